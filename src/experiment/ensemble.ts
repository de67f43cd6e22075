/**
 * Uncertainty ensembles: the experiment file's "ensemble" block draws N samples of any number of
 * scenario values (each a JSON Pointer) from probability distributions, by Latin hypercube
 * sampling (McKay, Beckman & Conover 1979, "A comparison of three methods for selecting values of
 * input variables in the analysis of output from a computer code", Technometrics 21(2), 239-245).
 *
 * Latin hypercube: for each parameter j, a random permutation pi_j of 0..N-1 (Fisher-Yates with
 * the seeded generator of random.ts) and, for sample i, u_ij = (pi_j(i) + U_ij) / N with U_ij
 * uniform in [0, 1): every one of the N equal-probability strata of every parameter is hit by
 * exactly one sample. The value is the distribution's quantile at u_ij (for a truncated
 * distribution, at F(a) + u_ij (F(b) - F(a)), the inverse-CDF method).
 *
 * Distributions (keys of each parameter object):
 * - uniform: min, max (min < max)
 * - normal: mean, sd (sd > 0); optional min and/or max truncate it
 * - lognormal: median (> 0), sigma (> 0, the standard deviation of the natural logarithm);
 *   optional min and/or max (> 0) truncate it
 *
 * Samples are drawn in a fixed order (all permutations, then all offsets, parameters in file
 * order), so a seed gives the same members on every machine.
 */
import { toJsonPointer, parseJsonPointer } from '../json/jsonPointer';
import { formatNumber } from '../scenario/formatNumber';
import type { ValidationMessage } from '../scenario/validationMessage';
import { normalCdf, normalQuantile } from './normalDistribution';
import { randomIndex, xoshiro128ss, type Random } from './random';

export const ENSEMBLE_LIMITS = {
  /** Samples per ensemble (and so members per variant and sweep combination). */
  maxMembers: 10_000,
  maxParameters: 20,
  maxSeed: 4294967295,
} as const;

export type Distribution =
  | { distribution: 'uniform'; min: number; max: number }
  | { distribution: 'normal'; mean: number; sd: number; min?: number; max?: number }
  | { distribution: 'lognormal'; median: number; sigma: number; min?: number; max?: number };

export interface Ensemble {
  members: number;
  seed: number;
  method?: 'latin-hypercube';
  parameters: Record<string, Distribution>;
}

/** Drawn samples: values[i][j] is sample i of parameter pointers[j]. */
export interface EnsembleSamples {
  pointers: string[];
  values: number[][];
}

const isObject = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);
const isFiniteNumber = (v: unknown): v is number => typeof v === 'number' && Number.isFinite(v);

const KEYS: Record<Distribution['distribution'], { required: string[]; optional: string[] }> = {
  uniform: { required: ['min', 'max'], optional: [] },
  normal: { required: ['mean', 'sd'], optional: ['min', 'max'] },
  lognormal: { required: ['median', 'sigma'], optional: ['min', 'max'] },
};

