/**
 * Figures of the two analyses as the command line writes them (the browser draws them on screen
 * with its own chart and exports no figure of them): the committed change, length and volume of
 * the run so far continued by the run with the warming held; the sensitivity curve, steady
 * terminus and volume against held warming, warming-up branch solid, cooling-back branch dashed.
 * Same page, type, colours, panels and caption as the run figures (stackedPanels.ts).
 */
import type { CommittedChange } from '../model/analysis/committedChange';
import type { SteadyPoint } from '../model/analysis/sensitivityCurve';
import type { Scenario } from '../model/scenario';
import { captionBlock, captionMarkup, figureDocument, figureWidthPt, SIDE_MARGIN, TITLE_BLOCK, titleMarkup } from './figureDocument';
import { COLOURS, DEFAULT_WIDTH_MM } from './figureTheme';
import type { LegendEntry } from './legendMarkup';
import { stackHeight, stackMarkup, type PanelLine, type StackSpec } from './stackedPanels';

const DASH = '5 3';

function volumeScale(scenario: Scenario): { title: string; divisor: number } {
  return scenario.width ? { title: 'Volume (km³)', divisor: 1e9 } : { title: 'Volume (10⁶ m³ per m of width)', divisor: 1e6 };
}

function upperRange(lines: readonly PanelLine[]): [number, number] {
  let hi = 0;
  for (const line of lines) for (let i = 0; i < line.ys.length; i++) if (Number.isFinite(line.ys[i])) hi = Math.max(hi, line.ys[i]);
  return [0, Math.max(hi * 1.05, 1e-9)];
}

function page(scenario: Scenario, firnlineVersion: string, subject: string, stack: Omit<StackSpec, 'top'>, widthMm: number): string {
  const W = figureWidthPt(widthMm);
  const top = TITLE_BLOCK;
  const stackH = stackHeight(stack);
  const caption = captionBlock(scenario, firnlineVersion, W, true);
  const body = [titleMarkup(scenario.name, subject, W), stackMarkup({ ...stack, top }), captionMarkup(caption, top + stackH)];
  return figureDocument({ widthMm, heightPt: top + stackH + caption.height, title: subject, body: body.join('') });
}

export interface CommittedFigureInput {
  scenario: Scenario;
  firnlineVersion: string;
  /** The run's outputs up to the year held from. */
  runSoFar: readonly { time: number; length: number; volume: number }[];
  result: CommittedChange;
  widthMm?: number;
}

export function committedChangeFigure(input: CommittedFigureInput): string {
  const widthMm = input.widthMm ?? DEFAULT_WIDTH_MM;
  const W = figureWidthPt(widthMm);
  const { result, runSoFar } = input;
  const volume = volumeScale(input.scenario);
  const runTimes = runSoFar.map((f) => f.time);
  const heldTimes = result.path.map((p) => p.year);
  const legend: LegendEntry[] = [
    { label: 'Run so far', swatch: { kind: 'line', colour: COLOURS.length } },
    { label: 'Warming held', swatch: { kind: 'line', colour: COLOURS.warming, dash: DASH } },
  ];
  const panel = (key: string, title: string, run: number[], held: number[], withLegend: boolean) => {
    const lines: PanelLine[] = [
      { key: `${key}-run`, colour: COLOURS.length, xs: runTimes, ys: run },
      { key: `${key}-held`, colour: COLOURS.warming, dash: DASH, xs: heldTimes, ys: held },
    ];
    return { key, title, range: upperRange(lines), lines, ...(withLegend ? { legend } : {}) };
  };
  const first = runTimes[0] ?? result.year;
  const last = result.year + result.yearsToSteady;
  const stack: Omit<StackSpec, 'top'> = {
    left: 56,
    right: W - SIDE_MARGIN,
    panelHeight: Math.round(0.2 * W),
    gap: 14,
    xRange: [first, last > first ? last : first + 1],
    xTitle: 'Model year (a)',
    marker: { x: result.year, label: `held from ${result.year}` },
    panels: [
      panel('length', 'Length (km)', runSoFar.map((f) => f.length / 1000), result.path.map((p) => p.length / 1000), true),
      panel('volume', volume.title, runSoFar.map((f) => f.volume / volume.divisor), result.path.map((p) => p.volume / volume.divisor), false),
    ],
  };
  const subject = `Committed change: warming held from year ${result.year}${result.converged ? `, steady at year ${last}` : `, not steady by year ${last}`}`;
  return page(input.scenario, input.firnlineVersion, subject, stack, widthMm);
}

export interface SensitivityFigureInput {
  scenario: Scenario;
  firnlineVersion: string;
  points: readonly SteadyPoint[];
  widthMm?: number;
}

export function sensitivityFigure(input: SensitivityFigureInput): string {
  const widthMm = input.widthMm ?? DEFAULT_WIDTH_MM;
  const W = figureWidthPt(widthMm);
  const up = input.points.filter((p) => p.branch === 'up');
  // The down branch drawn from the top warming, where it leaves the up branch (as on screen).
  const down = [up[up.length - 1], ...input.points.filter((p) => p.branch === 'down')];
  const volume = volumeScale(input.scenario);
  const legend: LegendEntry[] = [
    { label: 'Warming up', swatch: { kind: 'line', colour: COLOURS.length } },
    { label: 'Cooling back', swatch: { kind: 'line', colour: COLOURS.ela, dash: DASH } },
  ];
  const panel = (key: string, title: string, value: (p: SteadyPoint) => number, withLegend: boolean) => {
    const lines: PanelLine[] = [
      { key: `${key}-up`, colour: COLOURS.length, xs: up.map((p) => p.warming), ys: up.map(value) },
      { key: `${key}-down`, colour: COLOURS.ela, dash: DASH, xs: down.map((p) => p.warming), ys: down.map(value) },
    ];
    for (const line of lines) line.include = (i) => Number.isFinite(line.ys[i]);
    return { key, title, range: upperRange(lines), lines, ...(withLegend ? { legend } : {}) };
  };
  const from = up[0].warming;
  const to = up[up.length - 1].warming;
  const stack: Omit<StackSpec, 'top'> = {
    left: 56,
    right: W - SIDE_MARGIN,
    panelHeight: Math.round(0.2 * W),
    gap: 14,
    xRange: [from, to > from ? to : from + 1],
    xTitle: 'Warming held (K)',
    panels: [panel('terminus', 'Steady terminus (km)', (p) => p.terminus / 1000, true), panel('volume', `Steady ${volume.title.toLowerCase()}`, (p) => p.volume / volume.divisor, false)],
  };
  const subject = `Steady-state sensitivity, ${from} to ${to} K, warming up and cooling back`;
  return page(input.scenario, input.firnlineVersion, subject, stack, widthMm);
}
