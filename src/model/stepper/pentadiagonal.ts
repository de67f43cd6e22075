/**
 * Solves a banded system with two diagonals below and two above the main one by Gaussian
 * elimination without pivoting (e.g. Golub & Van Loan 2013, Matrix Computations, 4th ed.,
 * section 4.3, band LU): row i reads
 *   below2[i] x[i-2] + below1[i] x[i-1] + diagonal[i] x[i] + above1[i] x[i+1] + above2[i] x[i+2] = rhs[i].
 * The bands and rhs are overwritten; the solution goes to `out`. Suitable for the diagonally
 * heavy Jacobians of an implicit step; a zero pivot gives non-finite output, which the caller
 * treats as a failed step.
 */
export interface PentadiagonalSystem {
  below2: Float64Array;
  below1: Float64Array;
  diagonal: Float64Array;
  above1: Float64Array;
  above2: Float64Array;
  rhs: Float64Array;
}

export function solvePentadiagonal(system: PentadiagonalSystem, out: Float64Array): void {
  const { below2, below1, diagonal, above1, above2, rhs } = system;
  const n = diagonal.length;
  for (let i = 0; i < n; i++) {
    const pivot = diagonal[i];
    if (i + 1 < n) {
      const f = below1[i + 1] / pivot;
      diagonal[i + 1] -= f * above1[i];
      above1[i + 1] -= f * above2[i];
      rhs[i + 1] -= f * rhs[i];
    }
    if (i + 2 < n) {
      const f = below2[i + 2] / pivot;
      below1[i + 2] -= f * above1[i];
      diagonal[i + 2] -= f * above2[i];
      rhs[i + 2] -= f * rhs[i];
    }
  }
  for (let i = n - 1; i >= 0; i--) {
    let value = rhs[i];
    if (i + 1 < n) value -= above1[i] * out[i + 1];
    if (i + 2 < n) value -= above2[i] * out[i + 2];
    out[i] = value / diagonal[i];
  }
}
