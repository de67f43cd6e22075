/**
 * The bed under a glacier from its surface, by mass conservation and shallow-ice flow, in the
 * flowline form of Farinotti et al. (2009, J. Glaciol. 55(191), 422-430):
 *
 *   apparent balance   b~(x) = b(s(x)) - dh/dt(x)          (ice equivalent, m a^-1)
 *                      where no elevation change is given, b shifted by a constant so that
 *                      the glacier-wide net is zero: the steady assumption, stated in the output
 *   ice flux           Q(x) = integral from the head to x of w b~ dx'   (m^3 a^-1)
 *   thickness          the H with which the model's own flux law (flux/faceFlux.ts: Glen's law
 *                      with Nye's shape factor, Weertman sliding) carries q = Q / w down the
 *                      smoothed surface slope
 *   bed                s - H; beyond the terminus the bed is the surface.
 *
 * Cells: the model's grid (cell i centred at (i + 1/2) dx); Q at a cell is the mean of its two
 * faces', as the diagnostics define the cell's flux. The surface slope is taken centred on the
 * surface smoothed by a running mean over `smoothingMetres` (default 300 m, never less than
 * three cells), floored at MIN_SLOPE (flat reaches would otherwise need infinitely thick ice).
 *
 * With radar or borehole thickness points, the rate factor is scaled by a multiplier k fitted by
 * weighted least squares, chi^2(k) = sum ((H(x_p; k) - H_p) / sigma_p)^2, minimised over log k;
 * its range is where chi^2 <= chi^2_min + max(1, chi^2_min / (N - 1)) (Delta chi^2 = 1 for one
 * parameter, e.g. Press et al. 2007, Numerical Recipes, section 15.6, inflated by the reduced
 * chi^2 when the points scatter more than their stated errors). The thickness band is H over that
 * range; without radar points, over A / 2 to 2 A (common practice: A is uncertain by a factor of
 * about two; no published source).
 */
import { chiSquareRise, levelCrossing, minimiseLog } from '../analysis/minimiseScalar';
import { createFlowlineModel } from '../createFlowlineModel';
import { thicknessForFlux } from '../flux/faceFlux';
import { observedTerminus } from '../observedTerminus';
import { piecewiseLinear } from '../piecewiseLinear';
import type { Point } from '../piecewiseLinear';
import type { Scenario } from '../scenario';

/** A scenario that may leave out the bed (the inversion's input). */
export type InversionScenario = Omit<Scenario, 'bed'> & { bed?: Scenario['bed'] };

export interface InversionOptions {
  /** Length of the running mean applied to the surface before the slope is taken [m]. */
  smoothingMetres?: number;
}

export interface InversionResult {
  /** Cell centres [m]. */
  x: Float64Array;
  /** Observed surface [m a.s.l.]. */
  surface: Float64Array;
  /** Ice thickness [m], 0 beyond the terminus. */
  thickness: Float64Array;
  /** surface - thickness [m a.s.l.]. */
  bed: Float64Array;
  /** Volume flux through the cell [m^3 a^-1]. */
  flux: Float64Array;
  /** Smoothed surface slope used, |ds/dx| [-]. */
  slope: Float64Array;
  /** Thickness band [m]. */
  thicknessLow: Float64Array;
  thicknessHigh: Float64Array;
  /** Terminus [m]. */
  terminus: number;
  /** Multiplier of the rate factor A (1 when not fitted). */
  rateFactorMultiplier: number;
  /** Range of the multiplier, when fitted to thickness points. */
  rateFactorMultiplierRange?: [number, number];
  /** The fitted multiplier's best scan point was an end of the searched 1e-3 to 1e3: not bracketed. */
  multiplierAtSearchBound?: boolean;
  /** Thickness points against the inverted thickness (modelled minus observed). */
  misfit?: { count: number; rmsMetres: number; biasMetres: number; weightedRms: number };
  /** Assumptions and adjustments, in words, for the output. */
  statements: string[];
}

export const DEFAULT_SMOOTHING_METRES = 300;
/** Smallest surface slope the inversion uses [-] (about 0.6 degrees). */
export const MIN_SLOPE = 0.01;
/** Range over which a multiplier is searched. */
const MULTIPLIER_SEARCH: [number, number] = [1e-3, 1e3];

