/**
 * Saves a scenario as a JSON file through the browser's download, the one way to keep work when
 * the browser's own storage cannot. The file is the scenario format the app and the command
 * line read.
 */
import type { Scenario } from '../../model/scenario';
import { downloadBlob } from './downloadBlob';

/** A file name from the scenario name: letters, digits, dashes; never empty. */
export function scenarioFileName(scenario: Scenario): string {
  const base = (scenario.name ?? '').normalize('NFKD').replace(/[^\w-]+/g, '-').replace(/^-+|-+$/g, '').slice(0, 80);
  return `${base || 'scenario'}.json`;
}

export function scenarioFileText(scenario: Scenario): string {
  return `${JSON.stringify(scenario, null, 2)}\n`;
}

export function downloadScenario(scenario: Scenario): void {
  downloadBlob(new Blob([scenarioFileText(scenario)], { type: 'application/json' }), scenarioFileName(scenario));
}
