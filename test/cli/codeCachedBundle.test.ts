/**
 * The code-cache loader of `firnline check` (src/cli/codeCachedBundle.ts): a cache written after a
 * run is taken by the next load; a cache from another build (even of the same length, which V8
 * alone would not notice) or a cut-off one is not, and the bundle then runs as compiled afresh.
 * Second loads use a copy under another file name: V8 keeps scripts it compiled in this process by
 * source and name, and would not look at the cache at all for the same name.
 */
import { copyFileSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { loadCodeCachedBundle } from '../../src/cli/codeCachedBundle';

const dir = mkdtempSync(join(tmpdir(), 'firnline-code-cache-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

/** A copy of the bundle at `path` and of its cache (or of `cache`) under the name `name`. */
function copyBundle(path: string, name: string, cache: Buffer = readFileSync(`${path}.cache`)): string {
  const copy = join(dir, name);
  copyFileSync(path, copy);
  writeFileSync(`${copy}.cache`, cache);
  return copy;
}

/** A CommonJS bundle as the build writes it: the build line, then code using require. */
function writeBundle(name: string, build: string, answer: number): string {
  const path = join(dir, name);
  writeFileSync(path, `//firnline-build ${build}\nconst { join } = require('node:path');\nexports.answer = () => join('a', 'b') + ':' + ${answer};\n`);
  return path;
}

describe('loadCodeCachedBundle', () => {
  it('runs without a cache, writes one that starts with the build line, and takes it on the next load', () => {
    const path = writeBundle('a.cjs', 'aaaaaaaaaaaaaaaa', 41);
    const first = loadCodeCachedBundle(path);
    expect(first.cacheUsed).toBe(false);
    expect((first.exports.answer as () => string)()).toBe(join('a', 'b') + ':41');
    first.writeCache();
    expect(readFileSync(`${path}.cache`).subarray(0, 34).toString()).toBe('//firnline-build aaaaaaaaaaaaaaaa\n');
    const second = loadCodeCachedBundle(copyBundle(path, 'a2.cjs'));
    expect(second.cacheUsed).toBe(true);
    expect((second.exports.answer as () => string)()).toBe(join('a', 'b') + ':41');
  });

  it('ignores the cache of another build of the same length and runs the new code', () => {
    const path = writeBundle('b.cjs', 'bbbbbbbbbbbbbbbb', 41);
    loadCodeCachedBundle(path).writeCache();
    writeBundle('b.cjs', 'cccccccccccccccc', 43); // same length, other code
    const loaded = loadCodeCachedBundle(path);
    expect(loaded.cacheUsed).toBe(false);
    expect((loaded.exports.answer as () => string)()).toBe(join('a', 'b') + ':43');
  });

  it('runs with a cut-off cache with the right build line, which V8 refuses', () => {
    const path = writeBundle('c.cjs', 'dddddddddddddddd', 7);
    loadCodeCachedBundle(path).writeCache();
    const cache = readFileSync(`${path}.cache`);
    const loaded = loadCodeCachedBundle(copyBundle(path, 'c2.cjs', cache.subarray(0, Math.floor(cache.length / 2))));
    expect(loaded.cacheUsed).toBe(false);
    expect((loaded.exports.answer as () => string)()).toBe(join('a', 'b') + ':7');
  });
});
