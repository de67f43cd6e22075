/**
 * Solves a tridiagonal system with the Thomas algorithm (e.g. Press et al. 2007, Numerical
 * Recipes, 3rd ed., section 2.4): lower[i] x[i-1] + diagonal[i] x[i] + upper[i] x[i+1] = rhs[i].
 * No pivoting: fine for the diagonally dominant systems of an implicit diffusion step.
 * `scratch` (length n) is overwritten; the solution goes to `out`.
 */
export function solveTridiagonal(
  lower: Float64Array,
  diagonal: Float64Array,
  upper: Float64Array,
  rhs: Float64Array,
  out: Float64Array,
  scratch: Float64Array,
): void {
  const n = diagonal.length;
  let beta = diagonal[0];
  out[0] = rhs[0] / beta;
  for (let i = 1; i < n; i++) {
    scratch[i] = upper[i - 1] / beta;
    beta = diagonal[i] - lower[i] * scratch[i];
    out[i] = (rhs[i] - lower[i] * out[i - 1]) / beta;
  }
  for (let i = n - 2; i >= 0; i--) out[i] -= scratch[i + 1] * out[i + 1];
}
