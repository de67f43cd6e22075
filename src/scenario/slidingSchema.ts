/**
 * Basal sliding u_b = C tau_b^m. C's unit (m a^-1 Pa^-m) depends on m, so its ceiling is set on
 * the speed C * (100 kPa)^m rather than on C itself.
 */
import { formatNumber } from './formatNumber';
import { numberField } from './numberField';
import { SCENARIO_LIMITS as L } from './scenarioLimits';
import { strictObjectField } from './strictObjectField';

export const slidingSchema = strictObjectField('sliding', {
  C: numberField(
    'the sliding coefficient C',
    'm a^-1 Pa^-m',
    { min: 0 },
    'Sliding coefficient C [m a^-1 Pa^-m]; 0 disables sliding. C * (100 kPa)^m may be at most 1,000,000 m a^-1.',
  ),
  m: numberField('the sliding exponent m', '', { min: L.slidingExponentMin, max: L.slidingExponentMax }, 'Sliding exponent m [-].'),
})
  .superRefine((sliding, ctx) => {
    const { C, m } = sliding;
    if (!(C > 0 && m >= L.slidingExponentMin && m <= L.slidingExponentMax)) return;
    if (C * Math.pow(L.referenceStress, m) > L.slidingSpeedMax) {
      const largest = L.slidingSpeedMax / Math.pow(L.referenceStress, m);
      ctx.addIssue({
        code: 'custom',
        path: ['C'],
        input: C,
        message: `with m = ${formatNumber(m)}, the sliding speed at 100 kPa basal shear stress, C * (100 kPa)^m, must be at most ${formatNumber(L.slidingSpeedMax)} m a^-1, so C may be at most ${formatNumber(Number(largest.toPrecision(4)))} m a^-1 Pa^-m`,
      });
    }
  })
  .describe('Basal sliding u_b = C tau_b^m [m a^-1]; absent or C = 0: no sliding.');
