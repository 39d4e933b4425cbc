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
    // One run is "1 run" (common practice in English), not "1 runs".
    expect(() => validateResponseData({ ...base, coded: base.coded.slice(0, 1), y: [1], labels: ['1'] })).toThrow(/^Gloss: 1 run cannot estimate even the intercept and \d+ main effects?;/);
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
  it('the constant-response check is relative to the values\' own scale, from 1e-300 to 1e300', () => {
    // A thickness in metres: about 1e-14 and differing by 20 %, which an absolute floor refused.
    expect(() => validateResponseData({ ...base, y: [1e-14, 1.2e-14, 1.1e-14, 1.3e-14] })).not.toThrow();
    for (let e = -300; e <= 300; e += 20) {
      const s = 10 ** e;
      // Spread of 20 % of the scale: never refused, whatever the scale.
      expect(() => validateResponseData({ ...base, y: [1, 1.2, 1.1, 1.3].map((v) => v * s) }), `scale 1e${e}`).not.toThrow();
      // Truly equal values, and values equal up to round-off (one ulp apart), are refused at every scale.
      expect(() => validateResponseData({ ...base, y: [s, s, s, s] }), `scale 1e${e}`).toThrow(/is the same .* in every run/);
      const next = s * (1 + Number.EPSILON);
      expect(() => validateResponseData({ ...base, y: [s, next, s, next] }), `scale 1e${e}`).toThrow(/is the same .* in every run/);
      // Negative values too: the magnitude, not the sign, sets the scale.
      expect(() => validateResponseData({ ...base, y: [-1, -1.2, -1.1, -1.3].map((v) => v * s) }), `scale -1e${e}`).not.toThrow();
    }
    // All zeros are equal; zero beside a tiny value is a real difference.
    expect(() => validateResponseData({ ...base, y: [0, 0, 0, 0] })).toThrow(/is the same \(0\) in every run/);
    expect(() => validateResponseData({ ...base, y: [0, 1e-300, 0, 1e-300] })).not.toThrow();
  });
});
