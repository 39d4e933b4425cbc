import { describe, expect, it } from 'vitest';
import { centralComposite } from '../../../src/core/design/central-composite.ts';
import { defineFactors } from '../../../src/core/factor/factor.ts';
import { boxExtent, testedExtent } from '../../../src/core/predict/tested-extent.ts';
import { fullFactorial, numeric } from './designs.ts';

describe('testedExtent: the axial distance widens the tested range on its axis (Montgomery 8th ed., section 11.4.1, from memory)', () => {
  it('a rotatable 2-factor central composite design reaches alpha = 4^(1/4) = 1.414 on both axes', () => {
    const plan = centralComposite({ factors: [numeric('A'), numeric('B')], axialDistance: 'rotatable', centerRuns: 5, randomize: false });
    const e = testedExtent(plan.design.factors, plan.design.runs.map((r) => r.coded));
    // alpha = F^(1/4), F = 4 factorial points (Box and Hunter 1957; Montgomery 8th ed., Eq. 11.22, from memory)
    expect(e[0]).toBeCloseTo(Math.SQRT2, 12);
    expect(e[1]).toBeCloseTo(Math.SQRT2, 12);
  });

  it('a face-centred design and a factorial with center runs stay at 1', () => {
    const face = centralComposite({ factors: [numeric('A'), numeric('B'), numeric('C')], axialDistance: 'face', randomize: false });
    expect(testedExtent(face.design.factors, face.design.runs.map((r) => r.coded))).toEqual([1, 1, 1]);
    const f = defineFactors([numeric('A'), numeric('B')]);
    expect(testedExtent(f, [...fullFactorial(2), [0, 0], [0, 0]])).toEqual([1, 1]);
  });

  it('a one-sided path along one factor does not widen the range; a pair of axial runs on one axis widens only that axis', () => {
    const f = defineFactors([numeric('A'), numeric('B')]);
    // invented path runs at coded 2, 3, 4 on A with B at its center
    expect(testedExtent(f, [...fullFactorial(2), [2, 0], [3, 0], [4, 0]])).toEqual([1, 1]);
    // the smaller of the two sides counts: +1.6 and -1.3 give 1.3 (by hand)
    expect(testedExtent(f, [...fullFactorial(2), [1.6, 0], [-1.3, 0]])).toEqual([1.3, 1]);
  });

  it('categorical factors keep 1 and are not needed at a center to find an axis', () => {
    const f = defineFactors([numeric('A'), { kind: 'categorical', name: 'Tool', levels: ['old', 'new'] }]);
    expect(testedExtent(f, [[-1.5, -1], [1.5, 1], [1, 1], [-1, -1]])).toEqual([1.5, 1]);
  });

  it('degenerate: no runs give 1 on every axis; no factors give an empty list', () => {
    expect(testedExtent(defineFactors([numeric('A')]), [])).toEqual([1]);
    expect(testedExtent([], [[]])).toEqual([]);
  });
});

describe('boxExtent: runs inside the factorial box (as on Yates\' path) are tested to 1 on every axis', () => {
  it('equals testedExtent on a replicated 2^3 with center runs, and on three factors with no runs', () => {
    const f = defineFactors([numeric('A'), numeric('B'), numeric('C')]);
    expect(boxExtent(3)).toEqual(testedExtent(f, [...fullFactorial(3), ...fullFactorial(3), [0, 0, 0], [0, 0, 0]]));
    expect(boxExtent(3)).toEqual(testedExtent(f, []));
    expect(boxExtent(0)).toEqual([]);
  });
});
