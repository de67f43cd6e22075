/**
 * Axes of a figure panel: light grid lines, a closed frame, ticks pointing out, tick labels and
 * axis titles with units. Ticks come from the same pure helpers as the on-screen plots
 * (src/chart), so a figure reads like the view it was exported from.
 */
import type { Tick } from '../chart/axisTicks';
import { COLOURS, TYPE } from './figureTheme';
import { element, text } from './svgMarkup';

export interface PlotArea {
  left: number;
  right: number;
  top: number;
  bottom: number;
}

export interface AxesSpec {
  area: PlotArea;
  xTicks: readonly Tick[];
  yTicks: readonly Tick[];
  /** Axis titles with units, e.g. "Distance down-valley (km)"; empty: no title (shared axis). */
  xTitle: string;
  yTitle: string;
  /** Tick labels on the x axis (false for the upper panels of a stack). */
  xLabels?: boolean;
}

const TICK_LENGTH = 3;

/** Grid lines, drawn first so the data go over them. */
export function gridMarkup({ area, xTicks, yTicks }: AxesSpec): string {
  const lines: string[] = [];
  for (const t of xTicks) lines.push(`M${t.px.toFixed(2)},${area.top.toFixed(2)}V${area.bottom.toFixed(2)}`);
  for (const t of yTicks) lines.push(`M${area.left.toFixed(2)},${t.px.toFixed(2)}H${area.right.toFixed(2)}`);
  return element('path', { class: 'grid', d: lines.join(''), stroke: COLOURS.grid, 'stroke-width': 0.5, fill: 'none' });
}

/** Frame, ticks, labels and titles, drawn last so they sit over the data. */
export function axesMarkup(spec: AxesSpec): string {
  const { area, xTicks, yTicks } = spec;
  const parts: string[] = [];
  parts.push(
    element('rect', {
      class: 'frame',
      x: area.left,
      y: area.top,
      width: area.right - area.left,
      height: area.bottom - area.top,
      fill: 'none',
      stroke: COLOURS.frame,
      'stroke-width': 0.7,
    }),
  );
  let ticks = '';
  for (const t of xTicks) ticks += `M${t.px.toFixed(2)},${area.bottom.toFixed(2)}v${TICK_LENGTH}`;
  for (const t of yTicks) ticks += `M${area.left.toFixed(2)},${t.px.toFixed(2)}h${-TICK_LENGTH}`;
  parts.push(element('path', { class: 'ticks', d: ticks, stroke: COLOURS.frame, 'stroke-width': 0.7, fill: 'none' }));
  const labels: string[] = [];
  if (spec.xLabels !== false) {
    for (const t of xTicks) {
      labels.push(text(t.label, t.px, area.bottom + TICK_LENGTH + TYPE.tick + 1, { size: TYPE.tick, anchor: 'middle', fill: COLOURS.text }));
    }
  }
  for (const t of yTicks) {
    labels.push(text(t.label, area.left - TICK_LENGTH - 2, t.px + TYPE.tick * 0.35, { size: TYPE.tick, anchor: 'end', fill: COLOURS.text }));
  }
  parts.push(element('g', { class: 'tick-labels' }, labels));
  if (spec.xTitle !== '') {
    parts.push(
      element(
        'g',
        { class: 'x-title' },
        text(spec.xTitle, (area.left + area.right) / 2, area.bottom + TICK_LENGTH + TYPE.tick + TYPE.axisTitle + 6, {
          size: TYPE.axisTitle,
          anchor: 'middle',
          fill: COLOURS.text,
        }),
      ),
    );
  }
  if (spec.yTitle !== '') {
    const x = area.left - yLabelWidth(yTicks) - TICK_LENGTH - 8;
    const y = (area.top + area.bottom) / 2;
    parts.push(element('g', { class: 'y-title' }, text(spec.yTitle, x, y, { size: TYPE.axisTitle, anchor: 'middle', rotate: -90, fill: COLOURS.text })));
  }
  return parts.join('');
}

/** Approximate width of the widest y tick label [pt]: Helvetica digits are 0.556 em wide. */
export function yLabelWidth(ticks: readonly Tick[]): number {
  let chars = 0;
  for (const t of ticks) chars = Math.max(chars, t.label.length);
  return chars * TYPE.tick * 0.556;
}
