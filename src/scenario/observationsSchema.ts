/**
 * `observations`: what was measured on the glacier, for the bed inversion and calibration. The
 * contract is the Observations type in src/model/scenario.ts. Rules:
 *   - every position is a finite number in the domain [0, grid.length] (the field allows 0 to
 *     1000 km; the cross-field rule against grid.length is `observationsOutsideDomain`, run by
 *     the scenario schema, which knows the grid);
 *   - positions of a list, and the years of the terminus record, strictly increasing: two
 *     measurements at one place are combined into one value with its uncertainty first;
 *   - thickness and speed at least 0; uncertainties greater than 0 (a zero uncertainty cannot
 *     weight a fit);
 *   - elevationChange and geodeticBalance over a period with `from` before `to`.
 */
import * as z from 'zod';
import type { Observations } from '../model/scenario';
import { formatNumber } from './formatNumber';
import { numberField, rangeRuleSentence } from './numberField';
import { pointList } from './pointList';
import { SCENARIO_LIMITS as L } from './scenarioLimits';
import { strictObjectField } from './strictObjectField';

const ZERO_UNCERTAINTY =
  'a zero uncertainty cannot weight a fit (the point would count infinitely more than every other)';

/** A position in the domain; the upper end here is the longest domain, grid.length is checked later. */
const position = (what: string) =>
  numberField(
    what,
    'm',
    { min: 0, max: L.gridLengthMax },
    'Distance along the flowline from the head of the valley [m]; must lie in the domain [0, grid.length].',
  );

const year = (what: string, description: string) =>
  numberField(what, 'a', { min: -L.yearAbsMax, max: L.yearAbsMax }, description);

interface ObservedPointsOptions {
  /** "thickness observation": one point in a sentence. */
  one: string;
  /** "the observed thickness". */
  valueName: string;
  unit: string;
  max: number;
  valueDescription: string;
  description: string;
}

/** [[x m, value, uncertainty], ...], 1 to 10,000 points, x strictly increasing. */
function observedPoints(o: ObservedPointsOptions) {
  const layout = `[x m, value ${o.unit}, uncertainty ${o.unit}]`;
  const listAllowed = `the ${o.one}s must be a list of 1 to ${formatNumber(L.pointsMax)} points ${layout}`;
  const point = z
    .tuple(
      [
        position(`the x of each ${o.one}`),
        numberField(o.valueName, o.unit, { min: 0, max: o.max }, o.valueDescription),
        numberField(
          `the uncertainty of each ${o.one}`,
          o.unit,
          { min: 0, minExclusive: true, max: o.max },
          `One-sigma uncertainty [${o.unit}], greater than 0.`,
          ZERO_UNCERTAINTY,
        ),
      ],
      { error: `each ${o.one} must be a list of exactly three numbers ${layout}` },
    )
    .describe(`One ${o.one} ${layout}.`);
  return z
    .array(point, { error: listAllowed })
    .min(1, { error: listAllowed })
    .max(L.pointsMax, { error: listAllowed })
    .superRefine((points, ctx) => {
      for (let i = 1; i < points.length; i++) {
        const previous = points[i - 1][0];
        const current = points[i][0];
        if (!(current > previous)) {
          ctx.addIssue({
            code: 'custom',
            path: [i, 0],
            input: current,
            message:
              `the x of each ${o.one} must be greater than the x of the one before it (${formatNumber(previous)} at index ${i - 1}); ` +
              'combine measurements at one position into one value with its uncertainty',
          });
        }
      }
    })
    .describe(o.description);
}

/** `from` before `to`, reported at `to`. */
function periodRule(what: string) {
  return (period: { from: number; to: number }, ctx: z.core.$RefinementCtx<{ from: number; to: number }>) => {
    const { from, to } = period;
    if (!(Number.isFinite(from) && Number.isFinite(to)) || to > from) return;
    ctx.addIssue({
      code: 'custom',
      path: ['to'],
      input: to,
      message: `the end year "to" of ${what} must be later than its start year "from" (${formatNumber(from)} a)`,
    });
  };
}

const terminusRecord = pointList({
  what: 'the terminus record',
  layout: '[year a, x m]',
  xName: 'year',
  x: year('the year of each terminus position', 'Model year of the terminus position [a].'),
  y: position('the terminus position'),
  minPoints: 1,
  description:
    'Terminus positions in time [[year a, x m], ...], years strictly increasing; each x in the domain [0, grid.length].',
});

const terminusSchema = z
  .union(
    [
      position('the terminus position').describe(
        'Terminus position [m] in the year of the observations; must lie in the domain [0, grid.length].',
      ),
      terminusRecord,
    ],
    {
      error:
        'the terminus must be a position in metres, or a record [[year a, x m], ...] with the years strictly increasing',
    },
  )
  .describe('Terminus position [m], or a record of positions [[year a, x m], ...] in time order.');

const elevationChangeSchema = strictObjectField('the elevation change', {
  from: year('the start year "from" of the elevation change', 'First year of the period [a].'),
  to: year('the end year "to" of the elevation change', 'Last year of the period [a]; later than "from".'),
  points: pointList({
    what: 'the elevation change',
    layout: '[x m, rate m a^-1]',
    xName: 'x',
    x: position('the x of each elevation-change point'),
    y: numberField(
      'the rate of elevation change',
      'm a^-1',
      { min: -L.elevationChangeAbsMax, max: L.elevationChangeAbsMax },
      'Mean rate of surface elevation change over the period [m a^-1]; negative for thinning.',
    ),
    minPoints: 1,
    description:
      'Surface elevation change [[x m, m a^-1], ...], x strictly increasing, each x in the domain [0, grid.length].',
  }),
})
  .superRefine(periodRule('the elevation change'))
  .describe('Surface elevation change over the years "from" to "to" [m a^-1].');

