import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { InputError } from '../../../src/core/errors.ts';
import { analyze } from '../../../src/core/fit/analyze.ts';
import { termsUpToOrder } from '../../../src/core/model/formula.ts';
import { CAUTION } from '../../../src/core/predict/caution.ts';
import { predict } from '../../../src/core/predict/predict.ts';
import { solveForTarget } from '../../../src/core/predict/solve-for-target.ts';
import { fixtureData } from '../../helpers/fixtures.ts';
import { handModel, numeric } from './designs.ts';

const yieldData = fixtureData('montgomery-8e-ex6-6-center-points.csv', { factors: ['Time', 'Temperature'], response: 'Yield' });
const yieldModel = analyze(yieldData, { terms: [1, 2] }).model;
const etch = fixtureData('montgomery-8e-ex6-1-plasma-etch-2x3.csv', { factors: ['Gap', 'Flow', 'Power'], response: 'Etch rate' });
const etchModel = analyze(etch, { terms: termsUpToOrder(3, 3) }).model;

describe('solveForTarget: Montgomery 8th ed., section 6.8 data, yhat = 40.44 + 0.775 x1 + 0.325 x2 (section 11.2)', () => {
  const s = solveForTarget(yieldModel, { factor: 'Time', target: 41, at: { Temperature: 155 } });

  it('gives the exact setting: x1 = (41 - 40.444) / 0.775, time = 35 + 5 x1 (by hand from the printed model)', () => {
    const x1 = (41 - 364 / 9) / 0.775;
    expect(s.coded).toBeCloseTo(x1, 10);
    expect(s.setting).toBeCloseTo(35 + 5 * x1, 9);
    expect(s.reachable).toBe(true);
    expect(s.fit).toBeCloseTo(41, 10);
    expect(s.slope).toBeCloseTo(0.775, 12);
    expect(s.reach[0]).toBeCloseTo(364 / 9 - 0.775, 12);
    expect(s.needed).toBeNull();
    expect(s.caution).toBe(CAUTION);
  });

  it('solve then predict gives the target back, with the same prediction interval', () => {
    const p = predict(yieldModel, { Time: s.setting, Temperature: 155 });
    expect(p.fit).toBeCloseTo(41, 10);
    expect(p.pi![0]).toBeCloseTo(s.pi![0], 10);
    expect(p.pi![1]).toBeCloseTo(s.pi![1], 10);
  });

  it('a target outside what the tested range reaches: not reachable, the nearest end with its prediction and PI, and the setting that would be needed', () => {
    const far = solveForTarget(yieldModel, { factor: 'A', target: 43, at: { B: 160 } });
    expect(far.reachable).toBe(false);
    expect(far.setting).toBe(40); // the high setting of time
    expect(far.coded).toBe(1);
    expect(far.fit).toBeCloseTo(364 / 9 + 0.775 + 0.325, 10);
    expect(far.pi).not.toBeNull();
    // would need x1 = (43 - 40.444 - 0.325) / 0.775, by hand
    expect(far.needed!.coded).toBeCloseTo((43 - 364 / 9 - 0.325) / 0.775, 10);
    expect(far.needed!.real).toBeCloseTo(35 + 5 * far.needed!.coded, 9);
    expect(far.messages.join(' ')).toMatch(/outside what the tested range of Time reaches at these settings/);
    expect(far.messages.join(' ')).toMatch(/nearest setting inside the range is 40 min \(the high setting\)/);
  });

  it('a numeric factor not given is held at its center, and said so', () => {
    const c = solveForTarget(yieldModel, { factor: 'A', target: 40.5 });
    expect(c.settings[1]).toMatchObject({ real: 155, source: 'center' });
    expect(c.messages).toContain('Temperature was not given: held at its center, 155 degF.');
  });
});

describe('solveForTarget with interactions (Montgomery 8th ed., Example 6.1 plasma etch, full model): still exact', () => {
  it('property: for any held settings and a target inside the reach, predict at the answer gives the target (fast-check)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.8, max: 1.2, noNaN: true }), fc.double({ min: 125, max: 200, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true }), (gap, flow, u) => {
        const probe = solveForTarget(etchModel, { factor: 'Power', target: 0, at: { Gap: gap, Flow: flow } });
        const [lo, hi] = [Math.min(...probe.reach), Math.max(...probe.reach)];
        const target = lo + u * (hi - lo);
        const s = solveForTarget(etchModel, { factor: 'Power', target, at: { Gap: gap, Flow: flow } });
        expect(s.reachable).toBe(true);
        const p = predict(etchModel, { Gap: gap, Flow: flow, Power: s.setting });
        expect(Math.abs(p.fit - target)).toBeLessThan(1e-8 * 1000);
      }),
      { numRuns: 100 },
    );
  });

  it('says when the factor interacts with others, so the answer holds at these settings only', () => {
    const s = solveForTarget(etchModel, { factor: 'C', target: 800, at: { A: 1, B: 150 } });
    expect(s.messages.join(' ')).toMatch(/Power interacts with other factors in the model \(AC, BC, ABC\)/);
  });
});

describe('solveForTarget: zero slope, categorical factors, bad input (hand-built models, invented coefficients)', () => {
  // yhat = 10 + 2 xA + 0.5 xB + 2 xA xB: at xB = -1 the slope in A is 2 - 2 = 0
  const m = handModel([numeric('A', 0, 10), numeric('B', 0, 10)], [1, 2, 3], [10, 2, 0.5, 2]);

  it('slope zero at the held settings: says so and gives the center with its prediction', () => {
    const s = solveForTarget(m, { factor: 'A', target: 12, at: { B: 0 } });
    expect(s.slope).toBe(0);
    expect(s.reachable).toBe(false);
    expect(s.coded).toBe(0);
    expect(s.setting).toBe(5);
    expect(s.fit).toBeCloseTo(9.5, 12); // 10 - 0.5
    expect(s.pi).not.toBeNull();
    expect(s.messages.join(' ')).toMatch(/A has no effect at these settings \(slope 0\)/);
    const already = solveForTarget(m, { factor: 'A', target: 9.5, at: { B: 0 } });
    expect(already.reachable).toBe(true);
  });

  it('a categorical factor cannot be solved for: the message gives the fit at each level', () => {
    const c = handModel([numeric('A', 0, 10), { kind: 'categorical', name: 'Powder', levels: ['matte', 'gloss'] }], [1, 2], [10, 2, 3]);
    expect(() => solveForTarget(c, { factor: 'Powder', target: 12, at: { A: 5 } })).toThrow(
      /Powder is categorical \("matte" or "gloss", nothing between\), so it cannot be solved for; at the given settings the model predicts 7 at matte and 13 at gloss/,
    );
  });

  it('degenerate: a non-finite target, an unknown factor, a setting for the solved factor, residual df 0', () => {
    expect(() => solveForTarget(m, { factor: 'A', target: Number.NaN })).toThrow(InputError);
    expect(() => solveForTarget(m, { factor: 'A', target: Number.NaN })).toThrow(/finite number, got NaN/);
    expect(() => solveForTarget(m, { factor: 'Z', target: 1 })).toThrow(/No factor is named or lettered "Z"/);
    expect(() => solveForTarget(m, { factor: 'A', target: 1, at: { A: 3 } })).toThrow(/factor to be found/);
    const s = solveForTarget({ ...m, sigma: null, dfResidual: 0 }, { factor: 'A', target: 11, at: { B: 5 } });
    expect(s.pi).toBeNull();
    expect(s.se).toBeNull();
    expect(s.fit).toBeCloseTo(11, 12);
    expect(s.messages.join(' ')).toMatch(/residual df 0/);
  });
});
