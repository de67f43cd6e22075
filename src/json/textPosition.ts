/**
 * Line and column (both from 1) of an offset in a text. Line breaks are "\n", "\r\n" and a lone
 * "\r"; the column counts characters (code points), as editors show it.
 */
export function textPosition(text: string, offset: number): { line: number; column: number } {
  const end = Math.max(0, Math.min(offset, text.length));
  let line = 1;
  let lineStart = 0;
  for (let i = 0; i < end; i++) {
    const c = text.charCodeAt(i);
    if (c === 0x0a || (c === 0x0d && text.charCodeAt(i + 1) !== 0x0a)) {
      line++;
      lineStart = i + 1;
    }
  }
  let column = 1;
  for (let i = lineStart; i < end; i++) {
    const c = text.charCodeAt(i);
    // The second half of a surrogate pair is part of the same character.
    if (!(c >= 0xdc00 && c <= 0xdfff && i > lineStart && isHighSurrogate(text.charCodeAt(i - 1)))) column++;
  }
  return { line, column };
}

function isHighSurrogate(c: number): boolean {
  return c >= 0xd800 && c <= 0xdbff;
}
