// @vitest-environment jsdom
import type { ChangeEvent } from 'react';
import { describe, expect, it } from 'vitest';
import { readChosenFile } from '../../src/ui/app/readChosenFile';

function choose(file: File | undefined) {
  const input = document.createElement('input');
  input.type = 'file';
  Object.defineProperty(input, 'files', { value: file ? [file] : [] });
  return { target: input } as unknown as ChangeEvent<HTMLInputElement>;
}

describe('reading a chosen file', () => {
  it('gives the text of a file within the limit', async () => {
    expect(await readChosenFile(choose(new File(['{"a":1}'], 'valley.json')))).toEqual({ name: 'valley.json', text: '{"a":1}' });
  });

  it('refuses a file over the limit before reading it, saying its size and the limit', async () => {
    const chosen = await readChosenFile(choose(new File(['x'.repeat(3_000_000)], 'huge.json')), 2_000_000);
    expect(chosen).toEqual({ name: 'huge.json', problem: 'huge.json is 3.0 MB; files up to 2 MB can be opened.' });
  });

  it('gives nothing when no file was chosen', async () => {
    expect(await readChosenFile(choose(undefined))).toBeNull();
  });
});
