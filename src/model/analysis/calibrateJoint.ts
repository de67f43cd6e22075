/**
 * Joint calibration of two parameters where the observations constrain them together.
 *
 * Flow pair: /ice/A (or /ice/enhancement) with /sliding/C, from at least three surface speeds of
 * the observed glacier (diagnostics, no time stepping). Deformation scales as H tau^n and sliding
 * as tau^m, so speeds over ice of different thickness separate them. Weighted least squares over
 * u = (log p1, log p2):
 *     chi^2(u) = sum_i ((u_s(x_i; p) - u_i) / sigma_i)^2,
 * minimised by the downhill simplex of Nelder & Mead (1965, The Computer Journal 7(4), 308-313),
 * chosen over nested 1-D searches because the two logs are strongly correlated (a long valley of
 * chi^2), which the simplex follows with far fewer diagnoses than a search nested in a search.
 * The covariance of u is 2 H^-1, H the Hessian of chi^2 at the minimum by central differences,
 * inflated by the reduced chi^2 chi^2_min / (N - 2) when the speeds scatter more than their
 * stated errors (Press et al. 2007, Numerical Recipes, 3rd ed., section 15.6); one-sigma ranges are
 * p exp(+- sigma_u), and the correlation is cov_12 / (sigma_1 sigma_2).
 *
 * Balance pair: the balance model's terminus parameter (/massBalance/ela, or the degree-day
 * /massBalance/meanTemperature) with another number under /massBalance (a gradient, a degree-day
 * factor, ...), from a terminus (one position or a record) and the geodetic balance. Nested 1-D
 * fits: for each trial of the terminus parameter e, the other parameter g(e) is the root of the
 * geodetic balance (calibrateToGeodeticBalance: bisection, section 9.1; no time stepping), and e
 * is found by bracketing and bisection of the terminus residual over spin-ups (section 9.1), as in
 * the single fits. Two observations fix two parameters exactly (no degree of freedom) and the
 * terminus moves in whole cells, so no Hessian is formed here: the range of e is the band of
 * values whose terminus (for a record, its mean residual) lies within half a cell, or the last
 * bracket when a record is followed only in the mean,
 * the range of g its values at the two ends of that band, and the correlation the sign of
 * dg/de (+1 or -1: along the band g follows e exactly). Spin-ups are counted and bounded (60).
 */
import { climateSeries, withClimateHeldAt } from '../climate';
import { createFlowlineModel } from '../createFlowlineModel';
import { profileFields } from '../diagnostics';
import { glacierExtent, MIN_GLACIER_THICKNESS } from '../glacierExtent';
import { sampleCells } from '../inversion/invertBed';
import type { Scenario } from '../scenario';
import { spinUp } from '../spinUp';
import { balanceParameter, calibrateToGeodeticBalance, specificBalance, terminusPointer, terminusRecordOf } from './calibrateClimate';
import { misfitOf } from './calibrateFlow';
import { flowParameterUnit } from './flowParameterUnit';
import { CalibrationNotBracketed, CalibrationRefusal, OBSERVATION_POINTER, type Misfit, type ObservationKind } from './calibrationTypes';
import { parameterValue, pointerProblem, withParameter } from './scenarioParameter';

export interface JointParameter {
  pointer: string;
  unit: string;
  before: number;
  value: number;
  /** One sigma from the Hessian (delta-chi-square-hessian), the match band, or the last bracket. */
  range: { low: number; high: number; kind: 'hessian' | 'match-band' | 'bracket' };
}

export interface JointCalibration {
  parameters: [JointParameter, JointParameter];
  /** Correlation of the two (of their logs for positive parameters), -1 to 1. */
  correlation: number;
  observations: ObservationKind[];
  method: string;
  /** Per observation kind. */
  misfitBefore: Partial<Record<ObservationKind, Misfit>>;
  misfitAfter: Partial<Record<ObservationKind, Misfit>>;
  runs: { kind: string; count: number };
  statements: string[];
  scenario: Scenario;
}

export interface JointOptions {
  /** Most spin-ups for a balance pair (default 60). */
  maxSpinUps?: number;
  maxSpinUpYears?: number;
}

const FLOW = new Set(['/ice/A', '/ice/enhancement']);
/** Fewest surface speeds for the flow pair. */
export const MIN_JOINT_SPEEDS = 3;

