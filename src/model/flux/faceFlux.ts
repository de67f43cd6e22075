/**
 * The one ice flux of the model: every time stepper, the Newton Jacobian and the diagnostics
 * call this file, and nothing else writes Glen's or Weertman's law for the flux.
 *
 * At face j (between cells j-1 and j), with the surface gradient g = (s_j - s_{j-1}) / dx taken
 * across the face, the reconstructed face thickness H and the shape factor f = f(H, w/2):
 *
 *   tau = f rho g H |g|                                    basal shear stress on the centre line
 *   q_d = 2A/(n+2) tau^n H^2                               deformation (Glen's law, plane flow;
 *                                                          Cuffey & Paterson 2010, eq. 8.36)
 *   q_b = C tau^m H                                        Weertman sliding (Weertman 1957)
 *   W   = -sign(g) w (q_d + q_b)                           volume flux [m^3 a^-1], + down-valley
 *
 * H comes from the upwind cell (the one the ice flows out of) by a minmod-limited linear
 * reconstruction (MUSCL, van Leer 1979), in the flux-limited spirit of Jarosch, Schoof & Anslow
 * (2013, The Cryosphere 7, 229-240) for ice over steps; it vanishes with the upwind cell, so an
 * empty cell sends nothing. The shape factor is evaluated in one way only: Nye's f (Nye 1965)
 * for the face's half-width and this reconstructed face thickness.
 *
 * Derivatives (for the implicit Jacobian), with f' = df/dH:
 *   dq_d/dH = q_d ((n+2)/H + n f'/f),   dq_b/dH = q_b ((m+1)/H + m f'/f)
 *   dq/d|g| = (n q_d + m q_b) / |g|
 * and dW/dH_k = dW/dg dg/dH_k + dW/dH dH/dH_k over the cells j-2..j+1 that the face depends on.
 *
 * Stable explicit step (linearised forward Euler, e.g. Hindmarsh & Payne 1996, Ann. Glaciol. 23):
 *   dt (2 dq/d|g| / dx^2 + dq/dH / dx) w_face / w_cell <= 1 at every face.
 *
 * With a valley section (physics/valleySection.ts) the same law carries the ice through the
 * section's area: the depth-averaged speed q/H times A(H), so W = -sign(g) w_m(H) q with the
 * mean width w_m = A/H, and Nye's f takes the section's own W = w_s(H) / (2H). Then
 *   dW/dH gains q dw_m/dH,   df/dH = (df/dH at fixed width) (1 - H w_s'/w_s)
 * (f is linear in H / (w_s/2) between table rows), and the stable step uses
 *   dt ((2 dq/d|g| / dx^2 + dq/dH / dx) w_m + q w_m' / dx) / w_s,cell <= 1.
 * Without a section w_m = w_s = w, the fixed width, and the code below is the one it always was.
 */
import type { FlowlineGrid, FlowParameters } from '../flowlineModel';
import { nyeShapeFactorWithSlope } from '../physics/shapeFactor';
import { secantWidth, secantWidthSlope, surfaceWidth, surfaceWidthSlope } from '../physics/valleySection';
import { minmod } from './minmod';

/** Per-face results (N + 1 entries; face 0 is the closed head and carries nothing). */
export interface FaceFields {
  /** Volume flux W [m^3 a^-1], positive down-valley. */
  volumeFlux: Float64Array;
  /** Shape factor f used at the face [-]. */
  shapeFactor: Float64Array;
  /** Scratch: the reconstruction's derivatives (4) and df/dH (1), reused by every call. */
  scratch: Float64Array;
}

/** dW_j / dH_k for k = j-2, j-1, j, j+1 [m^2 a^-1 per m]. */
export interface FaceJacobian {
  farLeft: Float64Array;
  left: Float64Array;
  right: Float64Array;
  farRight: Float64Array;
}

export interface FaceFluxOutcome {
  /** Largest stable explicit step [a] (Infinity when nothing moves). */
  stableStep: number;
  /** Face at which that step is smallest, -1 when nothing moves. */
  limitingFace: number;
}

export function createFaceFields(cellCount: number): FaceFields {
  const faces = () => new Float64Array(cellCount + 1);
  return { volumeFlux: faces(), shapeFactor: faces(), scratch: new Float64Array(5) };
}

export function createFaceJacobian(cellCount: number): FaceJacobian {
  const faces = () => new Float64Array(cellCount + 1);
  return { farLeft: faces(), left: faces(), right: faces(), farRight: faces() };
}

