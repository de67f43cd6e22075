/** Small long profile of a candidate scenario (bed and initial surface), for previews before applying. */
import { max, min, scaleLinear } from 'd3';
import type { Point, Scenario } from '../../model/scenario';
import { SmallPlotAxes } from '../plot/SmallPlotAxes';

const W = 480;
const H = 230;
const M = { top: 30, right: 14, bottom: 42, left: 62 };

export function ProfilePreviewPlot({ scenario }: { scenario: Scenario }) {
  const all = [...scenario.bed, ...(scenario.surface ?? [])];
  const zs = all.map(([, z]) => z);
  const x = scaleLinear().domain([0, scenario.grid.length / 1000]).range([M.left, W - M.right]);
  const y = scaleLinear().domain([min(zs) ?? 0, max(zs) ?? 1]).range([H - M.bottom, M.top]).nice();
  const d = (pts: readonly Point[]) => pts.map(([px, pz], i) => `${i ? 'L' : 'M'}${x(px / 1000)},${y(pz)}`).join('');
  return (
    <svg className="small-plot" viewBox={`0 0 ${W} ${H}`} role="img" aria-label="Preview of the imported profile">
      <path className="bed" d={d(scenario.bed)} />
      {scenario.surface && <path className="ice-surface" d={d(scenario.surface)} />}
      <g className="legend">
        <line className="bed" x1={W - 250} x2={W - 226} y1={12} y2={12} />
        <text x={W - 220} y={12} dy="0.35em">
          Bed
        </text>
        {scenario.surface && (
          <>
            <line className="ice-surface" x1={W - 160} x2={W - 136} y1={12} y2={12} />
            <text x={W - 130} y={12} dy="0.35em">
              Ice surface
            </text>
          </>
        )}
      </g>
      <SmallPlotAxes width={W} height={H} margin={M} x={x} y={y} xTickCount={6} yTickCount={4} xTitle="Distance (km)" yTitle="Elevation (m a.s.l.)" />
    </svg>
  );
}
