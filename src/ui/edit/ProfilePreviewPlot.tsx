/** Small long profile of a candidate scenario (bed and initial surface), for previews before applying. */
import { scaleLinear } from 'd3';
import type { Point, Scenario } from '../../model/scenario';

const W = 480;
const H = 230;
const M = { top: 30, right: 14, bottom: 42, left: 62 };

export function ProfilePreviewPlot({ scenario }: { scenario: Scenario }) {
  const all = [...scenario.bed, ...(scenario.surface ?? [])];
  const zs = all.map(([, z]) => z);
  const x = scaleLinear().domain([0, scenario.grid.length / 1000]).range([M.left, W - M.right]);
  const y = scaleLinear().domain([Math.min(...zs), Math.max(...zs)]).range([H - M.bottom, M.top]).nice();
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
      <g className="axis">
        <line x1={M.left} x2={W - M.right} y1={H - M.bottom} y2={H - M.bottom} />
        <line x1={M.left} x2={M.left} y1={M.top} y2={H - M.bottom} />
        {x.ticks(6).map((t) => (
          <text key={t} x={x(t)} y={H - M.bottom + 17} textAnchor="middle">
            {t}
          </text>
        ))}
        {y.ticks(4).map((t) => (
          <text key={t} x={M.left - 6} y={y(t)} dy="0.35em" textAnchor="end">
            {t}
          </text>
        ))}
        <text x={(M.left + W - M.right) / 2} y={H - 5} textAnchor="middle">
          Distance (km)
        </text>
        <text transform={`translate(14,${(M.top + H - M.bottom) / 2}) rotate(-90)`} textAnchor="middle">
          Elevation (m a.s.l.)
        </text>
      </g>
    </svg>
  );
}
