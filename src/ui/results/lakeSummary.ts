/** One line for the numbers panel about the lakes at the selected year. */
import type { ExposedLake } from '../../model/analysis/exposedLakes';
import { formatLakeVolume } from '../../chart/lakeShapes';

export function lakeSummary(lakes: readonly ExposedLake[], unitWidth: boolean): string {
  if (lakes.length === 0) return 'none';
  const deepest = lakes.reduce((a, b) => (b.maxDepth > a.maxDepth ? b : a));
  const volume = lakes.reduce((sum, l) => sum + l.volume, 0);
  const where = `${(deepest.deepestAt / 1000).toFixed(2)} km`;
  return lakes.length === 1
    ? `1, up to ${Math.round(deepest.maxDepth)} m deep at ${where}, ${(deepest.length / 1000).toFixed(2)} km long, ${formatLakeVolume(volume, unitWidth)}`
    : `${lakes.length}, deepest ${Math.round(deepest.maxDepth)} m at ${where}, together ${formatLakeVolume(volume, unitWidth)}`;
}
