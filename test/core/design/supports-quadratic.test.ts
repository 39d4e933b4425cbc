import { describe, expect, it } from 'vitest';
import { boxBehnken } from '../../../src/core/design/box-behnken.ts';
import { centralComposite } from '../../../src/core/design/central-composite.ts';
import { supportsQuadratic } from '../../../src/core/design/supports-quadratic.ts';
import { defineFactors } from '../../../src/core/factor/factor.ts';

const num = (name: string) => ({ kind: 'numeric' as const, name, low: 0, high: 10 });

describe('supportsQuadratic (Myers, Montgomery and Anderson-Cook, 3rd ed., section 7.1, from memory)', () => {
  it('central composite and Box-Behnken designs can estimate the full quadratic model', () => {
    const ccd = centralComposite({ factors: [num('A'), num('B')], randomize: false });
    expect(supportsQuadratic(ccd.design.factors, ccd.design.runs.map((r) => r.coded))).toBe(true);
    const bb = boxBehnken({ factors: [num('A'), num('B'), num('C')], randomize: false });
    expect(supportsQuadratic(bb.design.factors, bb.design.runs.map((r) => r.coded))).toBe(true);
  });

  it('a 2^2 with center runs cannot: its two squares share one column pattern (Montgomery 8th ed., section 6.8)', () => {
    const f = defineFactors([num('A'), num('B')]);
    expect(supportsQuadratic(f, [[-1, -1], [1, -1], [-1, 1], [1, 1], [0, 0], [0, 0], [0, 0], [0, 0]])).toBe(false);
  });

  it('a categorical factor rules it out', () => {
    const ccd = centralComposite({ factors: [num('A'), num('B')], randomize: false });
    const f = defineFactors([num('A'), { kind: 'categorical', name: 'Tool', levels: ['old', 'new'] }]);
    expect(supportsQuadratic(f, ccd.design.runs.map((r) => r.coded))).toBe(false);
  });

  it('degenerate: no factors or no runs -> false', () => {
    expect(supportsQuadratic([], [])).toBe(false);
    expect(supportsQuadratic(defineFactors([num('A')]), [])).toBe(false);
  });
});
