import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { exposedLakes, exposedLakesOverTime, fillLevels } from '../../src/model/analysis/exposedLakes';
import { runScenario } from '../../src/model/runScenario';
import type { FlowlineGrid } from '../../src/model/flowlineModel';

/** A grid of 10 m cells with the given bed and a constant width of 2 m. */
function grid(bed: number[]): FlowlineGrid {
  const n = bed.length;
  return {
    cellCount: n,
    spacing: 10,
    x: Float64Array.from(bed, (_, i) => (i + 0.5) * 10),
    bed: Float64Array.from(bed),
    bedBeyondEnd: bed[n - 1],
    widthAtCells: new Float64Array(n).fill(2),
    widthAtFaces: new Float64Array(n + 1).fill(2),
  };
}
const iceFree = (n: number) => new Float64Array(n);

// Every expected value below is worked by hand from W_i = min(max of bed up to i, max from i on).
describe('fillLevels and exposedLakes on hand-worked profiles', () => {
  it('a single basin fills to its down-valley lip', () => {
    const bed = [100, 90, 80, 85, 95, 70, 60];
    // Maxima from the head: 100 everywhere; from the end: 100, 95, 95, 95, 95, 70, 60.
    expect(Array.from(fillLevels(bed))).toEqual([100, 95, 95, 95, 95, 70, 60]);
    const lakes = exposedLakes(grid(bed), iceFree(7));
    expect(lakes).toEqual([
      // Depths 5, 15, 10 m in cells 1-3; volume (5 + 15 + 10) m x 2 m x 10 m = 600 m^3.
      { start: 10, end: 40, length: 30, waterLevel: 95, maxDepth: 15, deepestAt: 25, volume: 600, touchesIce: false },
    ]);
  });

  it('nested basins under a lower outer lip make one lake at the outer lip', () => {
    // Two hollows (80, 70) split by a 90 m sill, inside a basin closed by the 95 m lip.
    const bed = [100, 80, 90, 70, 95, 60];
    expect(Array.from(fillLevels(bed))).toEqual([100, 95, 95, 95, 95, 60]);
    const lakes = exposedLakes(grid(bed), iceFree(6));
    expect(lakes).toHaveLength(1);
    expect(lakes[0]).toMatchObject({ start: 10, end: 40, waterLevel: 95, maxDepth: 25, deepestAt: 35 });
    expect(lakes[0].volume).toBe((15 + 5 + 25) * 2 * 10);
  });

  it('a sill higher than the lip below it keeps two lakes at different levels', () => {
    const bed = [100, 80, 96, 70, 95, 60];
    const lakes = exposedLakes(grid(bed), iceFree(6));
    expect(lakes.map((l) => [l.start, l.end, l.waterLevel, l.maxDepth])).toEqual([
      [10, 20, 96, 16],
      [30, 40, 95, 25],
    ]);
  });

  it('a basin open at the down-valley end of the domain drains: no lake', () => {
    expect(exposedLakes(grid([100, 90, 80, 75, 70]), iceFree(5))).toEqual([]);
    // A closed hollow up-valley still holds water; the falling reach after it drains off the end.
    const lakes = exposedLakes(grid([100, 90, 95, 85, 80, 78]), iceFree(6));
    expect(lakes.map((l) => [l.start, l.end, l.waterLevel, l.maxDepth])).toEqual([[10, 20, 95, 5]]);
  });

  it('only the ice-free part of a depression counts, and it is marked as touching the ice', () => {
    const bed = [100, 90, 80, 85, 95, 70, 60];
    const thickness = Float64Array.from([50, 40, 30, 0, 0, 0, 0]);
    expect(exposedLakes(grid(bed), thickness)).toEqual([
      { start: 30, end: 40, length: 10, waterLevel: 95, maxDepth: 10, deepestAt: 35, volume: 200, touchesIce: true },
    ]);
  });
});

describe('exposedLakes on the demo valley after a +3 K warming', () => {
  it('finds the overdeepening behind the riegel once the ice has left it, filled to the riegel (hand-worked level and depth within 5e-10 m, extent exact)', () => {
    const demo = JSON.parse(readFileSync(new URL('../../examples/demo-valley.json', import.meta.url), 'utf8'));
    const report = runScenario({ ...demo, warming: [[0, 0], [80, 3]] });
    const series = exposedLakesOverTime(report.model.grid, report.frames);
    // At year 0 the spun-up glacier covers the overdeepening.
    expect(series[0].lakes.filter((l) => l.start > 5000 && l.end < 7000)).toEqual([]);
    const last = series[series.length - 1].lakes.find((l) => l.start > 5000 && l.end < 7000);
    // Worked by hand from the demo bed on 50 m cells: the riegel's highest cell is centred at
    // 6625 m, bed 2470 - 30 x 25/800 = 2469.0625 m; the deepest at 5925 m, bed 2410 + 60 x 25/700
    // = 2412.142857 m; the bed first drops below the lip after 5309 m (cell face 5300 m).
    expect(last).toBeDefined();
    expect(last!.waterLevel).toBeCloseTo(2469.0625, 9);
    expect(last!.maxDepth).toBeCloseTo(2469.0625 - (2410 + (60 * 25) / 700), 9);
    expect(last!.deepestAt).toBe(5925);
    expect([last!.start, last!.end]).toEqual([5300, 6600]);
    expect(last!.touchesIce).toBe(false);
    const firstYear = series.find((s) => s.lakes.some((l) => l.start > 5000 && l.end < 7000))!.time;
    console.info(`demo +3 K: overdeepening lake first exposed by year ${firstYear}; at the end ${last!.volume.toExponential(3)} m^3, ${last!.length} m long`);
  });
});
