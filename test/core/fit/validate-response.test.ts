import { describe, expect, it } from 'vitest';
import { InputError } from '../../../src/core/errors.ts';
import { defineFactors } from '../../../src/core/factor/factor.ts';
import { validateResponseData } from '../../../src/core/fit/validate-response.ts';

const factors = defineFactors([
  { kind: 'numeric', name: 'Temperature', low: 160, high: 200 },
  { kind: 'categorical', name: 'Powder', levels: ['matte', 'gloss'] },
]);
const coded = [[-1, -1], [1, -1], [-1, 1], [1, 1]];
const base = { factors, response: 'Gloss', coded, y: [1, 2, 3, 5], blocks: null, labels: ['1', '2', '3', '4'], messages: [] };

describe('validateResponseData', () => {
  it('passes good runs and changes nothing', () => {
    const copy = JSON.stringify(base);
    expect(() => validateResponseData(base)).not.toThrow();
    expect(JSON.stringify(base)).toBe(copy);
  });
  it('says what was needed and what came', () => {
    expect(() => validateResponseData({ ...base, y: [1, 2, 3] })).toThrow('Gloss: 3 responses but 4 rows of settings');
    expect(() => validateResponseData({ ...base, y: [1, Number.NaN, 3, 4] })).toThrow('Gloss, run 2: needs a number, got NaN');
    expect(() => validateResponseData({ ...base, coded: [[-1, -1], [1, Number.NaN], [-1, 1], [1, 1]] })).toThrow('Run 2: Powder needs a number, got NaN');
    expect(() => validateResponseData({ ...base, coded: [[-1], [1], [-1], [1]] })).toThrow('Run 1: 1 settings for 2 factors');
    expect(() => validateResponseData({ ...base, coded: coded.map((r) => [r[0], 1]) })).toThrow('Powder has the same setting (gloss) in every run');
    expect(() => validateResponseData({ ...base, coded: coded.map((r) => [0.5, r[1]]) })).toThrow('Temperature has the same setting (190) in every run');
  });
  it('degenerate input: too few runs and a constant response (within CONSTANT_TOLERANCE) are refused', () => {
    expect(() => validateResponseData({ ...base, coded: coded.slice(0, 2), y: [1, 2], labels: ['1', '2'] })).toThrow(/at least 3 runs are needed/);
    expect(() => validateResponseData({ ...base, y: [5, 5, 5, 5 + 1e-14] })).toThrow(InputError);
    expect(() => validateResponseData({ ...base, y: [], coded: [], labels: [] })).toThrow(/0 runs cannot estimate/);
  });
});
