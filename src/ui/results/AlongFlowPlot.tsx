/**
 * A quantity along the flowline at the selected year: one or more lines against distance
 * down-valley, drawn only where there is ice. The vertical axis is fixed by the largest value of
 * the whole run so that playback shows change, not rescaling.
 */
import { useId } from 'react';
import { MIN_GLACIER_THICKNESS } from '../../model/glacierExtent';
import { linearAxis } from '../../chart/axisTicks';
import { linePath } from '../../chart/linePath';
import { errorBarMarks, type ValueWithError } from '../../chart/observationMarks';
import { GridLines, XTicks, YTicks } from '../plot/TickMarks';

export interface AlongFlowSeries {
  key: string;
  label: string;
  values: ArrayLike<number>;
  /** CSS class giving colour and dash. */
  className: string;
}

export interface AlongFlowPlotProps {
  title: string;
  /** Vertical axis title with unit, e.g. "Speed (m a⁻¹)". */
  yTitle: string;
  /** Cell centres [m]. */
  x: ArrayLike<number>;
  /** Domain length [m]. */
  lengthM: number;
  thickness: ArrayLike<number>;
  series: AlongFlowSeries[];
  /** Upper end of the vertical axis over the run. */
  yMax: number;
  /** Model year shown [a]. */
  time: number;
  /** Measurements to draw as points with +- bars (x in m, in the series' unit). */
  observed?: { label: string; points: readonly ValueWithError[]; year: number };
}

const W = 860;
const H = 270;
const M = { top: 40, right: 20, bottom: 58, left: 86 };

export function AlongFlowPlot({ title, yTitle, x, lengthM, thickness, series, yMax, time, observed }: AlongFlowPlotProps) {
  const titleId = useId();
  const left = M.left;
  const right = W - M.right;
  const top = M.top;
  const bottom = H - M.bottom;
  const xAxis = linearAxis(0, lengthM / 1000, [left, right], 9);
  const yAxis = linearAxis(0, yMax, [bottom, top], 4);
  const xPixel = (m: number) => xAxis.px(m / 1000);
  // Drawn only on the glacier, as the model counts it.
  const onIce = (i: number) => thickness[i] >= MIN_GLACIER_THICKNESS;
  const marks = observed ? errorBarMarks(observed.points, xPixel, yAxis.px, top, bottom) : [];
  const legend = [
    ...series.map((s) => ({ key: s.key, label: s.label, swatch: <line className={`series ${s.className}`} x1={0} x2={28} y1={0} y2={0} /> })),
    ...(marks.length && observed
      ? [
          {
            key: 'observed',
            label: `${observed.label}, year ${observed.year}`,
            swatch: (
              <g className="observation">
                <line x1={14} x2={14} y1={-8} y2={8} />
                <circle cx={14} cy={0} r={4} />
              </g>
            ),
          },
        ]
      : []),
  ];

  return (
    <svg className="plot along-flow" viewBox={`0 0 ${W} ${H}`} role="img" aria-labelledby={titleId}>
      <title id={titleId}>{`${title}, model year ${time}`}</title>
      <GridLines ticks={yAxis.ticks} left={left} right={right} />
      {series.map((s) => (
        <path key={s.key} className={`series ${s.className}`} d={linePath(x, s.values, xPixel, yAxis.px, onIce, true)} data-series={s.key} />
      ))}
      {marks.length > 0 && (
        <g className="observation" data-layer="observed">
          {marks.map((m) => (
            <g key={m.index}>
              {m.y2 > m.y1 && (
                <>
                  <line x1={m.cx} x2={m.cx} y1={m.y1} y2={m.y2} />
                  <line x1={m.cx - 4} x2={m.cx + 4} y1={m.y1} y2={m.y1} />
                  <line x1={m.cx - 4} x2={m.cx + 4} y1={m.y2} y2={m.y2} />
                </>
              )}
              <circle cx={m.cx} cy={m.cy} r={4} />
            </g>
          ))}
        </g>
      )}
      <g className="axis">
        <line x1={left} x2={right} y1={bottom} y2={bottom} />
        <XTicks ticks={xAxis.ticks} bottom={bottom} labelY={24} />
        <text className="axis-title" x={(left + right) / 2} y={H - 8} textAnchor="middle">
          Distance down-valley (km)
        </text>
        <line x1={left} x2={left} y1={top} y2={bottom} />
        <YTicks ticks={yAxis.ticks} left={left} />
      </g>
      {/* Title and unit above the axis, horizontal: easier to read than a rotated label. */}
      <text className="plot-title" x={left - 70} y={22}>
        {yTitle}
      </text>
      <g className="legend">
        {legend.map((e, i) => {
          // Right-aligned; each entry as wide as its label needs (about 8.5 px a character), at least 210.
          const at = right - legend.slice(i).reduce((sum, f) => sum + legendWidth(f.label), 0);
          return (
            <g key={e.key} transform={`translate(${at},18)`} data-legend={e.key}>
              {e.swatch}
              <text x={36} dy="0.35em">
                {e.label}
              </text>
            </g>
          );
        })}
      </g>
    </svg>
  );
}

function legendWidth(label: string): number {
  return Math.max(210, 36 + Math.ceil(label.length * 8.5) + 20);
}
