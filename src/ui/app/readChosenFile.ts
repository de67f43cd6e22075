/**
 * The text of the file chosen in an <input type="file">, or why it cannot be had: too large to
 * open (checked before reading, so a huge file never fills the page's memory) or unreadable. The
 * input is cleared, so choosing the same file again opens it again.
 */
import type { ChangeEvent } from 'react';
import { MAX_SCENARIO_TEXT_BYTES } from '../../scenario/validateScenario';

export type ChosenFile = { name: string; text: string; problem?: undefined } | { name: string; problem: string };

export async function readChosenFile(event: ChangeEvent<HTMLInputElement>, maxBytes = MAX_SCENARIO_TEXT_BYTES): Promise<ChosenFile | null> {
  const file = event.target.files?.[0];
  event.target.value = '';
  if (!file) return null;
  if (file.size > maxBytes) {
    return { name: file.name, problem: `${file.name} is ${(file.size / 1e6).toFixed(1)} MB; files up to ${maxBytes / 1e6} MB can be opened.` };
  }
  try {
    return { name: file.name, text: await file.text() };
  } catch {
    return { name: file.name, problem: `${file.name} could not be read.` };
  }
}
