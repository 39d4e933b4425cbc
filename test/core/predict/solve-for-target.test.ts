import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { InputError } from '../../../src/core/errors.ts';
import { analyze } from '../../../src/core/fit/analyze.ts';
import { parseTerms, termsUpToOrder } from '../../../src/core/model/formula.ts';
import { squareTerm } from '../../../src/core/model/term.ts';
import { CAUTION } from '../../../src/core/predict/caution.ts';
import { predict } from '../../../src/core/predict/predict.ts';
import { solveForTarget } from '../../../src/core/predict/solve-for-target.ts';
import { fixtureData } from '../../helpers/fixtures.ts';
import { handModel, numeric } from './designs.ts';
import { referenceColumnsModel } from './reference.ts';
import { parseTransform } from '../../../src/core/fit/response-transform.ts';
import { shortNumber } from '../../../src/core/text/number-text.ts';

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

describe('solveForTarget with a square: the model is quadratic in the factor solved for', () => {
  // Invented coefficients: yhat = 10 + xA - 4 xA^2 (A 0..10); by hand, 9.5 is reached at xA = -0.25 and 0.5,
  // the fit turns at xA = 1/8 with 10 + 1/16 = 10.0625.
  const m = handModel([numeric('A', 0, 10), numeric('B', 0, 10)], [1, 2, squareTerm(0)], [10, 1, 0, -4]);

  it('two roots inside the range: both listed, the one nearer the center is the answer', () => {
    const s = solveForTarget(m, { factor: 'A', target: 9.5 });
    expect(s.solutions.map((r) => r.coded)).toEqual([-0.25, 0.5]);
    expect(s.solutions.map((r) => r.setting)).toEqual([3.75, 7.5]);
    expect(s.coded).toBe(-0.25);
    expect(s.reachable).toBe(true);
    expect(s.fit).toBeCloseTo(9.5, 12);
    expect(s.quadratic).toBe(-4);
    expect(s.slope).toBe(1);
    expect(s.stationary!.coded).toBeCloseTo(0.125, 15);
    expect(s.stationary!.fit).toBeCloseTo(10.0625, 14);
    // the span over the range: from the low end (10 - 1 - 4 = 5) up to the turning point, by hand
    expect(s.span[0]).toBe(5);
    expect(s.span[1]).toBeCloseTo(10.0625, 14);
    expect(s.reach).toEqual([5, 7]);
    expect(s.messages.join(' ')).toMatch(/Two settings of A inside the tested range give 9\.5: 3\.75 \(coded -0\.25\) and 7\.5 \(coded \+0\.5\)/);
    expect(s.messages.join(' ')).toMatch(/The model is quadratic in A/);
  });

  it('one root inside and one outside: only the inside one is a solution', () => {
    // 10 + x - 4x^2 = 7: x = (1 +- 7) / 8 -> 1 (the high end) and -0.75, by hand
    const s = solveForTarget(m, { factor: 'A', target: 7 });
    expect(s.solutions.map((r) => r.coded)).toEqual([-0.75, 1]);
    // 10 + x - 4x^2 = 6.5: x = (1 +- sqrt(57)) / 8 -> 1.069 (outside) and -0.819
    const t = solveForTarget(m, { factor: 'A', target: 6.5 });
    expect(t.solutions).toHaveLength(1);
    expect(t.coded).toBeCloseTo((1 - Math.sqrt(57)) / 8, 14);
  });

  it('a target above the peak: not reachable, no setting would reach it, the turning point is the nearest', () => {
    const s = solveForTarget(m, { factor: 'A', target: 11 });
    expect(s.reachable).toBe(false);
    expect(s.needed).toBeNull();
    expect(s.solutions).toEqual([]);
    expect(s.coded).toBeCloseTo(0.125, 15);
    expect(s.fit).toBeCloseTo(10.0625, 12);
    expect(s.messages.join(' ')).toMatch(/no setting of A reaches it in the fitted model, whose fit peaks at 10\.06/);
    expect(s.messages.join(' ')).toMatch(/where the fit turns/);
  });

  it('a target below the range but on the parabola: the nearer outside root is needed, the nearer end is given', () => {
    // 10 + x - 4x^2 = 0: x = (1 +- sqrt(161)) / 8 -> -1.461 and 1.711; the lower end gives 5, the higher 7
    const s = solveForTarget(m, { factor: 'A', target: 0 });
    expect(s.reachable).toBe(false);
    expect(s.coded).toBe(-1);
    expect(s.needed!.coded).toBeCloseTo((1 - Math.sqrt(161)) / 8, 13);
    expect(s.needed!.real).toBeCloseTo(5 + 5 * s.needed!.coded, 12);
  });

  it('the square of another factor adds a constant only: the answer is linear in A', () => {
    const other = handModel([numeric('A', 0, 10), numeric('B', 0, 10)], [1, 2, squareTerm(1)], [10, 2, 0, 1]);
    const s = solveForTarget(other, { factor: 'A', target: 12, at: { B: 10 } }); // 10 + 2x + 1 = 12 -> x = 0.5
    expect(s.quadratic).toBe(0);
    expect(s.stationary).toBeNull();
    expect(s.coded).toBeCloseTo(0.5, 15);
    expect(s.solutions).toHaveLength(1);
  });

  it('property: on the central composite fit (Montgomery 8th ed., Example 11.2), predict at every solution gives the target (fast-check)', () => {
    const data = fixtureData('montgomery-8e-ex11-2-ccd-yield.csv', { factors: ['Time', 'Temperature'], response: 'Yield', levels: { Time: ['80', '90'], Temperature: ['170', '180'] } });
    const model = analyze(data, { terms: parseTerms('quadratic', data.factors) }).model;
    // Targets are drawn from each band on purpose: a uniform draw from the whole reach landed in
    // the narrow two-solution band (about 5% of it) in none of 100 runs for about 1 seed in 130.
    fc.assert(
      fc.property(fc.double({ min: 170, max: 180, noNaN: true }), fc.boolean(), fc.double({ min: 0, max: 1, noNaN: true }), (temp, twoBand, u) => {
        const probe = solveForTarget(model, { factor: 'Time', target: 0, at: { Temperature: temp } });
        // The fit along Time is a downward parabola with its peak inside the range: every value
        // from the lower end up to the peak is reached; above the higher end it is reached twice.
        const top = probe.stationary!.fit;
        const low = Math.min(...probe.reach);
        const high = Math.max(...probe.reach);
        expect(top).toBeGreaterThan(high);
        // In the two-solution band stop short of the peak, where the two roots meet.
        const target = twoBand ? high + 0.99 * u * (top - high) : low + u * (high - low);
        const s = solveForTarget(model, { factor: 'Time', target, at: { Temperature: temp } });
        expect(s.reachable).toBe(true);
        if (twoBand) expect(s.solutions).toHaveLength(2);
        for (const r of s.solutions) {
          const p = predict(model, { Time: r.setting, Temperature: temp });
          expect(Math.abs(p.fit - target)).toBeLessThan(1e-9 * 100);
        }
      }),
      { numRuns: 100 },
    );
  });
});

