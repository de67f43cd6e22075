/**
 * Mass-balance parameters from the terminus and the geodetic balance.
 *
 * Terminus (one position). The spun-up glacier's terminus against the observed one, by
 * calibrateTerminus.ts (bracketing, then bisection: Press et al. 2007, Numerical Recipes, 3rd ed.,
 * section 9.1), for the balance model's own parameter: the ELA (/massBalance/ela), the mean
 * temperature (/massBalance/meanTemperature, i.e. a temperature offset) or the table's elevation
 * (/massBalance/points, the whole table shifted). The answer is the middle of the band of values
 * whose terminus lies within half a cell of the observed one; the band is its uncertainty. The
 * observed terminus is taken as in balance with the climate of the observation year: the trials
 * spin up with the warming held at dT(year) (dT(0), the scenario's own spin-up, for year 0).
 *
 * Terminus record [year, x]. A transient fit of the same parameter: each trial spins the glacier
 * up under the year-0 climate and runs it under the scenario's warming to the last record year;
 * the parameter minimises S(p) = sum_k (L(t_k; p) - L_k)^2, the record followed in the
 * least-squares sense (the record states no uncertainties, so all years weigh alike). Raising the
 * parameter shortens the glacier, so the mean residual falls with p: its sign change is
 * bracketed by steps doubling outward from the scenario's value, and S is then minimised in that
 * bracket by golden-section search (section 10.2). The terminus moves in whole cells, so S is a
 * staircase; the search ends when the bracket is narrower than `parameterTolerance` and reports
 * the bracket.
 *
 * Geodetic balance. The glacier-wide specific balance of the observed glacier (the scenario's
 * surface on its bed, held fixed: the reference-surface balance) over its area, under the
 * scenario's climate in the years from..to (each year at the warming of its middle):
 *   B(p) = (1 / Y) sum_years sum_i w_i dx b(s_i, dT(year); p) / sum_i w_i dx   [m w.e. a^-1].
 * The root of B(p) - B_obs is bracketed by steps doubling outward (in log p for parameters that
 * must stay positive) and found by bisection (section 9.1). The observation states no
 * uncertainty, so the report gives dB/dp at the answer: sigma_p = sigma_B / |dB/dp|.
 */
import { cellSurfaceWidth } from '../cellSection';
import { createFlowlineModel } from '../createFlowlineModel';
import { glacierExtent, MIN_GLACIER_THICKNESS } from '../glacierExtent';
import type { Scenario } from '../scenario';
import { FlowlineSimulation } from '../simulation';
import { spinUp } from '../spinUp';
import { climateSeries, withClimateHeldAt } from '../climate';
import { calibrateTerminus, withCalibrationParameter } from './calibrateTerminus';
import { CalibrationNotBracketed, CalibrationRefusal, type Misfit, type ParameterCalibration } from './calibrationTypes';
import { parameterValue, withParameter } from './scenarioParameter';

/** How a mass-balance parameter is read, set and stepped. */
export interface BalanceParameter {
  pointer: string;
  unit: string;
  before: number;
  apply: (value: number) => Scenario;
  /** First bracketing step. */
  step: number;
  /** Must stay positive (bracketed in log p). */
  positive: boolean;
  /** This is the balance model's terminus parameter (ELA, temperature, table shift). */
  terminusParameter: boolean;
}

const UNITS: Record<string, string> = {
  ela: 'm a.s.l.',
  ablationGradient: '(m w.e. a^-1) m^-1',
  accumulationGradient: '(m w.e. a^-1) m^-1',
  maxAccumulation: 'm w.e. a^-1',
  elaSensitivity: 'm K^-1',
  referenceElevation: 'm a.s.l.',
  meanTemperature: 'deg C',
  amplitude: 'K',
  lapseRate: 'K m^-1',
  precipitation: 'm w.e. a^-1',
  precipitationGradient: 'm^-1',
  snowThreshold: 'deg C',
  ddfSnow: 'mm w.e. K^-1 d^-1',
  ddfIce: 'mm w.e. K^-1 d^-1',
};

/** Keys that may take any sign (offsets and elevations); the others are rates that stay positive. */
const SIGNED = new Set(['ela', 'referenceElevation', 'meanTemperature', 'snowThreshold']);

