/**
 * Twin experiments for the calibration (calibrateParameter): the model makes the observations
 * itself on known parameters, the calibration starts from wrong ones and must find the known
 * values. A twin is the usual test of a fitting method (the truth is known exactly); the
 * tolerances are ours and stated in each title. Methods and their sources:
 *   - speeds: weighted least squares with the Delta chi^2 = 1 range (Press et al. 2007, Numerical
 *     Recipes, 3rd ed., section 15.6), golden-section search (section 10.2);
 *   - one terminus: bracketing and bisection (section 9.1) over spin-ups;
 *   - terminus record: transient least squares, bracketing (section 9.1) and golden section (10.2);
 *   - geodetic balance: bisection (section 9.1).
 * The valley is the demo's invented Fennimow valley.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { calibrateParameter } from '../../src/model/analysis/calibrateParameter';
import { specificBalance, terminusRecordOf } from '../../src/model/analysis/calibrateClimate';
import { CalibrationNotBracketed, CalibrationRefusal } from '../../src/model/analysis/calibrationTypes';
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
const TRUE_ELA = 2780;

/** The demo valley spun up under its year-0 climate: the truth of the twin (steady glacier). */
function truth(overrides: object = {}) {
  const scenario: Scenario = checkedJson({ ...demo, warming: [[0, 0]], ...overrides });
  const model = createFlowlineModel(scenario);
  const spun = spinUp(model, model.initialThickness);
  expect(spun.converged).toBe(true);
  const surface: Point[] = Array.from(model.grid.x, (x, i) => [x, model.grid.bed[i] + spun.thickness[i]]);
  const terminus = glacierExtent(model.grid, spun.thickness).terminus;
  return { scenario, model, thickness: spun.thickness, surface, terminus };
}

const SPEED_X = [1500, 2500, 3500, 4500, 5500, 6500];

/** Six surface speeds of the truth, with 5 % one-sigma errors and the given relative noise. */
function speeds(t: ReturnType<typeof truth>, noise: readonly number[] = [0, 0, 0, 0, 0, 0]): ObservedPoint[] {
  const u = profileFields(t.model, t.thickness, 0).surfaceSpeed;
  return SPEED_X.map((x, k) => {
    const value = sampleCells(u, t.model.grid.spacing, x);
    return [x, value * (1 + noise[k]), 0.05 * value];
  });
}

