/**
 * Observations on the exported figures, as the screen draws them (chart/observationMarks.ts):
 * measured thickness as the bed it implies under the surface shown, with its error bar; measured
 * surface speeds with error bars; the observed terminus as a triangle on the ground. Pure text,
 * shared by the browser and `firnline run --figures`, so both write the same bytes.
 */
import { errorBarMarks, type ValueWithError } from '../chart/observationMarks';
import { COLOURS_OBSERVATION } from './figureTheme';
import type { LegendEntry } from './legendMarkup';
import { element } from './svgMarkup';

/** Error-bar points in pixels, as a group; empty text when there are none. */
export function errorBarsMarkup(
  key: string,
  points: readonly ValueWithError[],
  xPixel: (x: number) => number,
  yPixel: (y: number) => number,
  area: { top: number; bottom: number },
): string {
  if (points.length === 0) return '';
  const marks = errorBarMarks(points, xPixel, yPixel, area.top, area.bottom).map((m) => {
    const bar = m.y2 > m.y1 ? element('path', { d: `M${r(m.cx)},${r(m.y1)}V${r(m.y2)}M${r(m.cx - 2.5)},${r(m.y1)}h5M${r(m.cx - 2.5)},${r(m.y2)}h5`, stroke: COLOURS_OBSERVATION, 'stroke-width': 0.8, fill: 'none' }) : '';
    return bar + element('circle', { cx: r(m.cx), cy: r(m.cy), r: 2, fill: COLOURS_OBSERVATION, stroke: '#ffffff', 'stroke-width': 0.5 });
  });
  return element('g', { class: `observations observations-${key}` }, marks);
}

/** The observed terminus: a triangle pointing down at the ground (x, y in pixels). */
export function terminusMarkup(x: number, y: number): string {
  return element('g', { class: 'observations observed-terminus' }, element('path', { d: `M${r(x)},${r(y - 1)}l-4,-7h8z`, fill: COLOURS_OBSERVATION, stroke: '#ffffff', 'stroke-width': 0.5 }));
}

export const legendFor = {
  thickness: (year: number): LegendEntry => ({ label: `Bed implied by measured thickness, year ${year}`, swatch: { kind: 'point', colour: COLOURS_OBSERVATION, mark: 'errorbar' } }),
  speed: (year: number): LegendEntry => ({ label: `Measured surface speed, year ${year}`, swatch: { kind: 'point', colour: COLOURS_OBSERVATION, mark: 'errorbar' } }),
  terminus: (year: number): LegendEntry => ({ label: `Observed terminus, year ${year}`, swatch: { kind: 'point', colour: COLOURS_OBSERVATION, mark: 'triangle' } }),
};

function r(value: number): number {
  return Math.round(value * 100) / 100;
}
