import { describe, expect, it } from 'vitest';
import { degreeDayBalance } from '../../src/model/physics/massBalance/degreeDayBalance';
import { linearBalance } from '../../src/model/physics/massBalance/linearBalance';
import { annualPositiveDegreeDays, fractionOfYearBelow } from '../../src/model/physics/massBalance/positiveDegreeDays';
import { precipitationFactor } from '../../src/model/physics/massBalance/precipitationChange';
import { tableBalance } from '../../src/model/physics/massBalance/tableBalance';
import { annualPositiveDegreeDaysWithSpread, fractionOfYearBelowWithSpread } from '../../src/model/physics/massBalance/temperatureSpread';
import type { DegreeDayBalanceSpec } from '../../src/model/scenario';

describe('linearBalance', () => {
  const model = linearBalance({
    model: 'linear', ela: 3000, ablationGradient: 0.007, accumulationGradient: 0.004, maxAccumulation: 2.5, elaSensitivity: 120,
  });
  it('is gradient * (z - ELA) below the ELA (hand-worked: 200 m below at 0.7 m w.e./100 m -> -1.4, within 5e-13)', () => {
    expect(model.balanceAt(2800, 0)).toBeCloseTo(-1.4, 12);
  });
  it('uses the accumulation gradient above the ELA (100 m above -> 0.4, within 5e-13) and caps it at maxAccumulation exactly', () => {
    expect(model.balanceAt(3100, 0)).toBeCloseTo(0.4, 12);
    expect(model.balanceAt(4000, 0)).toBe(2.5);
  });
  it('raises the ELA by elaSensitivity per kelvin (exactly: +1.5 K -> 3180 m, b = 0 there)', () => {
    expect(model.equilibriumLineAltitude(1.5)).toBe(3180);
    expect(model.balanceAt(3180, 1.5)).toBe(0);
  });
  it('defaults the accumulation gradient to the ablation gradient (within 5e-13) and the sensitivity to 100 m/K (exactly)', () => {
    const plain = linearBalance({ model: 'linear', ela: 2000, ablationGradient: 0.005 });
    expect(plain.balanceAt(2100, 0)).toBeCloseTo(0.5, 12);
    expect(plain.equilibriumLineAltitude(2)).toBe(2200);
  });
});

describe('tableBalance', () => {
  const model = tableBalance({ model: 'table', points: [[2000, -6], [3000, 0], [3600, 1.5]], elaSensitivity: 100 });
  it('interpolates linearly (within 5e-13) and holds the end values exactly', () => {
    expect(model.balanceAt(2500, 0)).toBeCloseTo(-3, 12);
    expect(model.balanceAt(1000, 0)).toBe(-6);
    expect(model.balanceAt(5000, 0)).toBe(1.5);
  });
  it('shifts the whole table up with warming: balance within 5e-13, ELA within 5e-10 m', () => {
    expect(model.balanceAt(2700, 2)).toBeCloseTo(model.balanceAt(2500, 0), 12);
    expect(model.equilibriumLineAltitude(2)).toBeCloseTo(3200, 9);
  });
});

describe('annualPositiveDegreeDays (closed form of a sinusoidal year)', () => {
  // Independent check: integrate max(T, 0) over the year numerically in 100,000 sub-daily steps.
  function numericPdd(mean: number, amplitude: number): number {
    const steps = 100000;
    let sum = 0;
    for (let k = 0; k < steps; k++) {
      const t = mean + amplitude * Math.cos((2 * Math.PI * (k + 0.5)) / steps);
      sum += Math.max(t, 0);
    }
    return (sum / steps) * 365.25;
  }
  it.each([[-4, 8], [0, 8], [3, 8], [10, 8], [-12, 8], [2, 0]])('mean %f, half-range %f matches numeric integration within 5e-4 degree-days', (mean, amp) => {
    expect(annualPositiveDegreeDays(mean, amp)).toBeCloseTo(numericPdd(mean, amp), 3);
  });
  it('equals 365.25 * amplitude / pi for a zero mean (hand-worked, within 5e-10 degree-days)', () => {
    expect(annualPositiveDegreeDays(0, 8)).toBeCloseTo((365.25 * 8) / Math.PI, 9);
  });
  it('fraction below a threshold: half the year below the mean (within 5e-13), none below the minimum, all below a threshold above the maximum', () => {
    expect(fractionOfYearBelow(-4, -4, 8)).toBeCloseTo(0.5, 12);
    expect(fractionOfYearBelow(-13, -4, 8)).toBe(0);
    expect(fractionOfYearBelow(5, -4, 8)).toBe(1);
  });
});

