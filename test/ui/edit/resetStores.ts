/** Fresh document and editor state for each component test. */
import { demoScenario, useScenarioStore } from '../../../src/state/scenarioStore';
import { useEditorStore, DEFAULT_DRAW_TOLERANCE_M } from '../../../src/state/editorStore';

export function resetStores(): void {
  useScenarioStore.getState().load(demoScenario, 'Open demo');
  useEditorStore.setState({
    mode: 'view',
    target: 'bed',
    selected: null,
    snap: false,
    drawToleranceM: DEFAULT_DRAW_TOLERANCE_M,
    stroke: null,
    dragPreview: null,
    notice: null,
  });
}
