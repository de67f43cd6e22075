/**
 * Approximate printed width of a line of Helvetica, for laying out legends and wrapping captions
 * without a DOM to measure text in. Average advance widths in em, from the standard Helvetica
 * font metrics (Adobe AFM): digits 0.556, lower case about 0.5, capitals about 0.67, space 0.278.
 */
export function textWidth(content: string, size: number): number {
  let em = 0;
  for (const ch of content) {
    if (ch === ' ') em += 0.278;
    else if (/[0-9]/.test(ch)) em += 0.556;
    else if (/[ilj.,;:'|!]/.test(ch)) em += 0.24;
    else if (/[A-Z]/.test(ch)) em += 0.68;
    else if ('⁰¹²³⁴⁵⁶⁷⁸⁹⁻'.includes(ch)) em += 0.42;
    else if (/[mw]/.test(ch)) em += 0.8;
    else em += 0.54;
  }
  return em * size;
}

/** Words greedily packed into lines no wider than `maxWidth`. */
export function wrapText(content: string, size: number, maxWidth: number): string[] {
  const lines: string[] = [];
  let line = '';
  // Split at ordinary spaces only: no-break spaces hold their neighbours together.
  for (const word of content.split(/[ \t\n]+/).filter((w) => w !== '')) {
    const candidate = line === '' ? word : `${line} ${word}`;
    if (line !== '' && textWidth(candidate, size) > maxWidth) {
      lines.push(line);
      line = word;
    } else {
      line = candidate;
    }
  }
  if (line !== '') lines.push(line);
  return lines;
}
