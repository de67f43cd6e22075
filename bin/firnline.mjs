#!/usr/bin/env node
// Thin launcher: the command line itself is bundled to dist/ by `npm ci` (the prepare script).
import { existsSync } from 'node:fs';
import { fileURLToPath, pathToFileURL } from 'node:url';

const bundle = fileURLToPath(new URL('../dist/firnline.mjs', import.meta.url));
if (!existsSync(bundle)) {
  process.stderr.write('firnline: the command line is not built yet; run `npm ci` (or `npm run build:cli`) first.\n');
  process.exit(1);
}
const { main } = await import(pathToFileURL(bundle).href);
process.exitCode = await main(process.argv.slice(2));
