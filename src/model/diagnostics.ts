/**
 * Derived fields along the flowline and glacier-wide numbers at one model time, all read from the
 * face fluxes that move the ice (flux/faceFlux.ts), so that what a user reads is what the model
 * does, also below a rock step where a slope taken across the step would mean nothing.
 *
 * At cell i, with the volume fluxes W through its two faces and its width w and thickness H:
 *   flux per unit width   q = (W_i + W_{i+1}) / (2 w)        (the cell's mean flux; in a valley
 *                                                            section w = A(H)/H, so q/H = W/A)
 *   depth-averaged speed  u = q / H
 *   basal shear stress    tau_b: the stress with which the flux law carries q in a column of H
 *   surface, sliding      u_s = 2A/(n+1) tau_b^n H + u_b,  u_b = C tau_b^m  (faceFlux.columnForFlux)
 *                         so 1 <= u_s / u <= (n+2)/(n+1) everywhere
 *   driving stress        tau_d = tau_b / f, f the faces' shape factor weighted by their flux
 *                         (the stress before side drag is taken off; f = 1 in a unit-width channel)
 *   strain rate           du_s/dx, centred over neighbouring cells; positive = extension [a^-1]
 *   crevasse depth        Nye (1957) where the ice extends, never deeper than the ice
 *   balance               the balance actually applied [m w.e. a^-1], booked by the time stepper
 *                         in the cell where it happened and averaged over the time since the last
 *                         output (so a cell that melted out, and the terminus' ablation of the ice
 *                         pushed into bare cells, are in it), hence
 *                         sum(w b dx) / (rho_w/rho_i) * interval = volume change + outflow.
 *                         Without a booking (the first output, a preview) the rate of the state:
 *                         the climatic balance on ice and where it accumulates; on bare ground
 *                         that ablates, the melt of the ice flowing in, (W_{i+1} - W_i) / (w dx),
 *                         at most the climatic rate.
 * Speeds and stresses are given on glacier cells (at least MIN_GLACIER_THICKNESS of ice), signed
 * positive down-valley; elsewhere they are 0.
 */
import { cellSurfaceWidth } from './cellSection';
import type { FlowlineModel } from './flowlineModel';
import { secantWidth, type ValleySection } from './physics/valleySection';
import { columnForFlux, computeFaceFluxes, createFaceFields, type ColumnState } from './flux/faceFlux';
import { glacierExtent, iceVolume, MIN_GLACIER_THICKNESS } from './glacierExtent';
import { nyeCrevasseDepth } from './physics/crevasseDepth';
import { SECONDS_PER_YEAR } from './units';

export interface ProfileFields {
  x: Float64Array;
  bed: Float64Array;
  surface: Float64Array;
  thickness: Float64Array;
  /** Width [m]: the fixed width, or with a valley section the valley-floor width. */
  width: Float64Array;
  /** Width of the ice surface [m] (cellSection.cellSurfaceWidth): the floor width plus what the
   * flanks add at this thickness; equals `width` for fixed walls. */
  surfaceWidth: Float64Array;
  /** Surface speed, deformation plus sliding [m a^-1]. */
  surfaceSpeed: Float64Array;
  /** Sliding speed [m a^-1]. */
  slidingSpeed: Float64Array;
  /** Driving stress [kPa]. */
  drivingStress: Float64Array;
  /** Longitudinal strain rate of the surface speed [a^-1]. */
  strainRate: Float64Array;
  /** Nye crevasse depth [m]. */
  crevasseDepth: Float64Array;
  /** Applied surface balance [m w.e. a^-1]. */
  balance: Float64Array;
}

/** Per-output fields; x, bed and width do not change in a run (RunGrid holds them once). */
export type FrameFields = Omit<ProfileFields, 'x' | 'bed' | 'width'>;

/**
 * One diagnosed output of a run: what stores, figures, CSV and archive writers read. The model
 * makes it once per output time (runScenario), the worker streams it, nobody recomputes it.
 */
