/**
 * One backward-Euler step of the flowline continuity equation, solved by Newton's method with
 * the constraint H >= 0:
 *
 *   R_i = w_i dx (H_i - H_i_old) + dt (W_{i+1/2} - W_{i-1/2}) - dt w_i dx b_i = 0   where H_i > 0
 *   H_i = 0 and R_i >= 0                                                          otherwise
 *
 * W the face volume flux of flux/faceFlux.ts, the same function the explicit step and the
 * diagnostics call (its upwind face thickness vanishes with the upwind cell's thickness, so ice
 * cannot be drawn from a cell that has none),
 * b the ice-equivalent balance at the end-of-step surface (the elevation feedback is implicit too,
 * with db/ds from a finite difference in the Jacobian, so long steps stay stable). The
 * complementarity form is the implicit statement of "ablation removes at most the ice present":
 * on a cell held at zero the balance actually applied is b - R_i / (w_i dx dt), and the budget
 * counts exactly that. Backward Euler has no stability limit, so steps are set by accuracy and
 * by Newton's convergence (halved on failure, lengthened after easy steps); cf. the implicit
 * free-boundary treatment of Bueler (2016, J. Glaciol. 62(232)).
 *
 * With a valley section (physics/valleySection.ts) the cell holds A(H) dx and the balance falls
 * on the surface width swept while the surface moves from H_old to H, the secant width
 * w_m = (A(H) - A(H_old)) / (H - H_old) (exact for a balance uniform across the surface):
 *
 *   R_i = dx (A_i(H_i) - A_i(H_i_old)) + dt (W_{i+1/2} - W_{i-1/2}) - dt w_m,i dx b_i
 *
 * and Newton solves R_i / w_m,i = 0, whose balance part dx (H - H_old - dt b) no longer depends on
 * the width, so a growing surface width cannot turn the diagonal negative (as dt b dw_s/dH > w_s
 * would on narrow floors under heavy accumulation). The row's derivative is exact:
 * d(R/w_m)/dH = (dR/dH) / w_m - R w_m' / w_m^2, with dR/dH_i = dx w_s - dt dx (w_m' b + w_m db/ds)
 * plus the face terms.
 *
 * The Jacobian is pentadiagonal (a face flux depends on the two cells beside it through the
 * surface gradient and on one more through the reconstruction) and is solved by band Gaussian
 * elimination. Its entries are faceFlux.ts's analytic derivatives, shape factor included. A
 * correction that is not finite (a singular or poisoned Jacobian) is a failed iteration: the
 * step is retried shorter, never applied.
 */
import { cellArea, cellSurfaceWidth } from '../cellSection';
import type { FlowlineModel } from '../flowlineModel';
import { secantWidth, secantWidthSlope } from '../physics/valleySection';
import { computeFaceFluxes, createFaceFields, createFaceJacobian, type FaceFields, type FaceJacobian } from '../flux/faceFlux';
import type { MassBudgetTotals } from './explicitStep';
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
  faces: FaceFields;
  /** d W_j / d H_{j-2}, d H_{j-1}, d H_j and d H_{j+1} at each face. */
  dFlux: FaceJacobian;
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
  return {
    old: cells(),
    trial: cells(),
    surface: cells(),
    balance: cells(),
    balanceAbove: cells(),
    faces: createFaceFields(cellCount),
    dFlux: createFaceJacobian(cellCount),
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
  /** The free cell with the largest remaining residual (where a failing step fails), or -1. */
  worstCell: number;
}

/**
 * Tries one backward-Euler step of length `step` [a]. On success `thickness` holds the new state
 * and the budget is updated; on failure nothing changes.
 */