/** Refusals that need no model run; returns which pair it is (the order: [first, second] as fitted). */
export function checkJointCalibration(scenario: Scenario, pointers: readonly string[]): { pair: 'flow' | 'balance'; ordered: [string, string] } {
  if (pointers.length > 2) {
    throw new CalibrationRefusal(pointers.join(', '), `${pointers.length} parameters given: joint fits take at most two (/ice/A with /sliding/C, or two mass-balance parameters)`);
  }
  const [a, b] = pointers;
  const both = `${a} with ${b}`;
  if (a === b) throw new CalibrationRefusal(a, `${a} is given twice`);
  for (const p of [a, b]) {
    const tableShift = p === '/massBalance/points' && scenario.massBalance.model === 'table';
    const problem = tableShift ? undefined : pointerProblem(scenario, p);
    if (problem) throw new CalibrationRefusal(p, `${p} names no number in the scenario: ${problem}`);
  }
  const obs = scenario.observations ?? {};
  const hasSurface = (scenario.surface?.length ?? 0) >= 2;
  if ((FLOW.has(a) && b === '/sliding/C') || (FLOW.has(b) && a === '/sliding/C')) {
    const flow = FLOW.has(a) ? a : b;
    if (flow === '/ice/enhancement' && scenario.ice.A !== undefined) {
      throw new CalibrationRefusal(flow, '/ice/enhancement multiplies only the rate factor from /ice/temperature; this scenario gives /ice/A: calibrate /ice/A');
    }
    const count = obs.surfaceSpeed?.length ?? 0;
    if (count < MIN_JOINT_SPEEDS) {
      throw new CalibrationRefusal(
        both,
        `fitting ${both} together needs at least ${MIN_JOINT_SPEEDS} surface speeds over ice of different thickness (the scenario has ${count}): ` +
          `deformation scales as H tau^n and sliding as tau^m, so speeds at several thicknesses separate them`,
        OBSERVATION_POINTER.surfaceSpeed,
      );
    }
    if (!hasSurface) throw new CalibrationRefusal(both, 'fitting to surface speeds needs the observed glacier: its surface (/surface)', '/surface');
    for (const p of [flow, '/sliding/C']) {
      const v = parameterValue(scenario, p);
      if (!(v > 0)) throw new CalibrationRefusal(p, `${p} is ${v}: the fit searches over log ${p}, so it needs a positive starting value`);
    }
    return { pair: 'flow', ordered: [flow, '/sliding/C'] };
  }
  const terminusP = terminusPointer(scenario);
  const isBalance = (p: string) => p.startsWith('/massBalance/');
  if (isBalance(a) && isBalance(b) && (a === terminusP || b === terminusP) && scenario.massBalance.model !== 'table') {
    const other = a === terminusP ? b : a;
    const hasTerminus = obs.terminus !== undefined && !(Array.isArray(obs.terminus) && obs.terminus.length === 0);
    const hasGeodetic = obs.geodeticBalance !== undefined;
    if (!hasTerminus || !hasGeodetic) {
      const missing = !hasTerminus ? 'a terminus position or record (/observations/terminus)' : 'a geodetic balance (/observations/geodeticBalance)';
      throw new CalibrationRefusal(
        both,
        `fitting ${both} together needs a terminus (which pins ${terminusP}) and a geodetic balance (which then fixes ${other}); the scenario lacks ${missing}`,
        !hasTerminus ? OBSERVATION_POINTER.terminus : OBSERVATION_POINTER.geodeticBalance,
      );
    }
    if (!hasSurface) throw new CalibrationRefusal(both, 'fitting to the geodetic balance needs the observed glacier: its surface (/surface)', '/surface');
    return { pair: 'balance', ordered: [terminusP, other] };
  }
  throw new CalibrationRefusal(
    both,
    `the observations cannot constrain ${both} together: joint fits are /ice/A (or /ice/enhancement) with /sliding/C from at least ${MIN_JOINT_SPEEDS} surface speeds ` +
      `(/observations/surfaceSpeed), or ${terminusP} with another number under /massBalance from a terminus (/observations/terminus) and a geodetic balance ` +
      `(/observations/geodeticBalance); fit ${a} and ${b} one at a time otherwise`,
  );
}

export function calibrateJoint(scenario: Scenario, pointers: readonly string[], options: JointOptions = {}): JointCalibration {
  const { pair, ordered } = checkJointCalibration(scenario, pointers);
  return pair === 'flow' ? fitFlowPair(scenario, ordered) : fitBalancePair(scenario, ordered, options);
}

