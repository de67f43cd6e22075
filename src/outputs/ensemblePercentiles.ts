/**
 * Percentiles of an uncertainty ensemble's outcomes, written to percentiles.csv.
 *
 * Definition (model/analysis/percentiles.ts): the p-th percentile of n sorted values x_0 <= ... <= x_(n-1) is the linear
 * interpolation between closest ranks, h = (n - 1) p / 100, Q = x_floor(h) + (h - floor h)
 * (x_(floor h + 1) - x_floor(h)): definition 7 of Hyndman & Fan (1996, "Sample quantiles in
 * statistical packages", The American Statistician 50(4), 361-365), the default of R and NumPy.
 * One value gives that value at every p. A percentile that falls on +Infinity (or interpolates
 * towards it) is +Infinity, written as an empty field ("not within the run").
 *
 * The quantities, per member, are read from the member's rows of experiment.csv (so one run and
 * a merge of shards, which hold the same rows, give the same bytes): the length, volume and
 * terminus at the last output time, and the year by which half the volume at year 0 is lost:
 * the first output time t with V(t) <= V(0) / 2, linearly interpolated between output times
 * (+Infinity when the volume never falls to half within the run; undefined, and left out, when
 * the glacier starts ice-free). A terminus that does not exist (ice-free at the end) is left
 * out. Failed members have no rows and are left out. The `members` column gives how many values
 * each row's percentiles are taken over.
 */
import { ENSEMBLE_PERCENTILES, percentileOfSorted, percentiles } from '../model/analysis/percentiles';
import { csvNumber, FIELD_DIGITS } from './csvWriters';
import { csvText } from './experimentCsv';

export const PERCENTILES = ENSEMBLE_PERCENTILES;
export { percentileOfSorted, percentiles };

export const PERCENTILES_HEADER = ['group', 'label', 'quantity', 'members', 'p5', 'p17', 'p50', 'p83', 'p95'] as const;

export const ENSEMBLE_QUANTITIES = ['length_end_m', 'volume_end_m3', 'terminus_end_m', 'half_volume_lost_yr'] as const;
export type EnsembleQuantity = (typeof ENSEMBLE_QUANTITIES)[number];

export interface SeriesPoint {
  time: number;
  volume: number;
  length: number;
  /** NaN when ice-free. */
  terminus: number;
}

/** First time V(t) <= V(0)/2, interpolated between output times; Infinity if never; NaN when V(0) = 0. */
export function halfVolumeLostYear(series: readonly SeriesPoint[]): number {
  if (series.length === 0 || !(series[0].volume > 0)) return Number.NaN;
  const target = series[0].volume / 2;
  for (let k = 1; k < series.length; k++) {
    const { volume: v1, time: t1 } = series[k];
    if (v1 <= target) {
      const { volume: v0, time: t0 } = series[k - 1];
      return t0 + ((v0 - target) / (v0 - v1)) * (t1 - t0);
    }
  }
  return Number.POSITIVE_INFINITY;
}

export function memberQuantities(series: readonly SeriesPoint[]): Record<EnsembleQuantity, number> {
  const last = series[series.length - 1];
  return {
    length_end_m: last ? last.length : Number.NaN,
    volume_end_m3: last ? last.volume : Number.NaN,
    terminus_end_m: last ? last.terminus : Number.NaN,
    half_volume_lost_yr: halfVolumeLostYear(series),
  };
}

/** Each member's series read back from experiment.csv text (header line included). */
export function seriesFromExperimentCsv(text: string): Map<string, SeriesPoint[]> {
  const byMember = new Map<string, SeriesPoint[]>();
  const lines = text.split('\n');
  for (const line of lines.slice(1)) {
    if (line === '') continue;
    const [member, t, volume, , length, terminus] = line.split(',');
    const list = byMember.get(member) ?? [];
    list.push({ time: Number(t), volume: Number(volume), length: Number(length), terminus: terminus === '' ? Number.NaN : Number(terminus) });
    byMember.set(member, list);
  }
  return byMember;
}

export interface EnsembleGroups {
  /** Samples per group; group g holds members g * members .. (g + 1) * members - 1. */
  members: number;
  /** One label per group: the variant and swept values it stands for. */
  labels: string[];
}

/** percentiles.csv: one row per group per quantity. `memberNames` in member order. */
export function percentilesCsv(experimentCsv: string, memberNames: readonly string[], groups: EnsembleGroups): string {
  const series = seriesFromExperimentCsv(experimentCsv);
  let text = PERCENTILES_HEADER.join(',') + '\n';
  groups.labels.forEach((label, g) => {
    const names = memberNames.slice(g * groups.members, (g + 1) * groups.members);
    const quantities = names.flatMap((name) => {
      const s = series.get(name);
      return s && s.length > 0 ? [memberQuantities(s)] : [];
    });
    for (const q of ENSEMBLE_QUANTITIES) {
      const values = quantities.map((x) => x[q]).filter((v) => !Number.isNaN(v));
      const ps = percentiles(values);
      const digits = q === 'volume_end_m3' ? undefined : FIELD_DIGITS;
      text += [String(g + 1), csvText(label), q, String(values.length), ...ps.map((v) => (Number.isFinite(v) ? csvNumber(v, digits) : ''))].join(',') + '\n';
    }
  });
  return text;
}
