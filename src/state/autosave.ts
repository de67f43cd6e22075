/**
 * Debounced saving: a change asks for a save, which happens `delayMs` after the last change; a
 * flush saves a pending change at once. When the page may be going away (hidden, or pagehide)
 * the pending change is flushed, so an edit made just before the tab is closed is kept.
 */

/** Timers and the time of day; tests pass fake ones. */
export interface Clock {
  now(): number;
  setTimeout(callback: () => void, ms: number): unknown;
  clearTimeout(handle: unknown): void;
}

/** The global timers, looked up at each call (so test fake timers installed later apply). */
export const systemClock: Clock = {
  now: () => Date.now(),
  setTimeout: (callback, ms) => setTimeout(callback, ms),
  clearTimeout: (handle) => clearTimeout(handle as ReturnType<typeof setTimeout>),
};

/** Tells when the page may be about to go away; tests pass a fake. */
export interface PageEvents {
  /** Calls `listener` when the page is hidden or being left; returns the way to stop. */
  onLeave(listener: () => void): () => void;
}

/** The targets the browser's page events come from; tests pass fake EventTargets. */
export interface PageTargets {
  window: Pick<EventTarget, 'addEventListener' | 'removeEventListener'>;
  document: Pick<EventTarget, 'addEventListener' | 'removeEventListener'> & { readonly visibilityState: string };
}

/**
 * The browser's: visibilitychange to hidden (comes first when a tab is closed or left, and leaves
 * more time) and pagehide (closing, navigating away, going into the back-forward cache).
 * The targets are looked up when listening starts, not when this is called.
 */
export function browserPageEvents(targets: () => PageTargets = () => ({ window, document })): PageEvents {
  return {
    onLeave(listener) {
      const { window: win, document: doc } = targets();
      const onHidden = () => {
        if (doc.visibilityState === 'hidden') listener();
      };
      win.addEventListener('pagehide', listener);
      doc.addEventListener('visibilitychange', onHidden);
      return () => {
        win.removeEventListener('pagehide', listener);
        doc.removeEventListener('visibilitychange', onHidden);
      };
    },
  };
}

export interface Autosave {
  /** Starts listening for the page going away (once; not before, so nothing is touched at import). */
  start(): void;
  /** A change was made: save `delayMs` after the last one. */
  schedule(): void;
  /** Forgets a pending save. */
  cancel(): void;
  /** Whether a change waits to be saved. */
  pending(): boolean;
  /** Saves a pending change now (nothing when none waits). */
  flush(): Promise<void>;
  /** Stops listening to the page and forgets a pending save. */
  dispose(): void;
}

export interface AutosaveOptions {
  /** Writes the current state; called by the timer, a flush, or the page going away. */
  save: () => Promise<void>;
  delayMs: number;
  clock?: Clock;
  /** Where to hear that the page may be going away; null: nowhere (a flush is then up to the caller). */
  page?: PageEvents | null;
}

export function createAutosave({ save, delayMs, clock = systemClock, page = null }: AutosaveOptions): Autosave {
  let timer: unknown;
  let waiting = false;

  const cancel = () => {
    if (waiting) clock.clearTimeout(timer);
    waiting = false;
    timer = undefined;
  };

  // The save is started before flush returns: a pagehide handler has no later moment.
  const flush = () => {
    if (!waiting) return Promise.resolve();
    cancel();
    return save();
  };

  let stopListening: (() => void) | undefined;

  return {
    start() {
      stopListening ??= page?.onLeave(() => void flush());
    },
    schedule() {
      cancel();
      waiting = true;
      timer = clock.setTimeout(() => {
        waiting = false;
        timer = undefined;
        void save();
      }, delayMs);
    },
    cancel,
    pending: () => waiting,
    flush,
    dispose() {
      cancel();
      stopListening?.();
      stopListening = undefined;
    },
  };
}