/** Downhill simplex (Nelder & Mead 1965) in two dimensions; returns the best vertex. */
export function nelderMead2(f: (u: [number, number]) => number, start: [number, number], step: number, maxEvaluations: number): { at: [number, number]; value: number; evaluations: number } {
  let evaluations = 0;
  const g = (u: [number, number]) => {
    evaluations++;
    return f(u);
  };
  let simplex: { u: [number, number]; f: number }[] = [start, [start[0] + step, start[1]] as [number, number], [start[0], start[1] + step] as [number, number]].map((u) => ({ u, f: g(u) }));
  const along = (a: [number, number], b: [number, number], t: number): [number, number] => [a[0] + t * (b[0] - a[0]), a[1] + t * (b[1] - a[1])];
  while (evaluations < maxEvaluations) {
    simplex.sort((p, q) => p.f - q.f);
    const [best, good, worst] = simplex;
    const size = Math.max(Math.hypot(good.u[0] - best.u[0], good.u[1] - best.u[1]), Math.hypot(worst.u[0] - best.u[0], worst.u[1] - best.u[1]));
    if (size < 1e-9 || worst.f - best.f <= 1e-14 * (Math.abs(best.f) + 1e-30)) break;
    const centroid: [number, number] = [0.5 * (best.u[0] + good.u[0]), 0.5 * (best.u[1] + good.u[1])];
    const reflected = along(centroid, worst.u, -1);
    const fr = g(reflected);
    if (fr < best.f) {
      const expanded = along(centroid, worst.u, -2);
      const fe = g(expanded);
      simplex[2] = fe < fr ? { u: expanded, f: fe } : { u: reflected, f: fr };
    } else if (fr < good.f) {
      simplex[2] = { u: reflected, f: fr };
    } else {
      const contracted = fr < worst.f ? along(centroid, reflected, 0.5) : along(centroid, worst.u, 0.5);
      const fc = g(contracted);
      if (fc < Math.min(fr, worst.f)) simplex[2] = { u: contracted, f: fc };
      else simplex = [best, ...[good, worst].map((p) => ({ u: along(best.u, p.u, 0.5), f: 0 }))].map((p, k) => (k === 0 ? p : { u: p.u, f: g(p.u) }));
    }
  }
  simplex.sort((p, q) => p.f - q.f);
  return { at: simplex[0].u, value: simplex[0].f, evaluations };
}

