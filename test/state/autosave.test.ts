/**
 * The debounce on its own, with a clock the test moves by hand and a page that only dispatches
 * events: a save waits for the last change, a flush saves at once (and before it returns), the
 * page going away flushes, and a disposed autosave neither saves nor listens.
 */
import { describe, expect, it } from 'vitest';
import { browserPageEvents, createAutosave, type Clock, type PageTargets } from '../../src/state/autosave';

function manualClock() {
  let time = 0;
  const timers = new Map<number, { at: number; callback: () => void }>();
  let next = 1;
  const clock: Clock = {
    now: () => time,
    setTimeout(callback, ms) {
      timers.set(next, { at: time + ms, callback });
      return next++;
    },
    clearTimeout: (handle) => void timers.delete(handle as number),
  };
  const advance = (ms: number) => {
    time += ms;
    for (const [handle, timer] of [...timers].sort((a, b) => a[1].at - b[1].at)) {
      if (timer.at > time) continue;
      timers.delete(handle);
      timer.callback();
    }
  };
  return { clock, advance, pendingTimers: () => timers.size };
}

function fakePage() {
  const document = Object.assign(new EventTarget(), { visibilityState: 'visible' as DocumentVisibilityState });
  return { window: new EventTarget(), document } satisfies PageTargets;
}

function setUp() {
  const { clock, advance, pendingTimers } = manualClock();
  const page = fakePage();
  let saves = 0;
  const autosave = createAutosave({ save: async () => void saves++, delayMs: 500, clock, page: browserPageEvents(() => page) });
  autosave.start();
  return { autosave, advance, page, pendingTimers, saves: () => saves };
}

describe('autosave', () => {
  it('saves once, the delay after the last of several changes', () => {
    const { autosave, advance, saves } = setUp();
    autosave.schedule();
    advance(300);
    autosave.schedule();
    advance(300);
    expect(saves()).toBe(0);
    expect(autosave.pending()).toBe(true);
    advance(200);
    expect(saves()).toBe(1);
    expect(autosave.pending()).toBe(false);
  });

  it('a flush saves a waiting change before it returns, and nothing when none waits', () => {
    const { autosave, advance, saves, pendingTimers } = setUp();
    void autosave.flush();
    expect(saves()).toBe(0);
    autosave.schedule();
    void autosave.flush();
    expect(saves()).toBe(1);
    expect(pendingTimers()).toBe(0);
    advance(1000);
    expect(saves()).toBe(1);
  });

  it('flushes on pagehide and on hiding, not on showing', () => {
    const { autosave, page, saves } = setUp();
    autosave.schedule();
    page.document.dispatchEvent(new Event('visibilitychange'));
    expect(saves()).toBe(0);
    page.window.dispatchEvent(new Event('pagehide'));
    expect(saves()).toBe(1);
    autosave.schedule();
    page.document.visibilityState = 'hidden';
    page.document.dispatchEvent(new Event('visibilitychange'));
    expect(saves()).toBe(2);
  });

  it('once disposed, forgets the waiting change and stops listening to the page', () => {
    const { autosave, advance, page, saves } = setUp();
    autosave.schedule();
    autosave.dispose();
    advance(1000);
    autosave.schedule();
    autosave.dispose();
    page.window.dispatchEvent(new Event('pagehide'));
    expect(saves()).toBe(0);
  });
});
