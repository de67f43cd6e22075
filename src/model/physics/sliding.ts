/**
 * Weertman-type sliding law (Weertman 1957, J. Glaciol. 3(21); power-law form as used in
 * flowline models, Cuffey & Paterson 2010, section 7.2):
 *
 *   u_b = C tau_b^m,   tau_b = f rho g H |ds/dx|
 *
 * C in m a^-1 Pa^-m; C = 0 disables sliding. Sliding carries the whole column, so its flux per
 * unit width is q_b = u_b H, directed down the surface slope.
 */

/** Sliding speed u_b [m a^-1] for basal shear stress tau_b [Pa]. */
export function slidingSpeed(coefficient: number, exponent: number, basalShearStress: number): number {
  if (coefficient === 0 || basalShearStress <= 0) return 0;
  return coefficient * Math.pow(basalShearStress, exponent);
}
