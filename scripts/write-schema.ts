// Writes the scenario format's JSON Schema to docs/firnline-scenario.schema.json (bundled to
// dist/write-schema.mjs by scripts/build-cli.mjs; run it from the repository root).
// test/scenario/scenarioJsonSchema.test.ts fails if the committed file differs from a fresh one.
import { writeFileSync } from 'node:fs';
import { scenarioJsonSchema } from '../src/scenario/scenarioJsonSchema';

const SCHEMA_FILE = 'docs/firnline-scenario.schema.json';

writeFileSync(SCHEMA_FILE, JSON.stringify(scenarioJsonSchema(), null, 2) + '\n');
console.log(`wrote ${SCHEMA_FILE}`);
