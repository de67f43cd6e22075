/**
 * What each export button makes, from the run on screen: the figure SVG text (the same pure code
 * as `firnline run --figures`), converted to PNG or PDF in the browser; the data archive; the
 * report sheet. Returns a file to download, or throws an Error whose message is for the user.
 */
import { alongFlowFigure } from '../../figures/alongFlowFigure';
import { FIGURE_FILE_NAMES } from '../../figures/figureFileNames';
import type { FigureRun } from '../../figures/figureRun';
import { profileFigure } from '../../figures/profileFigure';
import { snapshotYears } from '../../figures/snapshotYears';
import { timeSeriesFigure } from '../../figures/timeSeriesFigure';
import { runArchive } from '../../outputs/runArchive';
import { validateScenario } from '../../scenario/validateScenario';
import type { RunSummary } from '../../model/runScenario';
import { scenarioFileName } from '../app/downloadScenario';
import type { ExportSettings } from './exportSettings';
import { svgToPng } from './rasterise';
import { reportSheet, type Paper } from './reportSheet';
import { svgToPdf } from './svgToPdf';

export type FigureKind = 'profile' | 'snapshots' | 'along-flow' | 'time-series';
export type FigureFormat = 'svg' | 'png' | 'pdf';
export type ProfileChoice = 'all' | 'shown' | 'snapshots';

export const FIGURE_KINDS: { kind: FigureKind; label: string }[] = [
  { kind: 'profile', label: 'Long profile at the shown year' },
  { kind: 'snapshots', label: 'Long profile, snapshot series' },
  { kind: 'along-flow', label: 'Speed and driving stress at the shown year' },
  { kind: 'time-series', label: 'Length, volume, ELA and warming through time' },
];

export interface ExportFile {
  blob: Blob;
  fileName: string;
}

/** Scenario file name without ".json": the stem of every export's name. */
export function exportStem(run: FigureRun): string {
  return scenarioFileName(run.scenario).replace(/\.json$/, '');
}

export function figureSvg(run: FigureRun, kind: FigureKind, year: number, settings: ExportSettings, caption: boolean): { svg: string; name: string } {
  const widthMm = settings.widthMm;
  switch (kind) {
    case 'profile':
      return { svg: profileFigure(run, { years: [year], caption, widthMm }), name: FIGURE_FILE_NAMES.profile(year) };
    case 'snapshots': {
      const years = snapshotYears(run.frames.map((f) => f.time), settings.every);
      return { svg: profileFigure(run, { years, caption, widthMm }), name: FIGURE_FILE_NAMES.snapshots(settings.every) };
    }
    case 'along-flow':
      return { svg: alongFlowFigure(run, { year, caption, widthMm }), name: FIGURE_FILE_NAMES.alongFlow(year) };
    case 'time-series':
      return { svg: timeSeriesFigure(run, { caption, widthMm }), name: FIGURE_FILE_NAMES.timeSeries };
  }
}

export async function figureFile(
  run: FigureRun,
  kind: FigureKind,
  format: FigureFormat,
  year: number,
  settings: ExportSettings,
  caption: boolean,
): Promise<ExportFile> {
  const { svg, name } = figureSvg(run, kind, year, settings, caption);
  const fileName = `${exportStem(run)}_${name}.${format}`;
  return { blob: await figureBlob(svg, format, settings.widthMm, settings.dpi, name), fileName };
}

/** A figure's SVG as the chosen file: as it is, a PNG of the printed width at `dpi`, or a PDF. */
export async function figureBlob(svg: string, format: FigureFormat, widthMm: number, dpi: number, pdfTitle: string): Promise<Blob> {
  if (format === 'svg') return new Blob([svg], { type: 'image/svg+xml' });
  if (format === 'png') return svgToPng(svg, widthMm, dpi);
  return svgToPdf(svg, pdfTitle);
}

export function dataFile(run: FigureRun, summary: RunSummary, choice: ProfileChoice, year: number, settings: ExportSettings, date: string): ExportFile {
  const times = run.frames.map((f) => f.time);
  const profileYears = choice === 'all' ? undefined : choice === 'shown' ? [year] : snapshotYears(times, settings.every);
  const check = validateScenario(run.scenario);
  const scenarioName = scenarioFileName(run.scenario);
  const bytes = runArchive({
    scenario: run.scenario,
    grid: { x: Float64Array.from(run.grid.x), bed: Float64Array.from(run.grid.bed), width: Float64Array.from(run.grid.width) },
    frames: run.frames,
    summary,
    validatorWarnings: check.warnings,
    firnlineVersion: run.firnlineVersion,
    profileYears,
    date,
    scenarioFileName: scenarioName,
  });
  return { blob: new Blob([bytes as BlobPart], { type: 'application/zip' }), fileName: `${exportStem(run)}_data.zip` };
}

export async function reportFile(run: FigureRun, summary: RunSummary, year: number, paper: Paper, date: string): Promise<ExportFile> {
  const blob = await reportSheet({ run, summary, year, paper, date });
  return { blob, fileName: `${exportStem(run)}_report-${paper}.pdf` };
}

/** Today's date in the user's calendar, as YYYY-MM-DD. */
export function isoDate(now: Date = new Date()): string {
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${now.getFullYear()}-${pad(now.getMonth() + 1)}-${pad(now.getDate())}`;
}
