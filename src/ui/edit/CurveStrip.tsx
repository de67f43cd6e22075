/**
 * A small SVG plot of a point list y(x) whose points can be dragged with the mouse (x held
 * between the neighbours) or moved with the arrow keys when focused (Shift for ten times the
 * step). The curve shown during a drag is a local preview; the edit is committed once, when the
 * pointer is released.
 */
import { max, min, scaleLinear } from 'd3';
import { useRef, useState, type KeyboardEvent, type PointerEvent } from 'react';
import type { Point } from '../../model/scenario';
import { movePoint } from './geometry/movePoint';
import { SmallPlotAxes } from '../plot/SmallPlotAxes';

export interface CurveStripProps {
  /** Accessible name of the plot, e.g. "Glacier width along the valley". */
  title: string;
  /** Name of one point for its label, e.g. "Width point". */
  pointName: string;
  points: readonly Point[];
  xDomain: [number, number];
  /** Axis titles with units. */
  xLabel: string;
  yLabel: string;
  /** x shown = x * xDisplay (1/1000 for km). */
  xDisplay?: number;
  xUnit: string;
  yUnit: string;
  /** Smallest allowed y shown on the axis (e.g. 0 for a width). */
  yFloor?: number;
  xStep: number;
  yStep: number;
  onCommit: (points: Point[], label: string) => void;
  width?: number;
  height?: number;
}

const M = { top: 10, right: 16, bottom: 44, left: 70 };

export function CurveStrip(props: CurveStripProps) {
  const { title, pointName, points, xDomain, xLabel, yLabel, xDisplay = 1, xUnit, yUnit, xStep, yStep, onCommit } = props;
  const W = props.width ?? 440;
  const H = props.height ?? 170;
  const [preview, setPreview] = useState<Point[] | null>(null);
  const drag = useRef<{ index: number; pointerId: number } | null>(null);
  const svgRef = useRef<SVGSVGElement>(null);
  const shown = preview ?? points;
  const ys = shown.map(([, y]) => y);
  const yLo = Math.min(props.yFloor ?? Infinity, min(ys) ?? Infinity);
  const yHi = max(ys) ?? -Infinity;
  const pad = Math.max(1, (yHi - yLo) * 0.15);
  const x = scaleLinear().domain(xDomain).range([M.left, W - M.right]);
  const y = scaleLinear().domain([yLo - (props.yFloor !== undefined ? 0 : pad), yHi + pad]).range([H - M.bottom, M.top]).nice();
  // Beyond its ends the list is held constant, so the line is drawn out to the edges.
  const extended: Point[] = [[Math.min(xDomain[0], shown[0][0]), shown[0][1]], ...shown, [Math.max(xDomain[1], shown[shown.length - 1][0]), shown[shown.length - 1][1]]];
  const d = extended.map(([px, py], i) => `${i ? 'L' : 'M'}${x(px)},${y(py)}`).join('');
  const bounds = { lower: xDomain[0], upper: xDomain[1] };

  function toData(event: PointerEvent<Element>): Point {
    const svg = svgRef.current;
    const ctm = svg?.getScreenCTM?.();
    if (!svg || !ctm) return [x.invert(event.clientX), y.invert(event.clientY)];
    const p = svg.createSVGPoint();
    p.x = event.clientX;
    p.y = event.clientY;
    const local = p.matrixTransform(ctm.inverse());
    return [x.invert(local.x), y.invert(local.y)];
  }
  function label(i: number) {
    return `Move ${pointName.toLowerCase()} ${i + 1}`;
  }
  function onKey(event: KeyboardEvent<SVGCircleElement>, i: number) {
    const k = event.shiftKey ? 10 : 1;
    const moves: Record<string, [number, number]> = {
      ArrowLeft: [-xStep * k, 0],
      ArrowRight: [xStep * k, 0],
      ArrowUp: [0, yStep * k],
      ArrowDown: [0, -yStep * k],
    };
    const m = moves[event.key];
    if (!m) return;
    event.preventDefault();
    onCommit(movePoint(points, i, [points[i][0] + m[0], points[i][1] + m[1]], bounds), label(i));
  }
  const fmtX = (v: number) => String(Number((v * xDisplay).toPrecision(4)));

  return (
    <svg ref={svgRef} className="curve-strip" viewBox={`0 0 ${W} ${H}`} role="group" aria-label={title}>
      <SmallPlotAxes width={W} height={H} margin={M} x={x} y={y} xTickCount={8} yTickCount={3} formatX={fmtX} xTitle={xLabel} yTitle={yLabel} ariaHidden />
      <path className="curve-line" d={d} />
      {shown.map((p, i) => (
        <circle
          key={i}
          className="edit-point"
          cx={x(p[0])}
          cy={y(p[1])}
          r={7}
          tabIndex={0}
          role="button"
          aria-label={`${pointName} ${i + 1} of ${shown.length}: ${fmtX(p[0])} ${xUnit}, ${Number(p[1].toPrecision(4))} ${yUnit}`}
          onKeyDown={(e) => onKey(e, i)}
          // Mouse, finger or pen (pointer events, captured): one pointer drags; a second finger
          // or a cancelled touch leaves the curve as it was.
          onPointerDown={(e) => {
            if (e.button !== 0 || !e.isPrimary) return;
            e.currentTarget.setPointerCapture?.(e.pointerId);
            drag.current = { index: i, pointerId: e.pointerId };
          }}
          onPointerMove={(e) => {
            if (drag.current?.pointerId !== e.pointerId) return;
            setPreview(movePoint(points, drag.current.index, toData(e), bounds));
          }}
          onPointerUp={(e) => {
            const held = drag.current;
            if (held?.pointerId !== e.pointerId) return;
            drag.current = null;
            const next = preview;
            setPreview(null);
            if (next) onCommit(next, label(held.index));
          }}
          onPointerCancel={(e) => {
            if (drag.current?.pointerId !== e.pointerId) return;
            drag.current = null;
            setPreview(null);
          }}
        />
      ))}
    </svg>
  );
}