describe('degreeDayBalance (Braithwaite 1995; Hock 2003)', () => {
  const spec: DegreeDayBalanceSpec = {
    model: 'degree-day', referenceElevation: 3000, meanTemperature: -4, amplitude: 8, lapseRate: 0.0065,
    precipitation: 2.0, precipitationGradient: 0.0005, snowThreshold: 1, ddfSnow: 3, ddfIce: 8,
  };
  const model = degreeDayBalance(spec);

  it('high and cold: keeps all precipitation as snow (b = P(z) within 5e-10)', () => {
    // 2000 m above the reference: mean -17 C, warmest -9 C: no melt, all snow.
    expect(model.balanceAt(5000, 0)).toBeCloseTo(2.0 * (1 + 0.0005 * 2000), 9);
  });

  it('low and warm: loses ice at ddfIce per degree-day once the snow is gone (hand-worked, within 5e-10; b < -2 m w.e./a)', () => {
    // 1000 m below: mean 2.5 C, half-range 8 K.
    const z = 2000;
    const mean = -4 + 0.0065 * 1000;
    const pdd = annualPositiveDegreeDays(mean, 8);
    const snow = 2.0 * (1 - 0.0005 * 1000) * fractionOfYearBelow(1, mean, 8);
    const expected = -0.008 * (pdd - snow / 0.003);
    expect(model.balanceAt(z, 0)).toBeCloseTo(expected, 9);
    expect(model.balanceAt(z, 0)).toBeLessThan(-2);
  });

  it('has an ELA where |b| < 1e-5, and +1 K raises it by 60-200 m (common practice; 1/lapse rate is 154 m)', () => {
    const ela0 = model.equilibriumLineAltitude(0);
    expect(Math.abs(model.balanceAt(ela0, 0))).toBeLessThan(1e-5);
    const rise = model.equilibriumLineAltitude(1) - ela0;
    // Common practice, no single source: 90-160 m/K for such a climate; bounded above by 1/lapse = 154 m
    // plus the effect of the precipitation gradient.
    expect(rise).toBeGreaterThan(60);
    expect(rise).toBeLessThan(200);
  });

  it('balance never decreases with elevation (1,500-5,000 m, every 100 m)', () => {
    let previous = -Infinity;
    for (let z = 1500; z <= 5000; z += 100) {
      const b = model.balanceAt(z, 0);
      expect(b).toBeGreaterThanOrEqual(previous);
      previous = b;
    }
  });
});

describe('precipitation change per kelvin (Held & Soden 2006 for the scale, from memory; compounded form)', () => {
  it('factor (1 + p/100)^dT: +7 %/K (Clausius–Clapeyron) over +2 K -> 1.1449 (hand-worked, within 5e-13); 0 or no warming -> exactly 1', () => {
    expect(precipitationFactor(7, 2)).toBeCloseTo(1.1449, 12);
    expect(precipitationFactor(7, 0)).toBe(1);
    expect(precipitationFactor(undefined, 3)).toBe(1);
    // Cooling with a positive p reduces precipitation; a negative p (drying) with warming likewise.
    expect(precipitationFactor(7, -1)).toBeCloseTo(1 / 1.07, 12);
    expect(precipitationFactor(-10, 1)).toBeCloseTo(0.9, 12);
  });
  it('differs from the linear form 1 + p dT/100 by the binomial term dT(dT-1)/2 (p/100)^2 (5 %/K, 0.1 K: -1.125e-4, within 5e-6, the next term being 3.6e-6)', () => {
    expect(precipitationFactor(5, 0.1) - 1.005).toBeCloseTo(-1.125e-4, 5);
  });
  it('linear model: scales accumulation only; ablation and the ELA unchanged (exact)', () => {
    const wet = linearBalance({ model: 'linear', ela: 3000, ablationGradient: 0.007, elaSensitivity: 100, precipitationPerK: 10 });
    const dry = linearBalance({ model: 'linear', ela: 3000, ablationGradient: 0.007, elaSensitivity: 100 });
    // +1 K: ELA 3100; 200 m above it b = 1.4 without the change, 1.54 with +10 %.
    expect(wet.balanceAt(3300, 1)).toBeCloseTo(1.4 * 1.1, 12);
    expect(wet.balanceAt(2900, 1)).toBe(dry.balanceAt(2900, 1));
    expect(wet.equilibriumLineAltitude(1)).toBe(dry.equilibriumLineAltitude(1));
  });
  it('table model: scales the positive part of the shifted table only (within 5e-13)', () => {
    const table = tableBalance({ model: 'table', points: [[2000, -6], [3000, 0], [3600, 1.5]], elaSensitivity: 100, precipitationPerK: 20 });
    expect(table.balanceAt(3700, 1)).toBeCloseTo(1.5 * 1.2, 12);
    expect(table.balanceAt(2600, 1)).toBeCloseTo(-3, 12);
  });
  it('degree-day model: more snow lowers the ELA under the same warming (direction), +7 %/K at +1 K adds 7 % to high snowfall (within 5e-10)', () => {
    const base: DegreeDayBalanceSpec = {
      model: 'degree-day', referenceElevation: 3000, meanTemperature: -4, amplitude: 8, lapseRate: 0.0065,
      precipitation: 2.0, precipitationGradient: 0.0005, snowThreshold: 1, ddfSnow: 3, ddfIce: 8,
    };
    const wet = degreeDayBalance({ ...base, precipitationPerK: 7 });
    const dry = degreeDayBalance(base);
    // 2000 m above the reference, +1 K: mean -16 C, warmest -8 C: all snow, no melt.
    expect(wet.balanceAt(5000, 1)).toBeCloseTo(2.0 * (1 + 0.0005 * 2000) * 1.07, 9);
    expect(wet.equilibriumLineAltitude(1)).toBeLessThan(dry.equilibriumLineAltitude(1));
    expect(wet.equilibriumLineAltitude(0)).toBe(dry.equilibriumLineAltitude(0));
  });
});

