/**
 * Degree-days with a normal temperature spread (Calov & Greve 2005) against independent numerical
 * integrals, erfc against its Taylor series, and the sigma -> 0 limit of the plain sinusoid.
 */
import { describe, expect, it } from 'vitest';
import { annualPositiveDegreeDays, fractionOfYearBelow } from '../../src/model/physics/massBalance/positiveDegreeDays';
import {
  annualPositiveDegreeDaysWithSpread,
  erfc,
  expectedPositiveTemperature,
  fractionOfYearBelowWithSpread,
} from '../../src/model/physics/massBalance/temperatureSpread';

/** erf by its Maclaurin series (independent of the Chebyshev fit), for |x| <= 3. */
function erfSeries(x: number): number {
  let term = x;
  let sum = x;
  for (let n = 1; n < 200; n++) {
    term *= (-x * x) / n;
    sum += term / (2 * n + 1);
  }
  return (2 / Math.sqrt(Math.PI)) * sum;
}

/** E[max(T, 0)] by Simpson's rule over the normal density, +-10 sigma in 4,000 parts. */
function expectedPositiveNumeric(mean: number, sigma: number): number {
  const n = 4000;
  const lo = mean - 10 * sigma;
  const h = (20 * sigma) / n;
  let sum = 0;
  for (let k = 0; k <= n; k++) {
    const t = lo + k * h;
    const f = Math.max(t, 0) * Math.exp(-((t - mean) ** 2) / (2 * sigma * sigma)) / (sigma * Math.sqrt(2 * Math.PI));
    sum += (k === 0 || k === n ? 1 : k % 2 ? 4 : 2) * f;
  }
  return (sum * h) / 3;
}

describe('erfc (Press et al. 2007 fit)', () => {
  it.each([-2.5, -1, -0.3, 0, 0.5, 1.2, 2, 3])('erfc(%f) matches 1 - erf by series within 2e-7 relative', (x) => {
    const exact = 1 - erfSeries(x);
    expect(Math.abs(erfc(x) - exact) / exact).toBeLessThan(2e-7);
  });
});

describe('expected positive temperature (Calov & Greve 2005 closed form)', () => {
  it('equals sigma / sqrt(2 pi) at a mean of 0 (hand-worked: sigma 5 K -> 1.99471 K, within 1e-5)', () => {
    expect(expectedPositiveTemperature(0, 5)).toBeCloseTo(5 / Math.sqrt(2 * Math.PI), 5);
  });
  it.each([[-10, 5], [-3, 5], [0, 2], [2, 5], [8, 3]])('mean %f, sigma %f: matches the integral over the normal density within 1e-6 K', (mean, sigma) => {
    expect(Math.abs(expectedPositiveTemperature(mean, sigma) - expectedPositiveNumeric(mean, sigma))).toBeLessThan(1e-6);
  });
});

describe('annual positive degree-days with spread', () => {
  it('tends to the plain sinusoid as sigma -> 0 (sigma 0.01 K: within 0.05 K d)', () => {
    for (const [mean, amp] of [[-4, 8], [3, 8], [-12, 8]]) {
      expect(Math.abs(annualPositiveDegreeDaysWithSpread(mean, amp, 0.01) - annualPositiveDegreeDays(mean, amp))).toBeLessThan(0.05);
      expect(Math.abs(fractionOfYearBelowWithSpread(1, mean, amp, 0.01) - fractionOfYearBelow(1, mean, amp))).toBeLessThan(1e-3);
    }
  });
  it('adds degree-days, most where the cycle barely reaches 0 C (direction; -8 C mean, 8 K half-range, sigma 5 K: from ~0 to > 100 K d)', () => {
    const plain = annualPositiveDegreeDays(-8, 8);
    const spread = annualPositiveDegreeDaysWithSpread(-8, 8, 5);
    console.info('PDD at -8 C, a = 8 K: plain', plain.toFixed(1), 'K d; sigma 5 K', spread.toFixed(1), 'K d');
    expect(plain).toBeLessThan(1e-9);
    expect(spread).toBeGreaterThan(100);
    expect(annualPositiveDegreeDaysWithSpread(5, 8, 5)).toBeGreaterThan(annualPositiveDegreeDays(5, 8));
  });
  it('equals 365.25 E[max(T,0)] for a flat year (amplitude 0), and a double integral for a cycle (within 0.01 K d)', () => {
    expect(annualPositiveDegreeDaysWithSpread(1, 0, 4)).toBeCloseTo(365.25 * expectedPositiveNumeric(1, 4), 3);
    // Independent: 2,000 points over the year of the Simpson integral over the normal density.
    let sum = 0;
    for (let k = 0; k < 2000; k++) sum += expectedPositiveNumeric(-2 + 9 * Math.cos((2 * Math.PI * (k + 0.5)) / 2000), 4.5);
    expect(Math.abs(annualPositiveDegreeDaysWithSpread(-2, 9, 4.5) - (sum / 2000) * 365.25)).toBeLessThan(0.01);
  });
});
