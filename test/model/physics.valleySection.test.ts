/**
 * The valley cross-section (src/model/physics/valleySection.ts) against elementary geometry:
 * the trapezoid's area as the mean of its parallel sides times its height, the parabola's as
 * Archimedes' two thirds of the bounding rectangle, and both against a direct quadrature of the
 * ice between the flat surface and the bed's cross profile.
 */
import { describe, expect, it } from 'vitest';
import {
  secantWidth,
  secantWidthSlope,
  sectionArea,
  surfaceWidth,
  surfaceWidthSlope,
  thicknessForArea,
  type ValleySection,
} from '../../src/model/physics/valleySection';

const trapezoid: ValleySection = { shape: 'trapezoidal', widening: 200 };
const parabola: ValleySection = { shape: 'parabolic', widening: 300 };

/**
 * Area of ice up to depth H over a bed cross profile z_b(y) (z_b = 0 on the floor), by the
 * composite Simpson rule over the wetted half-width: independent of the module's formulas.
 */
function quadratureArea(bedAt: (y: number) => number, halfWidth: number, H: number): number {
  const n = 20_000;
  const h = halfWidth / n;
  let sum = 0;
  for (let k = 0; k <= n; k++) {
    const depth = Math.max(0, H - bedAt(k * h));
    sum += depth * (k === 0 || k === n ? 1 : k % 2 === 1 ? 4 : 2);
  }
  return 2 * (sum * h) / 3;
}

describe('valley section geometry', () => {
  it('trapezoid with 45-degree walls (widening = 200 m / tan 45 = 200 m): floor 100 m, 50 m of ice -> surface 200 m, area (100 + 200)/2 * 50 = 7500 m^2', () => {
    expect(surfaceWidth(trapezoid, 100, 50)).toBe(200);
    expect(sectionArea(trapezoid, 100, 50)).toBeCloseTo(7500, 9);
    expect(surfaceWidthSlope(trapezoid, 100, 50)).toBe(2);
  });

  it('parabola over a 1-mm floor: area = 2/3 H w_s (Archimedes, the parabolic segment), to 1e-6', () => {
    for (const H of [5, 80, 400]) {
      const ws = surfaceWidth(parabola, 1e-3, H);
      expect(sectionArea(parabola, 1e-3, H) / ((2 / 3) * H * ws) - 1).toBeCloseTo(0, 6);
    }
  });

  it('widening is the extra surface width at 100 m of ice, for both flanked shapes', () => {
    for (const floor of [20, 150, 900]) {
      expect(surfaceWidth(trapezoid, floor, 100) - floor).toBeCloseTo(200, 9);
      expect(surfaceWidth(parabola, floor, 100) - floor).toBeCloseTo(300, 9);
    }
  });

  it('areas agree with a Simpson quadrature of the ice over the bed cross profile, to 1e-7', () => {
    const floor = 120;
    // Trapezoid: the flank rises 100 m over widening/2 horizontally.
    const k = trapezoid.widening / 100;
    const trapezoidBed = (y: number) => (y <= floor / 2 ? 0 : (y - floor / 2) * (2 / k));
    // Filled parabola: z = c (y^2 - (w0/2)^2) outside the floor, c from w_s(100) = w0 + L.
    const halfAt100 = (floor + parabola.widening) / 2;
    const c = 100 / (halfAt100 ** 2 - (floor / 2) ** 2);
    const parabolaBed = (y: number) => (y <= floor / 2 ? 0 : c * (y * y - (floor / 2) ** 2));
    for (const H of [3, 60, 250]) {
      const wt = surfaceWidth(trapezoid, floor, H);
      const wp = surfaceWidth(parabola, floor, H);
      expect(sectionArea(trapezoid, floor, H) / quadratureArea(trapezoidBed, wt / 2, H) - 1).toBeCloseTo(0, 7);
      expect(sectionArea(parabola, floor, H) / quadratureArea(parabolaBed, wp / 2, H) - 1).toBeCloseTo(0, 7);
      // The surface width is where the bed profile reaches the surface.
      expect(parabolaBed(wp / 2)).toBeCloseTo(H, 9);
      expect(trapezoidBed(wt / 2)).toBeCloseTo(H, 9);
    }
  });

  describe.each([
    ['rectangular', { shape: 'rectangular', widening: 0 } as ValleySection],
    ['trapezoidal', trapezoid],
    ['parabolic', parabola],
  ])('%s: the functions are one consistent section', (_label, section) => {
    const floor = 80;
    it('dA/dH = w_s and dw_s/dH by centred differences, to 1e-7', () => {
      for (const H of [0.5, 40, 300]) {
        const d = 1e-3;
        expect((sectionArea(section, floor, H + d) - sectionArea(section, floor, H - d)) / (2 * d) / surfaceWidth(section, floor, H) - 1).toBeCloseTo(0, 7);
        const slope = (surfaceWidth(section, floor, H + d) - surfaceWidth(section, floor, H - d)) / (2 * d);
        expect(Math.abs(slope - surfaceWidthSlope(section, floor, H))).toBeLessThan(1e-7);
      }
    });

    it('thicknessForArea inverts sectionArea to 1e-12, from a 1-micrometre film to 1 km', () => {
      for (const H of [1e-6, 0.3, 75, 1000]) expect(thicknessForArea(section, floor, sectionArea(section, floor, H)) / H - 1).toBeCloseTo(0, 12);
      expect(thicknessForArea(section, floor, 0)).toBe(0);
    });

    it('the secant width is (A(h) - A(o)) / (h - o), w_s(o) at h = o, and its slope matches a difference', () => {
      const o = 120;
      for (const h of [0, 60, 119, 121, 200]) {
        expect(secantWidth(section, floor, h, o)).toBeCloseTo((sectionArea(section, floor, h) - sectionArea(section, floor, o)) / (h - o), 8);
        const d = 1e-3;
        const numeric = (secantWidth(section, floor, h + d, o) - secantWidth(section, floor, h - d, o)) / (2 * d);
        expect(Math.abs(numeric - secantWidthSlope(section, floor, h, o))).toBeLessThan(1e-7);
      }
      expect(secantWidth(section, floor, o, o)).toBeCloseTo(surfaceWidth(section, floor, o), 10);
    });
  });
});
