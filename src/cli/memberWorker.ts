// Worker thread of `firnline experiment` (bundled to dist/firnline-member-worker.mjs): runs each
// member it is sent and answers with that member's rows; one member at a time, so the main thread
// can hand the next one to whichever worker is free.
import { parentPort } from 'node:worker_threads';
import { runMemberJob, type MemberJob } from './experimentMember';

parentPort?.on('message', (job: MemberJob) => {
  parentPort?.postMessage(runMemberJob(job));
});
