/**
 * The steady-glacier preview worker's logic without the Worker: spins the current scenario up to
 * its steady glacier in short slices (SLICE_MS) and, between slices, hears a newer 'compute' or a
 * 'cancel'. The slice checks that its job is still the latest generation before every step, so a
 * replaced job never posts. Posting, yielding and the clock are injected, so tests run it in Node
 * with a hand-cranked scheduler, as runDriver.ts and analysisDriver.ts do.
 */
import { steadyGlacierSteps, type SteadyGlacier } from '../model/steadyGlacier';
import type { FromPreviewWorker, ToPreviewWorker } from './steadyPreviewProtocol';
import { SLICE_MS, type Schedule } from './runDriver';
import { failureFields, sliceWaker } from './sliceWaker';

export type PreviewPost = (message: FromPreviewWorker, transfer: ArrayBuffer[]) => void;

interface PreviewJob {
  generation: number;
  steps: Generator<number, SteadyGlacier, void>;
}

export interface PreviewDriver {
  handle(message: ToPreviewWorker): void;
}

export function createPreviewDriver(post: PreviewPost, schedule: Schedule, now: () => number = () => performance.now()): PreviewDriver {
  let latest = 0;
  let active: PreviewJob | undefined;
  const { wake } = sliceWaker(schedule, () => slice());

  const slice = () => {
    const job = active;
    if (!job) return;
    const start = now();
    try {
      do {
        const next = job.steps.next();
        if (next.done) {
          active = undefined;
          const { glacier, transfer } = transferable(next.value);
          post({ type: 'result', generation: job.generation, glacier }, transfer);
          return;
        }
      } while (now() - start < SLICE_MS);
    } catch (error) {
      active = undefined;
      post({ type: 'failed', generation: job.generation, ...failureFields(error) }, []);
      return;
    }
    wake();
  };

  return {
    handle(message) {
      // Messages of an older generation than one already seen are late: ignored.
      if (message.generation < latest) return;
      latest = message.generation;
      active = undefined;
      if (message.type === 'cancel') return;
      try {
        active = { generation: message.generation, steps: steadyGlacierSteps(message.scenario) };
      } catch (error) {
        post({ type: 'failed', generation: message.generation, ...failureFields(error) }, []);
        return;
      }
      wake();
    },
  };
}

function transferable(glacier: SteadyGlacier): { glacier: SteadyGlacier; transfer: ArrayBuffer[] } {
  return { glacier, transfer: [glacier.x.buffer, glacier.thickness.buffer, glacier.surface.buffer] as ArrayBuffer[] };
}
