/**
 * Geodesic distance between two points on an ellipsoid of revolution: Vincenty's inverse method.
 *
 * Source: T. Vincenty (1975), "Direct and inverse solutions of geodesics on the ellipsoid with
 * application of nested equations", Survey Review 23(176), 88-93, equations (3)-(6) and (13)-(19)
 * with the iteration on lambda. It is accurate to about 0.5 mm on the Earth's ellipsoid (the
 * paper's own figure) for every pair of points except nearly antipodal ones, where the iteration
 * may not converge; then `geodesicDistance` returns NaN and the caller refuses that pair. A glacier
 * centreline's successive vertices are metres to kilometres apart, far from that case.
 *
 * Angles in degrees (latitude north positive, longitude east positive), distances in metres.
 * Pure: no DOM, no Node.
 */

export interface Ellipsoid {
  /** Semi-major axis a [m]. */
  a: number;
  /** Flattening f = (a - b) / a [-]. */
  f: number;
}

/** WGS 84 (NIMA TR8350.2): a = 6,378,137 m, 1/f = 298.257223563. RFC 7946 positions are on it. */
export const WGS84: Ellipsoid = { a: 6_378_137, f: 1 / 298.257223563 };

const RAD = Math.PI / 180;
const MAX_ITERATIONS = 200;
/** Change of lambda [rad] below which the iteration has converged (~0.006 mm on the Earth). */
const TOLERANCE = 1e-12;

/**
 * Geodesic distance [m] from (lat1, lon1) to (lat2, lon2) [degrees] on `ellipsoid` (WGS 84 by
 * default). NaN when the iteration does not converge (nearly antipodal points).
 */
export function geodesicDistance(lat1: number, lon1: number, lat2: number, lon2: number, ellipsoid: Ellipsoid = WGS84): number {
  const { a, f } = ellipsoid;
  const b = (1 - f) * a;
  // Difference in longitude, reduced to (-180, 180].
  let dLon = (lon2 - lon1) % 360;
  if (dLon > 180) dLon -= 360;
  else if (dLon <= -180) dLon += 360;
  const L = dLon * RAD;
  // Reduced latitudes.
  const U1 = Math.atan((1 - f) * Math.tan(lat1 * RAD));
  const U2 = Math.atan((1 - f) * Math.tan(lat2 * RAD));
  const sinU1 = Math.sin(U1);
  const cosU1 = Math.cos(U1);
  const sinU2 = Math.sin(U2);
  const cosU2 = Math.cos(U2);

  let lambda = L;
  let sinSigma = 0;
  let cosSigma = 1;
  let sigma = 0;
  let cosSqAlpha = 1;
  let cos2SigmaM = 0;
  let converged = false;
  for (let i = 0; i < MAX_ITERATIONS; i++) {
    const sinLambda = Math.sin(lambda);
    const cosLambda = Math.cos(lambda);
    // (14)
    sinSigma = Math.hypot(cosU2 * sinLambda, cosU1 * sinU2 - sinU1 * cosU2 * cosLambda);
    if (sinSigma === 0) return 0; // coincident points
    // (15), (16)
    cosSigma = sinU1 * sinU2 + cosU1 * cosU2 * cosLambda;
    sigma = Math.atan2(sinSigma, cosSigma);
    // (17)
    const sinAlpha = (cosU1 * cosU2 * sinLambda) / sinSigma;
    cosSqAlpha = 1 - sinAlpha * sinAlpha;
    // (18); on the equator cos^2 alpha = 0 and the term is 0.
    cos2SigmaM = cosSqAlpha === 0 ? 0 : cosSigma - (2 * sinU1 * sinU2) / cosSqAlpha;
    // (10)
    const C = (f / 16) * cosSqAlpha * (4 + f * (4 - 3 * cosSqAlpha));
    // (11)
    const next =
      L + (1 - C) * f * sinAlpha * (sigma + C * sinSigma * (cos2SigmaM + C * cosSigma * (-1 + 2 * cos2SigmaM * cos2SigmaM)));
    const change = Math.abs(next - lambda);
    lambda = next;
    if (change < TOLERANCE) {
      converged = true;
      break;
    }
  }
  if (!converged) return NaN;
  // (3), (4), (6), (19)
  const uSq = (cosSqAlpha * (a * a - b * b)) / (b * b);
  const A = 1 + (uSq / 16384) * (4096 + uSq * (-768 + uSq * (320 - 175 * uSq)));
  const B = (uSq / 1024) * (256 + uSq * (-128 + uSq * (74 - 47 * uSq)));
  const deltaSigma =
    B *
    sinSigma *
    (cos2SigmaM +
      (B / 4) *
        (cosSigma * (-1 + 2 * cos2SigmaM * cos2SigmaM) -
          (B / 6) * cos2SigmaM * (-3 + 4 * sinSigma * sinSigma) * (-3 + 4 * cos2SigmaM * cos2SigmaM)));
  return b * A * (sigma - deltaSigma);
}
