/**
 * Small multiples sharing one horizontal axis: panels stacked top to bottom, each with its own
 * vertical axis and title, the shared axis labelled once at the bottom. Used by the along-flow
 * and time-series figures.
 */
import { linearAxis, type Tick } from '../chart/axisTicks';
import { axesMarkup, gridMarkup, type PlotArea } from './axesMarkup';
import { COLOURS, TYPE } from './figureTheme';
import { legendHeight, legendMarkup, type LegendEntry } from './legendMarkup';
import { element, pathData, text } from './svgMarkup';
import { textWidth } from './textWidth';
import type { ValueWithError } from '../chart/observationMarks';
import { errorBarsMarkup } from './observationsMarkup';

export interface PanelLine {
  key: string;
  colour: string;
  dash?: string;
  xs: ArrayLike<number>;
  ys: ArrayLike<number>;
  /** Samples to leave out (e.g. ice-free cells); they break the line. */
  include?: (i: number) => boolean;
}

/** A shaded range between two curves (e.g. the min–max spread of a sweep). */
export interface PanelFill {
  key: string;
  colour: string;
  opacity: number;
  xs: ArrayLike<number>;
  low: ArrayLike<number>;
  high: ArrayLike<number>;
}

export interface PanelSpec {
  key: string;
  /** Panel title with units, e.g. "Speed (m a⁻¹)". */
  title: string;
  range: [number, number];
  lines: PanelLine[];
  /** Drawn under the lines. */
  fills?: PanelFill[];
  legend?: LegendEntry[];
  /** Measured points with error bars, in the axes' units (figures/observationsMarkup.ts). */
  points?: readonly ValueWithError[];
}

export interface StackSpec {
  left: number;
  right: number;
  top: number;
  panelHeight: number;
  gap: number;
  xRange: [number, number];
  xTitle: string;
  panels: PanelSpec[];
  /** A vertical marker (e.g. the selected year) drawn across every panel. */
  marker?: { x: number; label: string };
}

const PANEL_TITLE = TYPE.axisTitle + 6;

/** Height the stack takes below `top`, shared axis labels included. */
export function stackHeight(spec: Omit<StackSpec, 'top'>): number {
  const legends = spec.panels.map((p) => (p.legend ? legendHeight(p.legend, spec.right - spec.left) : 0));
  return spec.panels.reduce((h, _, k) => h + PANEL_TITLE + legends[k] + spec.panelHeight, 0) + (spec.panels.length - 1) * spec.gap + 30;
}

export function stackMarkup(spec: StackSpec): string {
  const xAxis = linearAxis(spec.xRange[0], spec.xRange[1], [spec.left, spec.right], Math.max(2, Math.round((spec.right - spec.left) / 60)));
  const parts: string[] = [];
  let top = spec.top;
  let firstAreaTop = NaN;
  spec.panels.forEach((panel, k) => {
    const last = k === spec.panels.length - 1;
    parts.push(element('g', { class: 'panel-title' }, text(panel.title, spec.left, top + TYPE.axisTitle, { size: TYPE.axisTitle, weight: 'bold', fill: COLOURS.text })));
    top += PANEL_TITLE;
    if (panel.legend) {
      parts.push(legendMarkup(panel.legend, spec.left, top, spec.right - spec.left));
      top += legendHeight(panel.legend, spec.right - spec.left);
    }
    const area: PlotArea = { left: spec.left, right: spec.right, top, bottom: top + spec.panelHeight };
    if (k === 0) firstAreaTop = top;
    const yAxis = linearAxis(panel.range[0], panel.range[1], [area.bottom, area.top], Math.max(2, Math.round(spec.panelHeight / 28)));
    const axes = { area, xTicks: xAxis.ticks as Tick[], yTicks: yAxis.ticks as Tick[], xTitle: last ? spec.xTitle : '', yTitle: '', xLabels: last };
    const lines = panel.lines.map((line) => {
      const points: [number, number][] = [];
      for (let i = 0; i < line.xs.length; i++) {
        const inside = (line.include?.(i) ?? true) && Number.isFinite(line.ys[i]);
        points.push(inside ? [xAxis.px(line.xs[i]), yAxis.px(line.ys[i])] : [NaN, NaN]);
      }
      return element('path', {
        class: `series series-${line.key}`,
        d: pathData(points),
        fill: 'none',
        stroke: line.colour,
        'stroke-width': 1.3,
        'stroke-dasharray': line.dash,
        'stroke-linejoin': 'round',
      });
    });
    const fills = (panel.fills ?? []).map((fill) => {
      const upper: [number, number][] = [];
      const lower: [number, number][] = [];
      for (let i = 0; i < fill.xs.length; i++) {
        if (!Number.isFinite(fill.low[i]) || !Number.isFinite(fill.high[i])) continue;
        upper.push([xAxis.px(fill.xs[i]), yAxis.px(fill.high[i])]);
        lower.push([xAxis.px(fill.xs[i]), yAxis.px(fill.low[i])]);
      }
      return element('path', { class: `band band-${fill.key}`, d: pathData([...upper, ...lower.reverse()], true), fill: fill.colour, 'fill-opacity': fill.opacity, stroke: 'none' });
    });
    const marker = spec.marker
      ? element('path', { class: 'marker', d: `M${xAxis.px(spec.marker.x)},${area.top}V${area.bottom}`, stroke: COLOURS.muted, 'stroke-width': 0.8, 'stroke-dasharray': '2 2', fill: 'none' })
      : '';
    const points = panel.points ? errorBarsMarkup(panel.key, panel.points, xAxis.px, yAxis.px, area) : '';
    parts.push(element('g', { class: 'panel', 'data-panel': panel.key }, [gridMarkup(axes), ...fills, marker, ...lines, points, axesMarkup(axes)]));
    top = area.bottom + spec.gap;
  });
  if (spec.marker) {
    const x = xAxis.px(spec.marker.x);
    // Right of the marker, or left of it when it would run past the plot's edge.
    const right = x + 3 + textWidth(spec.marker.label, TYPE.tick) <= spec.right - 2;
    const labelX = right ? x + 3 : x - 3;
    parts.push(
      element('g', { class: 'marker-label' }, text(spec.marker.label, labelX, firstAreaTop + TYPE.tick + 2, { size: TYPE.tick, anchor: right ? 'start' : 'end', fill: COLOURS.muted })),
    );
  }
  return parts.join('');
}
