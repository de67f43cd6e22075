/**
 * Driving stress tau_d = rho g H |ds/dx| (Cuffey & Paterson 2010, eq. 8.4; Paterson 1994).
 * Reported without the shape factor: it is the gravitational stress the whole cross section
 * must resist. The basal shear stress on the centre line is f * tau_d.
 */
export function drivingStress(density: number, gravity: number, thickness: number, surfaceSlope: number): number {
  return density * gravity * thickness * Math.abs(surfaceSlope);
}
