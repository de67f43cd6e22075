/** The pool's real workers in the browser, and its size from the cores the browser reports. */
import type { CreateMemberWorker, MemberWorkerLike } from './experimentPool';
import { poolSize } from './experimentPool';

export const createExperimentMemberWorker: CreateMemberWorker = () =>
  new Worker(new URL('./experimentMember.worker.ts', import.meta.url), { type: 'module', name: 'experiment-member' }) as MemberWorkerLike;

export function browserPoolSize(members: number): number {
  return poolSize(typeof navigator === 'undefined' ? undefined : navigator.hardwareConcurrency, members);
}
