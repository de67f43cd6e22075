/**
 * Finds the first syntax error in JSON text (RFC 8259 grammar), for engines whose JSON.parse
 * message does not state a position (V8 says only "Unexpected token '}', ... is not valid JSON").
 * Iterative, so deeply nested text cannot overflow the stack.
 */
export interface JsonSyntaxError {
  /** Offset of the offending character in the text (text.length: it ended too early). */
  position: number;
  /** What was wrong, as part of a sentence. */
  reason: string;
}

const END = 'the text ends before the JSON value is complete';

export function findJsonSyntaxError(text: string): JsonSyntaxError | null {
  const n = text.length;
  let i = 0;
  const stack: string[] = [];

  const skipWhitespace = () => {
    // RFC 8259 §2: space, tab, line feed, carriage return.
    while (i < n) {
      const c = text.charCodeAt(i);
      if (c !== 0x20 && c !== 0x09 && c !== 0x0a && c !== 0x0d) break;
      i++;
    }
  };
  const unexpected = (what: string): JsonSyntaxError =>
    i >= n ? { position: n, reason: END } : { position: i, reason: `unexpected ${describeCharacter(text, i)}; expected ${what}` };

  /** A string starting at i (RFC 8259 §7); null when fine. */
  const scanString = (): JsonSyntaxError | null => {
    i++;
    while (i < n) {
      const c = text.charCodeAt(i);
      if (c === 0x22) {
        i++;
        return null;
      }
      if (c < 0x20) return { position: i, reason: 'a control character inside a string must be escaped' };
      if (c === 0x5c) {
        const e = text[i + 1];
        if (e === undefined) return { position: n, reason: END };
        if (e === 'u') {
          for (let k = 2; k < 6; k++) {
            if (i + k >= n) return { position: n, reason: END };
            if (!/[0-9a-fA-F]/.test(text[i + k])) return { position: i + k, reason: 'a \\u escape needs four hexadecimal digits' };
          }
          i += 6;
        } else if ('"\\/bfnrt'.includes(e)) {
          i += 2;
        } else {
          return { position: i + 1, reason: `"\\${e}" is not a valid escape in a string` };
        }
        continue;
      }
      i++;
    }
    return { position: n, reason: 'a string is not closed before the end of the text' };
  };

  const digits = (): number => {
    const start = i;
    while (i < n && text.charCodeAt(i) >= 0x30 && text.charCodeAt(i) <= 0x39) i++;
    return i - start;
  };

  /** A number starting at i (RFC 8259 §6). */
  const scanNumber = (): JsonSyntaxError | null => {
    if (text[i] === '-') i++;
    if (text[i] === '0') i++;
    else if (digits() === 0) return unexpected('a digit');
    if (text[i] === '.') {
      i++;
      if (digits() === 0) return unexpected('a digit after the decimal point');
    }
    if (text[i] === 'e' || text[i] === 'E') {
      i++;
      if (text[i] === '+' || text[i] === '-') i++;
      if (digits() === 0) return unexpected('a digit in the exponent');
    }
    return null;
  };

  /** A key string and its colon, inside an object. */
  const scanKey = (): JsonSyntaxError | null => {
    skipWhitespace();
    if (text[i] !== '"') return unexpected('a property name in double quotes');
    const error = scanString();
    if (error) return error;
    skipWhitespace();
    if (text[i] !== ':') return unexpected("':' after a property name");
    i++;
    return null;
  };

  for (;;) {
    // Expecting a value.
    skipWhitespace();
    const c = text[i];
    if (c === '{' || c === '[') {
      i++;
      skipWhitespace();
      const close = c === '{' ? '}' : ']';
      if (text[i] === close) {
        i++;
      } else {
        stack.push(close);
        if (c === '{') {
          const error = scanKey();
          if (error) return error;
        }
        continue;
      }
    } else if (c === '"') {
      const error = scanString();
      if (error) return error;
    } else if (c === '-' || (c >= '0' && c <= '9')) {
      const error = scanNumber();
      if (error) return error;
    } else {
      const literal = c === 't' ? 'true' : c === 'f' ? 'false' : c === 'n' ? 'null' : undefined;
      if (literal === undefined) return unexpected('a JSON value');
      for (let k = 0; k < literal.length; k++, i++) {
        if (text[i] !== literal[k]) return unexpected(`"${literal}"`);
      }
    }
    // After a value: close containers or move to the next item.
    for (;;) {
      skipWhitespace();
      const close = stack[stack.length - 1];
      if (close === undefined) {
        return i < n ? { position: i, reason: `unexpected ${describeCharacter(text, i)} after the end of the JSON value` } : null;
      }
      if (text[i] === close) {
        stack.pop();
        i++;
        continue;
      }
      if (text[i] !== ',') return unexpected(`',' or '${close}'`);
      i++;
      if (close === '}') {
        const error = scanKey();
        if (error) return error;
      }
      break;
    }
  }
}

/** "character '}'", "character U+0007", "end of the text". */
export function describeCharacter(text: string, position: number): string {
  if (position >= text.length) return 'end of the text';
  const code = text.codePointAt(position) ?? 0;
  // Invisible or look-alike characters (a no-break space looks like a space) by code point.
  if (code < 0x21 || (code >= 0x7f && code <= 0xa0) || (code >= 0xd800 && code <= 0xdfff) || /\s/u.test(String.fromCodePoint(code))) {
    return `character U+${code.toString(16).toUpperCase().padStart(4, '0')}`;
  }
  return `character '${String.fromCodePoint(code)}'`;
}