/** The balance parameter at `pointer` (which names a number, or is /massBalance/points of a table). */
export function balanceParameter(scenario: Scenario, pointer: string): BalanceParameter {
  const mb = scenario.massBalance;
  if (pointer === '/massBalance/points' && mb.model === 'table') {
    return { pointer, unit: 'm (shift of the table)', before: 0, apply: (v) => withCalibrationParameter(scenario, v), step: 50, positive: false, terminusParameter: true };
  }
  const key = pointer.split('/')[2] ?? '';
  const before = parameterValue(scenario, pointer);
  const temperatureLike = key === 'meanTemperature' || key === 'snowThreshold';
  const positive = !SIGNED.has(key) && before > 0;
  return {
    pointer,
    unit: UNITS[key] ?? '',
    before,
    apply: (v) => withParameter(scenario, pointer, v),
    step: temperatureLike ? 0.5 : SIGNED.has(key) ? 50 : 0.1 * Math.abs(before) || 0.1,
    positive,
    terminusParameter: (mb.model === 'linear' && key === 'ela') || (mb.model === 'degree-day' && key === 'meanTemperature'),
  };
}

/** The terminus parameter of the balance model, as a pointer (for messages). */
export function terminusPointer(scenario: Scenario): string {
  switch (scenario.massBalance.model) {
    case 'linear':
      return '/massBalance/ela';
    case 'degree-day':
      return '/massBalance/meanTemperature';
    case 'table':
      return '/massBalance/points';
  }
}

function singleMisfit(modelled: number, observed: number, unit: string): Misfit {
  const d = modelled - observed;
  return { count: 1, rms: Math.abs(d), bias: d, unit };
}

export interface TerminusFitOptions {
  /** Most spin-ups (default 30). */
  maxTrials?: number;
  maxSpinUpYears?: number;
}

export function calibrateToTerminus(scenario: Scenario, parameter: BalanceParameter, options: TerminusFitOptions): ParameterCalibration {
  const observed = scenario.observations!.terminus as number;
  const dx = scenario.grid.spacing;
  // The terminus is taken as in balance with the climate of its year: the warming held at dT(year).
  const year = scenario.observations?.year ?? 0;
  const climate = climateSeries(scenario);
  const held = climate.warmingAt(year);
  const heldClimate = held !== climate.warmingAt(0) || climate.precipitationFactorAt(year) !== climate.precipitationFactorAt(0);
  const trialScenario: Scenario = heldClimate ? withClimateHeldAt(scenario, year) : scenario;
  // calibrateTerminus works in the model's own terms: ELA, table shift, temperature offset.
  const offset = scenario.massBalance.model === 'degree-day' ? scenario.massBalance.meanTemperature : 0;
  const result = calibrateTerminus(trialScenario, {
    observedTerminus: observed,
    tolerance: 0.5 * dx,
    maxIterations: options.maxTrials ?? 30,
    ...(options.maxSpinUpYears !== undefined ? { maxSpinUpYears: options.maxSpinUpYears } : {}),
  });
  const tried = result.trials.map((t) => ({ parameter: offset + t.parameter, misfit: t.terminus - observed }));
  if (!result.matched || !result.matchBand) {
    const closest = tried.reduce((a, b) => (Math.abs(b.misfit) < Math.abs(a.misfit) ? b : a));
    throw new CalibrationNotBracketed(
      parameter.pointer,
      `no value of ${parameter.pointer} put the spun-up terminus within half a cell (${0.5 * dx} m) of ${observed} m in ${result.iterations} spin-ups ` +
        `(tried ${describeTried(tried, parameter.unit)}; closest ${closest.parameter.toPrecision(5)}, terminus off by ${closest.misfit.toFixed(0)} m)`,
      tried,
    );
  }
  const value = offset + result.parameter;
  const first = result.trials[0];
  const spunUp = result.trials.filter((t) => !t.converged).length;
  return {
    pointer: parameter.pointer,
    unit: parameter.unit,
    observation: 'terminus',
    method: 'spun-up terminus against the observed one: bracketing, then bisection (Press et al. 2007, Numerical Recipes 3rd ed., section 9.1); the middle of the matching band',
    before: parameter.before,
    value,
    range: { low: offset + result.matchBand[0], high: offset + result.matchBand[1], kind: 'match-band' },
    misfitBefore: singleMisfit(first.terminus, observed, 'm'),
    misfitAfter: singleMisfit(result.terminus, observed, 'm'),
    comparison: { along: 'year', unit: 'm', at: [year], observed: [observed], before: [first.terminus], after: [result.terminus] },
    runs: { kind: 'spin-up', count: result.iterations },
    statements: [
      heldClimate
        ? `the observed terminus is taken as in balance with the climate of its year ${year} (each trial is a spin-up to a steady state with the warming held at ${held} K)`
        : 'the observed terminus is taken as in balance with the year-0 climate (each trial is a spin-up to a steady state)',
      `a match is a terminus within half a cell (${0.5 * dx} m); the range is the band of values that match`,
      ...(spunUp > 0 ? [`${spunUp} spin-up(s) stopped before a steady state`] : []),
    ],
    scenario: withCalibrationParameter(scenario, result.parameter),
  };
}

