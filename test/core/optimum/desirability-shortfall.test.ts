import { describe, expect, it } from 'vitest';
import { desirabilityShortfalls } from '../../../src/core/optimum/desirability-shortfall.ts';
import { desirability, type DesirabilitySpec } from '../../../src/core/optimum/desirability.ts';

// d = 0 exactly where a prediction is at or beyond an acceptable value (Derringer and Suich
// 1980, Journal of Quality Technology 12, 214-219); checked against desirability() itself.
describe('desirabilityShortfalls', () => {
  const specs: DesirabilitySpec[] = [
    { name: 'Gloss', goal: 'max', low: 70, high: 90 },
    { name: 'Scrap', goal: 'min', low: 2, high: 8 },
    { name: 'Thickness', goal: 'target', low: 60, target: 70, high: 80 },
  ];

  it('names each response with d = 0, the value it misses and the side', () => {
    expect(desirabilityShortfalls(specs, [62, 9, 85], ['GU', undefined, 'µm'])).toEqual([
      { name: 'Gloss', unit: 'GU', fit: 62, limit: 70, side: 'below' },
      { name: 'Scrap', fit: 9, limit: 8, side: 'above' },
      { name: 'Thickness', unit: 'µm', fit: 85, limit: 80, side: 'above' },
    ]);
    expect(desirabilityShortfalls(specs, [80, 5, 55])).toEqual([{ name: 'Thickness', fit: 55, limit: 60, side: 'below' }]);
  });

  it('agrees with d = 0 at and beyond the limits, and is empty when every d is above 0', () => {
    for (const ys of [[70, 8, 60], [71, 7.9, 79.9], [100, 0, 80]]) {
      const zero = specs.filter((s, i) => desirability(s, ys[i]) === 0).map((s) => s.name);
      expect(desirabilityShortfalls(specs, ys).map((s) => s.name)).toEqual(zero);
    }
    expect(desirabilityShortfalls([], [])).toEqual([]);
  });
});
