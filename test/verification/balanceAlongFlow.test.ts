/**
 * The balance shown along the flowline is the balance that changes the glacier: summed over the
 * cells (sum of w b dx, in ice equivalent), it equals the rate of change of the ice volume when
 * nothing leaves the domain. This is continuity integrated over the glacier (e.g. Cuffey &
 * Paterson 2010, section 8.4); the terminus' ablation of the ice pushed into the first bare cell
 * belongs in that sum. Demo valley, spun up, then 1.5 K of warming over a century: steady at
 * first, retreating after.
 *
 * The balance written at an output is what the time stepper applied in each cell since the
 * previous output, averaged over that time; summed, it is the volume change over the interval
 * for either scheme, to the solver's tolerance.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { iceVolume } from '../../src/model/glacierExtent';
import { runScenario } from '../../src/model/runScenario';
import { checkedJson } from '../helpers/checkedScenario';

const demo = JSON.parse(readFileSync(new URL('../../examples/demo-valley.json', import.meta.url), 'utf8'));

describe.each(['implicit', 'explicit'] as const)('sum of w b dx against dV/dt, demo valley, %s scheme', (scheme) => {
  const years = scheme === 'implicit' ? 200 : 120;
  const report = runScenario(checkedJson({ ...demo, run: { years, outputEvery: 1 }, numerics: { scheme } }));
  const { model } = report;
  const { grid } = model;
  const volumes = report.frames.map((frame) => iceVolume(grid, frame.fields.thickness));
  // The balance profiles.csv writes (balance_mwe_a), as the run diagnosed it at each output.
  const sums = report.frames.map((frame) => {
    const profile = frame.fields;
    let sum = 0;
    let accumulation = 0;
    for (let i = 0; i < grid.cellCount; i++) {
      const perCell = (profile.balance[i] / model.iceToWaterEquivalent) * grid.widthAtCells[i] * grid.spacing;
      sum += perCell;
      if (perCell > 0) accumulation += perCell;
    }
    return { sum, accumulation };
  });

  it('no ice leaves the domain (so nothing else enters the sum)', () => {
    expect(report.summary.massBudget.outflow).toBe(0);
  });

  it('the first output, a steady glacier with no booking yet, shows its state: the sum is within 0.1 % of the gross accumulation of zero (it was +1 % with the terminus ablation left out)', () => {
    expect(Math.abs(sums[0].sum) / sums[0].accumulation).toBeLessThan(1e-3);
  });

  it.each([
    ['first decade of the warming, nearly steady', 1, 10],
    ['retreating', 60, years - 1],
  ])('%s: the two agree within 1e-8 of the gross accumulation every year', (_label, from, to) => {
    let worst = 0;
    for (let k = from; k <= to; k++) {
      const rate = volumes[k] - volumes[k - 1]; // outputs are one year apart
      const mismatch = Math.abs(sums[k].sum - rate) / sums[k].accumulation;
      worst = Math.max(worst, mismatch);
    }
    console.log(`${scheme}, years ${from}-${to}: worst |sum(w b dx) - dV/dt| = ${(100 * worst).toExponential(2)} % of accumulation`);
    expect(worst).toBeLessThan(1e-8);
  });

  it('the retreat is real: volume falls by more than 10 % of the gross accumulation a year at its fastest', () => {
    const fastest = Math.max(...sums.map((s, k) => (k > 0 ? (volumes[k - 1] - volumes[k]) / s.accumulation : 0)));
    expect(fastest).toBeGreaterThan(0.1);
  });
});
