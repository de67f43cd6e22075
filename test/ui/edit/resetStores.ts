/** Fresh document and editor state for each component test. */
import { demoScenario, useScenarioStore } from '../../../src/state/scenarioStore';
import { EDITOR_INITIAL_STATE, useEditorStore } from '../../../src/state/editorStore';

export function resetStores(): void {
  useScenarioStore.getState().load(demoScenario, 'Open demo');
  useEditorStore.setState(EDITOR_INITIAL_STATE);
}
