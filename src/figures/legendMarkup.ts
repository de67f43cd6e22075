/**
 * A figure legend: one swatch and label per series, laid out in rows across the figure width.
 */
import { COLOURS, TYPE } from './figureTheme';
import { element, text } from './svgMarkup';
import { textWidth } from './textWidth';

export type Swatch =
  | { kind: 'line'; colour: string; dash?: string; width?: number }
  | { kind: 'fill'; colour: string; stroke?: string; opacity?: number }
  /** A measured point with its error bar, or the observed-terminus triangle. */
  | { kind: 'point'; colour: string; mark: 'errorbar' | 'triangle' };

export interface LegendEntry {
  label: string;
  swatch: Swatch;
}

const SWATCH_WIDTH = 16;
const GAP = 12;
const ROW_HEIGHT = TYPE.legend + 5;

export function legendHeight(entries: readonly LegendEntry[], maxWidth: number): number {
  return layout(entries, maxWidth).rows * ROW_HEIGHT;
}

function layout(entries: readonly LegendEntry[], maxWidth: number) {
  const places: { x: number; row: number }[] = [];
  let x = 0;
  let row = 0;
  for (const entry of entries) {
    const w = SWATCH_WIDTH + 4 + textWidth(entry.label, TYPE.legend);
    if (x > 0 && x + w > maxWidth) {
      x = 0;
      row++;
    }
    places.push({ x, row });
    x += w + GAP;
  }
  return { places, rows: entries.length === 0 ? 0 : row + 1 };
}

/** The legend with its top-left corner at (left, top). */
export function legendMarkup(entries: readonly LegendEntry[], left: number, top: number, maxWidth: number): string {
  const { places } = layout(entries, maxWidth);
  const items = entries.map((entry, k) => {
    const x = left + places[k].x;
    const mid = top + places[k].row * ROW_HEIGHT + ROW_HEIGHT / 2;
    const s = entry.swatch;
    const swatch =
      s.kind === 'point'
        ? pointSwatch(s.colour, s.mark, x + SWATCH_WIDTH / 2, mid)
        : s.kind === 'line'
        ? element('path', {
            d: `M${x},${mid}h${SWATCH_WIDTH}`,
            stroke: s.colour,
            'stroke-width': s.width ?? 1.5,
            'stroke-dasharray': s.dash,
            fill: 'none',
          })
        : element('rect', {
            x,
            y: mid - 4,
            width: SWATCH_WIDTH,
            height: 8,
            fill: s.colour,
            'fill-opacity': s.opacity,
            stroke: s.stroke,
            'stroke-width': s.stroke ? 0.7 : undefined,
          });
    return element('g', { class: 'legend-entry' }, [
      swatch,
      text(entry.label, x + SWATCH_WIDTH + 4, mid + TYPE.legend * 0.35, { size: TYPE.legend, fill: COLOURS.text }),
    ]);
  });
  return element('g', { class: 'legend' }, items);
}

function pointSwatch(colour: string, mark: 'errorbar' | 'triangle', cx: number, cy: number): string {
  if (mark === 'triangle') return element('path', { d: `M${cx},${cy + 4}l-4,-7h8z`, fill: colour, stroke: 'none' });
  return element('g', {}, [
    element('path', { d: `M${cx},${cy - 4.5}v9M${cx - 2.5},${cy - 4.5}h5M${cx - 2.5},${cy + 4.5}h5`, stroke: colour, 'stroke-width': 0.8, fill: 'none' }),
    element('circle', { cx, cy, r: 2, fill: colour }),
  ]);
}
