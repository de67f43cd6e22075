import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { CAUTION_TEXT, LAKE_CAUTION_TEXT } from '../../src/outputs/caution';

const read = (path: string) => readFileSync(fileURLToPath(new URL(`../../${path}`, import.meta.url)), 'utf8');

/** The prose of a Markdown file with quote marks and line breaks taken out, so a quote reads as one line. */
const prose = (path: string) => read(path).replace(/^> ?/gm, '').replace(/\s+/g, ' ');

describe('the caution in the docs', () => {
  it.each(['README.md', 'docs/command-line.md', 'docs/experiments.md', 'docs/cluster.md'])('%s quotes it exactly as the program writes it', (path) => {
    expect(prose(path)).toContain(CAUTION_TEXT);
  });

  it('docs/command-line.md quotes the lake caution of lakes.json exactly', () => {
    expect(prose('docs/command-line.md')).toContain(LAKE_CAUTION_TEXT);
  });
});
