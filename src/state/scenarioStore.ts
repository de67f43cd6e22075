/**
 * The scenario document and its edit history (undo/redo). Every edit goes through `apply`, which
 * takes a complete, already validated scenario: the document is always valid, and nothing is
 * ever half-applied. Edits that belong together (the frames of a drag) are committed once, when
 * the gesture ends. Run state, the editor and projects live in their own stores.
 */
import { create } from 'zustand';
import demo from '../../examples/demo-valley.json';
import type { Scenario } from '../model/scenario';

// JSON imports type tuples as number[][] and literals as string; the demo is a checked-in file
// in the scenario format (a test validates it), so it is asserted here.
export const demoScenario = demo as unknown as Scenario;

/** Most edits kept for undo. */
export const HISTORY_LIMIT = 200;

export interface HistoryEntry {
  scenario: Scenario;
  /** What the edit did, for menus and tooltips ("Move bed point", "Set ELA"). */
  label: string;
}

export interface ScenarioState {
  scenario: Scenario;
  /** Label of the edit that produced the current document. */
  label: string;
  past: HistoryEntry[];
  future: HistoryEntry[];
  /** Increases with every change of the document (edit, undo, redo, load): results made from an
   * older revision are stale. */
  revision: number;
  /** Commits a complete, valid scenario as one undoable edit. */
  apply: (next: Scenario, label: string) => void;
  undo: () => void;
  redo: () => void;
  /** Opens another document (a project, a file, the demo): history starts afresh. */
  load: (scenario: Scenario, label?: string) => void;
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
