/**
 * Ice rheology: Glen's exponent, the rate factor given directly or through the ice temperature,
 * and density. Cross-field rules: exactly one of A and temperature; enhancement only with
 * temperature; A * (100 kPa)^n at most 1e-5 s^-1 (an n-independent ceiling on A).
 */
import { formatNumber } from './formatNumber';
import { numberField } from './numberField';
import { SCENARIO_LIMITS as L } from './scenarioLimits';
import { strictObjectField } from './strictObjectField';

export const iceSchema = strictObjectField('the ice', {
  n: numberField("Glen's exponent n", '', { min: L.nMin, max: L.nMax }, "Exponent n of Glen's flow law [-]; 3 is usual."),
  A: numberField(
    'the rate factor A',
    'Pa^-n s^-1',
    { min: 0, minExclusive: true },
    "Rate factor A of Glen's flow law [Pa^-n s^-1]. Give exactly one of A and temperature. " +
      'A * (100 kPa)^n may be at most 1e-5 s^-1 (A <= 1e-20 for n = 3).',
  ).optional(),
  temperature: numberField(
    'the ice temperature',
    'deg C',
    { min: L.temperatureMin, max: L.temperatureMax },
    'Ice temperature relative to the pressure-melting point [deg C, at most 0], used instead of A: ' +
      'A follows from the Arrhenius relation with this as the homologous temperature.',
  ).optional(),
  enhancement: numberField(
    'the enhancement factor',
    '',
    { min: 0, minExclusive: true, max: L.enhancementMax },
    'Enhancement factor E [-] multiplying A from temperature; only with temperature. Default 1.',
  ).optional(),
  density: numberField(
    'the ice density',
    'kg m^-3',
    { min: L.densityMin, max: L.densityMax },
    'Ice density [kg m^-3]. Default 910.',
  ).optional(),
})
  .superRefine((ice, ctx) => {
    const hasA = ice.A !== undefined;
    const hasTemperature = ice.temperature !== undefined;
    if (hasA === hasTemperature) {
      ctx.addIssue({
        code: 'custom',
        path: [],
        input: ice,
        message: hasA
          ? 'give exactly one of "A" and "temperature", not both: A is computed from the temperature'
          : 'give exactly one of "A" (the rate factor, Pa^-n s^-1) and "temperature" (deg C, at most 0, from which A is computed)',
      });
      return;
    }
    if (hasA && ice.enhancement !== undefined) {
      ctx.addIssue({
        code: 'custom',
        path: ['enhancement'],
        input: ice.enhancement,
        message: 'the enhancement factor applies only to A computed from "temperature"; with "A" given, fold it into A',
      });
    }
    const { n, A } = ice;
    if (A !== undefined && A > 0 && n >= L.nMin && n <= L.nMax) {
      const strainRate = A * Math.pow(L.referenceStress, n);
      if (strainRate > L.strainRateMax) {
        const largest = L.strainRateMax / Math.pow(L.referenceStress, n);
        ctx.addIssue({
          code: 'custom',
          path: ['A'],
          input: A,
          message: `with n = ${formatNumber(n)}, A * (100 kPa)^n must be at most ${formatNumber(L.strainRateMax)} s^-1, so A may be at most ${formatNumber(Number(largest.toPrecision(4)))} Pa^-${formatNumber(n)} s^-1`,
        });
      }
    }
  })
  .meta({
    description: "Ice properties: Glen's flow law (strain rate = A tau^n) and density.",
    // The two key-presence rules JSON Schema can state, so that editors flag them too.
    oneOf: [{ required: ['A'] }, { required: ['temperature'] }],
    dependentRequired: { enhancement: ['temperature'] },
  });
