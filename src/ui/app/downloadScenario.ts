/**
 * Saves a scenario as a JSON file through the browser's download, the one way to keep work when
 * the browser's own storage cannot. The file is the scenario format the app and the command
 * line read.
 */
import type { Scenario } from '../../model/scenario';

/** A file name from the scenario name: letters, digits, dashes; never empty. */
export function scenarioFileName(scenario: Scenario): string {
  const base = (scenario.name ?? '').normalize('NFKD').replace(/[^\w-]+/g, '-').replace(/^-+|-+$/g, '').slice(0, 80);
  return `${base || 'scenario'}.json`;
}

export function scenarioFileText(scenario: Scenario): string {
  return `${JSON.stringify(scenario, null, 2)}\n`;
}

export function downloadScenario(scenario: Scenario): void {
  const url = URL.createObjectURL(new Blob([scenarioFileText(scenario)], { type: 'application/json' }));
  const link = document.createElement('a');
  link.href = url;
  link.download = scenarioFileName(scenario);
  link.click();
  // The click has handed the blob to the download; freeing it at once can cancel it in some browsers.
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}