function describeTried(tried: { parameter: number; misfit: number }[], unit: string): string {
  const sorted = [...tried].sort((a, b) => a.parameter - b.parameter);
  return `${sorted.length} values from ${sorted[0].parameter.toPrecision(5)} to ${sorted[sorted.length - 1].parameter.toPrecision(5)} ${unit}`;
}

export interface RecordFitOptions extends TerminusFitOptions {
  /** The search ends when the bracket is narrower (default: the first step / 50). */
  parameterTolerance?: number;
}

/** Modelled terminus [m] at each record year: spin-up under the year-0 climate, then the warming history. */
export function terminusRecordOf(scenario: Scenario, years: readonly number[], maxSpinUpYears?: number): { termini: number[]; converged: boolean } {
  const model = createFlowlineModel(scenario);
  const spun = spinUp(model, model.initialThickness, maxSpinUpYears !== undefined ? { maxYears: maxSpinUpYears } : {});
  const simulation = new FlowlineSimulation(model, spun.thickness);
  const termini = years.map((year) => {
    simulation.advanceTo(year);
    const t = glacierExtent(model.grid, simulation.thickness).terminus;
    return Number.isNaN(t) ? 0 : t;
  });
  return { termini, converged: spun.converged };
}

export function calibrateToTerminusRecord(scenario: Scenario, parameter: BalanceParameter, options: RecordFitOptions): ParameterCalibration {
  const record = scenario.observations!.terminus as [number, number][];
  const years = record.map(([y]) => y);
  if (years.some((y, i) => y < 0 || (i > 0 && y <= years[i - 1]))) {
    throw new CalibrationRefusal(parameter.pointer, 'the terminus record must run forward in time from model year 0 (the spin-up stands for year 0)', '/observations/terminus');
  }
  const maxTrials = options.maxTrials ?? 30;
  const tolerance = options.parameterTolerance ?? parameter.step / 50;
  interface Trial {
    parameter: number;
    termini: number[];
    sumSquares: number;
    meanResidual: number;
    converged: boolean;
  }
  const trials: Trial[] = [];
  const trial = (p: number): Trial => {
    const known = trials.find((t) => t.parameter === p);
    if (known) return known;
    const { termini, converged } = terminusRecordOf(parameter.apply(p), years, options.maxSpinUpYears);
    let sumSquares = 0;
    let sum = 0;
    termini.forEach((L, k) => {
      const r = L - record[k][1];
      sumSquares += r * r;
      sum += r;
    });
    const t = { parameter: p, termini, sumSquares, meanResidual: sum / termini.length, converged };
    trials.push(t);
    return t;
  };
  const tried = () => trials.map((t) => ({ parameter: t.parameter, misfit: Math.sqrt(t.sumSquares / years.length) }));
  const notBracketed = (why: string) =>
    new CalibrationNotBracketed(
      parameter.pointer,
      `${why} (tried ${describeTried(tried(), parameter.unit)} in ${trials.length} runs of spin-up and record; RMS terminus misfit ${tried()
        .map((t) => t.misfit.toFixed(0))
        .join(', ')} m)`,
      tried(),
    );

  // 1. Bracket the sign change of the mean residual (raising the parameter shortens the glacier).
  const start = trial(parameter.before);
  let lo = start;
  let hi = start;
  if (start.meanResidual !== 0) {
    const direction = start.meanResidual > 0 ? 1 : -1;
    let step = parameter.step;
    let found = false;
    while (trials.length < maxTrials) {
      const next = trial(start.parameter + direction * step);
      if (Math.sign(next.meanResidual) !== Math.sign(start.meanResidual)) {
        const previous = trials[trials.length - 2];
        [lo, hi] = direction > 0 ? [previous, next] : [next, previous];
        found = true;
        break;
      }
      step *= 2;
    }
    if (!found) throw notBracketed(`the modelled terminus stayed ${direction > 0 ? 'beyond' : 'short of'} the record on average`);
  }

  // 2. Golden-section search for the least squares in the bracket.
  const g = (Math.sqrt(5) - 1) / 2;
  let a = lo.parameter;
  let b = hi.parameter;
  if (b > a) {
    let c = b - g * (b - a);
    let d = a + g * (b - a);
    let fc = trial(c).sumSquares;
    let fd = trial(d).sumSquares;
    while (b - a > tolerance && trials.length < maxTrials) {
      if (fc < fd) {
        b = d;
        d = c;
        fd = fc;
        c = b - g * (b - a);
        fc = trial(c).sumSquares;
      } else {
        a = c;
        c = d;
        fc = fd;
        d = a + g * (b - a);
        fd = trial(d).sumSquares;
      }
    }
  }
  const best = trials.reduce((x, y) => (y.sumSquares < x.sumSquares ? y : x));
  const misfit = (t: Trial): Misfit => {
    const rms = Math.sqrt(t.sumSquares / years.length);
    return { count: years.length, rms, bias: t.meanResidual, unit: 'm' };
  };
  const unconverged = trials.filter((t) => !t.converged).length;
  return {
    pointer: parameter.pointer,
    unit: parameter.unit,
    observation: 'terminusRecord',
    method:
      'transient least squares of the terminus record: the mean residual bracketed by doubling steps, then golden-section search (Press et al. 2007, Numerical Recipes 3rd ed., sections 9.1 and 10.2)',
    before: parameter.before,
    value: best.parameter,
    range: { low: a, high: b, kind: 'bracket' },
    misfitBefore: misfit(start),
    misfitAfter: misfit(best),
    comparison: { along: 'year', unit: 'm', at: years, observed: record.map(([, x]) => x), before: start.termini, after: best.termini },
    runs: { kind: `spin-up and run to year ${years[years.length - 1]}`, count: trials.length },
    statements: [
      `each trial spins the glacier up under the year-0 climate and runs the scenario's warming to year ${years[years.length - 1]}`,
      `the ${years.length} record points weigh alike (the record states no uncertainties); the range is the last bracket of the search`,
      ...(b - a > tolerance ? [`the search stopped at ${maxTrials} runs with a bracket of ${(b - a).toPrecision(3)} ${parameter.unit}`] : []),
      ...(unconverged > 0 ? [`${unconverged} spin-up(s) stopped before a steady state`] : []),
    ],
    scenario: parameter.apply(best.parameter),
  };
}

