/** Time-stepping choices: the scheme and the longest step. */
import * as z from 'zod';
import { numberField } from './numberField';
import { strictObjectField } from './strictObjectField';

export const numericsSchema = strictObjectField('the numerics', {
  scheme: z
    .enum(['implicit', 'explicit'], { error: 'the scheme must be "implicit" or "explicit"' })
    .describe('"implicit" (default): backward Euler with Newton, steps of up to maxStepYears; "explicit": forward Euler at its stability limit (the reference, much slower).')
    .optional(),
  maxStepYears: numberField(
    'the longest time step',
    'a',
    { min: 0.0001, max: 1 },
    'Longest time step [a], 0.0001 to 1 (default 1).',
  ).optional(),
}).describe('How the model steps in time. Default: implicit, steps of at most 1 a.');
