/**
 * A zod object that rejects unknown keys (a typo such as "spacng" must not be silently ignored),
 * with messages that list the keys the object allows.
 */
import * as z from 'zod';

function allowedKeysText(keys: readonly string[]): string {
  return keys.map((k) => `"${k}"`).join(', ');
}

export function strictObjectField<Shape extends z.ZodRawShape>(what: string, shape: Shape) {
  const keys = allowedKeysText(Object.keys(shape));
  return z.strictObject(shape, {
    error: (issue) =>
      issue.code === 'unrecognized_keys'
        ? `${what} allows only the keys ${keys}`
        : `${what} must be a JSON object with the keys ${keys}`,
  });
}
