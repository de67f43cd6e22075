/**
 * Which years a snapshot series shows: every `every` years from the first output, plus the last,
 * each taken as the nearest output time. With no interval given, a round one (1, 2 or 5 times a
 * power of ten) that gives at most seven snapshots.
 */
export const MAX_SNAPSHOTS = 12;

export function roundInterval(span: number, most = 7): number {
  if (!(span > 0)) return 1;
  const raw = span / (most - 1);
  const power = 10 ** Math.floor(Math.log10(raw));
  for (const m of [1, 2, 5, 10]) if (m * power >= raw) return m * power;
  return 10 * power;
}

export function snapshotYears(times: readonly number[], every?: number): number[] {
  if (times.length === 0) return [];
  const first = times[0];
  const last = times[times.length - 1];
  const step = every !== undefined && every > 0 ? every : roundInterval(last - first);
  const nearest = (year: number) => times.reduce((best, t) => (Math.abs(t - year) < Math.abs(best - year) ? t : best), first);
  const years = new Set<number>();
  for (let k = 0; first + k * step <= last + 1e-9 && years.size < MAX_SNAPSHOTS - 1; k++) years.add(nearest(first + k * step));
  years.add(last);
  return [...years].sort((a, b) => a - b);
}
