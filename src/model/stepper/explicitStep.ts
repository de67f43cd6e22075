/**
 * One forward-Euler step of the flowline continuity equation in flux form,
 *
 *   d(w H)/dt = -d(w q)/dx + w b        (e.g. Cuffey & Paterson 2010, eq. 8.63 with width)
 *
 * finite-volume: each cell's volume w_i H_i dx changes by the face volume fluxes in and out, and by
 * the surface balance. Two limits keep thickness non-negative while conserving mass exactly:
 *  - outflow cap: a cell never sends out more ice in one step than it holds; its outgoing face
 *    fluxes are scaled down together (Jarosch, Schoof & Anslow 2013 discuss why this is needed on
 *    steep beds). Scaling a face flux changes the donor and the receiver alike, so no ice is made
 *    or lost.
 *  - ablation limit: negative balance removes at most the ice present; the balance actually
 *    applied is what the budget counts.
 *
 * With a valley section (physics/valleySection.ts) the cell holds A(H) dx: the face fluxes change
 * the area, the thickness follows from the area, and the balance then moves the surface by b dt
 * (a balance uniform across the surface), adding A(H + b dt) - A(H): the surface width swept
 * over the step, w_s integrated over the thickness change (d A / d H = w_s).
 */
import { CompensatedSum } from '../compensatedSum';
import { cellArea, cellThicknessForArea } from '../cellSection';
import type { FlowlineModel } from '../flowlineModel';
import { computeFaceFluxes, createFaceFields, type FaceFields } from '../flux/faceFlux';

/** Fraction of the linear stability limit used for the step (common practice: 0.5-0.9). */
export const STABILITY_SAFETY_FACTOR = 0.8;

export interface MassBudgetTotals {
  /** Ice volume added (positive) or removed (negative) by the applied surface balance [m^3]. */
  appliedBalance: CompensatedSum;
  /** Ice volume that left through the down-valley end of the domain [m^3]. */
  outflow: CompensatedSum;
  /** Gross accumulation: the positive part of the applied balance [m^3] (the glacier's turnover). */
  grossAccumulation: CompensatedSum;
  /** Round-off-sized negative thickness set to zero after the outflow cap [m^3]; reported, not hidden. */
  clippedRoundOff: CompensatedSum;
  /** Implicit scheme: what Newton's tolerance leaves unbalanced [m^3]; the budget residual shows it. */
  solverResidual: CompensatedSum;
  /** Ice volume calved into a lake at the front (positive) [m^3] (physics/frontalAblation.ts). */
  frontalAblation: CompensatedSum;
  /**
   * Applied balance booked in the cell where it happened [m^3 of ice] (length N, or 0 to skip):
   * the terminus' ablation of ice that flowed into a cell and melted within the step is booked
   * there. The run reads and clears it at each output (FlowlineSimulation.takeAppliedBalance).
   */
  appliedByCell: Float64Array;
}

export function createMassBudgetTotals(cellCount = 0): MassBudgetTotals {
  return {
    appliedByCell: new Float64Array(cellCount),
    appliedBalance: new CompensatedSum(),
    outflow: new CompensatedSum(),
    grossAccumulation: new CompensatedSum(),
    clippedRoundOff: new CompensatedSum(),
    solverResidual: new CompensatedSum(),
    frontalAblation: new CompensatedSum(),
  };
}

/** Work arrays reused by every step (no allocation in the time loop). */
export interface StepWorkspace {
  surface: Float64Array;
  faces: FaceFields;
  balance: Float64Array;
  outgoingScale: Float64Array;
}

export function createStepWorkspace(cellCount: number): StepWorkspace {
  return {
    surface: new Float64Array(cellCount),
    faces: createFaceFields(cellCount),
    balance: new Float64Array(cellCount),
    outgoingScale: new Float64Array(cellCount),
  };
}

export interface StepOutcome {
  /** Step actually taken [a]. */
  step: number;
  /** The stability limit before the cap to `maxStep` [a]. */
  stableStep: number;
  /** Face that set the stability limit, or -1. */
  limitingFace: number;
}

/**
 * Advances `thickness` in place by one step of at most `maxStep` years under warming dT [K] and
 * precipitation factor [-].
 */
