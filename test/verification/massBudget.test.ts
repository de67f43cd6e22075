/**
 * Mass conservation of the whole engine (finite-volume flux form, e.g. LeVeque 2002 ch. 4): over a
 * long run the change of ice volume must equal the applied balance minus the outflow, to round-off.
 * Invented valley with a bedrock step, an overdeepening, ice-free cells and a warming ramp.
 */
import { describe, expect, it } from 'vitest';
import { runScenario } from '../../src/model/runScenario';
import type { Scenario } from '../../src/model/scenario';

const steppedValley: Scenario = {
  format: 'firnline-scenario',
  version: 1,
  name: 'Budget test valley (invented)',
  grid: { length: 8000, spacing: 50 },
  bed: [[0, 3000], [2000, 2700], [3000, 2640], [3500, 2660], [4000, 2600], [4050, 2450], [8000, 2000]],
  width: [[0, 900], [8000, 300]],
  shapeFactor: { crossSection: 'parabolic' },
  ice: { n: 3, A: 2.4e-24 },
  sliding: { C: 2e-14, m: 3 },
  massBalance: { model: 'linear', ela: 2700, ablationGradient: 0.008, accumulationGradient: 0.005, maxAccumulation: 2 },
  warming: [[0, -1], [300, -1], [500, 2.5]],
  run: { years: 1000, outputEvery: 50 },
};

describe.each(['explicit', 'implicit'] as const)('mass budget, %s scheme', (scheme) => {
  const report = runScenario({ ...steppedValley, numerics: { scheme } });
  const budget = report.summary.massBudget;

  it('closes over 1,000 years of advance and retreat over a step: relative residual <= 1e-9, clipped round-off below 1e-9 of the largest volume', () => {
    console.info(`budget test (${scheme}): relative residual`, budget.relativeResidual.toExponential(2), 'steps', report.summary.steps);
    expect(budget.relativeResidual).toBeLessThanOrEqual(1e-9);
    expect(budget.clippedRoundOff).toBeLessThan(1e-9 * Math.max(budget.initialVolume, budget.finalVolume, 1));
  });

  it('exercised what it claims: the terminus advanced past the step (beyond 4,100 m), then retreated by more than 500 m', () => {
    const termini = report.frames.map((f) => {
      let last = -1;
      f.fields.thickness.forEach((h, i) => {
        if (h >= 1) last = i;
      });
      return (last + 1) * 50;
    });
    expect(Math.max(...termini)).toBeGreaterThan(4100);
    expect(termini[termini.length - 1]).toBeLessThan(Math.max(...termini) - 500);
    expect(budget.appliedBalance).not.toBe(0);
  });

  it('never produces negative or non-finite thickness in any output frame', () => {
    for (const frame of report.frames) for (const h of frame.fields.thickness) expect(h >= 0 && Number.isFinite(h)).toBe(true);
  });
});
