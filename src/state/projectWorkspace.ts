/**
 * What a project is in the open page: the scenario (scenarioStore), the selected model year
 * (playbackStore, runStore) and the experiment (experimentStore). The project store reads it to
 * save, replaces it to open a project, and hears of its changes through this one interface; tests
 * may pass a fake in its place.
 */
import type { ValidationMessage } from '../scenario/validationMessage';
import { useExperimentStore } from './experimentStore';
import { usePlaybackStore } from './playbackStore';
import type { SavedProject } from './projectRepository';
import { useRunStore } from './runStore';
import { useScenarioStore } from './scenarioStore';

export interface ProjectWorkspace {
  /** What would be saved now. */
  snapshot(): SavedProject;
  /**
   * Opens `record`: its scenario goes into the editor and old results are dropped. Resolves to
   * the reasons its experiment was left out, if it was (the scenario still opens).
   */
  show(record: SavedProject, label: string): Promise<readonly ValidationMessage[] | null>;
  /** Calls `listener` on every change that is worth saving; returns the way to stop. */
  onChange(listener: () => void): () => void;
}

/** The page's own stores. */
export function storeWorkspace(): ProjectWorkspace {
  /** The selected model year: the selected frame's, or the one waiting for a run to reach it. */
  const currentTime = (): number | null => {
    const frames = useRunStore.getState().frames;
    if (!frames.length) return usePlaybackStore.getState().pendingTime;
    return frames[Math.min(usePlaybackStore.getState().index, frames.length - 1)].time;
  };

  return {
    snapshot() {
      const experiment = useExperimentStore.getState().experiment;
      return { scenario: useScenarioStore.getState().scenario, time: currentTime(), ...(experiment ? { experiment } : {}) };
    },

    async show(record, label) {
      useRunStore.getState().reset();
      useScenarioStore.getState().load(record.scenario, label);
      // Checked by the experiment store (off the page's thread when large); one that no longer
      // validates is left out, and the scenario opens as saved.
      const experiment = await useExperimentStore.getState().load(record.experiment ?? null);
      if (!experiment.ok) await useExperimentStore.getState().load(null);
      usePlaybackStore.getState().setPendingTime(record.time);
      return experiment.ok ? null : experiment.errors;
    },

    onChange(listener) {
      const offScenario = useScenarioStore.subscribe((s, prev) => {
        if (s.scenario !== prev.scenario) listener();
      });
      const offPlayback = usePlaybackStore.subscribe((s, prev) => {
        if (s.index !== prev.index && !s.playing) listener();
      });
      const offExperiment = useExperimentStore.subscribe((s, prev) => {
        if (s.experiment !== prev.experiment) listener();
      });
      return () => {
        offScenario();
        offPlayback();
        offExperiment();
      };
    },
  };
}
