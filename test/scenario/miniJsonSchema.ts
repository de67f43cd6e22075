/**
 * Test helper: a JSON Schema (draft 2020-12) checker for exactly the keywords the scenario schema
 * uses, so the published schema can be tried on real scenarios without another dependency.
 * An unknown keyword throws, so a schema change cannot make this checker silently lenient.
 */
type Schema = Record<string, unknown>;

const ANNOTATIONS = new Set(['$schema', '$id', 'title', 'description']);

export function schemaErrors(schema: Schema, value: unknown, path = ''): string[] {
  const errors: string[] = [];
  const fail = (why: string) => errors.push(`${path || '/'}: ${why}`);
  for (const [keyword, arg] of Object.entries(schema)) {
    if (ANNOTATIONS.has(keyword)) continue;
    switch (keyword) {
      case 'type': {
        const ok =
          arg === 'object' ? typeof value === 'object' && value !== null && !Array.isArray(value)
          : arg === 'array' ? Array.isArray(value)
          : arg === 'number' ? typeof value === 'number'
          : arg === 'string' ? typeof value === 'string'
          : arg === 'boolean' ? typeof value === 'boolean'
          : (() => { throw new Error(`type ${String(arg)}`); })();
        if (!ok) return [`${path || '/'}: not of type ${String(arg)}`];
        break;
      }
      case 'const': if (value !== arg) fail(`not ${JSON.stringify(arg)}`); break;
      case 'enum': if (!(arg as unknown[]).includes(value)) fail('not in enum'); break;
      case 'minimum': if ((value as number) < (arg as number)) fail('below minimum'); break;
      case 'maximum': if ((value as number) > (arg as number)) fail('above maximum'); break;
      case 'exclusiveMinimum': if ((value as number) <= (arg as number)) fail('not above exclusiveMinimum'); break;
      case 'exclusiveMaximum': if ((value as number) >= (arg as number)) fail('not below exclusiveMaximum'); break;
      case 'maxLength': if ([...(value as string)].length > (arg as number)) fail('too long'); break;
      case 'minItems': if ((value as unknown[]).length < (arg as number)) fail('too few items'); break;
      case 'maxItems': if ((value as unknown[]).length > (arg as number)) fail('too many items'); break;
      case 'prefixItems':
        (arg as Schema[]).forEach((s, i) => {
          if (i < (value as unknown[]).length) errors.push(...schemaErrors(s, (value as unknown[])[i], `${path}/${i}`));
        });
        break;
      case 'items': {
        const start = Array.isArray(schema.prefixItems) ? schema.prefixItems.length : 0;
        (value as unknown[]).slice(start).forEach((item, k) => {
          if (arg === false) fail('extra item');
          else errors.push(...schemaErrors(arg as Schema, item, `${path}/${start + k}`));
        });
        break;
      }
      case 'properties':
        for (const [key, s] of Object.entries(arg as Record<string, Schema>)) {
          if (Object.prototype.hasOwnProperty.call(value, key)) {
            errors.push(...schemaErrors(s, (value as Record<string, unknown>)[key], `${path}/${key}`));
          }
        }
        break;
      case 'required':
        for (const key of arg as string[]) if (!Object.prototype.hasOwnProperty.call(value, key)) fail(`missing ${key}`);
        break;
      case 'additionalProperties': {
        if (arg !== false) throw new Error('additionalProperties other than false');
        const known = Object.keys((schema.properties ?? {}) as object);
        for (const key of Object.keys(value as object)) if (!known.includes(key)) fail(`unknown key ${key}`);
        break;
      }
      case 'dependentRequired':
        for (const [key, needs] of Object.entries(arg as Record<string, string[]>)) {
          if (!Object.prototype.hasOwnProperty.call(value, key)) continue;
          for (const need of needs) if (!Object.prototype.hasOwnProperty.call(value, need)) fail(`${key} needs ${need}`);
        }
        break;
      case 'anyOf':
      case 'oneOf': {
        const passing = (arg as Schema[]).filter((s) => schemaErrors(s, value, path).length === 0).length;
        if (keyword === 'anyOf' ? passing === 0 : passing !== 1) fail(`${keyword} matched ${passing}`);
        break;
      }
      default:
        throw new Error(`keyword ${keyword} is not supported by this checker`);
    }
  }
  return errors;
}
