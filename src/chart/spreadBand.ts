/**
 * The min–max spread of a group of members through time (the members of one variant across a
 * sweep), as an SVG polygon. Members with other output times than the first are left out of the
 * band rather than interpolated: the band shows only what was computed.
 */
import { percentiles } from '../model/analysis/percentiles';
import { pathData } from './screenPath';

export interface BandSeries {
  times: ArrayLike<number>;
  values: ArrayLike<number>;
}

export interface Band {
  times: number[];
  low: number[];
  high: number[];
}

function sameTimes(a: ArrayLike<number>, b: ArrayLike<number>): boolean {
  if (a.length !== b.length) return false;
  for (let k = 0; k < a.length; k++) if (a[k] !== b[k]) return false;
  return true;
}

/** Lowest and highest finite value at each output time; null with fewer than two members. */
export function minMaxBand(series: readonly BandSeries[]): Band | null {
  const usable = series.filter((s) => sameTimes(s.times, series[0].times));
  if (usable.length < 2) return null;
  const times = Array.from(usable[0].times);
  const low = times.map(() => Infinity);
  const high = times.map(() => -Infinity);
  for (const s of usable) {
    for (let k = 0; k < times.length; k++) {
      const v = s.values[k];
      if (!Number.isFinite(v)) continue;
      if (v < low[k]) low[k] = v;
      if (v > high[k]) high[k] = v;
    }
  }
  return { times, low, high };
}

/**
 * The band between two percentiles (e.g. 5 and 95) of a group of members at each output time
 * (model/analysis/percentiles.ts, linear between closest ranks); null with fewer than two members.
 */
export function percentileBand(series: readonly BandSeries[], low: number, high: number): Band | null {
  const usable = series.filter((s) => sameTimes(s.times, series[0].times));
  if (usable.length < 2) return null;
  const times = Array.from(usable[0].times);
  const lows: number[] = [];
  const highs: number[] = [];
  const at = new Float64Array(usable.length);
  for (let k = 0; k < times.length; k++) {
    let n = 0;
    for (const s of usable) if (Number.isFinite(s.values[k])) at[n++] = s.values[k];
    const [a, b] = percentiles(at.subarray(0, n), [low, high]);
    lows.push(Number.isNaN(a) ? Infinity : a);
    highs.push(Number.isNaN(b) ? -Infinity : b);
  }
  return { times, low: lows, high: highs };
}

/** The two nested bands an ensemble draws: 5 to 95 and 17 to 83 per cent. */
export const ENSEMBLE_BANDS = [
  { key: 'p5-p95', low: 5, high: 95, label: '5–95 % of the ensemble', opacity: 0.15 },
  { key: 'p17-p83', low: 17, high: 83, label: '17–83 % of the ensemble', opacity: 0.3 },
] as const;

/** Closed outline: the high edge forwards in time, the low edge back. */
export function bandPath(band: Band, x: (t: number) => number, y: (v: number) => number): string {
  const points: [number, number][] = [];
  band.times.forEach((t, k) => {
    if (Number.isFinite(band.high[k])) points.push([x(t), y(band.high[k])]);
  });
  for (let k = band.times.length - 1; k >= 0; k--) {
    if (Number.isFinite(band.low[k])) points.push([x(band.times[k]), y(band.low[k])]);
  }
  return points.length >= 3 ? pathData(points, true) : '';
}
