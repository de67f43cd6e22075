/**
 * Axes of the editor's small plots (balance profile, width and warming strips, import preview):
 * the two axis lines, tick labels without marks, and the titles with their units. One place, so
 * the small plots read alike.
 */
import type { ScaleLinear } from 'd3';

const typographicMinus = (v: number) => String(v).replace('-', '\u2212');

export interface SmallPlotAxesProps {
  width: number;
  height: number;
  margin: { top: number; right: number; bottom: number; left: number };
  x: ScaleLinear<number, number>;
  y: ScaleLinear<number, number>;
  xTickCount: number;
  yTickCount: number;
  xTitle: string;
  yTitle: string;
  formatX?: (v: number) => string;
  formatY?: (v: number) => string;
  /** For plots whose content is described elsewhere (a labelled group). */
  ariaHidden?: boolean;
}

export function SmallPlotAxes(props: SmallPlotAxesProps) {
  const { width: W, height: H, margin: M, x, y, formatX = typographicMinus, formatY = typographicMinus } = props;
  return (
    <g className="axis" aria-hidden={props.ariaHidden || undefined}>
      <line x1={M.left} x2={W - M.right} y1={H - M.bottom} y2={H - M.bottom} />
      <line x1={M.left} x2={M.left} y1={M.top} y2={H - M.bottom} />
      {x.ticks(props.xTickCount).map((t) => (
        <text key={t} x={x(t)} y={H - M.bottom + 17} textAnchor="middle">
          {formatX(t)}
        </text>
      ))}
      {y.ticks(props.yTickCount).map((t) => (
        <text key={t} x={M.left - 6} y={y(t)} dy="0.35em" textAnchor="end">
          {formatY(t)}
        </text>
      ))}
      <text x={(M.left + W - M.right) / 2} y={H - 6} textAnchor="middle">
        {props.xTitle}
      </text>
      <text transform={`translate(14,${(M.top + H - M.bottom) / 2}) rotate(-90)`} textAnchor="middle">
        {props.yTitle}
      </text>
    </g>
  );
}
