/**
 * Loads a CommonJS bundle of dist/ through node:vm with a V8 code cache beside it (path +
 * ".cache"), for `firnline check` and `run`, whose start-up is held against a bare Node
 * (docs/performance.md, 4a). Node 20 has no module.enableCompileCache, and its ES-module loader
 * costs more than one script: loaded this way with the cache, `check` took 1.23× the CPU time of
 * `node -e 0` against 1.48× as an ES module chunk (same machine, interleaved runs).
 *
 * The bundle's first line names its build ("//firnline-build <id>", scripts/build-cli.mjs) and
 * the cache starts with that line, so a cache made from another build is never offered to V8
 * (which itself compares only the source length); V8 rejects a cache from another Node version or
 * other flags and compiles as usual. Either way the result is the same, only slower.
 */
import { readFileSync, renameSync, writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { Script } from 'node:vm';

export interface CodeCachedBundle {
  exports: Record<string, unknown>;
  /** Whether V8 took the cache (false: none, from another build, or rejected by V8). */
  cacheUsed: boolean;
  /** Writes the code of everything run so far to the cache (the build calls it after one run). */
  writeCache: () => void;
}

export function loadCodeCachedBundle(path: string): CodeCachedBundle {
  const source = readFileSync(path, 'utf8');
  const header = Buffer.from(source.slice(0, source.indexOf('\n') + 1));
  let cachedData: Buffer | undefined;
  try {
    const cache = readFileSync(`${path}.cache`);
    if (header.length > 1 && cache.subarray(0, header.length).equals(header)) cachedData = cache.subarray(header.length);
  } catch {
    cachedData = undefined; // no cache: compile
  }
  const script = new Script(`(function (require, module, exports) {${source}\n})`, { filename: path, cachedData });
  const module = { exports: {} as Record<string, unknown> };
  const body = script.runInThisContext() as (require: NodeJS.Require, module: object, exports: object) => void;
  body(createRequire(path), module, module.exports);
  return {
    exports: module.exports,
    cacheUsed: cachedData !== undefined && !script.cachedDataRejected,
    writeCache: () => {
      const partial = `${path}.cache.partial`;
      writeFileSync(partial, Buffer.concat([header, script.createCachedData()]));
      renameSync(partial, `${path}.cache`);
    },
  };
}
