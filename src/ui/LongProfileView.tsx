/**
 * Long profile of a scenario along the flowline: bedrock, ice and the ELA, drawn as SVG from the
 * plain geometry in plot/longProfile.ts. The SVG scales uniformly with its container (viewBox),
 * so the stated vertical exaggeration stays true at any display size.
 */
import { useId, useMemo } from 'react';
import { line } from 'd3';
import type { Scenario } from '../model/scenario';
import {
  exaggerationLabel,
  longProfileGeometry,
  sampleScenario,
  scenarioEla,
  type PixelPoint,
  type PlotSize,
} from './plot/longProfile';

/**
 * Drawing size in SVG user units, near the usual on-screen width so text renders at about its
 * nominal size. The legend sits in the top margin so it never hides data.
 */
const SIZE: PlotSize = { width: 860, height: 520, margin: { top: 44, right: 20, bottom: 66, left: 86 } };
const TICK_LENGTH = 6;
const LEGEND_Y = 20;

const polyline = line<PixelPoint>();
const closedPath = (points: PixelPoint[]): string => (points.length ? `${polyline(points)}Z` : '');

export function LongProfileView({ scenario }: { scenario: Scenario }) {
  const titleId = useId();
  const descId = useId();
  const g = useMemo(
    () => longProfileGeometry(sampleScenario(scenario), scenario.grid.length, scenarioEla(scenario), SIZE),
    [scenario],
  );
  const { left, right, top, bottom } = g.plotArea;
  const exaggeration = exaggerationLabel(g.verticalExaggeration);

  return (
    <svg
      className="long-profile"
      viewBox={`0 0 ${SIZE.width} ${SIZE.height}`}
      role="img"
      aria-labelledby={titleId}
      aria-describedby={descId}
    >
      <title id={titleId}>Long profile of the flowline</title>
      <desc id={descId}>
        {`Bed and ice surface from 0 to ${g.xDomainKm[1]} km down-valley, elevations ${g.zDomain[0]} to ${g.zDomain[1]} m a.s.l.` +
          (g.ela ? `, ${g.ela.label}` : '') +
          `. ${exaggeration}.`}
      </desc>

      <g className="grid" aria-hidden="true">
        {g.zTicks.map((t) => (
          <line key={t.value} x1={left} x2={right} y1={t.px} y2={t.px} />
        ))}
      </g>

      <path className="bed-area" d={closedPath(g.bedArea)} data-layer="bed-area" />
      {g.iceBodies.map((body, i) => (
        <g key={i}>
          <path className="ice" d={closedPath(body.polygon)} data-layer="ice" />
          <path className="ice-surface" d={polyline(body.surface) ?? ''} data-layer="ice-surface" />
        </g>
      ))}
      <path className="bed" d={polyline(g.bedLine) ?? ''} data-layer="bed" />

      {g.ela && (
        <g className="ela" data-layer="ela">
          <line x1={left} x2={right} y1={g.ela.y} y2={g.ela.y} />
          <text x={right - 8} y={g.ela.y - 8} textAnchor="end">
            {g.ela.label}
          </text>
        </g>
      )}

      <g className="axis axis-x">
        <line x1={left} x2={right} y1={bottom} y2={bottom} />
        {g.xTicks.map((t) => (
          <g key={t.value} transform={`translate(${t.px},${bottom})`}>
            <line y2={TICK_LENGTH} />
            <text y={TICK_LENGTH + 18} textAnchor="middle">
              {t.label}
            </text>
          </g>
        ))}
        <text className="axis-title" x={(left + right) / 2} y={SIZE.height - 10} textAnchor="middle">
          Distance down-valley (km)
        </text>
      </g>

      <g className="axis axis-z">
        <line x1={left} x2={left} y1={top} y2={bottom} />
        {g.zTicks.map((t) => (
          <g key={t.value} transform={`translate(${left},${t.px})`}>
            <line x2={-TICK_LENGTH} />
            <text x={-TICK_LENGTH - 4} dy="0.35em" textAnchor="end">
              {t.label}
            </text>
          </g>
        ))}
        <text
          className="axis-title"
          transform={`translate(18,${(top + bottom) / 2}) rotate(-90)`}
          textAnchor="middle"
          dy="0.35em"
        >
          Elevation (m a.s.l.)
        </text>
      </g>

      {/* Above the plot, opposite the legend: stated where the eye reads the profile's shape. */}
      <text className="exaggeration" x={left} y={LEGEND_Y} dy="0.35em">
        {exaggeration}
      </text>
      <Legend right={right} y={LEGEND_Y} />
    </svg>
  );
}

/** One row of swatches, right-aligned above the plot area. */
function Legend({ right, y }: { right: number; y: number }) {
  const entries = [
    { key: 'bed', label: 'Bed', width: 70 },
    { key: 'ice', label: 'Ice', width: 62 },
    { key: 'ela', label: 'ELA', width: 70 },
  ];
  const total = entries.reduce((sum, e) => sum + e.width + 28, 0);
  let x = right - total;
  return (
    <g className="legend" data-layer="legend">
      {entries.map((e) => {
        const at = x;
        x += e.width + 28;
        return (
          <g key={e.key} transform={`translate(${at},${y})`}>
            <LegendSwatch kind={e.key} />
            <text x={30} dy="0.35em">
              {e.label}
            </text>
          </g>
        );
      })}
    </g>
  );
}

function LegendSwatch({ kind }: { kind: string }) {
  if (kind === 'bed') {
    return (
      <g>
        <rect className="bed-area" x={0} y={0} width={24} height={9} />
        <line className="bed" x1={0} x2={24} y1={0} y2={0} />
      </g>
    );
  }
  if (kind === 'ice') {
    return (
      <g>
        <rect className="ice" x={0} y={-9} width={24} height={18} />
        <line className="ice-surface" x1={0} x2={24} y1={-9} y2={-9} />
      </g>
    );
  }
  return <line className="ela-swatch" x1={0} x2={24} y1={0} y2={0} />;
}
