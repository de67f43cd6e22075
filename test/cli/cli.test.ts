/**
 * The built command line, run as a child process exactly as a user runs it: files written,
 * exit codes, one-line messages on stderr naming the key, and no stack traces.
 */
import { mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, relative } from 'node:path';
import { csvParse } from 'd3';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { progressLine } from '../../src/cli/progress';
import { CAUTION_TEXT } from '../../src/outputs/caution';
import { quorrelCirque } from '../helpers/quorrelCirque';
import { ensureFreshBundles, ROOT, runFirnline, expectOneLineFailure } from '../helpers/cliBundle';

const DEMO = join(ROOT, 'examples/demo-valley.json');

const PROFILES_COLUMNS =
  't_yr,x_m,bed_m,surface_m,thickness_m,width_m,surface_width_m,u_surface_m_a,u_sliding_m_a,tau_d_kPa,strain_rate_a,crevasse_depth_m,balance_mwe_a';
const SERIES_COLUMNS = 't_yr,volume_m3,area_m2,length_m,terminus_m,ela_m,aar,max_thickness_m,max_u_surface_m_a,warming_K,frontal_ablation_m3_a';


let work: string;

const firnline = (...args: string[]) => runFirnline(work, args);

/** Writes a scenario into the work directory and returns its file name. */
function scenarioFile(name: string, content: unknown): string {
  writeFileSync(join(work, name), typeof content === 'string' ? content : JSON.stringify(content, null, 2));
  return name;
}

const cirque = () => quorrelCirque();

function readOutputs(dir: string) {
  const full = join(work, dir);
  const profilesText = readFileSync(join(full, 'profiles.csv'), 'utf8');
  const seriesText = readFileSync(join(full, 'series.csv'), 'utf8');
  return {
    profilesText,
    seriesText,
    profiles: csvParse(profilesText),
    series: csvParse(seriesText),
    summary: JSON.parse(readFileSync(join(full, 'summary.json'), 'utf8')),
  };
}

beforeAll(() => {
  ensureFreshBundles();
  work = mkdtempSync(join(tmpdir(), 'firnline-cli-'));
}, 60_000);

afterAll(() => {
  if (work) rmSync(work, { recursive: true, force: true });
});

