/** The interface every surface-mass-balance formulation implements. */
export interface MassBalanceModel {
  /**
   * Climatic surface mass balance b [m w.e. a^-1] at surface elevation z [m a.s.l.] under warming
   * dT [K], with the precipitation (accumulation) multiplied by `precipitationFactor` [-] (default 1;
   * from the forcing series, model/climate.ts).
   */
  balanceAt(elevation: number, warming: number, precipitationFactor?: number): number;
  /** Equilibrium-line altitude [m a.s.l.] under warming dT [K]; NaN where b has no zero crossing. */
  equilibriumLineAltitude(warming: number, precipitationFactor?: number): number;
}

/** Lowest and highest elevations searched for an ELA [m a.s.l.]. */
export const ELA_SEARCH_RANGE: readonly [number, number] = [-2000, 12000];

/**
 * Elevation where a balance profile that increases with height crosses zero, by bisection
 * (to 1 mm). NaN when it does not change sign in the search range.
 */
export function findEquilibriumLine(balance: (z: number) => number): number {
  let [lo, hi] = ELA_SEARCH_RANGE;
  let bLo = balance(lo);
  const bHi = balance(hi);
  if (!(bLo < 0 && bHi >= 0)) return Number.NaN;
  while (hi - lo > 1e-3) {
    const mid = 0.5 * (lo + hi);
    const bMid = balance(mid);
    if (bMid < 0) {
      lo = mid;
      bLo = bMid;
    } else hi = mid;
  }
  return 0.5 * (lo + hi);
}
