/** One experiment check, as the experiment check worker and the page both run it. */
import { parseExperimentText, validateExperiment, type ExperimentValidation } from '../experiment/validateExperiment';

/** An experiment file's text (JSON syntax checked first), or parsed JSON data. */
export type CheckRequest = { text: string } | { experiment: unknown };

export function checkNow(request: CheckRequest): ExperimentValidation {
  return 'text' in request ? parseExperimentText(request.text) : validateExperiment(request.experiment);
}
