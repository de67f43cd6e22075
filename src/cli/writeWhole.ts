/**
 * Writes a file through a temporary name, so a file that is there is complete: a run stopped
 * half-way leaves a ".partial" file, never a short one under the real name.
 */
import { closeSync, openSync, renameSync, writeSync } from 'node:fs';
import { join } from 'node:path';

export function writeWhole(dir: string, name: string, pieces: Iterable<string>): void {
  const path = join(dir, name);
  const partial = `${path}.partial`;
  const fd = openSync(partial, 'w');
  try {
    for (const piece of pieces) writeSync(fd, piece);
  } finally {
    closeSync(fd);
  }
  renameSync(partial, path);
}
