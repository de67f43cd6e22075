/**
 * One backward-Euler step of the flowline continuity equation, solved by Newton's method with
 * the constraint H >= 0:
 *
 *   R_i = w_i dx (H_i - H_i_old) + dt (W_{i+1/2} - W_{i-1/2}) - dt w_i dx b_i = 0   where H_i > 0
 *   H_i = 0 and R_i >= 0                                                          otherwise
 *
 * W the face volume flux of faceFluxes.ts, with the same upwind minmod-limited face thickness (it
 * vanishes with the upwind cell's thickness, so ice cannot be drawn from a cell that has none),
 * b the ice-equivalent balance at the end-of-step surface (the elevation feedback is implicit too,
 * with db/ds from a finite difference in the Jacobian, so long steps stay stable). The
 * complementarity form is the implicit statement of "ablation removes at most the ice present":
 * on a cell held at zero the balance actually applied is b - R_i / (w_i dx dt), and the budget
 * counts exactly that. Backward Euler has no stability limit, so steps are set by accuracy and
 * by Newton's convergence (halved on failure, lengthened after easy steps); cf. the implicit
 * free-boundary treatment of Bueler (2016, J. Glaciol. 62(232)).
 *
 * The Jacobian is pentadiagonal (a face flux depends on the two cells beside it through the
 * surface gradient and on one more through the reconstruction) and is solved by band Gaussian
 * elimination; the shape factor is lagged within a step.
 */
import type { FlowlineModel } from '../flowlineModel';
import { nyeShapeFactor } from '../physics/shapeFactor';
import type { MassBudgetTotals } from './explicitStep';
import { minmod } from './minmod';
import { solvePentadiagonal, type PentadiagonalSystem } from './pentadiagonal';

/** Height step for the finite-difference derivative of the balance with elevation [m]. */
const BALANCE_PROBE_METRES = 0.01;
/** Newton stops when every free cell's residual is below this thickness change [m] ... */
const NEWTON_TOLERANCE_METRES = 1e-9;
/**
 * ... or when it has stalled below this one (the residual no longer halves): on fine grids the
 * limiter's switching between nearly equal slopes leaves a floor of about 1e-9 m. What remains
 * is booked as solver residual.
 */
const STALLED_TOLERANCE_METRES = 1e-7;
const MAX_NEWTON_ITERATIONS = 30;
/** Halvings of a Newton update tried before a step is given up. */
const LINE_SEARCH_HALVINGS = 4;

export interface ImplicitWorkspace {
  old: Float64Array;
  trial: Float64Array;
  surface: Float64Array;
  balance: Float64Array;
  /** Balance at the surface raised by BALANCE_PROBE_METRES, for db/ds. */
  balanceAbove: Float64Array;
  shape: Float64Array;
  volumeFlux: Float64Array;
  /** d W_j / d H_{j-2}, d H_{j-1}, d H_j and d H_{j+1} at each face. */
  dFluxFarLeft: Float64Array;
  dFluxLeft: Float64Array;
  dFluxRight: Float64Array;
  dFluxFarRight: Float64Array;
  residual: Float64Array;
  /** Line-search candidate thickness [m]. */
  candidate: Float64Array;
  jacobian: PentadiagonalSystem;
  correction: Float64Array;
  /** 1 where the cell is held at zero thickness (constraint active). */
  held: Uint8Array;
  /** Thickness change rate of the last accepted step [m a^-1], for Newton's first guess. */
  lastRate: Float64Array;
}

export function createImplicitWorkspace(cellCount: number): ImplicitWorkspace {
  const cells = () => new Float64Array(cellCount);
  const faces = () => new Float64Array(cellCount + 1);
  return {
    old: cells(),
    trial: cells(),
    surface: cells(),
    balance: cells(),
    balanceAbove: cells(),
    shape: faces(),
    volumeFlux: faces(),
    dFluxFarLeft: faces(),
    dFluxLeft: faces(),
    dFluxRight: faces(),
    dFluxFarRight: faces(),
    residual: cells(),
    candidate: cells(),
    jacobian: { below2: cells(), below1: cells(), diagonal: cells(), above1: cells(), above2: cells(), rhs: cells() },
    correction: cells(),
    held: new Uint8Array(cellCount),
    lastRate: cells(),
  };
}

export interface ImplicitOutcome {
  /** Whether Newton converged; if not, `thickness` is unchanged and the caller retries shorter. */
  converged: boolean;
  iterations: number;
  /** Largest remaining residual on a free cell [m of ice]. */
  residual: number;
  /** A cell whose residual is not finite (NaN or infinite input), or -1. Halving cannot mend that. */
  nonFiniteCell: number;
}

