/**
 * Names of projects: what a new project or a copy is called, and what a name may be. The names a
 * new project must avoid are those in the stored list at the moment it is added (see
 * projectRepository's addProject), so two tabs adding at once still get different names.
 */
import { demoScenario } from './scenarioStore';

export const MAX_NAME_LENGTH = 100;

/** The demo's own name (or "Blank valley"), else "Demo 2", "Demo 3", ... whichever is free. */
export function newProjectName(from: 'demo' | 'blank', taken: Set<string>): string {
  let name = from === 'demo' ? (demoScenario.name ?? 'Demo') : 'Blank valley';
  for (let k = 2; taken.has(name); k++) name = `${from === 'demo' ? 'Demo' : 'Blank valley'} ${k}`;
  return name;
}

/** "Copy of X", or "Copy 2 of X" when that name is taken. */
export function copyName(name: string, taken: Set<string>): string {
  let candidate = `Copy of ${name}`;
  for (let k = 2; taken.has(candidate); k++) candidate = `Copy ${k} of ${name}`;
  return candidate.slice(0, MAX_NAME_LENGTH);
}

/** Why `name` cannot be a project's name, or null when it can (after trimming). */
export function checkProjectName(name: string): string | null {
  const trimmed = name.trim();
  if (!trimmed) return 'A project name needs at least one character other than spaces.';
  if (trimmed.length > MAX_NAME_LENGTH) return `A project name can have at most ${MAX_NAME_LENGTH} characters; this one has ${trimmed.length}.`;
  return null;
}
