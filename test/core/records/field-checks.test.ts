import { describe, expect, it } from 'vitest';
import { InputError } from '../../../src/core/errors.ts';
import { bool, fail, finite, id, int, list, MAX_TEXT, obj, oneOf, only, text, texts, time } from '../../../src/core/records/field-checks.ts';

// Field checks written out from the backup schema's type, length and range rules (common practice).
describe('field checks', () => {
  it('return the value with its type when it fits', () => {
    expect(obj({ a: 1 }, 'p')).toEqual({ a: 1 });
    expect(list([1, 2], 'p', 2)).toEqual([1, 2]);
    expect(text('ok', 'p')).toBe('ok');
    expect(id('run-1_A', 'p')).toBe('run-1_A');
    expect(time('2024-05-02T07:25:00Z', 'p')).toBe('2024-05-02T07:25:00Z');
    expect(finite(-0.5, 'p')).toBe(-0.5);
    expect(int(3, 'rev', 1)).toBe(3);
    expect(bool(false, 'p')).toBe(false);
    expect(oneOf('center', 'kind', ['factorial', 'center'])).toBe('center');
    expect(texts(['a', 'b'], 'p')).toEqual(['a', 'b']);
    expect(() => only({ a: 1 }, 'p', ['a', 'b'])).not.toThrow();
  });
  it('refuse with the path, what was needed and what came', () => {
    expect(() => fail('x.y', 'a list', 3)).toThrow(new InputError('x.y: needs a list, got 3'));
    expect(() => obj([], 'p')).toThrow('p: needs an object, got a list');
    expect(() => obj(null, 'p')).toThrow('p: needs an object, got nothing');
    expect(() => list([1, 2, 3], 'p', 2)).toThrow('p: holds at most 2 items, got 3');
    expect(() => text('x'.repeat(MAX_TEXT + 1), 'p')).toThrow(`p: text of at most ${MAX_TEXT} characters, got ${MAX_TEXT + 1}`);
    expect(() => text('  ', 'p', { nonEmpty: true })).toThrow('p: needs non-empty text, got "  "');
    expect(() => id('a b', 'p')).toThrow(/p: needs an id/);
    expect(() => time('yesterday', 'p')).toThrow('p: needs a date and time (ISO 8601, e.g. 2026-03-01T14:05 or 2026-03-01T14:05:00Z), got "yesterday"');
    expect(() => finite(Number.POSITIVE_INFINITY, 'p')).toThrow('p: needs a finite number, got Infinity');
    expect(() => int(0, 'rev', 1)).toThrow(`rev: needs a whole number from 1 to ${Number.MAX_SAFE_INTEGER}, got 0`);
    expect(() => int(1.5, 'rev', 1)).toThrow(InputError);
    expect(() => bool('true', 'p')).toThrow('p: needs true or false, got "true"');
    expect(() => oneOf('axial ', 'kind', ['factorial', 'center'])).toThrow('kind: needs "factorial" or "center", got "axial "');
    expect(() => texts(['a', 1], 'p')).toThrow('p[1]: needs text, got 1');
    expect(() => only({ a: 1, yates: 2 }, 'p', ['a'])).toThrow('p: has no field "yates" in this format');
  });
  it('degenerate input: empty lists, empty text and the boundaries of a range are taken', () => {
    expect(list([], 'p', 0)).toEqual([]);
    expect(text('', 'p')).toBe('');
    expect(texts([], 'p')).toEqual([]);
    expect(int(1, 'p', 1, 1)).toBe(1);
    expect(() => int(2, 'p', 1, 1)).toThrow(InputError);
  });
});
