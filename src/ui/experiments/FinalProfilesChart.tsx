/**
 * The glacier surface at the end of the run for every finished member, over the bed of the first
 * one (a variant that changes the bed is not among the typed fields; from a file it would be,
 * and the note says so). Layout from the long profile's pure geometry helper.
 */
import { useId, useMemo } from 'react';
import { MIN_GLACIER_THICKNESS } from '../../model/glacierExtent';
import { exaggerationLabel, longProfileGeometry, type PlotSize, type ProfileSamples } from '../../chart/longProfile';
import { linePath } from '../../chart/linePath';
import { pathData } from '../../chart/screenPath';
import type { FinishedMember } from './finishedMembers';
import { GridLines, XTicks, YTicks } from '../plot/TickMarks';

const SIZE: PlotSize = { width: 860, height: 420, margin: { top: 44, right: 24, bottom: 66, left: 96 } };
/** Cells drawn as glacier: the model's own threshold. */
const MIN_ICE = MIN_GLACIER_THICKNESS;

function same(a: Float64Array, b: Float64Array): boolean {
  return a.length === b.length && a.every((v, i) => v === b[i]);
}

export function FinalProfilesChart({ members }: { members: readonly FinishedMember[] }) {
  const titleId = useId();
  const first = members[0]?.result.finalProfile;
  const g = useMemo(() => {
    if (!first) return null;
    const samples: ProfileSamples = { x: Array.from(first.x), bed: Array.from(first.bed), surface: Array.from(first.bed), thickness: Array.from(first.x, () => 0) };
    let top = -Infinity;
    for (const m of members) for (const z of m.result.finalProfile.surface) top = Math.max(top, z);
    return longProfileGeometry(samples, first.lengthM, null, SIZE, [top]);
  }, [first, members]);
  if (!first || !g) return null;
  const { left, right, top, bottom } = g.plotArea;
  const otherBeds = members.some((m) => !same(m.result.finalProfile.bed, first.bed));
  // The glacier at year 0 as a reference, when every member starts from the same one (a ladder of
  // warmings does; a sweep of A or the ELA does not, and then it would mislead).
  const commonStart = members.every((m) => same(m.result.finalProfile.startSurface, first.startSurface));
  const startIce = (i: number) => first.startSurface[i] - first.bed[i] >= MIN_ICE || first.startSurface[i - 1] - first.bed[i - 1] >= MIN_ICE || first.startSurface[i + 1] - first.bed[i + 1] >= MIN_ICE;

  return (
    <figure className="final-profiles">
      <svg className="plot final-profiles-plot" viewBox={`0 0 ${SIZE.width} ${SIZE.height}`} role="img" aria-labelledby={titleId}>
        <title id={titleId}>{`Glacier surface at the end of the run for ${members.length} member${members.length === 1 ? '' : 's'}, over the bed`}</title>
        <text className="plot-title" x={left} y={24}>
          Glacier at the end of the run
        </text>
        <GridLines ticks={g.zTicks} left={left} right={right} />
        <path className="bed-area" d={pathData(g.bedArea, true)} />
        <path className="bed-line" d={pathData(g.bedLine)} />
        {commonStart && <path className="start-surface" d={linePath(first.x, first.startSurface, g.xPixel, g.zPixel, startIce)} data-layer="start-surface" />}
        {members.map((m) => {
          const p = m.result.finalProfile;
          // A cell is drawn when it or a neighbour holds ice, so the surface comes down to the bed.
          const include = (i: number) => p.thickness[i] >= MIN_ICE || p.thickness[i - 1] >= MIN_ICE || p.thickness[i + 1] >= MIN_ICE;
          return (
            <path
              key={m.index}
              className="series member-line"
              d={linePath(p.x, p.surface, g.xPixel, g.zPixel, include)}
              stroke={m.style.colour}
              strokeDasharray={m.style.dash || undefined}
              data-member={m.name}
            >
              <title>{`${m.label} (${m.name})`}</title>
            </path>
          );
        })}
        <g className="axis">
          <line x1={left} x2={right} y1={bottom} y2={bottom} />
          <line x1={left} x2={left} y1={top} y2={bottom} />
          <XTicks ticks={g.xTicks} bottom={bottom} />
          <YTicks ticks={g.zTicks} left={left} />
          <text className="axis-title" x={(left + right) / 2} y={SIZE.height - 10} textAnchor="middle">
            Distance down-valley (km)
          </text>
          <text className="axis-title" transform={`translate(22,${(top + bottom) / 2}) rotate(-90)`} textAnchor="middle">
            Elevation (m a.s.l.)
          </text>
        </g>
        <text className="exaggeration" x={right} y={24} textAnchor="end">
          {exaggerationLabel(g.verticalExaggeration)}
        </text>
        {commonStart && (
          <g className="start-key" transform={`translate(${right - 250},${bottom - 16})`}>
            <line x1={0} x2={34} y1={0} y2={0} className="start-surface" />
            <text x={42} dy="0.35em">
              Surface at year 0
            </text>
          </g>
        )}
      </svg>
      {otherBeds && <figcaption>Some members have another bed than the one drawn; their surfaces are drawn over this one.</figcaption>}
    </figure>
  );
}
