/**
 * The climate forcing series [[year a, warming K, precipitation factor -], ...]: years strictly
 * increasing, factor above 0. It replaces `warming` (model/climate.ts); the cross-field rule
 * `forcingConflicts` refuses it beside `warming` or `massBalance.precipitationPerK`.
 */
import * as z from 'zod';
import { formatNumber } from './formatNumber';
import { numberField } from './numberField';
import { SCENARIO_LIMITS as L } from './scenarioLimits';

const LAYOUT = '[year a, warming K, precipitation factor]';

export const forcingSchema = (() => {
  const listAllowed = `the forcing must be a list of 1 to ${formatNumber(L.pointsMax)} rows ${LAYOUT}`;
  const row = z
    .tuple(
      [
        numberField('the forcing year', 'a', { min: -L.yearAbsMax, max: L.yearAbsMax }, 'Model year [a].'),
        numberField('the forcing warming', 'K', { min: -L.warmingAbsMax, max: L.warmingAbsMax }, 'Warming relative to the year-0 climate of the scenario [K].'),
        numberField(
          'the precipitation factor',
          '',
          { min: 0, minExclusive: true, max: L.precipitationFactorMax },
          'Factor on the precipitation (accumulation) of the scenario [-]; 1: unchanged.',
        ),
      ],
      { error: `each row of the forcing must be a list of exactly three numbers ${LAYOUT}` },
    )
    .describe(`One year of forcing ${LAYOUT}.`);
  return z
    .array(row, { error: listAllowed })
    .min(1, { error: listAllowed })
    .max(L.pointsMax, { error: listAllowed })
    .superRefine((rows, ctx) => {
      for (let i = 1; i < rows.length; i++) {
        const previous = rows[i - 1][0];
        const current = rows[i][0];
        if (!(current > previous)) {
          ctx.addIssue({
            code: 'custom',
            path: [i, 0],
            input: current,
            message: `the year of each row of the forcing must be greater than the year of the row before it (${formatNumber(previous)} at index ${i - 1})`,
          });
        }
      }
    })
    .describe(
      `Climate forcing [${LAYOUT}, ...], years strictly increasing; piecewise linear, constant beyond the ends. ` +
        'Replaces warming (give one or the other); the factor multiplies the accumulation (linear, table) or precipitation (degree-day). Default: none.',
    );
})();

/** Forcing beside warming or beside a precipitation change per kelvin: both would set the same thing. */
export function forcingConflicts(scenario: { forcing?: unknown; warming?: unknown; massBalance?: unknown }) {
  const issues: { path: (string | number)[]; input: unknown; message: string }[] = [];
  if (scenario.forcing === undefined) return issues;
  if (scenario.warming !== undefined) {
    issues.push({
      path: ['forcing'],
      input: scenario.forcing,
      message: 'give either "warming" or "forcing", not both: the forcing carries its own warming',
    });
  }
  const mb = scenario.massBalance;
  if (mb && typeof mb === 'object' && 'precipitationPerK' in mb && mb.precipitationPerK !== undefined) {
    issues.push({
      path: ['massBalance', 'precipitationPerK'],
      input: mb.precipitationPerK,
      message: 'leave out the precipitation change per kelvin when a forcing is given: its precipitation factor already says how precipitation changes',
    });
  }
  return issues;
}
