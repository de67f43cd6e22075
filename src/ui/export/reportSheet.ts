/**
 * The one-page report sheet (PDF, A4 or Letter): title, version and date; the long profile at the
 * chosen year; the time series; tables of parameters, outcomes, the mass budget and (with
 * observations) the misfit at that year; the caution.
 * Figures are the exported SVG figures converted with svg2pdf.js, so text stays text; the page
 * uses the standard PDF Helvetica, which every reader has.
 */
import type { jsPDF as JsPdf } from 'jspdf';
import { CAUTION_TEXT } from '../../outputs/caution';
import { lakesAt } from '../../figures/lakesMarkup';
import type { FigureRun } from '../../figures/figureRun';
import { frameAt } from '../../figures/figureRun';
import { profileFigure } from '../../figures/profileFigure';
import { SUPERSCRIPT_DIGITS } from '../../figures/svgMarkup';
import { timeSeriesFigure } from '../../figures/timeSeriesFigure';
import type { RunSummary } from '../../model/runScenario';
import { parameterRows } from '../../chart/parameterRows';
import { observationMisfit } from '../../model/analysis/observationMisfit';
import type { ObservedPoint } from '../../model/scenario';
import { massBudgetRows, outcomeRows, type ReportRow } from './reportRows';
import { svgPageSize } from './rasterise';
import { loadPdfLibraries, parseSvgElement } from './svgToPdf';

export type Paper = 'a4' | 'letter';

export const PAPER_SIZES_PT: Record<Paper, [number, number]> = { a4: [595.28, 841.89], letter: [612, 792] };
const MARGIN = 36;
const TEXT = '#1a1a1a';
const MUTED = '#4d4d4d';

/** Runs of plain and raised text; the true minus becomes a hyphen (the standard fonts lack it). */
function richRuns(text: string): { text: string; raised: boolean }[] {
  const runs: { text: string; raised: boolean }[] = [];
  for (const ch of text.replace(/\u2212/g, '-').replace(/→/g, 'to')) {
    const raised = ch in SUPERSCRIPT_DIGITS;
    const c = raised ? SUPERSCRIPT_DIGITS[ch] : ch;
    const lastRun = runs[runs.length - 1];
    if (lastRun && lastRun.raised === raised) lastRun.text += c;
    else runs.push({ text: c, raised });
  }
  return runs;
}

function richWidth(pdf: JsPdf, text: string, size: number): number {
  let w = 0;
  for (const run of richRuns(text)) {
    pdf.setFontSize(run.raised ? size * 0.7 : size);
    w += pdf.getTextWidth(run.text);
  }
  pdf.setFontSize(size);
  return w;
}

function drawRich(pdf: JsPdf, text: string, x: number, y: number, size: number): void {
  let at = x;
  for (const run of richRuns(text)) {
    pdf.setFontSize(run.raised ? size * 0.7 : size);
    pdf.text(run.text, at, run.raised ? y - size * 0.35 : y);
    at += pdf.getTextWidth(run.text);
  }
  pdf.setFontSize(size);
}

/** Words of `text` packed into lines no wider than `width`. */
function wrapRich(pdf: JsPdf, text: string, size: number, width: number): string[] {
  const lines: string[] = [];
  let line = '';
  for (const word of text.split(/ +/)) {
    const candidate = line === '' ? word : `${line} ${word}`;
    if (line !== '' && richWidth(pdf, candidate, size) > width) {
      lines.push(line);
      line = word;
    } else line = candidate;
  }
  if (line !== '') lines.push(line);
  return lines;
}

/** A heading and label/value rows; returns the y below the table. */
function drawTable(pdf: JsPdf, heading: string, rows: readonly ReportRow[], x: number, y: number, width: number): number {
  const size = 7.5;
  const lineHeight = size * 1.3;
  pdf.setFont('helvetica', 'bold');
  pdf.setFontSize(9);
  pdf.setTextColor(TEXT);
  pdf.text(heading, x, y);
  y += 12;
  const labelWidth = width * 0.42;
  for (const row of rows) {
    pdf.setFont('helvetica', 'normal');
    const labels = wrapRich(pdf, row.label, size, labelWidth - 6);
    const values = wrapRich(pdf, row.value, size, width - labelWidth);
    pdf.setTextColor(MUTED);
    labels.forEach((l, k) => drawRich(pdf, l, x, y + k * lineHeight, size));
    pdf.setTextColor(TEXT);
    values.forEach((v, k) => drawRich(pdf, v, x + labelWidth, y + k * lineHeight, size));
    y += Math.max(labels.length, values.length) * lineHeight + 2;
  }
  return y + 6;
}

async function drawFigure(pdf: JsPdf, svg: string, x: number, y: number, width: number): Promise<number> {
  const page = svgPageSize(svg);
  const height = (width * page.height) / page.width;
  await pdf.svg(parseSvgElement(svg), { x, y, width, height });
  return height;
}

export interface ReportInput {
  run: FigureRun;
  summary: RunSummary;
  /** The model year the profile shows (the year selected in the workbench). */
  year: number;
  paper: Paper;
  /** ISO date, e.g. "2026-12-02". */
  date: string;
}

