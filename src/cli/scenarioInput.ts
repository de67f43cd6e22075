/**
 * The scenario file as the calibration and analysis commands read it: through the one validator,
 * its errors worded as for `run` (exit 2), its warnings on stderr unless --quiet.
 */
import { formatMessage, MAX_SCENARIO_TEXT_BYTES, parseScenarioText, type ValidScenario } from '../scenario/validateScenario';
import { oneLine } from '../outputs/failureText';
import { CommandFailure, invalidDocumentText, readInputText } from './commandFiles';

export function readValidScenario(path: string, quiet: boolean, err: (text: string) => void): ValidScenario {
  const result = parseScenarioText(readInputText(path, 'scenario', MAX_SCENARIO_TEXT_BYTES, '20 MB'));
  if (!result.ok) throw new CommandFailure(invalidDocumentText('scenario', result.errors), 2);
  if (!quiet) for (const w of result.warnings) err(`warning: ${oneLine(formatMessage(w))}\n`);
  return result.scenario;
}
