/**
 * Number formatting for parameter values: plain decimals in the everyday range, otherwise
 * "2.4 × 10⁻²⁴", which reads better on a projector than "2.4e-24".
 */
const SUPERSCRIPT: Record<string, string> = {
  '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹', '-': '⁻',
};

/** Superscript form of an integer, e.g. -24 -> "⁻²⁴"; non-integers fall back to "^x". */
export function superscript(value: number): string {
  if (!Number.isInteger(value)) return `^${value}`;
  return String(value)
    .split('')
    .map((c) => SUPERSCRIPT[c])
    .join('');
}

/** Up to `digits` significant figures, with a true minus sign; scientific notation outside 0.001 <= |v| < 100000. */
export function formatScientific(value: number, digits = 3): string {
  if (value === 0 || !Number.isFinite(value)) return String(value);
  const magnitude = Math.abs(value);
  if (magnitude >= 1e-3 && magnitude < 1e5) return minus(String(Number(value.toPrecision(digits))));
  const exponent = Math.floor(Math.log10(magnitude));
  // Rounding can carry the mantissa to 10 (9.999e-5 -> 10 × 10⁻⁵); renormalise.
  let mantissa = Number((value / 10 ** exponent).toPrecision(digits));
  let e = exponent;
  if (Math.abs(mantissa) >= 10) {
    mantissa /= 10;
    e += 1;
  }
  return `${minus(String(mantissa))} × 10${superscript(e)}`;
}

/** A true minus sign (U+2212), as the plot's tick labels use, instead of a hyphen. */
function minus(text: string): string {
  return text.replace('-', '\u2212');
}
