/**
 * Long-profile figure: bed, ice and ELA at one model year, or the ice surfaces of several years
 * (a snapshot series) in an ordered colour-blind-safe sequence with a labelled key. Axis titles
 * with units and the vertical exaggeration are always printed.
 */
import { interpolateViridis, max } from 'd3';
import { exaggerationLabel, longProfileGeometry, type LongProfileGeometry, type ProfileSamples } from '../chart/longProfile';
import { axesMarkup, gridMarkup } from './axesMarkup';
import { captionBlock, captionMarkup, figureDocument, figureWidthPt, SIDE_MARGIN, TITLE_BLOCK, titleMarkup } from './figureDocument';
import { frameAt, type FigureFrame, type FigureRun } from './figureRun';
import { COLOURS, DEFAULT_WIDTH_MM, TYPE } from './figureTheme';
import { lakesAt, lakesMarkup } from './lakesMarkup';
import { impliedBed, valueRange } from '../chart/observationMarks';
import { observedTerminus as observedTerminusAt } from '../model/observedTerminus';
import { interpolateAt } from '../model/analysis/observationMisfit';
import { errorBarsMarkup, legendFor, terminusMarkup } from './observationsMarkup';
import { debrisBandLabel, debrisBands } from '../chart/debrisBands';
import { legendHeight, legendMarkup, type LegendEntry } from './legendMarkup';
import { element, pathData, text } from './svgMarkup';
import { textWidth } from './textWidth';

export interface ProfileFigureOptions {
  /** Model years to show; one gives a filled snapshot, several a series of surfaces. */
  years: readonly number[];
  caption: boolean;
  widthMm?: number;
  /** Plot height as a share of the figure width (default 0.42). */
  plotHeightRatio?: number;
  /** Version and caution footer (default on). */
  footer?: boolean;
}

const LEFT = 56;
const X_TITLE = 'Distance down-valley (km)';
const AXIS_BELOW = 30;

/**
 * Colours of a series of n years, earliest first: viridis (perceptually ordered and readable with
 * the common colour-vision deficiencies; van der Walt & Smith 2015), stopping short of its palest
 * yellow so every line shows on white.
 */
export function sequenceColours(n: number): string[] {
  if (n === 1) return [interpolateViridis(0)];
  return Array.from({ length: n }, (_, k) => interpolateViridis((0.85 * k) / (n - 1)));
}

function samplesOf(run: FigureRun, frame: FigureFrame): ProfileSamples {
  return {
    x: Array.from(run.grid.x),
    bed: Array.from(run.grid.bed),
    surface: Array.from(frame.fields.surface),
    thickness: Array.from(frame.fields.thickness),
  };
}

/** "year 120", or "years 0–300" for a series. */
export function yearsText(frames: readonly FigureFrame[]): string {
  if (frames.length === 1) return `year ${frames[0].time}`;
  return `years ${frames[0].time}–${frames[frames.length - 1].time}`;
}

/** The distinct frames for the requested years (nearest output to each), in time order. */
export function framesForYears(run: FigureRun, years: readonly number[]): FigureFrame[] {
  const chosen = new Set<FigureFrame>();
  for (const y of years) chosen.add(frameAt(run, y));
  return [...chosen].sort((a, b) => a.time - b.time);
}

