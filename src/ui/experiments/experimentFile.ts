/**
 * Experiment files in the browser: the firnline-experiment format the command line reads, saved
 * through a download; opened through the one experiment validator (experimentStore.openText),
 * refusals worded as the command line prints them (a JSON Pointer, the variant and the member).
 */
import { outcomesHeaderLine } from '../../outputs/experimentCsv';
import { downloadBlob } from '../app/downloadBlob';
import { fileStem, jsonFileText } from '../app/downloadScenario';
import type { MemberRunState } from '../../state/experimentStore';
import type { Experiment } from '../../experiment/experimentSchema';
import { formatMessage, type ValidationMessage } from '../../scenario/validationMessage';

export function experimentFileName(experiment: Experiment): string {
  return `${fileStem(experiment.name, 'experiment')}.experiment.json`;
}

export function experimentFileText(experiment: Experiment): string {
  return jsonFileText(experiment);
}

/** The outcomes.csv rows of the members that have finished (ok or failed), in member order. */
export function finishedOutcomeRows(runs: readonly MemberRunState[]): string[] {
  return runs.flatMap((r) => (r.outcomeRow === null ? [] : [r.outcomeRow]));
}

/** outcomes.csv as the command line writes it, from the members' rows in member order. */
export function outcomesCsvText(rows: readonly string[]): string {
  return outcomesHeaderLine() + rows.join('');
}

/** Messages listed for a refused file; the rest are counted. */
export const MESSAGES_SHOWN = 6;

/** The lines saying why a file was refused, as the command line words them. */
export function refusedFileLines(fileName: string, errors: readonly ValidationMessage[]): string[] {
  const listed = errors.slice(0, MESSAGES_SHOWN).map((m) => (m.path === '' ? m.message : formatMessage(m)));
  const more = errors.length - listed.length;
  return [`${fileName} was not opened; nothing was changed:`, ...listed, ...(more > 0 ? [`… and ${more} more`] : [])];
}

export function downloadText(fileName: string, text: string, type: string): void {
  downloadBlob(new Blob([text], { type }), fileName);
}
