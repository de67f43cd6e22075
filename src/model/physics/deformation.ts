/**
 * Ice deformation under the shallow-ice approximation with Glen's flow law
 * (strain rate = A tau^n), plane flow with a shape factor f for side drag.
 *
 *   flux per unit width   q_d = -(2A/(n+2)) (f rho g)^n H^(n+2) |ds/dx|^(n-1) ds/dx
 *   surface speed         u_d = (2A/(n+1)) tau_b^n H,   tau_b = f rho g H |ds/dx|
 *
 * Sources: Paterson (1994), The Physics of Glaciers, 3rd ed., ch. 11; Cuffey & Paterson (2010),
 * 4th ed., section 8.3 (eqs. 8.35-8.38 for plane flow). Units: A in Pa^-n a^-1 inside the model,
 * so speeds come out in m a^-1 and fluxes in m^2 a^-1.
 */

/**
 * Diffusion coefficient Gamma = 2A (f rho g)^n / (n+2) [Pa^-n a^-1 * Pa^n m^-n = m^-n a^-1],
 * so that |q_d| = Gamma H^(n+2) |ds/dx|^n.
 */
export function deformationFluxCoefficient(
  rateFactorPerYear: number,
  n: number,
  density: number,
  gravity: number,
  shapeFactor = 1,
): number {
  return (2 * rateFactorPerYear * Math.pow(shapeFactor * density * gravity, n)) / (n + 2);
}

/** Surface speed from deformation [m a^-1] for basal shear stress tau [Pa] and thickness H [m]. */
export function deformationSurfaceSpeed(
  rateFactorPerYear: number,
  n: number,
  basalShearStress: number,
  thickness: number,
): number {
  return ((2 * rateFactorPerYear) / (n + 1)) * Math.pow(basalShearStress, n) * thickness;
}

/** Depth-averaged speed from deformation [m a^-1]: (n+1)/(n+2) of the surface speed. */
export function deformationMeanSpeed(
  rateFactorPerYear: number,
  n: number,
  basalShearStress: number,
  thickness: number,
): number {
  return ((2 * rateFactorPerYear) / (n + 2)) * Math.pow(basalShearStress, n) * thickness;
}
