/**
 * Opens an experiment member in the workbench: its scenario becomes the workbench scenario as one
 * named, undoable change, the workbench is shown and the run starts there. The model is
 * deterministic, so this is the same run the experiment made, now with every workbench view.
 */
import type { ExperimentMember } from '../../experiment/validateExperiment';
import { useScenarioStore } from '../../state/scenarioStore';
import { useViewStore } from '../../state/viewStore';
import type { RunClient } from '../../worker/workerClient';

export function openMemberInWorkbench(member: ExperimentMember, client: RunClient): void {
  const scenarios = useScenarioStore.getState();
  scenarios.apply(member.scenario, `Open experiment member ${member.name}`);
  const { scenario, revision } = useScenarioStore.getState();
  useViewStore
    .getState()
    .show(
      'workbench',
      `Member ${member.name} is now the workbench scenario (one change: Undo returns to the scenario before) and is running here. ` +
        'The model is deterministic, so this is the same run as in the experiment, shown in every workbench view.',
    );
  client.run(scenario, revision);
}