export function invertBed(scenario: InversionScenario, options: InversionOptions = {}): InversionResult {
  // The flux-to-thickness step below assumes vertical walls (thicknessForFlux per unit width).
  if (scenario.section) throw new InversionInputError('/section', 'the inversion works with vertical walls at the width only; leave out the valley section');
  const surfacePoints = scenario.surface;
  if (!surfacePoints || surfacePoints.length < 2) throw new InversionInputError('/surface', 'the inversion needs the observed surface over the domain');
  const terminus = terminusOf(scenario);
  // The model on a bed equal to the surface: its grid, widths, flow law and balance, no ice.
  const model = createFlowlineModel({ ...scenario, bed: surfacePoints });
  const { grid, flow } = model;
  const N = grid.cellCount;
  const dx = grid.spacing;
  const x = Float64Array.from(grid.x);
  const surface = Float64Array.from(grid.bed);
  const statements: string[] = [];
  if (!(terminus > 0 && terminus <= N * dx)) throw new InversionInputError('/observations/terminus', `the terminus must lie inside the domain (0 to ${N * dx} m]`);
  const lastCell = Math.min(N, Math.round(terminus / dx)) - 1;
  if (lastCell < 1) throw new InversionInputError('/observations/terminus', 'the terminus leaves fewer than two cells of glacier');

  // Apparent balance over the glacier [m of ice a^-1].
  const year = scenario.observations?.year ?? 0;
  const balance = new Float64Array(N);
  model.iceBalance(surface, model.warmingAt(year), model.precipitationFactorAt(year), balance);
  const change = scenario.observations?.elevationChange;
  const changeAt = change ? piecewiseLinear(change.points) : undefined;
  if (change) statements.push(`apparent balance: climatic balance minus the observed elevation change of ${change.from}-${change.to}`);
  const apparent = new Float64Array(N);
  let net = 0;
  let area = 0;
  for (let i = 0; i <= lastCell; i++) {
    apparent[i] = balance[i] - (changeAt ? changeAt(x[i]) : 0);
    const cellArea = grid.widthAtCells[i] * dx;
    net += apparent[i] * cellArea;
    area += cellArea;
  }
  const shift = -net / area;
  for (let i = 0; i <= lastCell; i++) apparent[i] += shift;
  const shiftWe = shift * model.iceToWaterEquivalent;
  statements.push(
    change
      ? `the apparent balance was shifted by ${shiftWe.toFixed(3)} m w.e. a^-1 so that the ice flux vanishes at the terminus (the residual of balance and elevation change)`
      : `steady state assumed: the balance was shifted by ${shiftWe.toFixed(3)} m w.e. a^-1 so that the glacier-wide net is zero and the ice flux vanishes at the terminus`,
  );

  // Flux at faces, then at cells as the mean of the two faces.
  const flux = new Float64Array(N);
  let faceFlux = 0;
  let clamped = 0;
  for (let i = 0; i <= lastCell; i++) {
    const next = faceFlux + apparent[i] * grid.widthAtCells[i] * dx;
    flux[i] = 0.5 * (faceFlux + next);
    faceFlux = next;
    if (!(flux[i] > 0)) clamped++;
  }
  if (clamped > 0) statements.push(`${clamped} cell(s) with no down-valley flux (apparent balance negative near the head) are given no ice`);

  const slope = smoothedSlope(surface, dx, Math.max(3 * dx, options.smoothingMetres ?? DEFAULT_SMOOTHING_METRES));
  let floored = 0;
  for (let i = 0; i < N; i++) {
    if (slope[i] < MIN_SLOPE) {
      slope[i] = MIN_SLOPE;
      if (i <= lastCell) floored++;
    }
  }
  statements.push(`surface smoothed over ${Math.max(3 * dx, options.smoothingMetres ?? DEFAULT_SMOOTHING_METRES)} m before the slope was taken`);
  if (floored > 0) statements.push(`slope held at ${MIN_SLOPE} in ${floored} glacier cell(s) where the surface is flatter`);

  const thicknessAt = (i: number, k: number): number => {
    if (i > lastCell) return 0;
    const q = flux[i] / grid.widthAtCells[i];
    const h = q > 0 ? thicknessForFlux(flow, q, slope[i], 0.5 * grid.widthAtCells[i], k) : 0;
    return Number.isFinite(h) ? h : 0;
  };
  const thicknessFor = (k: number): Float64Array => {
    const H = new Float64Array(N);
    for (let i = 0; i <= lastCell; i++) H[i] = thicknessAt(i, k);
    return H;
  };
  /** The inverted thickness at x, from the two cells around it only (the fit asks this often). */
  const thicknessAtX = (px: number, k: number): number => {
    const u = px / dx - 0.5;
    if (u <= 0) return thicknessAt(0, k);
    if (u >= N - 1) return thicknessAt(N - 1, k);
    const i = Math.floor(u);
    const t = u - i;
    return thicknessAt(i, k) * (1 - t) + thicknessAt(i + 1, k) * t;
  };

  const points = scenario.observations?.thickness ?? [];
  let multiplier = 1;
  let range: [number, number];
  let misfit: InversionResult['misfit'];
  let atBound = false;
  if (points.length > 0) {
    const chi2 = (k: number) => points.reduce((sum, [px, h, sigma]) => sum + ((thicknessAtX(px, k) - h) / sigma) ** 2, 0);
    const fit = minimiseLog(chi2, MULTIPLIER_SEARCH);
    multiplier = fit.at;
    atBound = fit.atBound;
    const allowed = fit.value + chiSquareRise(fit.value, points.length);
    range = [levelCrossing(chi2, fit.at, MULTIPLIER_SEARCH[0], allowed), levelCrossing(chi2, fit.at, MULTIPLIER_SEARCH[1], allowed)];
    statements.push(`rate factor multiplier ${multiplier.toPrecision(3)} (range ${range[0].toPrecision(3)}-${range[1].toPrecision(3)}) fitted to ${points.length} thickness point(s)`);
  } else {
    range = [0.5, 2];
    statements.push('no thickness points: the band is the thickness for A / 2 to 2 A');
  }
  const thickness = thicknessFor(multiplier);
  if (points.length > 0) misfit = misfitOf(thickness, dx, points);
  // H decreases as k grows, so the larger multiplier gives the lower edge.
  const low = thicknessFor(range[1]);
  const high = thicknessFor(range[0]);
  const bed = surface.map((s, i) => s - thickness[i]);
  return {
    x,
    surface,
    thickness,
    bed,
    flux,
    slope,
    thicknessLow: low,
    thicknessHigh: high,
    terminus: (lastCell + 1) * dx,
    rateFactorMultiplier: multiplier,
    ...(points.length > 0 ? { rateFactorMultiplierRange: range, multiplierAtSearchBound: atBound } : {}),
    ...(misfit ? { misfit } : {}),
    statements,
  };
}