export interface DiagnosedFrame {
  /** Model year [a]. */
  time: number;
  fields: FrameFields;
  numbers: GlacierNumbers;
}

/** The fixed geometry of a run's grid, sent once. */
export interface RunGrid {
  /** Cell centres [m]. */
  x: Float64Array;
  /** Bed elevation at cell centres [m a.s.l.]. */
  bed: Float64Array;
  /** Width at cell centres [m]; with a `section`, the valley-floor width. */
  width: Float64Array;
  /** Domain length [m]. */
  length: number;
  /** The valley section that follows the ice (physics/valleySection.ts); absent: fixed walls. */
  section?: ValleySection;
}

export function runGrid(model: FlowlineModel): RunGrid {
  const { grid } = model;
  const fixed = { x: grid.x, bed: grid.bed, width: grid.widthAtCells, length: grid.cellCount * grid.spacing };
  return grid.section ? { ...fixed, section: grid.section } : fixed;
}

/**
 * The diagnosed frame for thickness [m] at model year `time`; `appliedBalance` [m of ice a^-1]
 * is the stepper's booking since the previous output (FlowlineSimulation.takeAppliedBalance).
 */
export function diagnoseFrame(
  model: FlowlineModel,
  thickness: Float64Array,
  time: number,
  appliedBalance?: Float64Array,
  /** Mean frontal ablation since the previous output [m^3 a^-1] (FlowlineSimulation.takeFrontalAblationRate). */
  frontalAblation = 0,
): DiagnosedFrame {
  const { x: _x, bed: _bed, width: _width, ...fields } = profileFields(model, thickness, time, appliedBalance);
  return { time, fields, numbers: glacierNumbers(model, fields, time, frontalAblation) };
}

export interface GlacierNumbers {
  time: number;
  /** [m^3] */
  volume: number;
  /** Plan area of glacier cells [m^2] (surface width times dx; in a valley section at today's thickness). */
  area: number;
  /** [m] */
  length: number;
  /** [m], NaN when ice-free. */
  terminus: number;
  /** Climatic ELA [m a.s.l.], NaN when undefined. */
  ela: number;
  /** Accumulation-area ratio [-], NaN when ice-free. */
  aar: number;
  /** [m] */
  maxThickness: number;
  /** [m a^-1] */
  maxSurfaceSpeed: number;
  /** [K] */
  warming: number;
  /** Mean frontal ablation (calving into a lake at the front) since the previous output [m^3 a^-1]. */
  frontalAblation: number;
}

