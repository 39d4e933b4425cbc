import { describe, expect, it } from 'vitest';
import { matrixMemo } from '../../../src/core/fit/matrix-memo.ts';

// The store's contract (matrix-memo.ts): a result is recalled only for the same tag and the same
// numbers entry for entry (Object.is), from the store's own copy, least recently used out first.
describe('matrixMemo', () => {
  it('recalls a kept result for an equal matrix and tag, and computes it once', () => {
    const memo = matrixMemo<number>(2, 100);
    let made = 0;
    const x = Float64Array.of(1, 2, 3);
    const v = memo.keep(x, 't', (own) => (made++, own[0] + own[1] + own[2]));
    expect(v).toBe(6);
    expect(memo.recall(Float64Array.of(1, 2, 3), 't')).toBe(6);
    expect(made).toBe(1);
  });

  it('tells apart another tag, another length, -0 from 0, and sees NaN as NaN', () => {
    const memo = matrixMemo<string>(4, 100);
    memo.keep(Float64Array.of(0, NaN), 'a', () => 'zero');
    expect(memo.recall(Float64Array.of(0, NaN), 'b')).toBeUndefined();
    expect(memo.recall(Float64Array.of(-0, NaN), 'a')).toBeUndefined();
    expect(memo.recall(Float64Array.of(0, NaN, 1), 'a')).toBeUndefined();
    expect(memo.recall(Float64Array.of(0, NaN), 'a')).toBe('zero');
  });

  it('keeps its own copy: a caller that changes its array afterwards does not change what matches', () => {
    const memo = matrixMemo<number>(1, 100);
    const x = Float64Array.of(5, 6);
    memo.keep(x, '', () => 1);
    x[0] = 7;
    expect(memo.recall(x, '')).toBeUndefined();
    expect(memo.recall(Float64Array.of(5, 6), '')).toBe(1);
  });

  it('drops the least recently used matrix beyond its size, and keeps none longer than the limit', () => {
    const memo = matrixMemo<number>(2, 3);
    memo.keep(Float64Array.of(1), '', () => 1);
    memo.keep(Float64Array.of(2), '', () => 2);
    expect(memo.recall(Float64Array.of(1), '')).toBe(1); // 1 is now the most recent
    memo.keep(Float64Array.of(3), '', () => 3); // drops 2
    expect(memo.recall(Float64Array.of(2), '')).toBeUndefined();
    expect(memo.recall(Float64Array.of(1), '')).toBe(1);
    expect(memo.recall(Float64Array.of(3), '')).toBe(3);
    expect(memo.keep(Float64Array.of(1, 2, 3, 4), '', () => 4)).toBe(4);
    expect(memo.recall(Float64Array.of(1, 2, 3, 4), '')).toBeUndefined();
  });

  it('refuses a size below 1', () => {
    expect(() => matrixMemo(0, 10)).toThrow(RangeError);
  });
});
