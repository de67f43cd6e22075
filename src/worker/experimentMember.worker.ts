/**
 * An experiment member worker: runs each member it is sent, one at a time, and answers with its
 * progress and its result. The pool (experimentPool.ts) hands it the next member when it is free.
 */
import type { ToMemberWorker } from './experimentProtocol';
import { answerMemberJob } from './experimentMemberRun';


onmessage = (event: MessageEvent<ToMemberWorker>) => {
  answerMemberJob(event.data.job, (message, transfer) => postMessage(message, transfer));
};
