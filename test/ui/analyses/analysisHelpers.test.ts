import { describe, expect, it } from 'vitest';
import type { CalibrationResult } from '../../../src/model/analysis/calibrateTerminus';
import type { SteadyPoint } from '../../../src/model/analysis/sensitivityCurve';
import { calibratedScenario, formatParameter, valueToApply } from '../../../src/ui/analyses/calibrationApply';
import { compareBranches } from '../../../src/ui/analyses/sensitivityBranches';
import { testValley } from '../../analysis/valley';

const point = (branch: 'up' | 'down', warming: number, terminus: number, volume: number, converged = true): SteadyPoint => ({
  warming,
  branch,
  terminus,
  length: Number.isNaN(terminus) ? 0 : terminus,
  volume,
  years: 100,
  converged,
});

describe('comparing the sensitivity branches', () => {
  it('treats one grid cell as agreement and flags more, or ice on one branch only', () => {
    const points = [
      point('up', 0, 6000, 10),
      point('up', 1, 5000, 8),
      point('up', 2, 4000, 5),
      point('up', 3, Number.NaN, 0),
      point('down', 2, Number.NaN, 0),
      point('down', 1, 4900, 7.2),
      point('down', 0, 6000, 10, false),
    ];
    const c = compareBranches(points, 100, 6000);
    expect(c.rows.map((r) => [r.warming, r.down?.warming])).toEqual([[0, 0], [1, 1], [2, 2], [3, undefined]]);
    // 100 m at +1 K is one cell: agreement; at +2 K ice on the up branch only.
    expect(c.differAt).toEqual([2]);
    expect(c.largestTerminusDifference).toEqual({ metres: Infinity, warming: 2 });
    // Volumes: |8 - 7.2| / 8 = 10 % at +1 K; 100 % at +2 K.
    expect(c.largestVolumeDifference).toEqual({ share: 1, warming: 2 });
    // The up branch reaches the domain end (6000 m) at 0 K.
    expect(c.atDomainEnd).toEqual([0]);
    expect(c.unconverged).toBe(1);
  });
});

describe('applying a calibration', () => {
  const result = (parameter: number, band: [number, number] | undefined): CalibrationResult => ({
    parameterName: 'ela',
    unit: 'm a.s.l.',
    parameter,
    terminus: 4600,
    matched: band !== undefined,
    iterations: 20,
    matchBand: band,
    trials: [],
    scenario: testValley(),
  });

  it('rounds the found value to centimetres when that stays inside the matching band', () => {
    expect(valueToApply(result(2872.1449, [2868.95, 2875.34]))).toBe(2872.14);
    // A band narrower than the rounding: the value is kept as found.
    expect(valueToApply(result(2872.1449, [2872.1446, 2872.1452]))).toBe(2872.1449);
    expect(formatParameter('temperature-offset', -0.4, 'K')).toBe('\u22120.400 K');
  });

  it('sets the ELA of the scenario it was made from and labels the edit', () => {
    const edit = calibratedScenario(testValley(), result(2872.1449, [2868.95, 2875.34]), 4600);
    expect(edit.scenario.massBalance).toMatchObject({ model: 'linear', ela: 2872.14 });
    expect({ ...edit.scenario, massBalance: testValley().massBalance }).toEqual(testValley());
    expect(edit.label).toBe('ELA calibrated to a terminus at 4.60 km');
  });
});
