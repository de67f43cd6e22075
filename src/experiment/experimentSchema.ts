/**
 * The zod schema of the experiment file, version 1: a base scenario, optional variants (each a
 * JSON Merge Patch, RFC 7386, on the base) and an optional sweep (JSON Pointers, RFC 6901, each
 * with a list of values). Only the shape is checked here; validateExperiment.ts checks the
 * pointers, the names, the member count and every resulting scenario.
 */
import * as z from 'zod';
import { formatNumber } from '../scenario/formatNumber';
import { strictObjectField } from '../scenario/strictObjectField';
import type { Ensemble } from './ensemble';

export const EXPERIMENT_FORMAT = 'firnline-experiment';
export const EXPERIMENT_VERSION = 1;

export const EXPERIMENT_LIMITS = {
  nameMaxLength: 200,
  maxVariants: 1000,
  maxSweepKeys: 20,
  maxSweepValues: 10_000,
  /** Members = variants (or 1) x the product of the sweep list lengths x the ensemble's members (or 1). */
  maxMembers: 10_000,
  /** Largest experiment text accepted [bytes of UTF-8]; the base alone may be up to 20 MB. */
  maxTextBytes: 50_000_000,
} as const;

const L = EXPERIMENT_LIMITS;

const nameText = (what: string, minLength: number) => {
  const allowed = `${what} must be a string of ${minLength > 0 ? '1 to ' : 'at most '}${L.nameMaxLength} characters`;
  return z.string({ error: allowed }).min(minLength, { error: allowed }).max(L.nameMaxLength, { error: allowed });
};

const jsonObject = (allowed: string) => z.record(z.string(), z.unknown(), { error: allowed });

export const variantSchema = strictObjectField('a variant', {
  name: nameText('the variant name', 1).describe('Name of the variant, unique within the experiment.'),
  set: jsonObject('"set" must be a JSON object: a JSON Merge Patch (RFC 7386) applied to the base scenario').describe(
    'JSON Merge Patch (RFC 7386) applied to the base scenario: keys replace, null removes, objects merge.',
  ),
});

const sweepValues = z
  .array(z.unknown(), {
    error: `each sweep entry must be a list of 1 to ${formatNumber(L.maxSweepValues)} values`,
  })
  .min(1, { error: `each sweep entry must be a list of 1 to ${formatNumber(L.maxSweepValues)} values` })
  .max(L.maxSweepValues, { error: `each sweep entry must be a list of 1 to ${formatNumber(L.maxSweepValues)} values` });

export const experimentSchema = strictObjectField('an experiment', {
  format: z.literal(EXPERIMENT_FORMAT, { error: `"format" must be exactly "${EXPERIMENT_FORMAT}"` }),
  version: z.literal(EXPERIMENT_VERSION, {
    error: `"version" must be ${EXPERIMENT_VERSION}, the only experiment format version this program reads`,
  }),
  name: nameText('the experiment name', 0).optional(),
  base: jsonObject('"base" must be a JSON object: a complete firnline-scenario'),
  variants: z
    .array(variantSchema, { error: `"variants" must be a list of 1 to ${formatNumber(L.maxVariants)} variants` })
    .min(1, { error: `"variants" must be a list of 1 to ${formatNumber(L.maxVariants)} variants` })
    .max(L.maxVariants, { error: `"variants" must be a list of 1 to ${formatNumber(L.maxVariants)} variants` })
    .optional(),
  sweep: z
    .record(z.string(), sweepValues, {
      error: '"sweep" must be a JSON object whose keys are JSON Pointers into the scenario and whose values are lists',
    })
    .optional(),
  /** Checked in detail by checkEnsemble (ensemble.ts), which names the key path of each error. */
  ensemble: z.unknown().optional(),
});

export interface ExperimentVariant {
  name: string;
  set: Record<string, unknown>;
}

export interface Experiment {
  format: typeof EXPERIMENT_FORMAT;
  version: typeof EXPERIMENT_VERSION;
  name?: string;
  base: Record<string, unknown>;
  variants?: ExperimentVariant[];
  sweep?: Record<string, unknown[]>;
  ensemble?: Ensemble;
}
