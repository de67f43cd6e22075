/**
 * Uncertainty ensembles: the seeded generator, the normal distribution against table values,
 * the Latin hypercube's stratification (McKay, Beckman & Conover 1979), the distributions, the
 * validation of the "ensemble" block and its members, and the percentile definition (Hyndman &
 * Fan 1996, definition 7) against hand-worked examples.
 */
import { describe, expect, it } from 'vitest';
import { distributionQuantile, drawEnsemble, latinHypercube, type Ensemble } from '../../src/experiment/ensemble';
import { normalCdf, normalQuantile } from '../../src/experiment/normalDistribution';
import { randomIndex, xoshiro128ss } from '../../src/experiment/random';
import { validateExperiment } from '../../src/experiment/validateExperiment';
import { percentileBand } from '../../src/chart/spreadBand';
import { halfVolumeLostYear, percentiles, percentilesCsv } from '../../src/outputs/ensemblePercentiles';

function base(): Record<string, unknown> {
  return {
    format: 'firnline-scenario',
    version: 1,
    grid: { length: 3000, spacing: 100 },
    bed: [[0, 3000], [3000, 2500]],
    ice: { n: 3, A: 2.4e-24 },
    sliding: { C: 0, m: 3 },
    massBalance: { model: 'linear', ela: 2880, ablationGradient: 0.007 },
    run: { years: 20, outputEvery: 10 },
  };
}

const ensemble = (extra: Record<string, unknown> = {}): Record<string, unknown> => ({
  members: 8,
  seed: 7,
  parameters: {
    '/ice/A': { distribution: 'lognormal', median: 2.4e-24, sigma: 0.3 },
    '/massBalance/ela': { distribution: 'normal', mean: 2880, sd: 30, min: 2830, max: 2930 },
    '/sliding/C': { distribution: 'uniform', min: 0, max: 1e-14 },
  },
  ...extra,
});

const experiment = (extra: Record<string, unknown> = {}) => ({ format: 'firnline-experiment', version: 1, base: base(), ...extra });

function errorsOf(input: unknown) {
  const result = validateExperiment(input);
  if (result.ok) throw new Error('expected errors');
  return result.errors;
}

describe('xoshiro128** generator', () => {
  it('is deterministic for a seed, differs between seeds, stays in [0, 1)', () => {
    const a = xoshiro128ss(42);
    const b = xoshiro128ss(42);
    const c = xoshiro128ss(43);
    const xs = Array.from({ length: 1000 }, () => a.nextUnit());
    expect(Array.from({ length: 1000 }, () => b.nextUnit())).toEqual(xs);
    expect(Array.from({ length: 1000 }, () => c.nextUnit())).not.toEqual(xs);
    expect(xs.every((x) => x >= 0 && x < 1)).toBe(true);
  });

  it('is uniform: chi-square over 20 bins of 100,000 draws below the 0.1 % point (43.8 for 19 degrees of freedom)', () => {
    const r = xoshiro128ss(1);
    const bins = new Array(20).fill(0);
    const n = 100_000;
    for (let k = 0; k < n; k++) bins[Math.floor(r.nextUnit() * 20)]++;
    const chi2 = bins.reduce((s, o) => s + (o - n / 20) ** 2 / (n / 20), 0);
    console.log(`chi-square of 20 bins: ${chi2.toFixed(2)}`);
    expect(chi2).toBeLessThan(43.8);
  });

  it('randomIndex covers 0..n-1 only', () => {
    const r = xoshiro128ss(3);
    const seen = new Set<number>();
    for (let k = 0; k < 2000; k++) seen.add(randomIndex(r, 7));
    expect([...seen].sort()).toEqual([0, 1, 2, 3, 4, 5, 6]);
  });
});

describe('standard normal distribution', () => {
  // Table values of the normal quantile and CDF (Abramowitz & Stegun 1964, Tables 26.1 and 26.5;
  // the same in every statistical table), quoted to the digits tabulated there. From memory of
  // those tables; they are the familiar critical values.
  const quantiles: [number, number][] = [
    [0.5, 0],
    [0.75, 0.6744897502],
    [0.9, 1.2815515655],
    [0.95, 1.6448536270],
    [0.975, 1.9599639845],
    [0.99, 2.3263478740],
    [0.995, 2.5758293035],
    [0.999, 3.0902323062],
    [0.9999, 3.7190164855],
    [0.01, -2.3263478740],
    [0.001, -3.0902323062],
  ];
  it('quantile matches the table to 1e-9 (both tails and the centre of Acklam\'s regions)', () => {
    for (const [p, z] of quantiles) {
      const got = normalQuantile(p);
      console.log(`Phi^-1(${p}) = ${got} (table ${z}), error ${(got - z).toExponential(1)}`);
      expect(Math.abs(got - z)).toBeLessThan(1e-9);
    }
  });
  it('CDF matches the table: Phi(1) = 0.8413447461, Phi(2) = 0.9772498681, Phi(3) = 0.9986501020, Phi(-4) = 3.1671242e-5', () => {
    expect(normalCdf(1)).toBeCloseTo(0.8413447461, 10);
    expect(normalCdf(2)).toBeCloseTo(0.9772498681, 10);
    expect(normalCdf(3)).toBeCloseTo(0.998650102, 10);
    expect(normalCdf(-4) / 3.1671242e-5).toBeCloseTo(1, 6);
    expect(normalCdf(0)).toBe(0.5);
  });
  it('quantile and CDF invert each other to 1e-12', () => {
    for (let p = 1e-6; p < 1; p += 0.0137) expect(Math.abs(normalCdf(normalQuantile(p)) - p)).toBeLessThan(1e-12 * Math.max(1, p / (1 - p)));
  });
});

