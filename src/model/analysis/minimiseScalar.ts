/**
 * One-parameter minimisation and confidence range, shared by the bed inversion's rate-factor fit
 * and the calibration of flow parameters to surface speeds.
 *
 * minimiseLog: the minimum of f(k) for k in [a, b] > 0, searched in log k: a coarse scan of 61
 * points (which also brackets the minimum), then golden-section search in the bracket (Press et
 * al. 2007, Numerical Recipes, 3rd ed., section 10.2). `atBound` says the scan's best point was an
 * end of the range, i.e. the minimum is not bracketed inside it.
 *
 * levelCrossing: where f rises to `level` between the minimum and a bound, by bisection in log k
 * (section 9.1); the bound when f never reaches the level there. With f = chi^2 and
 * level = chi^2_min + Delta, Delta = 1, the crossings are the one-sigma range of one parameter
 * (Delta chi^2 = 1, section 15.6).
 */

export interface LogMinimum {
  at: number;
  value: number;
  /** The best point of the coarse scan was an end of the range. */
  atBound: boolean;
  /** Evaluations of f used. */
  evaluations: number;
}

export function minimiseLog(f: (k: number) => number, [a, b]: readonly [number, number]): LogMinimum {
  let evaluations = 0;
  const g0 = (k: number) => {
    evaluations++;
    return f(k);
  };
  const steps = 60;
  let best = 0;
  let bestValue = Number.POSITIVE_INFINITY;
  const la = Math.log(a);
  const lb = Math.log(b);
  for (let s = 0; s <= steps; s++) {
    const value = g0(Math.exp(la + ((lb - la) * s) / steps));
    if (value < bestValue) {
      bestValue = value;
      best = s;
    }
  }
  let lo = la + ((lb - la) * Math.max(0, best - 1)) / steps;
  let hi = la + ((lb - la) * Math.min(steps, best + 1)) / steps;
  const g = (Math.sqrt(5) - 1) / 2;
  for (let k = 0; k < 80 && hi - lo > 1e-10; k++) {
    const c = hi - g * (hi - lo);
    const d = lo + g * (hi - lo);
    if (g0(Math.exp(c)) < g0(Math.exp(d))) hi = d;
    else lo = c;
  }
  const at = Math.exp(0.5 * (lo + hi));
  const value = g0(at);
  return { at, value, atBound: best === 0 || best === steps, evaluations };
}

/** Where f reaches `level` between the minimum `from` and the search bound `to` (log bisection); the bound if never. */
export function levelCrossing(f: (k: number) => number, from: number, to: number, level: number): number {
  if (f(to) <= level) return to;
  let inside = Math.log(from);
  let outside = Math.log(to);
  for (let k = 0; k < 60; k++) {
    const mid = 0.5 * (inside + outside);
    if (f(Math.exp(mid)) <= level) inside = mid;
    else outside = mid;
  }
  return Math.exp(0.5 * (inside + outside));
}

/**
 * The allowed rise of chi^2 above its minimum for a one-parameter range: Delta chi^2 = 1 (Press
 * et al. 2007, section 15.6), inflated by the reduced chi^2 chi^2_min / (N - 1) when the points
 * scatter more than their stated errors.
 */
export function chiSquareRise(chiSquareMin: number, count: number): number {
  return Math.max(1, count > 1 ? chiSquareMin / (count - 1) : 1);
}