describe('firnline run on the demo valley', () => {
  let run: ReturnType<typeof firnline>;
  let out: ReturnType<typeof readOutputs>;

  beforeAll(() => {
    run = firnline('run', DEMO, '--out', 'demo-out', '--quiet');
    out = readOutputs('demo-out');
  }, 120_000);

  it('succeeds quietly and says where the files are', () => {
    expect(run.status, run.stderr).toBe(0);
    expect(run.stderr).toBe('');
    expect(run.stdout.trim().split('\n')).toHaveLength(1);
    expect(run.stdout).toContain('demo-out');
    expect(run.stdout).toMatch(/length [\d.]+ m/);
    expect(run.stdout).toMatch(/relative residual \d/);
    expect(run.stdout).toContain('0 warnings');
  });

  it('writes CSV files with the exact headers and no comment lines', () => {
    expect(out.profilesText.split('\n')[0]).toBe(PROFILES_COLUMNS);
    expect(out.seriesText.split('\n')[0]).toBe(SERIES_COLUMNS);
    for (const text of [out.profilesText, out.seriesText]) {
      expect(text.endsWith('\n')).toBe(true);
      expect(text).not.toMatch(/\r|#|NaN|Infinity/);
    }
  });

  it('has output times 0, 5, ..., 300 and 240 profile rows for each', () => {
    const expectedTimes = Array.from({ length: 61 }, (_, k) => 5 * k);
    expect(out.series.map((r) => Number(r.t_yr))).toEqual(expectedTimes);
    expect(out.summary.outputTimes_yr).toEqual(expectedTimes);
    expect(out.profiles).toHaveLength(240 * 61);
    const perTime = new Map<number, number>();
    for (const r of out.profiles) perTime.set(Number(r.t_yr), (perTime.get(Number(r.t_yr)) ?? 0) + 1);
    expect([...perTime.keys()]).toEqual(expectedTimes);
    expect([...perTime.values()].every((n) => n === 240)).toBe(true);
  });

  it('writes a summary with a closed mass budget, the spin-up and the caution', () => {
    const s = out.summary;
    expect(s.format).toBe('firnline-summary');
    expect(s.version).toBe(1);
    expect(s.firnlineVersion).toBe(JSON.parse(readFileSync(join(ROOT, 'package.json'), 'utf8')).version);
    expect(s.scenarioName).toBe(JSON.parse(readFileSync(DEMO, 'utf8')).name);
    expect(s.massBudget.relativeResidual).toBeLessThanOrEqual(1e-9);
    const { initialVolume, finalVolume, appliedBalance, outflow, residual } = s.massBudget;
    expect(Math.abs(finalVolume - initialVolume - appliedBalance + outflow - residual)).toBeLessThanOrEqual(1e-6 * initialVolume);
    expect(Number(out.series[out.series.length - 1].volume_m3)).toBe(finalVolume);
    expect(s.spinup.years).toBeGreaterThan(0);
    expect(typeof s.spinup.converged).toBe('boolean');
    expect(s.spinup.criterion.length).toBeGreaterThan(0);
    expect(s.steps).toBeGreaterThan(0);
    expect(s.smallestStep_yr).toBeGreaterThan(0);
    expect(s.largestStep_yr).toBeGreaterThanOrEqual(s.smallestStep_yr);
    expect(s.warnings).toEqual([]);
    expect(s.caution).toBe(CAUTION_TEXT);
    expect(s.caution).toMatch(/not a hazard assessment/);
  });

  it('profile volumes add up to the series volumes', () => {
    // Volume = sum of width * thickness * spacing (50 m), within the 7-figure rounding of the profile fields.
    const volumeAt = new Map<number, number>();
    for (const r of out.profiles) {
      const t = Number(r.t_yr);
      volumeAt.set(t, (volumeAt.get(t) ?? 0) + Number(r.width_m) * Number(r.thickness_m) * 50);
    }
    for (const r of out.series) {
      const v = Number(r.volume_m3);
      expect(Math.abs(volumeAt.get(Number(r.t_yr))! - v)).toBeLessThanOrEqual(1e-6 * v);
    }
  });
});

describe('firnline run on a small scenario', () => {
  it('year-to-year weather: the same seed writes byte-identical outputs, another seed other ones', () => {
    const windy = (seed: number) => quorrelCirque({ variability: { temperatureSd: 0.8, precipitationSd: 0.15, seed, ar1: 0.3 } });
    const file = scenarioFile('windy.json', windy(5));
    expect(firnline('run', file, '--out', 'windy-a', '--quiet').status).toBe(0);
    expect(firnline('run', file, '--out', 'windy-b', '--quiet').status).toBe(0);
    const other = scenarioFile('windy-other.json', windy(6));
    expect(firnline('run', other, '--out', 'windy-c', '--quiet').status).toBe(0);
    const a = readOutputs('windy-a');
    const b = readOutputs('windy-b');
    const c = readOutputs('windy-c');
    expect(b.profilesText).toBe(a.profilesText);
    expect(b.seriesText).toBe(a.seriesText);
    expect(JSON.stringify(b.summary)).toBe(JSON.stringify(a.summary));
    expect(c.seriesText).not.toBe(a.seriesText);
    // The weather shows in the warming column (year 0 has none).
    expect(a.series.map((r) => Number(r.warming_K)).filter((w) => w !== 0).length).toBe(a.series.length - 1);
  });

  it('always writes the final year, and a --out that is a file is refused', () => {
    const file = scenarioFile('cirque.json', cirque());
    const result = firnline('run', file, '--out', 'nested/cirque-out');
    expect(result.status, result.stderr).toBe(0);
    expect(result.stderr).toBe(''); // not a terminal, no warnings: nothing to say
    const out = readOutputs('nested/cirque-out');
    expect(out.series.map((r) => Number(r.t_yr))).toEqual([0, 15, 30, 45, 50]);
    expect(out.profiles).toHaveLength(30 * 5);
    expect(out.summary.spinup).toBeUndefined();
    expect(readdirSync(join(work, 'nested/cirque-out')).sort()).toEqual(['lakes.json', 'profiles.csv', 'series.csv', 'summary.json']);

    expectOneLineFailure(firnline('run', file, '--out', file), 2, '--out', 'not a directory');
  });

  it('prints warnings on stderr unless --quiet, and counts them', () => {
    const s = cirque();
    s.ice = { n: 3, A: 1e-21 }; // valid but outside the usual range: a warning naming /ice/A
    const file = scenarioFile('soft.json', s);
    const loud = firnline('run', file, '--out', 'soft-out');
    expect(loud.status, loud.stderr).toBe(0);
    expect(loud.stderr).toMatch(/^warning: \/ice\/A: /m);
    expect(loud.stderr).not.toContain('\r'); // no progress line when stderr is not a terminal
    const count = Number(/(\d+) warnings?/.exec(loud.stdout)?.[1]);
    expect(count).toBeGreaterThanOrEqual(1);
    expect(JSON.parse(readFileSync(join(work, 'soft-out/summary.json'), 'utf8')).warnings).toHaveLength(count);

    const quiet = firnline('run', file, '--out', 'soft-out', '-q');
    expect(quiet.status).toBe(0);
    expect(quiet.stderr).toBe('');
  });
});

describe('firnline check', () => {
  it('accepts the demo', () => {
    const result = firnline('check', DEMO);
    expect(result.status, result.stderr).toBe(0);
    expect(result.stdout).toBe('ok\n');
    expect(result.stderr).toBe('');
  });

  it('lists warnings after "ok"', () => {
    const s = cirque();
    s.ice = { n: 3, A: 1e-21 };
    const result = firnline('check', scenarioFile('check-soft.json', s));
    expect(result.status).toBe(0);
    const lines = result.stdout.trim().split('\n');
    expect(lines[0]).toBe('ok');
    expect(lines.slice(1).every((l) => /^warning: \/\S*: ./.test(l))).toBe(true);
    expect(lines.some((l) => l.startsWith('warning: /ice/A: '))).toBe(true);
  });

  it('reads the old key massBalance.gradient as ablationGradient with a warning, and refuses both together', () => {
    const s = cirque();
    const mb = s.massBalance as Record<string, unknown>;
    const old = { model: mb.model, ela: mb.ela, gradient: mb.ablationGradient };
    const result = firnline('check', scenarioFile('old-key.json', { ...s, massBalance: old }));
    expect(result.status, result.stderr).toBe(0);
    expect(result.stdout).toMatch(/^ok\nwarning: \/massBalance\/ablationGradient: \/massBalance\/gradient is the old name of \/massBalance\/ablationGradient/);
    const both = firnline('check', scenarioFile('both-keys.json', { ...s, massBalance: { ...old, ablationGradient: 0.005 } }));
    expectOneLineFailure(both, 2, 'invalid scenario', '/massBalance/gradient', '/massBalance/ablationGradient');
  });

  it('names an unknown key', () => {
    const s = cirque();
    (s.grid as Record<string, unknown>).spcing = 100;
    const result = firnline('check', scenarioFile('unknown-key.json', s));
    expectOneLineFailure(result, 2, 'firnline: invalid scenario: ', '/grid/spcing', 'spcing');
  });

  it('names a negative spacing', () => {
    const s = cirque();
    s.grid = { length: 3000, spacing: -100 };
    expectOneLineFailure(firnline('check', scenarioFile('negative.json', s)), 2, 'invalid scenario', '/grid/spacing');
  });

  it('gives the line of a JSON syntax error', () => {
    const text = JSON.stringify(cirque(), null, 2).replace('"version": 1,', '"version": 1,,');
    expectOneLineFailure(firnline('check', scenarioFile('broken.json', text)), 2, 'invalid scenario', 'line 3');
  });

  it('lists several errors, the first on a line of its own', () => {
    const s = cirque();
    s.grid = { length: 3000, spacing: -100 };
    s.run = { years: -5, outputEvery: 15 };
    const result = firnline('check', scenarioFile('two-errors.json', s));
    expectOneLineFailure(result, 2, 'firnline: invalid scenario: /');
    const lines = result.stderr.trim().split('\n');
    expect(lines.length).toBeGreaterThanOrEqual(2);
    expect(lines.slice(1).every((l) => l.startsWith('  /'))).toBe(true);
  });

  it('reports a missing file or a directory', () => {
    expectOneLineFailure(firnline('check', 'no-such-scenario.json'), 2, 'no-such-scenario.json', 'no such file');
    expectOneLineFailure(firnline('run', relative(work, ROOT), '--out', 'x'), 2, 'directory');
  });
});

describe('failures of the run itself', () => {
  it('exits 3 with the model year and position when the time step collapses', () => {
    // A = 1e-20 Pa^-3 s^-1 (the largest the format accepts for n = 3) on a 1:2 slope under 1 km
    // of ice: deformation of order 1e5 m/a, so the stable explicit step falls below 1e-7 a.
    const s = cirque();
    s.bed = [[0, 3000], [3000, 1500]];
    s.surface = [[0, 4000], [3000, 2500]];
    s.ice = { n: 3, A: 1e-20 };
    // The explicit scheme's stability limit collapses; the implicit default takes this in its stride.
    s.numerics = { scheme: 'explicit' };
    const result = firnline('run', scenarioFile('runaway.json', s), '--out', 'runaway-out', '--quiet');
    expectOneLineFailure(result, 3, 'numerical failure', 'model year', 'x = ');
    expect(result.stderr.trim().split('\n')).toHaveLength(1);
  });
});

describe('arguments', () => {
  it('shows the usage for --help and -h', () => {
    for (const flag of ['--help', '-h']) {
      const result = firnline(flag);
      expect(result.status).toBe(0);
      expect(result.stdout).toContain('firnline run <scenario.json> --out <dir>');
      expect(result.stdout).toContain('firnline check <scenario.json>');
    }
  });

  it('prints the version', () => {
    const result = firnline('--version');
    expect(result.status).toBe(0);
    expect(result.stdout.trim()).toBe(`firnline ${JSON.parse(readFileSync(join(ROOT, 'package.json'), 'utf8')).version}`);
  });

  it('exits 2 with the usage when no command is given', () => {
    const result = firnline();
    expectOneLineFailure(result, 2, 'no command');
    expect(result.stderr).toContain('Usage:');
  });

  it('exits 2 with one line for bad arguments', () => {
    expectOneLineFailure(firnline('simulate', DEMO), 2, 'unknown command "simulate"');
    expectOneLineFailure(firnline('run', DEMO), 2, '--out');
    expectOneLineFailure(firnline('run', DEMO, '--out'), 2, '--out');
    expectOneLineFailure(firnline('run', DEMO, '--out', 'a', '--fast'), 2, '--fast');
    expectOneLineFailure(firnline('check'), 2, 'scenario file');
    expectOneLineFailure(firnline('check', DEMO, DEMO), 2, 'one scenario file');
  });
});

describe('progress line', () => {
  // Child processes never have a terminal, so the line itself is checked in-process.
  function recorder(enabled: boolean) {
    let text = '';
    let clock = 0;
    const line = progressLine((t) => (text += t), enabled, () => clock);
    return { line, text: () => text, tick: (ms: number) => (clock += ms) };
  }

  it('rewrites one line with \r, pads over longer text and ends with one newline', () => {
    const r = recorder(true);
    r.line.update({ phase: 'spinup', year: 12340, of: 20000 });
    r.tick(1000);
    r.line.update({ phase: 'run', year: 5, of: 300 });
    r.line.update({ phase: 'run', year: 10, of: 300 }); // within the redraw interval: skipped
    r.line.update({ phase: 'run', year: 300, of: 300 }); // the last year is always drawn
    r.line.finish();
    r.line.finish();
    const parts = r.text().split('\r').slice(1);
    expect(parts).toHaveLength(3);
    expect(parts[0]).toContain('spin-up: model year 12,340');
    expect(parts[1]).toMatch(/^run: year 5 of 300 +$/);
    expect(parts[1].length).toBe(parts[0].length); // padded to wipe the longer spin-up text
    // Longer than the visible "run: year 5 of 300", so no padding is needed.
    expect(parts[2]).toBe('run: year 300 of 300\n');
    expect(r.text().match(/\n/g)).toHaveLength(1);
  });

  it('writes nothing when disabled', () => {
    const r = recorder(false);
    r.line.update({ phase: 'run', year: 300, of: 300 });
    r.line.finish();
    expect(r.text()).toBe('');
  });
});
