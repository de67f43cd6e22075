/**
 * Shape factor f for side drag in a valley glacier (Nye 1965, J. Glaciol. 5(41), 661-690;
 * tabulated in Cuffey & Paterson 2010, Table 8.1).
 *
 * Firnline uses f as Nye defined it through the centre-line speed: the basal shear stress on
 * the centre line is f * rho * g * H * |ds/dx|, and f multiplies rho g in the deformation flux
 * and in the sliding law. W = surface half-width / centre-line depth.
 *
 * Between tabulated W the factor is interpolated linearly in 1/W, which makes f -> 1 as W -> inf
 * (a wide channel feels no side drag). Narrower than W = 1 the table gives no value; Firnline
 * holds f at its W = 1 value there and the simulation reports it as a warning.
 */
export type CrossSection = 'parabolic' | 'semi-elliptic' | 'rectangular';

/** Tabulated W values (Nye 1965), as 1/W so that W = inf sits at 0. */
const INVERSE_HALF_WIDTH_RATIO = [0, 1 / 4, 1 / 3, 1 / 2, 1];

/** f at W = inf, 4, 3, 2, 1 (same order as INVERSE_HALF_WIDTH_RATIO). */
const NYE_TABLE: Record<CrossSection, readonly number[]> = {
  parabolic: [1, 0.806, 0.746, 0.646, 0.445],
  'semi-elliptic': [1, 0.849, 0.799, 0.709, 0.5],
  rectangular: [1, 0.929, 0.884, 0.789, 0.558],
};

/** Smallest W the table covers; narrower sections use f(W = 1). */
export const SMALLEST_TABULATED_HALF_WIDTH_RATIO = 1;

/**
 * Shape factor for a cross section of the given type, half-width `halfWidth` [m] and
 * centre-line depth `depth` [m]. Ice-free (depth <= 0) gives 1.
 */
export function nyeShapeFactor(crossSection: CrossSection, halfWidth: number, depth: number): number {
  return nyeShapeFactorWithSlope(crossSection, halfWidth, depth, undefined);
}

/**
 * The same factor, and, when `slope` is given, df/d(depth) [m^-1] written to slope[0]: the
 * interpolation is linear in 1/W = depth / halfWidth, so within a table interval the slope is
 * (f_k - f_{k-1}) / ((1/W)_k - (1/W)_{k-1}) / halfWidth, and 0 where f is held (W <= 1, ice-free).
 * The implicit step needs it for an exact Jacobian of the face flux.
 */
export function nyeShapeFactorWithSlope(
  crossSection: CrossSection,
  halfWidth: number,
  depth: number,
  slope: Float64Array | undefined,
): number {
  if (slope) slope[0] = 0;
  if (!(depth > 0)) return 1;
  const inverseW = depth / halfWidth;
  const table = NYE_TABLE[crossSection];
  if (inverseW >= 1) return table[table.length - 1];
  let k = 1;
  while (INVERSE_HALF_WIDTH_RATIO[k] < inverseW) k++;
  const x0 = INVERSE_HALF_WIDTH_RATIO[k - 1];
  const x1 = INVERSE_HALF_WIDTH_RATIO[k];
  const perInverseW = (table[k] - table[k - 1]) / (x1 - x0);
  if (slope) slope[0] = perInverseW / halfWidth;
  return table[k - 1] + (inverseW - x0) * perInverseW;
}
