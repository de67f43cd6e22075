import { describe, expect, it } from 'vitest';
import { parseJsonPointer, resolveJsonPointer, toJsonPointer } from '../../src/json/jsonPointer';
import { setJsonPointer } from '../../src/json/jsonPointerSet';

// RFC 6901 (JSON Pointer), section 5: the example document and the pointers into it, as given
// there (reproduced from memory of the RFC text).
const rfcDocument = JSON.parse(
  '{"foo": ["bar", "baz"], "": 0, "a/b": 1, "c%d": 2, "e^f": 3, "g|h": 4, "i\\\\j": 5, "k\\"l": 6, " ": 7, "m~n": 8}',
) as Record<string, unknown>;

describe('resolveJsonPointer (RFC 6901 section 5)', () => {
  const cases: [string, unknown][] = [
    ['', rfcDocument],
    ['/foo', ['bar', 'baz']],
    ['/foo/0', 'bar'],
    ['/', 0],
    ['/a~1b', 1],
    ['/c%d', 2],
    ['/e^f', 3],
    ['/g|h', 4],
    ['/i\\j', 5],
    ['/k"l', 6],
    ['/ ', 7],
    ['/m~0n', 8],
  ];
  it.each(cases)('%j', (pointer, expected) => {
    expect(resolveJsonPointer(rfcDocument, pointer)).toEqual({ found: true, value: expected });
  });

  it('finds nothing past the end of a list, at "-", with leading zeros or for a missing key', () => {
    for (const pointer of ['/foo/2', '/foo/-', '/foo/01', '/nope', '/foo/0/x']) {
      expect(resolveJsonPointer(rfcDocument, pointer).found, pointer).toBe(false);
    }
  });
});

describe('parseJsonPointer (RFC 6901 sections 3 and 4)', () => {
  it('unescapes ~1 before ~0, so "~01" is the text "~1" (section 4)', () => {
    expect(parseJsonPointer('/~01')).toEqual({ ok: true, tokens: ['~1'] });
  });
  it('round-trips with toJsonPointer', () => {
    const tokens = ['a/b', 'm~n', '', '0'];
    expect(parseJsonPointer(toJsonPointer(tokens))).toEqual({ ok: true, tokens });
  });
  it('rejects text that does not start with "/" and a "~" not followed by 0 or 1', () => {
    expect(parseJsonPointer('ice/A').ok).toBe(false);
    expect(parseJsonPointer('/a~2').ok).toBe(false);
    expect(parseJsonPointer('/a~').ok).toBe(false);
  });
});

describe('setJsonPointer', () => {
  it('replaces a value in a copy, leaving the document unchanged', () => {
    const doc = { ice: { n: 3, A: 2.4e-24 }, bed: [[0, 3000], [3000, 2500]] };
    const set = setJsonPointer(doc, '/ice/A', 1.2e-24);
    expect(set).toEqual({ ok: true, document: { ice: { n: 3, A: 1.2e-24 }, bed: doc.bed } });
    expect(doc.ice.A).toBe(2.4e-24);
    expect(setJsonPointer(doc, '/bed/1/1', 2400)).toEqual({ ok: true, document: { ice: doc.ice, bed: [[0, 3000], [3000, 2400]] } });
  });
  it('adds a new key to an existing object, but needs the parent to exist', () => {
    expect(setJsonPointer({ ice: {} }, '/ice/A', 1)).toEqual({ ok: true, document: { ice: { A: 1 } } });
    expect(setJsonPointer({}, '/sliding/C', 1).ok).toBe(false);
  });
  it('does not grow lists', () => {
    expect(setJsonPointer({ bed: [1] }, '/bed/1', 2).ok).toBe(false);
    expect(setJsonPointer({ bed: [1] }, '/bed/-', 2).ok).toBe(false);
  });
});
