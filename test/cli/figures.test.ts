/**
 * `firnline run --figures` writes the standard SVG figures beside the CSV files, byte-identical to
 * the figures the same code draws in-process (which is what the browser calls), and draws a lake
 * where the demo's retreat uncovers its overdeepening.
 */
import { mkdtempSync, readFileSync, rmSync, writeFileSync, readdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import pkg from '../../package.json';
import { figureRunFromReport } from '../../src/figures/figureRun';
import { lakesAt, lakeLabel } from '../../src/figures/lakesMarkup';
import { runFigures } from '../../src/figures/runFigures';
import { runScenario } from '../../src/model/runScenario';
import { ensureFreshBundles, ROOT, runFirnline } from '../helpers/cliBundle';
import { quorrelCirque } from '../helpers/quorrelCirque';
import { parseSvg, scenarioOf, textsOf } from '../figures/figureFixtures';

let work: string;
beforeAll(() => {
  ensureFreshBundles();
  work = mkdtempSync(join(tmpdir(), 'firnline-figures-'));
});
afterAll(() => rmSync(work, { recursive: true, force: true }));

describe('firnline run --figures', () => {
  it('writes the four figures, identical to the in-process figures of the same scenario', () => {
    const json = quorrelCirque();
    writeFileSync(join(work, 'cirque.json'), JSON.stringify(json));
    const result = runFirnline(work, ['run', 'cirque.json', '--out', 'out', '--figures', '--quiet']);
    expect(result.stderr).toBe('');
    expect(result.status).toBe(0);
    const written = readdirSync(join(work, 'out')).sort();
    // Outputs at 0, 15, 30, 45 and 50 a: snapshots every 10 a (a round interval giving at most seven), final year 50;
    // the browser names the same figures "<scenario>_profile-year-50.svg" and so on (exportActions.ts).
    const figures = ['profile-snapshots-every-10a.svg', 'profile-year-50.svg', 'along-flow-year-50.svg', 'time-series.svg'];
    expect(written).toEqual([...figures, 'lakes.json', 'profiles.csv', 'series.csv', 'summary.json'].sort());
    const scenario = scenarioOf(json);
    const expected = runFigures(figureRunFromReport(runScenario(scenario), scenario, pkg.version));
    for (const figure of expected) expect(readFileSync(join(work, 'out', figure.fileName), 'utf8')).toBe(figure.svg);
  });

  it('without --figures writes no figures', () => {
    writeFileSync(join(work, 'plain.json'), JSON.stringify(quorrelCirque()));
    expect(runFirnline(work, ['run', 'plain.json', '--out', 'plain', '-q']).status).toBe(0);
    expect(readdirSync(join(work, 'plain')).filter((f) => f.endsWith('.svg'))).toEqual([]);
  });

  it('draws the lake the demo uncovers by year 300, labelled with the analysis numbers', () => {
    const demo = JSON.parse(readFileSync(join(ROOT, 'examples/demo-valley.json'), 'utf8'));
    const result = runFirnline(work, ['run', join(ROOT, 'examples/demo-valley.json'), '--out', 'demo', '--figures', '-q']);
    expect(result.status).toBe(0);
    const doc = parseSvg(readFileSync(join(work, 'demo', 'profile-year-300.svg'), 'utf8'));
    const scenario = scenarioOf(demo);
    const run = figureRunFromReport(runScenario(scenario), scenario, pkg.version);
    const lakes = lakesAt(run.grid, run.frames[run.frames.length - 1]);
    expect(lakes.length).toBeGreaterThan(0);
    expect(doc.querySelectorAll('g.lake')).toHaveLength(lakes.length);
    // Superscripts are raised tspans: the text content reads "10" + "6".
    const expectedLabel = lakeLabel(lakes[0], false).replace('⁶', '6').replace('³', '3');
    expect(textsOf(doc)).toContain(expectedLabel);
  });
});
