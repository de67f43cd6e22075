/**
 * `firnline invert` as a user runs it (the built bundle as a child process): inputs the inversion
 * cannot start from give exit 2 naming the key; a good survey writes scenario.json (a valid
 * scenario), inversion.csv and inversion.json.
 */
import { existsSync, mkdtempSync, readFileSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { csvParse } from 'd3';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CAUTION_TEXT } from '../../src/outputs/caution';
import { validateScenario } from '../../src/scenario/validateScenario';
import { ensureFreshBundles, ROOT, runFirnline, expectOneLineFailure } from '../helpers/cliBundle';

const EXAMPLE = join(ROOT, 'examples/zindleton-survey.json');
const example = () => JSON.parse(readFileSync(EXAMPLE, 'utf8'));
const INVERSION_COLUMNS = 'x_m,surface_m,thickness_m,bed_m,flux_m3_a,slope,thickness_low_m,thickness_high_m';

/**
 * Until the real inversion lands, src/model/inversion/invertBed.ts is a stub whose functions
 * throw 'not yet'; the tests that need its numbers are skipped while it is, and run as soon as the
 * real module replaces it.
 */
const INVERSION_IS_STUB = readFileSync(join(ROOT, 'src/model/inversion/invertBed.ts'), 'utf8').includes("throw new Error('not yet')");

let work: string;
const firnline = (...args: string[]) => runFirnline(work, args);

function inputFile(name: string, content: unknown): string {
  writeFileSync(join(work, name), JSON.stringify(content, null, 2));
  return name;
}

beforeAll(() => {
  ensureFreshBundles();
  work = mkdtempSync(join(tmpdir(), 'firnline-invert-'));
}, 60_000);

afterAll(() => {
  if (work) rmSync(work, { recursive: true, force: true });
});

describe('firnline invert: input the inversion cannot start from (exit 2, the key named)', () => {
  const cases: [string, (s: ReturnType<typeof example>) => void, ...string[]][] = [
    ['no surface', (s) => delete s.surface, 'invalid scenario: /surface: this required key is missing', 'observed ice surface'],
    ['no terminus', (s) => delete s.observations.terminus, 'invalid scenario: /observations/terminus: this required key is missing'],
    ['no observations', (s) => delete s.observations, 'invalid scenario: /observations: this required key is missing'],
    ['a terminus outside the domain', (s) => (s.observations.terminus = 12500), '/observations/terminus: 12500 is not allowed', 'within the domain, from 0 to 12,000 m'],
    ['a terminus record outside the domain', (s) => (s.observations.terminus[0][1] = 13000), '/observations/terminus/0/1: 13000 is not allowed'],
    ['a flat surface', (s) => (s.surface = [[0, 2500], [12000, 2500]]), '/surface: the surface does not fall from the head', 'cannot carry it'],
    ['a surface rising down-valley', (s) => (s.surface = [[0, 2000], [12000, 2600]]), '/surface: the surface does not fall'],
    ['a surface short of the domain', (s) => (s.surface = s.surface.slice(0, -1)), '/surface/9/0: 11000 is not allowed', 'reach the end of the domain'],
    ['a zero uncertainty', (s) => (s.observations.thickness[1][2] = 0), '/observations/thickness/1/2: 0 is not allowed', 'a zero uncertainty cannot weight a fit'],
    ['a duplicated radar position', (s) => (s.observations.thickness[2][0] = 3000), '/observations/thickness/2/0: 3000 is not allowed', 'greater than the x of the one before it'],
    ['an unknown key', (s) => (s.observations.radar = []), '/observations/radar', 'unknown key "radar"'],
  ];
  it.each(cases)('%s', (what, mutate, ...fragments) => {
    const s = example();
    mutate(s);
    const out = `bad-${what.replace(/\W+/g, '-')}`;
    const result = firnline('invert', inputFile(`${out}.json`, s), '--out', out);
    expectOneLineFailure(result, 2, ...fragments);
    // Refused before anything is made.
    expect(existsSync(join(work, out))).toBe(false);
  });

  it('refuses missing or unknown arguments', () => {
    expectOneLineFailure(firnline('invert', EXAMPLE), 2, 'invert needs --out <dir>');
    expectOneLineFailure(firnline('invert', '--out', 'x'), 2, 'invert needs a scenario file');
    expectOneLineFailure(firnline('invert', EXAMPLE, '--out', 'x', '--figures'), 2, 'unknown option "--figures" for invert');
    expectOneLineFailure(firnline('invert', 'no-such-survey.json', '--out', 'x'), 2, 'no-such-survey.json', 'no such file');
  });

  it('is listed in the help with every file it writes', () => {
    const help = firnline('--help');
    expect(help.status).toBe(0);
    expect(help.stdout).toContain('firnline invert <scenario.json> --out <dir>');
    for (const name of ['scenario.json', 'inversion.csv', 'inversion.json']) expect(help.stdout).toContain(name);
    for (const column of INVERSION_COLUMNS.split(',')) expect(help.stdout).toContain(column);
  });
});

