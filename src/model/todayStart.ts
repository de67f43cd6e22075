/**
 * Starting a run from the glacier as it is today instead of from a steady state (the scenario's
 * `start`, see scenario.ts). Year 0 is the observation year; the run proper starts there.
 *
 * "observed": the run starts from the scenario's surface over its bed as given (typically the
 * bed the inversion worked out from that surface), H_i = max(0, s(x_i) - b(x_i)).
 *
 * "transient": glaciers are rarely in balance with today's climate, so a steady state under it
 * is the wrong start; a past state is sought that evolves into today's glacier under the known
 * climate history. This follows the initialisation by searching past glacier states that evolve
 * into the observed present-day geometry of Eis, Maussion & Marzeion (2019, "Initialization of a
 * global glacier model based on present-day glacier geometry and past climate information: an
 * ensemble approach", The Cryosphere 13, 3317-3335; cited from memory). Their candidates are
 * states at a start year t0 from varied past climates, each run forward through the climate
 * record and kept when it matches the present glacier. Here the candidates form a one-parameter
 * family: the steady state under the warming held at dT(t0) + delta, run through dT(t) from t0 to
 * year 0. The offset delta is fitted so that, at year 0,
 *
 *   g(delta) = (L(delta) - L_obs) / dx + (V(delta) - V_obs) / (0.05 V_obs) = 0,
 *
 * L the terminus [m] (observations.terminus at their year), V = sum w H dx the ice volume [m^3]
 * of the observed glacier (surface minus bed), dx the cell size: a misfit of one cell in length
 * weighs as much as 5 % in volume. Both L and V fall as delta rises (a warmer past leaves a
 * smaller glacier), so g falls too: bracketing by steps doubling outward from 0 K, then bisection
 * (Press et al. 2007, Numerical Recipes, 3rd ed., sec. 9.1) to 1e-3 K. Bisection, not a faster
 * root finder, because L moves in whole cells (a staircase). Every candidate spins up from the
 * observed glacier, so the answer does not depend on the order of the trials.
 *
 * For both starts the change already committed at year 0 is reported: the further change in
 * length and volume if the warming stayed at dT(0) (analysis/committedChange.ts).
 */
import { committedChangeSteps, type CommittedChange } from './analysis/committedChange';
import type { AnalysisSteps } from './analysis/stepwise';
import type { FlowlineModel } from './flowlineModel';
import { glacierExtent, iceVolume } from './glacierExtent';
import { observedTerminus } from './observedTerminus';
import type { Scenario, StartSpec } from './scenario';
import { FlowlineSimulation } from './simulation';
import { SpinUp } from './spinUp';

/** Volume misfit that weighs as much as one cell of terminus misfit, as a fraction of V_obs. */
export const VOLUME_SCALE_FRACTION = 0.05;
/** The bisection stops when the bracket of the offset is narrower than this [K]. */
export const OFFSET_TOLERANCE_K = 1e-3;
/** First bracketing step [K]; the steps double. */
const FIRST_STEP_K = 0.5;
/** Offsets searched at most [K] either side of 0. */
export const MAX_OFFSET_K = 16;
/** Candidate runs at most. */
export const MAX_TRIALS = 60;
/** Model years between progress reports. */
const SLICE_YEARS = 50;

export interface TransientTrial {
  /** [K] */
  climateOffset: number;
  /** Terminus at year 0 [m] (0 when ice-free); volume at year 0 [m^3]. */
  terminus: number;
  volume: number;
  /** g(delta) of the header [-]. */
  misfit: number;
  spinUpConverged: boolean;
}

export interface StartReport {
  from: StartSpec['from'];
  /** The run starts at this model year, the observation year [a]. */
  year: number;
  /** Transient: the history's start year [a], the offset [K], whether it was fitted. */
  startYear?: number;
  climateOffset?: number;
  fitted?: boolean;
  /** Transient: the warming held during the spin-up, dT(startYear) + offset [K]. */
  spinUpWarming?: number;
  spinUpYears?: number;
  spinUpConverged?: boolean;
  /** Terminus [m] and volume [m^3] observed and at the start of the run. */
  terminusObserved?: number;
  terminusModelled: number;
  volumeObserved: number;
  volumeModelled: number;
  /** Fitted transient start: the offsets tried, and whether the root was bracketed. */
  trials?: TransientTrial[];
  bracketed?: boolean;
  /** The change committed at year 0 (warming held at dT(0)). */
  committed: CommittedChange;
  /** Method and choices, in words. */
  statements: string[];
}

export interface TodayStart {
  thickness: Float64Array;
  report: StartReport;
}

/** The state at year 0 of the transient start with offset `offset`, in steps. */
export function* transientStateSteps(
  model: FlowlineModel,
  from: Float64Array,
  startYear: number,
  offset: number,
): Generator<number, { thickness: Float64Array; spinUpYears: number; spinUpConverged: boolean }, void> {
  const spin = new SpinUp(model, from, undefined, model.warmingAt(startYear) + offset);
  while (!spin.advance(SLICE_YEARS)) yield spin.years;
  const spun = spin.result();
  const history = new FlowlineSimulation(model, spun.thickness, model.warmingAt, startYear);
  while (history.time < 0) {
    history.advanceTo(Math.min(0, history.time + SLICE_YEARS));
    yield history.time;
  }
  return { thickness: Float64Array.from(history.thickness), spinUpYears: spun.years, spinUpConverged: spun.converged };
}

