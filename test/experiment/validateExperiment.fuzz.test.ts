/**
 * Property-based fuzzing (fast-check) of the experiment-file validator: whatever comes in, it
 * never throws; a valid result has members whose scenarios pass the scenario validator; every
 * refusal carries at least one message with a JSON Pointer (RFC 6901) path. 10,000 inputs in all.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseExperimentText, validateExperiment, type ExperimentValidation } from '../../src/experiment/validateExperiment';
import { validateScenario } from '../../src/scenario/validateScenario';
import { quorrelCirque } from '../helpers/quorrelCirque';
import { applyMutation, mutation } from '../scenario/jsonMutations';
import type { Json } from '../scenario/scenarioFixtures';

const RUNS_MUTATED = 5000;
const RUNS_ANYTHING = 2500;
const RUNS_TEXT = 2500;

/** A small valid experiment: 2 variants x 2 values of A x 2 of C = 8 members. */
function ladder(): Json {
  return {
    format: 'firnline-experiment',
    version: 1,
    name: 'Quorrel ladder',
    base: quorrelCirque({ sliding: { C: 0, m: 3 } }),
    variants: [
      { name: '+1 K', set: { warming: [[0, 0], [20, 1]] } },
      { name: '+2 K', set: { warming: [[0, 0], [20, 2]] } },
    ],
    sweep: { '/ice/A': [1.2e-24, 2.4e-24], '/sliding/C': [0, 1e-14] },
  };
}

function check(result: ExperimentValidation): void {
  if (result.ok) {
    expect(result.members.length).toBeGreaterThanOrEqual(1);
    for (const member of result.members) expect(validateScenario(member.scenario).ok).toBe(true);
    return;
  }
  expect(result.errors.length).toBeGreaterThanOrEqual(1);
  for (const e of result.errors) {
    expect(e.message.length).toBeGreaterThan(0);
    expect(e.path === '' || e.path.startsWith('/')).toBe(true);
  }
}

describe('experiment validator fuzzing', () => {
  it('the unmutated ladder is valid with 8 members', () => {
    const result = validateExperiment(ladder());
    expect(result.ok && result.members.length).toBe(8);
  });

  it(`(a) ${RUNS_MUTATED} mutated experiments`, () => {
    const mutated = fc.array(mutation, { minLength: 1, maxLength: 3 }).map((ms) => ms.reduce((doc, m) => applyMutation(doc, m), ladder()));
    fc.assert(fc.property(mutated, (doc) => check(validateExperiment(doc))), { numRuns: RUNS_MUTATED });
  });

  it(`(b) ${RUNS_ANYTHING} arbitrary values`, () => {
    const anything = fc.oneof(
      fc.anything({ maxDepth: 4, withBigInt: true, withDate: true, withMap: true, withSet: true, withNullPrototype: true, withTypedArray: true }),
      fc.dictionary(fc.constantFrom('format', 'version', 'name', 'base', 'variants', 'sweep', 'x'), fc.jsonValue({ maxDepth: 3 })),
    );
    fc.assert(fc.property(anything, (value) => check(validateExperiment(value))), { numRuns: RUNS_ANYTHING });
  });

  it(`(c) ${RUNS_TEXT} texts: edited files and junk`, () => {
    const text = JSON.stringify(ladder(), null, 2);
    const edited = fc
      .array(fc.record({ at: fc.nat(), remove: fc.nat(3), insert: fc.string({ maxLength: 3 }) }), { minLength: 1, maxLength: 3 })
      .map((edits) => edits.reduce((t, e) => t.slice(0, e.at % (t.length + 1)) + e.insert + t.slice((e.at % (t.length + 1)) + e.remove), text));
    const junk = fc.oneof(edited, fc.string(), fc.uint8Array({ maxLength: 200 }).map((bytes) => String.fromCharCode(...bytes)));
    fc.assert(fc.property(junk, (t) => check(parseExperimentText(t))), { numRuns: RUNS_TEXT });
  });
});
