/**
 * Experiment figure: glacier length and volume against model year for every member, one line
 * each in its member style, over the min–max spread of each variant's sweep when there is one, or
 * the 5–95 % and 17–83 % percentile bands of each ensemble group for an uncertainty ensemble.
 * The caption lists the base scenario's parameters; the members' differences are in the legend.
 */
import type { Scenario } from '../model/scenario';
import { ENSEMBLE_BANDS, minMaxBand, percentileBand } from '../chart/spreadBand';
import { captionBlock, captionMarkup, figureDocument, figureWidthPt, SIDE_MARGIN, TITLE_BLOCK, titleMarkup } from './figureDocument';
import { COLOURS, DEFAULT_WIDTH_MM } from './figureTheme';
import { legendHeight, legendMarkup, type LegendEntry } from './legendMarkup';
import { stackHeight, stackMarkup, type PanelFill, type StackSpec } from './stackedPanels';

export interface ExperimentFigureMember {
  name: string;
  /** Members of one group (a variant across its sweep values) share a spread band. */
  group: number;
  /** Members of one ensemble group (differing only in their sample) share percentile bands. */
  ensembleGroup?: number;
  style: { colour: string; dash: string };
  times: ArrayLike<number>;
  /** [m] */
  length: ArrayLike<number>;
  /** [m^3] */
  volume: ArrayLike<number>;
}

export interface ExperimentFigureInput {
  experimentName: string;
  base: Scenario;
  members: readonly ExperimentFigureMember[];
  /** Draw the spread band of each group (the experiment sweeps a parameter). */
  bands: boolean;
  /** Draw the 5–95 % and 17–83 % percentile bands of each ensemble group instead of the range. */
  percentileBands?: boolean;
  firnlineVersion: string;
  caption: boolean;
  widthMm?: number;
}

/** Members named in the legend; beyond this the legend says how many more. */
export const MAX_LEGEND_MEMBERS = 21;

export function experimentFigure(input: ExperimentFigureInput): string {
  const widthMm = input.widthMm ?? DEFAULT_WIDTH_MM;
  const W = figureWidthPt(widthMm);
  const unitWidth = !input.base.width;
  const { members } = input;
  let years = 1;
  for (const m of members) if (m.times.length > 0) years = Math.max(years, m.times[m.times.length - 1]);

  const scaled = (f: (m: ExperimentFigureMember) => ArrayLike<number>, k: number) => (m: ExperimentFigureMember) => Float64Array.from(f(m), (v) => v / k);
  const panel = (key: 'length' | 'volume', title: string, values: (m: ExperimentFigureMember) => Float64Array) => {
    let hi = 0;
    const lines = members.map((m) => {
      const ys = values(m);
      for (const v of ys) if (Number.isFinite(v)) hi = Math.max(hi, v);
      return { key: `${key}-${m.name}`, colour: m.style.colour, dash: m.style.dash || undefined, xs: m.times, ys };
    });
    const fills: PanelFill[] = [];
    if (input.percentileBands) {
      const groups = new Map<number, ExperimentFigureMember[]>();
      for (const m of members) groups.set(m.ensembleGroup ?? 0, [...(groups.get(m.ensembleGroup ?? 0) ?? []), m]);
      for (const [group, list] of groups) {
        for (const b of ENSEMBLE_BANDS) {
          const band = percentileBand(list.map((m) => ({ times: m.times, values: values(m) })), b.low, b.high);
          if (band) fills.push({ key: `${key}-${group}-${b.key}`, colour: groups.size > 1 ? list[0].style.colour : COLOURS.muted, opacity: b.opacity, xs: band.times, low: band.low, high: band.high });
        }
      }
    } else if (input.bands) {
      const groups = new Map<number, ExperimentFigureMember[]>();
      for (const m of members) groups.set(m.group, [...(groups.get(m.group) ?? []), m]);
      for (const [group, list] of groups) {
        const band = minMaxBand(list.map((m) => ({ times: m.times, values: values(m) })));
        if (band) fills.push({ key: `${key}-${group}`, colour: list[0].style.colour, opacity: 0.18, xs: band.times, low: band.low, high: band.high });
      }
    }
    return { key, title, range: [0, Math.max(hi * 1.05, 1e-9)] as [number, number], lines, fills };
  };

  const entries: LegendEntry[] = members.slice(0, MAX_LEGEND_MEMBERS).map((m) => ({ label: m.name, swatch: { kind: 'line', colour: m.style.colour, dash: m.style.dash || undefined } }));
  if (members.length > MAX_LEGEND_MEMBERS) entries.push({ label: `and ${members.length - MAX_LEGEND_MEMBERS} more members`, swatch: { kind: 'line', colour: COLOURS.muted } });
  if (input.percentileBands) for (const b of ENSEMBLE_BANDS) entries.push({ label: b.label, swatch: { kind: 'fill', colour: COLOURS.muted, opacity: b.opacity } });
  else if (input.bands) entries.push({ label: 'Range over the sweep', swatch: { kind: 'fill', colour: COLOURS.muted, opacity: 0.18 } });

  const stack: Omit<StackSpec, 'top'> = {
    left: 56,
    right: W - SIDE_MARGIN,
    panelHeight: Math.round(0.2 * W),
    gap: 14,
    xRange: [0, years],
    xTitle: 'Model year (a)',
    panels: [
      panel('length', 'Length (km)', scaled((m) => m.length, 1000)),
      unitWidth ? panel('volume', 'Volume (10⁶ m³ per m of width)', scaled((m) => m.volume, 1e6)) : panel('volume', 'Volume (km³)', scaled((m) => m.volume, 1e9)),
    ],
  };
  const legendTop = TITLE_BLOCK;
  const legendH = legendHeight(entries, W - 2 * SIDE_MARGIN);
  const top = legendTop + legendH + 6;
  const stackH = stackHeight(stack);
  const caption = captionBlock(input.base, input.firnlineVersion, W, input.caption);
  const subject = `Length and volume of ${members.length} member${members.length === 1 ? '' : 's'}, years 0–${years}`;
  const body = [
    titleMarkup(input.experimentName, subject, W),
    legendMarkup(entries, SIDE_MARGIN, legendTop, W - 2 * SIDE_MARGIN),
    stackMarkup({ ...stack, top }),
    captionMarkup(caption, top + stackH),
  ];
  return figureDocument({ widthMm, heightPt: top + stackH + caption.height, title: subject, body: body.join('') });
}
