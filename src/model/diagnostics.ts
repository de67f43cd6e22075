/**
 * Derived fields along the flowline and glacier-wide numbers at one model time, all read from the
 * face fluxes that move the ice (flux/faceFlux.ts), so that what a user reads is what the model
 * does, also below a rock step where a slope taken across the step would mean nothing.
 *
 * At cell i, with the volume fluxes W through its two faces and its width w and thickness H:
 *   flux per unit width   q = (W_i + W_{i+1}) / (2 w)        (the cell's mean flux)
 *   depth-averaged speed  u = q / H
 *   basal shear stress    tau_b: the stress with which the flux law carries q in a column of H
 *   surface, sliding      u_s = 2A/(n+1) tau_b^n H + u_b,  u_b = C tau_b^m  (faceFlux.columnForFlux)
 *                         so 1 <= u_s / u <= (n+2)/(n+1) everywhere
 *   driving stress        tau_d = tau_b / f, f the faces' shape factor weighted by their flux
 *                         (the stress before side drag is taken off; f = 1 in a unit-width channel)
 *   strain rate           du_s/dx, centred over neighbouring cells; positive = extension [a^-1]
 *   crevasse depth        Nye (1957) where the ice extends, never deeper than the ice
 *   balance               the balance actually applied [m w.e. a^-1]: the climatic balance on ice
 *                         and where it accumulates; on bare ground that ablates, the melt of the
 *                         ice flowing in, (W_{i+1} - W_i) / (w dx), at most the climatic rate,
 *                         which is where the terminus' ablation happens. So
 *                         sum(w b dx) / (rho_w/rho_i) = dV/dt + outflow at every output.
 * Speeds and stresses are given on glacier cells (at least MIN_GLACIER_THICKNESS of ice), signed
 * positive down-valley; elsewhere they are 0.
 */
import type { FlowlineModel } from './flowlineModel';
import { columnForFlux, computeFaceFluxes, createFaceFields, type ColumnState } from './flux/faceFlux';
import { glacierExtent, iceVolume, MIN_GLACIER_THICKNESS } from './glacierExtent';
import { nyeCrevasseDepth } from './physics/crevasseDepth';
import { SECONDS_PER_YEAR } from './units';

export interface ProfileFields {
  x: Float64Array;
  bed: Float64Array;
  surface: Float64Array;
  thickness: Float64Array;
  width: Float64Array;
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

export interface GlacierNumbers {
  time: number;
  /** [m^3] */
  volume: number;
  /** Plan area of glacier cells [m^2]. */
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
}

export function profileFields(model: FlowlineModel, thickness: Float64Array, time: number): ProfileFields {
  const { grid, flow } = model;
  const N = grid.cellCount;
  const dx = grid.spacing;
  const faces = createFaceFields(N);
  computeFaceFluxes(grid, flow, thickness, faces);
  const W = faces.volumeFlux;
  const surface = new Float64Array(N);
  for (let i = 0; i < N; i++) surface[i] = grid.bed[i] + thickness[i];
  const surfaceSpeed = new Float64Array(N);
  const sliding = new Float64Array(N);
  const stress = new Float64Array(N);
  const column: ColumnState = { basalStress: 0, surfaceSpeed: 0, slidingSpeed: 0 };
  for (let i = 0; i < N; i++) {
    const H = thickness[i];
    const q = (W[i] + W[i + 1]) / (2 * grid.widthAtCells[i]);
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
  model.iceBalance(surface, model.warmingAt(time), balance);
  for (let i = 0; i < N; i++) {
    let applied = balance[i];
    if (!(thickness[i] > 0) && applied < 0) {
      // Bare ground: only the ice that flows in can melt (none flows out of an empty cell).
      const meltOfInflow = (W[i + 1] - W[i]) / (grid.widthAtCells[i] * dx);
      applied = Math.min(0, Math.max(applied, meltOfInflow));
    }
    balance[i] = applied * model.iceToWaterEquivalent;
  }
  return {
    x: grid.x,
    bed: grid.bed,
    surface,
    thickness: Float64Array.from(thickness),
    width: grid.widthAtCells,
    surfaceSpeed,
    slidingSpeed: sliding,
    drivingStress: stress,
    strainRate,
    crevasseDepth,
    balance,
  };
}

export function glacierNumbers(model: FlowlineModel, profile: ProfileFields, time: number): GlacierNumbers {
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
    const cellArea = grid.widthAtCells[i] * grid.spacing;
    area += cellArea;
    if (profile.balance[i] > 0) accumulationArea += cellArea;
  }
  return {
    time,
    volume: iceVolume(grid, profile.thickness),
    area,
    length: extent.length,
    terminus: extent.terminus,
    ela: model.massBalance ? model.massBalance.equilibriumLineAltitude(warming) : Number.NaN,
    aar: area > 0 ? accumulationArea / area : Number.NaN,
    maxThickness,
    maxSurfaceSpeed,
    warming,
  };
}
