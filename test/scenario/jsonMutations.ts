/**
 * Random changes to JSON documents for property-based fuzzing (fast-check): replace, delete, add
 * or scale the value at a random path, with values chosen to probe validators (non-finite
 * numbers, -0, wrong types, prototype keys, JSON Pointer escape characters).
 */
import fc from 'fast-check';
import type { Json } from './scenarioFixtures';

export const special = fc.constantFrom<unknown>(
  NaN, Infinity, -Infinity, -0, 0, 1, -1, 1e308, -1e308, 5e-324, 1e-24, '', 'x', '12', [], {}, null,
  true, false, undefined, [0], [[0, 0]], [0, 0, 0], { model: 'linear' }, { crossSection: 'parabolic' },
);
export const anyValue = fc.oneof(fc.jsonValue({ maxDepth: 3 }), special, fc.double(), fc.integer({ min: -20000, max: 20000 }));

export const mutation = fc.record({
  at: fc.nat(),
  op: fc.constantFrom('replace', 'delete', 'add', 'scale'),
  key: fc.oneof(fc.string({ maxLength: 6 }), fc.constantFrom('A', 'temperature', 'enhancement', '__proto__', 'a/b~')),
  value: anyValue,
  factor: fc.constantFrom(-1, 0, 0.5, 1.0001, 2, 10, 1e6, 1e-6),
});

export type Path = (string | number)[];

export function allPaths(node: unknown, path: Path = [], out: Path[] = []): Path[] {
  out.push(path);
  if (Array.isArray(node)) node.forEach((v, i) => allPaths(v, [...path, i], out));
  else if (typeof node === 'object' && node !== null) for (const k of Object.keys(node)) allPaths((node as Json)[k], [...path, k], out);
  return out;
}

export type Mutation = typeof mutation extends fc.Arbitrary<infer T> ? T : never;

export function applyMutation(root: Json, m: Mutation): Json {
  const paths = allPaths(root);
  const path = paths[m.at % paths.length];
  // fc.constantFrom hands out the same [] and {} every time: copy, or a later mutation adding to
  // one place would add to all of them and could build a cycle.
  const value: unknown = typeof m.value === 'object' && m.value !== null ? structuredClone(m.value) : m.value;
  if (path.length === 0) return m.op === 'replace' ? value : root;
  const parent = path.slice(0, -1).reduce((node: Json, k) => node[k], root);
  const key = path[path.length - 1];
  const here = parent[key];
  switch (m.op) {
    case 'replace':
      parent[key] = value;
      break;
    case 'delete':
      if (Array.isArray(parent)) parent.splice(key as number, 1);
      else delete parent[key];
      break;
    case 'add':
      if (Array.isArray(here)) here.push(value);
      else if (typeof here === 'object' && here !== null) Object.defineProperty(here, m.key, { value: value, enumerable: true, writable: true, configurable: true });
      else parent[key] = value;
      break;
    case 'scale':
      parent[key] = typeof here === 'number' ? here * m.factor : value;
      break;
  }
  return root;
}
