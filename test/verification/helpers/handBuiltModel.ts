/**
 * Builds a FlowlineModel directly (bypassing the scenario file) for exact-solution tests, where
 * the balance is a given function of x rather than of elevation.
 */
import type { FlowlineModel, SchemeName } from '../../../src/model/flowlineModel';
import { SECONDS_PER_YEAR } from '../../../src/model/units';

export interface HandBuiltOptions {
  length: number;
  spacing: number;
  /** Rate factor A [Pa^-n a^-1]. */
  rateFactorPerYear: number;
  n?: number;
  density?: number;
  gravity?: number;
  /** Bed elevation [m] at x. */
  bed?: (x: number) => number;
  /** Ice-equivalent balance [m a^-1] at x (and, optionally, surface elevation s). */
  balance?: (x: number, surface: number) => number;
  slidingCoefficient?: number;
  slidingExponent?: number;
  initialThickness?: (x: number) => number;
  scheme?: SchemeName;
  maxStepYears?: number;
}

export function handBuiltModel(options: HandBuiltOptions): FlowlineModel {
  const N = Math.round(options.length / options.spacing);
  const dx = options.spacing;
  const bedAt = options.bed ?? (() => 0);
  const x = Float64Array.from({ length: N }, (_, i) => (i + 0.5) * dx);
  const balance = options.balance ?? (() => 0);
  // A balance that depends on x alone is evaluated once, not at every step.
  const fixedBalance = balance.length < 2 ? x.map((xi) => balance(xi, 0)) : undefined;
  return {
    grid: {
      cellCount: N,
      spacing: dx,
      x,
      bed: x.map(bedAt),
      bedBeyondEnd: bedAt(options.length + 0.5 * dx),
      widthAtCells: new Float64Array(N).fill(1),
      widthAtFaces: new Float64Array(N + 1).fill(1),
    },
    numerics: { scheme: options.scheme ?? 'explicit', maxStepYears: options.maxStepYears ?? 1 },
    flow: {
      n: options.n ?? 3,
      rateFactorPerYear: options.rateFactorPerYear,
      rateFactorPerSecond: options.rateFactorPerYear / SECONDS_PER_YEAR,
      density: options.density ?? 910,
      gravity: options.gravity ?? 9.81,
      slidingCoefficient: options.slidingCoefficient ?? 0,
      slidingExponent: options.slidingExponent ?? 3,
      shapeFactor: { kind: 'constant', value: 1 },
    },
    iceBalance(surface, _warming, _precipitationFactor, out) {
      if (fixedBalance) out.set(fixedBalance);
      else for (let i = 0; i < N; i++) out[i] = balance(x[i], surface[i]);
    },
    iceToWaterEquivalent: (options.density ?? 910) / 1000,
    warmingAt: () => 0,
    precipitationFactorAt: () => 1,
    initialThickness: options.initialThickness ? x.map(options.initialThickness) : new Float64Array(N),
  };
}

/** Root-mean-square of a list of numbers. */
export function rms(values: number[]): number {
  return Math.sqrt(values.reduce((sum, v) => sum + v * v, 0) / values.length);
}
