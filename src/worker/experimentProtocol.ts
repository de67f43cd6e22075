/**
 * Messages between the experiments view's worker pool and an experiment member worker. One job
 * per message; the answer is progress messages, then exactly one result. Typed arrays in a
 * result are transferred, not copied.
 */
import type { ValidScenario } from '../scenario/validateScenario';
import type { MemberRunResult } from './experimentMemberRun';

export interface MemberJob {
  /** 0-based position in member order. */
  index: number;
  /** The member's name (as in outcomes.csv). */
  name: string;
  scenario: ValidScenario;
}

export interface MemberProgress {
  phase: 'spinup' | 'run';
  /** Model years reached in this phase [a]. */
  year: number;
  /** Spin-up: the most it may take; run: its length [a]. */
  of: number;
}

export type ToMemberWorker = { type: 'run'; job: MemberJob };

export type FromMemberWorker =
  | { type: 'progress'; index: number; progress: MemberProgress }
  | { type: 'result'; index: number; result: MemberRunResult };

/** Every buffer of a result once (a buffer listed twice makes postMessage throw). */
export function resultTransferables(result: MemberRunResult): ArrayBuffer[] {
  if (result.status !== 'ok') return [];
  const arrays = [...Object.values(result.series), ...Object.values(result.finalProfile).filter((v) => v instanceof Float64Array)];
  return [...new Set(arrays.map((a) => (a as Float64Array).buffer as ArrayBuffer))];
}
