/**
 * The standard set of figures of a run, as `firnline run --figures` writes them and the browser
 * offers them: a snapshot series of the long profile, the final profile, speed and stress at the
 * final year, and the time series. Same code, same data, same bytes.
 */
import { alongFlowFigure } from './alongFlowFigure';
import type { FigureRun } from './figureRun';
import { profileFigure } from './profileFigure';
import { snapshotYears } from './snapshotYears';
import { timeSeriesFigure } from './timeSeriesFigure';

export interface FigureFile {
  fileName: string;
  svg: string;
}

export const RUN_FIGURE_NAMES = ['profile-snapshots.svg', 'profile-final.svg', 'along-flow-final.svg', 'time-series.svg'] as const;

export function runFigures(run: FigureRun): FigureFile[] {
  const times = run.frames.map((f) => f.time);
  const final = times[times.length - 1];
  return [
    { fileName: 'profile-snapshots.svg', svg: profileFigure(run, { years: snapshotYears(times), caption: true }) },
    { fileName: 'profile-final.svg', svg: profileFigure(run, { years: [final], caption: true }) },
    { fileName: 'along-flow-final.svg', svg: alongFlowFigure(run, { year: final, caption: true }) },
    { fileName: 'time-series.svg', svg: timeSeriesFigure(run, { caption: true }) },
  ];
}
