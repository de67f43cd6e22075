/**
 * Messages between the main thread and the steady-glacier preview worker. Each request carries a
 * generation number; a newer 'compute' replaces the one under way, and any message about an older
 * generation is dropped on both sides. Typed both ways, like protocol.ts.
 */
import type { SteadyGlacier } from '../model/steadyGlacier';
import type { ValidScenario } from '../scenario/validateScenario';

export type { SteadyGlacier } from '../model/steadyGlacier';

export type ToPreviewWorker =
  | { type: 'compute'; generation: number; scenario: ValidScenario }
  /** Stop the computation of `generation` (a newer 'compute' stops it too). */
  | { type: 'cancel'; generation: number };

export type FromPreviewWorker =
  | { type: 'result'; generation: number; glacier: SteadyGlacier }
  | { type: 'failed'; generation: number; message: string; year?: number; position?: number };