export function explicitStep(
  model: FlowlineModel,
  thickness: Float64Array,
  warming: number,
  precipitationFactor: number,
  maxStep: number,
  work: StepWorkspace,
  budget: MassBudgetTotals,
): StepOutcome {
  const { grid } = model;
  const N = grid.cellCount;
  const dx = grid.spacing;
  const { surface, balance, outgoingScale } = work;
  const volumeFlux = work.faces.volumeFlux;
  for (let i = 0; i < N; i++) surface[i] = grid.bed[i] + thickness[i];

  const { stableStep, limitingFace } = computeFaceFluxes(grid, model.flow, thickness, work.faces);
  const step = Math.min(maxStep, STABILITY_SAFETY_FACTOR * stableStep);
  model.iceBalance(surface, warming, precipitationFactor, balance);

  // Outflow cap: the share of each cell's outgoing flux it can actually supply this step.
  for (let i = 0; i < N; i++) {
    const outgoing = Math.max(volumeFlux[i + 1], 0) + Math.max(-volumeFlux[i], 0);
    const available = (grid.section ? cellArea(grid, i, thickness[i]) : grid.widthAtCells[i] * thickness[i]) * dx;
    const demand = outgoing * step;
    outgoingScale[i] = demand > available ? available / demand : 1;
  }
  for (let j = 1; j <= N; j++) {
    const flux = volumeFlux[j];
    volumeFlux[j] = flux * (flux > 0 ? outgoingScale[j - 1] : j < N ? outgoingScale[j] : 1);
  }

  if (grid.section) sectionUpdate(model, thickness, step, work, budget);
  else fixedWidthUpdate(model, thickness, step, work, budget);
  budget.outflow.add(step * Math.max(volumeFlux[N], 0));
  return { step, stableStep, limitingFace };
}

/** The cell update with vertical walls: w dx dH = dt (W_in - W_out) + w dx b dt. */
function fixedWidthUpdate(model: FlowlineModel, thickness: Float64Array, step: number, work: StepWorkspace, budget: MassBudgetTotals): void {
  const { grid } = model;
  const N = grid.cellCount;
  const dx = grid.spacing;
  const { balance } = work;
  const volumeFlux = work.faces.volumeFlux;
  const byCell = budget.appliedByCell;
  for (let i = 0; i < N; i++) {
    const cellArea = grid.widthAtCells[i] * dx;
    let afterFlow = thickness[i] + (step * (volumeFlux[i] - volumeFlux[i + 1])) / cellArea;
    if (afterFlow < 0) {
      // The cap guarantees >= 0 up to round-off; what is clipped is counted.
      budget.clippedRoundOff.add(-afterFlow * cellArea);
      afterFlow = 0;
    }
    const applied = Math.max(balance[i] * step, -afterFlow);
    thickness[i] = afterFlow + applied;
    budget.appliedBalance.add(applied * cellArea);
    if (byCell.length > 0) byCell[i] += applied * cellArea;
    if (applied > 0) budget.grossAccumulation.add(applied * cellArea);
  }
}

/** The cell update in a valley section: the area first, then the surface moves by b dt. */
function sectionUpdate(model: FlowlineModel, thickness: Float64Array, step: number, work: StepWorkspace, budget: MassBudgetTotals): void {
  const { grid } = model;
  const N = grid.cellCount;
  const dx = grid.spacing;
  const { balance } = work;
  const volumeFlux = work.faces.volumeFlux;
  const byCell = budget.appliedByCell;
  for (let i = 0; i < N; i++) {
    let afterFlow = cellArea(grid, i, thickness[i]) + (step * (volumeFlux[i] - volumeFlux[i + 1])) / dx;
    if (afterFlow < 0) {
      budget.clippedRoundOff.add(-afterFlow * dx);
      afterFlow = 0;
    }
    const next = Math.max(0, cellThicknessForArea(grid, i, afterFlow) + balance[i] * step);
    // Booked against the area after the flow, so the budget closes whatever the inversion's round-off.
    const applied = (cellArea(grid, i, next) - afterFlow) * dx;
    thickness[i] = next;
    budget.appliedBalance.add(applied);
    if (byCell.length > 0) byCell[i] += applied;
    if (applied > 0) budget.grossAccumulation.add(applied);
  }
}
