/**
 * A failed run in words, one line, the same on the command line and in the browser: whether the
 * spin-up or the run failed, at which model year and position, and why.
 */
import { NumericalFailure } from '../model/numericalFailure';

/** The text on one line: each line break, with the spaces around it, becomes one space. */
export function oneLine(text: string): string {
  return text.replace(/\s*[\r\n]+\s*/g, ' ').trim();
}

export function describeFailure(error: unknown, phase: 'spinup' | 'run'): string {
  if (error instanceof NumericalFailure) {
    const where = error.position !== undefined && Number.isFinite(error.position) ? `, x = ${error.position.toFixed(0)} m` : '';
    return `numerical failure in the ${phase === 'spinup' ? 'spin-up' : 'run'} (model year ${error.year.toFixed(2)}${where}): ${oneLine(error.message)}`;
  }
  return `unexpected error: ${oneLine(error instanceof Error ? error.message : String(error))}`;
}
