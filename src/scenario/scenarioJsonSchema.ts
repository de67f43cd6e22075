/**
 * The published JSON Schema (draft 2020-12) of the scenario format, generated from the zod schema
 * so that the two cannot disagree. Cross-field rules (whole number of cells, strictly increasing
 * x, exactly one of A and temperature, ...) cannot be stated in JSON Schema; the descriptions
 * name them and validateScenario enforces them.
 */
import * as z from 'zod';
import { scenarioSchema } from './scenarioSchema';

export const SCENARIO_JSON_SCHEMA_ID = 'https://firnline.invalid/schema/firnline-scenario-1.json';

export function scenarioJsonSchema(): object {
  const generated = z.toJSONSchema(scenarioSchema, { target: 'draft-2020-12' });
  const { $schema, ...rest } = generated;
  // Identification first, so the file reads naturally from the top.
  return {
    $schema,
    $id: SCENARIO_JSON_SCHEMA_ID,
    title: 'Firnline scenario, format version 1',
    ...rest,
  };
}