/**
 * Tries one backward-Euler step of length `step` [a]. On success `thickness` holds the new state
 * and the budget is updated; on failure nothing changes.
 */
export function implicitStep(
  model: FlowlineModel,
  thickness: Float64Array,
  warming: number,
  step: number,
  work: ImplicitWorkspace,
  budget: MassBudgetTotals,
): ImplicitOutcome {
  const { grid } = model;
  const N = grid.cellCount;
  const { old, trial, surface, correction, candidate } = work;
  old.set(thickness);
  // First guess: the last step's rate carried on (the glacier changes smoothly in time).
  for (let i = 0; i < N; i++) {
    const guess = old[i] + step * work.lastRate[i];
    trial[i] = guess > 0 ? guess : 0;
  }
  for (let i = 0; i < N; i++) surface[i] = grid.bed[i] + old[i];
  lagShapeFactor(model, old, surface, work.shape);

  let state = evaluate(model, trial, warming, step, work);
  let previousNorm = Number.POSITIVE_INFINITY;
  for (let iteration = 1; iteration <= MAX_NEWTON_ITERATIONS; iteration++) {
    if (state.nonFiniteCell >= 0) return { converged: false, iterations: iteration, residual: Number.NaN, nonFiniteCell: state.nonFiniteCell };
    // At least one Newton update, so that a balance smaller than the tolerance is still applied.
    const stalled = iteration > 2 && state.worst <= STALLED_TOLERANCE_METRES && state.norm > 0.5 * previousNorm;
    if (iteration > 1 && (state.worst <= NEWTON_TOLERANCE_METRES || stalled)) {
      commit(model, thickness, step, work, budget);
      return { converged: true, iterations: iteration - 1, residual: state.worst, nonFiniteCell: -1 };
    }
    previousNorm = state.norm;
    solvePentadiagonal(work.jacobian, correction);
    // Backtracking line search on the residual norm: full Newton steps can overshoot where the
    // limiter or the margin switches, most on fine grids with long steps.
    let fraction = 1;
    for (let attempt = 0; ; attempt++) {
      for (let i = 0; i < N; i++) {
        const next = trial[i] + fraction * correction[i];
        candidate[i] = next > 0 ? next : 0;
      }
      const tried = evaluate(model, candidate, warming, step, work);
      if (tried.nonFiniteCell < 0 && (tried.norm < state.norm || attempt === LINE_SEARCH_HALVINGS)) {
        trial.set(candidate);
        state = tried;
        break;
      }
      if (attempt === LINE_SEARCH_HALVINGS) return { converged: false, iterations: iteration, residual: state.worst, nonFiniteCell: tried.nonFiniteCell };
      fraction /= 2;
    }
  }
  return { converged: false, iterations: MAX_NEWTON_ITERATIONS, residual: state.worst, nonFiniteCell: -1 };
}

interface Evaluation {
  /** Largest free-cell residual [m of ice]. */
  worst: number;
  /** Root-mean-square free-cell residual [m of ice], for the line search. */
  norm: number;
  /** First cell with a non-finite residual, or -1. */
  nonFiniteCell: number;
}

