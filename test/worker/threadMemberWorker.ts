/**
 * Real parallel workers for the pool in Node tests: node:worker_threads running the member
 * worker's own code (memberWorkerThread.ts, bundled with esbuild) behind the browser Worker's
 * interface.
 */
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { Worker } from 'node:worker_threads';
import { build } from 'esbuild';
import type { FromMemberWorker, ToMemberWorker } from '../../src/worker/experimentProtocol';
import type { MemberWorkerLike } from '../../src/worker/experimentPool';

type Handlers = Pick<MemberWorkerLike, 'onmessage' | 'onerror' | 'onmessageerror'>;

let bundled: Promise<string> | undefined;

/** The thread entry bundled once per test file. */
export function bundleThreadWorker(): Promise<string> {
  bundled ??= (async () => {
    const outfile = join(mkdtempSync(join(tmpdir(), 'firnline-pool-')), 'member-thread.mjs');
    await build({ entryPoints: [fileURLToPath(new URL('./memberWorkerThread.ts', import.meta.url))], outfile, bundle: true, platform: 'node', format: 'esm', logLevel: 'warning' });
    return outfile;
  })();
  return bundled;
}

/** A node worker thread behind the browser Worker's interface. */
export class ThreadMemberWorker implements MemberWorkerLike {
  onmessage: Handlers['onmessage'] = null;
  onerror: Handlers['onerror'] = null;
  onmessageerror: Handlers['onmessageerror'] = null;
  private readonly thread: Worker;
  constructor(file: string) {
    this.thread = new Worker(file);
    this.thread.on('message', (data: FromMemberWorker) => this.onmessage?.({ data } as MessageEvent<FromMemberWorker>));
    this.thread.on('error', (error) => this.onerror?.({ message: error.message, preventDefault: () => undefined } as ErrorEvent));
  }
  postMessage(message: ToMemberWorker): void {
    this.thread.postMessage(message);
  }
  terminate(): void {
    void this.thread.terminate();
  }
}
