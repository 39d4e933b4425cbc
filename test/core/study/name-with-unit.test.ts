import { describe, expect, it } from 'vitest';
import { defineFactors } from '../../../src/core/factor/factor.ts';
import { factorLabel, nameWithUnit } from '../../../src/core/study/name-with-unit.ts';

// "Name (unit)" is the common practice for labeled columns and axes.
describe('nameWithUnit', () => {
  it('puts a unit in parentheses after the name', () => {
    expect(nameWithUnit('Film thickness', 'µm')).toBe('Film thickness (µm)');
    expect(nameWithUnit('Film thickness', '  µm ')).toBe('Film thickness (µm)');
  });
  it('a name that ends with its unit in parentheses (a CSV header) does not get it twice (common practice)', () => {
    expect(nameWithUnit('Time (min)', 'min')).toBe('Time (min)');
    expect(nameWithUnit('Time (min)', 's')).toBe('Time (min) (s)');
  });
  it('leaves the bare name without a unit (degenerate: missing, empty or blank unit)', () => {
    expect(nameWithUnit('Gloss')).toBe('Gloss');
    expect(nameWithUnit('Gloss', '')).toBe('Gloss');
    expect(nameWithUnit('Gloss', '   ')).toBe('Gloss');
    expect(nameWithUnit('Gloss', null)).toBe('Gloss');
  });
  it('a categorical factor has no unit; a numeric one shows its own', () => {
    const [t, p] = defineFactors([
      { kind: 'numeric', name: 'Oven temperature', low: 160, high: 200, unit: '°C' },
      { kind: 'categorical', name: 'Powder', levels: ['matte', 'gloss'] },
    ]);
    expect(factorLabel(t)).toBe('Oven temperature (°C)');
    expect(factorLabel(p)).toBe('Powder');
  });
});
