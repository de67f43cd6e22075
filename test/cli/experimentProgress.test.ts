/** The experiment's progress line on a terminal, as a pure function: done, failed, time left. */
import { describe, expect, it } from 'vitest';
import { durationText, experimentProgressText } from '../../src/cli/progress';

describe('experiment progress text', () => {
  it('says members done and failed, and estimates the time left from the members this run finished', () => {
    expect(experimentProgressText({ done: 0, failed: 0, total: 20, ranHere: 0, elapsedMs: 300 })).toBe(
      'experiment: 0 of 20 members done, 0 failed, estimating the time left',
    );
    // 4 members in 10 s: 2.5 s each, 16 to go: 40 s.
    expect(experimentProgressText({ done: 4, failed: 1, total: 20, ranHere: 4, elapsedMs: 10_000 })).toBe(
      'experiment: 4 of 20 members done, 1 failed, about 40 s left',
    );
    // Resumed: 600 were done before; this run did 10 in 30 s (3 s each); 390 to go: 1,170 s.
    expect(experimentProgressText({ done: 610, failed: 0, total: 1000, ranHere: 10, elapsedMs: 30_000 })).toBe(
      'experiment: 610 of 1000 members done, 0 failed, about 19 min 30 s left',
    );
    expect(experimentProgressText({ done: 20, failed: 2, total: 20, ranHere: 20, elapsedMs: 65_000 })).toBe(
      'experiment: 20 of 20 members done, 2 failed, took 1 min 05 s',
    );
  });
  it('writes durations in seconds, minutes or hours', () => {
    expect(durationText(0)).toBe('0 s');
    expect(durationText(59_400)).toBe('59 s');
    expect(durationText(60_000)).toBe('1 min 00 s');
    expect(durationText(3_599_000)).toBe('59 min 59 s');
    expect(durationText(3_600_000 * 2 + 7 * 60_000)).toBe('2 h 07 min');
  });
});
