/**
 * Asks for the steady glacier of the current scenario whenever what its spin-up depends on changes
 * (runScenario.spinUpKey: geometry, flow and the year-0 climate, not the run length), and says what
 * the profile should show. The request under way is replaced by the next edit; while a run goes
 * on the preview waits (the run's own spin-up is on screen, and both would share the second core).
 */
import { useEffect, useMemo } from 'react';
import { spinUpKey } from '../../model/runScenario';
import { isActive, useRunStore } from '../../state/runStore';
import { useScenarioStore } from '../../state/scenarioStore';
import { useSteadyPreviewStore } from '../../state/steadyPreviewStore';
import { usePreviewClient } from './PreviewClientContext';
import type { SteadyPreviewView } from './steadyPreviewText';

export function useSteadyPreview(): SteadyPreviewView {
  const client = usePreviewClient();
  const scenario = useScenarioStore((s) => s.scenario);
  const key = useMemo(() => spinUpKey(scenario), [scenario]);
  const enabled = useSteadyPreviewStore((s) => s.enabled);
  const runActive = useRunStore((s) => isActive(s.status));
  const status = useSteadyPreviewStore((s) => s.status);
  const glacier = useSteadyPreviewStore((s) => s.glacier);
  const glacierKey = useSteadyPreviewStore((s) => s.glacierKey);
  const failure = useSteadyPreviewStore((s) => s.failure);
  const refused = useSteadyPreviewStore((s) => Object.keys(s.refusals).length > 0);

  useEffect(() => {
    const state = useSteadyPreviewStore.getState();
    if (!enabled || runActive) {
      if (state.status === 'computing') client.cancel();
      return;
    }
    // Already shown, or under way: nothing new to ask.
    if (state.glacierKey === key || (state.key === key && state.status !== 'idle')) return;
    client.request(scenario, key);
  }, [client, scenario, key, enabled, runActive]);

  if (!enabled) return { kind: 'off' };
  if (refused) return { kind: 'refused' };
  if (runActive) return { kind: 'paused' };
  if (glacier && glacierKey === key) return { kind: 'glacier', glacier, unitWidth: !scenario.width };
  if (status === 'failed' && failure) return { kind: 'failed', message: failure };
  return { kind: 'computing' };
}
