import { describe, expect, it } from 'vitest';
import { strokeToProfile } from '../../../src/ui/edit/geometry/strokeToProfile';
import type { Point } from '../../../src/model/scenario';

describe('strokeToProfile', () => {
  it('clips to the domain, skips backtracking and keeps x strictly increasing', () => {
    const stroke: Point[] = [[-300, 2000], [100, 1990], [400, 1900], [350, 1950], [800, 1800], [12_500, 1500]];
    const out = strokeToProfile(stroke, 12_000, 0.001);
    expect(out[0][0]).toBe(0);
    expect(out[out.length - 1][0]).toBe(12_000);
    expect(out.map(([x]) => x)).not.toContain(350);
    for (let i = 1; i < out.length; i++) expect(out[i][0]).toBeGreaterThan(out[i - 1][0]);
  });

  it('turns a click (one sample) into fewer than two points', () => {
    expect(strokeToProfile([[500, 2000]], 12_000, 5)).toHaveLength(1);
  });
});
