/**
 * Test helper, independent of src/json/jsonPointer.ts: does a JSON Pointer (RFC 6901) resolve in a value, or
 * name a missing key or item of an object or array that does? Own properties only.
 */
export type PointerTarget = 'value' | 'missing-child' | 'invalid';

const POINTER_SYNTAX = /^(\/([^~/]|~[01])*)*$/;

export function pointerTarget(root: unknown, pointer: string): PointerTarget {
  if (!POINTER_SYNTAX.test(pointer)) return 'invalid';
  if (pointer === '') return 'value';
  // RFC 6901 §4: split on "/", then turn "~1" into "/" and only afterwards "~0" into "~".
  const tokens = pointer
    .slice(1)
    .split('/')
    .map((t) => t.replace(/~1/g, '/').replace(/~0/g, '~'));
  let node: unknown = root;
  for (let i = 0; i < tokens.length; i++) {
    const token = tokens[i];
    const isContainer = typeof node === 'object' && node !== null;
    const key = Array.isArray(node) && /^(0|[1-9][0-9]*)$/.test(token) ? Number(token) : token;
    if (!isContainer || !Object.prototype.hasOwnProperty.call(node, key)) {
      return isContainer && i === tokens.length - 1 ? 'missing-child' : 'invalid';
    }
    node = (node as Record<PropertyKey, unknown>)[key];
  }
  return 'value';
}
