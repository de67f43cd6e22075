/**
 * Flow parameters (/ice/A, /ice/enhancement, /sliding/C) from what was measured on the glacier
 * as it is, without time stepping.
 *
 * Surface speeds. The observed glacier is the scenario's surface on its bed. Its speeds come from
 * the diagnostics (diagnostics.profileFields) of that state, i.e. the face fluxes of the one flux
 * law (flux/faceFlux.ts: Glen's law with Nye's shape factor, Weertman sliding) and the column that
 * carries them (columnForFlux):  u_s = 2A/(n+1) tau^n H + C tau^m. With speeds u_i +- sigma_i at
 * x_i the parameter p is fitted by weighted least squares,
 *     chi^2(p) = sum_i ((u_s(x_i; p) - u_i) / sigma_i)^2,
 * minimised over log p in p0 / 1000 to 1000 p0 (a scan, then golden section: minimiseScalar.ts);
 * its one-sigma range is where chi^2 <= chi^2_min + max(1, chi^2_min / (N - 1)): Delta chi^2 = 1
 * for one parameter (Press et al. 2007, Numerical Recipes, 3rd ed., section 15.6), inflated by the
 * reduced chi^2 when the speeds scatter more than their stated errors, as the bed inversion does.
 *
 * Thickness points. Through the bed inversion (inversion/invertBed.ts, Farinotti et al. 2009):
 * it fits a multiplier k of the rate factor to the points with the same Delta chi^2 range, so
 * /ice/A (or /ice/enhancement, which multiplies the A from the temperature) becomes p0 k. The
 * inversion works from the surface and the terminus only, so the scenario's bed takes no part.
 * /sliding/C is not fitted this way: the inversion scales the deformation term only, and a
 * thickness alone cannot tell deformation from sliding; it needs the surface speeds.
 */
import { createFlowlineModel } from '../createFlowlineModel';
import { profileFields } from '../diagnostics';
import { MIN_GLACIER_THICKNESS } from '../glacierExtent';
import { invertBed, InversionInputError, sampleCells } from '../inversion/invertBed';
import type { ObservedPoint, Scenario } from '../scenario';
import {
  CalibrationNotBracketed,
  CalibrationRefusal,
  type Misfit,
  type ParameterCalibration,
  type ObservedAndModelled,
} from './calibrationTypes';
import { chiSquareRise, levelCrossing, minimiseLog } from './minimiseScalar';
import { parameterValue, withParameter } from './scenarioParameter';

/** Searched range around the starting value, as a factor each way (as the inversion's). */
const SEARCH_FACTOR = 1e3;

/** Misfit of modelled against observed values with one-sigma uncertainties. */
export function misfitOf(modelled: readonly number[], points: readonly ObservedPoint[], unit: string): Misfit {
  let sum = 0;
  let squares = 0;
  let chiSquare = 0;
  points.forEach(([, value, sigma], i) => {
    const d = modelled[i] - value;
    sum += d;
    squares += d * d;
    chiSquare += (d / sigma) ** 2;
  });
  const count = points.length;
  return { count, rms: Math.sqrt(squares / count), bias: sum / count, unit, chiSquare };
}

/** Observed points [x, value, sigma] against the modelled values before and after. */
function pointComparison(points: readonly ObservedPoint[], unit: string, before: number[], after: number[]): ObservedAndModelled {
  return { along: 'x', unit, at: points.map(([x]) => x), observed: points.map(([, v]) => v), uncertainty: points.map(([, , s]) => s), before, after };
}

