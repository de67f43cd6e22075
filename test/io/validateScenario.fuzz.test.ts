/**
 * Property-based fuzzing (fast-check): whatever comes in, validation never throws, every result
 * is either a scenario equal to the input or at least one error, and every message points
 * (JSON Pointer, RFC 6901) at something that exists in the input, or at a missing key of an
 * object that does. 10,500 generated inputs in all.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { findJsonSyntaxError } from '../../src/io/findJsonSyntaxError';
import { parseScenarioText, validateScenario, type ValidationResult } from '../../src/io/validateScenario';
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

const special = fc.constantFrom<unknown>(
  NaN, Infinity, -Infinity, -0, 0, 1, -1, 1e308, -1e308, 5e-324, 1e-24, '', 'x', '12', [], {}, null,
  true, false, undefined, [0], [[0, 0]], [0, 0, 0], { model: 'linear' }, { crossSection: 'parabolic' },
);
const anyValue = fc.oneof(fc.jsonValue({ maxDepth: 3 }), special, fc.double(), fc.integer({ min: -20000, max: 20000 }));

const mutation = fc.record({
  at: fc.nat(),
  op: fc.constantFrom('replace', 'delete', 'add', 'scale'),
  key: fc.oneof(fc.string({ maxLength: 6 }), fc.constantFrom('A', 'temperature', 'enhancement', '__proto__', 'a/b~')),
  value: anyValue,
  factor: fc.constantFrom(-1, 0, 0.5, 1.0001, 2, 10, 1e6, 1e-6),
});

type Path = (string | number)[];

function allPaths(node: unknown, path: Path = [], out: Path[] = []): Path[] {
  out.push(path);
  if (Array.isArray(node)) node.forEach((v, i) => allPaths(v, [...path, i], out));
  else if (typeof node === 'object' && node !== null) for (const k of Object.keys(node)) allPaths((node as Json)[k], [...path, k], out);
  return out;
}

type Mutation = typeof mutation extends fc.Arbitrary<infer T> ? T : never;

function applyMutation(root: Json, m: Mutation): Json {
  const paths = allPaths(root);
  const path = paths[m.at % paths.length];
  if (path.length === 0) return m.op === 'replace' ? m.value : root;
  const parent = path.slice(0, -1).reduce((node: Json, k) => node[k], root);
  const key = path[path.length - 1];
  const here = parent[key];
  switch (m.op) {
    case 'replace':
      parent[key] = m.value;
      break;
    case 'delete':
      if (Array.isArray(parent)) parent.splice(key as number, 1);
      else delete parent[key];
      break;
    case 'add':
      if (Array.isArray(here)) here.push(m.value);
      else if (typeof here === 'object' && here !== null) Object.defineProperty(here, m.key, { value: m.value, enumerable: true, writable: true, configurable: true });
      else parent[key] = m.value;
      break;
    case 'scale':
      parent[key] = typeof here === 'number' ? here * m.factor : m.value;
      break;
  }
  return root;
}

const mutatedScenario = fc
  .record({ base: fc.nat(3), mutations: fc.array(mutation, { minLength: 1, maxLength: 3 }) })
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
  fc.dictionary(fc.constantFrom('format', 'version', 'grid', 'bed', 'ice', 'massBalance', 'run', 'width', 'x'), fc.jsonValue({ maxDepth: 3 })),
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