/**
 * Misfit of the shown year to the scenario's measured thickness and surface speed, model minus
 * observed (model/analysis/observationMisfit.ts): RMS, bias and count, one short row each so the
 * sheet stays one page; and the years compared. None without such observations.
 */
export function reportMisfitRows(run: FigureRun, year: number): ReportRow[] {
  const observations = run.scenario.observations;
  const frame = frameAt(run, year);
  const rows: ReportRow[] = [];
  const add = (name: string, points: readonly ObservedPoint[] | undefined, values: ArrayLike<number>, unit: string, decimals: number) => {
    if (!points?.length) return;
    const m = observationMisfit(run.grid.x, values, run.grid.length, points);
    const signed = (v: number) => `${v > 0 ? '+' : v < 0 ? '\u2212' : ''}${Math.abs(v).toFixed(decimals)}`;
    rows.push(
      m
        ? { label: `${name} (${m.count} point${m.count === 1 ? '' : 's'})`, value: `RMS ${m.rms.toFixed(decimals)} ${unit}, bias ${signed(m.bias)} ${unit}` }
        : { label: name, value: 'no observation inside the domain' },
    );
  };
  add('Thickness', observations?.thickness, frame.fields.thickness, 'm', 0);
  add('Surface speed', observations?.surfaceSpeed, frame.fields.surfaceSpeed, 'm a⁻¹', 1);
  if (rows.length) rows.push({ label: 'Compared', value: `model year ${frame.time} with observations of year ${observations?.year ?? 0}` });
  return rows;
}

export async function reportSheet(input: ReportInput): Promise<Blob> {
  const { jsPDF } = await loadPdfLibraries();
  const [pageW, pageH] = PAPER_SIZES_PT[input.paper];
  const pdf = new jsPDF({ unit: 'pt', format: input.paper, orientation: 'portrait', compress: true });
  const { run } = input;
  const title = run.scenario.name ?? 'Unnamed scenario';
  pdf.setProperties({ title: `${title}: report sheet`, creator: `Firnline ${run.firnlineVersion}` });
  const contentW = pageW - 2 * MARGIN;
  let y = MARGIN + 12;

  pdf.setFont('helvetica', 'bold');
  pdf.setFontSize(14);
  pdf.setTextColor(TEXT);
  pdf.text(wrapRich(pdf, title, 14, contentW)[0], MARGIN, y);
  y += 15;
  pdf.setFont('helvetica', 'normal');
  pdf.setFontSize(8.5);
  pdf.setTextColor(MUTED);
  const frame = frameAt(run, input.year);
  const last = run.frames[run.frames.length - 1];
  pdf.text(`Flowline model run, years ${run.frames[0].time}-${last.time}. Report sheet made with Firnline ${run.firnlineVersion} on ${input.date}.`, MARGIN, y);
  y += 8;

  const mm = (pt: number) => pt / (72 / 25.4);
  const profile = profileFigure(run, { years: [frame.time], caption: false, footer: false, widthMm: mm(contentW), plotHeightRatio: 0.3 });
  y += await drawFigure(pdf, profile, MARGIN, y, contentW);

  const columnW = (contentW - 14) / 2;
  const series = timeSeriesFigure(run, { caption: false, footer: false, widthMm: mm(columnW), markYear: frame.time, panelHeightPt: 40 });
  const seriesH = await drawFigure(pdf, series, MARGIN, y, columnW);

  const tableX = MARGIN + columnW + 14;
  let tableY = y + 14;
  const unitWidth = !run.scenario.width;
  tableY = drawTable(pdf, 'Parameters', parameterRows(run.scenario), tableX, tableY, columnW);
  tableY = drawTable(pdf, 'Outcomes', outcomeRows(run.frames, input.summary, unitWidth, lakesAt(run.grid, last)), tableX, tableY, columnW);
  tableY = drawTable(pdf, 'Mass budget', massBudgetRows(input.summary, unitWidth), tableX, tableY, columnW);
  // The misfit goes under the time series, where the left column has room.
  const misfit = reportMisfitRows(run, frame.time);
  const leftBottom = misfit.length ? drawTable(pdf, 'Misfit to observations, model minus observed', misfit, MARGIN, y + seriesH + 14, columnW) : y + seriesH;
  y = Math.max(leftBottom, tableY) + 6;

  pdf.setDrawColor('#e69f00');
  pdf.setLineWidth(2);
  const caution = wrapRich(pdf, `Caution. ${CAUTION_TEXT}`, 8, contentW - 10);
  pdf.line(MARGIN, y - 8, MARGIN, y + caution.length * 10.5 - 6);
  pdf.setFont('helvetica', 'normal');
  pdf.setTextColor(TEXT);
  caution.forEach((line, k) => drawRich(pdf, line, MARGIN + 8, y + k * 10.5, 8));
  y += caution.length * 10.5;

  pdf.setFontSize(7);
  pdf.setTextColor(MUTED);
  pdf.text(`Firnline ${run.firnlineVersion} · ${input.date} · the scenario file reproduces this run`, MARGIN, pageH - MARGIN / 2);
  if (y > pageH - MARGIN) throw new Error(`the report sheet did not fit on one page (${Math.ceil(y - (pageH - MARGIN))} pt too long)`);
  return pdf.output('blob');
}
