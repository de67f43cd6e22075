import { describe, expect, it } from 'vitest';
import { geodesicDistance, WGS84, type Ellipsoid } from '../../src/csvImport/geodesic';

/** Degrees from degrees, minutes and seconds; the sign of the degrees applies to all three. */
function dms(d: number, m: number, s: number, negative = false): number {
  const v = Math.abs(d) + m / 60 + s / 3600;
  return negative || d < 0 ? -v : v;
}

// Vincenty (1975) uses these two ellipsoids for his test lines.
const BESSEL: Ellipsoid = { a: 6_377_397.155, f: 1 / 299.1528128 };
const INTERNATIONAL: Ellipsoid = { a: 6_378_388, f: 1 / 297 };

describe('geodesicDistance (Vincenty 1975 inverse)', () => {
  // Geoscience Australia, Geodetic Calculations documentation, worked example "Flinders Peak to
  // Buninyong" on GRS80 (its flattening differs from WGS 84's by 1.5e-11 relative, which moves this
  // 55 km line by well under 0.01 mm). Coordinates and distance from memory.
  it('Flinders Peak to Buninyong: 54,972.271 m within 1 mm (Geoscience Australia worked example)', () => {
    const s = geodesicDistance(dms(-37, 57, 3.7203), dms(144, 25, 29.5244), dms(-37, 39, 10.1561), dms(143, 55, 35.3839), WGS84);
    console.info(`Flinders Peak - Buninyong: ${s.toFixed(4)} m, error ${((s - 54972.271) * 1000).toFixed(2)} mm`);
    expect(Math.abs(s - 54972.271)).toBeLessThan(0.001);
  });

  // Vincenty (1975), Survey Review 23(176), the test lines of the paper's table (values from memory).
  const lines: { name: string; e: Ellipsoid; lat1: number; lat2: number; dLon: number; s: number }[] = [
    { name: '(a) Bessel', e: BESSEL, lat1: dms(55, 45, 0), lat2: dms(-33, 26, 0), dLon: dms(108, 13, 0), s: 14_110_526.17 },
    { name: '(b) International', e: INTERNATIONAL, lat1: dms(37, 19, 54.95367), lat2: dms(26, 7, 42.83946), dLon: dms(41, 28, 35.50729), s: 4_085_966.703 },
    { name: '(c) International', e: INTERNATIONAL, lat1: dms(35, 16, 11.24862), lat2: dms(67, 22, 14.77638), dLon: dms(137, 47, 28.31435), s: 8_084_823.839 },
  ];
  for (const line of lines) {
    it(`Vincenty (1975) line ${line.name}: ${line.s} m within 1 mm`, () => {
      const s = geodesicDistance(line.lat1, 0, line.lat2, line.dLon, line.e);
      console.info(`Vincenty line ${line.name}: ${s.toFixed(4)} m, error ${((s - line.s) * 1000).toFixed(2)} mm`);
      expect(Math.abs(s - line.s)).toBeLessThan(0.001);
    });
  }

  it('is symmetric, zero for coincident points, and independent of where longitude is counted from', () => {
    const s = geodesicDistance(46.5, 8.0, 46.52, 8.05);
    expect(geodesicDistance(46.52, 8.05, 46.5, 8.0)).toBeCloseTo(s, 9);
    expect(geodesicDistance(46.5, 178.0, 46.52, 178.05)).toBeCloseTo(s, 6);
    // Across the antimeridian: 179.99 E to 179.99 W is 0.02 degrees of longitude.
    expect(geodesicDistance(60, 179.99, 60, -179.99)).toBeCloseTo(geodesicDistance(60, 0, 60, 0.02), 6);
    expect(geodesicDistance(46.5, 8, 46.5, 8)).toBe(0);
  });

  // Along a meridian the geodesic is the meridian arc; one arc-minute of latitude at 45 degrees is
  // M * pi / 10800 with the meridional radius of curvature M = a (1 - e^2) / (1 - e^2 sin^2 phi)^1.5
  // (standard result; the arc is short enough that M's change over it is below 1e-7 relative).
  it('one arc-minute along a meridian at 45 degrees matches the meridional radius of curvature (within 1 mm)', () => {
    const { a, f } = WGS84;
    const e2 = f * (2 - f);
    const M = (a * (1 - e2)) / Math.pow(1 - e2 * Math.sin(Math.PI / 4) ** 2, 1.5);
    const expected = (M * Math.PI) / 10800;
    const s = geodesicDistance(45 - 1 / 120, 10, 45 + 1 / 120, 10);
    console.info(`1' of meridian at 45 deg: ${s.toFixed(5)} m vs ${expected.toFixed(5)} m`);
    expect(Math.abs(s - expected)).toBeLessThan(0.001);
  });

  it('returns NaN where the iteration does not converge (nearly antipodal points)', () => {
    expect(geodesicDistance(0, 0, 0.5, 179.7)).toBeNaN();
  });
});
