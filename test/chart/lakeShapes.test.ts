import { describe, expect, it } from 'vitest';
import type { ExposedLake } from '../../src/model/analysis/exposedLakes';
import { formatLakeVolume, lakeLabel, lakeShapes } from '../../src/chart/lakeShapes';
import { lakeSummary } from '../../src/ui/results/lakeSummary';

// 10 m cells, centres at 5, 15, ... ; the hand-worked basin of test/analysis/exposedLakes.test.ts:
// bed 100, 90, 80, 85, 95, 70, 60 holds water at 95 m over cells 1-3 (depths 5, 15, 10 m).
const x = [5, 15, 25, 35, 45, 55, 65];
const bed = [100, 90, 80, 85, 95, 70, 60];
const lake: ExposedLake = { start: 10, end: 40, length: 30, waterLevel: 95, maxDepth: 15, deepestAt: 25, volume: 600, touchesIce: false };
// Identity scales (metres and metres a.s.l. as pixels) keep the expected points readable; y is
// flipped as on screen (higher elevation, smaller y).
const px = (m: number) => m;
const pz = (z: number) => 200 - z;

describe('lake shapes on the long profile', () => {
  it('spans from where the bed line rises through the water level on either side, over the bed of the lake cells', () => {
    const [shape] = lakeShapes([lake], x, bed, px, pz, false);
    // Up-valley: bed 100 at x 5 down to 90 at x 15 crosses 95 at x = 10. Down-valley: 85 at x 35
    // up to 95 at x 45 reaches 95 at x = 45.
    expect(shape.surface).toEqual([
      [10, 105],
      [45, 105],
    ]);
    expect(shape.polygon).toEqual([
      [10, 105],
      [45, 105],
      [35, 115],
      [25, 120],
      [15, 110],
    ]);
    expect(shape.label).toEqual(['Lake, up to 15 m deep', '≈ 0.0006 × 10⁶ m³']);
    expect(shape.labelAt).toEqual([27.5, 91]);
  });

  it('stops at the lake edge where the depression runs on under the ice', () => {
    const underIce: ExposedLake = { ...lake, start: 30, length: 10, maxDepth: 10, deepestAt: 35, volume: 200, touchesIce: true };
    // Cell 2 (bed 80 < 95) is ice-covered, so the water ends at the lake's start face, x = 30.
    const [shape] = lakeShapes([underIce], x, bed, px, pz, false);
    expect(shape.surface[0]).toEqual([30, 105]);
    expect(shape.polygon.slice(2)).toEqual([[35, 115]]);
  });

  it('staggers the labels of neighbouring lakes', () => {
    const shapes = lakeShapes([lake, { ...lake }], x, bed, px, pz, false);
    expect(shapes[1].labelAt[1] - shapes[0].labelAt[1]).toBe(-40);
  });

  it('writes volumes in 10⁶ m³ (or per metre of width) to two significant figures', () => {
    expect(formatLakeVolume(39_860_742, false)).toBe('≈ 40 × 10⁶ m³');
    expect(formatLakeVolume(338_153, false)).toBe('≈ 0.34 × 10⁶ m³');
    expect(formatLakeVolume(1_234_567_890, false)).toBe('≈ 1235 × 10⁶ m³');
    expect(formatLakeVolume(48_000, true)).toBe('≈ 48 × 10³ m³ per m of width');
    expect(lakeLabel({ ...lake, maxDepth: 56.92 }, false)[0]).toBe('Lake, up to 57 m deep');
  });

  it('sums the lakes up in one line for the numbers panel', () => {
    expect(lakeSummary([], false)).toBe('none');
    const demoLake: ExposedLake = { start: 5300, end: 6600, length: 1300, waterLevel: 2469.06, maxDepth: 56.92, deepestAt: 5925, volume: 39_860_742, touchesIce: false };
    expect(lakeSummary([demoLake], false)).toBe('1, up to 57 m deep at 5.92 km, 1.30 km long, ≈ 40 × 10⁶ m³');
    expect(lakeSummary([demoLake, { ...demoLake, maxDepth: 5.5, volume: 338_153 }], false)).toBe('2, deepest 57 m at 5.92 km, together ≈ 40 × 10⁶ m³');
  });
});
