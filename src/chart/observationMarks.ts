/**
 * Observations as marks on the plots, as plain data (no React, no DOM): a point and its error bar
 * in pixels for each observation inside the domain.
 *
 * Radar or borehole thickness is drawn where a glaciologist reads it on a long profile: as the
 * bed it implies under the surface shown, z = s(x) - H_obs, with the bar spanning
 * s(x) - (H_obs +- sigma). Where the modelled bed lies inside the bar, the model's bed and the
 * measurement agree at that surface.
 */
import { interpolateAt } from '../model/analysis/observationMisfit';
import type { ObservedPoint } from '../model/scenario';

/** An observation to draw: position, value and its +- uncertainty, in the plot's units. */
export interface ValueWithError {
  /** Distance down-valley [m] or model year [a]: whatever the horizontal axis shows. */
  x: number;
  value: number;
  /** One-sided uncertainty (the bar is value +- sigma); 0 draws no bar. */
  sigma: number;
  /** Index of the observation in its list, for keys and titles. */
  index: number;
}

export interface ErrorBarMark {
  index: number;
  /** Point in pixels. */
  cx: number;
  cy: number;
  /** Bar ends in pixels (y1 the upper value's pixel, y2 the lower's), clipped to the plot area. */
  y1: number;
  y2: number;
  /** The bar reaches past the plot's top or bottom and was clipped. */
  clipped: boolean;
  /** The observation, for a tooltip. */
  source: ValueWithError;
}

/** Thickness observations as the bed elevations they imply under `surface` (at cell centres `x`). */
export function impliedBed(thickness: readonly ObservedPoint[], x: ArrayLike<number>, surface: ArrayLike<number>, lengthM: number): ValueWithError[] {
  const out: ValueWithError[] = [];
  thickness.forEach(([xo, h, sigma], index) => {
    if (!(xo >= 0 && xo <= lengthM)) return;
    out.push({ x: xo, value: interpolateAt(x, surface, xo) - h, sigma: Math.max(0, sigma), index });
  });
  return out;
}

/** Observed points [x, value, sigma] inside the horizontal range [0, xMax], as values with errors. */
export function withinRange(points: readonly ObservedPoint[], xMax: number): ValueWithError[] {
  const out: ValueWithError[] = [];
  points.forEach(([x, value, sigma], index) => {
    if (x >= 0 && x <= xMax && Number.isFinite(value)) out.push({ x, value, sigma: Math.max(0, sigma), index });
  });
  return out;
}

/**
 * Pixel marks for `points`: `xPixel` and `yPixel` map the plot's units to pixels; `top` and
 * `bottom` are the plot area's edges in pixels (bottom > top), to which bars are clipped.
 */
export function errorBarMarks(
  points: readonly ValueWithError[],
  xPixel: (x: number) => number,
  yPixel: (y: number) => number,
  top: number,
  bottom: number,
): ErrorBarMark[] {
  return points.map((p) => {
    const upper = yPixel(p.value + p.sigma);
    const lower = yPixel(p.value - p.sigma);
    const y1 = Math.max(top, Math.min(upper, lower));
    const y2 = Math.min(bottom, Math.max(upper, lower));
    return {
      index: p.index,
      cx: xPixel(p.x),
      cy: Math.max(top, Math.min(bottom, yPixel(p.value))),
      y1,
      y2,
      clipped: Math.min(upper, lower) < top || Math.max(upper, lower) > bottom,
      source: p,
    };
  });
}

/** Lowest and highest value +- sigma, for an axis that must show every bar; null when empty. */
export function valueRange(points: readonly ValueWithError[]): [number, number] | null {
  if (!points.length) return null;
  let lo = Infinity;
  let hi = -Infinity;
  for (const p of points) {
    lo = Math.min(lo, p.value - p.sigma);
    hi = Math.max(hi, p.value + p.sigma);
  }
  return [lo, hi];
}

/** The terminus observation split into a single position [m] or a record [year a, x m][]. */
export function terminusObservation(terminus: number | readonly (readonly [number, number])[] | undefined): {
  position: number | null;
  record: readonly (readonly [number, number])[];
} {
  if (terminus === undefined) return { position: null, record: [] };
  if (typeof terminus === 'number') return { position: terminus, record: [] };
  return { position: null, record: terminus };
}
