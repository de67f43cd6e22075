/**
 * The data archive offered in the browser: the files the command line writes, read back to the
 * same numbers (round trip), a README with the version and the caution, and the same bytes for the
 * same run.
 */
import { strFromU8, unzipSync } from 'fflate';
import { describe, expect, it } from 'vitest';
import { CAUTION_TEXT } from '../../src/outputs/caution';
import { COORDINATE_DIGITS, FIELD_DIGITS, PROFILES_HEADER } from '../../src/outputs/csvWriters';
import { runArchive, type RunArchiveInput } from '../../src/outputs/runArchive';
import { runOutputs } from '../../src/outputs/runOutputs';
import { figureRunFromReport } from '../../src/figures/figureRun';
import { runScenario } from '../../src/model/runScenario';
import { quorrelCirque } from '../helpers/quorrelCirque';
import { scenarioOf } from '../figures/figureFixtures';

const scenario = scenarioOf(quorrelCirque());
const report = runScenario(scenario);
const run = figureRunFromReport(report, scenario, '1.2.3');
const input = (changes: Partial<RunArchiveInput> = {}): RunArchiveInput => ({
  scenario,
  grid: { x: Float64Array.from(run.grid.x), bed: Float64Array.from(run.grid.bed), width: Float64Array.from(run.grid.width) },
  frames: run.frames,
  summary: report.summary,
  validatorWarnings: [],
  firnlineVersion: '1.2.3',
  date: '2026-12-02',
  scenarioFileName: 'Quorrel-cirque-invented.json',
  ...changes,
});

describe('run data archive', () => {
  const files = unzipSync(runArchive(input()));

  it('holds the command line files, byte for byte, plus the scenario and a README', () => {
    const cli = runOutputs(report, { scenario, firnlineVersion: '1.2.3', validatorWarnings: [] });
    expect(Object.keys(files).sort()).toEqual(['Quorrel-cirque-invented.json', 'README.txt', 'profiles.csv', 'series.csv', 'summary.json']);
    expect(strFromU8(files['profiles.csv'])).toBe(cli.profilesCsv);
    expect(strFromU8(files['series.csv'])).toBe(cli.seriesCsv);
    expect(JSON.parse(strFromU8(files['summary.json']))).toEqual(cli.summary);
    expect(scenarioOf(JSON.parse(strFromU8(files['Quorrel-cirque-invented.json'])))).toEqual(scenario);
  });

  it('reads back to the model numbers at the stated precision (round trip)', () => {
    const lines = strFromU8(files['profiles.csv']).trimEnd().split('\n');
    expect(lines[0]).toBe(PROFILES_HEADER.join(','));
    const rows = lines.slice(1).map((l) => l.split(',').map(Number));
    const cells = run.grid.x.length;
    const column = (name: (typeof PROFILES_HEADER)[number]) => PROFILES_HEADER.indexOf(name);
    expect(rows).toHaveLength(cells * run.frames.length);
    run.frames.forEach((frame, k) => {
      for (let i = 0; i < cells; i++) {
        const row = rows[k * cells + i];
        expect(row[0]).toBe(Number(frame.time.toPrecision(COORDINATE_DIGITS)));
        expect(row[1]).toBe(Number(run.grid.x[i].toPrecision(COORDINATE_DIGITS)));
        expect(row[4]).toBe(Number(frame.fields.thickness[i].toPrecision(FIELD_DIGITS)) + 0);
        expect(row[column('surface_width_m')]).toBe(Number(frame.fields.surfaceWidth[i].toPrecision(FIELD_DIGITS)) + 0);
        expect(row[column('u_surface_m_a')]).toBe(Number(frame.fields.surfaceSpeed[i].toPrecision(FIELD_DIGITS)) + 0);
      }
    });
  });

  it('states the version, the date and the caution in the README', () => {
    const readme = strFromU8(files['README.txt']);
    expect(readme).toMatch(/^Firnline 1\.2\.3: data of one model run, exported 2026-12-02\./);
    expect(readme).toContain(CAUTION_TEXT);
  });

  it('gives the same bytes for the same run, and only the chosen years when asked', () => {
    expect(runArchive(input())).toEqual(runArchive(input()));
    const chosen = unzipSync(runArchive(input({ profileYears: [0, 50] })));
    const years = new Set(strFromU8(chosen['profiles.csv']).trimEnd().split('\n').slice(1).map((l) => l.split(',')[0]));
    expect([...years]).toEqual(['0', '50']);
  });
});
