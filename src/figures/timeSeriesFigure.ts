/**
 * Time-series figure: length, volume, ELA and warming against model year as stacked panels (the
 * same panels, units and ranges as the workbench view), with an optional marker at one year.
 */
import { panelRange, seriesPanels } from '../chart/seriesPanels';
import { captionBlock, captionMarkup, figureDocument, figureWidthPt, SIDE_MARGIN, TITLE_BLOCK, titleMarkup } from './figureDocument';
import type { FigureRun } from './figureRun';
import { COLOURS, DEFAULT_WIDTH_MM } from './figureTheme';
import { stackHeight, stackMarkup, type StackSpec } from './stackedPanels';

export interface TimeSeriesFigureOptions {
  caption: boolean;
  /** Model year to mark, e.g. the year shown in the workbench. */
  markYear?: number;
  widthMm?: number;
  /** Height of each panel's plot [pt] (default 11 % of the width). */
  panelHeightPt?: number;
  /** Version and caution footer (default on). */
  footer?: boolean;
}

const PANEL_COLOURS = { length: COLOURS.length, volume: COLOURS.volume, ela: COLOURS.ela, warming: COLOURS.warming };

export function timeSeriesFigure(run: FigureRun, options: TimeSeriesFigureOptions): string {
  const widthMm = options.widthMm ?? DEFAULT_WIDTH_MM;
  const W = figureWidthPt(widthMm);
  const times = Float64Array.from(run.frames, (f) => f.time);
  const first = times[0];
  const last = times[times.length - 1];
  const panels = seriesPanels(run.frames, !run.scenario.width).map((p) => ({
    key: p.key,
    title: p.title,
    range: panelRange(p),
    lines: [{ key: p.key, colour: PANEL_COLOURS[p.key], xs: times, ys: p.values }],
  }));
  const stack: Omit<StackSpec, 'top'> = {
    left: 56,
    right: W - SIDE_MARGIN,
    panelHeight: options.panelHeightPt ?? Math.round(0.11 * W),
    gap: 12,
    xRange: [first, last > first ? last : first + 1],
    xTitle: 'Model year (a)',
    panels,
    marker: options.markYear === undefined ? undefined : { x: options.markYear, label: `year ${options.markYear}` },
  };
  const top = TITLE_BLOCK;
  const stackH = stackHeight(stack);
  const caption = captionBlock(run.scenario, run.firnlineVersion, W, options.caption, options.footer);
  const height = top + stackH + caption.height;
  const span = `years ${first}–${last}`;
  const body = [
    titleMarkup(run.scenario.name, `Length, volume, ELA and warming, ${span}`, W),
    stackMarkup({ ...stack, top }),
    captionMarkup(caption, top + stackH),
  ];
  return figureDocument({ widthMm, heightPt: height, title: `Length, volume, ELA and warming, ${span}`, body: body.join('') });
}