/**
 * Fills `faces` for thickness `thickness` [m] at cell centres, and `jacobian` when given.
 * Surfaces are bed + thickness; beyond the last cell lies the ice-free ghost at grid.bedBeyondEnd.
 */
export function computeFaceFluxes(
  grid: FlowlineGrid,
  flow: FlowParameters,
  thickness: Float64Array,
  faces: FaceFields,
  jacobian?: FaceJacobian,
): FaceFluxOutcome {
  const N = grid.cellCount;
  const dx = grid.spacing;
  const bed = grid.bed;
  const { n, slidingExponent: m, slidingCoefficient: C } = flow;
  const deformation = (2 * flow.rateFactorPerYear) / (n + 2);
  const rhoG = flow.density * flow.gravity;
  const rule = flow.shapeFactor;
  const constantShape = rule.kind === 'constant' ? rule.value : 0;
  const section = grid.section;
  const cubic = n === 3;
  const cubicSliding = m === 3;
  const { volumeFlux, shapeFactor } = faces;
  const reconstruction = faces.scratch;
  const shapeSlope = faces.scratch.subarray(4);
  let largestRate = 0;
  let limitingFace = -1;

  volumeFlux[0] = 0;
  shapeFactor[0] = 1;
  if (jacobian) jacobian.farLeft[0] = jacobian.left[0] = jacobian.right[0] = jacobian.farRight[0] = 0;
  let sLeft = bed[0] + thickness[0];
  for (let j = 1; j <= N; j++) {
    const sRight = j < N ? bed[j] + thickness[j] : grid.bedBeyondEnd;
    const gradient = (sRight - sLeft) / dx;
    sLeft = sRight; // the next face's up-valley surface
    const downValley = gradient < 0;
    const H = gradient === 0 ? 0 : jacobian ? reconstructFace(thickness, j, downValley, N, reconstruction) : faceValue(thickness, j, downValley, N);
    if (!(H > 0)) {
      // No flux, and for n > 1 no first-order change of it either.
      volumeFlux[j] = 0;
      shapeFactor[j] = 1;
      if (jacobian) jacobian.farLeft[j] = jacobian.left[j] = jacobian.right[j] = jacobian.farRight[j] = 0;
      continue;
    }
    const floor = grid.widthAtFaces[j];
    // The width that carries the flux (w_m = A/H), its slope, and the surface width for Nye's W.
    let width = floor;
    let widthSlope = 0;
    let surface = floor;
    let shapeSlopeScale = 1;
    if (section) {
      width = secantWidth(section, floor, H, 0);
      widthSlope = secantWidthSlope(section, floor, H, 0);
      surface = surfaceWidth(section, floor, H);
      shapeSlopeScale = 1 - (H * surfaceWidthSlope(section, floor, H)) / surface;
    }
    const f =
      rule.kind === 'constant'
        ? constantShape
        : nyeShapeFactorWithSlope(rule.crossSection, 0.5 * surface, H, jacobian ? shapeSlope : undefined);
    const slope = Math.abs(gradient);
    const tau = f * rhoG * H * slope;
    const tauN = cubic ? tau * tau * tau : Math.pow(tau, n);
    const qDeformation = deformation * tauN * H * H;
    let qSliding = 0;
    if (C > 0) qSliding = C * (cubicSliding ? tau * tau * tau : Math.pow(tau, m)) * H;
    const q = qDeformation + qSliding;
    const direction = downValley ? 1 : -1;
    volumeFlux[j] = direction * width * q;
    shapeFactor[j] = f;

    const dqdSlope = (n * qDeformation + m * qSliding) / slope;
    const dqdH = ((n + 2) * qDeformation + (m + 1) * qSliding) / H;
    let rate: number;
    if (section) {
      const up = surfaceWidth(section, grid.widthAtCells[j - 1], thickness[j - 1]);
      const narrowestSurface = j < N ? Math.min(up, surfaceWidth(section, grid.widthAtCells[j], thickness[j])) : up;
      rate = (((2 * dqdSlope) / (dx * dx) + dqdH / dx) * width + (widthSlope * q) / dx) / narrowestSurface;
    } else {
      const narrowestCell = j < N ? Math.min(grid.widthAtCells[j - 1], grid.widthAtCells[j]) : grid.widthAtCells[j - 1];
      rate = ((2 * dqdSlope) / (dx * dx) + dqdH / dx) * (width / narrowestCell);
    }
    if (rate > largestRate) {
      largestRate = rate;
      limitingFace = j;
    }

    if (jacobian) {
      const fRelativeSlope = rule.kind === 'constant' ? 0 : (shapeSlope[0] * shapeSlopeScale) / f;
      const dqdFace = dqdH + (n * qDeformation + m * qSliding) * fRelativeSlope;
      // W = -sign(g) w q(|g|): dW/dg = -w dq/d|g| whichever way the ice flows.
      const dWdGradient = -width * dqdSlope;
      // widthSlope is 0 without a section, and adding 0 leaves the product's bits as they were.
      const dWdFace = direction * (width * dqdFace + widthSlope * q);
      jacobian.farLeft[j] = dWdFace * reconstruction[0];
      jacobian.left[j] = -dWdGradient / dx + dWdFace * reconstruction[1];
      jacobian.right[j] = j < N ? dWdGradient / dx + dWdFace * reconstruction[2] : 0;
      jacobian.farRight[j] = j + 1 < N ? dWdFace * reconstruction[3] : 0;
    }
  }
  return { stableStep: largestRate > 0 ? 1 / largestRate : Number.POSITIVE_INFINITY, limitingFace };
}

