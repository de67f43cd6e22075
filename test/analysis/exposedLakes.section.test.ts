/**
 * Lakes in a valley section: the water fills the section, not a box over the floor. A cell's
 * water of depth d above a floor w0 has the area of the section filled to d (elementary geometry):
 *   trapezoid, flanks together widening by k d:  (w0 + (w0 + k d)) / 2 x d   (mean of the two parallel sides)
 *   parabola on a floor of zero width:             2/3 d w_s, w_s = sqrt(p d)  (Archimedes' parabolic segment)
 * Fixed walls keep the old sum d w dx to the last bit. The model's callers (lakes.json's grid, the
 * figures' grid, the grid the worker sends the browser) all carry the section.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { exposedLakes, exposedLakesOverTime, fillLevels } from '../../src/model/analysis/exposedLakes';
import { runGrid } from '../../src/model/diagnostics';
import type { FlowlineGrid } from '../../src/model/flowlineModel';
import type { ValleySection } from '../../src/model/physics/valleySection';
import { runScenario } from '../../src/model/runScenario';
import { figureRunFromReport } from '../../src/figures/figureRun';
import { lakesAt } from '../../src/figures/lakesMarkup';
import { createRunDriver } from '../../src/worker/runDriver';
import type { FromWorker } from '../../src/worker/protocol';
import { checked } from '../helpers/checkedScenario';

const DX = 10;

/** 10 m cells over `bed`, floor width `floor`, optionally a valley section. */
function grid(bed: number[], floor: number | number[], section?: ValleySection): FlowlineGrid {
  const n = bed.length;
  const widths = typeof floor === 'number' ? new Array<number>(n).fill(floor) : floor;
  return {
    cellCount: n,
    spacing: DX,
    x: Float64Array.from(bed, (_, i) => (i + 0.5) * DX),
    bed: Float64Array.from(bed),
    bedBeyondEnd: bed[n - 1],
    widthAtCells: Float64Array.from(widths),
    widthAtFaces: Float64Array.from([...widths, widths[n - 1]]),
    ...(section ? { section } : {}),
  };
}
const iceFree = (n: number) => new Float64Array(n);

// A single basin: fills to its 95 m lip, depths 5, 15, 10 m in cells 1-3 (hand-worked in exposedLakes.test.ts).
const BASIN = [100, 90, 80, 85, 95, 70, 60];
const DEPTHS = [5, 15, 10];

describe('lake volume in a valley section, hand-worked basin', () => {
  it('trapezoid, floor 20 m, widening 300 m (k = 3): sum of (w0 + (w0 + k d))/2 d dx = 11,250 m^3, against 6,000 m^3 over the floor alone', () => {
    const k = 3;
    const trapezoids = DEPTHS.reduce((sum, d) => sum + ((20 + (20 + k * d)) / 2) * d * DX, 0);
    // By hand: 10 x (20 x 30 + 1.5 x (25 + 225 + 100)) = 10 x (600 + 525).
    expect(trapezoids).toBe(11250);
    const [lake] = exposedLakes(grid(BASIN, 20, { shape: 'trapezoidal', widening: 300 }), iceFree(7));
    expect(lake.volume).toBeCloseTo(11250, 9);
    expect(exposedLakes(grid(BASIN, 20), iceFree(7))[0].volume).toBe(6000);
    // Depth, level and extent are the bed's alone: the section changes only the volume.
    const { volume: _v, ...rest } = lake;
    const { volume: _w, ...fixedRest } = exposedLakes(grid(BASIN, 20), iceFree(7))[0];
    expect(rest).toEqual(fixedRest);
  });

  it("parabola on a zero-width floor, widening 300 m (p = 900 m): sum of 2/3 d sqrt(p d) dx (Archimedes), to 1e-12", () => {
    const p = 300 ** 2 / 100;
    const archimedes = DEPTHS.reduce((sum, d) => sum + (2 / 3) * d * Math.sqrt(p * d) * DX, 0);
    const [lake] = exposedLakes(grid(BASIN, 0, { shape: 'parabolic', widening: 300 }), iceFree(7));
    expect(lake.volume / archimedes - 1).toBeCloseTo(0, 12);
  });

  it('fixed walls and a rectangular section: the old sum of d w dx, bit for bit, on uneven widths and depths', () => {
    const bed = [100, 97.3, 91.17, 94.9, 88.123, 96.5, 99.01, 60];
    const widths = [310.7, 290.3, 271.9, 255.55, 240.1, 233.3, 219.7, 200];
    const level = fillLevels(bed);
    let old = 0;
    // Cells 1-5 lie below the 99.01 m lip (cell 6 is the lip itself).
    for (let i = 1; i <= 5; i++) old += (level[i] - bed[i]) * widths[i] * DX;
    const [fixed] = exposedLakes(grid(bed, widths), iceFree(8));
    const [rectangular] = exposedLakes(grid(bed, widths, { shape: 'rectangular', widening: 300 }), iceFree(8));
    expect([fixed.start, fixed.end, fixed.waterLevel]).toEqual([10, 60, 99.01]);
    expect(fixed.volume).toBe(old);
    expect(rectangular.volume).toBe(old);
  });
});

