/**
 * The live steady-glacier preview states what the command line computes: for the demo, the
 * terminus and volume of year 0 in series.csv (after the spin-up, as a user runs `firnline run`)
 * equal the preview's steadyGlacierSteps of the same scenario.
 */
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { csvParse } from 'd3';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { runToEnd } from '../../src/model/analysis/stepwise';
import { steadyGlacierSteps } from '../../src/model/steadyGlacier';
import { checkedJson } from '../helpers/checkedScenario';
import { ensureFreshBundles, ROOT, runFirnline } from '../helpers/cliBundle';

let work: string;

beforeAll(() => {
  ensureFreshBundles();
  work = mkdtempSync(join(tmpdir(), 'firnline-steady-'));
}, 120_000);

afterAll(() => {
  if (work) rmSync(work, { recursive: true, force: true });
});

describe('steady-glacier preview against firnline run', () => {
  it('gives the terminus and volume the command line writes for year 0 of the demo', () => {
    const demo = JSON.parse(readFileSync(join(ROOT, 'examples/demo-valley.json'), 'utf8'));
    const short = { ...demo, run: { years: 5, outputEvery: 5 } };
    writeFileSync(join(work, 'demo.json'), JSON.stringify(short));
    const result = runFirnline(work, ['run', 'demo.json', '--out', 'out', '--quiet']);
    expect(result.status, result.stderr).toBe(0);
    const year0 = csvParse(readFileSync(join(work, 'out', 'series.csv'), 'utf8'))[0];
    const glacier = runToEnd(steadyGlacierSteps(checkedJson(short)));
    expect(Number(year0.t_yr)).toBe(0);
    expect(Number(year0.terminus_m)).toBe(glacier.terminus);
    // series.csv writes the volume unrounded (docs/command-line.md).
    expect(Number(year0.volume_m3)).toBe(glacier.volume);
  });
});