/** reconstructFace's value alone, for the explicit step and the diagnostics (no derivatives). */
function faceValue(thickness: Float64Array, j: number, downValley: boolean, N: number): number {
  if (downValley) {
    const c = thickness[j - 1];
    return c + 0.5 * minmod(c - (j >= 2 ? thickness[j - 2] : c), (j < N ? thickness[j] : 0) - c);
  }
  if (j >= N) return 0;
  const c = thickness[j];
  return c - 0.5 * minmod(c - thickness[j - 1], (j + 1 < N ? thickness[j + 1] : c) - c);
}

/**
 * Thickness at face j seen from the upwind cell (minmod-limited MUSCL), and in `d` its
 * derivatives with respect to the cells j-2, j-1, j, j+1. Zero when the upwind cell is empty.
 */
export function reconstructFace(thickness: Float64Array, j: number, downValley: boolean, N: number, d: Float64Array): number {
  if (downValley) {
    const c = thickness[j - 1];
    const previous = j >= 2 ? thickness[j - 2] : c;
    const next = j < N ? thickness[j] : 0;
    const slope = minmod(c - previous, next - c);
    // slope = c - previous: Hf = 1.5c - 0.5p; slope = next - c: Hf = 0.5c + 0.5n; none: Hf = c.
    if (slope === 0) setDerivatives(d, 0, 1, 0, 0);
    else if (slope === c - previous) setDerivatives(d, j >= 2 ? -0.5 : 0, 1.5, 0, 0);
    else setDerivatives(d, 0, 0.5, j < N ? 0.5 : 0, 0);
    return c + 0.5 * slope;
  }
  if (j >= N) {
    setDerivatives(d, 0, 0, 0, 0);
    return 0;
  }
  const c = thickness[j];
  const next = j + 1 < N ? thickness[j + 1] : c;
  const slope = minmod(c - thickness[j - 1], next - c);
  // slope = c - left: Hf = 0.5c + 0.5 left; slope = next - c: Hf = 1.5c - 0.5 next; none: Hf = c.
  if (slope === 0) setDerivatives(d, 0, 0, 1, 0);
  else if (slope === c - thickness[j - 1]) setDerivatives(d, 0, 0.5, 0.5, 0);
  else setDerivatives(d, 0, 0, 1.5, -0.5);
  return c - 0.5 * slope;
}

function setDerivatives(d: Float64Array, farLeft: number, left: number, right: number, farRight: number): void {
  d[0] = farLeft;
  d[1] = left;
  d[2] = right;
  d[3] = farRight;
}

/**
 * The column that carries a flux q [m^2 a^-1] (per unit width) with thickness H [m]: the basal
 * shear stress tau that the same law needs, solved from 2A/(n+2) tau^n H^2 + C tau^m H = q, and
 * the speeds it implies,
 *   u_b = C tau^m,   u_s = 2A/(n+1) tau^n H + u_b   (Cuffey & Paterson 2010, section 8.3;
 *   the sliding law as above),
 * so that the depth-averaged speed is exactly q / H and u_s / (q/H) lies in [1, (n+2)/(n+1)].
 * Diagnostics use it to state what the face fluxes imply at a cell centre.
 */
