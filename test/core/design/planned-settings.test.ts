import { describe, expect, it } from 'vitest';
import { plannedSetting } from '../../../src/core/design/planned-settings.ts';
import { InputError } from '../../../src/core/errors.ts';
import { defineFactors } from '../../../src/core/factor/factor.ts';

const [temp, speed, powder] = defineFactors([
  { kind: 'numeric', name: 'Temperature', low: 160, high: 200, unit: 'degC' },
  { kind: 'numeric', name: 'Speed', low: 100, high: 400, scale: 'log' },
  { kind: 'categorical', name: 'Powder', levels: ['matte', 'gloss'] },
]);

describe('plannedSetting', () => {
  it('gives the declared settings at -1 and +1 and the middle at 0 (Montgomery, 8th ed., section 6.7 coded variables)', () => {
    expect([-1, 0, 1].map((c) => plannedSetting(temp, c))).toEqual([160, 180, 200]);
  });
  it('gives the geometric mean at the center of a log scale, exactly the declared settings at the ends', () => {
    expect([-1, 0, 1].map((c) => plannedSetting(speed, c))).toEqual([100, 200, 400]);
  });
  it('gives level names for a categorical factor and refuses a center for it (degenerate input)', () => {
    expect(plannedSetting(powder, 1)).toBe('gloss');
    expect(() => plannedSetting(powder, 0)).toThrow(InputError);
    expect(() => plannedSetting(temp, Number.NaN)).toThrow(InputError);
  });
});
