/**
 * Length, volume, ELA and warming against model year as small multiples sharing one time axis,
 * with a cursor at the selected year. Stacked panels read more clearly than four axes on one plot.
 */
import { memo, useId, useMemo, useDeferredValue } from 'react';
import { usePlaybackStore } from '../../state/playbackStore';
import { useRunStore, type RunFrame } from '../../state/runStore';
import { useScenarioStore } from '../../state/scenarioStore';
import { linearAxis } from '../../chart/axisTicks';
import { linePath } from '../../chart/linePath';
import { terminusObservation } from '../../chart/observationMarks';
import { panelRange, seriesPanels, terminusPanel, type SeriesPanel } from '../../chart/seriesPanels';
import { GridLines, XTicks } from '../plot/TickMarks';

const W = 380;
const PANEL = 100;
const GAP = 48;
const M = { top: 28, right: 14, bottom: 52, left: 62 };

export function TimeSeriesView() {
  // Deferred, so that redrawing every series as frames stream in never blocks the page.
  const frames = useDeferredValue(useRunStore((s) => s.frames));
  const index = useDeferredValue(usePlaybackStore((s) => s.index));
  const years = useRunStore((s) => s.years);
  const unitWidth = useScenarioStore((s) => !s.scenario.width);
  const observedTerminus = useScenarioStore((s) => s.scenario.observations?.terminus);
  const record = useMemo(() => terminusObservation(observedTerminus).record, [observedTerminus]);
  return <SeriesPlot frames={frames} index={index} years={years} unitWidth={unitWidth} terminusRecord={record} />;
}

interface SeriesProps {
  frames: RunFrame[];
  index: number;
  years: number;
  unitWidth: boolean;
  /** Observed terminus positions [year a, x m]; with any, a terminus panel shows them. */
  terminusRecord: readonly (readonly [number, number])[];
}

/** The plot itself, from plain data (exported for tests). */
export const SeriesPlot = memo(function SeriesPlot({ frames, index, years, unitWidth, terminusRecord }: SeriesProps) {
  const titleId = useId();
  const times = useMemo(() => Float64Array.from(frames, (f) => f.time), [frames]);
  const series = useMemo((): SeriesPanel<string>[] => {
    const panels = seriesPanels(frames, unitWidth);
    // The observed record beside the modelled terminus, under the length.
    return terminusRecord.length ? [panels[0], terminusPanel(frames), ...panels.slice(1)] : panels;
  }, [frames, unitWidth, terminusRecord]);
  // Observed terminus positions [km] within the run's years.
  const observedKm = useMemo(
    () => terminusRecord.filter(([t]) => t >= 0 && t <= years).map(([t, x]) => ({ t, km: x / 1000 })),
    [terminusRecord, years],
  );
  const left = M.left;
  const right = W - M.right;
  const tAxis = useMemo(() => linearAxis(0, years, [left, right], 5), [years, left, right]);
  // Axes and lines depend on the run, not on the selected year: laid out once per batch of
  // frames, so playback only moves the cursor.
  const panels = useMemo(
    () =>
      series.map((p, k) => {
        const top = M.top + k * (PANEL + GAP);
        const observed = p.key === 'terminus' ? observedKm : [];
        const [lo, hi] = panelRange(p, observed.map((o) => o.km));
        const y = linearAxis(lo, hi, [top + PANEL, top], 3);
        const points = observed.map((o) => ({ key: `${o.t}-${o.km}`, cx: tAxis.px(o.t), cy: y.px(o.km), t: o.t, km: o.km }));
        return { p, top, bottom: top + PANEL, y, d: linePath(times, p.values, tAxis.px, y.px), points };
      }),
    [series, times, tAxis, observedKm],
  );
  if (frames.length === 0) return null;

  const height = M.top + series.length * PANEL + (series.length - 1) * GAP + M.bottom;
  const current = frames[Math.min(index, frames.length - 1)];
  const cursorX = tAxis.px(current.time);

  return (
    <svg className="plot time-series" viewBox={`0 0 ${W} ${height}`} role="img" aria-labelledby={titleId}>
      <title id={titleId}>{`Length, ${observedKm.length ? 'terminus (model and observed), ' : ''}volume, ELA and warming against model year; cursor at year ${current.time}`}</title>
      {/* One cursor segment per panel, so it never crosses the panel titles; drawn under the lines and dots. */}
      <g className="cursor" data-layer="cursor">
        {series.map((p, k) => {
          const top = M.top + k * (PANEL + GAP);
          return <line key={p.key} x1={cursorX} x2={cursorX} y1={top} y2={top + PANEL} />;
        })}
      </g>
      {panels.map(({ p, top, bottom, y, d, points }) => {
        const value = p.values[Math.min(index, frames.length - 1)];
        return (
          <g key={p.key} data-panel={p.key}>
            <text className="panel-title" x={4} y={top - 10}>
              {p.title}
            </text>
            <GridLines ticks={y.ticks} left={left} right={right} />
            <g className="axis">
              <line x1={left} x2={left} y1={top} y2={bottom} />
              <line x1={left} x2={right} y1={bottom} y2={bottom} />
              {y.ticks.map((t) => (
                <text key={t.value} x={left - 8} y={t.px} dy="0.35em" textAnchor="end">
                  {t.label}
                </text>
              ))}
            </g>
            <path className={`series ts-${p.key}`} d={d} />
            {points.length > 0 && (
              <g className="observation" data-layer="observed-terminus">
                {points.map((o) => (
                  <circle key={o.key} cx={o.cx} cy={o.cy} r={3.5}>
                    <title>{`Observed terminus ${o.km.toFixed(2)} km in year ${o.t}`}</title>
                  </circle>
                ))}
                <g transform={`translate(${right - 80},${top - 14})`} data-legend="observed-terminus">
                  <circle cx={0} cy={0} r={3.5} />
                  <text x={8} dy="0.35em" className="legend-note">
                    observed
                  </text>
                </g>
              </g>
            )}
            {Number.isFinite(value) && <circle className={`cursor-dot ts-${p.key}`} cx={cursorX} cy={y.px(value)} r={4.5} />}
          </g>
        );
      })}
      <g className="axis">
        <XTicks ticks={tAxis.ticks} bottom={height - M.bottom} labelY={22} />
        <text className="axis-title" x={(left + right) / 2} y={height - 8} textAnchor="middle">
          Model year (a)
        </text>
      </g>
    </svg>
  );
});
