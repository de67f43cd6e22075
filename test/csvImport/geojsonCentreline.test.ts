import { describe, expect, it } from 'vitest';
import { geodesicDistance } from '../../src/csvImport/geodesic';
import { parseCentrelineGeojson, type Centreline } from '../../src/csvImport/geojsonCentreline';

// An invented centreline in an imaginary valley (no real glacier), drawn down-valley.
const POSITIONS = [
  [7.1, 61.5, 1900],
  [7.11, 61.495, 1800],
  [7.125, 61.49, 1650],
  [7.14, 61.486, 1500],
];
const lineString = (coordinates: unknown) => ({ type: 'LineString', coordinates });
const feature = (geometry: unknown, name = 'invented centreline') => ({ type: 'Feature', properties: { name }, geometry });

function ok(text: string, reverse = false): Centreline {
  const r = parseCentrelineGeojson(text, { reverse });
  if (!r.ok) throw new Error(r.error);
  return r;
}
function error(value: unknown): string {
  const r = parseCentrelineGeojson(typeof value === 'string' ? value : JSON.stringify(value));
  if (r.ok) throw new Error('expected a refusal');
  return r.error;
}

describe('parseCentrelineGeojson', () => {
  it('reads a bare LineString, a Feature and a FeatureCollection alike, with geodesic distances', () => {
    const expected = [0];
    for (let i = 1; i < POSITIONS.length; i++) {
      const [lon0, lat0] = POSITIONS[i - 1];
      const [lon1, lat1] = POSITIONS[i];
      expected.push(expected[i - 1] + geodesicDistance(lat0, lon0, lat1, lon1));
    }
    for (const text of [
      JSON.stringify(lineString(POSITIONS)),
      JSON.stringify(feature(lineString(POSITIONS))),
      JSON.stringify({ type: 'FeatureCollection', features: [feature({ type: 'Point', coordinates: [7, 61] }), feature(lineString(POSITIONS))] }),
    ]) {
      const r = ok(text);
      expect(r.problems).toEqual([]);
      expect(r.points.map((p) => p.elevation)).toEqual([1900, 1800, 1650, 1500]);
      r.points.forEach((p, i) => expect(p.distanceM).toBeCloseTo(expected[i], 6));
      expect(r.lengthM).toBeCloseTo(expected[3], 6);
    }
    expect(ok(JSON.stringify(feature(lineString(POSITIONS)))).name).toBe('invented centreline');
    // About 2.9 km: 0.04 degrees of longitude at 61.5 N (~2.1 km) and 0.014 of latitude (~1.6 km).
    expect(expected[3]).toBeGreaterThan(2500);
    expect(expected[3]).toBeLessThan(3200);
  });

  it('reads a line drawn up-valley reversed when asked, and says that it climbs otherwise', () => {
    const up = JSON.stringify(lineString([...POSITIONS].reverse()));
    expect(ok(up).notes.join(' ')).toMatch(/climbs from 1500 m to 1900 m/);
    const r = ok(up, true);
    expect(r.points.map((p) => p.elevation)).toEqual([1900, 1800, 1650, 1500]);
    expect(r.points.map((p) => p.index)).toEqual([3, 2, 1, 0]);
    expect(r.notes.join(' ')).not.toMatch(/climbs/);
  });

  it('leaves out repeated positions with a note', () => {
    const r = ok(JSON.stringify(lineString([POSITIONS[0], POSITIONS[0], ...POSITIONS.slice(1)])));
    expect(r.points).toHaveLength(4);
    expect(r.notes.join(' ')).toMatch(/1 position repeating the one before was left out/);
  });

  it('refuses what is not a single GeoJSON LineString, saying what was found', () => {
    expect(error('{"type": "LineString", ')).toMatch(/^the file is not JSON \(.+\); a centreline must be GeoJSON text$/);
    expect(error('')).toMatch(/the file is empty/);
    expect(error([1, 2])).toMatch(/holds JSON array, not a GeoJSON object/);
    expect(error({ format: 'firnline-scenario' })).toMatch(/is JSON but not GeoJSON: its "type" is missing/);
    expect(error({ type: 'Topology' })).toMatch(/its "type" is "Topology"/);
    expect(error({ type: 'FeatureCollection', features: [feature({ type: 'Point', coordinates: [7, 61, 1] }), feature({ type: 'Polygon', coordinates: [] })] })).toBe(
      'the file holds no LineString (found: 1 Point, 1 Polygon); the centreline must be one LineString with [longitude, latitude, elevation] positions',
    );
    expect(error({ type: 'MultiLineString', coordinates: [POSITIONS, POSITIONS] })).toMatch(/MultiLineString but no LineString.*merge its parts/);
    expect(error({ type: 'FeatureCollection', features: [feature(lineString(POSITIONS)), feature(lineString(POSITIONS))] })).toBe(
      'the file holds 2 LineStrings (features[0].geometry, features[1].geometry); exactly one is accepted — keep only the centreline, or merge the parts in the GIS',
    );
    expect(error(lineString([POSITIONS[0]]))).toBe('the LineString at the top-level object has 1 position; a line needs at least 2');
    expect(error(lineString([POSITIONS[0], POSITIONS[0]]))).toMatch(/fewer than 2 distinct positions/);
    expect(error({ ...lineString(POSITIONS), crs: { type: 'name', properties: { name: 'urn:ogc:def:crs:EPSG::32632' } } })).toMatch(
      /names the coordinate reference system urn:ogc:def:crs:EPSG::32632; positions must be WGS 84 longitude and latitude/,
    );
    expect(ok(JSON.stringify({ ...lineString(POSITIONS), crs: { type: 'name', properties: { name: 'urn:ogc:def:crs:OGC:1.3:CRS84' } } })).points).toHaveLength(4);
    expect(error(lineString(Array.from({ length: 10_001 }, (_, i) => [7 + i * 1e-4, 61, 1000])))).toMatch(/10,001 positions; a profile holds at most 10,000/);
    expect(error(' '.repeat(20_000_001))).toMatch(/larger than 20 MB/);
  });

  it('lists each position that cannot be read, by index, with what is wrong and what is allowed', () => {
    const r = ok(
      JSON.stringify(
        lineString([
          [7.1, 61.5, 1900],
          [7.11, 61.495],
          [190, 61.49, 1650],
          [7.14, 95, 1500],
          [7.15, 61.48, 'high'],
          '7.16,61.47,1400',
          [7.17, 61.46, 20000],
          [7.18, 61.45, 1300],
        ]),
      ).replace('20000', '1e400'),
    );
    expect(r.problems).toEqual([
      { index: 1, message: 'has no elevation; each position must be [longitude, latitude, elevation in m] — export the line with its Z values (e.g. draped on a DEM)' },
      { index: 2, message: 'longitude 190 is outside -180 to 180 degrees' },
      { index: 3, message: 'latitude 95 is outside -90 to 90 degrees' },
      { index: 4, message: 'elevation is the text "high", not a number' },
      { index: 5, message: 'is the text "7.16,61.47,1400", not a position [longitude, latitude, elevation]' },
      { index: 6, message: 'elevation is not a finite number' },
    ]);
    expect(r.points.map((p) => p.index)).toEqual([0, 7]);
  });

  it('refuses elevations outside the scenario limits', () => {
    const r = ok(JSON.stringify(lineString([[7.1, 61.5, 1900], [7.11, 61.49, 12_000]])));
    expect(r.problems).toEqual([{ index: 1, message: 'elevation 12000 m is outside -1000 to 10,000 m' }]);
  });
});
