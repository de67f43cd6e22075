/**
 * The valley cross-section key (model/physics/valleySection.ts): its shape and, for sloping
 * flanks, how much wider the ice surface is at 100 m of ice than the valley floor (`width`).
 * Cross-field rules: a section needs `width`; a side-drag table named for a rectangular or
 * parabolic section must be that section's own.
 */
import * as z from 'zod';
import type { SectionShape } from '../model/scenario';
import { numberField } from './numberField';
import { SCENARIO_LIMITS as L } from './scenarioLimits';
import { strictObjectField } from './strictObjectField';

export const sectionShapes = ['rectangular', 'trapezoidal', 'parabolic'] as const satisfies readonly SectionShape[];

export const sectionSchema = strictObjectField('the section', {
  shape: z
    .enum(sectionShapes, { error: 'the section shape must be "rectangular", "trapezoidal" or "parabolic"' })
    .describe(
      'Cross-section of the valley: "rectangular" (vertical walls), "trapezoidal" (straight flanks) or ' +
        '"parabolic" (a U-shaped valley: a parabola with a flat floor).',
    ),
  widening: numberField(
    'the section widening',
    'm',
    { min: 0, minExclusive: true, max: L.sectionWideningMax },
    'How much wider the ice surface is at 100 m of ice than the valley floor [m] (both flanks together); ' +
      'required for "trapezoidal" and "parabolic", absent for "rectangular". A trapezoid whose walls rise at ' +
      'angle theta has widening = 200 m / tan(theta).',
  ).optional(),
})
  .superRefine((section, ctx) => {
    if (section.shape === 'rectangular' && section.widening !== undefined) {
      ctx.addIssue({
        code: 'custom',
        path: ['widening'],
        input: section.widening,
        message: 'leave out the widening for a rectangular section: its walls are vertical',
      });
    } else if (section.shape !== 'rectangular' && section.widening === undefined) {
      ctx.addIssue({
        code: 'custom',
        path: ['widening'],
        input: section,
        message: `a ${section.shape} section needs "widening": how much wider the surface is at 100 m of ice than the floor, greater than 0 and at most ${L.sectionWideningMax.toLocaleString('en')} m`,
      });
    }
  })
  .describe(
    'Valley cross-section that follows the ice: "width" is then the valley-floor width, and the surface width ' +
      'and section area grow with the ice thickness (flux, continuity, volume, area and shape factor alike). ' +
      'Default: vertical walls at "width".',
  );

/** A section needs the floor width; a named side-drag table must match a rectangular or parabolic section. */
export function sectionConflicts(scenario: { section?: unknown; width?: unknown; shapeFactor?: unknown }) {
  const issues: { path: (string | number)[]; input: unknown; message: string }[] = [];
  const section = scenario.section;
  if (!section || typeof section !== 'object' || !('shape' in section)) return issues;
  if (scenario.width === undefined) {
    issues.push({
      path: ['section'],
      input: section,
      message: 'a section needs "width", the valley-floor width [[x m, width m], ...]; without it the flowline has unit width',
    });
  }
  const shape = section.shape;
  const table = scenario.shapeFactor;
  if (
    (shape === 'rectangular' || shape === 'parabolic') &&
    table !== null &&
    typeof table === 'object' &&
    'crossSection' in table &&
    table.crossSection !== shape
  ) {
    issues.push({
      path: ['shapeFactor', 'crossSection'],
      input: table.crossSection,
      message: `the side-drag table must be the section's own: "${shape}" for a ${shape} section`,
    });
  }
  return issues;
}