function fitFlowPair(scenario: Scenario, [flow, slide]: [string, string]): JointCalibration {
  const points = scenario.observations!.surfaceSpeed!;
  const base = createFlowlineModel(scenario);
  const dx = base.grid.spacing;
  const year = scenario.observations?.year ?? 0;
  for (const [x] of points) {
    if (!(sampleCells(base.initialThickness, dx, x) >= MIN_GLACIER_THICKNESS)) {
      throw new CalibrationRefusal(flow, `the surface speed at x = ${x} m lies where the observed glacier has less than ${MIN_GLACIER_THICKNESS} m of ice`, '/surface');
    }
  }
  const p0: [number, number] = [parameterValue(scenario, flow), parameterValue(scenario, slide)];
  const apply = (u: readonly [number, number]) => withParameter(withParameter(scenario, flow, p0[0] * Math.exp(u[0])), slide, p0[1] * Math.exp(u[1]));
  let diagnoses = 0;
  const speedsAt = (u: readonly [number, number]) => {
    diagnoses++;
    const model = createFlowlineModel(apply(u));
    const speed = profileFields(model, model.initialThickness, year).surfaceSpeed;
    return points.map(([x]) => sampleCells(speed, dx, x));
  };
  const chi2 = (u: readonly [number, number]) => misfitOf(speedsAt(u), points, 'm a^-1').chiSquare!;
  const startSpeeds = speedsAt([0, 0]);
  // Coarse restarts: the simplex, restarted from its answer until it stays put (Press et al. 2007, section 10.5).
  let fit = nelderMead2(chi2, [0, 0], 1, 400);
  for (let k = 0; k < 3; k++) {
    const again = nelderMead2(chi2, fit.at, 0.1, 300);
    const moved = Math.hypot(again.at[0] - fit.at[0], again.at[1] - fit.at[1]);
    fit = again.value <= fit.value ? again : fit;
    if (moved < 1e-6) break;
  }
  const limit = Math.log(1e4);
  if (Math.abs(fit.at[0]) > limit || Math.abs(fit.at[1]) > limit) {
    throw new CalibrationNotBracketed(
      `${flow} with ${slide}`,
      `the least-squares fit of ${flow} with ${slide} left the range of 10^4 times either way of the starting values (at ${(p0[0] * Math.exp(fit.at[0])).toPrecision(3)}, ${(p0[1] * Math.exp(fit.at[1])).toPrecision(3)}): the speeds cannot separate the two`,
      [],
    );
  }
  // Hessian of chi^2 in u by central differences.
  const h = 1e-2;
  const [u1, u2] = fit.at;
  const f0 = chi2(fit.at);
  const f = (a: number, b: number) => chi2([u1 + a, u2 + b]);
  const h11 = (f(h, 0) - 2 * f0 + f(-h, 0)) / (h * h);
  const h22 = (f(0, h) - 2 * f0 + f(0, -h)) / (h * h);
  const h12 = (f(h, h) - f(h, -h) - f(-h, h) + f(-h, -h)) / (4 * h * h);
  const det = h11 * h22 - h12 * h12;
  if (!(h11 > 0 && h22 > 0 && det > 1e-8 * h11 * h22)) {
    throw new CalibrationRefusal(
      `${flow} with ${slide}`,
      `the surface speeds do not separate ${flow} from ${slide} (the misfit is flat along a line of the two): it needs speeds over ice of more different thickness (more points in /observations/surfaceSpeed)`,
      OBSERVATION_POINTER.surfaceSpeed,
    );
  }
  const n = points.length;
  const inflation = Math.max(1, n > 2 ? f0 / (n - 2) : 1);
  const c11 = ((2 * h22) / det) * inflation;
  const c22 = ((2 * h11) / det) * inflation;
  const c12 = ((-2 * h12) / det) * inflation;
  const s1 = Math.sqrt(c11);
  const s2 = Math.sqrt(c22);
  const correlation = c12 / (s1 * s2);
  const values: [number, number] = [Number((p0[0] * Math.exp(u1)).toPrecision(6)), Number((p0[1] * Math.exp(u2)).toPrecision(6))];
  const fitted = withParameter(withParameter(scenario, flow, values[0]), slide, values[1]);
  const speedsAfter = speedsAt([Math.log(values[0] / p0[0]), Math.log(values[1] / p0[1])]);
  const param = (k: 0 | 1, pointer: string, s: number): JointParameter => ({
    pointer,
    unit: flowParameterUnit(scenario, pointer),
    before: p0[k],
    value: values[k],
    range: { low: values[k] * Math.exp(-s), high: values[k] * Math.exp(s), kind: 'hessian' },
  });
  return {
    parameters: [param(0, flow, s1), param(1, slide, s2)],
    correlation,
    observations: ['surfaceSpeed'],
    method:
      'weighted least squares over (log p1, log p2), downhill simplex (Nelder & Mead 1965, The Computer Journal 7(4), 308-313); covariance 2 H^-1 from the Hessian of chi^2 at the minimum, inflated by the reduced chi^2 (Press et al. 2007, Numerical Recipes 3rd ed., section 15.6)',
    misfitBefore: { surfaceSpeed: misfitOf(startSpeeds, points, 'm a^-1') },
    misfitAfter: { surfaceSpeed: misfitOf(speedsAfter, points, 'm a^-1') },
    runs: { kind: 'diagnosis of the observed glacier (no time stepping)', count: diagnoses },
    statements: [
      `speeds of the observed glacier (the scenario's surface on its bed) from the model's flux law at model year ${year}'s state; no time stepping`,
      `fitted to ${n} surface speeds: deformation scales as H tau^n, sliding as tau^m, so speeds over ice of different thickness separate them`,
      `covariance of the logs 2 H^-1 x ${inflation.toPrecision(3)} (the reduced chi^2 ${(n > 2 ? f0 / (n - 2) : 0).toPrecision(3)} with ${n - 2} degrees of freedom, at least 1); ranges are one sigma of each log`,
      `correlation of log ${flow} with log ${slide}: ${correlation.toFixed(3)}`,
    ],
    scenario: fitted,
  };
}

