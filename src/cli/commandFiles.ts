/**
 * Files as the command's subcommands read and write them, and their failures worded for the
 * user: a CommandFailure carries the message and the exit code (2: input the user can fix; 1:
 * files that could not be written). One set for `run`, `experiment` and `merge`.
 */
import { mkdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { oneLine } from '../outputs/failureText';
import { formatMessage, type ValidationMessage } from '../scenario/validationMessage';
import { writeWhole } from './writeWhole';

/** The model could not go on (a NumericalFailure, located and worded for the user): exit 3. */
export class FailedRun extends Error {}

export class CommandFailure extends Error {
  constructor(
    message: string,
    readonly exitCode: number,
  ) {
    super(message);
  }
}

/** Node's file-system error codes as words; the raw message repeats the path and syscall. */
export function fileProblem(error: unknown): string {
  const code = (error as { code?: unknown } | null)?.code;
  switch (code) {
    case 'ENOENT':
      return 'no such file or directory';
    case 'EACCES':
    case 'EPERM':
      return 'permission denied';
    case 'EISDIR':
      return 'it is a directory';
    case 'ENOTDIR':
      return 'a part of the path is not a directory';
    default:
      return oneLine(error instanceof Error ? error.message : String(error));
  }
}

/**
 * The text of an input file ("-": standard input), refused before reading when larger than
 * `maxBytes` (plus 3 for a byte-order mark), so a huge file is not loaded only to be refused.
 */
export function readInputText(path: string, kind: 'scenario' | 'experiment', maxBytes: number, limitWords: string): string {
  try {
    if (path === '-') return readFileSync(0, 'utf8');
    const size = statSync(path).size;
    if (size > maxBytes + 3) {
      throw new CommandFailure(`cannot read ${kind} file "${path}": it is ${size} bytes, more than the ${limitWords} accepted`, 2);
    }
    return readFileSync(path, 'utf8');
  } catch (error) {
    if (error instanceof CommandFailure) throw error;
    throw new CommandFailure(`cannot read ${kind} file "${path}": ${fileProblem(error)}`, 2);
  }
}

/** First error on a line of its own (it must make sense alone); the others indented below. */
export function invalidDocumentText(kind: 'scenario' | 'experiment', errors: readonly ValidationMessage[]): string {
  const [first, ...others] = errors.map((m) => (m.path === '' ? m.message : formatMessage(m)));
  return [`invalid ${kind}: ${oneLine(first ?? 'no details given')}`, ...others.map((m) => `  ${oneLine(m)}`)].join('\n');
}

/** The output directory, made when missing; refused when the path is something else. */
export function prepareOutDir(dir: string): void {
  let isDirectory: boolean | undefined;
  try {
    isDirectory = statSync(dir).isDirectory();
  } catch {
    isDirectory = undefined; // does not exist (or cannot be inspected): try to create it below
  }
  if (isDirectory === false) throw new CommandFailure(`--out "${dir}" exists and is not a directory`, 2);
  if (isDirectory) return;
  try {
    mkdirSync(dir, { recursive: true });
  } catch (error) {
    throw new CommandFailure(`cannot create the output directory "${dir}": ${fileProblem(error)}`, 2);
  }
}

/** writeWhole, with a failure worded for the user (exit 1). */
export function writeOutput(dir: string, name: string, pieces: Iterable<string>): void {
  try {
    writeWhole(dir, name, pieces);
  } catch (error) {
    throw new CommandFailure(`cannot write "${join(dir, name)}": ${fileProblem(error)}`, 1);
  }
}
