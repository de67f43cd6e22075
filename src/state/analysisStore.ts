/**
 * The state of the analyses (committed change, sensitivity curve, calibration, fit to the observations,
 * bed from the surface), fed by the
 * analysis client: for each, its status, latest progress, result or failure, and the scenario
 * revision it was made from. One analysis runs at a time (`active`). Plain transitions of
 * messages, tested without a worker, like runStore.
 */
import { create } from 'zustand';
import type { AnalysisProgress } from '../model/analysis/stepwise';
import type { AnalysisSink } from '../worker/analysisClient';
import type { AnalysisKind, AnalysisResult, FromAnalysisWorker } from '../worker/analysisProtocol';

export type AnalysisStatus = 'idle' | 'running' | 'done' | 'cancelled' | 'failed';

export type ResultOf<K extends AnalysisKind> = Extract<AnalysisResult, { kind: K }>;

export interface AnalysisSlot<K extends AnalysisKind> {
  status: AnalysisStatus;
  jobId: number;
  progress: AnalysisProgress | null;
  result: ResultOf<K> | null;
  failure: string | null;
  /** scenarioStore revision the analysis was asked for with; null before any. */
  revision: number | null;
}

export interface AnalysisState {
  /** The analysis under way, if any. */
  active: AnalysisKind | null;
  committed: AnalysisSlot<'committed'>;
  sensitivity: AnalysisSlot<'sensitivity'>;
  calibration: AnalysisSlot<'calibration'>;
  fit: AnalysisSlot<'fit'>;
  inversion: AnalysisSlot<'inversion'>;
  /** The bed from the surface is previewed on the long profile (until Apply or Discard). */
  inversionPreview: boolean;
  setInversionPreview: (shown: boolean) => void;
  /** The client has sent 'start' for job `jobId`; the previous result stays until the new one. */
  begin: (kind: AnalysisKind, jobId: number, revision: number) => void;
  receive: (message: FromAnalysisWorker) => void;
  /** The worker died or could not start: the analysis under way failed with this text. */
  lost: (message: string) => void;
  reset: () => void;
}

const empty = <K extends AnalysisKind>(): AnalysisSlot<K> => ({
  status: 'idle',
  jobId: 0,
  progress: null,
  result: null,
  failure: null,
  revision: null,
});

const KINDS: AnalysisKind[] = ['committed', 'sensitivity', 'calibration', 'fit', 'inversion'];

export const useAnalysisStore = create<AnalysisState>()((set, get) => {
  /** The kind whose slot holds job `jobId`, if that job is still the latest of its kind. */
  const kindOf = (jobId: number): AnalysisKind | undefined => KINDS.find((k) => get()[k].jobId === jobId);
  const update = (kind: AnalysisKind, patch: Partial<AnalysisSlot<AnalysisKind>>, finished: boolean) =>
    set((s) => ({
      [kind]: { ...s[kind], ...patch },
      ...(finished && s.active === kind ? { active: null } : {}),
    }) as Partial<AnalysisState>);
  return {
    active: null,
    committed: empty(),
    sensitivity: empty(),
    calibration: empty(),
    fit: empty(),
    inversion: empty(),
    inversionPreview: false,
    setInversionPreview(shown) {
      set({ inversionPreview: shown });
    },
    begin(kind, jobId, revision) {
      set((s) => ({ active: kind, [kind]: { ...s[kind], status: 'running', jobId, progress: null, failure: null, revision } }) as Partial<AnalysisState>);
    },
    receive(message) {
      const kind = kindOf(message.jobId);
      if (!kind || get()[kind].status !== 'running') return;
      switch (message.type) {
        case 'progress':
          update(kind, { progress: message.progress }, false);
          break;
        case 'result':
          update(kind, { status: 'done', result: message.result, progress: null }, true);
          // A new bed from the surface is shown on the long profile until applied or discarded.
          if (kind === 'inversion') set({ inversionPreview: true });
          break;
        case 'cancelled':
          update(kind, { status: 'cancelled', progress: null }, true);
          break;
        case 'failed': {
          const where =
            message.year !== undefined
              ? ` (model year ${message.year.toFixed(1)}${message.position !== undefined && Number.isFinite(message.position) ? `, ${(message.position / 1000).toFixed(2)} km down-valley` : ''})`
              : '';
          update(kind, { status: 'failed', failure: `${message.message}${where}`, progress: null }, true);
          break;
        }
      }
    },
    lost(message) {
      const kind = get().active;
      if (kind) update(kind, { status: 'failed', failure: message, progress: null }, true);
    },
    reset() {
      set({ active: null, committed: empty(), sensitivity: empty(), calibration: empty(), fit: empty(), inversion: empty(), inversionPreview: false });
    },
  };
});

/** The analysis store as the analysis client's sink: each call reads the store afresh. */
export const analysisStoreSink: AnalysisSink = {
  begin: (kind, jobId, revision) => useAnalysisStore.getState().begin(kind, jobId, revision),
  receive: (message) => useAnalysisStore.getState().receive(message),
  lost: (message) => useAnalysisStore.getState().lost(message),
  busy: () => useAnalysisStore.getState().active !== null,
};
