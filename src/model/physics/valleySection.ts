/**
 * A valley cross-section that follows the ice: the surface width w_s and the section area A
 * change with the centre-line thickness H, with dA/dH = w_s (the area grows by a strip as wide as
 * the surface). The valley floor, of width w0 [m] (the scenario's `width`), is flat; the flanks
 * rise from its edges so that the surface is `widening` L [m] wider than the floor at
 * H = WIDENING_DEPTH = 100 m of ice. Units: m, m^2.
 *
 *  rectangular  vertical walls:            w_s = w0,                A = w0 H
 *  trapezoidal  straight flanks:           w_s = w0 + k H,          A = w0 H + k H^2 / 2,
 *               k = L / 100 (both flanks together; a wall at angle theta above the horizontal
 *               gives k = 2 / tan(theta)); Oerlemans' trapezoidal valley w_s = w0 + lambda H
 *               (Oerlemans 2008, Minimal Glacier Models, Utrecht: Igitur [memory])
 *  parabolic    a parabola z = c y^2 filled with sediment up to the floor (a flat-floored U):
 *               w_s^2 = w0^2 + p H,  p = ((w0 + L)^2 - w0^2) / 100 = 4 / c,
 *               A = 2 (w_s^3 - w0^3) / (3 p)  (the integral of w_s dH); with w0 -> 0 it is the
 *               plain parabola, A = 2/3 H w_s (Archimedes' parabolic segment).
 *
 * The filled parabola keeps dw_s/dH = p / (2 w_s) finite at H = 0 (a plain parabola's is
 * infinite there), so the implicit solver's Jacobian stays finite on bare ground.
 */
export type SectionShape = 'rectangular' | 'parabolic' | 'trapezoidal';

/** Thickness at which `widening` is measured [m]. */
export const WIDENING_DEPTH = 100;

export interface ValleySection {
  shape: SectionShape;
  /** Surface width at 100 m of ice minus the floor width [m] (ignored for rectangular). */
  widening: number;
}

/** p [m] of the parabola (w_s^2 = w0^2 + p H), or k [-] of the trapezoid; 0: vertical walls. */
function flankCoefficient(section: ValleySection, floor: number): number {
  if (section.shape === 'rectangular' || !(section.widening > 0)) return 0;
  const L = section.widening;
  if (section.shape === 'trapezoidal') return L / WIDENING_DEPTH;
  return ((floor + L) * (floor + L) - floor * floor) / WIDENING_DEPTH;
}

/** Surface width w_s [m] at centre-line thickness H [m] (>= 0) over a floor of width `floor` [m]. */
export function surfaceWidth(section: ValleySection, floor: number, H: number): number {
  const k = flankCoefficient(section, floor);
  if (k === 0) return floor;
  if (section.shape === 'trapezoidal') return floor + k * H;
  return Math.sqrt(floor * floor + k * H);
}

/** dw_s/dH [-]. */
export function surfaceWidthSlope(section: ValleySection, floor: number, H: number): number {
  const k = flankCoefficient(section, floor);
  if (k === 0) return 0;
  if (section.shape === 'trapezoidal') return k;
  return k / (2 * Math.sqrt(floor * floor + k * H));
}

/** Section area A [m^2] at thickness H [m]. */
export function sectionArea(section: ValleySection, floor: number, H: number): number {
  return H * secantWidth(section, floor, H, 0);
}

/**
 * The secant width (A(h) - A(o)) / (h - o) [m], written without the difference so that it is
 * exact for h = o too (where it is w_s(o)): the mean surface width while the surface moves from
 * thickness o to h. With o = 0 it is the mean width A / H of the section.
 */
export function secantWidth(section: ValleySection, floor: number, h: number, o: number): number {
  const k = flankCoefficient(section, floor);
  if (k === 0) return floor;
  if (section.shape === 'trapezoidal') return floor + 0.5 * k * (h + o);
  // (2/(3p)) (a^3 - b^3) / ((a^2 - b^2)/p) with a = w_s(h), b = w_s(o): a^3 - b^3 = (a - b)(a^2 + ab + b^2).
  const a = Math.sqrt(floor * floor + k * h);
  const b = Math.sqrt(floor * floor + k * o);
  return ((2 / 3) * (a * a + a * b + b * b)) / (a + b);
}

/** d(secantWidth)/dh at fixed o [-]; w_s'(o) / 2 at h = o. */
export function secantWidthSlope(section: ValleySection, floor: number, h: number, o: number): number {
  const k = flankCoefficient(section, floor);
  if (k === 0) return 0;
  if (section.shape === 'trapezoidal') return 0.5 * k;
  const a = Math.sqrt(floor * floor + k * h);
  const b = Math.sqrt(floor * floor + k * o);
  // d/da of (2/3)(a^2 + ab + b^2)/(a + b) is (2/3) a (a + 2b) / (a + b)^2, and da/dh = p / (2a).
  return ((k / 3) * (a + 2 * b)) / ((a + b) * (a + b));
}

/** The thickness H [m] whose section has area A [m^2] (A >= 0); the inverse of sectionArea. */
export function thicknessForArea(section: ValleySection, floor: number, A: number): number {
  if (!(A > 0)) return 0;
  const k = flankCoefficient(section, floor);
  if (k === 0) return A / floor;
  if (section.shape === 'trapezoidal') {
    // Root of k/2 H^2 + w0 H - A = 0, written without cancellation.
    return (2 * A) / (floor + Math.sqrt(floor * floor + 2 * k * A));
  }
  // a^3 = w0^3 + 1.5 p A and H = (a^2 - w0^2) / p = 1.5 A (a + w0) / (a^2 + a w0 + w0^2).
  const a = Math.cbrt(floor * floor * floor + 1.5 * k * A);
  return (1.5 * A * (a + floor)) / (a * a + a * floor + floor * floor);
}
