import { describe, expect, it } from 'vitest';
import { roundInterval, snapshotYears } from '../../src/figures/snapshotYears';

describe('snapshot years', () => {
  const every5 = Array.from({ length: 61 }, (_, k) => 5 * k); // outputs 0, 5, ..., 300

  it('picks a round interval giving at most seven snapshots (hand-worked: 300 a / 6 = 50)', () => {
    expect(roundInterval(300)).toBe(50);
    expect(roundInterval(50)).toBe(10);
    expect(roundInterval(1000)).toBe(200);
    expect(snapshotYears(every5)).toEqual([0, 50, 100, 150, 200, 250, 300]);
  });

  it('takes a chosen interval, always ends at the last output, and uses output times only', () => {
    expect(snapshotYears(every5, 120)).toEqual([0, 120, 240, 300]);
    expect(snapshotYears([0, 15, 30, 45, 50], 20)).toEqual([0, 15, 45, 50]);
  });

  it('never gives more than twelve snapshots', () => {
    expect(snapshotYears(every5, 1).length).toBe(12);
  });
});