describe('calibration twins on the demo valley', () => {
  const t = truth();

  it('A from six surface speeds, no noise, starting from 3 A: within 0.5 % (weighted least squares, Numerical Recipes 15.6), well under a second', () => {
    const scenario: Scenario = { ...t.scenario, ice: { ...t.scenario.ice, A: 3 * TRUE_A }, surface: t.surface, observations: { surfaceSpeed: speeds(t) } };
    const started = performance.now();
    const fit = calibrateParameter(scenario, '/ice/A');
    const ms = performance.now() - started;
    console.log(
      `speeds, no noise: A ${fit.value.toPrecision(4)} (truth ${TRUE_A}), range ${fit.range!.low.toPrecision(3)}-${fit.range!.high.toPrecision(3)}, ` +
        `chi2 ${fit.misfitBefore.chiSquare!.toPrecision(3)} -> ${fit.misfitAfter.chiSquare!.toExponential(2)}, ${fit.runs.count} diagnoses, ${ms.toFixed(0)} ms`,
    );
    expect(Math.abs(fit.value / TRUE_A - 1)).toBeLessThan(0.005);
    expect(fit.misfitAfter.chiSquare!).toBeLessThan(fit.misfitBefore.chiSquare!);
    expect(fit.range!.low).toBeLessThan(TRUE_A);
    expect(fit.range!.high).toBeGreaterThan(TRUE_A);
    expect(fit.scenario.ice.A).toBe(fit.value);
    expect(ms).toBeLessThan(5000); // generous against a shared machine; bench/bench.ts records the time
  });

  it('A from six surface speeds with known noise (+-4 % alternating, under the 5 % errors): within 3 %, and the Delta chi^2 range holds the truth', () => {
    const noisy = speeds(t, [0.04, -0.04, 0.04, -0.04, 0.04, -0.04]);
    const scenario: Scenario = { ...t.scenario, ice: { ...t.scenario.ice, A: TRUE_A / 4 }, surface: t.surface, observations: { surfaceSpeed: noisy } };
    const fit = calibrateParameter(scenario, '/ice/A');
    console.log(`speeds, noise: A ${fit.value.toPrecision(4)} (truth ${TRUE_A}), range ${fit.range!.low.toPrecision(3)}-${fit.range!.high.toPrecision(3)}, chi2 ${fit.misfitAfter.chiSquare!.toPrecision(3)}`);
    expect(Math.abs(fit.value / TRUE_A - 1)).toBeLessThan(0.03);
    expect(fit.range!.low).toBeLessThan(TRUE_A);
    expect(fit.range!.high).toBeGreaterThan(TRUE_A);
  });

  it('the sliding coefficient C from six surface speeds, no noise, starting from C / 5: within 1 %', () => {
    const scenario: Scenario = { ...t.scenario, sliding: { C: 3e-14 / 5, m: 3 }, surface: t.surface, observations: { surfaceSpeed: speeds(t) } };
    const fit = calibrateParameter(scenario, '/sliding/C');
    console.log(`speeds: C ${fit.value.toPrecision(4)} (truth 3e-14), range ${fit.range!.low.toPrecision(3)}-${fit.range!.high.toPrecision(3)}`);
    expect(Math.abs(fit.value / 3e-14 - 1)).toBeLessThan(0.01);
  });

  it('the ELA from the spun-up terminus, starting 120 m too high: the true ELA lies in the reported band of ELAs whose terminus is in the true cell (bisection, Numerical Recipes 9.1), at most 30 spin-ups', () => {
    const scenario: Scenario = { ...t.scenario, massBalance: { ...t.scenario.massBalance, ela: TRUE_ELA + 120 } as Scenario['massBalance'], observations: { terminus: t.terminus } };
    const fit = calibrateParameter(scenario, '/massBalance/ela');
    console.log(
      `terminus ${t.terminus} m: ELA ${fit.value.toFixed(1)} (truth ${TRUE_ELA}), band ${fit.range!.low.toFixed(1)}-${fit.range!.high.toFixed(1)}, ` +
        `terminus misfit ${fit.misfitBefore.bias} -> ${fit.misfitAfter.bias} m, ${fit.runs.count} spin-ups`,
    );
    expect(fit.range!.low).toBeLessThanOrEqual(TRUE_ELA);
    expect(fit.range!.high).toBeGreaterThanOrEqual(TRUE_ELA);
    expect(Math.abs(fit.misfitAfter.bias)).toBeLessThanOrEqual(0.5 * t.model.grid.spacing);
    expect(fit.runs.count).toBeLessThanOrEqual(30);
  });

  it('the ELA from a terminus observed in year 100 of the warming, taken as in balance with the warming held at +1.5 K: the true ELA in the reported band', () => {
    const warming: Point[] = [[0, 0], [100, 1.5]];
    const held = truth({ warming: [[0, 1.5]] });
    const scenario: Scenario = {
      ...t.scenario,
      warming,
      massBalance: { ...t.scenario.massBalance, ela: TRUE_ELA - 100 } as Scenario['massBalance'],
      observations: { year: 100, terminus: held.terminus },
    };
    const fit = calibrateParameter(scenario, '/massBalance/ela');
    console.log(`terminus ${held.terminus} m in year 100: ELA ${fit.value.toFixed(1)}, band ${fit.range!.low.toFixed(1)}-${fit.range!.high.toFixed(1)}, ${fit.runs.count} spin-ups`);
    expect(fit.range!.low).toBeLessThanOrEqual(TRUE_ELA);
    expect(fit.range!.high).toBeGreaterThanOrEqual(TRUE_ELA);
    expect(fit.scenario.warming).toEqual(warming);
  });

  it('the ELA from the geodetic balance the model gives on the true ELA over years 0-20 of the warming: within 0.01 m (bisection)', () => {
    const warming: Point[] = [[0, 0], [100, 1.5]];
    const observed = specificBalance({ ...t.scenario, surface: t.surface, warming }, 0, 20);
    const scenario: Scenario = {
      ...t.scenario,
      warming,
      surface: t.surface,
      massBalance: { ...t.scenario.massBalance, ela: 2600 } as Scenario['massBalance'],
      observations: { geodeticBalance: { from: 0, to: 20, value: observed } },
    };
    const fit = calibrateParameter(scenario, '/massBalance/ela');
    console.log(`geodetic ${observed.toFixed(4)} m w.e./a: ELA ${fit.value.toFixed(4)}, dB/dELA ${fit.sensitivity!.value.toExponential(3)}, ${fit.runs.count} balances`);
    expect(Math.abs(fit.value - TRUE_ELA)).toBeLessThan(0.01);
    expect(fit.sensitivity!.value).toBeLessThan(0);
  });

  it('A from three thickness points through the bed inversion, starting from 5 A: within 10 % (as the inversion twin)', () => {
    const radar: ObservedPoint[] = [3000, 5500, 7500].map((x) => [x, sampleCells(t.thickness, t.model.grid.spacing, x), 5]);
    const scenario: Scenario = {
      ...t.scenario,
      sliding: { C: 0, m: 3 },
      ice: { ...t.scenario.ice, A: 5 * TRUE_A },
      surface: t.surface,
      observations: { terminus: t.terminus, thickness: radar },
    };
    const noSliding = truth({ sliding: { C: 0, m: 3 } });
    const radarNoSliding: ObservedPoint[] = [3000, 5500, 7500].map((x) => [x, sampleCells(noSliding.thickness, noSliding.model.grid.spacing, x), 5]);
    const fit = calibrateParameter({ ...scenario, surface: noSliding.surface, observations: { terminus: noSliding.terminus, thickness: radarNoSliding } }, '/ice/A');
    console.log(`thickness: A ${fit.value.toPrecision(3)} (truth ${TRUE_A}), RMS ${fit.misfitBefore.rms.toFixed(1)} -> ${fit.misfitAfter.rms.toFixed(1)} m`);
    expect(Math.abs(fit.value / TRUE_A - 1)).toBeLessThan(0.1);
    expect(fit.observation).toBe('thickness');
    expect(() => calibrateParameter(scenario, '/sliding/C')).toThrow(/surfaceSpeed/);
  });
});