describe('solveForTarget under a transform: solved on the fitted scale, reported in the response units', () => {
  // Montgomery 8th ed., Example 6.1 (plasma etch, every rate positive), fitted on a transformed
  // scale with A, C and AC. The references: ml-regression-multivariate-linear 2.0.4 fitted to
  // the transformed rates by the test itself, and the Box-Cox formulas done by hand here.
  const transforms = [
    { token: 'log', lambda: 0 },
    { token: 'sqrt', lambda: 0.5 },
    { token: 'inverse', lambda: -1 },
    { token: 'power=0.3', lambda: 0.3 },
  ];
  const g = (y: number, l: number) => (l === 0 ? Math.log(y) : (y ** l - 1) / l);
  const gInv = (z: number, l: number) => (l === 0 ? Math.exp(z) : (1 + l * z) ** (1 / l));
  const terms = [1, 4, 5]; // A (Gap), C (Power), AC
  const columns = (x: readonly number[]) => [x[0], x[2], x[0] * x[2]];
  for (const { token, lambda } of transforms) {
    const model = analyze(etch, { terms, transform: parseTransform(token) }).model;
    const ref = referenceColumnsModel({ ...etch, y: etch.y.map((v) => g(v, lambda)) }, columns);
    // The reference line along Power at Gap 1.2 cm (coded +1), Flow at its center: z = a + s xC.
    const a = ref.at([1, 0, 0]).fit;
    const s = ref.at([1, 0, 1]).fit - a;

    it(`${token}: the setting is the hand root x = (g(T) - a) / s, and predict there gives the target back`, () => {
      const sol = solveForTarget(model, { factor: 'Power', target: 700, at: { Gap: 1.2 } });
      expect(sol.reachable).toBe(true);
      expect(sol.coded).toBeCloseTo((g(700, lambda) - a) / s, 9);
      expect(sol.fit).toBeCloseTo(700, 8);
      expect(sol.transformed!.target).toBeCloseTo(g(700, lambda), 12);
      expect(sol.se).toBeNull();
      const p = predict(model, { Gap: 1.2, Flow: 162.5, Power: sol.setting });
      expect(p.fit).toBeCloseTo(700, 8);
      expect(p.pi![0]).toBeCloseTo(sol.pi![0], 8);
      expect(p.pi![1]).toBeCloseTo(sol.pi![1], 8);
      // the interval, back-transformed by hand from the reference's interval on the fitted scale
      const r = ref.at([1, 0, sol.coded]);
      // relative agreement: the reference library's least squares agrees to about 1e-9 here
      expect(Math.abs(sol.pi![0] / gInv(r.pi[0], lambda) - 1)).toBeLessThan(1e-8);
      expect(Math.abs(sol.ci![1] / gInv(r.ci[1], lambda) - 1)).toBeLessThan(1e-8);
      expect(sol.messages.join(' ')).toContain('To reach 700, set Power to');
      // With the response's unit given, the target is quoted with it; the figures stay the same.
      const withUnit = solveForTarget(model, { factor: 'Power', target: 700, at: { Gap: 1.2 }, responseUnit: 'mm/min' });
      expect(withUnit.messages.join(' ')).toContain('To reach 700 mm/min, set Power to');
      expect(withUnit.setting).toBe(sol.setting);
    });

    it(`${token}: an unreachable target quotes the reach in the response units, and the nearest setting`, () => {
      const sol = solveForTarget(model, { factor: 'Power', target: 2000, at: { Gap: 1.2 } });
      expect(sol.reachable).toBe(false);
      // the reach along Power, back-transformed by hand: g^-1(a - |s|) to g^-1(a + |s|)
      const lo = gInv(a - Math.abs(s), lambda);
      const hi = gInv(a + Math.abs(s), lambda);
      expect(sol.span[0]).toBeCloseTo(lo, 6);
      expect(sol.span[1]).toBeCloseTo(hi, 6);
      const text = sol.messages.join(' ');
      expect(text).toContain(`The target 2000 lies outside what the tested range of Power reaches at these settings (${shortNumber(lo)} to ${shortNumber(hi)})`);
      expect(text).toContain(`the model would need Power = `);
      expect(sol.fit).toBeCloseTo(hi, 6);
    });
  }

  it('a square under log: two roots quoted with the target in the response units (invented coefficients)', () => {
    // log yhat = 2 + xA - 4 xA^2, L = 0: the target e^1.5 (4.4817) is reached where xA - 4 xA^2 = -0.5,
    // by hand xA = -0.25 and 0.5; the fit turns at xA = 1/8 where it is e^(2 + 1/16) = 7.866.
    const base = handModel([numeric('A', 0, 10), numeric('B', 0, 10)], [1, 2, squareTerm(0)], [2, 1, 0, -4]);
    const m = { ...base, transform: { token: 'log', lambda: 0, lowerBound: 0, suggestion: null } };
    const sol = solveForTarget(m, { factor: 'A', target: Math.exp(1.5) });
    expect(sol.solutions.map((r) => r.coded)).toEqual([-0.25, 0.5]);
    expect(sol.fit).toBeCloseTo(Math.exp(1.5), 12);
    expect(sol.stationary!.fit).toBeCloseTo(Math.exp(2 + 1 / 16), 12);
    const text = sol.messages.join(' ');
    expect(text).toContain('Two settings of A inside the tested range give 4.482: 3.75 (coded -0.25) and 7.5 (coded +0.5)');
    expect(text).toContain('where it is 7.866');
    expect(text).toContain('on the log scale');
  });

  it('a lower bound shifts the scale: sqrt of y - 2 (invented coefficients)', () => {
    // sqrt scale z = 2 (sqrt(y - 2) - 1); zhat = 1 + 0.5 xA. Target 5: z = 2 (sqrt 3 - 1) = 1.4641, xA = 0.9282 by hand.
    const base = handModel([numeric('A', 0, 10)], [1], [1, 0.5]);
    const m = { ...base, transform: { token: 'sqrt', lambda: 0.5, lowerBound: 2, suggestion: null } };
    const sol = solveForTarget(m, { factor: 'A', target: 5 });
    expect(sol.coded).toBeCloseTo(2 * (Math.sqrt(3) - 1) * 2 - 2, 12);
    expect(sol.fit).toBeCloseTo(5, 12);
  });

  it('a target the transform cannot give is refused with the bound in words; nothing is solved', () => {
    const model = analyze(etch, { terms, transform: parseTransform('log') }).model;
    expect(() => solveForTarget(model, { factor: 'Power', target: 0 })).toThrow(InputError);
    expect(() => solveForTarget(model, { factor: 'Power', target: -5 })).toThrow('With the log transform the target for Etch rate needs to be above 0, got -5');
    const sq = analyze(etch, { terms, transform: parseTransform('sqrt') }).model;
    expect(solveForTarget(sq, { factor: 'Power', target: 0 }).reachable).toBe(false); // 0 is allowed under sqrt, just far out of reach
  });
});
