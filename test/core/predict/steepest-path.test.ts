import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { InputError } from '../../../src/core/errors.ts';
import { analyze } from '../../../src/core/fit/analyze.ts';
import { parseTerms } from '../../../src/core/model/formula.ts';
import { CAUTION } from '../../../src/core/predict/caution.ts';
import { predict } from '../../../src/core/predict/predict.ts';
import { MAX_PATH_STEPS, pathSenseForGoal, steepestPath } from '../../../src/core/predict/steepest-path.ts';
import { fixtureData } from '../../helpers/fixtures.ts';
import { handModel, numeric } from './designs.ts';

const yieldData = fixtureData('montgomery-8e-ex6-6-center-points.csv', { factors: ['Time', 'Temperature'], response: 'Yield' });
const yieldModel = analyze(yieldData, { terms: [1, 2] }).model;

describe('steepestPath: the worked example of Montgomery 8th ed., section 11.2 (Myers, Montgomery and Anderson-Cook, RSM 4th ed., section 5.1)', () => {
  // yhat = 40.44 + 0.775 x1 + 0.325 x2, x1 = (time - 35) / 5, x2 = (temperature - 155) / 5; base time, 5 min per step
  const p = steepestPath(yieldModel, { base: 'Time', step: 5, steps: 12 });

  it('Delta x1 = 1, Delta x2 = 0.325 / 0.775 = 0.42, i.e. about 2 degF per step (the printed path rounds to 2)', () => {
    expect(p.direction[0]).toBeCloseTo(1, 12);
    expect(p.direction[1]).toBeCloseTo(0.325 / 0.775, 12);
    expect(p.direction[1]).toBeCloseTo(0.42, 2);
    expect(p.realStep[0]).toBeCloseTo(5, 12);
    expect(p.realStep[1]).toBeCloseTo(2.1, 1);
    expect(Math.round(p.realStep[1])).toBe(2);
  });

  it('starts at the origin (35 min, 155 degF) and moves 5 min and 2.1 degF per step', () => {
    expect(p.steps[0].real).toEqual([35, 155]);
    expect(p.steps[1].real[0]).toBeCloseTo(40, 12);
    expect(p.steps[1].real[1]).toBeCloseTo(155 + (5 * 0.325) / 0.775, 10);
    expect(p.steps[12].real[0]).toBeCloseTo(95, 10); // 35 + 12 x 5; the printed path ends at 95 min (from memory)
    expect(p.steps).toHaveLength(13);
  });

  it('each step carries the fitted model prediction; predict at the same settings agrees', () => {
    for (const s of p.steps) {
      expect(s.fit).toBeCloseTo(364 / 9 + 0.775 * s.coded[0] + 0.325 * s.coded[1], 10);
      const q = predict(yieldModel, { Time: s.real[0], Temperature: s.real[1] });
      expect(s.fit).toBeCloseTo(q.fit, 10);
      expect(s.pi![1]).toBeCloseTo(q.pi![1], 10);
    }
  });

  it('marks the steps outside the tested range (from step 2: time 45 min > 40 min) and says so', () => {
    expect(p.steps.map((s) => s.outside).slice(0, 4)).toEqual([false, false, true, true]);
    expect(p.firstOutside).toBe(2);
    expect(p.messages.join(' ')).toMatch(/From step 2 the path lies outside the tested range \(Time\)/);
    expect(p.caution).toBe(CAUTION);
  });

  it('descent runs the other way', () => {
    const d = steepestPath(yieldModel, { base: 'A', step: 5, steps: 2, sense: 'descent' });
    expect(d.direction[0]).toBeCloseTo(-1, 12);
    expect(d.direction[1]).toBeCloseTo(-0.325 / 0.775, 12);
    expect(d.steps[2].fit).toBeLessThan(d.steps[0].fit);
    expect(d.messages.join(' ')).toMatch(/stops falling/);
  });

  it('without a base, the largest main effect is the base', () => {
    expect(steepestPath(yieldModel, { step: 5, steps: 1 }).base.name).toBe('Time');
  });
});

