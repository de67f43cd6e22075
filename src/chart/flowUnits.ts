/**
 * Units of the flow-law and sliding parameters with the scenario's exponents written in: A in
 * Pa⁻ⁿ s⁻¹ is Pa⁻³ s⁻¹ for n = 3 and Pa⁻⁴ s⁻¹ for n = 4; C in m a⁻¹ Pa⁻ᵐ likewise with m.
 */
import { superscript } from './formatScientific';

export const rateFactorUnit = (n: number): string => `Pa${superscript(-n)} s${superscript(-1)}`;

export const slidingCoefficientUnit = (m: number): string => `m a${superscript(-1)} Pa${superscript(-m)}`;

/** A unit written with the placeholders Pa⁻ⁿ and Pa⁻ᵐ, with the exponents put in. */
export function withExponents(unit: string, n: number, m: number): string {
  return unit.replace('Pa⁻ⁿ', `Pa${superscript(-n)}`).replace('Pa⁻ᵐ', `Pa${superscript(-m)}`);
}
