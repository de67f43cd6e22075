/**
 * Derived fields along the flowline and glacier-wide numbers at one model time.
 *
 * Cell-centred, with the surface gradient centred over neighbouring cells (one-sided at the ends):
 *   driving stress     tau_d = rho g H |ds/dx|                    (drivingStress.ts)
 *   surface speed      u_s = 2A/(n+1) (f tau_d)^n H + C (f tau_d)^m   (deformation.ts, sliding.ts)
 *   strain rate        du_s/dx, centred; positive = extension [a^-1]
 *   crevasse depth     Nye (1957) where the ice extends, at most the ice thickness
 *   balance            climatic balance at the surface [m w.e. a^-1]; 0 on bare ground where it is
 *                      negative (nothing to melt), i.e. the balance that is actually applied
 * Speeds are signed, positive down-valley.
 */
import type { FlowlineModel } from './flowlineModel';
import { glacierExtent, iceVolume, MIN_GLACIER_THICKNESS } from './glacierExtent';
import { nyeCrevasseDepth } from './physics/crevasseDepth';
import { deformationSurfaceSpeed } from './physics/deformation';
import { drivingStress } from './physics/drivingStress';
import { nyeShapeFactor } from './physics/shapeFactor';
import { slidingSpeed } from './physics/sliding';
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
  const surface = new Float64Array(N);
  for (let i = 0; i < N; i++) surface[i] = grid.bed[i] + thickness[i];
  const surfaceSpeed = new Float64Array(N);
  const sliding = new Float64Array(N);
  const stress = new Float64Array(N);
  for (let i = 0; i < N; i++) {
    const H = thickness[i];
    if (!(H > 0)) continue;
    const lo = Math.max(0, i - 1);
    const hi = Math.min(N - 1, i + 1);
    const gradient = hi > lo ? (surface[hi] - surface[lo]) / ((hi - lo) * dx) : 0;
    const tauD = drivingStress(flow.density, flow.gravity, H, gradient);
    const f =
      flow.shapeFactor.kind === 'constant'
        ? flow.shapeFactor.value
        : nyeShapeFactor(flow.shapeFactor.crossSection, 0.5 * grid.widthAtCells[i], H);
    const tauB = f * tauD;
    const direction = gradient > 0 ? -1 : 1;
    const ub = slidingSpeed(flow.slidingCoefficient, flow.slidingExponent, tauB);
    sliding[i] = direction * ub;
    surfaceSpeed[i] = direction * (deformationSurfaceSpeed(flow.rateFactorPerYear, flow.n, tauB, H) + ub);
    stress[i] = tauD / 1000;
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
    const bareGroundMelt = thickness[i] <= 0 && balance[i] < 0;
    balance[i] = bareGroundMelt ? 0 : balance[i] * model.iceToWaterEquivalent;
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