describe('Latin hypercube (McKay, Beckman & Conover 1979)', () => {
  it('hits each of the N strata of every dimension exactly once', () => {
    for (const n of [1, 2, 7, 100, 1000]) {
      const cube = latinHypercube(n, 4, xoshiro128ss(n));
      expect(cube).toHaveLength(n);
      for (let j = 0; j < 4; j++) {
        const strata = cube.map((row) => Math.floor(row[j] * n)).sort((a, b) => a - b);
        expect(strata).toEqual(Array.from({ length: n }, (_, i) => i));
      }
    }
  });
  it('maps through the quantiles: every member of a sampled parameter in its own stratum of probability', () => {
    const d = { distribution: 'normal' as const, mean: 10, sd: 2 };
    const { values } = drawEnsemble({ members: 50, seed: 5, parameters: { '/x': d } });
    const strata = values.map((row) => Math.floor(normalCdf((row[0] - 10) / 2) * 50)).sort((a, b) => a - b);
    expect(strata).toEqual(Array.from({ length: 50 }, (_, i) => i));
  });
  it('same seed, same samples; another seed, other samples', () => {
    const e = ensemble() as unknown as Ensemble;
    expect(drawEnsemble(e)).toEqual(drawEnsemble(e));
    expect(drawEnsemble({ ...e, seed: 8 }).values).not.toEqual(drawEnsemble(e).values);
  });
});

describe('distributions', () => {
  it('uniform, normal, lognormal quantiles; truncation keeps to the bounds', () => {
    expect(distributionQuantile({ distribution: 'uniform', min: 2, max: 4 }, 0.25)).toBe(2.5);
    expect(distributionQuantile({ distribution: 'normal', mean: 5, sd: 2 }, 0.975)).toBeCloseTo(5 + 2 * 1.959963985, 8);
    expect(distributionQuantile({ distribution: 'lognormal', median: 3, sigma: 0.5 }, 0.5)).toBeCloseTo(3, 12);
    // Truncated to [0, inf): the median of the half-normal is Phi^-1(0.75) sd.
    expect(distributionQuantile({ distribution: 'normal', mean: 0, sd: 1, min: 0 }, 0.5)).toBeCloseTo(0.6744897502, 9);
    const t = { distribution: 'normal' as const, mean: 0, sd: 1, min: -0.5, max: 0.2 };
    for (let u = 0; u < 1; u += 0.01) {
      const x = distributionQuantile(t, u);
      expect(x).toBeGreaterThanOrEqual(-0.5);
      expect(x).toBeLessThanOrEqual(0.2);
    }
    const l = { distribution: 'lognormal' as const, median: 1, sigma: 1, max: 2 };
    expect(distributionQuantile(l, 0.999999)).toBeLessThanOrEqual(2);
  });
});

