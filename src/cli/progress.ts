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

export interface ExperimentProgress {
  /** Members finished (including those a resumed run found done), of `total`. */
  done: number;
  failed: number;
  total: number;
  /** Members finished by this process, and the time it has spent on them [ms]. */
  ranHere: number;
  elapsedMs: number;
}

/** A duration for people: "45 s", "3 min 05 s", "2 h 07 min". */
export function durationText(ms: number): string {
  const s = Math.max(0, Math.round(ms / 1000));
  if (s < 60) return `${s} s`;
  if (s < 3600) return `${Math.floor(s / 60)} min ${String(s % 60).padStart(2, '0')} s`;
  const minutes = Math.round(s / 60);
  return `${Math.floor(minutes / 60)} h ${String(minutes % 60).padStart(2, '0')} min`;
}

/**
 * The experiment's progress line: members done and failed, and the time left, estimated as the
 * mean time per member finished so far by this process times the members still to run.
 */
export function experimentProgressText(p: ExperimentProgress): string {
  const head = `experiment: ${formatNumber(p.done)} of ${formatNumber(p.total)} members done, ${formatNumber(p.failed)} failed`;
  if (p.done >= p.total) return `${head}, took ${durationText(p.elapsedMs)}`;
  if (p.ranHere === 0) return `${head}, estimating the time left`;
  return `${head}, about ${durationText((p.elapsedMs / p.ranHere) * (p.total - p.done))} left`;
}