/** A refusal of the input, with the key path it concerns. */
export class InversionInputError extends Error {
  constructor(
    readonly path: string,
    message: string,
  ) {
    super(message);
    this.name = 'InversionInputError';
  }
}

/** The terminus the inversion uses: the single value, or the record's at the observation year. */
function terminusOf(scenario: InversionScenario): number {
  const terminus = observedTerminus(scenario.observations);
  if (terminus === undefined) throw new InversionInputError('/observations/terminus', 'the inversion needs the terminus position');
  return terminus;
}

/** |ds/dx| of the surface after a centred running mean over about `window` metres. */
function smoothedSlope(surface: Float64Array, dx: number, window: number): Float64Array {
  const N = surface.length;
  const half = Math.max(1, Math.round(window / (2 * dx)));
  const smooth = new Float64Array(N);
  for (let i = 0; i < N; i++) {
    const a = Math.max(0, i - half);
    const b = Math.min(N - 1, i + half);
    let sum = 0;
    for (let k = a; k <= b; k++) sum += surface[k];
    smooth[i] = sum / (b - a + 1);
  }
  const slope = new Float64Array(N);
  for (let i = 0; i < N; i++) {
    const a = Math.max(0, i - 1);
    const b = Math.min(N - 1, i + 1);
    slope[i] = Math.abs(smooth[b] - smooth[a]) / ((b - a) * dx);
  }
  return slope;
}

/** Value at x of a cell-centred field (linear between centres, held beyond them). */
export function sampleCells(field: Float64Array, dx: number, x: number): number {
  const u = x / dx - 0.5;
  if (u <= 0) return field[0];
  if (u >= field.length - 1) return field[field.length - 1];
  const i = Math.floor(u);
  const t = u - i;
  return field[i] * (1 - t) + field[i + 1] * t;
}

function misfitOf(H: Float64Array, dx: number, points: readonly (readonly [number, number, number])[]) {
  let sum = 0;
  let sumSquares = 0;
  let weighted = 0;
  for (const [px, h, sigma] of points) {
    const d = sampleCells(H, dx, px) - h;
    sum += d;
    sumSquares += d * d;
    weighted += (d / sigma) ** 2;
  }
  const count = points.length;
  return { count, rmsMetres: Math.sqrt(sumSquares / count), biasMetres: sum / count, weightedRms: Math.sqrt(weighted / count) };
}

/**
 * The complete scenario with the inverted bed (a point per cell and one at each end), the
 * observed surface as the initial surface, and any fitted multiplier in the rate factor (A, or
 * the enhancement factor when A comes from the temperature). It starts from the glacier as
 * observed (`start: {from: "observed"}`, no steady spin-up) unless the input chose a start.
 */
export function invertedScenario(scenario: InversionScenario, result: InversionResult): Scenario {
  const N = result.x.length;
  const length = scenario.grid.length;
  const bed: Point[] = [[0, result.bed[0]]];
  for (let i = 0; i < N; i++) bed.push([result.x[i], round(result.bed[i])]);
  bed.push([length, result.bed[N - 1]]);
  const k = result.rateFactorMultiplier;
  const ice =
    k === 1
      ? scenario.ice
      : scenario.ice.A !== undefined
        ? { ...scenario.ice, A: Number((scenario.ice.A * k).toPrecision(4)) }
        : { ...scenario.ice, enhancement: Number(((scenario.ice.enhancement ?? 1) * k).toPrecision(4)) };
  const { spinup: _spinup, ...rest } = scenario;
  return scenario.start ? { ...scenario, bed, ice } : { ...rest, bed, ice, start: { from: 'observed' } };
}

function round(value: number): number {
  return Math.round(value * 1000) / 1000;
}