/** Checks the block's shape and numbers; errors carry a JSON Pointer into the experiment file. */
export function checkEnsemble(value: unknown): { ok: true; ensemble: Ensemble } | { ok: false; errors: ValidationMessage[] } {
  const errors: ValidationMessage[] = [];
  const at = (...path: PropertyKey[]) => toJsonPointer(['ensemble', ...path]);
  const fail = (path: string, message: string) => errors.push({ path, message });
  if (!isObject(value)) {
    fail(at(), '"ensemble" must be a JSON object with the keys "members", "seed", "parameters" and optionally "method"');
    return { ok: false, errors };
  }
  for (const key of Object.keys(value)) {
    if (!['members', 'seed', 'method', 'parameters'].includes(key)) {
      fail(at(key), `"${key}" is not allowed; the ensemble allows only the keys "members", "seed", "method" and "parameters"`);
    }
  }
  const members = value.members;
  if (!(Number.isInteger(members) && (members as number) >= 1 && (members as number) <= ENSEMBLE_LIMITS.maxMembers)) {
    fail(at('members'), `${JSON.stringify(members) ?? 'a missing value'} is not allowed; "members" must be a whole number from 1 to ${formatNumber(ENSEMBLE_LIMITS.maxMembers)}`);
  }
  const seed = value.seed;
  if (!(Number.isInteger(seed) && (seed as number) >= 0 && (seed as number) <= ENSEMBLE_LIMITS.maxSeed)) {
    fail(at('seed'), `${JSON.stringify(seed) ?? 'a missing value'} is not allowed; "seed" must be a whole number from 0 to ${formatNumber(ENSEMBLE_LIMITS.maxSeed)}`);
  }
  if (value.method !== undefined && value.method !== 'latin-hypercube') {
    fail(at('method'), `${JSON.stringify(value.method)} is not allowed; the only sampling method is "latin-hypercube"`);
  }
  const parameters = value.parameters;
  if (!isObject(parameters) || Object.keys(parameters).length === 0 || Object.keys(parameters).length > ENSEMBLE_LIMITS.maxParameters) {
    fail(at('parameters'), `"parameters" must be a JSON object of 1 to ${ENSEMBLE_LIMITS.maxParameters} keys, each a JSON Pointer to a number in the scenario with its distribution`);
    return { ok: false, errors };
  }
  for (const [pointer, spec] of Object.entries(parameters)) {
    const p = (...path: PropertyKey[]) => at('parameters', pointer, ...path);
    const parsed = parseJsonPointer(pointer);
    if (!parsed.ok || pointer === '' || pointer === '/format' || pointer === '/version') {
      fail(p(), `${JSON.stringify(pointer)} is not allowed; a parameter must be a JSON Pointer (RFC 6901) to a number in the scenario, such as "/ice/A"`);
      continue;
    }
    if (!isObject(spec) || !(typeof spec.distribution === 'string' && spec.distribution in KEYS)) {
      fail(isObject(spec) ? p('distribution') : p(), 'each parameter needs "distribution": "uniform", "normal" or "lognormal"');
      continue;
    }
    const kind = spec.distribution as Distribution['distribution'];
    const { required, optional } = KEYS[kind];
    for (const key of Object.keys(spec)) {
      if (key !== 'distribution' && !required.includes(key) && !optional.includes(key)) {
        fail(p(key), `"${key}" is not allowed; a ${kind} distribution takes ${[...required, ...optional].map((k) => `"${k}"`).join(', ')}`);
      }
    }
    let numbersOk = true;
    for (const key of [...required, ...optional]) {
      const v = spec[key];
      if (v === undefined && optional.includes(key)) continue;
      if (!isFiniteNumber(v)) {
        fail(p(key), `${JSON.stringify(v) ?? 'a missing value'} is not allowed; "${key}" of a ${kind} distribution must be a finite number`);
        numbersOk = false;
      }
    }
    if (!numbersOk) continue;
    const lo = spec.min as number | undefined;
    const hi = spec.max as number | undefined;
    if (kind === 'normal' && !((spec.sd as number) > 0)) fail(p('sd'), `${spec.sd} is not allowed; the spread "sd" must be greater than 0`);
    if (kind === 'lognormal') {
      if (!((spec.sigma as number) > 0)) fail(p('sigma'), `${spec.sigma} is not allowed; the spread "sigma" must be greater than 0`);
      if (!((spec.median as number) > 0)) fail(p('median'), `${spec.median} is not allowed; the median of a lognormal distribution must be greater than 0`);
      if (lo !== undefined && !(lo > 0)) fail(p('min'), `${lo} is not allowed; a lognormal distribution's "min" must be greater than 0`);
      if (hi !== undefined && !(hi > 0)) fail(p('max'), `${hi} is not allowed; a lognormal distribution's "max" must be greater than 0`);
    }
    if (lo !== undefined && hi !== undefined && !(lo < hi)) {
      fail(p('max'), `${hi} is not allowed; "max" must be greater than "min" (${lo}): the bounds are reversed or equal`);
    }
    if (errors.length === 0 && kind !== 'uniform' && (lo !== undefined || hi !== undefined)) {
      const [fa, fb] = truncationRange(spec as Distribution);
      if (!(fb - fa > 1e-12)) {
        fail(p(), `the bounds ${lo ?? '-infinity'} to ${hi ?? 'infinity'} hold no probability of this distribution (less than 1e-12); widen them or move the centre`);
      }
    }
  }
  if (errors.length > 0) return { ok: false, errors };
  return { ok: true, ensemble: value as unknown as Ensemble };
}

/** The standardised variable of a value: z for normal, ln-space z for lognormal. */
function standardise(d: Exclude<Distribution, { distribution: 'uniform' }>, x: number): number {
  return d.distribution === 'normal' ? (x - d.mean) / d.sd : (Math.log(x) - Math.log(d.median)) / d.sigma;
}

/** [F(min), F(max)] of the untruncated distribution (0 and 1 where a bound is absent). */
function truncationRange(d: Distribution): [number, number] {
  if (d.distribution === 'uniform') return [0, 1];
  const fa = d.min === undefined ? 0 : normalCdf(standardise(d, d.min));
  const fb = d.max === undefined ? 1 : normalCdf(standardise(d, d.max));
  return [fa, fb];
}

/** The quantile of the (possibly truncated) distribution at probability u in [0, 1). */
export function distributionQuantile(d: Distribution, u: number): number {
  if (d.distribution === 'uniform') return d.min + u * (d.max - d.min);
  const [fa, fb] = truncationRange(d);
  const p = Math.min(Math.max(fa + u * (fb - fa), Number.MIN_VALUE), 1 - 2 ** -53);
  const z = normalQuantile(p);
  let x = d.distribution === 'normal' ? d.mean + d.sd * z : d.median * Math.exp(d.sigma * z);
  // The bounds hold exactly even where the CDF's last bits round the other way.
  if (d.min !== undefined && x < d.min) x = d.min;
  if (d.max !== undefined && x > d.max) x = d.max;
  return x;
}

/** The unit-cube Latin hypercube: n samples of `dimensions` values in [0, 1). */
export function latinHypercube(n: number, dimensions: number, random: Random): number[][] {
  const permutations: number[][] = [];
  for (let j = 0; j < dimensions; j++) {
    const perm = Array.from({ length: n }, (_, i) => i);
    for (let i = n - 1; i > 0; i--) {
      const k = randomIndex(random, i + 1);
      [perm[i], perm[k]] = [perm[k], perm[i]];
    }
    permutations.push(perm);
  }
  const samples: number[][] = [];
  for (let i = 0; i < n; i++) {
    const row: number[] = [];
    for (let j = 0; j < dimensions; j++) row.push((permutations[j][i] + random.nextUnit()) / n);
    samples.push(row);
  }
  return samples;
}

export function drawEnsemble(ensemble: Ensemble): EnsembleSamples {
  const pointers = Object.keys(ensemble.parameters);
  const cube = latinHypercube(ensemble.members, pointers.length, xoshiro128ss(ensemble.seed));
  return {
    pointers,
    values: cube.map((row) => row.map((u, j) => distributionQuantile(ensemble.parameters[pointers[j]], u))),
  };
}
