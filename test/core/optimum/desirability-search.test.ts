import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { desirabilityAt, maximizeDesirability } from '../../../src/core/optimum/desirability-search.ts';
import { boxExtreme } from '../../../src/core/optimum/box-optimum.ts';
import { quadraticSurface, surfaceValue } from '../../../src/core/optimum/quadratic-surface.ts';
import { analyze } from '../../../src/core/fit/analyze.ts';
import { parseTerms } from '../../../src/core/model/formula.ts';
import { pcg32 } from '../../../src/core/design/random.ts';
import { fixtureData } from '../../helpers/fixtures.ts';
import { syntheticModel, uniform } from './helpers.ts';

describe('maximizeDesirability', () => {
  it('one response to maximise: the search finds the exact box maximum of its surface', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 3 }), fc.integer({ min: 0, max: 2 ** 31 - 1 }), (k, seed) => {
        const m = syntheticModel(k, seed);
        const s = quadraticSurface(m);
        const hi = boxExtreme(s, 'max');
        const lo = boxExtreme(s, 'min');
        // Limits so wide that d stays below 1 everywhere in the box: maximising d is maximising y.
        const spec = { name: 'Y', goal: 'max' as const, low: lo.fit - 1, high: hi.fit + 1 };
        const r = maximizeDesirability([m], [spec]);
        expect(surfaceValue(s, r.coded)).toBeCloseTo(hi.fit, 6);
        expect(r.D).toBeCloseTo((hi.fit - spec.low) / (spec.high - spec.low), 6);
      }),
      { numRuns: 40 },
    );
  });

  it('two responses: no random point in the box has a higher D than the one found (invented surfaces)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 2 ** 31 - 1 }), (seed) => {
        const m1 = syntheticModel(2, seed);
        const m2 = { ...syntheticModel(2, seed + 1), response: 'Y2' };
        const s1 = quadraticSurface(m1);
        const s2 = quadraticSurface(m2);
        const mid1 = (boxExtreme(s1, 'max').fit + boxExtreme(s1, 'min').fit) / 2;
        const lo2 = boxExtreme(s2, 'min').fit;
        const hi2 = boxExtreme(s2, 'max').fit;
        const specs = [
          { name: 'Y', goal: 'max' as const, low: mid1 - 1, high: boxExtreme(s1, 'max').fit + 0.5 },
          { name: 'Y2', goal: 'min' as const, low: lo2 - 0.5, high: hi2 + 0.5 },
        ];
        const r = maximizeDesirability([m1, m2], specs);
        const rng = pcg32(seed + 5);
        let top = 0;
        for (let i = 0; i < 300; i++) top = Math.max(top, desirabilityAt([m1, m2], specs, [uniform(rng, -1, 1), uniform(rng, -1, 1)]).D);
        expect(top).toBeLessThanOrEqual(r.D + 1e-7);
      }),
      { numRuns: 30 },
    );
  }, 60_000);

  it('reports each response at the best point with fit, interval and d, how it was found, and the caution', () => {
    const data = fixtureData('montgomery-8e-ex11-2-ccd-yield.csv', { factors: ['Time', 'Temperature'], response: 'Yield', levels: { Time: ['80', '90'], Temperature: ['170', '180'] } });
    const a = analyze(data, { terms: parseTerms('quadratic', data.factors) });
    const r = maximizeDesirability([a.model], [{ name: 'Yield', goal: 'target', low: 78, target: 79, high: 81 }], data.coded);
    expect(r.D).toBeCloseTo(1, 6);
    expect(r.responses[0].fit).toBeCloseTo(79, 5);
    expect(r.responses[0].pi![0]).toBeLessThan(79);
    expect(r.search.seeds).toBe(13 + 4 + 25); // 13 runs, 4 corners, 5 x 5 grid
    expect(r.caution.length).toBe(3);
    // D = 0 everywhere: the note says so
    const none = maximizeDesirability([a.model], [{ name: 'Yield', goal: 'max', low: 90, high: 95 }]);
    expect(none.D).toBe(0);
    expect(none.notes[0]).toMatch(/D = 0/);
  });

  it('refuses mismatched goals and models', () => {
    const m = syntheticModel(2, 1);
    expect(() => maximizeDesirability([m], [])).toThrow(/one goal per fitted response \(1\), got 0/);
    expect(() => maximizeDesirability([m, syntheticModel(3, 1)], [{ name: 'A', goal: 'max', low: 0, high: 1 }, { name: 'B', goal: 'max', low: 0, high: 1 }])).toThrow(/same factors and coding/);
    expect(() => desirabilityAt([m], [{ name: 'A', goal: 'max', low: 0, high: 1 }], [0])).toThrow(/one coded setting per factor \(2\), got 1/);
  });
});
