/**
 * JSON Pointers (RFC 6901) for validation messages: "" is the whole document, "/ice/A" a key,
 * "/bed/3/0" an array item. "~" and "/" inside a key are escaped as "~0" and "~1" (RFC 6901 §3).
 */
export function toJsonPointer(path: readonly PropertyKey[]): string {
  let pointer = '';
  for (const token of path) {
    pointer += '/' + String(token).replace(/~/g, '~0').replace(/\//g, '~1');
  }
  return pointer;
}

/** What lies at `path` inside `root`; own properties only, so "__proto__" is just a key. */
export function lookUpPath(
  root: unknown,
  path: readonly PropertyKey[],
): { found: true; value: unknown } | { found: false } {
  let node: unknown = root;
  for (let i = 0; i < path.length; i++) {
    const key = path[i];
    if (typeof node !== 'object' || node === null || !Object.prototype.hasOwnProperty.call(node, key)) {
      return { found: false };
    }
    node = (node as Record<PropertyKey, unknown>)[key];
  }
  return { found: true, value: node };
}
