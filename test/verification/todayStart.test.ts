/**
 * Twin experiments for the start from the glacier as it is today (src/model/todayStart.ts): the
 * model makes "today's" glacier itself from a known past climate (a steady state under
 * dT(-150) + 0.6 K) and a known warming history (-0.3 K at year -150 rising to +0.4 K at year
 * 0), writes its surface and terminus as the observations, and the transient start, from a wrong
 * (zero) offset, must recover the offset and match the terminus within one cell and the volume
 * within 3 %. The method searches past states that evolve into the observed glacier, after Eis,
 * Maussion & Marzeion (2019, The Cryosphere 13); the truth of a twin is known exactly, the
 * tolerances are ours and stated in each title. The observed start must begin from the given
 * surface exactly. The valley is the demo's invented Fennimow valley.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { createFlowlineModel } from '../../src/model/createFlowlineModel';
import { glacierExtent, iceVolume } from '../../src/model/glacierExtent';
import { runScenario, ScenarioRun } from '../../src/model/runScenario';
import type { Point, Scenario } from '../../src/model/scenario';
import { transientStateSteps } from '../../src/model/todayStart';
import { runToEnd } from '../../src/model/analysis/stepwise';
import { checkedJson } from '../helpers/checkedScenario';

const demo = JSON.parse(readFileSync(new URL('../../examples/demo-valley.json', import.meta.url), 'utf8'));
const TRUE_OFFSET = 0.6;
const START_YEAR = -150;
const WARMING: Point[] = [[-150, -0.3], [-60, 0], [0, 0.4], [100, 1.2]];

function today() {
  const base: Scenario = checkedJson({ ...demo, spinup: false, warming: WARMING, run: { years: 50, outputEvery: 10 } });
  const model = createFlowlineModel(base);
  const state = runToEnd(transientStateSteps(model, model.initialThickness, START_YEAR, TRUE_OFFSET));
  expect(state.spinUpConverged).toBe(true);
  const surface: Point[] = Array.from(model.grid.x, (x, i) => [x, model.grid.bed[i] + state.thickness[i]]);
  const terminus = glacierExtent(model.grid, state.thickness).terminus;
  const volume = iceVolume(model.grid, state.thickness);
  return { base, model, thickness: state.thickness, surface, terminus, volume };
}

describe('start from the glacier as it is today (twins on the demo valley)', () => {
  const t = today();

  it('transient start: offset recovered within 0.05 K, terminus within one cell (50 m), volume within 3 %', () => {
    const scenario: Scenario = checkedJson({
      ...t.base,
      surface: t.surface,
      start: { from: 'transient', startYear: START_YEAR },
      observations: { terminus: t.terminus },
    });
    const started = performance.now();
    const report = runScenario(scenario);
    const ms = performance.now() - started;
    const start = report.summary.start!;
    const volumeError = (start.volumeModelled - t.volume) / t.volume;
    console.log(
      `transient twin: offset ${start.climateOffset!.toFixed(4)} K (true ${TRUE_OFFSET}), terminus ${start.terminusModelled} m (observed ${t.terminus}), ` +
        `volume error ${(100 * volumeError).toFixed(2)} %, ${start.trials!.length} candidates, ${ms.toFixed(0)} ms; ` +
        `committed ${start.committed.lengthChange.toFixed(0)} m, ${(start.committed.volumeChange / 1e6).toFixed(1)} hm^3`,
    );
    expect(start.fitted).toBe(true);
    expect(start.bracketed).toBe(true);
    expect(Math.abs(start.climateOffset! - TRUE_OFFSET)).toBeLessThan(0.05);
    expect(Math.abs(start.terminusModelled - t.terminus)).toBeLessThanOrEqual(t.model.grid.spacing);
    expect(Math.abs(volumeError)).toBeLessThan(0.03);
    expect(Math.abs(start.volumeObserved / t.volume - 1)).toBeLessThan(1e-12);
    // Warmed from -0.3 K to +0.4 K, the glacier still has ice to lose at year 0.
    expect(start.committed.volumeChange).toBeLessThan(0);
    expect(report.frames[0].time).toBe(0);
  });

  it('transient start with the offset given: no fit, the state at year 0 is the truth to 1 cm (its spin-up starts from another glacier; steady only to the criterion)', () => {
    const scenario: Scenario = checkedJson({
      ...t.base,
      surface: t.surface,
      start: { from: 'transient', startYear: START_YEAR, climateOffset: TRUE_OFFSET },
    });
    const run = new ScenarioRun(scenario);
    const first = run.nextFrame()!;
    const start = run.report().summary.start!;
    expect(start.fitted).toBe(false);
    expect(start.trials).toBeUndefined();
    let worst = 0;
    for (let i = 0; i < t.thickness.length; i++) worst = Math.max(worst, Math.abs(first.fields.thickness[i] - t.thickness[i]));
    console.log(`given offset: largest thickness difference at year 0 ${worst.toExponential(2)} m`);
    expect(worst).toBeLessThan(0.01);
  });

  it('observed start: the first frame is the given surface over the bed (to 1e-9 m), committed change reported', () => {
    const scenario: Scenario = checkedJson({ ...t.base, surface: t.surface, start: { from: 'observed' }, observations: { terminus: t.terminus } });
    const run = new ScenarioRun(scenario);
    const first = run.nextFrame()!;
    expect(first.time).toBe(0);
    let worst = 0;
    for (let i = 0; i < t.thickness.length; i++) worst = Math.max(worst, Math.abs(first.fields.thickness[i] - t.thickness[i]));
    expect(worst).toBeLessThan(1e-9);
    while (run.nextFrame());
    const start = run.report().summary.start!;
    expect(start.from).toBe('observed');
    expect(start.terminusModelled).toBe(t.terminus);
    expect(start.volumeModelled).toBeCloseTo(t.volume, 3);
    expect(start.committed.volumeChange).toBeLessThan(0);
    expect(start.committed.converged).toBe(true);
  });
});
