/**
 * The minmod slope limiter (Roe 1986; LeVeque 2002, Finite Volume Methods for Hyperbolic
 * Problems, section 6.9): the smaller of two one-sided slopes when they agree in sign, else 0.
 * It keeps the reconstruction free of new extrema, so reconstructed thickness is never negative.
 */
export function minmod(a: number, b: number): number {
  if (a > 0 && b > 0) return a < b ? a : b;
  if (a < 0 && b < 0) return a > b ? a : b;
  return 0;
}
