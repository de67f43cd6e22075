/**
 * A short, safe rendering of any value for an error message: JSON-like, cut after a budget of
 * characters, and never throwing (cycles, getters that throw, proxies, exotic objects).
 */
const DEFAULT_BUDGET = 60;
const MAX_DEPTH = 3;

export function previewValue(value: unknown, budget = DEFAULT_BUDGET): string {
  try {
    const text = render(value, MAX_DEPTH, budget + 1);
    if (text.length <= budget) return text;
    // A cut-off list still says how long it was: "10,000 points" is often the problem itself.
    return text.slice(0, budget) + '…' + (Array.isArray(value) ? ` (${value.length} items)` : '');
  } catch {
    return 'an unreadable value';
  }
}

function render(value: unknown, depth: number, budget: number): string {
  switch (typeof value) {
    case 'number':
      // As written in JSON (no separators), so the user can find it in the file.
      return Object.is(value, -0) ? '-0' : String(value);
    case 'string':
      // Only the start of a long string matters; cut before quoting so huge strings stay cheap.
      return JSON.stringify(value.length > budget ? value.slice(0, budget) : value);
    case 'boolean':
      return String(value);
    case 'undefined':
      return 'undefined';
    case 'bigint':
      return `${value}n`;
    case 'symbol':
      return 'a symbol';
    case 'function':
      return 'a function';
  }
  if (value === null) return 'null';
  if (Array.isArray(value)) return renderArray(value, depth, budget);
  const proto: unknown = Object.getPrototypeOf(value);
  if (proto !== Object.prototype && proto !== null) {
    const tag = Object.prototype.toString.call(value).slice(8, -1);
    return `a ${tag === 'Object' ? 'non-plain' : tag} object`;
  }
  return renderObject(value as Record<string, unknown>, depth, budget);
}

function renderArray(items: readonly unknown[], depth: number, budget: number): string {
  if (items.length === 0) return '[]';
  if (depth === 0) return `[…${items.length} items]`;
  let text = '[';
  for (let i = 0; i < items.length; i++) {
    if (text.length > budget) return `${text}…]`;
    text += (i > 0 ? ',' : '') + render(items[i], depth - 1, budget - text.length);
  }
  return text + ']';
}

function renderObject(object: Record<string, unknown>, depth: number, budget: number): string {
  const keys = Object.keys(object);
  if (keys.length === 0) return '{}';
  if (depth === 0) return '{…}';
  let text = '{';
  for (let i = 0; i < keys.length; i++) {
    if (text.length > budget) return `${text}…}`;
    const key = keys[i];
    text += (i > 0 ? ',' : '') + render(key, 0, budget) + ':' + render(object[key], depth - 1, budget - text.length);
  }
  return text + '}';
}