describe('calibration twin: a terminus record made by the model under a warming history', () => {
  it('the ELA from a terminus record every 25 years to year 100 under 1.5 K of warming, starting 80 m too low: the record followed to within one cell RMS, the ELA within 10 m, at most 30 runs', () => {
    const coarse = { ...demo, grid: { length: 12000, spacing: 100 }, warming: [[0, 0], [100, 1.5]] };
    const base: Scenario = checkedJson(coarse);
    const years = [25, 50, 75, 100];
    const { termini } = terminusRecordOf(base, years);
    const record: Point[] = years.map((y, k) => [y, termini[k]]);
    const scenario: Scenario = { ...base, massBalance: { ...base.massBalance, ela: TRUE_ELA - 80 } as Scenario['massBalance'], observations: { terminus: record } };
    const started = performance.now();
    const fit = calibrateParameter(scenario, '/massBalance/ela');
    console.log(
      `record ${termini.join(', ')} m: ELA ${fit.value.toFixed(1)} (truth ${TRUE_ELA}), bracket ${fit.range!.low.toFixed(1)}-${fit.range!.high.toFixed(1)}, ` +
        `RMS ${fit.misfitBefore.rms.toFixed(0)} -> ${fit.misfitAfter.rms.toFixed(0)} m, ${fit.runs.count} runs, ${(performance.now() - started).toFixed(0)} ms`,
    );
    expect(fit.observation).toBe('terminusRecord');
    expect(fit.misfitAfter.rms).toBeLessThanOrEqual(100);
    expect(Math.abs(fit.value - TRUE_ELA)).toBeLessThan(10);
    expect(fit.runs.count).toBeLessThanOrEqual(30);
  });
});

describe('calibration of the other balance models and parameters', () => {
  const t = truth();

  it('the enhancement factor E (A from the temperature) from six surface speeds, starting from E = 1 for a truth of 2.5: within 0.5 %', () => {
    const ice = { n: 3, temperature: -2, enhancement: 2.5 };
    const warm = truth({ ice });
    const scenario: Scenario = { ...warm.scenario, ice: { ...ice, enhancement: 1 }, surface: warm.surface, observations: { surfaceSpeed: speeds(warm) } };
    const fit = calibrateParameter(scenario, '/ice/enhancement');
    console.log(`speeds: E ${fit.value.toPrecision(4)} (truth 2.5), range ${fit.range!.low.toPrecision(3)}-${fit.range!.high.toPrecision(3)}`);
    expect(Math.abs(fit.value / 2.5 - 1)).toBeLessThan(0.005);
    expect(() => calibrateParameter({ ...scenario, ice: { n: 3, A: TRUE_A, enhancement: 1 } }, '/ice/enhancement')).toThrow(/calibrate \/ice\/A/);
  });

  it('the balance gradient (a positive rate, bracketed in log p) from the geodetic balance of years 0-10: within 1e-6 relative', () => {
    const observed = specificBalance({ ...t.scenario, surface: t.surface }, 0, 10);
    const mb = t.scenario.massBalance as Extract<Scenario['massBalance'], { model: 'linear' }>;
    const scenario: Scenario = { ...t.scenario, surface: t.surface, massBalance: { ...mb, ablationGradient: 0.003 }, observations: { geodeticBalance: { from: 0, to: 10, value: observed } } };
    const fit = calibrateParameter(scenario, '/massBalance/ablationGradient');
    console.log(`geodetic: gradient ${fit.value} (truth ${mb.ablationGradient})`);
    expect(Math.abs(fit.value / mb.ablationGradient - 1)).toBeLessThan(1e-6);
  });

  it('a degree-day model: the mean temperature from the geodetic balance within 1e-4 K, and a table shifted as a whole to the terminus within the match band', () => {
    const degreeDay = DEGREE_DAY_BALANCE;
    const dd: Scenario = checkedJson({ ...demo, warming: [[0, 0]], massBalance: degreeDay });
    const observed = specificBalance({ ...dd, surface: t.surface }, 0, 5);
    const fit = calibrateParameter(
      { ...dd, surface: t.surface, massBalance: { ...degreeDay, meanTemperature: -4 } as Scenario['massBalance'], observations: { geodeticBalance: { from: 0, to: 5, value: observed } } },
      '/massBalance/meanTemperature',
    );
    console.log(`degree-day geodetic: mean temperature ${fit.value} (truth -6)`);
    expect(Math.abs(fit.value + 6)).toBeLessThan(1e-4);

    // A table that is the linear demo balance sampled; its truth terminus is the spun-up one (shift 0).
    const table = { model: 'table', points: [[2000, -5.46], [2780, 0], [3500, 2.0]] };
    const tabled: Scenario = checkedJson({ ...demo, warming: [[0, 0]], massBalance: table });
    const tableModel = createFlowlineModel(tabled);
    const tableTerminus = glacierExtent(tableModel.grid, spinUp(tableModel, tableModel.initialThickness).thickness).terminus;
    const shifted: Scenario = { ...tabled, massBalance: { model: 'table', points: [[2100, -5.46], [2880, 0], [3600, 2.0]] }, observations: { terminus: tableTerminus } };
    const shift = calibrateParameter(shifted, '/massBalance/points');
    console.log(`table: shift ${shift.value.toFixed(1)} m (truth -100), band ${shift.range!.low.toFixed(1)} to ${shift.range!.high.toFixed(1)}, ${shift.runs.count} spin-ups`);
    expect(shift.range!.low).toBeLessThanOrEqual(-100);
    expect(shift.range!.high).toBeGreaterThanOrEqual(-100);
    expect(shift.unit).toContain('shift');
  });
});

