/**
 * A scenario for tests, through the one validator like every scenario the app and the command
 * line run: a fixture that does not validate fails the test with the validator's messages.
 */
import { formatMessage, validateScenario } from '../../src/io/validateScenario';

export function validScenario(input: unknown) {
  const result = validateScenario(input);
  if (!result.ok) throw new Error(`test scenario is not valid:\n${result.errors.map(formatMessage).join('\n')}`);
  return result.scenario;
}
