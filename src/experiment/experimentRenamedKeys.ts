/**
 * Renamed scenario keys (scenario/renamedKeys.ts) in an experiment file: in its base, in each
 * variant's patch, and in the pointers of its sweep and ensemble. Experiment files and saved
 * projects written with an old name still open; the experiment is then held under the new names.
 * A sweep or ensemble naming one value by both names is refused.
 */
import { toJsonPointer } from '../json/jsonPointer';
import { migrateScenarioKeys, migrateScenarioPointer } from '../scenario/renamedKeys';
import type { ValidationMessage } from '../scenario/validationMessage';
import type { Experiment } from './experimentSchema';

const isObject = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);

/** The record with its pointer keys renamed (key order kept), or the refusals. */
function migratePointerKeys(record: Record<string, unknown>, at: readonly string[], errors: ValidationMessage[]): Record<string, unknown> {
  const renamed: Record<string, unknown> = {};
  let changed = false;
  for (const [key, value] of Object.entries(record)) {
    const current = migrateScenarioPointer(key);
    if (current !== key) {
      changed = true;
      if (Object.hasOwn(record, current)) {
        errors.push({
          path: toJsonPointer([...at, key]),
          message: `both ${JSON.stringify(key)} (the old name) and ${JSON.stringify(current)} are given; keep only ${JSON.stringify(current)}, the new name of the same value`,
        });
        continue;
      }
    }
    renamed[current] = value;
  }
  return changed ? renamed : record;
}

export function migrateExperimentKeys(experiment: Experiment): { experiment: Experiment; errors: ValidationMessage[] } {
  const errors: ValidationMessage[] = [];
  const base = migrateScenarioKeys(experiment.base, '/base');
  errors.push(...base.errors);
  const variants = experiment.variants?.map((variant, i) => {
    const set = migrateScenarioKeys(variant.set, toJsonPointer(['variants', i, 'set']));
    errors.push(...set.errors);
    return set.value === variant.set ? variant : { ...variant, set: set.value as Record<string, unknown> };
  });
  const sweep = experiment.sweep && (migratePointerKeys(experiment.sweep, ['sweep'], errors) as Record<string, unknown[]>);
  let ensemble = experiment.ensemble;
  // The ensemble is checked in detail later (ensemble.ts); only a well-formed one is renamed here.
  const raw: unknown = experiment.ensemble;
  if (isObject(raw) && isObject(raw.parameters)) {
    const parameters = migratePointerKeys(raw.parameters, ['ensemble', 'parameters'], errors);
    if (parameters !== raw.parameters) ensemble = { ...raw, parameters } as unknown as Experiment['ensemble'];
  }
  const migrated: Experiment = { ...experiment, base: base.value as Experiment['base'] };
  if (variants !== undefined) migrated.variants = variants;
  if (sweep !== undefined) migrated.sweep = sweep;
  if (ensemble !== undefined) migrated.ensemble = ensemble;
  return { experiment: migrated, errors };
}
