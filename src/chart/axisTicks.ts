/**
 * A linear axis as plain data: a "nice" domain from zero or from the data, pixel mapping and
 * labelled ticks. Shared by the along-flow plots and the time series.
 */
import { scaleLinear } from 'd3';

/** A labelled tick mark. */
export interface Tick {
  value: number;
  label: string;
  /** Position along the axis in pixels. */
  px: number;
}

export interface LinearAxis {
  domain: [number, number];
  px: (value: number) => number;
  ticks: Tick[];
}

// Axes repeat from frame to frame (the ranges hold still through a run); building one costs a
// d3 format and tick search, so recent ones are kept.
const cache = new Map<string, LinearAxis>();
const CACHE_SIZE = 64;

export function linearAxis(min: number, max: number, range: [number, number], tickCount: number): LinearAxis {
  const key = `${min}|${max}|${range[0]}|${range[1]}|${tickCount}`;
  const known = cache.get(key);
  if (known) return known;
  const axis = buildAxis(min, max, range, tickCount);
  if (cache.size >= CACHE_SIZE) cache.delete(cache.keys().next().value!);
  cache.set(key, axis);
  return axis;
}

function buildAxis(min: number, max: number, range: [number, number], tickCount: number): LinearAxis {
  // A flat series (e.g. no warming) still gets an axis a unit wide around its value.
  const lo = Number.isFinite(min) ? min : 0;
  let hi = Number.isFinite(max) ? max : 1;
  if (hi - lo < 1e-9) hi = lo + 1;
  const scale = scaleLinear().domain([lo, hi]).range(range).nice(tickCount);
  const format = scale.tickFormat(tickCount, '~f');
  const [d0, d1] = scale.domain() as [number, number];
  const k = (range[1] - range[0]) / (d1 - d0);
  return {
    domain: [d0, d1],
    // Affine, not the d3 scale: called for every sample of every line.
    px: (v) => range[0] + (v - d0) * k,
    ticks: scale.ticks(tickCount).map((v) => ({ value: v, label: format(v).replace('-', '\u2212'), px: scale(v) })),
  };
}
