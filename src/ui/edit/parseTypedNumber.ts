/** A number as typed in a field: decimal point, optional exponent; anything else is refused with the reason. */
export type TypedNumber = { ok: true; value: number } | { ok: false; message: string };

const NUMBER = /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/;

export function parseTypedNumber(text: string): TypedNumber {
  // A true minus sign (as the app prints numbers) is accepted as typed back.
  const t = text.trim().replace(/\u2212/g, '-');
  if (NUMBER.test(t)) {
    const value = Number(t);
    if (Number.isFinite(value)) return { ok: true, value };
    return { ok: false, message: `"${text}" is too large to be a number here` };
  }
  if (t.includes(',')) {
    return { ok: false, message: `"${text}" is not a number; write decimals with a point (2.5) and no thousands separators` };
  }
  return { ok: false, message: `"${text}" is not a number; write e.g. 2800, 0.007 or 2.4e-24` };
}
