/**
 * The time-series panels (length, volume, ELA, warming) as plain data: titles with units, values
 * and the value range each axis covers. Shared by the on-screen time series and the exported
 * figure, so both say the same thing in the same units.
 */
import type { GlacierNumbers } from '../model/diagnostics';

export interface SeriesPanel<K extends string = 'length' | 'volume' | 'ela' | 'warming'> {
  key: K;
  title: string;
  values: Float64Array;
  /** Start the axis at zero (amounts) rather than at the data (levels). */
  fromZero: boolean;
  /** Smallest axis span, so that a constant series is not drawn on a magnified axis. */
  minSpan: number;
}

export function seriesPanels(frames: readonly { numbers: GlacierNumbers }[], unitWidth: boolean): SeriesPanel[] {
  const pick = (f: (n: GlacierNumbers) => number) => Float64Array.from(frames, (frame) => f(frame.numbers));
  return [
    { key: 'length', title: 'Length (km)', values: pick((n) => n.length / 1000), fromZero: true, minSpan: 1 },
    unitWidth
      ? { key: 'volume', title: 'Volume (10⁶ m³ per m of width)', values: pick((n) => n.volume / 1e6), fromZero: true, minSpan: 0.1 }
      : { key: 'volume', title: 'Volume (km³)', values: pick((n) => n.volume / 1e9), fromZero: true, minSpan: 0.1 },
    { key: 'ela', title: 'ELA (m a.s.l.)', values: pick((n) => n.ela), fromZero: false, minSpan: 100 },
    { key: 'warming', title: 'Warming (K)', values: pick((n) => n.warming), fromZero: false, minSpan: 1 },
  ];
}

/**
 * The terminus position against model year, for comparison with an observed record of it (the
 * length is not the terminus position when the glacier does not start at the head of the domain).
 */
export function terminusPanel(frames: readonly { numbers: GlacierNumbers }[]): SeriesPanel<'terminus'> {
  return {
    key: 'terminus',
    title: 'Terminus (km down-valley)',
    values: Float64Array.from(frames, (f) => f.numbers.terminus / 1000),
    fromZero: false,
    minSpan: 1,
  };
}

/**
 * The range a panel's axis covers: the data (from zero for amounts) and any `alsoShow` values
 * (observations), widened to its smallest span.
 */
export function panelRange(p: SeriesPanel<string>, alsoShow: readonly number[] = []): [number, number] {
  let lo = Infinity;
  let hi = -Infinity;
  for (const v of [...p.values, ...alsoShow]) {
    if (!Number.isFinite(v)) continue;
    lo = Math.min(lo, v);
    hi = Math.max(hi, v);
  }
  if (p.fromZero) lo = 0;
  if (!Number.isFinite(hi)) hi = lo + p.minSpan;
  if (!Number.isFinite(lo)) lo = hi - p.minSpan;
  if (hi - lo < p.minSpan) {
    // Widen around the data; warming keeps zero in view.
    const middle = p.key === 'warming' ? Math.max(lo, 0) + p.minSpan / 2 : (lo + hi) / 2;
    lo = Math.min(lo, middle - p.minSpan / 2);
    hi = Math.max(hi, middle + p.minSpan / 2);
  }
  return [lo, hi];
}
