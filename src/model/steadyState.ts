/**
 * Steady-state test used by the spin-up and at the end of a run (our own criterion, common
 * practice rather than a published standard): over the last STEADY_WINDOW_YEARS the net change of
 * ice volume is at most STEADY_IMBALANCE of the gross accumulation in that time (the glacier's
 * turnover, so slow and fast glaciers are judged alike) and at most STEADY_DRIFT of the volume
 * itself (so that a control run after a spin-up drifts by well under 0.1 % per century even where
 * the turnover is large beside the volume), and the terminus moved by at most one grid cell. An
 * ice-free valley that stays ice-free is steady.
 */
import type { AnnualRecord } from './simulation';

export const STEADY_WINDOW_YEARS = 50;
export const STEADY_IMBALANCE = 1e-3;
/** Largest volume change over the window as a share of the volume: 1e-4 in 50 a is 0.02 % per century. */
export const STEADY_DRIFT = 1e-4;

export const STEADY_STATE_CRITERION =
  `over the last ${STEADY_WINDOW_YEARS} model years the ice volume changed by at most ` +
  `${STEADY_IMBALANCE * 100} % of the gross accumulation in that time and by at most ${STEADY_DRIFT * 100} % ` +
  'of the volume, and the terminus by at most one cell';

/** True when the annual record ends in a steady state by the criterion above. */
export function endsInSteadyState(record: AnnualRecord, spacing: number): boolean {
  const last = record.years.length - 1;
  const windowStart = record.years[last] - STEADY_WINDOW_YEARS;
  if (!(record.years[0] <= windowStart)) return false;
  // The last record at or before the start of the window (records are in time order).
  let first = last;
  while (first > 0 && record.years[first] > windowStart) first--;
  const volumeChange = Math.abs(record.volume[last] - record.volume[first]);
  const turnover = record.accumulation[last] - record.accumulation[first];
  const volumeSteady =
    volumeChange <= STEADY_IMBALANCE * turnover && volumeChange <= STEADY_DRIFT * Math.max(record.volume[first], record.volume[last]);
  const t0 = record.terminus[first];
  const t1 = record.terminus[last];
  const bothIceFree = Number.isNaN(t0) && Number.isNaN(t1);
  if (bothIceFree) return volumeChange === 0 || volumeChange <= STEADY_IMBALANCE * turnover;
  return volumeSteady && Math.abs(t1 - t0) <= spacing + 1e-9;
}
