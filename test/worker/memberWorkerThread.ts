// Entry of a Node worker thread that answers member jobs exactly as the browser's member worker
// does (answerMemberJob), so the pool can be tested with real parallel threads. Bundled by
// threadMemberWorkers.ts with esbuild.
import { parentPort } from 'node:worker_threads';
import type { ToMemberWorker } from '../../src/worker/experimentProtocol';
import { answerMemberJob } from '../../src/worker/experimentMemberRun';

parentPort?.on('message', (message: ToMemberWorker) => {
  answerMemberJob(message.job, (reply, transfer) => parentPort?.postMessage(reply, transfer));
});
