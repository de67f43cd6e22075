/**
 * JSON Merge Patch, RFC 7386 section 2: a patch object merges key by key into the target; a null
 * value removes the key; any value that is not an object (arrays included) replaces the target
 * outright. Pure: the inputs are never changed, the result shares no objects with the patch.
 */

type Json = unknown;

function isPlainObject(value: Json): value is Record<string, Json> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

/** Deep copy of JSON data, so a result never aliases the patch or the target. */
function copyJson(value: Json): Json {
  if (Array.isArray(value)) return value.map(copyJson);
  if (isPlainObject(value)) {
    const out: Record<string, Json> = {};
    for (const key of Object.keys(value)) defineKey(out, key, copyJson(value[key]));
    return out;
  }
  return value;
}

/** Plain assignment of "__proto__" would change the prototype; a JSON key is only a key. */
function defineKey(target: Record<string, Json>, key: string, value: Json): void {
  Object.defineProperty(target, key, { value, enumerable: true, writable: true, configurable: true });
}

/** MergePatch(Target, Patch) as in the pseudo-code of RFC 7386 section 2. */
export function applyMergePatch(target: Json, patch: Json): Json {
  if (!isPlainObject(patch)) return copyJson(patch);
  const result: Record<string, Json> = isPlainObject(target) ? (copyJson(target) as Record<string, Json>) : {};
  for (const key of Object.keys(patch)) {
    const value = patch[key];
    if (value === null) {
      delete result[key];
    } else {
      const current = Object.prototype.hasOwnProperty.call(result, key) ? result[key] : undefined;
      defineKey(result, key, applyMergePatch(current, value));
    }
  }
  return result;
}