describe('the demo valley in a trapezoidal section after a +3 K warming: every caller sees the section', () => {
  const demo = JSON.parse(readFileSync(new URL('../../examples/demo-valley.json', import.meta.url), 'utf8'));
  const section: ValleySection = { shape: 'trapezoidal', widening: 300 };
  const scenario = checked({ ...demo, section, warming: [[0, 0], [80, 3]] });
  const report = runScenario(scenario);
  const { grid: modelGrid } = report.model;
  const last = report.frames[report.frames.length - 1];
  const inBasin = (l: { start: number; end: number }) => l.start > 5000 && l.end < 7000;

  it('the riegel lake holds the sum of the trapezoids over its cells (to 1e-12), more than over the floor alone', () => {
    const lake = exposedLakesOverTime(modelGrid, report.frames).at(-1)!.lakes.find(inBasin);
    expect(lake).toBeDefined();
    let trapezoids = 0;
    let floorOnly = 0;
    for (let i = 0; i < modelGrid.cellCount; i++) {
      const x = modelGrid.x[i];
      if (x < lake!.start || x > lake!.end) continue;
      const d = lake!.waterLevel - modelGrid.bed[i];
      const w0 = modelGrid.widthAtCells[i];
      trapezoids += ((w0 + (w0 + 3 * d)) / 2) * d * modelGrid.spacing;
      floorOnly += w0 * d * modelGrid.spacing;
    }
    expect(lake!.volume / trapezoids - 1).toBeCloseTo(0, 12);
    expect(lake!.volume).toBeGreaterThan(1.01 * floorOnly);
  });

  it("the figures' grid (command line) and the run grid (browser) give the model's lakes, volume included", () => {
    const expected = exposedLakes(modelGrid, last.fields.thickness);
    expect(expected.some(inBasin)).toBe(true);
    expect(lakesAt(figureRunFromReport(report, scenario, 'test').grid, last)).toEqual(expected);
    expect(lakesAt(runGrid(report.model), last)).toEqual(expected);
  });

  it("the worker's 'started' message carries the section to the browser", () => {
    const received: FromWorker[] = [];
    const driver = createRunDriver(
      (message, transfer) => received.push(structuredClone(message, { transfer })),
      () => {},
    );
    driver.handle({ type: 'start', runId: 1, scenario: checked({ ...scenario, spinup: false, run: { years: 1, outputEvery: 1 } }) });
    const started = received.find((m) => m.type === 'started');
    expect(started?.grid.section).toEqual(section);
    driver.handle({ type: 'stop', runId: 1 });
  });
});