/** Glacier-wide specific balance of the observed glacier over the years [from, to) [m w.e. a^-1]. */
export function specificBalance(scenario: Scenario, from: number, to: number): number {
  const model = createFlowlineModel(scenario);
  const { grid } = model;
  const H = model.initialThickness;
  const surface = new Float64Array(grid.cellCount);
  for (let i = 0; i < grid.cellCount; i++) surface[i] = grid.bed[i] + H[i];
  const balance = new Float64Array(grid.cellCount);
  const count = Math.max(1, Math.round(to - from));
  let total = 0;
  let area = 0;
  for (let i = 0; i < grid.cellCount; i++) if (H[i] >= MIN_GLACIER_THICKNESS) area += cellSurfaceWidth(grid, i, H[i]) * grid.spacing;
  for (let k = 0; k < count; k++) {
    const year = to > from ? from + (k + 0.5) * ((to - from) / count) : from;
    model.iceBalance(surface, model.warmingAt(year), model.precipitationFactorAt(year), balance);
    for (let i = 0; i < grid.cellCount; i++) {
      if (H[i] >= MIN_GLACIER_THICKNESS) total += balance[i] * cellSurfaceWidth(grid, i, H[i]) * grid.spacing;
    }
  }
  return (total / count / area) * model.iceToWaterEquivalent;
}

