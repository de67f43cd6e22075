/**
 * The sensitivity curve as a table of warmings with both branches side by side, and where the
 * branches differ. The terminus moves in whole grid cells, so branches a cell apart agree within
 * the resolution; farther apart they hold two different steady glaciers for the same climate.
 */
import type { SteadyPoint } from '../../model/analysis/sensitivityCurve';

export interface BranchRow {
  warming: number;
  up: SteadyPoint;
  /** Absent at the top warming, where the curve turns. */
  down: SteadyPoint | undefined;
}

export interface BranchComparison {
  rows: BranchRow[];
  /** Warmings where the steady termini differ by more than one grid cell (or one branch has no ice). */
  differAt: number[];
  /** Largest terminus difference [m] and where; largest volume difference [share of the larger]. */
  largestTerminusDifference: { metres: number; warming: number } | null;
  largestVolumeDifference: { share: number; warming: number } | null;
  /** Warmings where the steady glacier reaches the end of the flowline (its length is cut by the domain). */
  atDomainEnd: number[];
  /** Steps that did not reach a steady state within their limit. */
  unconverged: number;
}

export function compareBranches(points: readonly SteadyPoint[], spacing: number, domainLength: number): BranchComparison {
  const up = points.filter((p) => p.branch === 'up');
  const down = points.filter((p) => p.branch === 'down');
  const rows = up.map((u) => ({ warming: u.warming, up: u, down: down.find((d) => d.warming === u.warming) }));
  const differAt: number[] = [];
  let largestTerminusDifference: BranchComparison['largestTerminusDifference'] = null;
  let largestVolumeDifference: BranchComparison['largestVolumeDifference'] = null;
  for (const { warming, up: u, down: d } of rows) {
    if (!d) continue;
    const iceOnOne = Number.isNaN(u.terminus) !== Number.isNaN(d.terminus);
    const metres = iceOnOne ? Infinity : Number.isNaN(u.terminus) ? 0 : Math.abs(u.terminus - d.terminus);
    if (metres > spacing + 1e-9) differAt.push(warming);
    if (metres > 0 && (!largestTerminusDifference || metres > largestTerminusDifference.metres)) largestTerminusDifference = { metres, warming };
    const larger = Math.max(u.volume, d.volume);
    const share = larger > 0 ? Math.abs(u.volume - d.volume) / larger : 0;
    if (share > 0 && (!largestVolumeDifference || share > largestVolumeDifference.share)) largestVolumeDifference = { share, warming };
  }
  const atDomainEnd = up.filter((p) => p.terminus >= domainLength - 1e-6 || (rows.find((r) => r.warming === p.warming)?.down?.terminus ?? 0) >= domainLength - 1e-6).map((p) => p.warming);
  return { rows, differAt, largestTerminusDifference, largestVolumeDifference, atDomainEnd, unconverged: points.filter((p) => !p.converged).length };
}
