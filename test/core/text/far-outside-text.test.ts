import { describe, expect, it } from 'vitest';
import { defineFactors } from '../../../src/core/factor/factor.ts';
import { farOutsideText } from '../../../src/core/text/far-outside-text.ts';

const [temp, flow, powder] = defineFactors([
  { kind: 'numeric', name: 'Oven temperature', low: 160, high: 200, unit: '°C' },
  { kind: 'numeric', name: 'Flow', low: 0.001, high: 0.002 },
  { kind: 'categorical', name: 'Powder', levels: ['matte', 'gloss'] },
]);

describe('farOutsideText', () => {
  it('names the run, the factor, the setting, the range and the coded distance', () => {
    // (1600 - 180) / 20 = 71 (by hand).
    expect(farOutsideText('Run 4', temp, { factor: 0, value: 1600, coded: 71 })).toBe(
      'Run 4: Oven temperature 1600 °C is far outside the planned range 160 to 200 °C (coded 71); check it for a typing slip',
    );
    // No unit: none is written. (0.015 - 0.0015) / 0.0005 = 27 (by hand).
    expect(farOutsideText('Run 2', flow, { factor: 1, value: 0.015, coded: 27 })).toBe('Run 2: Flow 0.015 is far outside the planned range 0.001 to 0.002 (coded 27); check it for a typing slip');
  });
  it('degenerate input: a categorical factor has no range to name', () => {
    expect(farOutsideText('Run 1', powder, { factor: 2, value: 5, coded: 5 })).toBe('Run 1: Powder is far outside the plan');
  });
});
