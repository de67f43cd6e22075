/**
 * Saves a scenario as a JSON file through the browser's download, the one way to keep work when
 * the browser's own storage cannot. The file is the scenario format the app and the command
 * line read.
 */
import type { Scenario } from '../../model/scenario';
import { downloadBlob } from './downloadBlob';

/** A file-name stem from a document's name: letters, digits, dashes, at most 80; `fallback` when empty. */
export function fileStem(name: string | undefined, fallback: string): string {
  const base = (name ?? '').normalize('NFKD').replace(/[^\w-]+/g, '-').replace(/^-+|-+$/g, '').slice(0, 80);
  return base || fallback;
}

/** A JSON document as the app saves it: two-space indents, a final newline. */
export function jsonFileText(value: unknown): string {
  return `${JSON.stringify(value, null, 2)}\n`;
}

/** A file name from the scenario name: letters, digits, dashes; never empty. */
export function scenarioFileName(scenario: Scenario): string {
  return `${fileStem(scenario.name, 'scenario')}.json`;
}

export function scenarioFileText(scenario: Scenario): string {
  return jsonFileText(scenario);
}

export function downloadScenario(scenario: Scenario): void {
  downloadBlob(new Blob([scenarioFileText(scenario)], { type: 'application/json' }), scenarioFileName(scenario));
}
