import { describe, expect, it } from 'vitest';
import { interpolateAt, observationMisfit } from '../../src/model/analysis/observationMisfit';
import type { ObservedPoint } from '../../src/model/scenario';

// Hand-worked example (derived here). Cells of 100 m: centres 50, 150, 250, 350 m; modelled
// thickness 100, 120, 80, 0 m over a 400 m domain.
const X = [50, 150, 250, 350];
const H = [100, 120, 80, 0];
// Observations [x, thickness, uncertainty]:
//   x = 100: modelled 110 (half-way 100..120), observed 100 +- 10 -> r = +10, r/s = 1
//   x = 250: modelled 80,  observed 90 +- 5   -> r = -10, r/s = -2
//   x = 20:  modelled 100 (held at the first centre), observed 94 +- 20 -> r = +6, r/s = 0.3
//   x = 450: outside the 400 m domain -> left out
const OBS: ObservedPoint[] = [
  [100, 100, 10],
  [250, 90, 5],
  [20, 94, 20],
  [450, 50, 5],
];

describe('observationMisfit (hand-worked example)', () => {
  it('interpolates between cell centres and holds the end values', () => {
    expect(interpolateAt(X, H, 100)).toBe(110);
    expect(interpolateAt(X, H, 300)).toBe(40);
    expect(interpolateAt(X, H, 20)).toBe(100);
    expect(interpolateAt(X, H, 399)).toBe(0);
  });

  it('bias, RMS, weighted and normalised RMS of modelled minus observed', () => {
    const m = observationMisfit(X, H, 400, OBS);
    // bias = (10 - 10 + 6)/3 = 2
    // RMS = sqrt((100 + 100 + 36)/3) = sqrt(78.667) = 8.8694
    // weights 1/100, 1/25, 1/400: weighted RMS = sqrt((1 + 4 + 0.09)/(0.01 + 0.04 + 0.0025))
    //   = sqrt(5.09/0.0525) = sqrt(96.952) = 9.8464
    // normalised RMS = sqrt((1 + 4 + 0.09)/3) = sqrt(1.69667) = 1.3026
    expect(m).not.toBeNull();
    expect(m?.count).toBe(3);
    expect(m?.outside).toBe(1);
    expect(m?.bias).toBeCloseTo(2, 12);
    expect(m?.rms).toBeCloseTo(Math.sqrt(236 / 3), 12);
    expect(m?.rms).toBeCloseTo(8.8694, 4);
    expect(m?.weightedRms).toBeCloseTo(9.8464, 4);
    expect(m?.normalisedRms).toBeCloseTo(1.3026, 4);
  });

  it('leaves uncertainties that are not positive out of the weighted figures only, and returns null with nothing in the domain', () => {
    const m = observationMisfit(X, H, 400, [[100, 100, 0]]);
    expect(m?.rms).toBe(10);
    expect(m?.weightedRms).toBeNaN();
    expect(observationMisfit(X, H, 400, [[500, 1, 1]])).toBeNull();
    expect(observationMisfit(X, H, 400, [])).toBeNull();
  });
});
