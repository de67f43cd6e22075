/**
 * Property-based fuzzing (fast-check): whatever comes in, validation never throws, every result
 * is either a scenario equal to the input or at least one error, and every message points
 * (JSON Pointer, RFC 6901) at something that exists in the input, or at a missing key of an
 * object that does. 10,500 generated inputs in all.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { findJsonSyntaxError } from '../../src/json/findJsonSyntaxError';
import { parseScenarioText, validateScenario, type ValidationResult } from '../../src/scenario/validateScenario';
import { applyMutation, mutation } from './jsonMutations';
import { pointerTarget } from './pointerResolves';
import { DEMO_TEXT, demo, validScenarios, type Json } from './scenarioFixtures';

const RUNS_MUTATED = 5000;
const RUNS_ANYTHING = 2500;
const RUNS_TEXT = 3000;

/** zod's own English wording; every message must come from the schema's sentences instead. */
const LIBRARY_WORDING = /Invalid input|Too small|Too big|Unrecognized key|Invalid option|Invalid discriminator|Invalid element/;

function checkResult(input: unknown, result: ValidationResult): void {
  expect(typeof result.ok).toBe('boolean');
  const messages = result.ok ? result.warnings : result.errors;
  if (result.ok) {
    expect(result.scenario).toEqual(input);
  } else {
    expect(result.errors.length).toBeGreaterThanOrEqual(1);
    expect(result.warnings).toEqual([]);
  }
  for (const m of messages) {
    expect(typeof m.message).toBe('string');
    expect(m.message.length).toBeGreaterThan(0);
    expect(m.message).not.toMatch(LIBRARY_WORDING);
    const target = pointerTarget(input, m.path);
    expect(target === 'value' || (!result.ok && target === 'missing-child'), `${m.path}: ${m.message}`).toBe(true);
  }
}

// ---- (a) valid scenarios with a few random changes ------------------------------------------

const mutatedScenario = fc
  // Every valid fixture and the demo can be the base.
  .record({ base: fc.nat(validScenarios().length), mutations: fc.array(mutation, { minLength: 1, maxLength: 3 }) })
  .map(({ base, mutations }) => {
    let s: Json = [...validScenarios(), demo()][base];
    for (const m of mutations) s = applyMutation(s, m);
    return s;
  });

// ---- (b) anything at all ---------------------------------------------------------------------

const anything = fc.oneof(
  fc.anything({
    maxDepth: 4,
    withBigInt: true,
    withBoxedValues: true,
    withDate: true,
    withMap: true,
    withSet: true,
    withNullPrototype: true,
    withObjectString: true,
    withSparseArray: true,
    withTypedArray: true,
  }),
  fc.jsonValue(),
  // Objects with the scenario's own keys reach past the first level.
  fc.dictionary(fc.constantFrom('format', 'version', 'grid', 'bed', 'ice', 'massBalance', 'run', 'width', 'surface', 'observations', 'x'), fc.jsonValue({ maxDepth: 3 })),
);

// ---- (c) text --------------------------------------------------------------------------------

const editedDemo = fc
  .array(fc.record({ at: fc.nat(), remove: fc.nat(3), insert: fc.string({ maxLength: 3 }) }), { minLength: 1, maxLength: 3 })
  .map((edits) =>
    edits.reduce((text, e) => {
      const at = e.at % (text.length + 1);
      return text.slice(0, at) + e.insert + text.slice(at + e.remove);
    }, DEMO_TEXT),
  );

const text = fc.oneof(
  fc.string({ unit: 'binary', maxLength: 200 }),
  fc.json(),
  editedDemo,
  mutatedScenario.map((s) => JSON.stringify(s) ?? 'undefined'),
);

describe('fuzzing', () => {
  it(`(a) ${RUNS_MUTATED} mutated valid scenarios`, () => {
    fc.assert(
      fc.property(mutatedScenario, (input) => checkResult(input, validateScenario(input))),
      { numRuns: RUNS_MUTATED },
    );
  });

  it(`(b) ${RUNS_ANYTHING} arbitrary values`, () => {
    fc.assert(
      fc.property(anything, (input) => checkResult(input, validateScenario(input))),
      { numRuns: RUNS_ANYTHING },
    );
  });

  it(`(c) ${RUNS_TEXT} texts`, () => {
    fc.assert(
      fc.property(text, (t) => {
        const result = parseScenarioText(t);
        let parsed: unknown;
        let engineError: unknown;
        try {
          parsed = JSON.parse(t.charCodeAt(0) === 0xfeff ? t.slice(1) : t);
        } catch (error) {
          engineError = error;
        }
        if (engineError === undefined) {
          // RFC 8259: our scanner accepts exactly what the engine accepts.
          expect(findJsonSyntaxError(t)).toBeNull();
          expect(result).toEqual(validateScenario(parsed));
          checkResult(parsed, result);
          return;
        }
        expect(result.ok).toBe(false);
        if (result.ok) return;
        expect(result.errors).toHaveLength(1);
        const [error] = result.errors;
        expect(error.path).toBe('');
        if (/^[ \t\n\r]*$/.test(t)) return; // reported as empty text
        const scanned = findJsonSyntaxError(t);
        expect(scanned).not.toBeNull();
        const stated = /at position (\d+)/.exec(String(engineError));
        if (stated) expect(scanned!.position).toBe(Number(stated[1]));
        expect(error.line).toBeGreaterThanOrEqual(1);
        expect(error.column).toBeGreaterThanOrEqual(1);
        expect(error.line).toBeLessThanOrEqual(t.split(/\r\n|\r|\n/).length);
        expect(error.message).toContain(`at line ${error.line}, column ${error.column}`);
      }),
      { numRuns: RUNS_TEXT },
    );
  });
});