export function profileFields(
  model: FlowlineModel,
  thickness: Float64Array,
  time: number,
  appliedBalance?: Float64Array,
): ProfileFields {
  const { grid, flow } = model;
  const N = grid.cellCount;
  const dx = grid.spacing;
  const faces = createFaceFields(N);
  computeFaceFluxes(grid, flow, thickness, faces);
  const W = faces.volumeFlux;
  const surface = new Float64Array(N);
  for (let i = 0; i < N; i++) surface[i] = grid.bed[i] + thickness[i];
  const surfaceWidth = new Float64Array(N);
  for (let i = 0; i < N; i++) surfaceWidth[i] = cellSurfaceWidth(grid, i, thickness[i]);
  const surfaceSpeed = new Float64Array(N);
  const sliding = new Float64Array(N);
  const stress = new Float64Array(N);
  const column: ColumnState = { basalStress: 0, surfaceSpeed: 0, slidingSpeed: 0 };
  for (let i = 0; i < N; i++) {
    const H = thickness[i];
    // Per unit width: in a valley section the flux spreads over the mean width A/H (faceFlux.ts).
    const width = grid.section ? secantWidth(grid.section, grid.widthAtCells[i], H, 0) : grid.widthAtCells[i];
    const q = (W[i] + W[i + 1]) / (2 * width);
    // A film thinner than a glacier cell would turn any inflow into a meaningless speed.
    if (!(H >= MIN_GLACIER_THICKNESS) || q === 0) continue;
    columnForFlux(flow, H, q, column);
    const direction = q > 0 ? 1 : -1;
    surfaceSpeed[i] = direction * column.surfaceSpeed;
    sliding[i] = direction * column.slidingSpeed;
    const inner = Math.abs(W[i]);
    const outer = Math.abs(W[i + 1]);
    const shapeFactor = (inner * faces.shapeFactor[i] + outer * faces.shapeFactor[i + 1]) / (inner + outer);
    stress[i] = column.basalStress / shapeFactor / 1000;
  }
  const strainRate = new Float64Array(N);
  const crevasseDepth = new Float64Array(N);
  for (let i = 0; i < N; i++) {
    if (thickness[i] < MIN_GLACIER_THICKNESS) continue;
    const lo = Math.max(0, i - 1);
    const hi = Math.min(N - 1, i + 1);
    strainRate[i] = hi > lo ? (surfaceSpeed[hi] - surfaceSpeed[lo]) / ((hi - lo) * dx) : 0;
    const depth = nyeCrevasseDepth(
      strainRate[i] / SECONDS_PER_YEAR,
      flow.rateFactorPerSecond,
      flow.n,
      flow.density,
      flow.gravity,
    );
    crevasseDepth[i] = Math.min(depth, thickness[i]);
  }
  const balance = new Float64Array(N);
  if (appliedBalance) {
    for (let i = 0; i < N; i++) balance[i] = appliedBalance[i] * model.iceToWaterEquivalent;
  } else {
    model.iceBalance(surface, model.warmingAt(time), model.precipitationFactorAt(time), balance);
    stateBalance(model, thickness, W, balance);
  }
  return {
    x: grid.x,
    bed: grid.bed,
    surface,
    thickness: Float64Array.from(thickness),
    width: grid.widthAtCells,
    surfaceWidth,
    surfaceSpeed,
    slidingSpeed: sliding,
    drivingStress: stress,
    strainRate,
    crevasseDepth,
    balance,
  };
}

/** The balance rate of a state [m w.e. a^-1] from the climatic balance in ice [m a^-1] in `balance`. */
function stateBalance(model: FlowlineModel, thickness: Float64Array, W: Float64Array, balance: Float64Array): void {
  const { grid } = model;
  for (let i = 0; i < grid.cellCount; i++) {
    let applied = balance[i];
    if (!(thickness[i] > 0) && applied < 0) {
      // Bare ground: only the ice that flows in can melt (none flows out of an empty cell).
      const meltOfInflow = (W[i + 1] - W[i]) / (cellSurfaceWidth(grid, i, 0) * grid.spacing);
      applied = Math.min(0, Math.max(applied, meltOfInflow));
    }
    balance[i] = applied * model.iceToWaterEquivalent;
  }
}

export function glacierNumbers(model: FlowlineModel, profile: FrameFields, time: number, frontalAblation = 0): GlacierNumbers {
  const { grid } = model;
  const extent = glacierExtent(grid, profile.thickness);
  const warming = model.warmingAt(time);
  let area = 0;
  let accumulationArea = 0;
  let maxThickness = 0;
  let maxSurfaceSpeed = 0;
  for (let i = 0; i < grid.cellCount; i++) {
    maxThickness = Math.max(maxThickness, profile.thickness[i]);
    maxSurfaceSpeed = Math.max(maxSurfaceSpeed, Math.abs(profile.surfaceSpeed[i]));
    if (profile.thickness[i] < MIN_GLACIER_THICKNESS) continue;
    const cellArea = cellSurfaceWidth(grid, i, profile.thickness[i]) * grid.spacing;
    area += cellArea;
    if (profile.balance[i] > 0) accumulationArea += cellArea;
  }
  return {
    time,
    volume: iceVolume(grid, profile.thickness),
    area,
    length: extent.length,
    terminus: extent.terminus,
    ela: model.massBalance ? model.massBalance.equilibriumLineAltitude(warming, model.precipitationFactorAt(time)) : Number.NaN,
    aar: area > 0 ? accumulationArea / area : Number.NaN,
    maxThickness,
    maxSurfaceSpeed,
    warming,
    frontalAblation,
  };
}