function fitBalancePair(scenario: Scenario, [first, second]: [string, string], options: JointOptions): JointCalibration {
  const obs = scenario.observations!;
  const geodetic = obs.geodeticBalance!;
  const record = Array.isArray(obs.terminus) ? (obs.terminus as [number, number][]) : undefined;
  const observedTerminus = record ? undefined : (obs.terminus as number);
  const dx = scenario.grid.spacing;
  const maxSpinUps = options.maxSpinUps ?? 60;
  const e0 = parameterValue(scenario, first);
  const g0 = parameterValue(scenario, second);
  const step = scenario.massBalance.model === 'degree-day' ? 0.5 : 50;
  const both = `${first} with ${second}`;
  if (record) {
    const years = record.map(([y]) => y);
    if (years.some((y, i) => y < 0 || (i > 0 && y <= years[i - 1]))) {
      throw new CalibrationRefusal(first, 'the terminus record must run forward in time from model year 0 (the spin-up stands for year 0)', '/observations/terminus');
    }
  }
  // Inner fit: the second parameter from the geodetic balance, for a value of the first.
  let balances = 0;
  const secondFor = (e: number): number => {
    const s = withParameter(scenario, first, e);
    const fit = calibrateToGeodeticBalance(s, balanceParameter(s, second));
    balances += fit.runs.count;
    return fit.value;
  };
  // Terminus of a trial: spin-up (held at the observation year's climate), or spin-up and record.
  const year = obs.year ?? 0;
  const climate = climateSeries(scenario);
  const held = !record && (climate.warmingAt(year) !== climate.warmingAt(0) || climate.precipitationFactorAt(year) !== climate.precipitationFactorAt(0));
  interface Trial {
    e: number;
    g: number;
    termini: number[];
    residual: number;
  }
  const trials: Trial[] = [];
  const trial = (e: number): Trial => {
    const known = trials.find((t) => t.e === e);
    if (known) return known;
    if (trials.length >= maxSpinUps) {
      throw new CalibrationNotBracketed(
        both,
        `no pair of ${both} matched the terminus and the geodetic balance within ${maxSpinUps} spin-ups (tried ${first} from ${Math.min(...trials.map((t) => t.e)).toPrecision(5)} to ${Math.max(...trials.map((t) => t.e)).toPrecision(5)})`,
        trials.map((t) => ({ parameter: t.e, misfit: t.residual })),
      );
    }
    const g = secondFor(e);
    const s = withParameter(withParameter(scenario, first, e), second, g);
    let termini: number[];
    if (record) {
      termini = terminusRecordOf(s, record.map(([y]) => y), options.maxSpinUpYears).termini;
    } else {
      const model = createFlowlineModel(held ? withClimateHeldAt(s, year) : s);
      const spun = spinUp(model, model.initialThickness, options.maxSpinUpYears !== undefined ? { maxYears: options.maxSpinUpYears } : {});
      const t = glacierExtent(model.grid, spun.thickness).terminus;
      termini = [Number.isNaN(t) ? 0 : t];
    }
    const observed = record ? record.map(([, x]) => x) : [observedTerminus!];
    const residual = termini.reduce((sum, L, k) => sum + L - observed[k], 0) / termini.length;
    const t = { e, g, termini, residual };
    trials.push(t);
    return t;
  };
  const matches = (t: Trial) => Math.abs(t.residual) <= 0.5 * dx;
  // Bracket: raising the terminus parameter (with the geodetic balance kept) shortens the glacier.
  const start = trial(e0);
  let lo = start; // residual > 0 side (too long): lower e
  let hi = start;
  if (start.residual !== 0) {
    const direction = start.residual > 0 ? 1 : -1;
    let s = step;
    for (;;) {
      const next = trial(start.e + direction * s);
      if (Math.sign(next.residual) !== Math.sign(start.residual) || matches(next)) {
        const previous = trials[trials.length - 2];
        [lo, hi] = direction > 0 ? [previous, next] : [next, previous];
        break;
      }
      s *= 2;
    }
  }
  // Bisection to a matching trial: a terminus (or the record's mean residual) within half a cell.
  const tolerance = step / 50;
  let best = [lo, hi].reduce((a, b) => (Math.abs(b.residual) < Math.abs(a.residual) ? b : a));
  while (hi.e - lo.e > tolerance && !matches(best)) {
    const mid = trial(0.5 * (lo.e + hi.e));
    if (mid.residual > 0) lo = mid;
    else hi = mid;
    if (Math.abs(mid.residual) < Math.abs(best.residual)) best = mid;
  }
  let range: JointParameter['range'];
  let answer: Trial;
  if (record && !matches(best)) {
    // The record is followed only in the mean: the last bracket is the range.
    answer = best;
    range = { low: lo.e, high: hi.e, kind: 'bracket' };
  } else {
    if (!matches(best)) {
      throw new CalibrationNotBracketed(both, `no ${first} put the spun-up terminus within half a cell (${0.5 * dx} m) of ${observedTerminus} m (closest off by ${best.residual.toFixed(0)} m)`, trials.map((t) => ({ parameter: t.e, misfit: t.residual })));
    }
    // Edges of the band of values whose terminus matches: bisection from the matching trial outward.
    const edge = (inside: Trial, outside: Trial): number => {
      let a = inside;
      let b = outside;
      for (let k = 0; k < 6 && Math.abs(b.e - a.e) > tolerance; k++) {
        const mid = trial(0.5 * (a.e + b.e));
        if (matches(mid)) a = mid;
        else b = mid;
      }
      return a.e;
    };
    const nearest = (side: -1 | 1): Trial => {
      const found = trials.filter((t) => side * (t.e - best.e) > 0 && !matches(t)).reduce<Trial | undefined>((a, t) => (!a || side * (t.e - a.e) < 0 ? t : a), undefined);
      if (found) return found;
      // No trial outside the band on this side yet: step out from the answer until the terminus leaves the cell.
      let s = step / 8;
      for (;;) {
        const next = trial(best.e + side * s);
        if (!matches(next)) return next;
        s *= 2;
      }
    };
    const below = nearest(-1);
    const above = nearest(1);
    const low = edge(best, below);
    const high = edge(best, above);
    const middle = Number((0.5 * (low + high)).toPrecision(8));
    answer = trial(middle);
    range = { low, high, kind: 'match-band' };
  }
  const gLow = secondFor(range.low);
  const gHigh = secondFor(range.high);
  const fitted = withParameter(withParameter(scenario, first, answer.e), second, answer.g);
  const observedL = record ? record.map(([, x]) => x) : [observedTerminus!];
  const terminusMisfit = (termini: number[]): Misfit => {
    let sum = 0;
    let sq = 0;
    termini.forEach((L, k) => {
      sum += L - observedL[k];
      sq += (L - observedL[k]) ** 2;
    });
    return { count: termini.length, rms: Math.sqrt(sq / termini.length), bias: sum / termini.length, unit: 'm' };
  };
  const balanceMisfit = (s: Scenario): Misfit => {
    const d = specificBalance(s, geodetic.from, geodetic.to) - geodetic.value;
    return { count: 1, rms: Math.abs(d), bias: d, unit: 'm w.e. a^-1' };
  };
  const kind: ObservationKind = record ? 'terminusRecord' : 'terminus';
  const unitOf = (p: string) => balanceParameter(scenario, p).unit;
  return {
    parameters: [
      { pointer: first, unit: unitOf(first), before: e0, value: answer.e, range },
      { pointer: second, unit: unitOf(second), before: g0, value: answer.g, range: { low: Math.min(gLow, gHigh), high: Math.max(gLow, gHigh), kind: range.kind } },
    ],
    correlation: gHigh === gLow ? 0 : Math.sign((gHigh - gLow) / (range.high - range.low || 1)),
    observations: [kind, 'geodeticBalance'],
    method:
      'nested 1-D fits: for each trial of the terminus parameter the other is the root of the geodetic balance (bisection), and the terminus parameter is bracketed and bisected over spin-ups (Press et al. 2007, Numerical Recipes 3rd ed., section 9.1)',
    misfitBefore: { [kind]: terminusMisfit(start.termini), geodeticBalance: balanceMisfit(scenario) },
    misfitAfter: { [kind]: terminusMisfit(answer.termini), geodeticBalance: balanceMisfit(fitted) },
    runs: { kind: record ? `spin-up and run to year ${record[record.length - 1][0]}` : 'spin-up', count: trials.length },
    statements: [
      `the terminus pins ${first}; for each value the geodetic balance of ${geodetic.from}-${geodetic.to} fixes ${second} (${balances} glacier-wide balances of the observed glacier, no time stepping)`,
      'the terminus before the fit is that of the first trial: the starting value of the first parameter with the second already fitted to the geodetic balance',
      record
        ? 'each trial spins the glacier up under the year-0 climate and runs the scenario\'s warming through the record; the range is the band of values whose mean terminus residual is within half a cell (else the last bracket)'
        : held
          ? `the observed terminus is taken as in balance with the climate of its year ${year}`
          : 'the observed terminus is taken as in balance with the year-0 climate',
      `two observations fix two parameters exactly: the range of ${second} is its value at the two ends of the range of ${first}, and the correlation is the sign of d(${second})/d(${first})`,
    ],
    scenario: fitted,
  };
}