// NEEDS THE REAL INVERSION (src/model/inversion/invertBed.ts): skipped while that file is the stub.
describe.skipIf(INVERSION_IS_STUB)('firnline invert on the example survey (needs the real inversion)', () => {
  let result: ReturnType<typeof firnline>;
  beforeAll(() => {
    result = firnline('invert', EXAMPLE, '--out', 'survey-out', '--quiet');
  }, 120_000);

  it('succeeds with one line on stdout and writes the three files', () => {
    expect(result.status, result.stderr).toBe(0);
    expect(result.stderr).toBe('');
    expect(result.stdout.trim().split('\n')).toHaveLength(1);
    expect(result.stdout).toContain('wrote scenario.json, inversion.csv and inversion.json to survey-out');
    expect(readdirSync(join(work, 'survey-out')).sort()).toEqual(['inversion.csv', 'inversion.json', 'scenario.json']);
  });

  it('writes a complete scenario that the one validator accepts and the command line runs', () => {
    const written = JSON.parse(readFileSync(join(work, 'survey-out/scenario.json'), 'utf8'));
    const checked = validateScenario(written);
    expect(checked.ok).toBe(true);
    expect(written.bed.length).toBeGreaterThanOrEqual(2);
    expect(written.observations).toEqual(example().observations);
    expect(firnline('check', 'survey-out/scenario.json').status).toBe(0);
  });

  it('writes inversion.csv with one row per cell, bed = surface - thickness, no thickness beyond the terminus', () => {
    const text = readFileSync(join(work, 'survey-out/inversion.csv'), 'utf8');
    expect(text.split('\n')[0]).toBe(INVERSION_COLUMNS);
    expect(text).not.toMatch(/\r|#|NaN|Infinity/);
    const rows = csvParse(text);
    expect(rows).toHaveLength(120);
    const summary = JSON.parse(readFileSync(join(work, 'survey-out/inversion.json'), 'utf8'));
    for (const r of rows) {
      const [x, s, h, b] = [r.x_m, r.surface_m, r.thickness_m, r.bed_m].map(Number);
      expect(Math.abs(s - h - b)).toBeLessThanOrEqual(1e-6 * Math.max(1, Math.abs(s)));
      expect(h).toBeGreaterThanOrEqual(0);
      if (x > summary.terminus_m) expect(h).toBe(0);
      expect(Number(r.thickness_low_m)).toBeLessThanOrEqual(Number(r.thickness_high_m));
    }
  });

  it('writes inversion.json with the terminus, the multiplier, the misfit, the statements and the caution', () => {
    const summary = JSON.parse(readFileSync(join(work, 'survey-out/inversion.json'), 'utf8'));
    expect(summary.format).toBe('firnline-inversion');
    expect(summary.version).toBe(1);
    expect(summary.firnlineVersion).toBe(JSON.parse(readFileSync(join(ROOT, 'package.json'), 'utf8')).version);
    expect(summary.scenarioName).toBe(example().name);
    expect(summary.terminus_m).toBeGreaterThan(0);
    expect(summary.terminus_m).toBeLessThanOrEqual(12000);
    expect(summary.rateFactorMultiplier).toBeGreaterThan(0);
    // The example has five radar points: the misfit is reported.
    expect(summary.misfit.count).toBe(5);
    expect(Array.isArray(summary.statements)).toBe(true);
    expect(summary.statements.length).toBeGreaterThan(0);
    expect(summary.caution).toBe(CAUTION_TEXT);
  });
});
