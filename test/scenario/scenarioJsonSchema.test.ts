/**
 * The published JSON Schema (draft 2020-12) is generated from the validator's zod schema: the
 * committed file must equal a fresh generation, describe every field, and accept what the
 * validator accepts.
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { SCENARIO_JSON_SCHEMA_ID, scenarioJsonSchema } from '../../src/scenario/scenarioJsonSchema';
import { validateScenario } from '../../src/scenario/validateScenario';
import { schemaErrors } from './miniJsonSchema';
import { demo, validScenarios, valleyScenario, type Json } from './scenarioFixtures';

const SCHEMA_FILE = fileURLToPath(new URL('../../docs/firnline-scenario.schema.json', import.meta.url));

type Schema = Record<string, unknown>;

/** Every schema reachable from a property, tuple position or union branch, with its path. */
function* fieldSchemas(schema: Schema, path: string): Generator<[string, Schema]> {
  for (const [key, child] of Object.entries((schema.properties ?? {}) as Record<string, Schema>)) {
    yield [`${path}/${key}`, child];
    yield* fieldSchemas(child, `${path}/${key}`);
  }
  if (typeof schema.items === 'object') {
    yield [`${path}/*`, schema.items as Schema];
    yield* fieldSchemas(schema.items as Schema, `${path}/*`);
  }
  for (const [i, child] of ((schema.prefixItems ?? []) as Schema[]).entries()) {
    yield [`${path}/${i}`, child];
    yield* fieldSchemas(child, `${path}/${i}`);
  }
  for (const child of [...((schema.oneOf ?? []) as Schema[]), ...((schema.anyOf ?? []) as Schema[])]) {
    yield* fieldSchemas(child, path);
  }
}

describe('scenarioJsonSchema', () => {
  const schema = scenarioJsonSchema() as Schema;

  it('matches the committed docs/firnline-scenario.schema.json (regenerate with npm run schema)', () => {
    expect(readFileSync(SCHEMA_FILE, 'utf8')).toBe(JSON.stringify(schema, null, 2) + '\n');
  });

  it('identifies itself as draft 2020-12 with the format id and a title', () => {
    expect(schema.$schema).toBe('https://json-schema.org/draft/2020-12/schema');
    expect(schema.$id).toBe('https://firnline.invalid/schema/firnline-scenario-1.json');
    expect(SCENARIO_JSON_SCHEMA_ID).toBe(schema.$id);
    expect(schema.title).toBe('Firnline scenario, format version 1');
  });

  it('describes every field', () => {
    const fields = [...fieldSchemas(schema, '')];
    expect(fields.length).toBeGreaterThan(50);
    const undescribed = fields.filter(([, s]) => typeof s.description !== 'string' || s.description === '').map(([p]) => p);
    expect(undescribed).toEqual([]);
  });

  it('accepts the demo and every valid fixture', () => {
    for (const s of [demo(), ...validScenarios()]) expect(schemaErrors(schema, s)).toEqual([]);
  });

  it('rejects what the validator rejects field by field', () => {
    const bad: ((s: Json) => void)[] = [
      (s) => (s.version = 2),
      (s) => (s.grid.spacing = 0.5),
      (s) => (s.grid.extra = 1),
      (s) => (s.bed = [[0, 3000]]),
      (s) => (s.bed[0] = [0, 3000, 1]),
      (s) => (s.ice.n = 6),
      (s) => (s.ice.A = 0),
      (s) => (s.shapeFactor = { crossSection: 'round' }),
      (s) => (s.shapeFactor = 1.5),
      (s) => (s.massBalance.model = 'energy'),
      (s) => delete s.massBalance.ela,
      (s) => (s.run.years = 0),
      (s) => (s.spinup = 'yes'),
      // The two key-presence rules of /ice are stated in the schema too.
      (s) => (s.ice.temperature = -5),
      (s) => delete s.ice.A,
      (s) => (s.ice.enhancement = 2),
      // Observations: ranges, types and keys.
      (s) => (s.observations = { thickness: [[2500, 210, 0]] }),
      (s) => (s.observations = { surfaceSpeed: [[1000, -1, 2]] }),
      (s) => (s.observations = { terminus: 'snout' }),
      (s) => (s.observations = { terminus: -5 }),
      (s) => (s.observations = { colour: 1 }),
    ];
    for (const mutate of bad) {
      const s = valleyScenario();
      mutate(s);
      expect(validateScenario(s).ok).toBe(false);
      expect(schemaErrors(schema, s).length).toBeGreaterThan(0);
    }
  });

  it('cannot express the cross-field rules, which only the validator enforces', () => {
    const crossField: ((s: Json) => void)[] = [
      (s) => (s.grid.spacing = 70), // whole number of cells
      (s) => (s.bed[3][0] = 5000), // strictly increasing x
      (s) => (s.run.outputEvery = 500), // outputEvery <= years
      (s) => (s.observations = { terminus: 16000 }), // inside the domain [0, grid.length]
      (s) => (s.observations = { thickness: [[4000, 200, 10], [4000, 210, 10]] }), // strictly increasing x
      (s) => (s.observations = { geodeticBalance: { from: 0, to: -10, value: -0.5 } }), // from before to
    ];
    for (const mutate of crossField) {
      const s = valleyScenario();
      mutate(s);
      expect(validateScenario(s).ok).toBe(false);
      expect(schemaErrors(schema, s)).toEqual([]);
    }
  });
});
