/**
 * `start`: begin the run from the glacier as it is today instead of a steady state (the contract
 * is StartSpec in src/model/scenario.ts; the method in src/model/todayStart.ts). Rules beside the
 * other keys (`startCrossFieldIssues`, run by the scenario schema): no `spinup: true` with it
 * (spinup is the steady start), the observed glacier (/surface) given, the observation year 0
 * (the run starts at year 0, the observation year), and a fitted transient start needs the
 * observed terminus.
 */
import * as z from 'zod';
import { MAX_OFFSET_K } from '../model/todayStart';
import { numberField } from './numberField';
import { strictObjectField } from './strictObjectField';

/** Earliest start year of a transient start [a]: every candidate runs the history from it. */
export const START_YEAR_MIN = -10000;

const FROM_ALLOWED = 'the start must be {"from": "observed"} or {"from": "transient", "startYear": ..., "climateOffset"?: ...}';

export const startSchema = z
  .discriminatedUnion(
    'from',
    [
      strictObjectField('the observed start', {
        from: z.literal('observed').describe('"observed": from the surface (/surface) over the bed as given, at year 0.'),
      }).describe('Start at year 0 (the observation year) from the observed surface over the bed as given.'),
      strictObjectField('the transient start', {
        from: z.literal('transient').describe('"transient": from a past steady state carried through the warming history.'),
        startYear: numberField(
          'the start year',
          'a',
          { min: START_YEAR_MIN, max: 0, maxExclusive: true },
          `Model year the history starts [a], from ${START_YEAR_MIN} to before year 0 (the observation year).`,
        ),
        climateOffset: numberField(
          'the climate offset',
          'K',
          { min: -MAX_OFFSET_K, max: MAX_OFFSET_K },
          `Added to the warming at startYear during the spin-up [K], -${MAX_OFFSET_K} to ${MAX_OFFSET_K}. Absent: fitted so that the terminus and volume at year 0 match the observations.`,
        ).optional(),
      }).describe(
        'Spin up under the warming at startYear plus climateOffset, then run the warming history to year 0; the run starts there.',
      ),
    ],
    { error: FROM_ALLOWED },
  )
  .describe(
    'Start from the glacier as it is today (year 0 = the observation year) instead of a steady state: ' +
      '{"from": "observed"} or {"from": "transient", "startYear": a, "climateOffset"?: K}. Replaces spinup.',
  );

interface StartIssue {
  path: (string | number)[];
  message: string;
  input?: unknown;
}

/** The cross-field rules of `start` (see the header). */
export function startCrossFieldIssues(s: { start?: unknown; spinup?: unknown; surface?: unknown; observations?: unknown }): StartIssue[] {
  const start = s.start as { from?: unknown; climateOffset?: unknown } | undefined;
  if (start === undefined || typeof start !== 'object' || start === null) return [];
  const issues: StartIssue[] = [];
  if (s.spinup === true) {
    issues.push({ path: ['spinup'], input: true, message: 'spinup (the steady start) and start (from the glacier as it is today) exclude each other: remove one' });
  }
  if (!Array.isArray(s.surface) || s.surface.length < 2) {
    issues.push({ path: ['start'], input: s.start, message: 'a start from the glacier as it is today needs the observed glacier: its surface (/surface), at least 2 points' });
  }
  const obs = (typeof s.observations === 'object' && s.observations !== null ? s.observations : {}) as { year?: unknown; terminus?: unknown };
  if (obs.year !== undefined && obs.year !== 0) {
    issues.push({
      path: ['observations', 'year'],
      input: obs.year,
      message: 'with start the run begins at year 0, the observation year: the observation year must be 0 (or absent); shift the warming years so that year 0 is the year observed',
    });
  }
  if (start.from === 'transient' && start.climateOffset === undefined && obs.terminus === undefined) {
    issues.push({
      path: ['start'],
      input: s.start,
      message: 'the transient start fits its climate offset to the observed terminus: give /observations/terminus, or a fixed climateOffset',
    });
  }
  return issues;
}
