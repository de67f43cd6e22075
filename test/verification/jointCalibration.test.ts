/**
 * Twin experiments for the joint calibration of two parameters (calibrateJoint): the model makes
 * the observations on known values, the fit starts from wrong ones and must find both. Methods and
 * sources: weighted least squares over (log A, log C) by the downhill simplex (Nelder & Mead 1965,
 * The Computer Journal 7(4), 308-313), covariance 2 H^-1 (Press et al. 2007, Numerical Recipes,
 * 3rd ed., section 15.6); for the balance pair nested bisections (section 9.1). The valley is the
 * demo's invented Fennimow valley. The tolerances are ours, stated in each title.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { specificBalance, terminusRecordOf } from '../../src/model/analysis/calibrateClimate';
import { calibrateJoint, nelderMead2 } from '../../src/model/analysis/calibrateJoint';
import { CalibrationRefusal } from '../../src/model/analysis/calibrationTypes';
import { createFlowlineModel } from '../../src/model/createFlowlineModel';
import { profileFields } from '../../src/model/diagnostics';
import { glacierExtent } from '../../src/model/glacierExtent';
import { sampleCells } from '../../src/model/inversion/invertBed';
import type { ObservedPoint, Point, Scenario } from '../../src/model/scenario';
import { spinUp } from '../../src/model/spinUp';
import { checkedJson } from '../helpers/checkedScenario';
import { DEGREE_DAY_BALANCE } from '../helpers/testValleys';

const demo = JSON.parse(readFileSync(new URL('../../examples/demo-valley.json', import.meta.url), 'utf8'));
const TRUE_A = 2.4e-24;
const TRUE_C = 3e-14;
const TRUE_ELA = 2780;

function truth() {
  const scenario: Scenario = checkedJson({ ...demo, warming: [[0, 0]] });
  const model = createFlowlineModel(scenario);
  const spun = spinUp(model, model.initialThickness);
  expect(spun.converged).toBe(true);
  const surface: Point[] = Array.from(model.grid.x, (x, i) => [x, model.grid.bed[i] + spun.thickness[i]]);
  return { scenario, model, thickness: spun.thickness, surface, terminus: glacierExtent(model.grid, spun.thickness).terminus };
}

const SPEED_X = [1500, 2500, 3500, 4500, 5500, 6500];

describe('the downhill simplex (Nelder & Mead 1965)', () => {
  it('finds the minimum (1, 1) of the Rosenbrock function from (-1.2, 1), the usual test of the method: within 1e-4', () => {
    const fit = nelderMead2(([x, y]) => 100 * (y - x * x) ** 2 + (1 - x) ** 2, [-1.2, 1], 0.5, 2000);
    console.log(`Rosenbrock: (${fit.at[0].toFixed(6)}, ${fit.at[1].toFixed(6)}) in ${fit.evaluations} evaluations`);
    expect(Math.abs(fit.at[0] - 1)).toBeLessThan(1e-4);
    expect(Math.abs(fit.at[1] - 1)).toBeLessThan(1e-4);
  });
});

describe('joint calibration twins on the demo valley', () => {
  const t = truth();
  const u = profileFields(t.model, t.thickness, 0).surfaceSpeed;
  const speeds: ObservedPoint[] = SPEED_X.map((x) => {
    const value = sampleCells(u, t.model.grid.spacing, x);
    return [x, value, 0.05 * value];
  });

  it('A and C together from six surface speeds made on the true A and C, starting from 3 A and C / 4: both within 2 % (Nelder & Mead 1965; covariance 2 H^-1, Numerical Recipes 15.6), ranges hold the truth', () => {
    const scenario: Scenario = { ...t.scenario, ice: { ...t.scenario.ice, A: 3 * TRUE_A }, sliding: { C: TRUE_C / 4, m: 3 }, surface: t.surface, observations: { surfaceSpeed: speeds } };
    const fit = calibrateJoint(scenario, ['/ice/A', '/sliding/C']);
    const [a, c] = fit.parameters;
    console.log(
      `joint speeds: A ${a.value.toPrecision(5)} (truth ${TRUE_A}) range ${a.range.low.toPrecision(3)}-${a.range.high.toPrecision(3)}, ` +
        `C ${c.value.toPrecision(5)} (truth ${TRUE_C}) range ${c.range.low.toPrecision(3)}-${c.range.high.toPrecision(3)}, correlation ${fit.correlation.toFixed(3)}, ` +
        `chi2 ${fit.misfitBefore.surfaceSpeed!.chiSquare!.toPrecision(3)} -> ${fit.misfitAfter.surfaceSpeed!.chiSquare!.toExponential(2)}, ${fit.runs.count} diagnoses`,
    );
    expect(Math.abs(a.value / TRUE_A - 1)).toBeLessThan(0.02);
    expect(Math.abs(c.value / TRUE_C - 1)).toBeLessThan(0.02);
    expect(a.range.low).toBeLessThan(TRUE_A);
    expect(a.range.high).toBeGreaterThan(TRUE_A);
    expect(c.range.low).toBeLessThan(TRUE_C);
    expect(c.range.high).toBeGreaterThan(TRUE_C);
    expect(Math.abs(fit.correlation)).toBeLessThan(1);
    expect(fit.scenario.ice.A).toBe(a.value);
    expect(fit.scenario.sliding?.C).toBe(c.value);
  });

  it('the ELA and the balance gradient together from a terminus and a geodetic balance made on the true values, starting 83 m and 40 % off: the ELA band holds the truth (the terminus cell), the gradient within 3 %, at most 60 spin-ups', () => {
    const mb = t.scenario.massBalance as Extract<Scenario['massBalance'], { model: 'linear' }>;
    // The terminus is the steady one of the year-0 climate (observation year 0); the geodetic balance is that of the
    // observed glacier under a warming to 3 K by year 100, over years 50-100, far from zero, so it weighs the gradient.
    const warming: Point[] = [[0, 0], [100, 3]];
    const observedBalance = specificBalance({ ...t.scenario, warming, surface: t.surface }, 50, 100);
    const scenario: Scenario = {
      ...t.scenario,
      warming,
      surface: t.surface,
      massBalance: { ...mb, ela: TRUE_ELA + 83, ablationGradient: mb.ablationGradient * 1.4 },
      observations: { terminus: t.terminus, geodeticBalance: { from: 50, to: 100, value: observedBalance } },
    };
    const fit = calibrateJoint(scenario, ['/massBalance/ela', '/massBalance/ablationGradient']);
    const [ela, gradient] = fit.parameters;
    console.log(
      `joint balance: ELA ${ela.value.toFixed(1)} (truth ${TRUE_ELA}) band ${ela.range.low.toFixed(1)}-${ela.range.high.toFixed(1)}, ` +
        `gradient ${gradient.value.toPrecision(5)} (truth ${mb.ablationGradient}) range ${gradient.range.low.toPrecision(4)}-${gradient.range.high.toPrecision(4)}, ` +
        `terminus misfit ${fit.misfitBefore.terminus!.bias.toFixed(0)} -> ${fit.misfitAfter.terminus!.bias.toFixed(0)} m, ${fit.runs.count} spin-ups`,
    );
    expect(ela.range.low).toBeLessThanOrEqual(TRUE_ELA);
    expect(ela.range.high).toBeGreaterThanOrEqual(TRUE_ELA);
    expect(Math.abs(gradient.value / mb.ablationGradient - 1)).toBeLessThan(0.03);
    expect(Math.abs(fit.misfitAfter.terminus!.bias)).toBeLessThanOrEqual(0.5 * t.model.grid.spacing);
    expect(Math.abs(fit.misfitAfter.geodeticBalance!.bias)).toBeLessThan(1e-6);
    expect(fit.runs.count).toBeLessThanOrEqual(60);
  });

  it('A and C from six speeds with known noise (+-4 % alternating, under the 5 % errors): the one-sigma ranges from 2 H^-1 hold the truth (Numerical Recipes 15.6)', () => {
    const noisy = speeds.map(([x, v, e], k) => [x, v * (1 + (k % 2 === 0 ? 0.04 : -0.04)), e] as ObservedPoint);
    const scenario: Scenario = { ...t.scenario, ice: { ...t.scenario.ice, A: TRUE_A / 2 }, sliding: { C: 2 * TRUE_C, m: 3 }, surface: t.surface, observations: { surfaceSpeed: noisy } };
    const fit = calibrateJoint(scenario, ['/sliding/C', '/ice/A']);
    const [a, c] = fit.parameters;
    console.log(
      `joint speeds, noise: A ${a.value.toPrecision(4)} range ${a.range.low.toPrecision(3)}-${a.range.high.toPrecision(3)}, ` +
        `C ${c.value.toPrecision(4)} range ${c.range.low.toPrecision(3)}-${c.range.high.toPrecision(3)}, correlation ${fit.correlation.toFixed(3)}, chi2 ${fit.misfitAfter.surfaceSpeed!.chiSquare!.toPrecision(3)}`,
    );
    expect(a.pointer).toBe('/ice/A');
    expect(a.range.low).toBeLessThan(TRUE_A);
    expect(a.range.high).toBeGreaterThan(TRUE_A);
    expect(c.range.low).toBeLessThan(TRUE_C);
    expect(c.range.high).toBeGreaterThan(TRUE_C);
  });

  it('refusals: fewer than three speeds, a pair the observations cannot constrain, three parameters, a missing geodetic balance', () => {
    const two: Scenario = { ...t.scenario, surface: t.surface, observations: { surfaceSpeed: speeds.slice(0, 2) } };
    expect(() => calibrateJoint(two, ['/ice/A', '/sliding/C'])).toThrow(/at least 3 surface speeds .*has 2/);
    expect(() => calibrateJoint(two, ['/ice/A', '/massBalance/ela'])).toThrow(CalibrationRefusal);
    expect(() => calibrateJoint(two, ['/ice/A', '/massBalance/ela'])).toThrow(/cannot constrain \/ice\/A with \/massBalance\/ela together/);
    expect(() => calibrateJoint(two, ['/ice/A', '/sliding/C', '/massBalance/ela'])).toThrow(/at most two/);
    try {
      calibrateJoint({ ...two, observations: { terminus: t.terminus } }, ['/massBalance/ela', '/massBalance/ablationGradient']);
      expect.unreachable();
    } catch (error) {
      expect((error as CalibrationRefusal).needed).toBe('/observations/geodeticBalance');
    }
  });
});

describe('joint calibration twin: a terminus record and a geodetic balance', () => {
  it('the ELA and the gradient from a terminus record every 25 years to year 100 under 3 K of warming and the geodetic balance of years 50-100, starting 60 m and 30 % off: ELA within 10 m and its band holding the truth, gradient within 5 %, at most 60 runs', () => {
    const coarse: Scenario = checkedJson({ ...demo, grid: { length: 12000, spacing: 100 }, warming: [[0, 0], [100, 3]] });
    const model = createFlowlineModel({ ...coarse, warming: [[0, 0]] });
    const spun = spinUp(model, model.initialThickness);
    const surface: Point[] = Array.from(model.grid.x, (x, i) => [x, model.grid.bed[i] + spun.thickness[i]]);
    const years = [25, 50, 75, 100];
    const { termini } = terminusRecordOf(coarse, years);
    const observedBalance = specificBalance({ ...coarse, surface }, 50, 100);
    const mb = coarse.massBalance as Extract<Scenario['massBalance'], { model: 'linear' }>;
    const scenario: Scenario = {
      ...coarse,
      surface,
      massBalance: { ...mb, ela: TRUE_ELA - 60, ablationGradient: mb.ablationGradient * 0.7 },
      observations: { terminus: years.map((y, k) => [y, termini[k]] as Point), geodeticBalance: { from: 50, to: 100, value: observedBalance } },
    };
    const fit = calibrateJoint(scenario, ['/massBalance/ablationGradient', '/massBalance/ela']);
    const [ela, gradient] = fit.parameters;
    console.log(
      `joint record: termini ${termini.join(', ')} m; ELA ${ela.value.toFixed(1)} (truth ${TRUE_ELA}) bracket ${ela.range.low.toFixed(1)}-${ela.range.high.toFixed(1)}, ` +
        `gradient ${gradient.value.toPrecision(5)} (truth ${mb.ablationGradient}), RMS ${fit.misfitBefore.terminusRecord!.rms.toFixed(0)} -> ${fit.misfitAfter.terminusRecord!.rms.toFixed(0)} m, ${fit.runs.count} runs`,
    );
    expect(ela.pointer).toBe('/massBalance/ela');
    expect(fit.observations).toEqual(['terminusRecord', 'geodeticBalance']);
    expect(Math.abs(ela.value - TRUE_ELA)).toBeLessThan(10);
    expect(ela.range.low).toBeLessThanOrEqual(TRUE_ELA);
    expect(ela.range.high).toBeGreaterThanOrEqual(TRUE_ELA);
    expect(Math.abs(gradient.value / mb.ablationGradient - 1)).toBeLessThan(0.05);
    expect(fit.runs.count).toBeLessThanOrEqual(60);
  });
});

describe('joint calibration twin: a degree-day model', () => {
  it('the mean temperature and the ice degree-day factor from a terminus and the geodetic balance of years 50-100 under 3 K of warming, starting 0.7 K and 30 % off: the temperature band holds the truth, the factor within 5 %, at most 60 spin-ups', () => {
    const degreeDay = DEGREE_DAY_BALANCE;
    const warming: Point[] = [[0, 0], [100, 3]];
    const dd: Scenario = checkedJson({ ...demo, warming, massBalance: degreeDay });
    const model = createFlowlineModel({ ...dd, warming: [[0, 0]] });
    const spun = spinUp(model, model.initialThickness);
    const surface: Point[] = Array.from(model.grid.x, (x, i) => [x, model.grid.bed[i] + spun.thickness[i]]);
    const terminus = glacierExtent(model.grid, spun.thickness).terminus;
    const observedBalance = specificBalance({ ...dd, surface }, 50, 100);
    const scenario: Scenario = {
      ...dd,
      surface,
      massBalance: { ...degreeDay, meanTemperature: -5.3, ddfIce: 7.8 } as Scenario['massBalance'],
      observations: { terminus, geodeticBalance: { from: 50, to: 100, value: observedBalance } },
    };
    const fit = calibrateJoint(scenario, ['/massBalance/meanTemperature', '/massBalance/ddfIce']);
    const [temperature, ddf] = fit.parameters;
    console.log(
      `joint degree-day: terminus ${terminus} m, balance ${observedBalance.toFixed(3)}; T ${temperature.value.toFixed(3)} (truth -6) band ${temperature.range.low.toFixed(3)} to ${temperature.range.high.toFixed(3)}, ` +
        `ddfIce ${ddf.value.toPrecision(4)} (truth 6) range ${ddf.range.low.toPrecision(4)}-${ddf.range.high.toPrecision(4)}, ${fit.runs.count} spin-ups`,
    );
    expect(temperature.range.low).toBeLessThanOrEqual(-6);
    expect(temperature.range.high).toBeGreaterThanOrEqual(-6);
    expect(Math.abs(ddf.value / 6 - 1)).toBeLessThan(0.05);
    expect(fit.runs.count).toBeLessThanOrEqual(60);
  });
});