export function profileFigure(run: FigureRun, options: ProfileFigureOptions): string {
  const frames = framesForYears(run, options.years);
  const widthMm = options.widthMm ?? DEFAULT_WIDTH_MM;
  const W = figureWidthPt(widthMm);
  const series = frames.length > 1;
  const colours = sequenceColours(frames.length);

  // ELAs of the first and last year shown (they differ when the climate warms).
  const elas = [...new Set([frames[0].numbers.ela, frames[frames.length - 1].numbers.ela].filter(Number.isFinite))];
  const entries: LegendEntry[] = [{ label: 'Bed', swatch: { kind: 'fill', colour: COLOURS.bedFill, stroke: COLOURS.bedLine } }];
  if (series) {
    frames.forEach((f, k) => entries.push({ label: `Ice surface, year ${f.time}`, swatch: { kind: 'line', colour: colours[k] } }));
  } else {
    entries.push({ label: `Ice, year ${frames[0].time}`, swatch: { kind: 'fill', colour: COLOURS.iceFill, stroke: COLOURS.iceLine } });
  }
  const lakes = series ? [] : lakesAt(run.grid, frames[0]);
  if (lakes.length > 0) entries.push({ label: 'Lake', swatch: { kind: 'fill', colour: COLOURS.water, opacity: 0.75 } });
  const debris = series ? [] : debrisBands(run.scenario.debris, { x: run.grid.x, surface: frames[0].fields.surface, thickness: frames[0].fields.thickness }, (x) => x, (z) => z);
  if (debris.length > 0) {
    const thickest = Math.max(...debris.map((b) => b.maxThickness));
    entries.push({ label: `Debris cover (up to ${Number(thickest.toPrecision(2))} m thick)`, swatch: { kind: 'line', colour: COLOURS.debris, width: 4 } });
  }
  if (elas.length > 0) entries.push({ label: 'ELA', swatch: { kind: 'line', colour: COLOURS.ela, dash: '5 3', width: 1 } });
  // Observations as the screen draws them: measured thickness as the bed it implies under the
  // surface shown (a series: the surface of the output nearest the observation year).
  const observations = run.scenario.observations;
  const observationYear = observations?.year ?? 0;
  const under = series ? frameAt(run, observationYear) : frames[0];
  const implied = observations?.thickness?.length ? impliedBed(observations.thickness, run.grid.x, under.fields.surface, run.grid.length) : [];
  // The terminus of the observation year: a single position, or the record's at that year.
  const observedTerminus = observedTerminusAt(observations) ?? null;
  const terminusShown = observedTerminus !== null && observedTerminus >= 0 && observedTerminus <= run.grid.length;
  if (implied.length > 0) entries.push(legendFor.thickness(observationYear));
  if (terminusShown) entries.push(legendFor.terminus(observationYear));

  const legendTop = TITLE_BLOCK;
  const legendH = legendHeight(entries, W - 2 * SIDE_MARGIN);
  const plotTop = legendTop + legendH + 8;
  const plotHeight = Math.round((options.plotHeightRatio ?? 0.42) * W);
  const caption = captionBlock(run.scenario, run.firnlineVersion, W, options.caption, options.footer);
  const plotBottom = plotTop + plotHeight;
  // The exaggeration goes beside the axis title, or on a line of its own when the two would meet.
  const plotLeft = LEFT;
  const plotRight = W - SIDE_MARGIN;
  const titleEnd = (plotLeft + plotRight) / 2 + textWidth(X_TITLE, TYPE.axisTitle) / 2;
  const veDrop = titleEnd + 8 > plotRight - textWidth(exaggerationLabel(9.9), TYPE.tick) ? TYPE.tick + 4 : 0;
  const height = plotBottom + AXIS_BELOW + veDrop + caption.height;

  const size = { width: W, height, margin: { top: plotTop, right: SIDE_MARGIN, bottom: height - plotBottom, left: LEFT } };
  const alsoShow = [...elas, ...frames.map((f) => max(f.fields.surface) ?? -Infinity), ...(valueRange(implied) ?? [])];
  const ticks = { x: 60, z: 40 };
  const geometries = frames.map((f) => longProfileGeometry(samplesOf(run, f), run.grid.length, null, size, alsoShow, ticks));
  const g: LongProfileGeometry = geometries[0];
  const area = g.plotArea;
  const axes = {
    area,
    xTicks: g.xTicks,
    yTicks: g.zTicks,
    xTitle: X_TITLE,
    yTitle: 'Elevation (m a.s.l.)',
  };

  const body: string[] = [titleMarkup(run.scenario.name, `Long profile, ${yearsText(frames)}`, W)];
  body.push(legendMarkup(entries, SIDE_MARGIN, legendTop, W - 2 * SIDE_MARGIN));
  body.push(gridMarkup(axes));
  body.push(element('path', { class: 'bed-fill', d: pathData(g.bedArea, true), fill: COLOURS.bedFill, stroke: 'none' }));
  if (series) {
    geometries.forEach((geometry, k) => {
      const d = geometry.iceBodies.map((b) => pathData(b.surface)).join('');
      body.push(element('path', { class: 'ice-surface', 'data-year': frames[k].time, d, fill: 'none', stroke: colours[k], 'stroke-width': 1.3 }));
    });
  } else {
    const d = g.iceBodies.map((b) => pathData(b.polygon, true)).join('');
    body.push(element('path', { class: 'ice-fill', d, fill: COLOURS.iceFill, 'fill-opacity': 0.85, stroke: 'none' }));
    const s = g.iceBodies.map((b) => pathData(b.surface)).join('');
    body.push(element('path', { class: 'ice-surface', 'data-year': frames[0].time, d: s, fill: 'none', stroke: COLOURS.iceLine, 'stroke-width': 1.2 }));
  }
  if (debris.length > 0) {
    // Recomputed in pixels now that the geometry is known.
    const bands = debrisBands(run.scenario.debris, { x: run.grid.x, surface: frames[0].fields.surface, thickness: frames[0].fields.thickness }, g.xPixel, g.zPixel);
    body.push(
      element(
        'g',
        { class: 'debris' },
        bands.map((b) => element('path', { class: 'debris-band', d: pathData(b.line), fill: 'none', stroke: COLOURS.debris, 'stroke-width': 3.5 }, [element('title', {}, [debrisBandLabel(b)])])),
      ),
    );
  }
  if (lakes.length > 0) body.push(lakesMarkup(lakes, run.grid, g, !run.scenario.width));
  body.push(element('path', { class: 'bed-line', d: pathData(g.bedLine), fill: 'none', stroke: COLOURS.bedLine, 'stroke-width': 1 }));
  elas.forEach((ela, k) => {
    const y = g.zPixel(ela);
    const year = k === 0 ? frames[0].time : frames[frames.length - 1].time;
    const label = elas.length > 1 ? `ELA ${Math.round(ela)} m a.s.l. (year ${year})` : `ELA ${Math.round(ela)} m a.s.l.`;
    body.push(
      element('g', { class: 'ela' }, [
        element('path', { d: `M${area.left},${y}H${area.right}`, stroke: COLOURS.ela, 'stroke-width': 1, 'stroke-dasharray': '5 3', fill: 'none' }),
        text(label, area.right - 4, y - 3, { size: TYPE.legend, anchor: 'end', fill: COLOURS.elaText }),
      ]),
    );
  });
  body.push(errorBarsMarkup('thickness', implied, g.xPixel, g.zPixel, area));
  if (terminusShown) body.push(terminusMarkup(g.xPixel(observedTerminus), g.zPixel(interpolateAt(run.grid.x, under.fields.surface, observedTerminus))));
  body.push(axesMarkup(axes));
  body.push(
    element(
      'g',
      { class: 'exaggeration' },
      text(exaggerationLabel(g.verticalExaggeration), area.right, area.bottom + AXIS_BELOW - 4 + veDrop, { size: TYPE.tick, anchor: 'end', fill: COLOURS.muted }),
    ),
  );
  body.push(captionMarkup(caption, plotBottom + AXIS_BELOW + veDrop));
  return figureDocument({ widthMm, heightPt: height, title: `Long profile, ${yearsText(frames)}`, body: body.join('') });
}
