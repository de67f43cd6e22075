/**
 * What the steady-glacier preview says, as a pure function of its state, so the wording of every
 * case (computing, steady, not yet steady, no glacier, refused edit, paused for a run, failed) is
 * tested without rendering.
 */
import type { SteadyGlacier } from '../../model/steadyGlacier';
import { formatKm, formatVolume } from './formatResult';

export type SteadyPreviewView =
  | { kind: 'off' }
  | { kind: 'refused' }
  | { kind: 'paused' }
  | { kind: 'computing' }
  | { kind: 'failed'; message: string }
  | { kind: 'glacier'; glacier: SteadyGlacier; unitWidth: boolean };

const years = new Intl.NumberFormat('en-GB');

export function steadyPreviewText(view: SteadyPreviewView): string {
  switch (view.kind) {
    case 'off':
      return '';
    case 'refused':
      return 'No steady glacier shown: the last edit was not applied (the reason is at the field). Correct it, or press Escape there to go back.';
    case 'paused':
      return 'The steady-glacier preview waits while the run goes on.';
    case 'computing':
      return 'Working out the steady glacier for this climate…';
    case 'failed':
      return `The steady glacier could not be worked out: ${view.message}.`;
    case 'glacier': {
      const { glacier, unitWidth } = view;
      const after = `${years.format(glacier.years)} model years`;
      if (glacier.iceFree) {
        return glacier.converged
          ? 'No glacier survives in this valley under this climate.'
          : `No glacier in this valley after ${after} under this climate (not yet steady).`;
      }
      const numbers = `terminus ${formatKm(glacier.terminus)}, ${formatVolume(glacier.volume, unitWidth)}`;
      return glacier.converged
        ? `Steady glacier for this climate: ${numbers}`
        : `Not yet steady after ${after} under this climate: so far ${numbers}, still changing.`;
    }
  }
}
