/**
 * Twin experiments for the bed inversion (Farinotti et al. 2009, J. Glaciol. 55(191), flowline
 * form): the forward model grows a steady glacier on a known bed; the inversion is given only its
 * surface, terminus and climate (and, where said, three thickness points) and must recover the
 * thickness. A twin is the usual test of an inversion method (the truth is known exactly); the
 * tolerances are ours.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { createFlowlineModel } from '../../src/model/createFlowlineModel';
import { glacierExtent, iceVolume } from '../../src/model/glacierExtent';
import { invertBed, invertedScenario, sampleCells, type InversionScenario } from '../../src/model/inversion/invertBed';
import type { ObservedPoint } from '../../src/model/scenario';
import { FlowlineSimulation } from '../../src/model/simulation';
import { spinUp } from '../../src/model/spinUp';
import { checkedJson } from '../helpers/checkedScenario';

const demo = JSON.parse(readFileSync(new URL('../../examples/demo-valley.json', import.meta.url), 'utf8'));

/** The demo valley (or a variant), spun up: the truth of the twin. */
function truth(overrides: object) {
  const scenario = checkedJson({ ...demo, warming: [[0, 0]], ...overrides });
  const model = createFlowlineModel(scenario);
  const spun = spinUp(model, model.initialThickness);
  expect(spun.converged).toBe(true);
  const extent = glacierExtent(model.grid, spun.thickness);
  const surface: [number, number][] = Array.from(model.grid.x, (x, i) => [x, model.grid.bed[i] + spun.thickness[i]]);
  return { scenario, model, thickness: spun.thickness, terminus: extent.terminus, surface };
}

/** What a surveyor would hand the inversion: no bed, the surface, the terminus, maybe radar points. */
function survey(t: ReturnType<typeof truth>, changes: Partial<InversionScenario> = {}): InversionScenario {
  const { bed: _bed, ...rest } = t.scenario;
  return { ...rest, surface: t.surface, observations: { terminus: t.terminus }, ...changes };
}

/** Worst and mean relative thickness error over the glacier, leaving out the thin ice at its two ends. */
function errors(t: ReturnType<typeof truth>, inverted: Float64Array) {
  const { grid } = t.model;
  const extent = glacierExtent(grid, t.thickness);
  let worst = 0;
  let sum = 0;
  let count = 0;
  const maxH = Math.max(...t.thickness);
  for (let i = extent.firstCell; i <= extent.lastCell; i++) {
    if (t.thickness[i] < 0.25 * maxH) continue;
    const e = Math.abs(inverted[i] / t.thickness[i] - 1);
    worst = Math.max(worst, e);
    sum += e;
    count++;
  }
  const volumeError = iceVolume(grid, inverted) / iceVolume(grid, t.thickness) - 1;
  return { worst, mean: sum / count, volumeError, count };
}

describe('bed inversion: twin experiments on the demo valley (steady glacier)', () => {
  it('with the right parameters: mean thickness error under 3 %, volume within 3 %, where the ice is over a quarter of its greatest thickness', () => {
    const t = truth({});
    const result = invertBed(survey(t), { smoothingMetres: 150 });
    const e = errors(t, result.thickness);
    console.log(`twin, sliding demo: mean ${(100 * e.mean).toFixed(2)} %, worst ${(100 * e.worst).toFixed(2)} %, volume ${(100 * e.volumeError).toFixed(2)} % over ${e.count} cells`);
    expect(e.count).toBeGreaterThan(50);
    expect(e.mean).toBeLessThan(0.03);
    expect(Math.abs(e.volumeError)).toBeLessThan(0.03);
    // Beyond the terminus the bed is the surface.
    const after = Math.ceil(t.terminus / t.model.grid.spacing);
    expect(result.bed[after + 2]).toBe(result.surface[after + 2]);
  });

  it('no sliding, A five times too large, three radar points: the fitted multiplier is within 10 % of 1/5 and the thickness within 3 % on average', () => {
    const noSliding = { sliding: { C: 0, m: 3 }, ice: { ...demo.ice, A: 6.8e-24 } };
    const t = truth(noSliding);
    const radar: ObservedPoint[] = [3000, 5500, 7500].map((x) => [x, sampleCells(t.thickness, t.model.grid.spacing, x), 5]);
    const wrongA = { ...t.scenario.ice, A: 5 * 6.8e-24 };
    const unfitted = invertBed(survey(t, { ice: wrongA }), { smoothingMetres: 150 });
    const fitted = invertBed(survey(t, { ice: wrongA, observations: { terminus: t.terminus, thickness: radar } }), { smoothingMetres: 150 });
    const before = errors(t, unfitted.thickness);
    const after = errors(t, fitted.thickness);
    console.log(
      `twin, A x5: multiplier ${fitted.rateFactorMultiplier.toPrecision(3)} (range ${fitted.rateFactorMultiplierRange?.map((v) => v.toPrecision(3)).join('-')}); ` +
        `mean error ${(100 * before.mean).toFixed(1)} % unfitted, ${(100 * after.mean).toFixed(2)} % fitted; radar misfit RMS ${fitted.misfit?.rmsMetres.toFixed(2)} m`,
    );
    expect(before.mean).toBeGreaterThan(0.2); // the wrong A matters without the radar points
    expect(Math.abs(fitted.rateFactorMultiplier / 0.2 - 1)).toBeLessThan(0.1);
    expect(after.mean).toBeLessThan(0.03);
    const [lo, hi] = fitted.rateFactorMultiplierRange!;
    expect(lo).toBeLessThan(fitted.rateFactorMultiplier);
    expect(hi).toBeGreaterThan(fitted.rateFactorMultiplier);
    expect(fitted.thicknessLow[100]).toBeLessThanOrEqual(fitted.thickness[100]);
    expect(fitted.thicknessHigh[100]).toBeGreaterThanOrEqual(fitted.thickness[100]);
  });

  it('the inverted glacier run forward under the same climate stays near steady: volume within 3 % and terminus within 300 m over the first 30 years', () => {
    const t = truth({});
    const result = invertBed(survey(t), { smoothingMetres: 150 });
    const scenario = checkedJson({ ...invertedScenario(survey(t), result), spinup: false });
    const model = createFlowlineModel(scenario);
    const simulation = new FlowlineSimulation(model, model.initialThickness);
    const v0 = simulation.volume();
    let worst = 0;
    let terminusShift = 0;
    const t0 = glacierExtent(model.grid, model.initialThickness).terminus;
    for (let year = 5; year <= 30; year += 5) {
      simulation.advanceTo(year);
      worst = Math.max(worst, Math.abs(simulation.volume() / v0 - 1));
      terminusShift = Math.max(terminusShift, Math.abs(glacierExtent(model.grid, simulation.thickness).terminus - t0));
    }
    console.log(`forward from the inverted bed: volume within ${(100 * worst).toFixed(2)} %, terminus within ${terminusShift} m over 30 years`);
    expect(worst).toBeLessThan(0.03);
    expect(terminusShift).toBeLessThanOrEqual(300);
  });
});
