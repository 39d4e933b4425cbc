import { describe, expect, it } from 'vitest';
import { ensure, InputError } from '../../src/core/errors.ts';

// The one error class (house style: one wording for bad input; common practice for a typed error).
describe('InputError', () => {
  it('is an Error named InputError that carries its message as given', () => {
    const e = new InputError('Temperature needs two different levels, got 180 and 180');
    expect(e).toBeInstanceOf(Error);
    expect(e).toBeInstanceOf(InputError);
    expect(e.name).toBe('InputError');
    expect(e.message).toBe('Temperature needs two different levels, got 180 and 180');
  });
  it('degenerate input: an empty message stays empty (nothing is made up)', () => {
    expect(new InputError('').message).toBe('');
  });
});

describe('ensure', () => {
  it('returns when the condition holds and throws an InputError with the message when it does not', () => {
    expect(() => ensure(true, 'never')).not.toThrow();
    expect(() => ensure(1, 'never')).not.toThrow();
    expect(() => ensure(false, 'needed a run, got none')).toThrow(new InputError('needed a run, got none'));
  });
  it('degenerate conditions (0, "", null, undefined, NaN) all fail; a message function runs only on failure', () => {
    for (const c of [0, '', null, undefined, Number.NaN]) expect(() => ensure(c, 'x')).toThrow(InputError);
    let calls = 0;
    const message = () => {
      calls += 1;
      return 'built late';
    };
    ensure(true, message);
    expect(calls).toBe(0);
    expect(() => ensure(false, message)).toThrow('built late');
    expect(calls).toBe(1);
  });
});
