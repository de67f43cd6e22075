/**
 * One complete run of a scenario: optional spin-up, then the run from year 0 with outputs at
 * 0, outputEvery, 2 outputEvery, ... and always the final year. Pure: the browser worker, the
 * command line and the tests all call this (or step a FlowlineSimulation themselves).
 */
import { cellSurfaceWidth } from './cellSection';
import { createFlowlineModel } from './createFlowlineModel';
import { diagnoseFrame, type DiagnosedFrame } from './diagnostics';
import type { FlowlineModel, Numerics } from './flowlineModel';
import { glacierExtent } from './glacierExtent';
import { detectStepForcing, eFoldingTime, volumeTimescaleEstimate, type StepForcing } from './responseTime';
import type { RunSpec, Scenario } from './scenario';
import { FlowlineSimulation, type AnnualRecord } from './simulation';
import { SpinUp, type SpinUpResult } from './spinUp';
import { endsInSteadyState, STEADY_STATE_CRITERION } from './steadyState';
import { todayStartSteps, type StartReport, type TodayStart } from './todayStart';
import type { AnalysisSteps } from './analysis/stepwise';
import { climateSeries, warmingPoints } from './climate';

/** An output of a run: the diagnosed frame (diagnostics.ts), made once per output time. */
export type OutputFrame = DiagnosedFrame;

export interface MassBudgetReport {
  initialVolume: number;
  finalVolume: number;
  appliedBalance: number;
  outflow: number;
  /** Ice calved into a lake at the front [m^3] (physics/frontalAblation.ts); 0 without. */
  frontalAblation: number;
  /** Positive part of the applied balance [m^3]; the scale the residual is judged against. */
  grossAccumulation: number;
  residual: number;
  relativeResidual: number;
  clippedRoundOff: number;
  /** Implicit scheme: volume left unbalanced by Newton's tolerance [m^3] (0 for explicit). */
  solverResidual: number;
}

export interface ResponseTimeReport {
  /** Years over which the warming step happens [a]. */
  stepStart: number;
  stepEnd: number;
  /** Modelled e-folding time of volume after the step start [a]; NaN when not reached. */
  eFoldingYears: number;
  /** Johannesson et al. (1989) estimate H / (-b_t) [a]. */
  estimateYears: number;
  /** Whether the run ended steady (else the e-folding time is provisional). */
  reachedSteadyState: boolean;
}

export interface RunSummary {
  massBudget: MassBudgetReport;
  /** The time-stepping used. */
  numerics: Numerics;
  spinup?: { years: number; converged: boolean; steps: number; criterion: string; reused?: boolean };
  /** The start from the glacier as it is today (scenario.start), with the change committed at year 0. */
  start?: StartReport;
  steps: number;
  /** Smallest stability-limited time step [a]. */
  smallestStep: number;
  /** Largest time step taken [a]. */
  largestStep: number;
  endsInSteadyState: boolean;
  responseTime?: ResponseTimeReport;
  warnings: string[];
}

export interface RunReport {
  model: FlowlineModel;
  frames: OutputFrame[];
  annual: AnnualRecord;
  summary: RunSummary;
}

export interface RunCallbacks {
  onFrame?: (frame: OutputFrame) => void;
  /** `message`: what the start from today's glacier is doing (scenario.start), in words. */
  onProgress?: (progress: { phase: 'spinup' | 'run'; year: number; of: number; message?: string }) => void;
}

/** Output times: 0, outputEvery, ... below `years`, then `years` itself. */
export function outputTimes(run: RunSpec): number[] {
  const times: number[] = [];
  for (let k = 0; ; k++) {
    // Rounded to 12 figures so that 3 * 0.1 is written as 0.3, not 0.30000000000000004.
    const t = Number((k * run.outputEvery).toPrecision(12));
    if (t >= run.years - 1e-9 * run.years) break;
    times.push(t);
  }
  times.push(run.years);
  return times;
}

export function runScenario(scenario: Scenario, callbacks: RunCallbacks = {}): RunReport {
  const run = new ScenarioRun(scenario);
  while (!run.advanceSpinUp(SPINUP_SLICE_YEARS)) {
    callbacks.onProgress?.({ phase: 'spinup', year: run.spinUpYears, of: run.spinUpMaxYears, ...(run.startMessage ? { message: run.startMessage } : {}) });
  }
  for (let frame = run.nextFrame(); frame; frame = run.nextFrame()) {
    callbacks.onFrame?.(frame);
    callbacks.onProgress?.({ phase: 'run', year: frame.time, of: scenario.run.years });
  }
  return run.report();
}