describe('degree-day model with a temperature spread (Calov & Greve 2005)', () => {
  const base: DegreeDayBalanceSpec = {
    model: 'degree-day', referenceElevation: 3000, meanTemperature: -4, amplitude: 8, lapseRate: 0.0065,
    precipitation: 2.0, precipitationGradient: 0.0005, snowThreshold: 1, ddfSnow: 3, ddfIce: 8,
  };
  it('uses the spread degree-days: high up, where the plain cycle never thaws, sigma 4.5 K melts snow (b below the snowfall)', () => {
    const plain = degreeDayBalance(base);
    const spread = degreeDayBalance({ ...base, dailyTemperatureSd: 4.5 });
    // 1,000 m above the reference: mean -10.5 C, warmest -2.5 C: no melt without a spread.
    expect(plain.balanceAt(4000, 0)).toBeCloseTo(2.0 * 1.5, 9);
    expect(spread.balanceAt(4000, 0)).toBeLessThan(plain.balanceAt(4000, 0));
  });
  it('tabulated in the model: within 1e-4 m w.e. of the direct quadrature at 7 elevations (expected by linear interpolation: < 1e-5)', () => {
    const spread = degreeDayBalance({ ...base, dailyTemperatureSd: 4.5 });
    for (const z of [1500, 2011.3, 2500, 2777.7, 3000, 3456.1, 4000]) {
      const dz = z - 3000;
      const mean = -4 - 0.0065 * dz;
      const snow = 2.0 * (1 + 0.0005 * dz) * fractionOfYearBelowWithSpread(1, mean, 8, 4.5);
      const pdd = annualPositiveDegreeDaysWithSpread(mean, 8, 4.5);
      const direct = 0.003 * pdd <= snow ? snow - 0.003 * pdd : -0.008 * (pdd - snow / 0.003);
      expect(Math.abs(spread.balanceAt(z, 0) - direct)).toBeLessThan(1e-4);
    }
  });
  it('raises the ELA (more melt at the margins of the thaw season; direction) and is the plain model at sigma 0 exactly', () => {
    expect(degreeDayBalance({ ...base, dailyTemperatureSd: 4.5 }).equilibriumLineAltitude(0)).toBeGreaterThan(degreeDayBalance(base).equilibriumLineAltitude(0));
    expect(degreeDayBalance({ ...base, dailyTemperatureSd: 0 }).balanceAt(2500, 0)).toBe(degreeDayBalance(base).balanceAt(2500, 0));
  });
});

describe('degree-day model with refreezing (Reeh 1991 cap, from memory; fixed share: common practice)', () => {
  const base: DegreeDayBalanceSpec = {
    model: 'degree-day', referenceElevation: 3000, meanTemperature: -4, amplitude: 8, lapseRate: 0.0065,
    precipitation: 2.0, precipitationGradient: 0.0005, snowThreshold: 1, ddfSnow: 3, ddfIce: 8,
  };
  // Hand-worked at the reference elevation: mean -4 C, half-range 8 K.
  const pdd = annualPositiveDegreeDays(-4, 8);
  const snowfall = 2.0 * fractionOfYearBelow(1, -4, 8);
  const snowMelt = Math.min(0.003 * pdd, snowfall);
  const rain = 2.0 - snowfall;
  const plain = degreeDayBalance(base).balanceAt(3000, 0);
  it('adds r (snow melt + rain) below the cap (r = 0.1, within 5e-12)', () => {
    const refrozen = 0.1 * (snowMelt + rain);
    expect(refrozen).toBeLessThan(0.6 * snowfall);
    expect(degreeDayBalance({ ...base, refreezingFraction: 0.1 }).balanceAt(3000, 0) - plain).toBeCloseTo(refrozen, 11);
  });
  it('adds at most 0.6 of the snowfall (r = 1, within 5e-12), and nothing at r = 0 (exactly)', () => {
    const all = snowMelt + rain;
    const added = degreeDayBalance({ ...base, refreezingFraction: 1 }).balanceAt(3000, 0) - plain;
    expect(added).toBeCloseTo(Math.min(all, 0.6 * snowfall), 11);
    expect(degreeDayBalance({ ...base, refreezingFraction: 0 }).balanceAt(3000, 0)).toBe(plain);
  });
  it('lowers the ELA (direction)', () => {
    expect(degreeDayBalance({ ...base, refreezingFraction: 0.3 }).equilibriumLineAltitude(0)).toBeLessThan(degreeDayBalance(base).equilibriumLineAltitude(0));
  });
});
