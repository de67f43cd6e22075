import { describe, expect, it } from 'vitest';
import { generateValley, STEP_WIDTH_M, valleyElevation } from '../../../src/ui/edit/geometry/generateValley';
import { piecewiseLinear } from '../../../src/model/piecewiseLinear';

const base = { headElevation: 3200, footElevation: 1800, length: 15_000, concavity: 1 };

describe('generateValley', () => {
  it('runs from the head to the foot elevation over [0, length] with x strictly increasing', () => {
    const bed = generateValley({ ...base, concavity: 2 });
    expect(bed[0]).toEqual([0, 3200]);
    expect(bed[bed.length - 1]).toEqual([15_000, 1800]);
    for (let i = 1; i < bed.length; i++) expect(bed[i][0]).toBeGreaterThan(bed[i - 1][0]);
  });

  it('is straight for concavity 1 and concave up (below the chord) for concavity 2', () => {
    expect(generateValley(base)).toHaveLength(2);
    const mid = piecewiseLinear(generateValley({ ...base, concavity: 2 }))(7500);
    // (1 - 1/2)^2 = 1/4 of the fall remains at mid-valley: 1800 + 1400/4 = 2150 m.
    expect(mid).toBeCloseTo(2150, 0);
  });

  it('digs an overdeepening with a reverse slope and the asked depth at its centre', () => {
    const od = { position: 8000, depth: 150, length: 3000 };
    const bed = piecewiseLinear(generateValley({ ...base, overdeepening: od }));
    const smooth = piecewiseLinear(generateValley(base));
    expect(smooth(8000) - bed(8000)).toBeCloseTo(150, 0);
    // The bed rises down-valley somewhere between the centre and the basin's lower end.
    expect(bed(9200)).toBeGreaterThan(bed(8300));
  });

  it('drops by the step height over the step width, keeping head and foot', () => {
    const o = { ...base, step: { position: 6000, height: 120 } };
    const before = valleyElevation(o, 6000 - STEP_WIDTH_M / 2);
    const after = valleyElevation(o, 6000 + STEP_WIDTH_M / 2);
    // The step's drop plus the smooth fall over the step width, less the compensating tilt.
    expect(before - after).toBeCloseTo(120 + (1400 / 15_000 - 120 / 15_000) * STEP_WIDTH_M, 3);
    const bed = generateValley(o);
    expect(bed[0][1]).toBe(3200);
    expect(bed[bed.length - 1][1]).toBe(1800);
  });
});
