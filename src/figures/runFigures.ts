/**
 * The standard set of figures of a run, as `firnline run --figures` writes them and the browser
 * offers them: a snapshot series of the long profile, the final profile, speed and driving stress
 * at the final year, and the time series. Same code, same data, same bytes.
 */
import { alongFlowFigure } from './alongFlowFigure';
import type { FigureRun } from './figureRun';
import { profileFigure } from './profileFigure';
import { FIGURE_FILE_NAMES as NAMES } from './figureFileNames';
import { roundInterval, snapshotYears } from './snapshotYears';
import { timeSeriesFigure } from './timeSeriesFigure';

export interface FigureFile {
  fileName: string;
  svg: string;
}

/** Named as the browser names the same figures (figureFileNames.ts), without the scenario's name in front. */
export function runFigures(run: FigureRun): FigureFile[] {
  const times = run.frames.map((f) => f.time);
  const final = times[times.length - 1];
  // The interval snapshotYears takes when none is given, named in the file.
  const every = roundInterval(final - times[0]);
  return [
    { fileName: `${NAMES.snapshots(every)}.svg`, svg: profileFigure(run, { years: snapshotYears(times, every), caption: true }) },
    { fileName: `${NAMES.profile(final)}.svg`, svg: profileFigure(run, { years: [final], caption: true }) },
    { fileName: `${NAMES.alongFlow(final)}.svg`, svg: alongFlowFigure(run, { year: final, caption: true }) },
    { fileName: `${NAMES.timeSeries}.svg`, svg: timeSeriesFigure(run, { caption: true }) },
  ];
}
