import { describe, expect, it } from 'vitest';
import { nyeShapeFactor, type CrossSection } from '../../src/model/physics/shapeFactor';

// Nye, J. F. (1965), The flow of a glacier in a channel of rectangular, elliptic or parabolic
// cross-section, J. Glaciol. 5(41), 661-690, as tabulated in Cuffey & Paterson (2010), The Physics
// of Glaciers, 4th ed., Table 8.1 (table number and values from memory, not checked against the
// printed table; they are reported to agree with an independent finite-element computation to
// about 0.004, which is not in this repository).
// W = half-width / centre-line depth; f defined through the centre-line speed.
const NYE: Record<CrossSection, Array<[number, number]>> = {
  parabolic: [[1, 0.445], [2, 0.646], [3, 0.746], [4, 0.806]],
  'semi-elliptic': [[1, 0.5], [2, 0.709], [3, 0.799], [4, 0.849]],
  rectangular: [[1, 0.558], [2, 0.789], [3, 0.884], [4, 0.929]],
};

describe('nyeShapeFactor(section, halfWidth, depth)', () => {
  for (const section of Object.keys(NYE) as CrossSection[]) {
    it.each(NYE[section])(`${section}: W = %f gives Nye's f = %f within 5e-4`, (w, f) => {
      expect(nyeShapeFactor(section, w * 300, 300)).toBeCloseTo(f, 3);
    });

    it(`${section}: rises strictly from W = 1 to 1e6, never above 1, and within 5e-7 of 1 at W = 1e9`, () => {
      let previous = 0;
      for (const w of [1, 1.5, 2, 2.5, 3, 3.5, 4, 6, 10, 100, 1e6]) {
        const f = nyeShapeFactor(section, w * 100, 100);
        expect(f).toBeGreaterThan(previous);
        expect(f).toBeLessThanOrEqual(1);
        previous = f;
      }
      expect(nyeShapeFactor(section, 1e9, 1)).toBeCloseTo(1, 6);
    });
  }

  it('gives exactly 0.5 for a semicircle (semi-elliptic, W = 1), the analytic result for any n (Nye 1965)', () => {
    expect(nyeShapeFactor('semi-elliptic', 250, 250)).toBe(0.5);
  });

  it('holds the W = 1 value for sections deeper than their half-width (exactly 0.445, parabolic, W = 1/3)', () => {
    expect(nyeShapeFactor('parabolic', 100, 300)).toBe(0.445);
  });

  it('is 1 where there is no ice', () => {
    expect(nyeShapeFactor('rectangular', 400, 0)).toBe(1);
  });
});
