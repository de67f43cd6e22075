/** Size limits on texts are in bytes of UTF-8, counted without encoding the whole text. */

/** UTF-8 length of a string, stopping early once past `limit`. */
export function utf8Length(text: string, limit: number): number {
  let bytes = 0;
  for (let i = 0; i < text.length && bytes <= limit; i++) {
    const c = text.charCodeAt(i);
    if (c < 0x80) bytes += 1;
    else if (c < 0x800) bytes += 2;
    else if (c >= 0xd800 && c <= 0xdbff && i + 1 < text.length) {
      const d = text.charCodeAt(i + 1);
      if (d >= 0xdc00 && d <= 0xdfff) {
        bytes += 4;
        i++;
      } else bytes += 3;
    } else bytes += 3;
  }
  return bytes;
}
