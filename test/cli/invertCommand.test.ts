/**
 * The invert command's own work, in-process with a stand-in inversion (the numbers are not the
 * point here, the files are): it writes scenario.json only when the one validator accepts it,
 * inversion.csv in the CSV conventions of the other outputs, inversion.json with the summary,
 * and refuses (exit 3, nothing written) what the format cannot carry.
 */
import { existsSync, mkdtempSync, readFileSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { csvParse } from 'd3';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CommandFailure } from '../../src/cli/commandFiles';
import { invertCommand, type Inversion } from '../../src/cli/invertCommand';
import type { InversionResult, InversionScenario } from '../../src/model/inversion/invertBed';
import { NumericalFailure } from '../../src/model/numericalFailure';
import { piecewiseLinear } from '../../src/model/piecewiseLinear';
import type { Scenario } from '../../src/model/scenario';
import { CAUTION_TEXT } from '../../src/outputs/caution';
import { validateScenario } from '../../src/scenario/validateScenario';
import { ROOT } from '../helpers/cliBundle';

const EXAMPLE = join(ROOT, 'examples/zindleton-survey.json');

/** A stand-in: a parabolic thickness profile ending at the observed terminus (8500 m). */
function fakeResult(s: InversionScenario, options: { bedOffset?: number } = {}): InversionResult {
  const cells = Math.round(s.grid.length / s.grid.spacing);
  const surfaceAt = piecewiseLinear(s.surface!);
  const terminus = 8500;
  const make = (f: (x: number) => number) => Float64Array.from({ length: cells }, (_, i) => f((i + 0.5) * s.grid.spacing));
  const thickness = make((x) => (x < terminus ? 200 * Math.sqrt(1 - x / terminus) : 0));
  const surface = make(surfaceAt);
  return {
    x: make((x) => x),
    surface,
    thickness,
    bed: surface.map((z, i) => z - thickness[i] + (options.bedOffset ?? 0)),
    flux: make((x) => (x < terminus ? 1e5 * Math.sin((Math.PI * x) / terminus) : 0)),
    slope: make(() => 0.1 / 3),
    thicknessLow: thickness.map((h) => 0.8 * h),
    thicknessHigh: thickness.map((h) => 1.25 * h),
    terminus,
    rateFactorMultiplier: 1.3,
    rateFactorMultiplierRange: [0.9, 1.8],
    misfit: { count: 5, rmsMetres: 12.5, biasMetres: -3.25, weightedRms: 0.8 },
    statements: ['stand-in statement: the glacier is taken to be in balance with the climate'],
  };
}

function fakeScenario(s: InversionScenario, r: InversionResult): Scenario {
  const bed = Array.from(r.x, (x, i): [number, number] => [x, r.bed[i]]);
  return { ...s, bed, ice: { ...s.ice, A: (s.ice.A ?? 2.4e-24) * r.rateFactorMultiplier } };
}

const standIn = (options: { bedOffset?: number } = {}): Inversion => ({
  invertBed: (s) => fakeResult(s, options),
  invertedScenario: fakeScenario,
});

let work: string;
beforeAll(() => {
  work = mkdtempSync(join(tmpdir(), 'firnline-invert-command-'));
});
afterAll(() => {
  if (work) rmSync(work, { recursive: true, force: true });
});

function invert(outName: string, inversion: Inversion, quiet = false) {
  const out: string[] = [];
  const err: string[] = [];
  const outDir = join(work, outName);
  const run = () =>
    invertCommand({ scenarioPath: EXAMPLE, outDir, quiet }, { out: (t) => out.push(t), err: (t) => err.push(t) }, '9.9.9', inversion);
  return { run, outDir, out, err };
}

