import { describe, expect, it } from 'vitest';
import { analyze } from '../../../src/core/fit/analyze.ts';
import { parseTerms } from '../../../src/core/model/formula.ts';
import { isSecondOrderModel, secondOrderAnalysis } from '../../../src/core/optimum/second-order-analysis.ts';
import { fixtureData } from '../../helpers/fixtures.ts';

describe('secondOrderAnalysis: Montgomery, Design and Analysis of Experiments, 8th ed., Example 11.2', () => {
  const data = fixtureData('montgomery-8e-ex11-2-ccd-yield.csv', { factors: ['Time', 'Temperature'], response: 'Yield', levels: { Time: ['80', '90'], Temperature: ['170', '180'] } });
  const a = analyze(data, { terms: parseTerms('quadratic', data.factors) });

  it('for the goal max the best setting in the box is the stationary point (a maximum inside the box)', () => {
    const s = secondOrderAnalysis(a.model, data.coded, { kind: 'max' });
    expect(s.canonical.nature).toBe('maximum');
    // Printed stationary point (from memory): 86.95 min, 176.53 degF, yield 80.21
    expect(s.optimum.real[0]).toBeCloseTo(86.95, 2);
    expect(s.optimum.real[1]).toBeCloseTo(176.53, 2);
    expect(s.optimum.fit).toBeCloseTo(80.21, 2);
    expect(s.optimum.pi![0]).toBeLessThan(s.optimum.fit);
    // Ridge to the largest design distance, 1.414 (the axial runs): radii 0.1 .. 1.4
    expect(s.ridge).toHaveLength(14);
    expect(s.ridge[0].radius).toBe(0.1);
    // On a maximum the ridge of highest response stops rising once the spheres pass the stationary point (radius 0.497)
    expect(s.ridge[3].fit).toBeLessThan(s.ridge[4].fit); // 0.4 -> 0.5 still rising
    expect(s.ridge[13].fit).toBeLessThan(s.ridge[4].fit);
    expect(s.caution).toHaveLength(3);
  });

  it('for a target the best setting meets it nearest the center; for min it sits on the box boundary', () => {
    const t = secondOrderAnalysis(a.model, data.coded, { kind: 'target', target: 79 });
    expect(t.optimum.fit).toBeCloseTo(79, 6);
    expect(t.ridgeSense).toBe('min'); // 79 is below the fit at the center, 79.94
    const m = secondOrderAnalysis(a.model, data.coded, { kind: 'min' });
    expect(m.optimum.coded.some((c) => Math.abs(c) === 1)).toBe(true);
  });

  it('refuses a model without squares', () => {
    const lin = analyze(data, { terms: parseTerms('A*B', data.factors) });
    expect(isSecondOrderModel(lin.model)).toBe(false);
    expect(() => secondOrderAnalysis(lin.model, data.coded, { kind: 'max' })).toThrow(/needs a model with squares/);
    expect(() => secondOrderAnalysis(a.model, [], { kind: 'max' })).toThrow(/got none/);
  });
});
