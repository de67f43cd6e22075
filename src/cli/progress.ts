/**
 * One self-overwriting progress line on a terminal. Callers enable it only when stderr is a TTY
 * (a log file or pipe would collect every rewrite) and the user did not ask for --quiet.
 */
import { formatNumber } from '../scenario/formatNumber';

export interface ProgressUpdate {
  phase: 'spinup' | 'run';
  year: number;
  of: number;
  /** The start from today's glacier: what it is doing, shown instead of the spin-up's years. */
  message?: string;
}

export interface ProgressLine {
  update(progress: ProgressUpdate): void;
  /** Ends the line (once), so that what follows starts on a fresh line. */
  finish(): void;
}

/** Redraws at most this often [ms]: the spin-up reports every 10 model years, far faster than that. */
const REDRAW_INTERVAL_MS = 100;

export function progressText(p: ProgressUpdate): string {
  const year = formatNumber(Math.round(p.year));
  if (p.phase === 'spinup' && p.message !== undefined) return `start: ${p.message}`;
  return p.phase === 'spinup'
    ? `spin-up: model year ${year} (until steady, at most ${formatNumber(p.of)})`
    : `run: year ${year} of ${formatNumber(p.of)}`;
}

export function progressLine(write: (text: string) => void, enabled: boolean, now: () => number = Date.now): ProgressLine {
  let shownLength = 0;
  let lastDraw = Number.NEGATIVE_INFINITY;
  let lastPhase: ProgressUpdate['phase'] | undefined;
  let finished = false;
  return {
    update(p) {
      if (!enabled || finished) return;
      const t = now();
      const last = p.phase === 'run' && p.year >= p.of;
      // Always draw a change of phase and the last year, so the line never ends stale.
      if (t - lastDraw < REDRAW_INTERVAL_MS && p.phase === lastPhase && !last) return;
      lastDraw = t;
      lastPhase = p.phase;
      const text = progressText(p);
      write('\r' + text + ' '.repeat(Math.max(0, shownLength - text.length)));
      shownLength = text.length;
    },
    finish() {
      if (!enabled || finished) return;
      finished = true;
      if (shownLength > 0) write('\n');
    },
  };
}
