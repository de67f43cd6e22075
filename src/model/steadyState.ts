/**
 * Steady-state test used by the spin-up and at the end of a run (our own criterion, common
 * practice rather than a published standard): over the last STEADY_WINDOW_YEARS the ice volume
 * changed by at most STEADY_RELATIVE_VOLUME_CHANGE of itself and the terminus moved by at most
 * one grid cell.
 */
import type { AnnualRecord } from './simulation';

export const STEADY_WINDOW_YEARS = 50;
export const STEADY_RELATIVE_VOLUME_CHANGE = 1e-4;

export const STEADY_STATE_CRITERION =
  `volume changed by at most ${STEADY_RELATIVE_VOLUME_CHANGE * 100} % and the terminus by at most one cell ` +
  `over the last ${STEADY_WINDOW_YEARS} model years`;

/** True when the annual record ends in a steady state by the criterion above. */
export function endsInSteadyState(record: AnnualRecord, spacing: number): boolean {
  const last = record.years.length - 1;
  if (last < STEADY_WINDOW_YEARS) return false;
  const first = last - STEADY_WINDOW_YEARS;
  const v1 = record.volume[last];
  const v0 = record.volume[first];
  const volumeSteady = Math.abs(v1 - v0) <= STEADY_RELATIVE_VOLUME_CHANGE * Math.max(v0, v1);
  const t0 = record.terminus[first];
  const t1 = record.terminus[last];
  const bothIceFree = Number.isNaN(t0) && Number.isNaN(t1);
  const terminusSteady = bothIceFree || Math.abs(t1 - t0) <= spacing + 1e-9;
  return volumeSteady && terminusSteady;
}
