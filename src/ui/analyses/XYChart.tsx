/**
 * A small x-y chart for the analyses: axes with titles and units, lines told apart by colour AND
 * line style (and marker shape) with a legend in the top margin, optional reference lines and a
 * shaded band. Sized for the results column; the SVG scales with its container.
 */
import { useId } from 'react';
import { linearAxis } from '../../chart/axisTicks';
import { linePath } from '../../chart/linePath';
import { GridLines, XTicks } from '../plot/TickMarks';

export interface ChartSeries {
  key: string;
  label: string;
  xs: readonly number[];
  ys: readonly number[];
  /** CSS class giving the colour (see analyses.css). */
  className: string;
  dashed?: boolean;
  markers?: 'filled' | 'open' | 'none';
  /** Draw markers only, no line (e.g. trials in the order they were run). */
  noLine?: boolean;
}

export interface ReferenceLine {
  value: number;
  label: string;
  className: string;
}

export interface XYChartProps {
  /** Accessible name of the chart. */
  title: string;
  xTitle: string;
  yTitle: string;
  series: ChartSeries[];
  /** Horizontal lines (at y) and vertical lines (at x). */
  hLines?: ReferenceLine[];
  vLines?: ReferenceLine[];
  /** A shaded horizontal band [y0, y1], e.g. observed ± tolerance. */
  hBand?: { from: number; to: number; className: string };
  /** Start the y axis at zero (amounts) rather than at the data. */
  yFromZero?: boolean;
  /** Smallest y span, so a nearly flat series is not drawn on a magnified axis. */
  yMinSpan?: number;
  /** About how many x ticks (default 5); fewer for long labels such as elevations. */
  xTicks?: number;
  /** Air on either side of the x data, as a share of its span, so end points do not sit on the axes. */
  xPad?: number;
  legend?: boolean;
  /** Marks the chart for tests and screenshots. */
  name: string;
}

const W = 380;
const LEGEND_H = 34;
const PLOT_H = 190;
// The right margin holds half of a four-digit tick label (an elevation) at the end of the x axis.
const M = { right: 26, bottom: 54, left: 64 };

function extent(values: Iterable<number>): [number, number] {
  let lo = Infinity;
  let hi = -Infinity;
  for (const v of values) {
    if (!Number.isFinite(v)) continue;
    lo = Math.min(lo, v);
    hi = Math.max(hi, v);
  }
  return [lo, hi];
}

export function XYChart(props: XYChartProps) {
  const titleId = useId();
  const { series, hLines = [], vLines = [], hBand, legend = false } = props;
  const top = legend ? LEGEND_H + 8 : 14;
  const height = top + PLOT_H + M.bottom;
  const left = M.left;
  const right = W - M.right;
  const bottom = top + PLOT_H;

  let [x0, x1] = extent([...series.flatMap((s) => s.xs), ...vLines.map((l) => l.value)]);
  if (props.xPad) {
    const pad = props.xPad * (x1 - x0);
    x0 -= pad;
    x1 += pad;
  }
  let [y0, y1] = extent([...series.flatMap((s) => s.ys), ...hLines.map((l) => l.value), ...(hBand ? [hBand.from, hBand.to] : [])]);
  if (props.yFromZero) y0 = Math.min(0, y0);
  const minSpan = props.yMinSpan ?? 0;
  if (y1 - y0 < minSpan) {
    const middle = (y0 + y1) / 2;
    y0 = props.yFromZero ? Math.max(0, Math.min(y0, middle - minSpan / 2)) : middle - minSpan / 2;
    y1 = y0 + minSpan;
  }
  const x = linearAxis(x0, x1, [left, right], props.xTicks ?? 5);
  const y = linearAxis(y0, y1, [bottom, top], 4);
  const clampX = (v: number) => Math.min(right, Math.max(left, x.px(v)));

  return (
    <svg className="plot analysis-chart" viewBox={`0 0 ${W} ${height}`} role="img" aria-labelledby={titleId} data-chart={props.name}>
      <title id={titleId}>{props.title}</title>
      <GridLines ticks={y.ticks} left={left} right={right} />
      {hBand && <rect className={hBand.className} x={left} width={right - left} y={y.px(hBand.to)} height={Math.max(1, y.px(hBand.from) - y.px(hBand.to))} />}
      {hLines.map((l) => (
        <g key={`h-${l.label}`} className={`reference ${l.className}`}>
          <line x1={left} x2={right} y1={y.px(l.value)} y2={y.px(l.value)} />
          <text x={left + 6} y={y.px(l.value) - 6} className="reference-label">
            {l.label}
          </text>
        </g>
      ))}
      {vLines.map((l) => {
        const px = clampX(l.value);
        const onRight = px > (left + right) / 2;
        return (
          <g key={`v-${l.label}`} className={`reference ${l.className}`}>
            <line x1={px} x2={px} y1={top} y2={bottom} />
            <text x={px + (onRight ? -5 : 5)} y={top + 16} textAnchor={onRight ? 'end' : 'start'} className="reference-label">
              {l.label}
            </text>
          </g>
        );
      })}
      {series.map((s) => (
        <g key={s.key} className={`chart-series ${s.className}`} data-series={s.key}>
          {!s.noLine && <path className={`series${s.dashed ? ' dashed' : ''}`} d={linePath(s.xs, s.ys, x.px, y.px)} />}
          {s.markers !== 'none' &&
            s.xs.map((xv, i) =>
              Number.isFinite(xv) && Number.isFinite(s.ys[i]) ? (
                <circle key={i} className={`marker ${s.markers === 'open' ? 'open' : 'filled'}`} cx={x.px(xv)} cy={y.px(s.ys[i])} r={s.markers === 'open' ? 5.5 : 3.5} />
              ) : null,
            )}
        </g>
      ))}
      <g className="axis">
        <line x1={left} x2={left} y1={top} y2={bottom} />
        <line x1={left} x2={right} y1={bottom} y2={bottom} />
        {y.ticks.map((t) => (
          <text key={t.value} x={left - 7} y={t.px} dy="0.35em" textAnchor="end">
            {t.label}
          </text>
        ))}
        <XTicks ticks={x.ticks} bottom={bottom} labelY={23} />
        <text className="axis-title" x={(left + right) / 2} y={height - 8} textAnchor="middle">
          {props.xTitle}
        </text>
        <text className="axis-title" transform={`translate(15,${(top + bottom) / 2}) rotate(-90)`} textAnchor="middle" dy="0.35em">
          {props.yTitle}
        </text>
      </g>
      {legend && <Legend series={series} y={LEGEND_H / 2 + 2} />}
    </svg>
  );
}

/** One row of entries, left to right from the plot's left edge; each shows colour, dash and marker. */
function Legend({ series, y }: { series: ChartSeries[]; y: number }) {
  let at = 8;
  return (
    <g className="legend" data-layer="legend">
      {series.map((s) => {
        const x = at;
        // Width of an entry: swatch, gap, and about 8.6 user units a character at the legend's size.
        at += 34 + 8.6 * s.label.length + 18;
        return (
          <g key={s.key} transform={`translate(${x},${y})`} className={`chart-series ${s.className}`}>
            {!s.noLine && <line className={`series${s.dashed ? ' dashed' : ''}`} x1={0} x2={28} y1={0} y2={0} />}
            {s.markers !== 'none' && <circle className={`marker ${s.markers === 'open' ? 'open' : 'filled'}`} cx={14} cy={0} r={s.markers === 'open' ? 5.5 : 3.5} />}
            <text x={34} dy="0.35em">
              {s.label}
            </text>
          </g>
        );
      })}
    </g>
  );
}