/** Residual, active set and Jacobian at thickness `h`; fills the workspace. */
function evaluate(model: FlowlineModel, h: Float64Array, warming: number, step: number, work: ImplicitWorkspace): Evaluation {
  const { grid } = model;
  const N = grid.cellCount;
  const dx = grid.spacing;
  const { old, surface, balance, residual } = work;
  const { below2, below1, diagonal, above1, above2, rhs } = work.jacobian;
  const { dFluxFarLeft: FL, dFluxLeft: L, dFluxRight: R, dFluxFarRight: FR } = work;
  fluxesAndDerivatives(model, h, work);
  const flux = work.volumeFlux;
  for (let i = 0; i < N; i++) surface[i] = grid.bed[i] + h[i];
  model.iceBalance(surface, warming, balance);
  for (let i = 0; i < N; i++) surface[i] += BALANCE_PROBE_METRES;
  model.iceBalance(surface, warming, work.balanceAbove);
  let worst = 0;
  let sumSquares = 0;
  for (let i = 0; i < N; i++) {
    const cellArea = grid.widthAtCells[i] * dx;
    const r = cellArea * (h[i] - old[i]) + step * (flux[i + 1] - flux[i]) - step * cellArea * balance[i];
    if (!Number.isFinite(r)) return { worst: Number.NaN, norm: Number.NaN, nonFiniteCell: i };
    residual[i] = r;
    // Bare ground that would melt further: the constraint is active.
    work.held[i] = h[i] === 0 && r >= 0 ? 1 : 0;
    if (work.held[i]) {
      below2[i] = below1[i] = above1[i] = above2[i] = 0;
      diagonal[i] = 1;
      residual[i] = 0;
      rhs[i] = 0;
      continue;
    }
    const thicknessResidual = Math.abs(r) / cellArea;
    worst = Math.max(worst, thicknessResidual);
    sumSquares += thicknessResidual * thicknessResidual;
    // dR_i/dH_k from the faces i (left) and i+1 (right) of cell i.
    below2[i] = -step * FL[i];
    below1[i] = step * (FL[i + 1] - L[i]);
    const balanceSlope = (work.balanceAbove[i] - balance[i]) / BALANCE_PROBE_METRES;
    diagonal[i] = cellArea + step * (L[i + 1] - R[i]) - step * cellArea * balanceSlope;
    above1[i] = step * (R[i + 1] - FR[i]);
    above2[i] = i + 1 < N ? step * FR[i + 1] : 0;
    rhs[i] = -r;
  }
  return { worst, norm: Math.sqrt(sumSquares / N), nonFiniteCell: -1 };
}


/**
 * Accepts the converged state and books the balance actually applied: b dt on free cells (their
 * remaining Newton residual is booked as solver residual, so the budget shows it), and on cells
 * held at zero the ablation that found ice (volume change plus net outflow).
 */
function commit(
  model: FlowlineModel,
  thickness: Float64Array,
  step: number,
  work: ImplicitWorkspace,
  budget: MassBudgetTotals,
): void {
  const { grid } = model;
  const N = grid.cellCount;
  const { trial, old, balance, residual, volumeFlux: flux } = work;
  for (let i = 0; i < N; i++) {
    const cellArea = grid.widthAtCells[i] * grid.spacing;
    let applied: number;
    if (work.held[i]) applied = cellArea * (trial[i] - old[i]) + step * (flux[i + 1] - flux[i]);
    else {
      applied = step * cellArea * balance[i];
      budget.solverResidual.add(residual[i]);
    }
    budget.appliedBalance.add(applied);
    if (applied > 0) budget.grossAccumulation.add(applied);
    work.lastRate[i] = (trial[i] - old[i]) / step;
    thickness[i] = trial[i];
  }
  budget.outflow.add(step * Math.max(flux[N], 0));
}

function lagShapeFactor(model: FlowlineModel, thickness: Float64Array, surface: Float64Array, shape: Float64Array): void {
  const { grid, flow } = model;
  const rule = flow.shapeFactor;
  if (rule.kind === 'constant') {
    shape.fill(rule.value);
    return;
  }
  const N = grid.cellCount;
  for (let j = 1; j <= N; j++) {
    const downSurface = j < N ? surface[j] : grid.bedBeyondEnd;
    const up = downSurface < surface[j - 1] ? j - 1 : Math.min(j, N - 1);
    shape[j] = nyeShapeFactor(rule.crossSection, 0.5 * grid.widthAtFaces[j], thickness[up]);
  }
}

/** Derivatives of the last reconstructed face thickness with respect to the cells j-2, j-1, j, j+1 around face j. */
let faceDerivativeFarLeft = 0;
let faceDerivativeLeft = 0;
let faceDerivativeRight = 0;
let faceDerivativeFarRight = 0;

/**
 * Thickness at face j seen from the upwind cell: the same minmod-limited (MUSCL) reconstruction as
 * the explicit scheme. It is zero whenever the upwind cell is empty, so an empty cell sends nothing.
 * Also sets the faceDerivative* variables for the Jacobian.
 */
