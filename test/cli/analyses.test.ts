/**
 * The built command line's calibrate, commit and sensitivity commands as a child process: files
 * written, exit codes, one-line messages, and the browser's numbers (the analysis worker's jobs,
 * src/worker/analysisJobs.ts, computed here in-process on the same inputs).
 */
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { runToEnd } from '../../src/model/analysis/stepwise';
import { createFlowlineModel } from '../../src/model/createFlowlineModel';
import { profileFields } from '../../src/model/diagnostics';
import { sampleCells } from '../../src/model/inversion/invertBed';
import { runScenario } from '../../src/model/runScenario';
import type { Scenario } from '../../src/model/scenario';
import { CAUTION_TEXT } from '../../src/outputs/caution';
import { sensitivityCsv } from '../../src/outputs/analysisOutputs';
import { validateScenario } from '../../src/scenario/validateScenario';
import { analysisSteps } from '../../src/worker/analysisJobs';
import { quorrelCirque } from '../helpers/quorrelCirque';
import { checkedJson } from '../helpers/checkedScenario';
import { ensureFreshBundles, ROOT, runFirnline, expectOneLineFailure } from '../helpers/cliBundle';

let work: string;
const firnline = (...args: string[]) => runFirnline(work, args);

function file(name: string, content: unknown): string {
  writeFileSync(join(work, name), JSON.stringify(content, null, 2));
  return name;
}

const read = (dir: string, name: string) => readFileSync(join(work, dir, name), 'utf8');

beforeAll(() => {
  ensureFreshBundles();
  work = mkdtempSync(join(tmpdir(), 'firnline-analyses-'));
}, 60_000);

afterAll(() => {
  if (work) rmSync(work, { recursive: true, force: true });
});

/** Six surface speeds of the cirque as it is, made by the model on the true A, 5 % errors. */
function cirqueWithSpeeds(factor: number, speedScale = 1): Record<string, unknown> {
  const truth = checkedJson(quorrelCirque());
  const model = createFlowlineModel(truth);
  const u = profileFields(model, model.initialThickness, 0).surfaceSpeed;
  const surfaceSpeed = [300, 600, 900, 1200, 1500, 1800].map((x) => {
    const value = sampleCells(u, model.grid.spacing, x) * speedScale;
    return [x, value, 0.05 * value];
  });
  return quorrelCirque({ ice: { n: 3, A: factor * 2.4e-24 }, observations: { surfaceSpeed } });
}

/** The validator accepts `observations` once its schema is in (being added in parallel). */
const observationsValidate = validateScenario(cirqueWithSpeeds(1)).ok;