export function implicitStep(
  model: FlowlineModel,
  thickness: Float64Array,
  warming: number,
  precipitationFactor: number,
  step: number,
  work: ImplicitWorkspace,
  budget: MassBudgetTotals,
): ImplicitOutcome {
  const { grid } = model;
  const N = grid.cellCount;
  const { old, trial, correction, candidate } = work;
  old.set(thickness);
  // First guess: the last step's rate carried on (the glacier changes smoothly in time).
  for (let i = 0; i < N; i++) {
    const guess = old[i] + step * work.lastRate[i];
    trial[i] = guess > 0 ? guess : 0;
  }

  let state = evaluate(model, trial, warming, precipitationFactor, step, work);
  let previousNorm = Number.POSITIVE_INFINITY;
  for (let iteration = 1; iteration <= MAX_NEWTON_ITERATIONS; iteration++) {
    if (state.nonFiniteCell >= 0) return { converged: false, iterations: iteration, residual: Number.NaN, nonFiniteCell: state.nonFiniteCell, worstCell: state.nonFiniteCell };
    // At least one Newton update, so that a balance smaller than the tolerance is still applied.
    const stalled = iteration > 2 && state.worst <= STALLED_TOLERANCE_METRES && state.norm > 0.5 * previousNorm;
    if (iteration > 1 && (state.worst <= NEWTON_TOLERANCE_METRES || stalled)) {
      commit(model, thickness, step, work, budget);
      return { converged: true, iterations: iteration - 1, residual: state.worst, nonFiniteCell: -1, worstCell: state.worstCell };
    }
    previousNorm = state.norm;
    solvePentadiagonal(work.jacobian, correction);
    // Backtracking line search on the residual norm: full Newton steps can overshoot where the
    // limiter or the margin switches, most on fine grids with long steps.
    let fraction = 1;
    for (let attempt = 0; ; attempt++) {
      for (let i = 0; i < N; i++) {
        const next = trial[i] + fraction * correction[i];
        // NaN > 0 is false: a non-finite correction must fail the iteration, not become bare rock.
        if (!Number.isFinite(next)) return { converged: false, iterations: iteration, residual: state.worst, nonFiniteCell: -1, worstCell: poisonedRow(work, i) };
        candidate[i] = next > 0 ? next : 0;
      }
      const tried = evaluate(model, candidate, warming, precipitationFactor, step, work);
      if (tried.nonFiniteCell < 0 && (tried.norm < state.norm || attempt === LINE_SEARCH_HALVINGS)) {
        trial.set(candidate);
        state = tried;
        break;
      }
      if (attempt === LINE_SEARCH_HALVINGS) return { converged: false, iterations: iteration, residual: state.worst, nonFiniteCell: tried.nonFiniteCell, worstCell: state.worstCell };
      fraction /= 2;
    }
  }
  return { converged: false, iterations: MAX_NEWTON_ITERATIONS, residual: state.worst, nonFiniteCell: -1, worstCell: state.worstCell };
}

interface Evaluation {
  /** Largest free-cell residual [m of ice]. */
  worst: number;
  /** Root-mean-square free-cell residual [m of ice], for the line search. */
  norm: number;
  /** First cell with a non-finite residual, or -1. */
  nonFiniteCell: number;
  /** Free cell with the largest residual, or -1. */
  worstCell: number;
}