export function calibrateToSpeeds(scenario: Scenario, pointer: string, unit: string): ParameterCalibration {
  const points = scenario.observations?.surfaceSpeed ?? [];
  const before = parameterValue(scenario, pointer);
  const base = createFlowlineModel(scenario);
  const dx = base.grid.spacing;
  const year = scenario.observations?.year ?? 0;
  for (const [x] of points) {
    if (!(sampleCells(base.initialThickness, dx, x) >= MIN_GLACIER_THICKNESS)) {
      throw new CalibrationRefusal(
        pointer,
        `the surface speed at x = ${x} m lies where the observed glacier (the scenario's surface on its bed) has less than ${MIN_GLACIER_THICKNESS} m of ice`,
        '/surface',
      );
    }
  }
  let evaluations = 0;
  const speedsAt = (p: number): number[] => {
    evaluations++;
    const model = createFlowlineModel(withParameter(scenario, pointer, p));
    const speed = profileFields(model, model.initialThickness, year).surfaceSpeed;
    return points.map(([x]) => sampleCells(speed, dx, x));
  };
  const tried: { parameter: number; misfit: number }[] = [];
  const chi2 = (p: number): number => {
    const value = misfitOf(speedsAt(p), points, 'm a^-1').chiSquare!;
    tried.push({ parameter: p, misfit: value });
    return value;
  };
  const startSpeeds = speedsAt(before);
  const doubled = speedsAt(2 * before);
  if (startSpeeds.every((u, i) => u === doubled[i])) {
    throw new CalibrationRefusal(pointer, `the modelled surface speeds do not change with ${pointer}, so the speeds cannot constrain it`);
  }
  const bounds: [number, number] = [before / SEARCH_FACTOR, before * SEARCH_FACTOR];
  const fit = minimiseLog(chi2, bounds);
  if (fit.atBound) {
    throw new CalibrationNotBracketed(
      pointer,
      `no minimum of the speed misfit between ${pointer} = ${bounds[0].toPrecision(3)} and ${bounds[1].toPrecision(3)} ` +
        `(61 values scanned on a log scale, ${fit.evaluations} evaluations in all; the misfit was least at the end, ${fit.at.toPrecision(3)})`,
      tried.slice(0, 61),
    );
  }
  const level = fit.value + chiSquareRise(fit.value, points.length);
  const low = levelCrossing(chi2, fit.at, bounds[0], level);
  const high = levelCrossing(chi2, fit.at, bounds[1], level);
  const value = Number(fit.at.toPrecision(6));
  const speedsAfter = speedsAt(value);
  const statements = [
    `speeds of the observed glacier (the scenario's surface on its bed) from the model's flux law, at model year ${year}'s state; no time stepping`,
    `fitted to ${points.length} surface speed(s) by weighted least squares over log ${pointer} (searched ${bounds[0].toPrecision(3)} to ${bounds[1].toPrecision(3)})`,
    `range: Delta chi^2 = ${chiSquareRise(fit.value, points.length).toPrecision(3)} above the minimum chi^2 ${fit.value.toPrecision(3)}`,
  ];
  if (low === bounds[0] || high === bounds[1]) statements.push('the one-sigma range reaches the end of the search: the speeds constrain this side only weakly');
  return {
    pointer,
    unit,
    observation: 'surfaceSpeed',
    method: 'weighted least squares over log p, golden-section search, Delta chi^2 range (Press et al. 2007, Numerical Recipes 3rd ed., sections 10.2 and 15.6)',
    before,
    value,
    range: { low, high, kind: 'delta-chi-square' },
    misfitBefore: misfitOf(startSpeeds, points, 'm a^-1'),
    misfitAfter: misfitOf(speedsAfter, points, 'm a^-1'),
    comparison: pointComparison(points, 'm a^-1', startSpeeds, speedsAfter),
    runs: { kind: 'diagnosis of the observed glacier (no time stepping)', count: evaluations },
    statements,
    scenario: withParameter(scenario, pointer, value),
  };
}

export function calibrateToThickness(scenario: Scenario, pointer: string, unit: string): ParameterCalibration {
  const points = scenario.observations?.thickness ?? [];
  const before = parameterValue(scenario, pointer);
  const invert = (s: Scenario) => {
    try {
      return invertBed(s);
    } catch (error) {
      if (error instanceof InversionInputError) throw new CalibrationRefusal(pointer, `the bed inversion needs ${error.path}: ${error.message}`, error.path);
      throw error;
    }
  };
  // Before: the inversion with the parameter as it is (no points, so no fit).
  const { thickness: _points, ...otherObservations } = scenario.observations ?? {};
  const unfitted = invert({ ...scenario, observations: otherObservations });
  const dx = scenario.grid.spacing;
  const modelledBefore = points.map(([x]) => sampleCells(unfitted.thickness, dx, x));
  const fitted = invert(scenario);
  const k = fitted.rateFactorMultiplier;
  if (fitted.multiplierAtSearchBound) {
    throw new CalibrationNotBracketed(
      pointer,
      `no minimum of the thickness misfit for ${pointer} between ${(before / SEARCH_FACTOR).toPrecision(3)} and ${(before * SEARCH_FACTOR).toPrecision(3)} ` +
        `(the bed inversion scanned 61 multipliers of the rate factor on a log scale; the misfit was least at the end, ${(before * k).toPrecision(3)})`,
      [],
    );
  }
  const [kLow, kHigh] = fitted.rateFactorMultiplierRange ?? [k, k];
  const value = Number((before * k).toPrecision(6));
  const modelledAfter = points.map(([x]) => sampleCells(fitted.thickness, dx, x));
  return {
    pointer,
    unit,
    observation: 'thickness',
    method:
      'bed inversion (flowline form of Farinotti et al. 2009) with the rate factor scaled by a multiplier fitted by weighted least squares over its log, Delta chi^2 range (Press et al. 2007, section 15.6)',
    before,
    value,
    range: { low: before * kLow, high: before * kHigh, kind: 'delta-chi-square' },
    misfitBefore: misfitOf(modelledBefore, points, 'm'),
    misfitAfter: misfitOf(modelledAfter, points, 'm'),
    comparison: pointComparison(points, 'm', modelledBefore, modelledAfter),
    runs: { kind: 'bed inversion', count: 2 },
    statements: [
      `through the bed inversion from the surface and terminus: the scenario's bed takes no part in the fit`,
      ...fitted.statements,
    ],
    scenario: withParameter(scenario, pointer, value),
  };
}