describe('firnline calibrate', () => {
  it.skipIf(!observationsValidate)('fits /ice/A to six surface speeds (within 0.5 %) and writes a valid scenario.json and calibration.json', () => {
    const result = firnline('calibrate', file('speeds.json', cirqueWithSpeeds(3)), '--parameter', '/ice/A', '--out', 'cal-a', '--quiet');
    expect(result.status, result.stderr).toBe(0);
    expect(result.stderr).toBe('');
    expect(result.stdout).toMatch(/^firnline: \/ice\/A = [\d.e-]+ Pa\^-3 s\^-1 \(one-sigma range/);
    const calibration = JSON.parse(read('cal-a', 'calibration.json'));
    expect(Math.abs(calibration.parameter.value / 2.4e-24 - 1)).toBeLessThan(0.005);
    expect(calibration.parameter.before).toBe(3 * 2.4e-24);
    expect(calibration.parameter.range.low).toBeLessThan(calibration.parameter.value);
    expect(calibration.misfit.after.chiSquare).toBeLessThan(calibration.misfit.before.chiSquare);
    expect(calibration.observation).toEqual({ kind: 'surfaceSpeed', pointer: '/observations/surfaceSpeed', count: 6 });
    expect(calibration.observationsUsed.surfaceSpeed).toHaveLength(6);
    expect(calibration.runs.count).toBeGreaterThan(0);
    expect(calibration.caution).toBe(CAUTION_TEXT);
    expect(calibration.firnlineVersion).toMatch(/^\d+\.\d+\.\d+/);
    const scenario = JSON.parse(read('cal-a', 'scenario.json'));
    expect(validateScenario(scenario).ok).toBe(true);
    expect(scenario.ice.A).toBe(calibration.parameter.value);
  });

  it.skipIf(!observationsValidate)('exit 3, saying what was tried, when no value within a factor 1000 fits (speeds 5,000 times too fast, under the 100,000 m a^-1 cap of the format)', () => {
    const result = firnline('calibrate', file('fast.json', cirqueWithSpeeds(1, 5e3)), '--parameter', '/ice/A', '--out', 'cal-fast');
    expectOneLineFailure(result, 3, 'calibration of /ice/A failed', '61 values scanned on a log scale');
  });

  it('exit 2 naming the observation needed when the scenario has none that constrains the parameter', () => {
    const result = firnline('calibrate', file('plain.json', quorrelCirque()), '--parameter', '/ice/A', '--out', 'cal-plain');
    expectOneLineFailure(result, 2, 'cannot calibrate /ice/A', '/observations/surfaceSpeed');
    const ela = firnline('calibrate', 'plain.json', '--parameter', '/massBalance/ela', '--out', 'cal-plain');
    expectOneLineFailure(ela, 2, 'needed: /observations/terminus');
  });

  it('exit 2 for a pointer that names no number, also in a joint fit', () => {
    file('plain.json', quorrelCirque());
    expectOneLineFailure(firnline('calibrate', 'plain.json', '--parameter', '/ice/B', '--out', 'x'), 2, '/ice/B names no number', 'no /ice/B');
    expectOneLineFailure(firnline('calibrate', 'plain.json', '--parameter', '/bed', '--out', 'x'), 2, 'a list, not a number');
    expectOneLineFailure(firnline('calibrate', 'plain.json', '--parameter', 'ice/A', '--out', 'x'), 2, 'not a JSON Pointer');
    expectOneLineFailure(firnline('calibrate', 'plain.json', '--parameter', '/ice/A', '-p', '/sliding/C', '--out', 'x'), 2, 'cannot calibrate /ice/A with /sliding/C', '/sliding/C names no number');
    expectOneLineFailure(firnline('calibrate', 'plain.json', '--out', 'x'), 2, 'calibrate needs --parameter');
    expectOneLineFailure(firnline('calibrate', 'plain.json', '--parameter', '/ice/A', '--observation', 'radar', '--out', 'x'), 2, '--observation needs one of');
  });
});

/** Six surface speeds of the cirque with sliding, made by the model on the true A and C, 5 % errors; the scenario starts from `factorA` A and `factorC` C. */
function slidingCirque(factorA: number, factorC: number, count = 6): Record<string, unknown> {
  const truth = checkedJson(quorrelCirque({ sliding: { C: 3e-14, m: 3 } }));
  const model = createFlowlineModel(truth);
  const u = profileFields(model, model.initialThickness, 0).surfaceSpeed;
  const surfaceSpeed = [300, 600, 900, 1200, 1500, 1800].slice(0, count).map((x) => {
    const value = sampleCells(u, model.grid.spacing, x);
    return [x, value, 0.05 * value];
  });
  return quorrelCirque({ ice: { n: 3, A: factorA * 2.4e-24 }, sliding: { C: factorC * 3e-14, m: 3 }, observations: { surfaceSpeed } });
}

describe('firnline calibrate with two parameters (joint fits)', () => {
  it.skipIf(!observationsValidate)('fits /ice/A with /sliding/C to six surface speeds (both within 2 %) and writes both values, ranges and the correlation', () => {
    const result = firnline('calibrate', file('sliding.json', slidingCirque(3, 0.25)), '--parameter', '/ice/A', '--parameter', '/sliding/C', '--out', 'cal-ac', '--quiet');
    expect(result.status, result.stderr).toBe(0);
    expect(result.stdout).toMatch(/^firnline: \/ice\/A = [\d.e-]+ Pa\^-3 s\^-1 \(one-sigma range .*; \/sliding\/C = [\d.e-]+ m a\^-1 Pa\^-3 .*; correlation -?[\d.]+; surfaceSpeed: RMS misfit/);
    const calibration = JSON.parse(read('cal-ac', 'calibration.json'));
    const [a, c] = calibration.parameters;
    console.log(`cli joint: A ${a.value} C ${c.value} correlation ${calibration.correlation}, ${calibration.runs.count} diagnoses`);
    expect(a.pointer).toBe('/ice/A');
    expect(c.pointer).toBe('/sliding/C');
    expect(Math.abs(a.value / 2.4e-24 - 1)).toBeLessThan(0.02);
    expect(Math.abs(c.value / 3e-14 - 1)).toBeLessThan(0.02);
    expect(a.range.low).toBeLessThan(a.value);
    expect(c.range.high).toBeGreaterThan(c.value);
    expect(Math.abs(calibration.correlation)).toBeLessThan(1);
    expect(calibration.misfit.after.surfaceSpeed.chiSquare).toBeLessThan(calibration.misfit.before.surfaceSpeed.chiSquare);
    expect(calibration.observations).toEqual([{ kind: 'surfaceSpeed', pointer: '/observations/surfaceSpeed', count: 6 }]);
    expect(calibration.runs.count).toBeGreaterThan(0);
    expect(calibration.caution).toBe(CAUTION_TEXT);
    const scenario = JSON.parse(read('cal-ac', 'scenario.json'));
    expect(validateScenario(scenario).ok).toBe(true);
    expect(scenario.ice.A).toBe(a.value);
    expect(scenario.sliding.C).toBe(c.value);
  });

  it.skipIf(!observationsValidate)('exit 2: too few speeds, a pair the observations cannot constrain, three parameters, --observation with two', () => {
    file('two-speeds.json', slidingCirque(1, 1, 2));
    expectOneLineFailure(firnline('calibrate', 'two-speeds.json', '-p', '/ice/A', '-p', '/sliding/C', '--out', 'x'), 2, 'at least 3 surface speeds', 'has 2', 'needed: /observations/surfaceSpeed');
    file('speeds6.json', slidingCirque(1, 1));
    expectOneLineFailure(firnline('calibrate', 'speeds6.json', '-p', '/ice/A', '-p', '/massBalance/ela', '--out', 'x'), 2, 'cannot constrain /ice/A with /massBalance/ela together');
    expectOneLineFailure(
      firnline('calibrate', 'speeds6.json', '-p', '/massBalance/ela', '-p', '/massBalance/ablationGradient', '--out', 'x'),
      2,
      'needs a terminus',
      'needed: /observations/terminus',
    );
    expectOneLineFailure(firnline('calibrate', 'speeds6.json', '-p', '/ice/A', '-p', '/sliding/C', '-p', '/massBalance/ela', '--out', 'x'), 2, 'at most two parameters');
    expectOneLineFailure(firnline('calibrate', 'speeds6.json', '-p', '/ice/A', '-p', '/sliding/C', '--observation', 'surfaceSpeed', '--out', 'x'), 2, 'a joint fit uses');
  });
});

describe('firnline commit and sensitivity: the browser analyses, same numbers', () => {
  it('commit --from 15 writes committed.csv/json/svg with the analysis worker\'s numbers', () => {
    const scenario: Scenario = checkedJson(quorrelCirque());
    const result = firnline('commit', file('cirque.json', quorrelCirque()), '--from', '15', '--out', 'commit');
    expect(result.status, result.stderr).toBe(0);
    expect(result.stdout).toMatch(/^firnline: committed change from year 15 /);
    const frame = runScenario(scenario).frames.find((f) => f.time === 15)!;
    const browser = runToEnd(analysisSteps({ kind: 'committed', scenario: checkedJson(quorrelCirque()), year: 15, thickness: frame.fields.thickness }));
    if (browser.kind !== 'committed') throw new Error('not a committed-change result');
    const json = JSON.parse(read('commit', 'committed.json'));
    expect(json.lengthChange).toBe(browser.committed.lengthChange);
    expect(json.volumeChange).toBe(browser.committed.volumeChange);
    expect(json.yearsToSteady).toBe(browser.committed.yearsToSteady);
    expect(json.caution).toBe(CAUTION_TEXT);
    const csv = read('commit', 'committed.csv').split('\n');
    expect(csv[0]).toBe('t_yr,phase,length_m,volume_m3');
    expect(csv.filter((l) => l.includes(',run,'))).toHaveLength(2); // outputs at years 0 and 15
    expect(csv.filter((l) => l.includes(',held,'))).toHaveLength(browser.committed.path.length);
    const svg = read('commit', 'committed.svg');
    expect(svg.startsWith('<?xml')).toBe(true);
    expect(svg).toContain('held from 15');
    expect(svg).toContain('Idealised model results');
  });

  it('commit on the demo valley (spin-up first) from year 100 gives the analysis worker\'s numbers', () => {
    const demo = JSON.parse(readFileSync(join(ROOT, 'examples/demo-valley.json'), 'utf8'));
    const result = firnline('commit', join(ROOT, 'examples/demo-valley.json'), '--from', '100', '--out', 'commit-demo', '--quiet');
    expect(result.status, result.stderr).toBe(0);
    const frame = runScenario(checkedJson(demo)).frames.find((f) => f.time === 100)!;
    const browser = runToEnd(analysisSteps({ kind: 'committed', scenario: checkedJson(demo), year: 100, thickness: frame.fields.thickness }));
    if (browser.kind !== 'committed') throw new Error('not a committed-change result');
    const json = JSON.parse(read('commit-demo', 'committed.json'));
    expect([json.lengthChange, json.volumeChange, json.yearsToSteady]).toEqual([browser.committed.lengthChange, browser.committed.volumeChange, browser.committed.yearsToSteady]);
  });

  it('commit refuses a year that is not an output year (exit 2)', () => {
    file('cirque.json', quorrelCirque());
    expectOneLineFailure(firnline('commit', 'cirque.json', '--from', '20', '--out', 'commit-20'), 2, '--from 20 is not an output year');
    expectOneLineFailure(firnline('commit', 'cirque.json', '--out', 'commit-20'), 2, 'commit needs --from');
  });

  it('sensitivity --from 0 --to 1 --step 0.5 writes the analysis worker\'s points as CSV, byte for byte, and the figure', () => {
    const result = firnline('sensitivity', file('cirque.json', quorrelCirque()), '--from', '0', '--to', '1', '--step', '0.5', '--out', 'sens');
    expect(result.status, result.stderr).toBe(0);
    expect(result.stdout).toMatch(/^firnline: 5 steady states from 0 to 1 K and back/);
    const browser = runToEnd(analysisSteps({ kind: 'sensitivity', scenario: checkedJson(quorrelCirque()), from: 0, to: 1, step: 0.5 }));
    if (browser.kind !== 'sensitivity') throw new Error('not a sensitivity result');
    expect(read('sens', 'sensitivity.csv')).toBe(sensitivityCsv(browser.points));
    expect(read('sens', 'sensitivity.csv').split('\n')[0]).toBe('warming_K,branch,terminus_m,length_m,volume_m3,years_to_steady,converged');
    const svg = read('sens', 'sensitivity.svg');
    expect(svg).toContain('Cooling back');
    expect(svg).toContain('Warming held (K)');
  });

  it('sensitivity refuses the ranges the browser refuses (exit 2)', () => {
    file('cirque.json', quorrelCirque());
    expectOneLineFailure(firnline('sensitivity', 'cirque.json', '--from', '0', '--to', '1', '--step', '0.3', '--out', 's'), 2, 'whole steps');
    expectOneLineFailure(firnline('sensitivity', 'cirque.json', '--from', '0', '--to', '12', '--step', '1', '--out', 's'), 2, 'from -10 to 10 K');
    expectOneLineFailure(firnline('sensitivity', 'cirque.json', '--from', '0', '--step', '1', '--out', 's'), 2, '--to is missing');
  });
});
