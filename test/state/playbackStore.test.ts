import { beforeEach, describe, expect, it } from 'vitest';
import { setAnimationSource, usePlaybackStore } from '../../src/state/playbackStore';
import { useRunStore } from '../../src/state/runStore';
import { loadFinishedRun } from './runFixtures';
import { resetStores } from '../helpers/resetStores';

/** A hand-cranked animation clock. */
let callbacks: ((now: number) => void)[] = [];
setAnimationSource({
  request: (cb) => callbacks.push(cb),
  cancel: () => void (callbacks = []),
});
function advanceClock(now: number) {
  const due = callbacks;
  callbacks = [];
  for (const cb of due) cb(now);
}

const playback = () => usePlaybackStore.getState();

beforeEach(() => {
  callbacks = [];
  resetStores();
});

describe('playback store', () => {
  it('follows the newest frame while a run streams in', () => {
    loadFinishedRun();
    expect(playback().index).toBe(4);
    expect(playback().follow).toBe(true);
  });

  it('seeks within the frames and stops following until the last frame is chosen again', () => {
    loadFinishedRun();
    playback().seek(1);
    expect(playback().index).toBe(1);
    expect(playback().follow).toBe(false);
    playback().seek(99);
    expect(playback().index).toBe(4);
    expect(playback().follow).toBe(true);
    playback().seek(-3);
    expect(playback().index).toBe(0);
  });

  it('plays at the chosen outputs per second and stops at the end', () => {
    loadFinishedRun();
    playback().seek(0);
    playback().setFps(10);
    playback().play();
    expect(playback().playing).toBe(true);
    advanceClock(1000);
    advanceClock(1100); // 0.1 s at 10 per second: one output on
    expect(playback().index).toBe(1);
    advanceClock(1300); // two more
    expect(playback().index).toBe(3);
    advanceClock(2000);
    expect(playback().index).toBe(4);
    expect(playback().playing).toBe(false);
    expect(callbacks).toHaveLength(0);
  });

  it('plays again from the start when at the end, and pauses on request', () => {
    loadFinishedRun();
    playback().toggle();
    expect(playback().index).toBe(0);
    expect(playback().playing).toBe(true);
    playback().toggle();
    expect(playback().playing).toBe(false);
    expect(callbacks).toHaveLength(0);
  });

  it('starts again from the first frame of the next run, following it', () => {
    loadFinishedRun();
    playback().seek(2);
    expect(playback().follow).toBe(false);
    loadFinishedRun();
    expect(playback().follow).toBe(true);
    expect(playback().index).toBe(4);
  });

  it('shows a restored model year once the run reaches it', () => {
    playback().setPendingTime(10);
    loadFinishedRun();
    expect(useRunStore.getState().frames[playback().index].time).toBe(10);
    expect(playback().pendingTime).toBeNull();
  });
});
