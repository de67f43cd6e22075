/**
 * Run length and output interval, with the cross-field rules outputEvery <= years and at most
 * 100,000 output intervals (each output keeps a whole profile in memory).
 */
import { formatNumber } from './formatNumber';
import { numberField } from './numberField';
import { SCENARIO_LIMITS as L } from './scenarioLimits';
import { strictObjectField } from './strictObjectField';

export const runSchema = strictObjectField('the run', {
  years: numberField(
    'the run length',
    'a',
    { min: 0, minExclusive: true, max: L.yearsMax },
    'Length of the run [a] from year 0 (1 a = 365.25 d).',
  ),
  outputEvery: numberField(
    'the output interval',
    'a',
    { min: 0, minExclusive: true, max: L.yearsMax },
    'Interval between output times [a]; at most the run length, and years / outputEvery at most 100,000.',
  ),
})
  .superRefine((run, ctx) => {
    const { years, outputEvery } = run;
    if (!(years > 0 && outputEvery > 0)) return;
    if (outputEvery > years) {
      ctx.addIssue({
        code: 'custom',
        path: ['outputEvery'],
        input: outputEvery,
        message: `the output interval must be at most the run length (${formatNumber(years)} a)`,
      });
    } else if (years / outputEvery > L.outputsMax) {
      ctx.addIssue({
        code: 'custom',
        path: ['outputEvery'],
        input: outputEvery,
        message: `a run of ${formatNumber(years)} a may have at most ${formatNumber(L.outputsMax)} output intervals; use an output interval of at least ${formatNumber(years / L.outputsMax)} a`,
      });
    }
  })
  .describe('How long to run and how often to record the glacier [a].');