function terminusOf(model: FlowlineModel, thickness: Float64Array): number {
  const t = glacierExtent(model.grid, thickness).terminus;
  return Number.isNaN(t) ? 0 : t;
}

/**
 * The start state of a scenario with `start`, and its report, in steps. The model is the
 * scenario's; its initial thickness is the observed glacier.
 */
export function* todayStartSteps(model: FlowlineModel, scenario: Scenario): AnalysisSteps<TodayStart> {
  const start = scenario.start;
  if (!start) throw new Error('todayStartSteps: the scenario has no start option');
  const observed = model.initialThickness;
  const volumeObserved = iceVolume(model.grid, observed);
  const terminusObserved = observedTerminus(scenario.observations);
  const statements: string[] = [];
  let thickness: Float64Array;
  let extra: Partial<StartReport> = {};

  if (start.from === 'observed') {
    thickness = Float64Array.from(observed);
    statements.push('the run starts at year 0 (the observation year) from the observed surface over the bed as given');
  } else {
    if (!(start.startYear < 0)) throw new Error(`the transient start needs a start year before year 0 (the observation year); it is ${start.startYear}`);
    const dx = model.grid.spacing;
    const trials: TransientTrial[] = [];
    const trial = function* (offset: number): AnalysisSteps<{ thickness: Float64Array; spinUpYears: number; spinUpConverged: boolean; misfit: number }> {
      const steps = transientStateSteps(model, observed, start.startYear, offset);
      let next = steps.next();
      while (!next.done) {
        yield { fraction: undefined, message: `transient start, candidate ${trials.length + 1} (offset ${offset.toFixed(3)} K): model year ${next.value.toFixed(0)}` };
        next = steps.next();
      }
      const state = next.value;
      const terminus = terminusOf(model, state.thickness);
      const volume = iceVolume(model.grid, state.thickness);
      const misfit =
        terminusObserved === undefined || !(volumeObserved > 0)
          ? Number.NaN
          : (terminus - terminusObserved) / dx + (volume - volumeObserved) / (VOLUME_SCALE_FRACTION * volumeObserved);
      trials.push({ climateOffset: offset, terminus, volume, misfit, spinUpConverged: state.spinUpConverged });
      return { ...state, misfit };
    };

    let offset: number;
    let fitted = false;
    let bracketed: boolean | undefined;
    if (start.climateOffset !== undefined) {
      offset = start.climateOffset;
      statements.push(`climate offset ${offset} K as given (not fitted)`);
    } else {
      if (terminusObserved === undefined) throw new Error('the transient start fits its climate offset to the observed terminus: give /observations/terminus (or a climateOffset)');
      if (!(volumeObserved > 0)) throw new Error('the transient start fits its climate offset to the observed glacier: the surface (/surface) lies nowhere above the bed');
      fitted = true;
      // Bracketing: g > 0 (too big) -> a warmer past, g < 0 -> a colder one.
      let lo = Number.NaN; // offset known to give g > 0
      let hi = Number.NaN; // offset known to give g < 0
      const classify = function* (p: number): AnalysisSteps<number> {
        const g = (yield* trial(p)).misfit;
        if (g > 0) lo = p;
        else hi = p;
        return g;
      };
      const g0 = yield* classify(0);
      for (let step = FIRST_STEP_K; step <= MAX_OFFSET_K && (Number.isNaN(lo) || Number.isNaN(hi)) && trials.length < MAX_TRIALS; step *= 2) {
        yield* classify(g0 > 0 ? step : -step);
      }
      bracketed = !Number.isNaN(lo) && !Number.isNaN(hi);
      if (bracketed) {
        while (Math.abs(hi - lo) > OFFSET_TOLERANCE_K && trials.length < MAX_TRIALS - 1) yield* classify(0.5 * (lo + hi));
        offset = 0.5 * (lo + hi);
        statements.push(
          `climate offset fitted by bracketing and bisection to ${OFFSET_TOLERANCE_K} K: g = (L - L_obs)/dx + (V - V_obs)/(${VOLUME_SCALE_FRACTION} V_obs) = 0 ` +
            '(searching past states that evolve into the observed glacier: Eis, Maussion & Marzeion 2019, The Cryosphere 13)',
        );
      } else {
        offset = trials.reduce((a, b) => (Math.abs(b.misfit) < Math.abs(a.misfit) ? b : a)).climateOffset;
        statements.push(`no climate offset within ±${MAX_OFFSET_K} K brings the terminus and volume to the observed ones; the closest tried (${offset} K) is used`);
      }
    }
    const final = yield* trial(offset);
    thickness = final.thickness;
    if (!final.spinUpConverged) statements.push(`the spin-up under dT(${start.startYear}) + ${offset} K did not reach a steady state in ${final.spinUpYears} model years`);
    extra = {
      startYear: start.startYear,
      climateOffset: offset,
      fitted,
      spinUpWarming: model.warmingAt(start.startYear) + offset,
      spinUpYears: final.spinUpYears,
      spinUpConverged: final.spinUpConverged,
      ...(fitted ? { trials, bracketed } : {}),
    };
  }

  const committed = yield* committedChangeSteps(model, thickness, model.warmingAt(0), 0);
  return {
    thickness,
    report: {
      from: start.from,
      year: 0,
      ...extra,
      ...(terminusObserved !== undefined ? { terminusObserved } : {}),
      terminusModelled: terminusOf(model, thickness),
      volumeObserved,
      volumeModelled: iceVolume(model.grid, thickness),
      committed,
      statements,
    },
  };
}
