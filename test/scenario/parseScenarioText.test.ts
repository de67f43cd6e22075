/**
 * Scenario text: JSON syntax errors (RFC 8259) are reported with line and column, the 20 MB size
 * limit has its own message, and valid text is validated like parsed input.
 */
import { describe, expect, it } from 'vitest';
import { MAX_SCENARIO_TEXT_BYTES, parseScenarioText, validateScenario } from '../../src/scenario/validateScenario';
import { valleyScenario } from './scenarioFixtures';

function onlyError(text: string) {
  const result = parseScenarioText(text);
  if (result.ok) throw new Error('expected an error');
  expect(result.errors).toHaveLength(1);
  return result.errors[0];
}

describe('parseScenarioText', () => {
  // [text, line, column, fragment of the reason]
  const syntaxCases: [string, number, number, string][] = [
    ['{', 1, 2, 'ends before the JSON value is complete'],
    ['{\n  "grid": }', 2, 11, "unexpected character '}'; expected a JSON value"],
    ['{\n  "a": 1\n  "b": 2\n}', 3, 3, "expected ',' or '}'"],
    ['[1, 2,]', 1, 7, "unexpected character ']'"],
    ['{"a": 1} x', 1, 10, "character 'x' after the end of the JSON value"],
    ['{"a": 01}', 1, 8, "unexpected character '1'"],
    ['{"a": 1.}', 1, 9, 'a digit after the decimal point'],
    ['{"a": 1e}', 1, 9, 'a digit in the exponent'],
    ['{"a": "x\ty"}', 1, 9, 'control character inside a string must be escaped'],
    ['{"a": "\\q"}', 1, 9, '"\\q" is not a valid escape'],
    ['{"a": "\\u12G4"}', 1, 12, 'four hexadecimal digits'],
    ['{"a": "open', 1, 12, 'string is not closed'],
    ['{a: 1}', 1, 2, 'a property name in double quotes'],
    ['{"a" 1}', 1, 6, "':' after a property name"],
    ['{"a": tru}', 1, 10, '"true"'],
    ['{"a": NaN}', 1, 7, "unexpected character 'N'"],
    ["{'a': 1}", 1, 2, "unexpected character '''"],
    // Windows line ends count once; a lone CR is a line break too.
    ['{\r\n"a": 1,\r\n}', 3, 1, "unexpected character '}'"],
    ['{\r"a": ]', 2, 6, "unexpected character ']'"],
    // Columns count characters, not UTF-16 units: "❄️" is two code points, "𝔤" one (two units).
    ['{"❄️𝔤": 1,, }', 1, 11, "unexpected character ','"],
    // A no-break space looks like a space but is not JSON whitespace.
    ['{"a":\u00a01}', 1, 6, 'character U+00A0'],
  ];
  it.each(syntaxCases)('reports %j at line %i, column %i', (text, line, column, reason) => {
    const error = onlyError(text);
    expect(error.path).toBe('');
    expect(error.line).toBe(line);
    expect(error.column).toBe(column);
    expect(error.message).toContain(`not valid JSON (RFC 8259) at line ${line}, column ${column}`);
    expect(error.message).toContain(reason);
  });

  it('reports empty text plainly', () => {
    for (const text of ['', '   \n\t']) {
      expect(onlyError(text).message).toBe('the text is empty; a scenario is a JSON object');
    }
  });

  it('accepts a leading byte-order mark and counts columns after it', () => {
    const text = '\ufeff' + JSON.stringify(valleyScenario());
    expect(parseScenarioText(text).ok).toBe(true);
    expect(onlyError('\ufeff{"a" 1}')).toMatchObject({ line: 1, column: 6 });
  });

  it('validates parsed text exactly like validateScenario', () => {
    const s = valleyScenario();
    s.grid.spacing = 70;
    const text = JSON.stringify(s, null, 2);
    expect(parseScenarioText(text)).toEqual(validateScenario(s));
    expect(parseScenarioText(JSON.stringify(valleyScenario()))).toEqual(validateScenario(valleyScenario()));
  });

  it('rejects text over 20 MB with its own message, before parsing', () => {
    expect(MAX_SCENARIO_TEXT_BYTES).toBe(20_000_000);
    const big = '{"name": "' + 'x'.repeat(MAX_SCENARIO_TEXT_BYTES) + '"}';
    const error = onlyError(big);
    expect(error).toEqual({
      path: '',
      message: 'the text is longer than 20,000,000 bytes (20 MB of UTF-8), the largest scenario accepted',
    });
  });

  it('counts the limit in UTF-8 bytes, not characters', () => {
    // 7,000,000 "€" are 7e6 UTF-16 units but 21e6 UTF-8 bytes.
    const text = '"' + '€'.repeat(7_000_000) + '"';
    expect(onlyError(text).message).toContain('longer than 20,000,000 bytes');
    // Just under the limit in bytes: parsed, then rejected only as a scenario.
    const under = '"' + 'é'.repeat(9_999_990) + '"';
    expect(onlyError(under).message).toContain('a scenario must be a JSON object');
  });

  it('survives deeply nested text', () => {
    const deep = '['.repeat(200_000) + ']'.repeat(200_000);
    expect(onlyError(deep).message).toContain('a scenario must be a JSON object');
    expect(onlyError('['.repeat(200_000)).message).toContain('ends before the JSON value is complete');
  });
});
