/**
 * The live steady-glacier preview: whether it is wanted (kept in localStorage), the request under
 * way (its generation and the spin-up key of its scenario, runScenario.spinUpKey), the latest
 * steady glacier and what it was made from, and the edits refused at a field right now (while
 * one is shown the preview shows nothing, since it would be of the document, not of what was
 * typed). Plain transitions of the preview client's messages, tested without a worker.
 */
import { create } from 'zustand';
import type { SteadyGlacier } from '../model/steadyGlacier';
import type { PreviewSink } from '../worker/steadyPreviewClient';
import type { FromPreviewWorker } from '../worker/steadyPreviewProtocol';

/** localStorage key of the on/off choice. */
export const STEADY_PREVIEW_SETTING = 'firnline.steadyPreview';

export type PreviewStatus = 'idle' | 'computing' | 'ready' | 'failed';

export interface SteadyPreviewState {
  enabled: boolean;
  status: PreviewStatus;
  /** Generation of the latest request; answers of others are dropped. */
  generation: number;
  /** Spin-up key of the latest request (null: none, or it was cancelled). */
  key: string | null;
  /** The latest steady glacier and the spin-up key it was made for. */
  glacier: SteadyGlacier | null;
  glacierKey: string | null;
  failure: string | null;
  /** Edits refused and shown at a field, by field; empty when none. */
  refusals: Record<string, string>;
  setEnabled: (enabled: boolean) => void;
  begin: (generation: number, key: string) => void;
  cancelled: (generation: number) => void;
  receive: (message: FromPreviewWorker) => void;
  lost: (generation: number, message: string) => void;
  refuse: (field: string, message: string) => void;
  clearRefusal: (field: string) => void;
}

function readSetting(): boolean {
  try {
    return globalThis.localStorage?.getItem(STEADY_PREVIEW_SETTING) !== 'off';
  } catch {
    return true;
  }
}

function writeSetting(enabled: boolean): void {
  try {
    globalThis.localStorage?.setItem(STEADY_PREVIEW_SETTING, enabled ? 'on' : 'off');
  } catch {
    // Storage refused (private mode, quota): the choice holds for this page only.
  }
}

export const useSteadyPreviewStore = create<SteadyPreviewState>()((set, get) => ({
  enabled: readSetting(),
  status: 'idle',
  generation: 0,
  key: null,
  glacier: null,
  glacierKey: null,
  failure: null,
  refusals: {},
  setEnabled(enabled) {
    writeSetting(enabled);
    set({ enabled });
  },
  begin(generation, key) {
    set({ generation, key, status: 'computing', failure: null });
  },
  cancelled(generation) {
    set({ generation, key: null, status: get().glacier ? 'ready' : 'idle' });
  },
  receive(message) {
    if (message.generation !== get().generation) return;
    if (message.type === 'result') set({ status: 'ready', glacier: message.glacier, glacierKey: get().key, failure: null });
    else set({ status: 'failed', failure: message.message, glacier: null, glacierKey: null });
  },
  lost(generation, message) {
    if (generation !== get().generation) return;
    set({ status: 'failed', failure: message, key: null, glacier: null, glacierKey: null });
  },
  refuse(field, message) {
    if (get().refusals[field] === message) return;
    set({ refusals: { ...get().refusals, [field]: message } });
  },
  clearRefusal(field) {
    if (!(field in get().refusals)) return;
    const { [field]: _cleared, ...rest } = get().refusals;
    set({ refusals: rest });
  },
}));

/** The preview store as the preview client's sink: each call reads the store afresh. */
export const steadyPreviewSink: PreviewSink = {
  begin: (generation, key) => useSteadyPreviewStore.getState().begin(generation, key),
  cancelled: (generation) => useSteadyPreviewStore.getState().cancelled(generation),
  receive: (message) => useSteadyPreviewStore.getState().receive(message),
  lost: (generation, message) => useSteadyPreviewStore.getState().lost(generation, message),
};
