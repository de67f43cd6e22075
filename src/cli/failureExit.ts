/**
 * How a command's failure ends: one line on stderr, without a stack trace (FIRNLINE_DEBUG=1 adds
 * it for unexpected errors), and the exit code: 2 for input the user can fix, 3 when the model
 * itself fails, 1 otherwise. Shared by main.ts and the check bundle (checkEntry.ts), which
 * carries its own copy of the error classes and so must judge its errors itself.
 */
import { CommandFailure, FailedRun } from './commandFiles';
import { oneLine } from '../outputs/failureText';
import type { CliStreams } from './main';

export const EXIT_UNEXPECTED = 1;
export const EXIT_NUMERICAL_FAILURE = 3;

function errorText(error: unknown): string {
  return error instanceof Error ? error.message : String(error);
}

/** Reports `error` on io.err and returns the exit code. */
export function failureExit(error: unknown, io: CliStreams): number {
  if (error instanceof CommandFailure) {
    io.err(`firnline: ${error.message}\n`);
    return error.exitCode;
  }
  if (error instanceof FailedRun) {
    io.err(`firnline: ${error.message}\n`);
    return EXIT_NUMERICAL_FAILURE;
  }
  io.err(`firnline: unexpected error: ${oneLine(errorText(error))}\n`);
  if (io.env.FIRNLINE_DEBUG === '1' && error instanceof Error && error.stack) io.err(error.stack + '\n');
  return EXIT_UNEXPECTED;
}
