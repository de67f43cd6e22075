/**
 * Volume response time after a step change in climate.
 *
 * Model: the e-folding time, i.e. the time after the step at which the volume has made
 * (1 - 1/e) ~ 63 % of its total change (exact for a linear first-order response).
 * Estimate: tau = H / (-b_t) (Johannesson, Raymond & Waddington 1989, J. Glaciol. 35(121)),
 * with H the largest ice thickness and b_t the (negative) ice-equivalent balance at the terminus,
 * both in the state before the step. Agreement within about a factor of two is what the estimate
 * promises.
 */
import type { FlowlineModel } from './flowlineModel';
import { glacierExtent } from './glacierExtent';
import type { Point } from './piecewiseLinear';
import type { AnnualRecord } from './simulation';

/**
 * A warming that reaches its new value within this many years counts as a step: a jump in the
 * forcing, resolved by the annual record. A longer change is a ramp, however short beside the
 * run, and the e-folding time after a ramp mixes the forcing's time scale with the glacier's.
 */
export const STEP_MAX_YEARS = 1;

export interface StepForcing {
  /** Year the warming starts to change [a]. */
  start: number;
  /** Year it reaches its final value [a]. */
  end: number;
  /** Total change [K]. */
  change: number;
}

/** The step in a warming series, or undefined when the forcing is not a step. */
export function detectStepForcing(points: readonly Point[] | undefined, runYears: number): StepForcing | undefined {
  if (!points || points.length < 2) return undefined;
  const first = points[0][1];
  const last = points[points.length - 1][1];
  if (first === last) return undefined;
  let start = points[0][0];
  for (const [year, value] of points) {
    if (value !== first) break;
    start = year;
  }
  let end = points[points.length - 1][0];
  for (let k = points.length - 1; k >= 0; k--) {
    if (points[k][1] !== last) break;
    end = points[k][0];
  }
  const startYear = Math.max(0, start);
  if (end - startYear > STEP_MAX_YEARS || end >= runYears) return undefined;
  return { start: startYear, end, change: last - first };
}

/** e-folding time [a] of the volume in an annual record after year `start`; NaN if it never gets there. */
export function eFoldingTime(record: AnnualRecord, start: number): number {
  const k0 = record.years.findIndex((year) => year >= start);
  if (k0 < 0) return Number.NaN;
  const v0 = record.volume[k0];
  const totalChange = record.volume[record.volume.length - 1] - v0;
  if (totalChange === 0) return Number.NaN;
  const target = (1 - Math.exp(-1)) * Math.abs(totalChange);
  for (let k = k0 + 1; k < record.years.length; k++) {
    const reached = Math.abs(record.volume[k] - v0);
    if (reached >= target) {
      // Interpolate within the year for a smoother number.
      const before = Math.abs(record.volume[k - 1] - v0);
      const share = reached > before ? (target - before) / (reached - before) : 1;
      return record.years[k - 1] + share * (record.years[k] - record.years[k - 1]) - record.years[k0];
    }
  }
  return Number.NaN;
}

/**
 * Johannesson et al. (1989) estimate H_max / (-b_t) [a]; NaN when the terminus balance is not
 * negative. `precipitationFactor` [-] as in the forcing series (default 1).
 */
export function volumeTimescaleEstimate(model: FlowlineModel, thickness: Float64Array, warming: number, precipitationFactor = 1): number {
  const { grid } = model;
  const extent = glacierExtent(grid, thickness);
  if (extent.lastCell < 0) return Number.NaN;
  const surface = new Float64Array(grid.cellCount);
  for (let i = 0; i < grid.cellCount; i++) surface[i] = grid.bed[i] + thickness[i];
  const balance = new Float64Array(grid.cellCount);
  model.iceBalance(surface, warming, precipitationFactor, balance);
  const terminusBalance = balance[extent.lastCell];
  if (!(terminusBalance < 0)) return Number.NaN;
  let maxThickness = 0;
  for (const h of thickness) maxThickness = Math.max(maxThickness, h);
  return maxThickness / -terminusBalance;
}