/** Residual, active set and Jacobian at thickness `h`; fills the workspace. */
function evaluate(
  model: FlowlineModel,
  h: Float64Array,
  warming: number,
  precipitationFactor: number,
  step: number,
  work: ImplicitWorkspace,
): Evaluation {
  const { grid } = model;
  const N = grid.cellCount;
  const dx = grid.spacing;
  const { old, surface, balance, residual } = work;
  const { below2, below1, diagonal, above1, above2, rhs } = work.jacobian;
  const { farLeft: FL, left: L, right: R, farRight: FR } = work.dFlux;
  computeFaceFluxes(grid, model.flow, h, work.faces, work.dFlux);
  const flux = work.faces.volumeFlux;
  for (let i = 0; i < N; i++) surface[i] = grid.bed[i] + h[i];
  model.iceBalance(surface, warming, precipitationFactor, balance);
  for (let i = 0; i < N; i++) surface[i] += BALANCE_PROBE_METRES;
  model.iceBalance(surface, warming, precipitationFactor, work.balanceAbove);
  if (grid.section) return evaluateSection(model, h, step, work);
  let worst = 0;
  let worstCell = -1;
  let sumSquares = 0;
  for (let i = 0; i < N; i++) {
    const cellArea = grid.widthAtCells[i] * dx;
    const r = cellArea * (h[i] - old[i]) + step * (flux[i + 1] - flux[i]) - step * cellArea * balance[i];
    if (!Number.isFinite(r)) return { worst: Number.NaN, norm: Number.NaN, nonFiniteCell: i, worstCell: i };
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
    if (thicknessResidual > worst) {
      worst = thicknessResidual;
      worstCell = i;
    }
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
  return { worst, norm: Math.sqrt(sumSquares / N), nonFiniteCell: -1, worstCell };
}

/**
 * evaluate's residual rows in a valley section, after the face fluxes and the balances are in the
 * workspace: residual[i] holds R_i [m^3] (booked as solver residual), the Jacobian and rhs the
 * row R_i / w_m,i.
 */
function evaluateSection(model: FlowlineModel, h: Float64Array, step: number, work: ImplicitWorkspace): Evaluation {
  const { grid } = model;
  const section = grid.section!;
  const N = grid.cellCount;
  const dx = grid.spacing;
  const { old, balance, residual } = work;
  const { below2, below1, diagonal, above1, above2, rhs } = work.jacobian;
  const { farLeft: FL, left: L, right: R, farRight: FR } = work.dFlux;
  const flux = work.faces.volumeFlux;
  let worst = 0;
  let worstCell = -1;
  let sumSquares = 0;
  for (let i = 0; i < N; i++) {
    const floor = grid.widthAtCells[i];
    const meanWidth = secantWidth(section, floor, h[i], old[i]);
    const r = dx * (cellArea(grid, i, h[i]) - cellArea(grid, i, old[i])) + step * (flux[i + 1] - flux[i]) - step * dx * meanWidth * balance[i];
    if (!Number.isFinite(r)) return { worst: Number.NaN, norm: Number.NaN, nonFiniteCell: i, worstCell: i };
    residual[i] = r;
    work.held[i] = h[i] === 0 && r >= 0 ? 1 : 0;
    if (work.held[i]) {
      below2[i] = below1[i] = above1[i] = above2[i] = 0;
      diagonal[i] = 1;
      residual[i] = 0;
      rhs[i] = 0;
      continue;
    }
    const thicknessResidual = Math.abs(r) / (meanWidth * dx);
    if (thicknessResidual > worst) {
      worst = thicknessResidual;
      worstCell = i;
    }
    sumSquares += thicknessResidual * thicknessResidual;
    const scale = step / meanWidth;
    const meanWidthSlope = secantWidthSlope(section, floor, h[i], old[i]);
    const balanceSlope = (work.balanceAbove[i] - balance[i]) / BALANCE_PROBE_METRES;
    const dRdH =
      dx * cellSurfaceWidth(grid, i, h[i]) + step * (L[i + 1] - R[i]) - step * dx * (meanWidthSlope * balance[i] + meanWidth * balanceSlope);
    below2[i] = -scale * FL[i];
    below1[i] = scale * (FL[i + 1] - L[i]);
    diagonal[i] = dRdH / meanWidth - (r * meanWidthSlope) / (meanWidth * meanWidth);
    above1[i] = scale * (R[i + 1] - FR[i]);
    above2[i] = i + 1 < N ? scale * FR[i + 1] : 0;
    rhs[i] = -r / meanWidth;
  }
  return { worst, norm: Math.sqrt(sumSquares / N), nonFiniteCell: -1, worstCell };
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
  const { trial, old, balance, residual } = work;
  const flux = work.faces.volumeFlux;
  const section = grid.section;
  const dx = grid.spacing;
  for (let i = 0; i < N; i++) {
    let applied: number;
    if (section) {
      // The same rows as evaluateSection: held cells gain what their area did, free ones w_m b dt dx.
      if (work.held[i]) applied = dx * (cellArea(grid, i, trial[i]) - cellArea(grid, i, old[i])) + step * (flux[i + 1] - flux[i]);
      else {
        applied = step * dx * secantWidth(section, grid.widthAtCells[i], trial[i], old[i]) * balance[i];
        budget.solverResidual.add(residual[i]);
      }
    } else {
      const cellArea = grid.widthAtCells[i] * grid.spacing;
      if (work.held[i]) applied = cellArea * (trial[i] - old[i]) + step * (flux[i + 1] - flux[i]);
      else {
        applied = step * cellArea * balance[i];
        budget.solverResidual.add(residual[i]);
      }
    }
    budget.appliedBalance.add(applied);
    if (budget.appliedByCell.length > 0) budget.appliedByCell[i] += applied;
    if (applied > 0) budget.grossAccumulation.add(applied);
    work.lastRate[i] = (trial[i] - old[i]) / step;
    thickness[i] = trial[i];
  }
  budget.outflow.add(step * Math.max(flux[N], 0));
}

/** Where a non-finite correction came from: the first Jacobian row that is not finite, else `fallback`. */
function poisonedRow(work: ImplicitWorkspace, fallback: number): number {
  const { below2, below1, diagonal, above1, above2 } = work.jacobian;
  for (let i = 0; i < diagonal.length; i++) {
    if (!Number.isFinite(below2[i] + below1[i] + diagonal[i] + above1[i] + above2[i])) return i;
  }
  return fallback;
}