describe('the "ensemble" block: validation', () => {
  const at = (errors: { path: string; message: string }[]) => errors.map((e) => `${e.path}: ${e.message}`).join('\n');
  it('refuses a negative spread, reversed bounds, N = 0 and N above the limit, naming the key path', () => {
    const params = (p: Record<string, unknown>) => ensemble({ parameters: p });
    expect(at(errorsOf(experiment({ ensemble: params({ '/ice/A': { distribution: 'normal', mean: 1e-24, sd: -1e-25 } }) })))).toMatch(
      /^\/ensemble\/parameters\/~1ice~1A\/sd: -1e-25 is not allowed; the spread "sd" must be greater than 0/,
    );
    expect(at(errorsOf(experiment({ ensemble: params({ '/ice/A': { distribution: 'lognormal', median: 1e-24, sigma: -0.1 } }) })))).toMatch(
      /^\/ensemble\/parameters\/~1ice~1A\/sigma: -0.1 is not allowed; the spread "sigma"/,
    );
    expect(at(errorsOf(experiment({ ensemble: params({ '/massBalance/ela': { distribution: 'uniform', min: 2900, max: 2800 } }) })))).toMatch(
      /^\/ensemble\/parameters\/~1massBalance~1ela\/max: 2800 is not allowed; "max" must be greater than "min" \(2900\)/,
    );
    expect(at(errorsOf(experiment({ ensemble: params({ '/massBalance/ela': { distribution: 'normal', mean: 2880, sd: 5, min: 2900, max: 2890 } }) })))).toMatch(
      /\/max: 2890 is not allowed; "max" must be greater than "min"/,
    );
    expect(at(errorsOf(experiment({ ensemble: ensemble({ members: 0 }) })))).toMatch(/^\/ensemble\/members: 0 is not allowed; "members" must be a whole number from 1 to 10,000/);
    expect(at(errorsOf(experiment({ ensemble: ensemble({ members: 10_001 }) })))).toMatch(/^\/ensemble\/members: 10001 is not allowed/);
    expect(at(errorsOf(experiment({ ensemble: ensemble({ members: 2.5 }) })))).toMatch(/^\/ensemble\/members: 2.5 is not allowed/);
    expect(at(errorsOf(experiment({ ensemble: ensemble({ seed: -1 }) })))).toMatch(/^\/ensemble\/seed: -1 is not allowed/);
    expect(at(errorsOf(experiment({ ensemble: ensemble({ extra: 1 }) })))).toMatch(/^\/ensemble\/extra: "extra" is not allowed/);
    expect(at(errorsOf(experiment({ ensemble: params({ '/ice/A': { distribution: 'beta', a: 1 } }) })))).toMatch(/^\/ensemble\/parameters\/~1ice~1A\/distribution: /);
    expect(at(errorsOf(experiment({ ensemble: params({ '/ice/A': { distribution: 'normal', mean: 0, sd: 1, min: 40, max: 50 } }) })))).toMatch(/hold no probability/);
  });
  it('refuses a pointer that names no number, after the variants and sweep', () => {
    const one = (pointer: string) => ensemble({ parameters: { [pointer]: { distribution: 'uniform', min: 1, max: 2 } } });
    expect(at(errorsOf(experiment({ ensemble: one('/ice/B') })))).toMatch(/^\/ensemble\/parameters\/~1ice~1B: in the base \(member 1_base_e1\) the ensemble parameter "\/ice\/B" cannot be sampled: it names no value in the scenario/);
    expect(at(errorsOf(experiment({ ensemble: one('/massBalance/model') })))).toMatch(/cannot be sampled: it names a string, not a number/);
    expect(at(errorsOf(experiment({ ensemble: one('/bed') })))).toMatch(/cannot be sampled: it names a list, not a number/);
    expect(at(errorsOf(experiment({ ensemble: one('ice/A') })))).toMatch(/^\/ensemble\/parameters\/ice~1A: "ice\/A" is not allowed; a parameter must be a JSON Pointer/);
  });
  it('places a sample the scenario refuses on its parameter', () => {
    const e = ensemble({ parameters: { '/ice/A': { distribution: 'normal', mean: 1e-25, sd: 1e-24 } } });
    expect(at(errorsOf(experiment({ ensemble: e })))).toMatch(/^\/ensemble\/parameters\/~1ice~1A: in the base \(member \d_base_e\d\): \/ice\/A: /);
  });
  it('refuses more than 10,000 members in all (variants x ensemble)', () => {
    const variants = [1, 2, 3].map((k) => ({ name: `v${k}`, set: {} }));
    expect(at(errorsOf(experiment({ variants, ensemble: ensemble({ members: 4000 }) })))).toMatch(/^\/ensemble\/members: 12,000 members are not allowed/);
  });
});

describe('the "ensemble" block: members', () => {
  it('combines with variants and sweeps: each variant and sweep value gets the same N samples, sample innermost', () => {
    const result = validateExperiment(
      experiment({
        variants: [
          { name: 'cool', set: { warming: [[0, 0], [20, 0.5]] } },
          { name: 'warm', set: { warming: [[0, 0], [20, 2]] } },
        ],
        sweep: { '/grid/spacing': [100, 50] },
        ensemble: ensemble({ members: 3, parameters: { '/ice/A': { distribution: 'lognormal', median: 2.4e-24, sigma: 0.3 } } }),
      }),
    );
    if (!result.ok) throw new Error(JSON.stringify(result.errors));
    expect(result.members.map((m) => m.name)).toEqual([
      '01_cool_grid.spacing=100_e1', '02_cool_grid.spacing=100_e2', '03_cool_grid.spacing=100_e3',
      '04_cool_grid.spacing=50_e1', '05_cool_grid.spacing=50_e2', '06_cool_grid.spacing=50_e3',
      '07_warm_grid.spacing=100_e1', '08_warm_grid.spacing=100_e2', '09_warm_grid.spacing=100_e3',
      '10_warm_grid.spacing=50_e1', '11_warm_grid.spacing=50_e2', '12_warm_grid.spacing=50_e3',
    ]);
    expect(result.members.map((m) => m.group)).toEqual([0, 0, 0, 1, 1, 1, 2, 2, 2, 3, 3, 3]);
    const a = result.members.map((m) => m.scenario.ice.A);
    expect(a.slice(3, 6)).toEqual(a.slice(0, 3));
    expect(a.slice(6, 9)).toEqual(a.slice(0, 3));
    expect(new Set(a.slice(0, 3)).size).toBe(3);
    expect(result.members[7].scenario.warming).toEqual([[0, 0], [20, 2]]);
    expect(result.members[4].scenario.grid.spacing).toBe(50);
  });
});

