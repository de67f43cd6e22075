/**
 * `firnline run` and `firnline check` with a start from the glacier as it is today (the scenario's
 * `start`): the example examples/brindlack-today.json (invented valley and measurements) runs,
 * and summary.json reports the fitted offset, the match at year 0 and the committed change.
 */
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ensureFreshBundles, ROOT, runFirnline, STACK_FRAME } from '../helpers/cliBundle';

const EXAMPLE = join(ROOT, 'examples/brindlack-today.json');
let work: string;
const firnline = (...args: string[]) => runFirnline(work, args);

beforeAll(() => {
  ensureFreshBundles();
  work = mkdtempSync(join(tmpdir(), 'firnline-today-'));
}, 60_000);

afterAll(() => {
  if (work) rmSync(work, { recursive: true, force: true });
});

describe('firnline run with a transient start (examples/brindlack-today.json)', () => {
  it('fits the climate offset, matches the terminus within a cell and the volume within 3 %, reports the committed change', () => {
    const run = firnline('run', EXAMPLE, '--out', 'today', '--quiet');
    expect(run.status, run.stderr).toBe(0);
    const summary = JSON.parse(readFileSync(join(work, 'today', 'summary.json'), 'utf8'));
    const start = summary.start;
    console.log(
      `brindlack: offset ${start.climateOffset} K after ${start.trials.length} candidates; terminus ${start.terminusModelled} m (observed ${start.terminusObserved}); ` +
        `volume ${start.volumeModelled.toExponential(4)} (observed ${start.volumeObserved.toExponential(4)}); committed ${start.committed.lengthChange} m`,
    );
    expect(start.from).toBe('transient');
    expect(start.fitted).toBe(true);
    expect(start.bracketed).toBe(true);
    expect(Math.abs(start.terminusModelled - start.terminusObserved)).toBeLessThanOrEqual(50);
    expect(Math.abs(start.volumeModelled / start.volumeObserved - 1)).toBeLessThan(0.03);
    expect(start.committed.lengthChange).toBeLessThan(0);
    expect(start.committed.converged).toBe(true);
    expect(summary.units.start).toContain('committed');
    expect(summary.spinup).toBeUndefined();
    expect(summary.outputTimes_yr[0]).toBe(0);
  }, 120_000);
});

describe('firnline check with a start', () => {
  it('accepts the example', () => {
    const result = firnline('check', EXAMPLE);
    expect(result.status, result.stderr).toBe(0);
    expect(result.stdout).toBe('ok\n');
  });

  it('refuses a start together with spinup, naming /spinup', () => {
    const s = JSON.parse(readFileSync(EXAMPLE, 'utf8'));
    s.spinup = true;
    writeFileSync(join(work, 'both.json'), JSON.stringify(s));
    const result = firnline('check', 'both.json');
    expect(result.status).toBe(2);
    expect(result.stderr).not.toMatch(STACK_FRAME);
    expect(result.stderr.split('\n')[0]).toContain('/spinup');
    expect(result.stderr).toContain('exclude each other');
  });

  it('refuses a transient start year at or after the observation year', () => {
    const s = JSON.parse(readFileSync(EXAMPLE, 'utf8'));
    s.start.startYear = 10;
    writeFileSync(join(work, 'late.json'), JSON.stringify(s));
    const result = firnline('check', 'late.json');
    expect(result.status).toBe(2);
    expect(result.stderr).toContain('/start/startYear');
  });
});
