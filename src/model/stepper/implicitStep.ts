/**
 * One backward-Euler step of the flowline continuity equation, solved by Newton's method with
 * the constraint H >= 0:
 *
 *   R_i = w_i dx (H_i - H_i_old) + dt (W_{i+1/2} - W_{i-1/2}) - dt w_i dx b_i = 0   where H_i > 0
 *   H_i = 0 and R_i >= 0                                                          otherwise
 *
 * W the face volume flux of faceFluxes.ts, with the same upwind minmod-limited face thickness (it
 * vanishes with the upwind cell's thickness, so ice cannot be drawn from a cell that has none),
 * b the ice-equivalent balance at the start-of-step surface. The
 * complementarity form is the implicit statement of "ablation removes at most the ice present":
 * on a cell held at zero the balance actually applied is b - R_i / (w_i dx dt), and the budget
 * counts exactly that. Backward Euler has no stability limit, so steps are set by accuracy and
 * by Newton's convergence (halved on failure, lengthened after easy steps); cf. the implicit
 * free-boundary treatment of Bueler (2016, J. Glaciol. 62(232)).
 *
 * The Jacobian is tridiagonal (the face flux depends on the two cells beside it) and is solved
 * with the Thomas algorithm; the shape factor is lagged within a step.
 */
import type { FlowlineModel } from '../flowlineModel';
import { nyeShapeFactor } from '../physics/shapeFactor';
import type { MassBudgetTotals } from './explicitStep';
import { minmod } from './minmod';
import { solveTridiagonal } from './tridiagonal';

/** Newton stops when every free cell's residual is below this thickness change [m]. */
const NEWTON_TOLERANCE_METRES = 1e-9;
const MAX_NEWTON_ITERATIONS = 40;

export interface ImplicitWorkspace {
  old: Float64Array;
  trial: Float64Array;
  surface: Float64Array;
  balance: Float64Array;
  shape: Float64Array;
  volumeFlux: Float64Array;
  /** d W_j / d H_{j-1} and d W_j / d H_j at each face. */
  dFluxLeft: Float64Array;
  dFluxRight: Float64Array;
  residual: Float64Array;
  lower: Float64Array;
  diagonal: Float64Array;
  upper: Float64Array;
  correction: Float64Array;
  scratch: Float64Array;
  /** 1 where the cell is held at zero thickness (constraint active). */
  held: Uint8Array;
}