describe('percentiles (Hyndman & Fan 1996, definition 7: linear between closest ranks)', () => {
  it('a hand-worked example: 10, 20, 30, 40, 50 in any order', () => {
    // h = (n - 1) p = 4 p: p5 -> h 0.2 -> 10 + 0.2 x 10 = 12; p17 -> 0.68 -> 16.8; p50 -> 2 -> 30;
    // p83 -> 3.32 -> 43.2; p95 -> 3.8 -> 48.
    const got = percentiles([30, 10, 50, 20, 40]);
    [12, 16.8, 30, 43.2, 48].forEach((want, k) => expect(got[k]).toBeCloseTo(want, 12));
  });
  it('one value at every percentile; none gives NaN; a percentile among never-reached members is Infinity', () => {
    expect(percentiles([7])).toEqual([7, 7, 7, 7, 7]);
    expect(percentiles([]).every(Number.isNaN)).toBe(true);
    // 100, 200, Infinity: h = 2 p; p17 -> 0.34 -> 134; p50 -> 1 -> 200; p83 -> 1.66 -> Infinity.
    const got = percentiles([Infinity, 100, 200]);
    expect(got[1]).toBeCloseTo(134, 12);
    expect(got[2]).toBe(200);
    expect(got[3]).toBe(Infinity);
  });
  it('the year by which half the volume is lost: interpolated between output times', () => {
    // V = 100, 60, 40 at 0, 10, 20: half (50) is crossed at 10 + (60 - 50) / (60 - 40) x 10 = 15.
    const s = (v: number[]) => v.map((volume, k) => ({ time: 10 * k, volume, length: 0, terminus: NaN }));
    expect(halfVolumeLostYear(s([100, 60, 40]))).toBe(15);
    expect(halfVolumeLostYear(s([100, 60, 55]))).toBe(Infinity);
    expect(halfVolumeLostYear(s([0, 10]))).toBeNaN();
  });
  it('percentiles.csv from experiment.csv rows, one row per group and quantity', () => {
    const csv =
      'variant,t_yr,volume_m3,area_m2,length_m,terminus_m\n' +
      ['a', 'b', 'c'].map((m, k) => `${m},0,100,1,1000,1000\n${m},10,${[40, 45, 80][k]},1,${[500, 600, 700][k]},${k === 2 ? '' : [500, 600][k]}\n`).join('');
    expect(percentilesCsv(csv, ['a', 'b', 'c'], { members: 3, labels: ['base'] })).toBe(
      'group,label,quantity,members,p5,p17,p50,p83,p95\n' +
        '1,base,length_end_m,3,510,534,600,666,690\n' +
        // h = 2 p on 40, 45, 80: p5 40.5, p17 41.7, p50 45, p83 45 + 0.66 x 35 = 68.1, p95 76.5.
        '1,base,volume_end_m3,3,40.5,41.7,45,68.1,76.5\n' +
        '1,base,terminus_end_m,2,505,517,550,583,595\n' +
        // Half lost: a at (100 - 50) / 60 x 10 = 8.333333, b at 50 / 55 x 10 = 9.090909, c never
        // (80 > 50): p5 8.333333 + 0.1 x 0.757576 = 8.409091, p17 8.590909, p50 9.090909, p83 and
        // p95 interpolate towards "never": empty.
        '1,base,half_volume_lost_yr,3,8.409091,8.590909,9.090909,,\n',
    );
  });
  it('bands over time', () => {
    // Three members; at t = 1 the values 10, 30, 20: h = 2 p -> p25 = 15, p75 = 25.
    const band = percentileBand(
      [
        { times: [0, 1], values: [1, 10] },
        { times: [0, 1], values: [3, 30] },
        { times: [0, 1], values: [2, 20] },
      ],
      25,
      75,
    );
    expect(band).toEqual({ times: [0, 1], low: [1.5, 15], high: [2.5, 25] });
    expect(percentileBand([{ times: [0], values: [1] }], 5, 95)).toBeNull();
  });
});
