/**
 * The time loop around the explicit step: keeps model time, lands exactly on requested times
 * and on whole years (for the annual record), accumulates the mass budget, and stops with a
 * NumericalFailure on non-finite values or a collapsing step.
 */
import { cellSurfaceWidth } from './cellSection';
import type { FlowlineModel } from './flowlineModel';
import { glacierExtent, iceVolume } from './glacierExtent';
import { NumericalFailure } from './numericalFailure';
import { fillLevels } from './analysis/exposedLakes';
import { applyFrontalAblation } from './physics/frontalAblation';
import {
  createMassBudgetTotals,
  createStepWorkspace,
  explicitStep,
  STABILITY_SAFETY_FACTOR,
  type MassBudgetTotals,
  type StepWorkspace,
} from './stepper/explicitStep';
import { createImplicitWorkspace, implicitStep, type ImplicitWorkspace } from './stepper/implicitStep';

/** Longest step either scheme takes [a]: the balance feedback is explicit, and whole years are recorded. */
export const MAX_STEP_YEARS = 1;
/** Thinnest layer of ice over the domain against which the budget residual is judged [m]. */
const MEANINGFUL_FILM_METRES = 1e-3;
/** Implicit steps grow by this factor after a step Newton found easy. */
const IMPLICIT_GROWTH = 1.5;
/** Newton iterations at or below which a step counts as easy. */
const EASY_NEWTON_ITERATIONS = 4;
/** A stability-limited step shorter than this means the run is failing [a] (about 3 s). */
export const COLLAPSED_STEP_YEARS = 1e-7;

export interface SimulationOptions {
  /** Interval of the record [a] (default 1: annual); the loop lands on its multiples. 'target':
   * record only where advanceTo arrives, and let steps stride (spin-up). */
  recordEvery?: number | 'target';
  /** Longest step [a]; default: the scenario's, at most MAX_STEP_YEARS. */
  maxStepYears?: number;
}

export interface AnnualRecord {
  /** Model years at which the record was taken: the start, then multiples of recordEvery [a]. */
  years: number[];
  /** Ice volume at those years [m^3]. */
  volume: number[];
  /** Terminus position at those years [m] (NaN when ice-free). */
  terminus: number[];
  /** Gross accumulation since the start, at those years [m^3]. */
  accumulation: number[];
}

export class FlowlineSimulation {
  readonly thickness: Float64Array;
  time: number;
  steps = 0;
  /** Smallest stability-limited step [a] (steps shortened only to land on a time are not counted). */
  smallestStableStep = Number.POSITIVE_INFINITY;
  largestStep = 0;
  readonly budget: MassBudgetTotals;
  readonly initialVolume: number;
  readonly annual: AnnualRecord = { years: [], volume: [], terminus: [], accumulation: [] };
  private readonly work: StepWorkspace;
  private implicitWork: ImplicitWorkspace | undefined;
  /** The implicit step to try next [a]. */
  private implicitTrialStep: number;
  private readonly maxStep: number;
  /** Newton iterations over all implicit steps (for benchmarks). */
  newtonIterations = 0;
  private nextWholeYear: number;
  /** Model year at which the per-cell applied balance was last read. */
  private lastTake: number;
  private readonly recordEvery: number;
  private readonly recordAtTargets: boolean;
  /** Lake levels of the bed, for frontal ablation (undefined when it is off). */
  private readonly lakeLevels: Float64Array | undefined;
  /** Frontal ablation since the last takeFrontalAblationRate [m^3], and when that was [a]. */
  private frontalSinceTake = 0;
  private lastFrontalTake: number;

  constructor(
    readonly model: FlowlineModel,
    thickness: Float64Array,
    /** Warming [K] at model year t; a spin-up passes a constant. */
    private readonly warmingAt: (year: number) => number = model.warmingAt,
    startTime = 0,
    options: SimulationOptions = {},
  ) {
    this.thickness = Float64Array.from(thickness);
    this.time = startTime;
    this.work = createStepWorkspace(model.grid.cellCount);
    this.budget = createMassBudgetTotals(model.grid.cellCount);
    this.lastTake = startTime;
    this.lastFrontalTake = startTime;
    this.lakeLevels = (model.frontalAblationCoefficient ?? 0) > 0 ? fillLevels(model.grid.bed) : undefined;
    this.maxStep = options.maxStepYears ?? Math.min(MAX_STEP_YEARS, model.numerics.maxStepYears);
    this.implicitTrialStep = Math.min(this.maxStep, MAX_STEP_YEARS);
    this.recordAtTargets = options.recordEvery === 'target';
    this.recordEvery = typeof options.recordEvery === 'number' ? options.recordEvery : 1;
    this.initialVolume = this.volume();
    this.recordYear();
    this.nextWholeYear = this.recordAtTargets
      ? Number.POSITIVE_INFINITY
      : (Math.floor(startTime / this.recordEvery) + 1) * this.recordEvery;
  }

