import { describe, expect, it } from 'vitest';
import { sensitivityCurve, warmingLadder } from '../../src/model/analysis/sensitivityCurve';
import { createFlowlineModel } from '../../src/model/createFlowlineModel';
import { testValley } from './valley';

describe('steady-state sensitivity curve', () => {
  const model = createFlowlineModel(testValley());
  const warmings = warmingLadder(-1, 2, 0.5);
  const curve = sensitivityCurve(model, model.initialThickness, warmings);
  const up = curve.filter((p) => p.branch === 'up');
  const down = curve.filter((p) => p.branch === 'down');

  it('visits every warming going up and every one but the top coming down', () => {
    console.info(curve.map((p) => `${p.branch} ${p.warming} K: terminus ${p.terminus} m, volume ${p.volume.toExponential(3)} m^3`).join('\n'));
    expect(warmingLadder(-1, 2, 0.5)).toEqual([-1, -0.5, 0, 0.5, 1, 1.5, 2]);
    expect(up.map((p) => p.warming)).toEqual(warmings);
    expect(down.map((p) => p.warming)).toEqual([...warmings].reverse().slice(1));
    expect(curve.every((p) => p.converged)).toBe(true);
  });

  it('steady volume falls and the terminus retreats (or stays) as the held warming rises, on both branches', () => {
    for (let k = 1; k < up.length; k++) {
      expect(up[k].volume).toBeLessThan(up[k - 1].volume);
      expect(up[k].length).toBeLessThanOrEqual(up[k - 1].length);
    }
    for (let k = 1; k < down.length; k++) {
      expect(down[k].volume).toBeGreaterThan(down[k - 1].volume);
      expect(down[k].length).toBeGreaterThanOrEqual(down[k - 1].length);
    }
  });
});

describe('steady-state sensitivity curve with two steady states', () => {
  // A high plateau at 3000 m near the ELA (2950 m at 0 K, +100 m per K), then a steep step down.
  // Ice on the plateau lifts its surface above the ELA and keeps itself (the mass-balance-
  // elevation feedback); bare plateau below the ELA never starts a glacier. Between the two
  // thresholds both states are steady: the textbook small-ice-cap hysteresis (e.g. Weertman
  // 1961, J. Geophys. Res. 66(11); cited from memory).
  const scenario = testValley({
    bed: [[0, 3000], [3000, 3000], [3600, 2600], [6000, 2300]],
    width: [[0, 1000], [6000, 1000]],
    massBalance: { model: 'linear', ela: 2950, ablationGradient: 0.006, maxAccumulation: 1.5, elaSensitivity: 100 },
  });
  const model = createFlowlineModel(scenario);
  const curve = sensitivityCurve(model, model.initialThickness, warmingLadder(-1, 2.5, 0.25));
  const at = (branch: 'up' | 'down', warming: number) => curve.find((p) => p.branch === branch && p.warming === warming)!;

  it('keeps a glacier going up and stays ice-free coming down over a range of warmings; at -1 to 0 K both branches end within 100 m (one cell)', () => {
    console.info(curve.map((p) => `${p.branch} ${p.warming} K: terminus ${p.terminus} m, volume ${p.volume.toExponential(3)} m^3`).join('\n'));
    expect(curve.every((p) => p.converged)).toBe(true);
    // Above the ELA at the plateau (0.5 K: ELA 3000 m) a glacier that is there survives ...
    const bistable = curve.filter((p) => p.branch === 'up' && p.warming >= 0.5 && p.volume > 0).map((p) => p.warming);
    expect(bistable.length).toBeGreaterThan(0);
    for (const w of bistable) {
      // ... but none comes back once it has gone.
      expect(at('down', w).volume, `${w} K`).toBe(0);
    }
    // At the warmest step the ice is gone on both branches; well below the plateau's ELA both
    // branches hold the same glacier (to within a cell of terminus).
    expect(at('up', 2.5).volume).toBe(0);
    for (const w of [-1, -0.5, 0]) {
      expect(Math.abs(at('up', w).terminus - at('down', w).terminus), `${w} K`).toBeLessThanOrEqual(100);
    }
  });
});