export function createImplicitWorkspace(cellCount: number): ImplicitWorkspace {
  const cells = () => new Float64Array(cellCount);
  const faces = () => new Float64Array(cellCount + 1);
  return {
    old: cells(),
    trial: cells(),
    surface: cells(),
    balance: cells(),
    shape: faces(),
    volumeFlux: faces(),
    dFluxLeft: faces(),
    dFluxRight: faces(),
    residual: cells(),
    lower: cells(),
    diagonal: cells(),
    upper: cells(),
    correction: cells(),
    scratch: cells(),
    held: new Uint8Array(cellCount),
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
  const dx = grid.spacing;
  const { old, trial, surface, balance, residual, lower, diagonal, upper, correction, scratch } = work;
  old.set(thickness);
  trial.set(thickness);
  for (let i = 0; i < N; i++) surface[i] = grid.bed[i] + old[i];
  model.iceBalance(surface, warming, balance);
  lagShapeFactor(model, old, surface, work.shape);

  let worst = Number.POSITIVE_INFINITY;
  for (let iteration = 1; iteration <= MAX_NEWTON_ITERATIONS; iteration++) {
    fluxesAndDerivatives(model, trial, work);
    const flux = work.volumeFlux;
    worst = 0;
    for (let i = 0; i < N; i++) {
      const cellArea = grid.widthAtCells[i] * dx;
      const r = cellArea * (trial[i] - old[i]) + step * (flux[i + 1] - flux[i]) - step * cellArea * balance[i];
      if (!Number.isFinite(r)) return { converged: false, iterations: iteration, residual: Number.NaN, nonFiniteCell: i };
      residual[i] = r;
      // Bare ground that would melt further: the constraint is active.
      work.held[i] = trial[i] === 0 && r >= 0 ? 1 : 0;
      if (work.held[i]) {
        lower[i] = 0;
        upper[i] = 0;
        diagonal[i] = 1;
        residual[i] = 0;
        continue;
      }
      worst = Math.max(worst, Math.abs(r) / cellArea);
      diagonal[i] = cellArea + step * (work.dFluxLeft[i + 1] - work.dFluxRight[i]);
      upper[i] = i + 1 < N ? step * work.dFluxRight[i + 1] : 0;
      lower[i] = i > 0 ? -step * work.dFluxLeft[i] : 0;
    }
    // At least one Newton update, so that a balance smaller than the tolerance is still applied.
    if (iteration > 1 && worst <= NEWTON_TOLERANCE_METRES) {
      commit(model, thickness, step, work, budget);
      return { converged: true, iterations: iteration - 1, residual: worst, nonFiniteCell: -1 };
    }
    for (let i = 0; i < N; i++) residual[i] = -residual[i];
    solveTridiagonal(lower, diagonal, upper, residual, correction, scratch);
    for (let i = 0; i < N; i++) {
      const next = trial[i] + correction[i];
      if (!Number.isFinite(next)) return { converged: false, iterations: iteration, residual: worst, nonFiniteCell: i };
      trial[i] = next > 0 ? next : 0;
    }
  }
  return { converged: false, iterations: MAX_NEWTON_ITERATIONS, residual: worst, nonFiniteCell: -1 };
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

/**
 * Thickness at face j seen from the upwind cell: the same minmod-limited (MUSCL) reconstruction as
 * the explicit scheme. It is zero whenever the upwind cell is empty, so an empty cell sends nothing.
 */
function reconstructedFaceThickness(thickness: Float64Array, j: number, downValley: boolean, N: number): number {
  if (downValley) {
    const c = thickness[j - 1];
    const previous = j - 2 >= 0 ? thickness[j - 2] : c;
    const next = j < N ? thickness[j] : 0;
    return c + 0.5 * minmod(c - previous, next - c);
  }
  if (j >= N) return 0;
  const c = thickness[j];
  const next = j + 1 < N ? thickness[j + 1] : c;
  return c - 0.5 * minmod(c - thickness[j - 1], next - c);
}

/**
 * Face volume fluxes W_j [m^3 a^-1] and their derivatives with respect to the thickness of the
 * cells on either side. The derivatives treat the reconstructed face thickness as moving with
 * the upwind cell alone (an approximate Jacobian: Newton then converges linearly rather than
 * quadratically, to the same tolerance).
 */
function fluxesAndDerivatives(model: FlowlineModel, thickness: Float64Array, work: ImplicitWorkspace): void {
  const { grid, flow } = model;
  const N = grid.cellCount;
  const dx = grid.spacing;
  const { n, slidingExponent: m, slidingCoefficient: C } = flow;
  const rhoG = flow.density * flow.gravity;
  const deformation = (2 * flow.rateFactorPerYear) / (n + 2);
  const { volumeFlux, dFluxLeft, dFluxRight, shape } = work;
  volumeFlux[0] = 0;
  dFluxLeft[0] = 0;
  dFluxRight[0] = 0;
  for (let j = 1; j <= N; j++) {
    const left = j - 1;
    const sLeft = grid.bed[left] + thickness[left];
    const sRight = j < N ? grid.bed[j] + thickness[j] : grid.bedBeyondEnd;
    const gradient = (sRight - sLeft) / dx;
    const downValley = gradient < 0;
    const upwindThickness = reconstructedFaceThickness(thickness, j, downValley, N);
    const width = grid.widthAtFaces[j];
    if (gradient === 0 || upwindThickness <= 0) {
      volumeFlux[j] = 0;
      // Ice could start to flow as soon as the upwind cell has some: the derivative with respect
      // to it is zero here for n > 1, so only the slope term can matter, and it is zero too.
      dFluxLeft[j] = 0;
      dFluxRight[j] = 0;
      continue;
    }
    const slope = Math.abs(gradient);
    const stress = shape[j] * rhoG * slope; // tau / H
    const k = deformation * Math.pow(stress, n);
    const qDeformation = k * Math.pow(upwindThickness, n + 2);
    let qSliding = 0;
    if (C > 0) qSliding = C * Math.pow(stress, m) * Math.pow(upwindThickness, m + 1);
    const q = qDeformation + qSliding;
    const direction = downValley ? 1 : -1;
    volumeFlux[j] = direction * width * q;
    // d|q|/d|g| and d|q|/dH_upwind
    const dqdSlope = (n * qDeformation + m * qSliding) / slope;
    const dqdH = ((n + 2) * qDeformation + (m + 1) * qSliding) / upwindThickness;
    // W = -sign(g)|q| width... with g = (s_j - s_{j-1}) / dx: dW/dg = -width dq/d|g| (both signs).
    const dWdGradient = -width * dqdSlope;
    dFluxLeft[j] = -dWdGradient / dx + (downValley ? width * dqdH : 0);
    dFluxRight[j] = j < N ? dWdGradient / dx + (downValley ? 0 : -width * dqdH) : 0;
  }
}