describe('calibration refusals', () => {
  const base: Scenario = checkedJson(demo);
  const withSpeeds: Scenario = { ...base, observations: { surfaceSpeed: [[3000, 40, 4]] } };

  it('a pointer that names no number is refused, naming it', () => {
    expect(() => calibrateParameter(withSpeeds, '/ice/Q')).toThrow(CalibrationRefusal);
    expect(() => calibrateParameter(withSpeeds, '/ice/Q')).toThrow(/\/ice\/Q names no number/);
    expect(() => calibrateParameter(withSpeeds, '/width')).toThrow(/a list, not a number/);
    expect(() => calibrateParameter(withSpeeds, 'ice/A')).toThrow(/must start with "\/"/);
  });

  it('observations that cannot constrain the pointer are refused with the observation needed', () => {
    try {
      calibrateParameter(withSpeeds, '/massBalance/ela');
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(CalibrationRefusal);
      expect((error as CalibrationRefusal).needed).toBe('/observations/terminus');
      expect((error as Error).message).toMatch(/terminus position.*geodetic balance/);
    }
    expect(() => calibrateParameter(base, '/ice/A')).toThrow(/observations\/surfaceSpeed/);
    expect(() => calibrateParameter(withSpeeds, '/run/years')).toThrow(/no observation constrains \/run\/years/);
    expect(() => calibrateParameter(withSpeeds, '/massBalance/ablationGradient')).toThrow(/geodeticBalance/);
  });

  it('thickness points without the terminus the bed inversion needs are refused, naming it', () => {
    try {
      calibrateParameter({ ...base, observations: { thickness: [[3000, 200, 10]] } }, '/ice/A');
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(CalibrationRefusal);
      expect((error as CalibrationRefusal).needed).toBe('/observations/terminus');
    }
  });

  it('a terminus record with a year before the spin-up year 0 is refused', () => {
    expect(() => calibrateParameter({ ...base, observations: { terminus: [[-10, 9000], [20, 8800]] } }, '/massBalance/ela')).toThrow(/from model year 0/);
  });

  it('a fit without a bracket says what was tried', () => {
    // Speeds ten thousand times the model's: no A within a factor 1000 of the start reaches them.
    const t = truth();
    const fast = speeds(t).map(([x, u, s]) => [x, u * 1e4, s * 1e4] as ObservedPoint);
    const scenario: Scenario = { ...t.scenario, sliding: { C: 0, m: 3 }, surface: t.surface, observations: { surfaceSpeed: fast } };
    expect(() => calibrateParameter(scenario, '/ice/A')).toThrow(CalibrationNotBracketed);
    expect(() => calibrateParameter(scenario, '/ice/A')).toThrow(/no minimum of the speed misfit .*\(61 values scanned on a log scale/);
  });
});
