import { describe, expect, it } from 'vitest';
import { solvePentadiagonal } from '../../../src/model/stepper/pentadiagonal';

describe('solvePentadiagonal(system, out)', () => {
  it('solves a random diagonally dominant banded system: A x reproduces the right-hand side within 5e-13', () => {
    const n = 40;
    let seed = 12345;
    const random = () => ((seed = (seed * 1103515245 + 12345) % 2 ** 31) / 2 ** 31) - 0.5;
    const bands = ['below2', 'below1', 'diagonal', 'above1', 'above2'] as const;
    const original = Object.fromEntries(bands.map((b) => [b, Float64Array.from({ length: n }, random)])) as Record<
      (typeof bands)[number],
      Float64Array
    >;
    for (let i = 0; i < n; i++) original.diagonal[i] = 5 + random();
    const rhs = Float64Array.from({ length: n }, random);
    const system = {
      below2: original.below2.slice(),
      below1: original.below1.slice(),
      diagonal: original.diagonal.slice(),
      above1: original.above1.slice(),
      above2: original.above2.slice(),
      rhs: rhs.slice(),
    };
    const x = new Float64Array(n);
    solvePentadiagonal(system, x);
    // Independent check: multiply back with the untouched bands.
    for (let i = 0; i < n; i++) {
      let sum = original.diagonal[i] * x[i];
      if (i >= 2) sum += original.below2[i] * x[i - 2];
      if (i >= 1) sum += original.below1[i] * x[i - 1];
      if (i + 1 < n) sum += original.above1[i] * x[i + 1];
      if (i + 2 < n) sum += original.above2[i] * x[i + 2];
      expect(sum).toBeCloseTo(rhs[i], 12);
    }
  });
});