describe('steepestPath: direction, held factors and warnings (hand-built models, invented coefficients)', () => {
  it('property: the direction is proportional to the main-effect coefficients, the base moving by its step (fast-check)', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: -5, max: 5, noNaN: true }), { minLength: 2, maxLength: 5 }), fc.double({ min: 0.1, max: 20, noNaN: true }), (b, step) => {
        fc.pre(b.some((v) => Math.abs(v) > 1e-3));
        const k = b.length;
        const m = handModel(Array.from({ length: k }, (_, i) => numeric(`F${i + 1}`, 0, 10 * (i + 1))), Array.from({ length: k }, (_, i) => 1 << i), [1, ...b]);
        const path = steepestPath(m, { step, steps: 3 });
        const base = path.factors.findIndex((f) => f.name === path.base.name);
        const scale = path.direction[base] / b[base];
        expect(scale).toBeGreaterThan(0);
        b.forEach((bi, i) => expect(path.direction[i]).toBeCloseTo(bi * scale, 10));
        expect(Math.abs(path.realStep[base])).toBeCloseTo(step, 10); // half-range 5 (i + 1), coded step step / D
        b.forEach((bi, i) => expect(path.realStep[i]).toBeCloseTo(path.direction[i] * 5 * (i + 1), 10));
      }),
      { numRuns: 100 },
    );
  });

  const cat = [numeric('Temperature', 160, 200, 'degC'), { kind: 'categorical' as const, name: 'Powder', levels: ['matte', 'gloss'] as [string, string] }, numeric('Time', 10, 20, 's')];

  it('a categorical factor is held at the better level by its main effect, or at the level given', () => {
    const m = handModel(cat, [1, 2, 4], [70, 5, -3, 1]);
    const up = steepestPath(m, { base: 'A', step: 10, steps: 2 });
    expect(up.steps[0].real[1]).toBe('matte'); // coefficient -3: matte is better for ascent
    expect(up.direction[1]).toBe(0);
    expect(up.messages.join(' ')).toMatch(/Powder held at matte, the better level by its main effect \(coefficient -3\)/);
    const down = steepestPath(m, { base: 'A', step: 10, steps: 2, sense: 'descent' });
    expect(down.steps[0].real[1]).toBe('gloss');
    const given = steepestPath(m, { base: 'A', step: 10, steps: 2, at: { Powder: 'gloss' } });
    expect(given.steps.every((s) => s.real[1] === 'gloss')).toBe(true);
    expect(given.steps[1].fit).toBeCloseTo(70 + 5 * 0.5 - 3 + 0.1, 12); // coded step 10 / 20 = 0.5; Time 0.5 x 1/5 = 0.1
  });

  it('a numeric factor given in `at` is held still', () => {
    const m = handModel(cat, [1, 2, 4], [70, 5, -3, 1]);
    const p = steepestPath(m, { base: 'A', step: 10, steps: 3, at: { Time: 12, Powder: 'gloss' } });
    expect(p.direction[2]).toBe(0);
    expect(p.steps.every((s) => s.real[2] === 12)).toBe(true);
    expect(p.factors[2].moving).toBe(false);
  });

  it('warns when interactions or curvature are significant', () => {
    const m = handModel([numeric('A'), numeric('B')], [1, 2, 3], [10, 2, 1, 0.8], { pValues: new Map([[1, 0.001], [2, 0.01], [3, 0.003]]), curvatureP: 0.02 });
    const p = steepestPath(m, { base: 'A', step: 10, steps: 1 });
    expect(p.messages.join(' ')).toMatch(/Interactions are significant \(AB p = 0.0030\).*points less reliably/);
    expect(p.messages.join(' ')).toMatch(/Curvature is significant \(p = 0.0200\)/);
    const quiet = steepestPath({ ...m, pValues: new Map([[3, 0.4]]), curvatureP: 0.5 }, { base: 'A', step: 10, steps: 1 });
    expect(quiet.messages.join(' ')).not.toMatch(/significant/);
  });

  it('a log-scale base takes a ratio per step (coded step ln(ratio) / D)', () => {
    const m = handModel([{ kind: 'numeric', name: 'Speed', low: 10, high: 1000, scale: 'log' }, numeric('B')], [1, 2], [1, 2, 1]);
    const p = steepestPath(m, { base: 'Speed', step: 10, steps: 2 });
    expect(p.steps[1].real[0]).toBeCloseTo(1000, 8); // center 100, times 10
    expect(p.realStep[0]).toBeCloseTo(10, 10);
    expect(p.direction[0]).toBeCloseTo(Math.log(10) / Math.log(10), 12); // D = (ln 1000 - ln 10) / 2 = ln 10
  });

  it('degenerate and bad input throw InputError saying what was needed', () => {
    const m = handModel(cat, [1, 2, 4], [70, 5, -3, 0]);
    expect(() => steepestPath(m, { base: 'A', step: 10, steps: 0 })).toThrow(/whole number from 1 to 1000, got 0/);
    expect(() => steepestPath(m, { base: 'A', step: 10, steps: MAX_PATH_STEPS + 1 })).toThrow(InputError);
    expect(() => steepestPath(m, { base: 'A', step: 0, steps: 2 })).toThrow(/positive number of degC, got 0/);
    expect(() => steepestPath(m, { base: 'A', step: Number.NaN, steps: 2 })).toThrow(/positive number/);
    expect(() => steepestPath(m, { base: 'Powder', step: 1, steps: 2 })).toThrow(/base factor must be numeric; Powder is categorical/);
    expect(() => steepestPath(m, { base: 'Time', step: 1, steps: 2 })).toThrow(/Time has no main effect in the model.*the largest main effect is Temperature/);
    expect(() => steepestPath(m, { base: 'A', step: 1, steps: 2, at: { A: 170 } })).toThrow(/must move along the path; Temperature is held/);
    expect(() => steepestPath(m, { base: 'Q', step: 1, steps: 2 })).toThrow(/No factor is named or lettered "Q"/);
    expect(() => steepestPath(m, { step: 1, steps: 2, at: { A: 170, C: 15 } })).toThrow(/at least one numeric factor to move/);
    expect(() => steepestPath(m, { step: 1, steps: 2, sense: 'sideways' as 'ascent' })).toThrow(/ascent or descent/);
    const log = handModel([{ kind: 'numeric', name: 'Speed', low: 10, high: 1000, scale: 'log' }], [1], [1, 2]);
    expect(() => steepestPath(log, { step: 1, steps: 2 })).toThrow(/ratio .* above 1; got 1/);
    // residual df 0: no intervals, and the result says significance cannot be judged
    const p = steepestPath({ ...m, sigma: null, dfResidual: 0 }, { base: 'A', step: 10, steps: 1 });
    expect(p.steps[0].pi).toBeNull();
    expect(p.messages.join(' ')).toMatch(/residual df 0/);
  });
});

