/**
 * `firnline check`, and the scenario loading that `run` shares: only the validator (and its zod
 * schemas), so that checking a file never loads the model or the writers.
 */
import { formatMessage, MAX_SCENARIO_TEXT_BYTES, parseScenarioText, type ValidationResult, type ValidScenario } from '../scenario/validateScenario';
import { oneLine } from '../outputs/failureText';
import { CommandFailure, invalidDocumentText, readInputText } from './commandFiles';
import type { CliStreams } from './main';

export function loadScenario(path: string): { scenario: ValidScenario; warnings: Extract<ValidationResult, { ok: true }>['warnings'] } {
  const result = parseScenarioText(readInputText(path, 'scenario', MAX_SCENARIO_TEXT_BYTES, '20 MB'));
  if (!result.ok) throw new CommandFailure(invalidDocumentText('scenario', result.errors), 2);
  return { scenario: result.scenario, warnings: result.warnings };
}

export function checkCommand(scenarioPath: string, io: CliStreams): number {
  const { warnings } = loadScenario(scenarioPath);
  io.out('ok\n');
  for (const w of warnings) io.out(`warning: ${oneLine(formatMessage(w))}\n`);
  return 0;
}