  volume(): number {
    return iceVolume(this.model.grid, this.thickness);
  }

  /** Runs until model year `targetTime` exactly. */
  advanceTo(targetTime: number): void {
    while (this.time < targetTime) {
      const stopAt = Math.min(targetTime, this.nextWholeYear);
      const step =
        this.model.numerics.scheme === 'implicit' ? this.implicitStepTowards(stopAt) : this.explicitStepTowards(stopAt);
      this.steps++;
      if (this.lakeLevels) this.frontalAblationStep(step);
      const landed = this.time + step >= stopAt - 1e-9 * Math.max(1, Math.abs(stopAt));
      this.time = landed ? stopAt : this.time + step;
      if (step > this.largestStep) this.largestStep = step;
      this.checkFinite();
      if (this.time === this.nextWholeYear) {
        this.recordYear();
        this.nextWholeYear += this.recordEvery;
      }
    }
    if (this.recordAtTargets && this.annual.years[this.annual.years.length - 1] !== this.time) this.recordYear();
  }

  private explicitStepTowards(stopAt: number): number {
    const outcome = explicitStep(
      this.model,
      this.thickness,
      this.warmingAt(this.time),
      this.model.precipitationFactorAt(this.time),
      Math.min(this.maxStep, stopAt - this.time),
      this.work,
      this.budget,
    );
    const limited = Math.min(this.maxStep, outcome.stableStep * STABILITY_SAFETY_FACTOR);
    if (limited < this.smallestStableStep) this.smallestStableStep = limited;
    if (limited < COLLAPSED_STEP_YEARS) this.collapsed(limited, outcome.limitingFace * this.model.grid.spacing);
    return outcome.step;
  }

  /**
   * Backward-Euler step: halves the step until Newton converges, lengthens it after easy ones.
   * Fully implicit, the forcing too: the climate at the end of the step, as the thickness is, so
   * the balance the step applies is the one diagnosed from its end state.
   */
  private implicitStepTowards(stopAt: number): number {
    this.implicitWork ??= createImplicitWorkspace(this.model.grid.cellCount);
    for (;;) {
      const trial = Math.min(this.implicitTrialStep, this.maxStep);
      const step = Math.min(trial, stopAt - this.time);
      const warming = this.warmingAt(this.time + step);
      const precipitationFactor = this.model.precipitationFactorAt(this.time + step);
      const outcome = implicitStep(this.model, this.thickness, warming, precipitationFactor, step, this.implicitWork, this.budget);
      this.newtonIterations += outcome.iterations;
      if (outcome.nonFiniteCell >= 0) this.nonFinite(outcome.nonFiniteCell);
      if (outcome.converged) {
        // Steps shortened only to land on a time say nothing about the solver; keep the trial.
        if (step === trial && outcome.iterations <= EASY_NEWTON_ITERATIONS) {
          this.implicitTrialStep = Math.min(this.maxStep, trial * IMPLICIT_GROWTH);
        }
        if (trial < this.smallestStableStep) this.smallestStableStep = trial;
        return step;
      }
      this.implicitTrialStep = trial / 2;
      if (this.implicitTrialStep < COLLAPSED_STEP_YEARS) {
        this.collapsed(this.implicitTrialStep, outcome.worstCell >= 0 ? this.model.grid.x[outcome.worstCell] : undefined);
      }
    }
  }

  /**
   * Split step: calving into a lake at the front over the step just taken (physics/frontalAblation.ts),
   * after the stepper in either scheme; booked apart from the surface balance.
   */
  private frontalAblationStep(step: number): void {
    const removed = applyFrontalAblation(
      this.model.grid,
      this.thickness,
      this.model.frontalAblationCoefficient ?? 0,
      step,
      this.lakeLevels ?? fillLevels(this.model.grid.bed),
    );
    if (removed > 0) {
      this.budget.frontalAblation.add(removed);
      this.frontalSinceTake += removed;
    }
  }