function reconstructedFaceThickness(thickness: Float64Array, j: number, downValley: boolean, N: number): number {
  if (downValley) {
    const c = thickness[j - 1];
    const previous = j - 2 >= 0 ? thickness[j - 2] : c;
    const next = j < N ? thickness[j] : 0;
    const slope = minmod(c - previous, next - c);
    // slope = c - previous: Hf = 1.5c - 0.5p; slope = next - c: Hf = 0.5c + 0.5n; none: Hf = c.
    faceDerivativeFarRight = 0;
    if (slope === 0) [faceDerivativeFarLeft, faceDerivativeLeft, faceDerivativeRight] = [0, 1, 0];
    else if (slope === c - previous) [faceDerivativeFarLeft, faceDerivativeLeft, faceDerivativeRight] = [j >= 2 ? -0.5 : 0, 1.5, 0];
    else [faceDerivativeFarLeft, faceDerivativeLeft, faceDerivativeRight] = [0, 0.5, j < N ? 0.5 : 0];
    return c + 0.5 * slope;
  }
  faceDerivativeFarLeft = 0;
  if (j >= N) {
    faceDerivativeLeft = faceDerivativeRight = faceDerivativeFarRight = 0;
    return 0;
  }
  const c = thickness[j];
  const next = j + 1 < N ? thickness[j + 1] : c;
  const slope = minmod(c - thickness[j - 1], next - c);
  // slope = c - left: Hf = 0.5c + 0.5 left; slope = next - c: Hf = 1.5c - 0.5 next; none: Hf = c.
  if (slope === 0) [faceDerivativeLeft, faceDerivativeRight, faceDerivativeFarRight] = [0, 1, 0];
  else if (slope === c - thickness[j - 1]) [faceDerivativeLeft, faceDerivativeRight, faceDerivativeFarRight] = [0.5, 0.5, 0];
  else [faceDerivativeLeft, faceDerivativeRight, faceDerivativeFarRight] = [0, 1.5, -0.5];
  return c - 0.5 * slope;
}

/**
 * Face volume fluxes W_j [m^3 a^-1] and their derivatives with respect to the thickness of the
 * cells on either side of the face (the Jacobian's three diagonals).
 */
function fluxesAndDerivatives(model: FlowlineModel, thickness: Float64Array, work: ImplicitWorkspace): void {
  const { grid, flow } = model;
  const N = grid.cellCount;
  const dx = grid.spacing;
  const { n, slidingExponent: m, slidingCoefficient: C } = flow;
  const cubic = n === 3;
  const cubicSliding = m === 3;
  const rhoG = flow.density * flow.gravity;
  const deformation = (2 * flow.rateFactorPerYear) / (n + 2);
  const { volumeFlux, dFluxFarLeft, dFluxLeft, dFluxRight, dFluxFarRight, shape } = work;
  volumeFlux[0] = dFluxFarLeft[0] = dFluxLeft[0] = dFluxRight[0] = dFluxFarRight[0] = 0;
  for (let j = 1; j <= N; j++) {
    const left = j - 1;
    const sLeft = grid.bed[left] + thickness[left];
    const sRight = j < N ? grid.bed[j] + thickness[j] : grid.bedBeyondEnd;
    const gradient = (sRight - sLeft) / dx;
    const downValley = gradient < 0;
    const H = reconstructedFaceThickness(thickness, j, downValley, N);
    if (gradient === 0 || H <= 0) {
      // No flux, and for n > 1 no first-order change of it either.
      volumeFlux[j] = dFluxFarLeft[j] = dFluxLeft[j] = dFluxRight[j] = dFluxFarRight[j] = 0;
      continue;
    }
    const width = grid.widthAtFaces[j];
    const slope = Math.abs(gradient);
    const stress = shape[j] * rhoG * slope; // basal shear stress per metre of ice
    const H2 = H * H;
    const qDeformation = cubic
      ? deformation * stress * stress * stress * H2 * H2 * H
      : deformation * Math.pow(stress, n) * Math.pow(H, n + 2);
    let qSliding = 0;
    if (C > 0) qSliding = cubicSliding ? C * stress * stress * stress * H2 * H2 : C * Math.pow(stress, m) * Math.pow(H, m + 1);
    const direction = downValley ? 1 : -1;
    volumeFlux[j] = direction * width * (qDeformation + qSliding);
    // W = -sign(g) |q| w with g = (s_j - s_{j-1}) / dx, so dW/dg = -w d|q|/d|g| on both sides.
    const dWdGradient = (-width * (n * qDeformation + m * qSliding)) / slope;
    const dWdFace = (direction * width * ((n + 2) * qDeformation + (m + 1) * qSliding)) / H;
    dFluxFarLeft[j] = dWdFace * faceDerivativeFarLeft;
    dFluxLeft[j] = -dWdGradient / dx + dWdFace * faceDerivativeLeft;
    dFluxRight[j] = j < N ? dWdGradient / dx + dWdFace * faceDerivativeRight : 0;
    dFluxFarRight[j] = j + 1 < N ? dWdFace * faceDerivativeFarRight : 0;
  }
}
