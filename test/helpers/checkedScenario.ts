/**
 * Scenarios built in tests reach the stores, the workers and the command line the way the app's
 * do: through the one validator. `checked` throws, naming the errors, when a fixture is not valid.
 */
import type { Scenario } from '../../src/model/scenario';
import { validScenarioOf, type ValidScenario } from '../../src/scenario/validateScenario';

export function checked(scenario: Scenario): ValidScenario {
  return validScenarioOf(scenario, 'the test scenario');
}

/** The same for a scenario written as plain JSON data (e.g. a variant of a parsed example file). */
export function checkedJson(input: unknown): ValidScenario {
  return validScenarioOf(input, 'the test scenario');
}

/**
 * The one deliberate way around the validator, for tests of what a worker does with a message
 * whose scenario did not come from it (a corrupt message, a bug elsewhere): it must report a
 * failure, not crash. Lint allows `as ValidScenario` only here and in the validator.
 */
export function unchecked(scenario: Scenario): ValidScenario {
  return scenario as ValidScenario;
}
