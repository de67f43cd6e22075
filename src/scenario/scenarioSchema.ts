/**
 * The zod schema of the scenario format, version 1: the single definition from which both the
 * validator (validateScenario) and the published JSON Schema (scenarioJsonSchema) are derived.
 * Every field carries a description with its unit; every failure a sentence saying what is allowed.
 * Cross-field rules live in superRefine steps beside the fields they join.
 */
import * as z from 'zod';
import type {
  CrossSection,
  DegreeDayBalanceSpec,
  GridSpec,
  IceSpec,
  LinearBalanceSpec,
  NumericsSpec,
  RunSpec,
  Scenario,
  SectionShape,
  SectionSpec,
  SlidingSpec,
  TableBalanceSpec,
  VariabilitySpec,
  FrontalAblationSpec,
} from '../model/scenario';
import { SCENARIO_FORMAT, SCENARIO_VERSION } from '../model/scenario';
import { forcingConflicts, forcingSchema } from './forcingSchema';
import { gridSchema } from './gridSchema';
import { iceSchema } from './iceSchema';
import { massBalanceSchema } from './massBalanceSchema';
import { numberField } from './numberField';
import { pointList } from './pointList';
import { numericsSchema } from './numericsSchema';
import { observationsOutsideDomain, observationsSchema } from './observationsSchema';
import { runSchema } from './runSchema';
import { sectionConflicts, sectionSchema, sectionShapes } from './sectionSchema';
import { SCENARIO_LIMITS as L } from './scenarioLimits';
import { slidingSchema } from './slidingSchema';
import { startCrossFieldIssues, startSchema } from './startSchema';
import { strictObjectField } from './strictObjectField';
import { variabilitySchema } from './variabilitySchema';

const position = (what: string) =>
  numberField(
    what,
    'm',
    { min: -L.positionAbsMax, max: L.positionAbsMax },
    'Distance along the flowline from the head of the valley [m]; points beyond the domain are allowed.',
  );

const crossSections = ['parabolic', 'semi-elliptic', 'rectangular'] as const;

const shapeFactorSchema = z
  .union(
    [
      numberField('the shape factor', '', { min: 0, minExclusive: true, max: 1 }, 'Constant shape factor f [-].'),
      strictObjectField('the shape factor', {
        crossSection: z
          .enum(crossSections, { error: 'the cross section must be "parabolic", "semi-elliptic" or "rectangular"' })
          .describe('Cross-section shape; f follows from the width and the ice thickness (Nye 1965).'),
      }).describe('Shape factor computed from the cross-section shape.'),
    ],
    {
      error:
        'the shape factor must be a number greater than 0 and at most 1, or {"crossSection": "parabolic" | "semi-elliptic" | "rectangular"}',
    },
  )
  .describe('Shape factor for side drag [-]: a number in (0, 1], or a cross-section shape. Default 1.');

/** The bed, required in a scenario and optional in the inversion's input (validateInversionInput). */
export const bedSchema = pointList({
  what: 'the bed',
  layout: '[x m, elevation m a.s.l.]',
  xName: 'x',
  x: position('the bed x'),
  y: numberField('the bed elevation', 'm a.s.l.', { min: L.bedMin, max: L.bedMax }, 'Bed elevation [m a.s.l.].'),
  minPoints: 2,
  description:
    'Bed elevation [[x m, elevation m a.s.l.], ...], x strictly increasing; piecewise linear, ' +
    'constant beyond the first and last point.',
});

/**
 * The keys of a scenario, shared by the scenario schema and the inversion's input schema (which
 * differs only in leaving out the bed), so that the two cannot drift apart.
 */
