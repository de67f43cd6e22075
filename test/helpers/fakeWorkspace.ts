/**
 * A tab's editor reduced to what the project store needs (see ProjectWorkspace): a record that
 * is shown, snapshotted and edited. Two of them let two "tabs" share one storage without sharing
 * the page's stores.
 */
import type { SavedProject } from '../../src/state/projectRepository';
import type { ProjectWorkspace } from '../../src/state/projectWorkspace';
import type { Scenario } from '../../src/model/scenario';
import { checked } from './checkedScenario';
import { demoScenario } from '../../src/state/scenarioStore';

export interface FakeWorkspace extends ProjectWorkspace {
  /** What the editor holds now. */
  record: SavedProject;
  /** An edit, as the user would make one (through the validator, as the editor does). */
  edit(scenario: Scenario): void;
}

export function fakeWorkspace(): FakeWorkspace {
  const listeners = new Set<() => void>();
  const changed = () => listeners.forEach((listener) => listener());
  const workspace: FakeWorkspace = {
    record: { scenario: demoScenario, time: null },
    snapshot: () => workspace.record,
    async show(record) {
      workspace.record = record;
      changed();
      return null;
    },
    onChange(listener) {
      listeners.add(listener);
      return () => void listeners.delete(listener);
    },
    edit(scenario) {
      workspace.record = { ...workspace.record, scenario: checked(scenario) };
      changed();
    },
  };
  return workspace;
}
