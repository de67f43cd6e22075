/**
 * One run summed up for an experiment's outcomes table: the change in length and volume from
 * year 0 to the end (absolute and per cent of the start), the time to make half of the final
 * volume change and half of the final length change, the e-folding response time when the
 * warming is a step (responseTime.ts, after Jóhannesson, Raymond & Waddington 1989), and whether
 * the run ends steady (steadyState.ts).
 *
 * Half-change time: the first time t with |X(t) - X(0)| >= |X(end) - X(0)| / 2, interpolated
 * linearly between records (volume: the annual record; length: the output times).
 */
import { glacierExtent } from '../glacierExtent';
import type { RunReport } from '../runScenario';

export interface RunOutcome {
  lengthStart: number;
  lengthEnd: number;
  lengthChange: number;
  /** Per cent of the starting value; NaN when the run starts ice-free. */
  lengthChangePercent: number;
  volumeStart: number;
  volumeEnd: number;
  volumeChange: number;
  volumeChangePercent: number;
  /** [a] after year 0; NaN when there is no change. */
  halfVolumeChangeYears: number;
  halfLengthChangeYears: number;
  /** [a]; NaN when the warming is not a step or the e-folding level is not reached. */
  eFoldingYears: number;
  endsInSteadyState: boolean;
}

/** First time the series has made half of its final change, interpolated; NaN if no change. */
export function halfChangeTime(times: readonly number[], values: readonly number[]): number {
  const last = values.length - 1;
  const total = values[last] - values[0];
  if (!(Math.abs(total) > 0)) return Number.NaN;
  const target = 0.5 * Math.abs(total);
  for (let k = 1; k <= last; k++) {
    const reached = Math.abs(values[k] - values[0]);
    if (reached >= target) {
      const before = Math.abs(values[k - 1] - values[0]);
      const share = reached > before ? (target - before) / (reached - before) : 1;
      return times[k - 1] + share * (times[k] - times[k - 1]) - times[0];
    }
  }
  return Number.NaN;
}

function percent(change: number, start: number): number {
  return start > 0 ? (100 * change) / start : Number.NaN;
}

export function runOutcome(report: RunReport): RunOutcome {
  const grid = report.model.grid;
  const times = report.frames.map((f) => f.time);
  const lengths = report.frames.map((f) => glacierExtent(grid, f.fields.thickness).length);
  const { years, volume } = report.annual;
  const lengthStart = lengths[0];
  const lengthEnd = lengths[lengths.length - 1];
  const volumeStart = volume[0];
  const volumeEnd = volume[volume.length - 1];
  return {
    lengthStart,
    lengthEnd,
    lengthChange: lengthEnd - lengthStart,
    lengthChangePercent: percent(lengthEnd - lengthStart, lengthStart),
    volumeStart,
    volumeEnd,
    volumeChange: volumeEnd - volumeStart,
    volumeChangePercent: percent(volumeEnd - volumeStart, volumeStart),
    halfVolumeChangeYears: halfChangeTime(years, volume),
    halfLengthChangeYears: halfChangeTime(times, lengths),
    eFoldingYears: report.summary.responseTime?.eFoldingYears ?? Number.NaN,
    endsInSteadyState: report.summary.endsInSteadyState,
  };
}