/**
 * What a spin-up depends on: everything but the name, the run length and outputs, and the
 * warming after year 0 (only dT(0) sets the spin-up climate). Equal keys, equal spin-ups.
 */
export function spinUpKey(scenario: Scenario): string {
  const { name: _name, run: _run, warming: _warming, forcing: _forcing, variability: _variability, ...rest } = scenario;
  const climate = climateSeries(scenario);
  return JSON.stringify({ ...rest, warmingAtYear0: climate.warmingAt(0), precipitationFactorAtYear0: climate.precipitationFactorAt(0) });
}

/** Model years of spin-up between progress reports. */
const SPINUP_SLICE_YEARS = 50;

/**
 * A run that advances on request: spin-up in slices, then one output frame at a time. The
 * browser worker drives it between messages (pause, stop); runScenario drives it to the end.
 */
export class ScenarioRun {
  readonly model: FlowlineModel;
  readonly frames: OutputFrame[] = [];
  private readonly warnings: string[] = [];
  private readonly spin: SpinUp | undefined;
  /** The start from today's glacier (scenario.start), while it is worked out; then its outcome. */
  private readonly today: AnalysisSteps<TodayStart> | undefined;
  private todayDone: TodayStart | undefined;
  private todaySlices = 0;
  private todayMessage: string | undefined;
  private simulation: FlowlineSimulation | undefined;
  private readonly times: number[];
  private readonly step: StepForcing | undefined;
  private startThickness: Float64Array;
  private beforeStep: Float64Array | undefined;

  /** A spin-up finished earlier for the same glacier and year-0 climate (see spinUpKey), reused. */
  private readonly reusedSpinUp: SpinUpResult | undefined;

  constructor(
    readonly scenario: Scenario,
    options: { reuseSpinUp?: SpinUpResult } = {},
  ) {
    this.model = createFlowlineModel(scenario);
    this.startThickness = this.model.initialThickness;
    this.reusedSpinUp = scenario.spinup && options.reuseSpinUp?.thickness.length === this.model.grid.cellCount ? options.reuseSpinUp : undefined;
    this.spin = scenario.spinup && !this.reusedSpinUp && !scenario.start ? new SpinUp(this.model, this.startThickness) : undefined;
    this.today = scenario.start ? todayStartSteps(this.model, scenario) : undefined;
    this.times = outputTimes(scenario.run);
    this.step = detectStepForcing(warmingPoints(scenario), scenario.run.years);
  }

  get spinUpYears(): number {
    return this.spin?.years ?? 0;
  }

  get spinUpMaxYears(): number {
    return this.spin?.maxYears ?? 0;
  }

  /** A copy of the glacier during the spin-up [m], or undefined when there is no spin-up under way. */
  spinUpThickness(): Float64Array | undefined {
    return this.spin && !this.spin.done ? Float64Array.from(this.spin.thickness) : undefined;
  }

  /** Progress messages of the start from today's glacier so far (0 without one). */
  get startSlices(): number {
    return this.todaySlices;
  }

  /** What the start from today's glacier is doing, in words (undefined without one, or once done). */
  get startMessage(): string | undefined {
    return this.todayDone ? undefined : this.todayMessage;
  }

  /** Advances the spin-up by up to `years` model years; true once it is over (or not asked for). */
  advanceSpinUp(years: number): boolean {
    if (this.today && !this.simulation) {
      // The start from today's glacier: one to a few of its progress steps per call.
      for (let k = 0; k < Math.max(1, Math.round(years / SPINUP_SLICE_YEARS)); k++) {
        const next = this.today.next();
        this.todaySlices++;
        if (next.done) {
          this.todayDone = next.value;
          this.startRun();
          return true;
        }
        this.todayMessage = next.value.message;
      }
      return false;
    }
    if (!this.spin || this.simulation) return true;
    const done = this.spin.advance(years);
    if (done) this.startRun();
    return done;
  }

