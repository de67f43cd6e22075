import { describe, expect, it } from 'vitest';
import { rateFactorFromTemperature } from '../../src/model/physics/rateFactor';

// Cuffey & Paterson (2010), The Physics of Glaciers, 4th ed., Table 3.4: recommended A for n = 3,
// in 1e-25 s^-1 Pa^-3. Values from memory, not checked against the printed table; the table has
// two figures and agrees with the Arrhenius relation (same book, eq. 3.35; equation number from
// memory) to within 3 % (worst -2.9 % at -2 C), hence the 4 % tolerance.
const TABLE_3_4: Array<[number, number]> = [
  [0, 24], [-2, 17], [-5, 9.3], [-10, 3.5], [-15, 2.1], [-20, 1.2],
  [-25, 0.68], [-30, 0.37], [-35, 0.2], [-40, 0.1], [-45, 0.052], [-50, 0.026],
];

describe('rateFactorFromTemperature(T)', () => {
  it.each(TABLE_3_4)('at %f C matches Cuffey & Paterson (2010) Table 3.4 (%f e-25) within 4 %', (t, tabulated) => {
    const a = rateFactorFromTemperature(t);
    expect(Math.abs(a / (tabulated * 1e-25) - 1)).toBeLessThan(0.04);
  });

  it('equals A* = 3.5e-25 (within 5e-31) at T* = -10 C (Cuffey & Paterson 2010, eq. 3.35)', () => {
    expect(rateFactorFromTemperature(-10)).toBeCloseTo(3.5e-25, 30);
  });

  it('multiplies by the enhancement factor (E = 3 at -5 C, within 5e-31)', () => {
    expect(rateFactorFromTemperature(-5, 3)).toBeCloseTo(3 * rateFactorFromTemperature(-5), 30);
  });

  it('is continuous across T* where the activation energy changes: relative jump below 1e-5 across T* +- 1e-6 K', () => {
    const below = rateFactorFromTemperature(-10.000001);
    const above = rateFactorFromTemperature(-9.999999);
    expect(Math.abs(above / below - 1)).toBeLessThan(1e-5);
  });
});
