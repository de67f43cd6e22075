import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { simplifyProfile } from '../../src/chart/simplifyProfile';
import { piecewiseLinear } from '../../src/model/piecewiseLinear';
import type { Point } from '../../src/model/scenario';

// Ramer (1972), Douglas & Peucker (1973): every dropped point lies within the tolerance of the
// simplified line; the end points are kept. Here the distance is vertical (profile z(x)).
describe('simplifyProfile (Ramer–Douglas–Peucker, vertical distance)', () => {
  it('reduces a straight line with small wiggles to its two ends', () => {
    const line: Point[] = Array.from({ length: 101 }, (_, i) => [i * 10, 3000 - i * 2 + (i % 2 ? 0.4 : -0.4)]);
    const out = simplifyProfile(line, 1);
    expect(out).toEqual([line[0], line[100]]);
  });

  it('keeps the apex of a V and the ends', () => {
    const v: Point[] = [[0, 100], [50, 50], [100, 0], [150, 50], [200, 100]];
    expect(simplifyProfile(v, 1)).toEqual([[0, 100], [100, 0], [200, 100]]);
  });

  it('keeps every point within the tolerance of the result (property)', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: -500, max: 500, noNaN: true }), { minLength: 3, maxLength: 200 }), fc.double({ min: 0.1, max: 50, noNaN: true }), (zs, tol) => {
        const pts: Point[] = zs.map((z, i) => [i * 7, z]);
        const out = simplifyProfile(pts, tol);
        expect(out[0]).toEqual(pts[0]);
        expect(out[out.length - 1]).toEqual(pts[pts.length - 1]);
        const f = piecewiseLinear(out);
        for (const [x, z] of pts) expect(Math.abs(f(x) - z)).toBeLessThanOrEqual(tol + 1e-9);
      }),
      { numRuns: 200 },
    );
  });
});