const geodeticBalanceSchema = strictObjectField('the geodetic balance', {
  from: year('the start year "from" of the geodetic balance', 'First year of the period [a].'),
  to: year('the end year "to" of the geodetic balance', 'Last year of the period [a]; later than "from".'),
  value: numberField(
    'the geodetic balance',
    'm w.e. a^-1',
    { min: -L.balanceAbsMax, max: L.balanceAbsMax },
    'Glacier-wide mean mass balance over the period [m w.e. a^-1].',
  ),
})
  .superRefine(periodRule('the geodetic balance'))
  .describe('Glacier-wide geodetic mass balance over the years "from" to "to" [m w.e. a^-1].');

export const observationsSchema = strictObjectField('the observations', {
  year: year(
    'the year of the observations',
    'Model year [a] that the thickness, speed and single terminus observations describe. Default 0.',
  ).optional(),
  terminus: terminusSchema.optional(),
  thickness: observedPoints({
    one: 'thickness observation',
    valueName: 'the observed thickness',
    unit: 'm',
    max: L.observedThicknessMax,
    valueDescription: 'Ice thickness from radar or a borehole [m].',
    description:
      'Ice thickness [[x m, thickness m, uncertainty m], ...], x strictly increasing, each x in the domain [0, grid.length]; ' +
      'uncertainty one sigma, greater than 0.',
  }).optional(),
  surfaceSpeed: observedPoints({
    one: 'surface-speed observation',
    valueName: 'the observed surface speed',
    unit: 'm a^-1',
    max: L.observedSpeedMax,
    valueDescription: 'Surface speed [m a^-1].',
    description:
      'Surface speed [[x m, speed m a^-1, uncertainty m a^-1], ...], x strictly increasing, each x in the domain ' +
      '[0, grid.length]; uncertainty one sigma, greater than 0.',
  }).optional(),
  elevationChange: elevationChangeSchema.optional(),
  geodeticBalance: geodeticBalanceSchema.optional(),
}).describe('Measurements on the glacier, for the bed inversion and calibration. All keys optional.');

/** Where an observation position is, its JSON Pointer below /observations, and how to name it. */
interface ObservedPosition {
  path: (string | number)[];
  x: unknown;
  what: string;
}

const isObject = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);

/** The x of every point of a list whose items are arrays (anything else is the field's error). */
function listPositions(list: unknown, path: (string | number)[], index: 0 | 1, what: string): ObservedPosition[] {
  if (!Array.isArray(list)) return [];
  const out: ObservedPosition[] = [];
  list.forEach((item: unknown, i) => {
    if (Array.isArray(item)) out.push({ path: [...path, i, index], x: item[index], what });
  });
  return out;
}

function observedPositions(o: Record<string, unknown>): ObservedPosition[] {
  const base = ['observations'];
  const positions: ObservedPosition[] = [];
  if (typeof o.terminus === 'number') positions.push({ path: [...base, 'terminus'], x: o.terminus, what: 'the terminus position' });
  else positions.push(...listPositions(o.terminus, [...base, 'terminus'], 1, 'each terminus position'));
  positions.push(...listPositions(o.thickness, [...base, 'thickness'], 0, 'the x of each thickness observation'));
  positions.push(...listPositions(o.surfaceSpeed, [...base, 'surfaceSpeed'], 0, 'the x of each surface-speed observation'));
  if (isObject(o.elevationChange)) {
    positions.push(
      ...listPositions(o.elevationChange.points, [...base, 'elevationChange', 'points'], 0, 'the x of each elevation-change point'),
    );
  }
  return positions;
}

/**
 * The cross-field rule the observations field cannot check alone: every position inside the
 * domain [0, grid.length]. Run on the whole scenario; the data may hold other errors (zod runs
 * refinements when only range errors were found), so everything is checked before it is used,
 * and a position that already failed its own range (negative, beyond 1000 km) is not reported twice.
 */
export function observationsOutsideDomain(scenario: { grid?: unknown; observations?: unknown }): {
  path: (string | number)[];
  input: number;
  message: string;
}[] {
  const { grid, observations } = scenario;
  if (!isObject(grid) || !isObject(observations)) return [];
  const length = grid.length;
  if (typeof length !== 'number' || !(length > 0 && length <= L.gridLengthMax)) return [];
  const issues = [];
  for (const p of observedPositions(observations)) {
    if (typeof p.x === 'number' && p.x > length && p.x <= L.gridLengthMax) {
      issues.push({
        path: p.path,
        input: p.x,
        message: rangeRuleSentence({
          what: p.what,
          unit: 'm',
          range: { min: 0, max: length },
          template: (range) => `${p.what} must lie within the domain, ${range} (grid.length)`,
        }),
      });
    }
  }
  return issues;
}

// Compile-time proof that the schema gives exactly the Observations type (see scenarioSchema.ts).
type Assert<T extends true> = T;
type Parsed = z.infer<typeof observationsSchema>;
type Mutable<T> = { -readonly [K in keyof T]: Mutable<T[K]> };
type _SchemaGivesObservations = Assert<Parsed extends Observations ? true : false>;
type _ObservationsFitSchema = Assert<Mutable<Observations> extends Parsed ? true : false>;
type _SameKeys = Assert<
  [keyof Observations] extends [keyof Parsed] ? ([keyof Parsed] extends [keyof Observations] ? true : false) : false
>;
