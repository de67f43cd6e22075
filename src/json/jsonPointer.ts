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

/** Why a string is not a JSON Pointer, or its reference tokens (RFC 6901 §3 and §4). */
export function parseJsonPointer(pointer: string): { ok: true; tokens: string[] } | { ok: false; reason: string } {
  if (pointer === '') return { ok: true, tokens: [] };
  if (!pointer.startsWith('/')) return { ok: false, reason: 'a JSON Pointer is empty or starts with "/"' };
  const tokens: string[] = [];
  for (const raw of pointer.slice(1).split('/')) {
    // "~" may only start the escapes "~0" and "~1" (RFC 6901 §3).
    if (/~(?![01])/.test(raw)) return { ok: false, reason: `"~" must be followed by 0 or 1 (in "${raw}")` };
    // Order matters (§4): "~01" is "~1" as text, not "/".
    tokens.push(raw.replace(/~1/g, '/').replace(/~0/g, '~'));
  }
  return { ok: true, tokens };
}

/** An array index token per RFC 6901 §4: "0" or digits without a leading zero. */
export function isArrayIndexToken(token: string): boolean {
  return /^(0|[1-9][0-9]*)$/.test(token);
}

/** The value a pointer refers to in `document` (RFC 6901 §4); own properties only. */
export function resolveJsonPointer(document: unknown, pointer: string): { found: true; value: unknown } | { found: false } {
  const parsed = parseJsonPointer(pointer);
  if (!parsed.ok) return { found: false };
  let node: unknown = document;
  for (const token of parsed.tokens) {
    if (Array.isArray(node)) {
      if (!isArrayIndexToken(token) || Number(token) >= node.length) return { found: false };
      node = node[Number(token)];
    } else if (typeof node === 'object' && node !== null && Object.prototype.hasOwnProperty.call(node, token)) {
      node = (node as Record<string, unknown>)[token];
    } else {
      return { found: false };
    }
  }
  return { found: true, value: node };
}
