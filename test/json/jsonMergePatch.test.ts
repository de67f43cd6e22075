import { describe, expect, it } from 'vitest';
import { applyMergePatch } from '../../src/json/jsonMergePatch';

// Cases from RFC 7386 (JSON Merge Patch), reproduced from memory of the RFC text and checked
// against its rules: section 3 (example) and Appendix A (example test cases).
describe('applyMergePatch (RFC 7386)', () => {
  it('section 3: the worked example', () => {
    const target = {
      title: 'Goodbye!',
      author: { givenName: 'John', familyName: 'Doe' },
      tags: ['example', 'sample'],
      content: 'This will be unchanged',
    };
    const patch = { title: 'Hello!', phoneNumber: '+01-123-456-7890', author: { familyName: null }, tags: ['example'] };
    expect(applyMergePatch(target, patch)).toEqual({
      title: 'Hello!',
      author: { givenName: 'John' },
      tags: ['example'],
      content: 'This will be unchanged',
      phoneNumber: '+01-123-456-7890',
    });
  });

  const appendixA: [unknown, unknown, unknown][] = [
    [{ a: 'b' }, { a: 'c' }, { a: 'c' }],
    [{ a: 'b' }, { b: 'c' }, { a: 'b', b: 'c' }],
    [{ a: 'b' }, { a: null }, {}],
    [{ a: 'b', b: 'c' }, { a: null }, { b: 'c' }],
    [{ a: ['b'] }, { a: 'c' }, { a: 'c' }],
    [{ a: 'c' }, { a: ['b'] }, { a: ['b'] }],
    [{ a: { b: 'c' } }, { a: { b: 'd', c: null } }, { a: { b: 'd' } }],
    [{ a: [{ b: 'c' }] }, { a: [1] }, { a: [1] }],
    [['a', 'b'], ['c', 'd'], ['c', 'd']],
    [{ a: 'b' }, ['c'], ['c']],
    [{ a: 'foo' }, null, null],
    [{ a: 'foo' }, 'bar', 'bar'],
    [{ e: null }, { a: 1 }, { e: null, a: 1 }],
    [[1, 2], { a: 'b', c: null }, { a: 'b' }],
    [{}, { a: { bb: { ccc: null } } }, { a: { bb: {} } }],
  ];
  it.each(appendixA.map((c, k) => [k + 1, ...c]))('Appendix A case %i', (_k, target, patch, expected) => {
    expect(applyMergePatch(target, patch)).toEqual(expected);
  });

  it('changes neither input and shares no objects with the patch', () => {
    const target = { a: { b: 1 }, list: [1, 2] };
    const patch = { a: { c: [3] } };
    const before = JSON.stringify([target, patch]);
    const result = applyMergePatch(target, patch) as { a: { c: number[] } };
    expect(JSON.stringify([target, patch])).toBe(before);
    result.a.c.push(4);
    expect(patch.a.c).toEqual([3]);
  });

  it('treats "__proto__" as an ordinary key (JSON.parse gives it as an own property)', () => {
    const patch = JSON.parse('{"__proto__": {"polluted": true}}') as unknown;
    const result = applyMergePatch({}, patch) as Record<string, unknown>;
    expect(Object.prototype.hasOwnProperty.call(result, '__proto__')).toBe(true);
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
    expect(Object.getPrototypeOf(result)).toBe(Object.prototype);
  });
});
