/**
 * Workers for the experiment pool in Node tests. In-process workers run the member worker's own
 * code (answerMemberJob) on a later macrotask and pass messages through structuredClone with
 * transfer, as postMessage does. (threadMemberWorker.ts runs the same code on real threads.)
 */
import type { FromMemberWorker, ToMemberWorker } from '../../src/worker/experimentProtocol';
import { answerMemberJob } from '../../src/worker/experimentMemberRun';
import type { MemberWorkerLike } from '../../src/worker/experimentPool';

type Handlers = Pick<MemberWorkerLike, 'onmessage' | 'onerror' | 'onmessageerror'>;

export class InProcessMemberWorker implements MemberWorkerLike {
  onmessage: Handlers['onmessage'] = null;
  onerror: Handlers['onerror'] = null;
  onmessageerror: Handlers['onmessageerror'] = null;
  terminated = false;
  readonly received: ToMemberWorker[] = [];

  /** `crashOn`: member indices on which a worker dies instead of answering (each once; shared by workers). */
  constructor(private readonly crashOn: Set<number> = new Set()) {}

  postMessage(message: ToMemberWorker): void {
    this.received.push(structuredClone(message));
    const job = this.received[this.received.length - 1].job;
    setTimeout(() => {
      if (this.terminated) return;
      if (this.crashOn.delete(job.index)) {
        this.onerror?.({ message: 'out of memory (simulated)', preventDefault: () => undefined } as ErrorEvent);
        return;
      }
      const replies: FromMemberWorker[] = [];
      answerMemberJob(job, (reply, transfer) => replies.push(structuredClone(reply, { transfer })));
      // Each reply on its own task, so replies of different workers interleave.
      for (const reply of replies) setTimeout(() => !this.terminated && this.onmessage?.({ data: reply } as MessageEvent<FromMemberWorker>), 0);
    }, 0);
  }

  terminate(): void {
    this.terminated = true;
  }
}

/** A worker that takes jobs and never answers (for cancelling). */
export class SilentMemberWorker implements MemberWorkerLike {
  onmessage: Handlers['onmessage'] = null;
  onerror: Handlers['onerror'] = null;
  onmessageerror: Handlers['onmessageerror'] = null;
  terminated = false;
  readonly received: ToMemberWorker[] = [];
  postMessage(message: ToMemberWorker): void {
    this.received.push(message);
  }
  terminate(): void {
    this.terminated = true;
  }
  /** Delivers a message as if the worker had sent it. */
  emit(message: FromMemberWorker): void {
    this.onmessage?.({ data: message } as MessageEvent<FromMemberWorker>);
  }
}