describe('invertCommand with a stand-in inversion', () => {
  it('writes the three files: a valid scenario, the profile and the summary', () => {
    const { run, outDir, out, err } = invert('good', standIn());
    expect(run()).toBe(0);
    expect(readdirSync(outDir).sort()).toEqual(['inversion.csv', 'inversion.json', 'scenario.json']);

    const written = JSON.parse(readFileSync(join(outDir, 'scenario.json'), 'utf8'));
    const checked = validateScenario(written);
    expect(checked.ok).toBe(true);
    expect(written.bed).toHaveLength(120);
    expect(written.ice.A).toBeCloseTo(2.4e-24 * 1.3, 30);

    const csv = readFileSync(join(outDir, 'inversion.csv'), 'utf8');
    const lines = csv.split('\n');
    expect(lines[0]).toBe('x_m,surface_m,thickness_m,bed_m,flux_m3_a,slope,thickness_low_m,thickness_high_m');
    expect(csv.endsWith('\n')).toBe(true);
    const rows = csvParse(csv);
    expect(rows).toHaveLength(120);
    // Positions to 10 significant figures, fields to 7, as every CSV file of Firnline.
    expect(rows[0].x_m).toBe('50');
    expect(rows[0].slope).toBe('0.03333333');
    expect(rows[0].thickness_m).toBe(String(Number((200 * Math.sqrt(1 - 50 / 8500)).toPrecision(7))));
    expect(rows[119].thickness_m).toBe('0');
    expect(rows[119].flux_m3_a).toBe('0');

    const summary = JSON.parse(readFileSync(join(outDir, 'inversion.json'), 'utf8'));
    expect(summary).toMatchObject({
      format: 'firnline-inversion',
      version: 1,
      firnlineVersion: '9.9.9',
      scenarioName: JSON.parse(readFileSync(EXAMPLE, 'utf8')).name,
      terminus_m: 8500,
      maxThickness_m: 200 * Math.sqrt(1 - 50 / 8500),
      rateFactorMultiplier: 1.3,
      rateFactorMultiplierRange: [0.9, 1.8],
      misfit: { count: 5, rmsMetres: 12.5, biasMetres: -3.25, weightedRms: 0.8 },
      statements: ['stand-in statement: the glacier is taken to be in balance with the climate'],
      caution: CAUTION_TEXT,
    });
    // The stand-in's bed points are the cell centres, which do not reach x = 0 and 12,000 m: a
    // warning of the written scenario, printed and kept in the summary.
    expect(summary.warnings, JSON.stringify(summary.warnings)).toHaveLength(1);
    expect(summary.warnings[0]).toMatch(/^\/bed: the bed points cover x = 50 to 11,950 m/);
    expect(err.join('')).toMatch(/^warning: \/bed: /m);
    expect(out.join('')).toMatch(
      /^firnline: wrote scenario\.json, inversion\.csv and inversion\.json to .*good; terminus 8500 m, largest thickness 199\.4 m, rate-factor multiplier 1\.3 \(0\.9 to 1\.8\), misfit to 5 radar points: rms 12\.5 m; 1 warning\n$/,
    );
  });

  it('says when the multiplier was not fitted and writes null for what there is not', () => {
    const inversion: Inversion = {
      invertBed: (s) => ({ ...fakeResult(s), rateFactorMultiplier: 1, rateFactorMultiplierRange: undefined, misfit: undefined }),
      invertedScenario: fakeScenario,
    };
    const { run, outDir, out, err } = invert('unfitted', inversion, true);
    expect(run()).toBe(0);
    expect(err).toEqual([]);
    expect(out.join('')).toContain('rate-factor multiplier 1 (not fitted); 1 warning');
    const summary = JSON.parse(readFileSync(join(outDir, 'inversion.json'), 'utf8'));
    expect(summary.rateFactorMultiplierRange).toBeNull();
    expect(summary.misfit).toBeNull();
  });

  it('refuses an inverted scenario the format cannot carry (exit 3) and writes nothing', () => {
    // A bed 20 km down: below the format's -1000 m.
    const { run, outDir } = invert('too-deep', standIn({ bedOffset: -20000 }));
    let failure: unknown;
    try {
      run();
    } catch (error) {
      failure = error;
    }
    expect(failure).toBeInstanceOf(CommandFailure);
    expect((failure as CommandFailure).exitCode).toBe(3);
    expect((failure as CommandFailure).message).toMatch(/^the inverted scenario is not a valid scenario, so no files were written: \/bed\/0\/1: /);
    expect(existsSync(outDir) ? readdirSync(outDir) : []).toEqual([]);
  });

  it('words a numerical failure of the inversion (exit 3) and writes nothing', () => {
    const inversion: Inversion = {
      invertBed: () => {
        throw new NumericalFailure('the thickness is not finite', 0, 4250);
      },
      invertedScenario: fakeScenario,
    };
    const { run, outDir } = invert('failed', inversion);
    expect(run).toThrow(CommandFailure);
    try {
      run();
    } catch (error) {
      expect((error as CommandFailure).exitCode).toBe(3);
      expect((error as CommandFailure).message).toBe(
        'numerical failure in the inversion (x = 4250 m): the thickness is not finite; no files were written',
      );
    }
    expect(readdirSync(outDir)).toEqual([]);
  });
});
