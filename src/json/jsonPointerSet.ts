/**
 * Sets the value a JSON Pointer (RFC 6901) refers to, in a copy of the document: what a sweep
 * does to the base scenario. The parent must exist; an object key may be new, an array index
 * must name an existing item (a sweep replaces values, it does not grow lists).
 */
import { isArrayIndexToken, parseJsonPointer } from './jsonPointer';

export type SetResult = { ok: true; document: unknown } | { ok: false; reason: string };

function copyContainer(node: unknown): unknown {
  if (Array.isArray(node)) return [...node];
  return Object.defineProperties({}, Object.getOwnPropertyDescriptors(node as object));
}

export function setJsonPointer(document: unknown, pointer: string, value: unknown): SetResult {
  const parsed = parseJsonPointer(pointer);
  if (!parsed.ok) return { ok: false, reason: parsed.reason };
  if (parsed.tokens.length === 0) return { ok: true, document: value };
  const [token, ...rest] = parsed.tokens;
  const restPointer = rest.map((t) => '/' + t.replace(/~/g, '~0').replace(/\//g, '~1')).join('');
  if (Array.isArray(document)) {
    if (!isArrayIndexToken(token) || Number(token) >= document.length) {
      return { ok: false, reason: `"${token}" is not an index of a list of ${document.length} items` };
    }
  } else if (typeof document !== 'object' || document === null) {
    return { ok: false, reason: `there is no object or list to hold "${token}"` };
  } else if (rest.length > 0 && !Object.prototype.hasOwnProperty.call(document, token)) {
    return { ok: false, reason: `"${token}" does not exist` };
  }
  const container = copyContainer(document) as Record<string, unknown>;
  const inner = setJsonPointer(container[token], restPointer, value);
  if (!inner.ok) return inner;
  Object.defineProperty(container, token, { value: inner.document, enumerable: true, writable: true, configurable: true });
  return { ok: true, document: container };
}
