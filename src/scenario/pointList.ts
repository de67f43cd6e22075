/**
 * Point lists [[x, y], ...]: piecewise-linear curves whose x must be strictly increasing.
 */
import * as z from 'zod';
import { formatNumber } from './formatNumber';
import { SCENARIO_LIMITS } from './scenarioLimits';

export interface PointListOptions {
  /** The list in a sentence: "the bed". */
  what: string;
  /** Point layout for messages: "[x m, elevation m a.s.l.]". */
  layout: string;
  /** Name of the first coordinate in messages: "x", "elevation", "year". */
  xName: string;
  x: z.ZodNumber;
  y: z.ZodNumber;
  minPoints: number;
  description: string;
}

export function pointList(options: PointListOptions) {
  const { what, layout, xName, minPoints } = options;
  const max = SCENARIO_LIMITS.pointsMax;
  const listAllowed = `${what} must be a list of ${formatNumber(minPoints)} to ${formatNumber(max)} points ${layout}`;
  const point = z
    .tuple([options.x, options.y], {
      error: `each point of ${what} must be a list of exactly two numbers ${layout}`,
    })
    .describe(`One point ${layout}.`);
  return z
    .array(point, { error: listAllowed })
    .min(minPoints, { error: listAllowed })
    .max(max, { error: listAllowed })
    .superRefine((points, ctx) => {
      for (let i = 1; i < points.length; i++) {
        const previous = points[i - 1][0];
        const current = points[i][0];
        if (!(current > previous)) {
          ctx.addIssue({
            code: 'custom',
            path: [i, 0],
            input: current,
            message: `the ${xName} of each point of ${what} must be greater than the ${xName} of the point before it (${formatNumber(previous)} at index ${i - 1})`,
          });
        }
      }
    })
    .describe(options.description);
}
