/**
 * The scenario document and its edit history (undo/redo). Every edit goes through `apply`, which
 * takes a complete, already validated scenario: the document is always valid, and nothing is
 * ever half-applied. Edits that belong together (the frames of a drag) are committed once, when
 * the gesture ends. Run state, the editor and projects live in their own stores.
 */
import { create } from 'zustand';
import demo from '../../examples/demo-valley.json';
import { validScenarioOf, type ValidScenario } from '../scenario/validateScenario';

// The demo is a checked-in file in the scenario format; it goes through the validator like any
// other scenario (a broken demo fails loudly at start-up, and a test validates it too).
export const demoScenario = validScenarioOf(demo, 'examples/demo-valley.json');

/** Most edits kept for undo. */
export const HISTORY_LIMIT = 200;

export interface HistoryEntry {
  scenario: ValidScenario;
  /** What the edit did, for menus and tooltips ("Move bed point", "Set ELA"). */
  label: string;
}

export interface ScenarioState {
  scenario: ValidScenario;
  /** Label of the edit that produced the current document. */
  label: string;
  past: HistoryEntry[];
  future: HistoryEntry[];
  /** Increases with every change of the document (edit, undo, redo, load): results made from an
   * older revision are stale. */
  revision: number;
  /** Commits a complete, valid scenario as one undoable edit. */
  apply: (next: ValidScenario, label: string) => void;
  undo: () => void;
  redo: () => void;
  /** Opens another document (a project, a file, the demo): history starts afresh. */
  load: (scenario: ValidScenario, label?: string) => void;
}

export const useScenarioStore = create<ScenarioState>()((set, get) => ({
  scenario: demoScenario,
  label: 'Open demo',
  past: [],
  future: [],
  revision: 0,
  apply(next, label) {
    const { scenario, label: previousLabel, past, revision } = get();
    if (next === scenario) return;
    set({
      scenario: next,
      label,
      past: [...past, { scenario, label: previousLabel }].slice(-HISTORY_LIMIT),
      future: [],
      revision: revision + 1,
    });
  },
  undo() {
    const { scenario, label, past, future, revision } = get();
    const previous = past[past.length - 1];
    if (!previous) return;
    set({
      scenario: previous.scenario,
      label: previous.label,
      past: past.slice(0, -1),
      future: [{ scenario, label }, ...future],
      revision: revision + 1,
    });
  },
  redo() {
    const { scenario, label, past, future, revision } = get();
    const next = future[0];
    if (!next) return;
    set({
      scenario: next.scenario,
      label: next.label,
      past: [...past, { scenario, label }],
      future: future.slice(1),
      revision: revision + 1,
    });
  },
  load(scenario, label = 'Open') {
    set({ scenario, label, past: [], future: [], revision: get().revision + 1 });
  },
}));
