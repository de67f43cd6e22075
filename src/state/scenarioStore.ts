/**
 * The scenario currently open in the app. Kept to the one slice for now; run state, results and
 * edits get their own slices when they exist.
 */
import { create } from 'zustand';
import type { Scenario } from '../model/scenario';
import demo from '../../examples/demo-valley.json';

// JSON imports type tuples as number[][] and literals as string; the demo is a checked-in file
// in the scenario format, so it is asserted here rather than validated at every start-up.
export const demoScenario = demo as unknown as Scenario;

export interface ScenarioState {
  scenario: Scenario;
  setScenario: (scenario: Scenario) => void;
}

export const useScenarioStore = create<ScenarioState>()((set) => ({
  scenario: demoScenario,
  setScenario: (scenario) => set({ scenario }),
}));