export function calibrateToGeodeticBalance(scenario: Scenario, parameter: BalanceParameter): ParameterCalibration {
  const { from, to, value: observed } = scenario.observations!.geodeticBalance!;
  let evaluations = 0;
  const balanceAt = (p: number) => {
    evaluations++;
    return specificBalance(parameter.apply(p), from, to);
  };
  const residual = (p: number) => balanceAt(p) - observed;
  // Bracket: outward from the start in the direction in which the residual shrinks.
  const toParameter = (u: number) => (parameter.positive ? parameter.before * Math.exp(u) : parameter.before + u);
  const firstStep = parameter.positive ? Math.log(1.1) : parameter.step;
  const tried: { parameter: number; misfit: number }[] = [];
  const at = (u: number) => {
    const r = residual(toParameter(u));
    tried.push({ parameter: toParameter(u), misfit: r });
    return r;
  };
  const r0 = at(0);
  const before = r0;
  let lo = 0;
  let hi = 0;
  if (r0 !== 0) {
    const rUp = at(firstStep);
    if (rUp === r0) throw new CalibrationRefusal(parameter.pointer, `the glacier-wide balance does not change with ${parameter.pointer}, so the geodetic balance cannot constrain it`);
    const direction = Math.abs(rUp) < Math.abs(r0) || Math.sign(rUp) !== Math.sign(r0) ? 1 : -1;
    let step = firstStep;
    let inside = 0;
    let found = Math.sign(rUp) !== Math.sign(r0) && direction === 1;
    let outside = found ? firstStep : 0;
    for (let k = 0; !found && k < 40; k++) {
      const u = direction * step;
      const r = at(u);
      if (Math.sign(r) !== Math.sign(r0)) {
        outside = u;
        found = true;
      } else inside = u;
      step *= 2;
    }
    if (!found) {
      throw new CalibrationNotBracketed(
        parameter.pointer,
        `no value of ${parameter.pointer} gives a glacier-wide balance of ${observed} m w.e. a^-1 ` +
          `(tried ${describeTried(tried, parameter.unit)}; balances ${Math.min(...tried.map((t) => t.misfit + observed)).toFixed(3)} to ${Math.max(...tried.map((t) => t.misfit + observed)).toFixed(3)})`,
        tried,
      );
    }
    [lo, hi] = [inside, outside];
    // Bisection (Press et al. 2007, section 9.1).
    const rLo = residual(toParameter(lo));
    for (let k = 0; k < 100 && Math.abs(hi - lo) > 1e-12 * Math.max(1, Math.abs(lo)); k++) {
      const mid = 0.5 * (lo + hi);
      const r = residual(toParameter(mid));
      if (r === 0) {
        lo = hi = mid;
        break;
      }
      if (Math.sign(r) === Math.sign(rLo)) lo = mid;
      else hi = mid;
    }
  }
  const value = Number(toParameter(0.5 * (lo + hi)).toPrecision(8));
  const h = parameter.positive ? 1e-4 * value : 1e-3 * parameter.step;
  const slope = (balanceAt(value + h) - balanceAt(value - h)) / (2 * h);
  const after = balanceAt(value);
  return {
    pointer: parameter.pointer,
    unit: parameter.unit,
    observation: 'geodeticBalance',
    method: 'root of the glacier-wide balance minus the geodetic one: bracketing by doubling steps, then bisection (Press et al. 2007, Numerical Recipes 3rd ed., section 9.1)',
    before: parameter.before,
    value,
    sensitivity: { value: slope, unit: `m w.e. a^-1 per ${parameter.unit}` },
    misfitBefore: singleMisfit(before + observed, observed, 'm w.e. a^-1'),
    misfitAfter: singleMisfit(after, observed, 'm w.e. a^-1'),
    comparison: { along: 'year', unit: 'm w.e. a^-1', at: [0.5 * (from + to)], observed: [observed], before: [before + observed], after: [after] },
    runs: { kind: 'glacier-wide balance of the observed glacier (no time stepping)', count: evaluations },
    statements: [
      `the observed glacier (the scenario's surface on its bed) held fixed over ${from}-${to}, each year at the warming of its middle`,
      `the geodetic balance states no uncertainty: sigma of the value = sigma of the balance / |${slope.toPrecision(3)}| (m w.e. a^-1 per ${parameter.unit})`,
    ],
    scenario: parameter.apply(value),
  };
}