export const scenarioShape = {
  format: z
    .literal(SCENARIO_FORMAT, { error: `"format" must be exactly "${SCENARIO_FORMAT}"` })
    .describe(`Identifies the file as a Firnline scenario: always "${SCENARIO_FORMAT}".`),
  version: z
    .literal(SCENARIO_VERSION, {
      error: `"version" must be ${SCENARIO_VERSION}, the only format version this program reads`,
    })
    .describe(`Format version: always ${SCENARIO_VERSION}.`),
  name: z
    .string({ error: `the name must be a string of at most ${L.nameMaxLength} characters` })
    .max(L.nameMaxLength, { error: `the name must be a string of at most ${L.nameMaxLength} characters` })
    .describe(`Free-text name of the scenario, at most ${L.nameMaxLength} characters.`)
    .optional(),
  grid: gridSchema,
  bed: bedSchema,
  width: pointList({
    what: 'the width',
    layout: '[x m, width m]',
    xName: 'x',
    x: position('the width x'),
    y: numberField('the width', 'm', { min: 0, minExclusive: true, max: L.widthMax }, 'Glacier width [m].'),
    minPoints: 1,
    description:
      'Glacier width [[x m, width m], ...], x strictly increasing; piecewise linear, constant beyond the ends. ' +
      'Default: 1 m everywhere (a unit-width flowline; volumes are in m^3 per m of width).',
  }).optional(),
  shapeFactor: shapeFactorSchema.optional(),
  section: sectionSchema.optional(),
  surface: pointList({
    what: 'the surface',
    layout: '[x m, elevation m a.s.l.]',
    xName: 'x',
    x: position('the surface x'),
    y: numberField(
      'the surface elevation',
      'm a.s.l.',
      { min: L.elevationMin, max: L.elevationMax },
      'Ice-surface elevation [m a.s.l.].',
    ),
    minPoints: 1,
    description:
      'Initial ice surface [[x m, elevation m a.s.l.], ...], x strictly increasing; piecewise linear, ' +
      'constant beyond the ends, clipped to the bed. Default: ice-free.',
  }).optional(),
  debris: pointList({
    what: 'the debris cover',
    layout: '[x m, debris thickness m]',
    xName: 'x',
    x: position('the debris x'),
    y: numberField('the debris thickness', 'm', { min: 0, max: L.debrisThicknessMax }, 'Thickness of the debris cover [m].'),
    minPoints: 1,
    description:
      'Debris cover [[x m, thickness m], ...], x strictly increasing; piecewise linear, constant beyond the ends. ' +
      'Ablation is multiplied by 0.066 / (0.066 + thickness) (Anderson & Anderson 2016); accumulation is untouched. Default: bare ice.',
  }).optional(),
  frontalAblation: strictObjectField('the frontal ablation', {
    waterDepthCoefficient: numberField(
      'the water-depth coefficient',
      'a^-1',
      { min: 0, max: L.frontalAblationCoefficientMax },
      'c in the calving rate u_c = c * D_w [a^-1], D_w the depth of a lake at the ice front [m]: about 27 for ' +
        'tidewater (Brown, Meier & Post 1982), an order smaller in fresh water (Funk & Röthlisberger 1989; ' +
        'Warren & Kirkbride 2003). 0: no calving.',
    ),
  })
    .describe(
      'Frontal ablation into a lake at the ice front: the calving flux c * D_w * H_front * w_front [m^3 a^-1] leaves the ' +
        'terminus cell after each step. Default: none.',
    )
    .optional(),
  ice: iceSchema,
  sliding: slidingSchema.optional(),
  massBalance: massBalanceSchema,
  warming: pointList({
    what: 'the warming',
    layout: '[year a, warming K]',
    xName: 'year',
    x: numberField('the warming year', 'a', { min: -L.yearAbsMax, max: L.yearAbsMax }, 'Model year [a].'),
    y: numberField(
      'the warming',
      'K',
      { min: -L.warmingAbsMax, max: L.warmingAbsMax },
      'Warming relative to year 0 climate [K].',
    ),
    minPoints: 1,
    description:
      'Warming dT(t) [[year a, K], ...], year strictly increasing; piecewise linear, constant beyond the ends. ' +
      'Default: no warming.',
  }).optional(),
  forcing: forcingSchema.optional(),
  variability: variabilitySchema.optional(),
  spinup: z
    .boolean({ error: 'spinup must be true or false' })
    .describe('true: first reach a steady state under the year-0 climate, then run from year 0.')
    .optional(),
  start: startSchema.optional(),
  run: runSchema,
  numerics: numericsSchema.optional(),
  observations: observationsSchema.optional(),
};

/**
 * Cross-field rules between top-level keys: observation positions inside the domain; the start's
 * needs (startSchema.ts); a forcing series alone; a section with its floor width and its own
 * side-drag table (sectionSchema.ts).
 */
export function scenarioCrossFieldRules(
  scenario: {
    grid?: unknown;
    observations?: unknown;
    start?: unknown;
    spinup?: unknown;
    surface?: unknown;
    forcing?: unknown;
    warming?: unknown;
    massBalance?: unknown;
    section?: unknown;
    width?: unknown;
    shapeFactor?: unknown;
  },
  ctx: z.RefinementCtx,
): void {
  for (const issue of observationsOutsideDomain(scenario)) ctx.addIssue({ code: 'custom', ...issue });
  for (const issue of startCrossFieldIssues(scenario)) ctx.addIssue({ code: 'custom', ...issue });
  for (const issue of forcingConflicts(scenario)) ctx.addIssue({ code: 'custom', ...issue });
  for (const issue of sectionConflicts(scenario)) ctx.addIssue({ code: 'custom', ...issue });
}

export const scenarioSchema = strictObjectField('a scenario', scenarioShape)
  .superRefine(scenarioCrossFieldRules)
  .describe('A Firnline scenario: one glacier flowline experiment.');

// Compile-time proof that the schema produces exactly the Scenario type: each side assignable to
// the other (ignoring readonly, which zod cannot express for tuples), and the same keys in every
// object, so an optional key added on one side only is caught too. A mismatch fails `tsc`.
type Mutable<T> = { -readonly [K in keyof T]: Mutable<T[K]> };
type Assert<T extends true> = T;
type Same<A, B> = [A] extends [B] ? ([B] extends [A] ? true : false) : false;
type Parsed = z.infer<typeof scenarioSchema>;
type Balance<M> = Extract<Parsed['massBalance'], { model: M }>;
type _SchemaGivesScenario = Assert<Parsed extends Scenario ? true : false>;
type _ScenarioFitsSchema = Assert<Mutable<Scenario> extends Parsed ? true : false>;
type _SameKeys = Assert<
  Same<
    [
      keyof Scenario,
      keyof GridSpec,
      keyof IceSpec,
      keyof SlidingSpec,
      keyof RunSpec,
      keyof NumericsSpec,
      keyof VariabilitySpec,
      keyof FrontalAblationSpec,
      keyof SectionSpec,
      keyof LinearBalanceSpec,
      keyof TableBalanceSpec,
      keyof DegreeDayBalanceSpec,
      CrossSection,
      SectionShape,
    ],
    [
      keyof Parsed,
      keyof Parsed['grid'],
      keyof Parsed['ice'],
      keyof NonNullable<Parsed['sliding']>,
      keyof Parsed['run'],
      keyof NonNullable<Parsed['numerics']>,
      keyof NonNullable<Parsed['variability']>,
      keyof NonNullable<Parsed['frontalAblation']>,
      keyof NonNullable<Parsed['section']>,
      keyof Balance<'linear'>,
      keyof Balance<'table'>,
      keyof Balance<'degree-day'>,
      (typeof crossSections)[number],
      (typeof sectionShapes)[number],
    ]
  >
>;
