/**
 * Numbers in the limits that messages quote: shortest round-trip form, thousands separators for
 * large integers so that 100000 and 1000000 are told apart at a glance, exponents for tiny values.
 */
export function formatNumber(value: number): string {
  if (Object.is(value, -0)) return '-0';
  if (Number.isInteger(value) && Math.abs(value) >= 10_000 && Math.abs(value) < 1e21) {
    return String(value).replace(/\B(?=(\d{3})+$)/g, ',');
  }
  // 1e-5 reads better than 0.00001; String() switches to exponents only below 1e-6.
  if (value !== 0 && Math.abs(value) < 1e-3) return value.toExponential();
  return String(value);
}
