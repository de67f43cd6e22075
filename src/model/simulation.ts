/**
 * The time loop around the explicit step: keeps model time, lands exactly on requested times
 * and on whole years (for the annual record), accumulates the mass budget, and stops with a
 * NumericalFailure on non-finite values or a collapsing step.
 */
import { CompensatedSum } from './compensatedSum';
import type { FlowlineModel } from './flowlineModel';
import { glacierExtent, iceVolume } from './glacierExtent';
import { NumericalFailure } from './numericalFailure';
import { createStepWorkspace, explicitStep, STABILITY_SAFETY_FACTOR, type MassBudgetTotals, type StepWorkspace } from './stepper/explicitStep';

/** Longest step the loop takes even when the ice is still [a]: the balance feedback is explicit. */
export const MAX_STEP_YEARS = 1;
/** A stability-limited step shorter than this means the run is failing [a] (about 3 s). */
export const COLLAPSED_STEP_YEARS = 1e-7;

export interface AnnualRecord {
  /** Model years 0, 1, 2, ... relative to the simulation's start [a]. */
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
  private nextWholeYear: number;

  constructor(
    readonly model: FlowlineModel,
    thickness: Float64Array,
    /** Warming [K] at model year t; a spin-up passes a constant. */
    private readonly warmingAt: (year: number) => number = model.warmingAt,
    startTime = 0,
  ) {
    this.thickness = Float64Array.from(thickness);
    this.time = startTime;
    this.work = createStepWorkspace(model.grid.cellCount);
    this.budget = {
      appliedBalance: new CompensatedSum(),
      outflow: new CompensatedSum(),
      grossAccumulation: new CompensatedSum(),
      clippedRoundOff: new CompensatedSum(),
    };
    this.initialVolume = this.volume();
    this.recordYear();
    this.nextWholeYear = Math.floor(startTime) + 1;
  }

  volume(): number {
    return iceVolume(this.model.grid, this.thickness);
  }

  /** Runs until model year `targetTime` exactly. `shouldStop` is polled once per model year. */
  advanceTo(targetTime: number): void {
    while (this.time < targetTime) {
      const stopAt = Math.min(targetTime, this.nextWholeYear);
      const outcome = explicitStep(
        this.model,
        this.thickness,
        this.warmingAt(this.time),
        Math.min(MAX_STEP_YEARS, stopAt - this.time),
        this.work,
        this.budget,
      );
      this.steps++;
      const landed = this.time + outcome.step >= stopAt - 1e-9 * Math.max(1, Math.abs(stopAt));
      this.time = landed ? stopAt : this.time + outcome.step;
      this.checkHealth(outcome);
      if (this.time === this.nextWholeYear) {
        this.recordYear();
        this.nextWholeYear++;
      }
    }
  }

  private checkHealth(outcome: { step: number; stableStep: number; limitingFace: number }): void {
    const limited = Math.min(MAX_STEP_YEARS, outcome.stableStep * STABILITY_SAFETY_FACTOR);
    if (limited < this.smallestStableStep) this.smallestStableStep = limited;
    if (outcome.step > this.largestStep) this.largestStep = outcome.step;
    if (!Number.isFinite(this.budget.appliedBalance.value) || !Number.isFinite(this.budget.outflow.value)) {
      const bad = this.thickness.findIndex((h) => !Number.isFinite(h));
      const position = bad >= 0 ? this.model.grid.x[bad] : undefined;
      throw new NumericalFailure(
        `non-finite ice thickness at model year ${this.time.toFixed(2)}` +
          (position !== undefined ? ` near x = ${position.toFixed(0)} m` : ''),
        this.time,
        position,
      );
    }
    if (outcome.stableStep * STABILITY_SAFETY_FACTOR < COLLAPSED_STEP_YEARS) {
      const position = outcome.limitingFace >= 0 ? outcome.limitingFace * this.model.grid.spacing : undefined;
      throw new NumericalFailure(
        `time step collapsed to ${(outcome.stableStep * STABILITY_SAFETY_FACTOR * 3.15576e7).toExponential(2)} s at model year ` +
          `${this.time.toFixed(2)}` + (position !== undefined ? ` at x = ${position.toFixed(0)} m` : '') +
          ': the ice there is moving implausibly fast (check A, sliding and the bed)',
        this.time,
        position,
      );
    }
  }

  private recordYear(): void {
    this.annual.years.push(this.time);
    this.annual.volume.push(this.volume());
    this.annual.terminus.push(glacierExtent(this.model.grid, this.thickness).terminus);
    this.annual.accumulation.push(this.budget.grossAccumulation.value);
  }

  /** Mass budget [m^3]: residual = final - initial - applied balance + outflow (round-off only). */
  massBudget() {
    const finalVolume = this.volume();
    const appliedBalance = this.budget.appliedBalance.value;
    const outflow = this.budget.outflow.value;
    const clippedRoundOff = this.budget.clippedRoundOff.value;
    const residual = finalVolume - this.initialVolume - appliedBalance + outflow;
    // Every term of the budget is bounded by the larger of these, so the residual is judged
    // against the ice the run actually handled.
    const grossAccumulation = this.budget.grossAccumulation.value;
    const scale = Math.max(this.initialVolume, finalVolume, grossAccumulation, outflow, Number.MIN_VALUE);
    return {
      initialVolume: this.initialVolume,
      finalVolume,
      appliedBalance,
      outflow,
      residual,
      grossAccumulation,
      relativeResidual: Math.abs(residual) / scale,
      clippedRoundOff,
    };
  }
}
