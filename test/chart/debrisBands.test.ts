import { describe, expect, it } from 'vitest';
import { debrisBandLabel, debrisBands } from '../../src/chart/debrisBands';

describe('debrisBands', () => {
  const samples = { x: [50, 150, 250, 350, 450], surface: [3000, 2950, 2900, 2850, 2800], thickness: [100, 80, 60, 0, 0] };
  const identity = (v: number) => v;
  it('follows the ice surface where there is ice and debris, widened to cell edges, with the thickest debris (hand-worked)', () => {
    const bands = debrisBands([[100, 0], [300, 0.4]], samples, identity, identity);
    expect(bands).toHaveLength(1);
    expect(bands[0].line).toEqual([[100, 2950], [150, 2950], [250, 2900], [300, 2900]]);
    expect(bands[0].maxThickness).toBeCloseTo(0.3, 12);
    expect(debrisBandLabel(bands[0])).toBe('Debris cover, up to 0.3 m thick, 0.1–0.3 km');
  });
  it('draws nothing without debris', () => {
    expect(debrisBands(undefined, samples, identity, identity)).toEqual([]);
    expect(debrisBands([[0, 0]], samples, identity, identity)).toEqual([]);
  });
});
