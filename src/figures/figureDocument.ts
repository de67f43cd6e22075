/**
 * The outer SVG document of an exported figure, and its caption and footer. The page is in points
 * with its printed size in millimetres, so the figure drops into a report at the size it was laid
 * out for. The footer (version and the caution) is on every figure; the parameter caption is
 * optional.
 */
import { CAUTION_TEXT } from '../outputs/caution';
import type { Scenario } from '../model/scenario';
import { parameterRows } from '../chart/parameterRows';
import { COLOURS, FONT_FAMILY, POINTS_PER_MM, TYPE } from './figureTheme';
import { element, escapeXml, num, text } from './svgMarkup';
import { textWidth, wrapText } from './textWidth';

export const SIDE_MARGIN = 12;
const LINE = TYPE.caption * 1.3;

export interface CaptionBlock {
  lines: { content: string; colour: string }[];
  height: number;
}

/** The key parameters in one sentence-like line each group, as the caption lists them. */
export function captionText(scenario: Scenario): string {
  // No-break spaces keep "2.4 × 10⁻²⁴" and a number with its unit on one caption line.
  const rows = parameterRows(scenario).map((row) => `${row.label}: ${row.value.replace(/ × /g, '\u00a0×\u00a0')}`);
  const scheme = scenario.numerics?.scheme === 'explicit' ? 'explicit' : 'implicit';
  const start = scenario.start;
  const spinUp = start
    ? start.from === 'observed'
      ? 'started at year 0 (the observation year) from the observed surface'
      : `started at year 0 (the observation year) from a transient past since year ${start.startYear}` +
        (start.climateOffset === undefined ? ' (climate offset fitted)' : ` (climate offset ${start.climateOffset} K)`)
    : scenario.spinup
      ? 'spun up to a steady state before year 0'
      : 'no spin-up';
  return `${rows.join('; ')}; ${scheme} time steps; ${spinUp}.`;
}

/** Caption (optional) and footer lines, wrapped to the figure width. */
export function captionBlock(
  scenario: Scenario,
  firnlineVersion: string,
  widthPt: number,
  withCaption: boolean,
  /** The version and caution footer; left out only where the page around carries both (report sheet). */
  withFooter = true,
): CaptionBlock {
  const maxWidth = widthPt - 2 * SIDE_MARGIN;
  const lines: CaptionBlock['lines'] = [];
  if (withCaption) {
    const name = scenario.name ? `${scenario.name}. ` : '';
    for (const l of wrapText(`${name}${captionText(scenario)}`, TYPE.caption, maxWidth)) lines.push({ content: l, colour: COLOURS.text });
  }
  if (withFooter) {
    for (const l of wrapText(`Firnline ${firnlineVersion}. ${CAUTION_TEXT}`, TYPE.caption, maxWidth)) {
      lines.push({ content: l, colour: COLOURS.muted });
    }
  }
  return { lines, height: lines.length > 0 ? lines.length * LINE + 4 : 0 };
}

export function captionMarkup(block: CaptionBlock, top: number): string {
  return element(
    'g',
    { class: 'caption' },
    block.lines.map((l, k) => text(l.content, SIDE_MARGIN, top + (k + 1) * LINE, { size: TYPE.caption, fill: l.colour })),
  );
}

export interface FigureDocument {
  widthMm: number;
  /** Height of the page [pt]; its printed height follows. */
  heightPt: number;
  /** Accessible title, also the figure's file title. */
  title: string;
  body: string;
}

export function figureWidthPt(widthMm: number): number {
  return widthMm * POINTS_PER_MM;
}

/** The complete SVG file (UTF-8, with XML declaration). */
export function figureDocument({ widthMm, heightPt, title, body }: FigureDocument): string {
  const widthPt = figureWidthPt(widthMm);
  const heightMm = heightPt / POINTS_PER_MM;
  return (
    '<?xml version="1.0" encoding="UTF-8"?>\n' +
    element(
      'svg',
      {
        xmlns: 'http://www.w3.org/2000/svg',
        version: '1.1',
        width: `${num(widthMm)}mm`,
        height: `${num(heightMm)}mm`,
        viewBox: `0 0 ${num(widthPt)} ${num(heightPt)}`,
        'font-family': FONT_FAMILY,
      },
      [
        `<title>${escapeXml(title)}</title>`,
        element('rect', { class: 'background', x: 0, y: 0, width: widthPt, height: heightPt, fill: '#ffffff' }),
        body,
      ],
    ) +
    '\n'
  );
}

/** Shortens `content` with an ellipsis so that it fits `maxWidth`. */
export function fitText(content: string, size: number, maxWidth: number): string {
  if (textWidth(content, size) <= maxWidth) return content;
  let cut = content;
  while (cut.length > 1 && textWidth(`${cut}…`, size) > maxWidth) cut = cut.slice(0, -1);
  return `${cut.trimEnd()}…`;
}

/**
 * The title block at the top left: the scenario's name in bold, and below it what the figure
 * shows and when ("Long profile, year 120"). Two lines, so long names never run off the page.
 */
export function titleMarkup(scenarioName: string | undefined, subject: string, widthPt: number): string {
  const maxWidth = widthPt - 2 * SIDE_MARGIN;
  return element('g', { class: 'figure-title' }, [
    text(fitText(scenarioName ?? 'Unnamed scenario', TYPE.title, maxWidth), SIDE_MARGIN, SIDE_MARGIN + TYPE.title, {
      size: TYPE.title,
      weight: 'bold',
      fill: COLOURS.text,
    }),
    text(fitText(subject, TYPE.axisTitle, maxWidth), SIDE_MARGIN, SIDE_MARGIN + TYPE.title + TYPE.axisTitle + 4, {
      size: TYPE.axisTitle,
      fill: COLOURS.text,
    }),
  ]);
}

export const TITLE_BLOCK = SIDE_MARGIN + TYPE.title + TYPE.axisTitle + 10;
