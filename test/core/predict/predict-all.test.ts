import { describe, expect, it } from 'vitest';
import { analyze } from '../../../src/core/fit/analyze.ts';
import { predict } from '../../../src/core/predict/predict.ts';
import { predictAll } from '../../../src/core/predict/predict-all.ts';
import { fixtureData } from '../../helpers/fixtures.ts';

const cols = { factors: ['Gap', 'Flow', 'Power'], response: 'Etch rate' };
const etch = fixtureData('montgomery-8e-ex6-1-plasma-etch-2x3.csv', cols);

describe('predictAll (Montgomery 8th ed., Example 6.1 plasma etch data; the second response is derived from it, invented)', () => {
  const m1 = analyze(etch).model;
  const m2 = analyze({ ...etch, response: 'Etch rate x 2', y: etch.y.map((v) => 2 * v) }).model;

  it('predicts every response at the same settings, each as predict would', () => {
    const all = predictAll([m1, m2], { Gap: 1, Flow: 150, Power: 300 });
    expect(all.map((p) => p.response)).toEqual(['Etch rate', 'Etch rate x 2']);
    const one = predict(m1, { Gap: 1, Flow: 150, Power: 300 });
    expect(all[0].fit).toBe(one.fit);
    expect(all[0].se).toBe(one.se);
    // doubling y doubles the fit and its standard error (least squares is linear in y)
    expect(all[1].fit).toBeCloseTo(2 * one.fit, 9);
    expect(all[1].se!).toBeCloseTo(2 * one.se!, 9);
  });

  it('degenerate: no models, or models with different factors, throw InputError', () => {
    expect(() => predictAll([], {})).toThrow(/at least one fitted response, got none/);
    const other = analyze(fixtureData('montgomery-8e-ex6-1-plasma-etch-2x3.csv', { factors: ['Gap', 'Power', 'Flow'], response: 'Etch rate' })).model;
    expect(() => predictAll([m1, other], {})).toThrow(/same factors and coding; Etch rate differs from Etch rate/);
  });
});
