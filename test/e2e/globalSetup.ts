/**
 * Builds the app with the project's own vite.config.ts (into dist/app) and serves the result
 * with `vite preview` on 127.0.0.1, so the end-to-end tests exercise what would be deployed.
 * The URL reaches the tests through `inject('baseUrl')`.
 */
import { fileURLToPath } from 'node:url';
import type { AddressInfo } from 'node:net';
import { build, preview } from 'vite';
import type { TestProject } from 'vitest/node';

declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string;
  }
}

const root = fileURLToPath(new URL('../..', import.meta.url));
const configFile = fileURLToPath(new URL('../../vite.config.ts', import.meta.url));

export default async function setup(project: TestProject): Promise<() => Promise<void>> {
  // Vitest sets NODE_ENV=test, which would make Vite bundle React's development build and leave
  // out production-only code (the service worker registration): build as deployed.
  const nodeEnv = process.env.NODE_ENV;
  process.env.NODE_ENV = 'production';
  try {
    await build({ root, configFile, logLevel: 'warn', mode: 'production' });
  } finally {
    process.env.NODE_ENV = nodeEnv;
  }
  // Port 0 lets the OS pick a free port, so a running dev server or a parallel run cannot clash.
  const server = await preview({
    root,
    configFile,
    logLevel: 'warn',
    preview: { host: '127.0.0.1', port: 0, strictPort: false, open: false },
  });
  const address = server.httpServer.address() as AddressInfo | null;
  if (!address || typeof address === 'string') throw new Error('vite preview did not report a TCP address');
  const baseUrl = `http://127.0.0.1:${address.port}/`;
  project.provide('baseUrl', baseUrl);
  process.env.FIRNLINE_E2E_URL = baseUrl;

  return async () => {
    await server.close();
  };
}