  /** The next output frame, or undefined when the run is complete. Finishes any spin-up first. */
  nextFrame(): OutputFrame | undefined {
    while (!this.advanceSpinUp(SPINUP_SLICE_YEARS));
    const simulation = this.simulation ?? this.startRun();
    const time = this.times[this.frames.length];
    if (time === undefined) return undefined;
    if (this.step && !this.beforeStep && this.step.start <= time) {
      // Keep the state at the start of a warming step for the response-time estimate.
      simulation.advanceTo(this.step.start);
      this.beforeStep = Float64Array.from(simulation.thickness);
    }
    simulation.advanceTo(time);
    const frontalRate = simulation.takeFrontalAblationRate();
    const frame = diagnoseFrame(this.model, simulation.thickness, time, simulation.takeAppliedBalance(), frontalRate);
    this.frames.push(frame);
    return frame;
  }

  get complete(): boolean {
    return this.frames.length === this.times.length;
  }

  /** Everything so far; call after the last frame for the full summary. */
  report(): RunReport {
    const simulation = this.simulation ?? this.startRun();
    const massBudget = simulation.massBudget();
    const warnings = [...this.warnings];
    if (massBudget.outflow > 0) {
      warnings.push(
        `ice left the domain at its down-valley end (${massBudget.outflow.toExponential(3)} m^3): ` +
          'lengthen the domain to follow the terminus',
      );
    }
    warnings.push(...narrowSectionWarnings(this.model, this.frames));
    const reachedSteadyState = endsInSteadyState(simulation.annual, this.model.grid.spacing);
    const spun = this.spinUpResult();
    return {
      model: this.model,
      frames: this.frames,
      annual: simulation.annual,
      summary: {
        massBudget,
        numerics: { ...this.model.numerics },
        spinup: spun && {
          years: spun.years,
          converged: spun.converged,
          steps: spun.steps,
          criterion: STEADY_STATE_CRITERION,
          ...(this.reusedSpinUp ? { reused: true } : {}),
        },
        ...(this.todayDone ? { start: this.todayDone.report } : {}),
        steps: simulation.steps,
        smallestStep: simulation.smallestStableStep,
        largestStep: simulation.largestStep,
        endsInSteadyState: reachedSteadyState,
        responseTime:
          this.step && this.beforeStep
            ? responseTimeReport(this.step, this.model, simulation, this.beforeStep, reachedSteadyState)
            : undefined,
        warnings,
      },
    };
  }

  /** The finished spin-up (run here or reused), or undefined when there is none (yet). */
  spinUpResult(): SpinUpResult | undefined {
    if (this.reusedSpinUp) return this.reusedSpinUp;
    return this.spin?.done ? this.spin.result() : undefined;
  }

  private startRun(): FlowlineSimulation {
    const spun = this.spinUpResult();
    if (this.todayDone) {
      this.startThickness = this.todayDone.thickness;
      for (const s of this.todayDone.report.statements) if (/did not reach|no climate offset/.test(s)) this.warnings.push(`start: ${s}`);
    } else if (spun) {
      this.startThickness = spun.thickness;
      if (!spun.converged) this.warnings.push(`spin-up did not reach a steady state in ${spun.years} model years`);
    }
    this.simulation = new FlowlineSimulation(this.model, this.startThickness);
    if (this.step && this.step.start === 0) this.beforeStep = this.startThickness;
    return this.simulation;
  }
}

function responseTimeReport(
  step: StepForcing,
  model: FlowlineModel,
  simulation: FlowlineSimulation,
  beforeStep: Float64Array,
  reachedSteadyState: boolean,
): ResponseTimeReport {
  return {
    stepStart: step.start,
    stepEnd: step.end,
    eFoldingYears: eFoldingTime(simulation.annual, step.start),
    estimateYears: volumeTimescaleEstimate(model, beforeStep, model.warmingAt(step.start), model.precipitationFactorAt(step.start)),
    reachedSteadyState,
  };
}

/** Where the Nye table had to be held at W = 1 (section deeper than its half-width). */
function narrowSectionWarnings(model: FlowlineModel, frames: OutputFrame[]): string[] {
  if (model.flow.shapeFactor.kind !== 'cross-section') return [];
  for (const frame of frames) {
    for (let i = 0; i < model.grid.cellCount; i++) {
      const H = frame.fields.thickness[i];
      if (H > 0.5 * cellSurfaceWidth(model.grid, i, H)) {
        const extent = glacierExtent(model.grid, frame.fields.thickness);
        return [
          `at year ${frame.time} the ice near x = ${model.grid.x[i].toFixed(0)} m is deeper than half its width; ` +
            `the shape factor was held at its tabulated value for W = 1 (glacier ${extent.length.toFixed(0)} m long)`,
        ];
      }
    }
  }
  return [];
}
