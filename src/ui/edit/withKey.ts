/** A copy of `object` with `key` set to `value`, or without `key` when `value` is undefined. */
export function withKey<T extends object, K extends keyof T>(object: T, key: K, value: T[K] | undefined): T {
  const copy = { ...object };
  if (value === undefined) delete copy[key];
  else copy[key] = value;
  return copy;
}
