/**
 * Along-flow figure at one model year: surface and sliding speed, and driving stress, against
 * distance down the flowline, drawn over the ice-covered cells only.
 */
import { captionBlock, captionMarkup, figureDocument, figureWidthPt, SIDE_MARGIN, TITLE_BLOCK, titleMarkup } from './figureDocument';
import { frameAt, type FigureRun } from './figureRun';
import { COLOURS, DEFAULT_WIDTH_MM } from './figureTheme';
import { withinRange } from '../chart/observationMarks';
import { legendFor } from './observationsMarkup';
import { stackHeight, stackMarkup, type StackSpec } from './stackedPanels';

export interface AlongFlowFigureOptions {
  year: number;
  caption: boolean;
  widthMm?: number;
  /** Version and caution footer (default on). */
  footer?: boolean;
}

function maxOf(values: ArrayLike<number>, include: (i: number) => boolean): number {
  let m = 0;
  for (let i = 0; i < values.length; i++) if (include(i) && Number.isFinite(values[i])) m = Math.max(m, values[i]);
  return m;
}

export function alongFlowFigure(run: FigureRun, options: AlongFlowFigureOptions): string {
  const frame = frameAt(run, options.year);
  const widthMm = options.widthMm ?? DEFAULT_WIDTH_MM;
  const W = figureWidthPt(widthMm);
  const xKm = Float64Array.from(run.grid.x, (x) => x / 1000);
  const onIce = (i: number) => frame.fields.thickness[i] > 0;
  const { surfaceSpeed, slidingSpeed, drivingStress } = frame.fields;
  // Measured surface speeds with their error bars, as on the screen (x in km, as the axis).
  const observationYear = run.scenario.observations?.year ?? 0;
  const measured = withinRange(run.scenario.observations?.surfaceSpeed ?? [], run.grid.length).map((p) => ({ ...p, x: p.x / 1000 }));
  const measuredTop = measured.reduce((m, p) => Math.max(m, p.value + p.sigma), 0);
  const stack: Omit<StackSpec, 'top'> = {
    left: 56,
    right: W - SIDE_MARGIN,
    panelHeight: Math.round(0.2 * W),
    gap: 14,
    xRange: [0, run.grid.length / 1000],
    xTitle: 'Distance down-valley (km)',
    panels: [
      {
        key: 'speed',
        title: 'Speed (m a⁻¹)',
        range: [0, Math.max(1, maxOf(surfaceSpeed, onIce), measuredTop)],
        lines: [
          { key: 'surface-speed', colour: COLOURS.speed, xs: xKm, ys: surfaceSpeed, include: onIce },
          { key: 'sliding-speed', colour: COLOURS.sliding, dash: '5 3', xs: xKm, ys: slidingSpeed, include: onIce },
        ],
        legend: [
          { label: 'Surface speed (deformation + sliding)', swatch: { kind: 'line', colour: COLOURS.speed } },
          { label: 'Sliding speed', swatch: { kind: 'line', colour: COLOURS.sliding, dash: '5 3' } },
          ...(measured.length ? [legendFor.speed(observationYear)] : []),
        ],
        ...(measured.length ? { points: measured } : {}),
      },
      {
        key: 'stress',
        title: 'Driving stress (kPa)',
        range: [0, Math.max(1, maxOf(drivingStress, onIce))],
        lines: [{ key: 'driving-stress', colour: COLOURS.stress, xs: xKm, ys: drivingStress, include: onIce }],
      },
    ],
  };
  const top = TITLE_BLOCK;
  const stackH = stackHeight(stack);
  const caption = captionBlock(run.scenario, run.firnlineVersion, W, options.caption, options.footer);
  const height = top + stackH + caption.height;
  const body = [
    titleMarkup(run.scenario.name, `Speed and driving stress along the flowline, year ${frame.time}`, W),
    stackMarkup({ ...stack, top }),
    captionMarkup(caption, top + stackH),
  ];
  return figureDocument({ widthMm, heightPt: height, title: `Speed and driving stress, year ${frame.time}`, body: body.join('') });
}
