/**
 * Tick marks with their labels for the on-screen SVG plots, below the plot area (x) and to its
 * left (y), and the grid lines across it. One place, so every chart's axes read alike.
 */
import type { Tick } from '../../chart/axisTicks';

const TICK_LENGTH = 6;

/** Ticks hanging down from `bottom`, labels centred below them at `labelY` from the axis. */
export function XTicks({ ticks, bottom, labelY = 26 }: { ticks: readonly Tick[]; bottom: number; labelY?: number }) {
  return (
    <>
      {ticks.map((t) => (
        <g key={t.value} transform={`translate(${t.px},${bottom})`}>
          <line y2={TICK_LENGTH} />
          <text y={labelY} textAnchor="middle">
            {t.label}
          </text>
        </g>
      ))}
    </>
  );
}

/** Ticks pointing left from `left`, labels right-aligned beside them. */
export function YTicks({ ticks, left }: { ticks: readonly Tick[]; left: number }) {
  return (
    <>
      {ticks.map((t) => (
        <g key={t.value} transform={`translate(${left},${t.px})`}>
          <line x2={-TICK_LENGTH} />
          <text x={-TICK_LENGTH - 4} dy="0.35em" textAnchor="end">
            {t.label}
          </text>
        </g>
      ))}
    </>
  );
}

/** Light horizontal lines across the plot area at the y ticks, under the data. */
export function GridLines({ ticks, left, right }: { ticks: readonly Pick<Tick, 'value' | 'px'>[]; left: number; right: number }) {
  return (
    <g className="grid" aria-hidden="true">
      {ticks.map((t) => (
        <line key={t.value} x1={left} x2={right} y1={t.px} y2={t.px} />
      ))}
    </g>
  );
}
