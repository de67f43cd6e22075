/**
 * A control run (no change of climate) after a spin-up must stay where the spin-up left it: a
 * drifting control would be read as a response. Target from common practice (no published
 * source): under 0.1 % of the volume per century. Demo valley at several held warmings, both
 * schemes (the explicit one at two warmings: its spin-up is thirty times slower).
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { runScenario } from '../../src/model/runScenario';
import { checkedJson } from '../helpers/checkedScenario';

const demo = JSON.parse(readFileSync(new URL('../../examples/demo-valley.json', import.meta.url), 'utf8'));

function control(warming: number, scheme: 'implicit' | 'explicit') {
  return checkedJson({ ...demo, warming: [[0, warming]], run: { years: 200, outputEvery: 100 }, numerics: { scheme } });
}

describe('control run after the spin-up (demo valley)', () => {
  it.each([
    [-1, 'implicit'],
    [0, 'implicit'],
    [0.5, 'implicit'],
    [1, 'implicit'],
    [2, 'implicit'],
    [0, 'explicit'],
    [1, 'explicit'],
  ] as const)('held warming %s K, %s: volume drifts less than 0.1 % per century over two centuries', (warming, scheme) => {
    const report = runScenario(control(warming, scheme));
    expect(report.summary.spinup?.converged).toBe(true);
    const volumes = report.frames.map((frame) => frame.fields.thickness.reduce((sum, h, i) => sum + h * report.model.grid.widthAtCells[i], 0));
    for (let k = 1; k < volumes.length; k++) {
      const perCentury = Math.abs(volumes[k] - volumes[k - 1]) / volumes[0];
      expect(perCentury).toBeLessThan(1e-3);
    }
  });
});
