/**
 * Exact steady state over a bedrock step, after Jarosch, Schoof & Anslow (2013, The Cryosphere 7,
 * 229-240): flat bed at height `stepHeight` up to `stepPosition`, at 0 beyond; the balance is
 * chosen so that the steady flux is
 *
 *   q(x) = x^n (xm - x)^n / xm^(2n-1)   for 0 <= x <= xm,   i.e.  b = dq/dx,
 *
 * so the ice ends at xm. On each flat stretch the shallow-ice steady equation
 * Gamma H^(n+2) |dH/dx|^n = q integrates to
 *
 *   H(x)^((2n+2)/n) = H(x1)^((2n+2)/n) + ((2n+2)/n) Gamma^(-1/n) * integral_x^x1 q^(1/n) dx'
 *
 * with q^(1/n) = x (xm - x) / xm^((2n-1)/n), integrated in closed form. Below the cliff the
 * profile runs up-valley from the margin (H = 0 at xm). The surface below the cliff lies lower than
 * the cliff top, so above the cliff the ice thins to H = 0 at the cliff edge (an infinite surface
 * slope carrying the finite flux q(xs), as at a margin) and the surface drops at the cliff. Derived here from the stated flux,
 * not copied from the paper. The parameters (n = 3, A = 1e-16 Pa^-3 a^-1, rho = 910, a 500 m
 * step at 7 km, xm = 20 km) and the form of q are the paper's set-up as we recall it (from
 * memory; not checked against the printed paper), so this test verifies the model against our
 * own derivation for that set-up, not against numbers read from the paper.
 */
export interface StepParameters {
  n: number;
  gamma: number;
  marginPosition: number;
  stepPosition: number;
  stepHeight: number;
}

export function stepBalance(p: StepParameters, x: number): number {
  // Beyond the exact margin the ground is bare: any negative balance keeps it so.
  if (x < 0 || x > p.marginPosition) return -1;
  return stepBalanceAt(p, x);
}

function stepBalanceAt(p: StepParameters, x: number): number {
  const { n, marginPosition: xm } = p;
  // d/dx [x^n (xm - x)^n] / xm^(2n-1)
  return (n * x ** (n - 1) * (xm - x) ** (n - 1) * (xm - 2 * x)) / xm ** (2 * n - 1);
}

export function stepFlux(p: StepParameters, x: number): number {
  const { n, marginPosition: xm } = p;
  if (x <= 0 || x >= xm) return 0;
  return (x ** n * (xm - x) ** n) / xm ** (2 * n - 1);
}

/** Antiderivative of x (xm - x): xm x^2 / 2 - x^3 / 3. */
function primitive(xm: number, x: number): number {
  return (xm * x * x) / 2 - (x * x * x) / 3;
}

export function stepThickness(p: StepParameters, x: number): number {
  const { n, gamma, marginPosition: xm, stepPosition: xs, stepHeight } = p;
  if (x >= xm) return 0;
  const power = (2 * n + 2) / n;
  const factor = (power / gamma ** (1 / n)) / xm ** ((2 * n - 1) / n);
  const below = (from: number, to: number) => factor * (primitive(xm, to) - primitive(xm, from));
  if (x >= xs) return below(x, xm) ** (1 / power);
  // Only valid while the ice below the cliff is thinner than the cliff is high (true for the
  // paper's numbers); otherwise the surface would be continuous and this profile would not apply.
  if (below(xs, xm) ** (1 / power) >= stepHeight) throw new Error('step lower than the ice below it');
  return below(x, xs) ** (1 / power);
}
