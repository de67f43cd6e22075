import { describe, expect, it } from 'vitest';
import { halfChangeTime, runOutcome } from '../../src/model/analysis/runOutcome';
import { runScenario } from '../../src/model/runScenario';
import { testValley } from './valley';

describe('halfChangeTime', () => {
  it('interpolates to the first time half the final change is made (hand-worked: exact, and within 5e-13)', () => {
    // Change 0 -> -100; half is -50, reached between t = 10 (-40) and t = 20 (-60): t = 15.
    expect(halfChangeTime([0, 10, 20, 30], [500, 460, 440, 400])).toBe(15);
    // Overshoot: the first crossing counts (|change| 60 >= 50 already at t = 10, from 0 at t = 0).
    expect(halfChangeTime([0, 10, 20], [0, 60, 100])).toBeCloseTo(50 / 6, 12);
  });
  it('is NaN when nothing changes', () => {
    expect(halfChangeTime([0, 10], [5, 5])).toBeNaN();
  });
  it('matches ln 2 x tau for an exponential approach within 0.05 a (records 1 a apart)', () => {
    // X(t) = 1 - exp(-t / tau): half the change at tau ln 2 (the change at the end is 1 - e^-20).
    const tau = 37;
    const times = Array.from({ length: 741 }, (_, k) => k);
    const values = times.map((t) => 1 - Math.exp(-t / tau));
    expect(Math.abs(halfChangeTime(times, values) - tau * Math.LN2)).toBeLessThan(0.05);
  });
});

describe('runOutcome', () => {
  it('takes the changes from year 0 to the end of the run, with the e-folding time of a step', () => {
    const report = runScenario(testValley({ warming: [[0, 0], [1, 1]], run: { years: 300, outputEvery: 50 } }));
    const outcome = runOutcome(report);
    const { volume } = report.annual;
    expect(outcome.volumeChange).toBe(volume[volume.length - 1] - volume[0]);
    expect(outcome.volumeChangePercent).toBeCloseTo((100 * outcome.volumeChange) / volume[0], 10);
    expect(outcome.lengthChange).toBeLessThan(0);
    expect(outcome.eFoldingYears).toBe(report.summary.responseTime!.eFoldingYears);
    // For a response close to exponential, the half-change time comes before the e-folding time.
    expect(outcome.halfVolumeChangeYears).toBeLessThan(outcome.eFoldingYears);
    console.info(`step +1 K: half volume change ${outcome.halfVolumeChangeYears.toFixed(1)} a, e-folding ${outcome.eFoldingYears.toFixed(1)} a`);
  });
});