export interface ColumnState {
  /** Basal shear stress [Pa]. */
  basalStress: number;
  /** Surface speed [m a^-1] (magnitude). */
  surfaceSpeed: number;
  /** Sliding speed [m a^-1] (magnitude). */
  slidingSpeed: number;
}

export function columnForFlux(flow: FlowParameters, thickness: number, flux: number, out: ColumnState): ColumnState {
  out.basalStress = out.surfaceSpeed = out.slidingSpeed = 0;
  const q = Math.abs(flux);
  if (!(thickness > 0) || !(q > 0)) return out;
  const { n, slidingExponent: m, slidingCoefficient: C } = flow;
  const a = ((2 * flow.rateFactorPerYear) / (n + 2)) * thickness * thickness;
  const c = C * thickness;
  const tau = solveStress(a, n, c, m, q);
  const sliding = C > 0 ? C * Math.pow(tau, m) : 0;
  out.basalStress = tau;
  out.slidingSpeed = sliding;
  out.surfaceSpeed = ((2 * flow.rateFactorPerYear) / (n + 1)) * Math.pow(tau, n) * thickness + sliding;
  return out;
}

/** Root tau > 0 of a tau^n + c tau^m = q (a > 0, c >= 0, q > 0): increasing in tau, so bracketed Newton. */
function solveStress(a: number, n: number, c: number, m: number, q: number): number {
  if (c === 0) return Math.pow(q / a, 1 / n);
  if (n === m) return Math.pow(q / (a + c), 1 / n);
  // At the root each term is at most q and one of them at least q / 2.
  let hi = Math.min(Math.pow(q / a, 1 / n), Math.pow(q / c, 1 / m));
  let lo = Math.min(Math.pow(q / (2 * a), 1 / n), Math.pow(q / (2 * c), 1 / m));
  let tau = 0.5 * (lo + hi);
  for (let k = 0; k < 100; k++) {
    const g = a * Math.pow(tau, n) + c * Math.pow(tau, m) - q;
    if (g > 0) hi = tau;
    else lo = tau;
    const dg = (n * a * Math.pow(tau, n) + m * c * Math.pow(tau, m)) / tau;
    let next = tau - g / dg;
    if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
    if (Math.abs(next - tau) <= 1e-14 * tau) return next;
    tau = next;
  }
  return tau;
}

/**
 * The inverse the bed inversion needs: the ice thickness H [m] that carries the flux q
 * [m^2 a^-1] (per unit width) down a surface slope |ds/dx| in a channel of half-width
 * `halfWidth` [m], by the same law as the faces (deformation with the rate factor times
 * `rateFactorMultiplier`, Weertman sliding, Nye's f at H). q(H) increases with H, so the root is
 * bracketed and found by bisection (geometric once bracketed away from 0). 0 for no flux; NaN
 * for no slope or for a flux no column carries.
 */
export function thicknessForFlux(
  flow: FlowParameters,
  flux: number,
  surfaceSlope: number,
  halfWidth: number,
  rateFactorMultiplier = 1,
): number {
  const q = Math.abs(flux);
  if (!(q > 0)) return 0;
  if (!(surfaceSlope > 0)) return Number.NaN;
  const { n, slidingExponent: m, slidingCoefficient: C } = flow;
  const deformation = (rateFactorMultiplier * 2 * flow.rateFactorPerYear) / (n + 2);
  const rhoGs = flow.density * flow.gravity * surfaceSlope;
  const rule = flow.shapeFactor;
  const fluxAt = (H: number): number => {
    const f = rule.kind === 'constant' ? rule.value : nyeShapeFactorWithSlope(rule.crossSection, halfWidth, H, undefined);
    const tau = f * rhoGs * H;
    return deformation * Math.pow(tau, n) * H * H + (C > 0 ? C * Math.pow(tau, m) * H : 0);
  };
  let lo = 0;
  let hi = 1;
  while (fluxAt(hi) < q) {
    lo = hi;
    hi *= 2;
    if (hi > 1e6) return Number.NaN; // no ice column of any thickness carries it: parameters off
  }
  // Bisection on log H keeps relative precision at every size; 60 halvings of [lo, hi] suffice.
  let H = lo > 0 ? Math.sqrt(lo * hi) : 0.5 * hi;
  for (let k = 0; k < 200 && hi - lo > 1e-12 * hi; k++) {
    if (fluxAt(H) < q) lo = H;
    else hi = H;
    H = lo > 0 ? Math.sqrt(lo * hi) : 0.5 * hi;
  }
  return H;
}
