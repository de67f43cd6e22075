/**
 * A number in a scenario named by a JSON Pointer (RFC 6901: "/ice/A", "/bed/3/1"; "~0" is "~" and
 * "~1" is "/" inside a key): read it, and a copy of the scenario with it replaced. The model may
 * import nothing outside itself (src/json has the general pointer helpers for the other folders);
 * this is the small part the calibration needs, for numbers only.
 */
import type { Scenario } from '../scenario';

/** Why a pointer names no number in the scenario (undefined: it does). */
export function pointerProblem(scenario: Scenario, pointer: string): string | undefined {
  const tokens = pointerTokens(pointer);
  if (typeof tokens === 'string') return tokens;
  if (tokens.length === 0) return 'the empty pointer names the whole scenario, not a number';
  let node: unknown = scenario;
  let path = '';
  for (const token of tokens) {
    path += '/' + escape(token);
    if (Array.isArray(node)) {
      if (!/^(0|[1-9][0-9]*)$/.test(token) || Number(token) >= node.length) return `${path} is not an item of the scenario`;
      node = node[Number(token)];
    } else if (typeof node === 'object' && node !== null && Object.prototype.hasOwnProperty.call(node, token)) {
      node = (node as Record<string, unknown>)[token];
    } else {
      return `the scenario has no ${path}`;
    }
  }
  if (typeof node !== 'number' || !Number.isFinite(node)) return `${pointer} is ${describe(node)}, not a number`;
  return undefined;
}

/** The number at `pointer` (check pointerProblem first). */
export function parameterValue(scenario: Scenario, pointer: string): number {
  let node: unknown = scenario;
  for (const token of pointerTokens(pointer) as string[]) node = (node as Record<string, unknown>)[token];
  return node as number;
}

/** A copy of the scenario with the number at `pointer` set to `value` (only the path is copied). */
export function withParameter(scenario: Scenario, pointer: string, value: number): Scenario {
  const tokens = pointerTokens(pointer) as string[];
  const set = (node: unknown, depth: number): unknown => {
    if (depth === tokens.length) return value;
    const token = tokens[depth];
    if (Array.isArray(node)) {
      const copy: unknown[] = [...node];
      copy[Number(token)] = set(node[Number(token)], depth + 1);
      return copy;
    }
    const record = node as Record<string, unknown>;
    return { ...record, [token]: set(record[token], depth + 1) };
  };
  return set(scenario, 0) as Scenario;
}

function pointerTokens(pointer: string): string[] | string {
  if (pointer === '') return [];
  if (!pointer.startsWith('/')) return `"${pointer}" is not a JSON Pointer (RFC 6901): it must start with "/", e.g. /ice/A`;
  const tokens: string[] = [];
  for (const raw of pointer.slice(1).split('/')) {
    if (/~(?![01])/.test(raw)) return `"${pointer}" is not a JSON Pointer (RFC 6901): "~" must be followed by 0 or 1`;
    tokens.push(raw.replace(/~1/g, '/').replace(/~0/g, '~'));
  }
  return tokens;
}

function escape(token: string): string {
  return token.replace(/~/g, '~0').replace(/\//g, '~1');
}

function describe(value: unknown): string {
  if (Array.isArray(value)) return 'a list';
  if (value === null) return 'null';
  if (typeof value === 'object') return 'an object';
  if (typeof value === 'string') return 'text';
  return typeof value;
}
