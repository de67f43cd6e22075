/**
 * `firnline run` writes lakes.json beside summary.json: per output year the lakes in exposed
 * overdeepenings, with the lake caution. Run as a child process, as a user runs it.
 */
import { existsSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { LAKE_CAUTION_TEXT } from '../../src/outputs/caution';
import { ensureFreshBundles, ROOT, runFirnline } from '../helpers/cliBundle';

let work: string;

beforeAll(() => {
  ensureFreshBundles();
  work = mkdtempSync(join(tmpdir(), 'firnline-lakes-'));
}, 120_000);

afterAll(() => {
  if (work) rmSync(work, { recursive: true, force: true });
});

describe('lakes.json from firnline run', () => {
  it('lists, for every output year, the lake the demo exposes behind its riegel, with the caution', () => {
    const demo = JSON.parse(readFileSync(join(ROOT, 'examples/demo-valley.json'), 'utf8'));
    // The demo warmed by 3 K over 80 years, outputs every 50 years to year 200.
    writeFileSync(join(work, 'warm.json'), JSON.stringify({ ...demo, warming: [[0, 0], [80, 3]], run: { years: 200, outputEvery: 50 } }));
    const result = runFirnline(work, ['run', 'warm.json', '--out', 'out', '--quiet']);
    expect(result.status, result.stderr).toBe(0);
    expect(result.stdout).toMatch(/^firnline: wrote profiles\.csv, series\.csv, summary\.json and lakes\.json to out;/);
    // Written through a temporary name, which is gone afterwards.
    expect(readdirSync(join(work, 'out')).sort()).toEqual(['lakes.json', 'profiles.csv', 'series.csv', 'summary.json']);

    const lakes = JSON.parse(readFileSync(join(work, 'out', 'lakes.json'), 'utf8'));
    expect(lakes).toMatchObject({ format: 'firnline-lakes', version: 1, caution: LAKE_CAUTION_TEXT });
    expect(lakes.caution).toMatch(/hazard precursor/);
    expect(lakes.caution).toMatch(/local authorities/);
    expect(lakes.units.volume_m3).toMatch(/^m\^3/);
    expect(lakes.outputs.map((o: { t_yr: number }) => o.t_yr)).toEqual([0, 50, 100, 150, 200]);
    // Year 0: the spun-up glacier covers the overdeepening.
    expect(lakes.outputs[0].lakes).toEqual([]);
    // Year 200: worked by hand from the demo bed on 50 m cells (test/analysis/exposedLakes.test.ts):
    // lip at the riegel 2469.0625 m, deepest bed 2410 + 60 x 25/700 m at 5925 m, 5300 to 6600 m.
    const last = lakes.outputs[4].lakes.find((l: { start_m: number }) => l.start_m > 5000);
    expect(last).toMatchObject({ start_m: 5300, end_m: 6600, length_m: 1300, deepestAt_m: 5925, touchesIce: false });
    expect(last.waterLevel_m).toBeCloseTo(2469.0625, 9);
    expect(last.maxDepth_m).toBeCloseTo(2469.0625 - (2410 + (60 * 25) / 700), 9);
    expect(last.volume_m3).toBeGreaterThan(0);
    console.info(`lakes.json, demo +3 K at year 200: ${last.maxDepth_m.toFixed(2)} m deep, ${last.volume_m3.toExponential(3)} m^3`);
    expect(existsSync(join(work, 'out', 'lakes.json.partial'))).toBe(false);
  }, 120_000);
});