  /** Mean frontal ablation since the last call [m^3 a^-1] (0 when no time has passed); clears it. */
  takeFrontalAblationRate(): number {
    const elapsed = this.time - this.lastFrontalTake;
    const rate = elapsed > 0 ? this.frontalSinceTake / elapsed : 0;
    this.frontalSinceTake = 0;
    this.lastFrontalTake = this.time;
    return rate;
  }

  /**
   * Mean applied balance per cell since the last call [m of ice a^-1], or undefined when no time
   * has passed; clears the booking. Summed as w b dx it is the volume change plus the outflow,
   * w the width (in a valley section: the surface width now, as the frame reports it).
   */
  takeAppliedBalance(): Float64Array | undefined {
    const elapsed = this.time - this.lastTake;
    if (!(elapsed > 0)) return undefined;
    const { grid } = this.model;
    const byCell = this.budget.appliedByCell;
    const rate = new Float64Array(grid.cellCount);
    for (let i = 0; i < grid.cellCount; i++) {
      const width = grid.section ? cellSurfaceWidth(grid, i, this.thickness[i]) : grid.widthAtCells[i];
      rate[i] = byCell[i] / (width * grid.spacing * elapsed);
    }
    byCell.fill(0);
    this.lastTake = this.time;
    return rate;
  }

  private collapsed(step: number, position: number | undefined): never {
    throw new NumericalFailure(
      `time step collapsed to ${(step * 3.15576e7).toExponential(2)} s at model year ${this.time.toFixed(2)}` +
        (position !== undefined ? ` at x = ${position.toFixed(0)} m` : '') +
        ': the ice there is moving implausibly fast (check A, sliding and the bed)',
      this.time,
      position,
    );
  }

  private checkFinite(): void {
    if (Number.isFinite(this.budget.appliedBalance.value) && Number.isFinite(this.budget.outflow.value)) return;
    this.nonFinite(this.thickness.findIndex((h) => !Number.isFinite(h)));
  }

  private nonFinite(cell: number): never {
    const position = cell >= 0 ? this.model.grid.x[cell] : undefined;
    throw new NumericalFailure(
      `non-finite ice thickness at model year ${this.time.toFixed(2)}` +
        (position !== undefined ? ` near x = ${position.toFixed(0)} m` : ''),
      this.time,
      position,
    );
  }

  private recordYear(): void {
    this.annual.years.push(this.time);
    this.annual.volume.push(this.volume());
    this.annual.terminus.push(glacierExtent(this.model.grid, this.thickness).terminus);
    this.annual.accumulation.push(this.budget.grossAccumulation.value);
  }

  /**
   * Mass budget [m^3]: residual = final - initial - applied balance + outflow + frontal ablation
   * (round-off only).
   */
  massBudget() {
    const finalVolume = this.volume();
    const appliedBalance = this.budget.appliedBalance.value;
    const outflow = this.budget.outflow.value;
    const clippedRoundOff = this.budget.clippedRoundOff.value;
    const solverResidual = this.budget.solverResidual.value;
    const frontalAblation = this.budget.frontalAblation.value;
    const residual = finalVolume - this.initialVolume - appliedBalance + outflow + frontalAblation;
    // Every term of the budget is bounded by the larger of these, so the residual is judged
    // against the ice the run actually handled, but never against less than a millimetre of ice
    // over the domain: that is no glacier, and its balance is computed from surface elevations
    // whose round-off (about 2e-13 m at 1,500 m a.s.l.) is then no longer small beside it.
    const grossAccumulation = this.budget.grossAccumulation.value;
    const roundOffFloor = MEANINGFUL_FILM_METRES * iceVolume(this.model.grid, this.model.grid.widthAtCells.map(() => 1));
    const scale = Math.max(this.initialVolume, finalVolume, grossAccumulation, outflow, frontalAblation, roundOffFloor);
    return {
      initialVolume: this.initialVolume,
      finalVolume,
      appliedBalance,
      outflow,
      frontalAblation,
      residual,
      grossAccumulation,
      relativeResidual: Math.abs(residual) / scale,
      clippedRoundOff,
      solverResidual,
    };
  }
}