describe('pathSenseForGoal (the response goal of src/core/study/response.ts)', () => {
  it('maximize -> ascent, minimize -> descent', () => {
    expect(pathSenseForGoal({ name: 'Gloss', goal: 'maximize' })).toBe('ascent');
    expect(pathSenseForGoal({ name: 'Scrap', goal: 'minimize' })).toBe('descent');
  });

  it('degenerate: a target goal has no single direction', () => {
    expect(() => pathSenseForGoal({ name: 'Thickness', goal: 'target', target: 2 })).toThrow(/aims at a target/);
  });
});

describe('steepestPath from a model with squares (Montgomery 8th ed., Example 11.2 central composite fit)', () => {
  const data = fixtureData('montgomery-8e-ex11-2-ccd-yield.csv', { factors: ['Time', 'Temperature'], response: 'Yield', levels: { Time: ['80', '90'], Temperature: ['170', '180'] } });
  const a = analyze(data, { terms: parseTerms('quadratic', data.factors) });
  const p = steepestPath(a.model, { base: 'Time', step: 5, steps: 4 });

  it('the direction is still the main-effect coefficients (the gradient at the center), and each step predicts with every term', () => {
    const b = Object.fromEntries(a.terms.map((t) => [t.letters, t.coef]));
    expect(p.direction[1]).toBeCloseTo(b.B / b.A, 12);
    for (const s of p.steps) {
      const x = s.coded;
      // the fitted quadratic, by hand from the coefficients
      const byHand = a.intercept.coef + b.A * x[0] + b.B * x[1] + b.AB * x[0] * x[1] + b['A^2'] * x[0] ** 2 + b['B^2'] * x[1] ** 2;
      expect(s.fit).toBeCloseTo(byHand, 10);
    }
    // the surface curves: the peak lies within one coded unit of the center (stationary point near
    // x = (0.39, 0.31), Montgomery Example 11.2, from memory), so a straight path of 5-min steps falls from step 1 on
    for (let k = 1; k <= 4; k++) expect(p.steps[k].fit).toBeLessThan(p.steps[k - 1].fit);
  });

  it('says that the model holds squares and that the surface curves; squares are not called interactions', () => {
    const text = p.messages.join(' ');
    expect(text).toMatch(/The model holds squares \(A\^2, B\^2\)/);
    expect(text).toMatch(/the squares A\^2 p [<=] [\d.]+, B\^2 p [<=] [\d.]+ are significant/);
    expect(text).not.toMatch(/Interactions are significant \([^)]*\^2/);
  });
});
