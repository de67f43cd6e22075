/**
 * Real worker messages for store and component tests: the run driver computes a short demo run
 * in-process, and the messages are fed to the run store as the worker client would.
 */
import type { ValidScenario } from '../../src/scenario/validateScenario';
import { checked } from '../helpers/checkedScenario';
import { useRunStore } from '../../src/state/runStore';
import { demoScenario, useScenarioStore } from '../../src/state/scenarioStore';
import type { FromWorker } from '../../src/worker/protocol';
import { createRunDriver } from '../../src/worker/runDriver';

/** The demo without spin-up, 20 years with output every 5: frames at 0, 5, 10, 15, 20. */
export const shortDemo = checked({ ...demoScenario, spinup: false, run: { years: 20, outputEvery: 5 } });

export function runMessages(scenario: ValidScenario, runId: number): FromWorker[] {
  const messages: FromWorker[] = [];
  const queue: (() => void)[] = [];
  const driver = createRunDriver((m) => messages.push(m), (resume) => queue.push(resume));
  driver.handle({ type: 'start', runId, scenario });
  while (queue.length) queue.shift()!();
  return messages;
}

let cached: FromWorker[] | undefined;

/** Loads the short demo into the scenario store and a finished run of it into the run store. */
export function loadFinishedRun(): void {
  useScenarioStore.getState().load(shortDemo, 'Test');
  const runId = useRunStore.getState().runId + 1;
  cached ??= runMessages(shortDemo, 0);
  useRunStore.getState().begin(runId, useScenarioStore.getState().revision, shortDemo.run.years);
  useRunStore.getState().receive(cached.map((m) => ({ ...m, runId })));
}
