import { describe, expect, it } from 'vitest';
import { checkRunLimit, MAX_RUNS } from '../../../src/core/design/run-limit.ts';
import { InputError } from '../../../src/core/errors.ts';

describe('checkRunLimit', () => {
  it('allows up to 1024 runs', () => {
    expect(MAX_RUNS).toBe(1024);
    expect(() => checkRunLimit(1024, '1024 factorial runs')).not.toThrow();
    expect(() => checkRunLimit(0, 'no runs')).not.toThrow();
  });
  it('refuses more, saying how the total came about and why', () => {
    expect(() => checkRunLimit(1056, '512 factorial + 16 center runs x 2 replicates')).toThrow(
      /512 factorial \+ 16 center runs x 2 replicates make 1056 runs, over the limit of 1024 runs for one design \(a plan that size/,
    );
    expect(() => checkRunLimit(Number.NaN, 'x')).toThrow(InputError);
  });
});
