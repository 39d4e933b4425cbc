import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { InputError } from '../../../src/core/errors.ts';
import { analyze } from '../../../src/core/fit/analyze.ts';
import { parseTerms, termsUpToOrder } from '../../../src/core/model/formula.ts';
import { defineFactors } from '../../../src/core/factor/factor.ts';
import { CAUTION } from '../../../src/core/predict/caution.ts';
import { centerNotes, modelNotes, predict, predictSettings } from '../../../src/core/predict/predict.ts';
import { parseSettings } from '../../../src/core/predict/parse-settings.ts';
import { fixtureData } from '../../helpers/fixtures.ts';
import { fullFactorial, handModel, lcg, numeric, responseData } from './designs.ts';
import { referenceColumnsModel, referenceModel } from './reference.ts';

const yieldData = fixtureData('montgomery-8e-ex6-6-center-points.csv', { factors: ['Time', 'Temperature'], response: 'Yield' });
const yieldModel = analyze(yieldData, { terms: [1, 2] }).model;

/** Invented data (for tests only): Temperature 160..200 degC, Powder matte/gloss, Time 10..20 s, 2^3 twice. */
function glossData() {
  const r = lcg(3);
  const coded = [...fullFactorial(3), ...fullFactorial(3)];
  const y = coded.map((x) => 70 + 5 * x[0] + 3 * x[1] + 2 * x[0] * x[1] - 0.5 * x[2] + (r() - 0.5)); // invented
  return responseData(
    [numeric('Temperature', 160, 200, 'degC'), { kind: 'categorical', name: 'Powder', levels: ['matte', 'gloss'] }, numeric('Time', 10, 20, 's')],
    coded,
    y,
  );
}
const gloss = glossData();
const glossTerms = termsUpToOrder(3, 2);
const glossModel = analyze(gloss, { terms: glossTerms }).model;

describe('predict: Montgomery 8th ed., section 6.8 yield data (2^2 + 5 center runs), yhat = 40.44 + 0.775 x1 + 0.325 x2 (section 11.2)', () => {
  const p = predict(yieldModel, { Time: 40, Temperature: 150 });

  it('shows each factor coded: x1 = (time - 35) / 5, x2 = (temperature - 155) / 5', () => {
    expect(p.settings.map((s) => s.coded)).toEqual([1, -1]);
    expect(p.settings.map((s) => s.real)).toEqual([40, 150]);
  });

  it('fit, baseline and contributions as in the printed model', () => {
    expect(p.baseline).toBeCloseTo(364 / 9, 12); // 40.44, the mean of the nine runs
    expect(p.fit).toBeCloseTo(364 / 9 + 0.775 - 0.325, 12);
    expect(p.contributions.map((c) => [c.letters, c.value])).toEqual([
      ['A', expect.closeTo(0.775, 12)],
      ['B', expect.closeTo(-0.325, 12)],
    ]);
  });

  it('se, 95% CI and PI as the reference library gives them (ml-regression-multivariate-linear 2.0.4, jstat t)', () => {
    const ref = referenceModel(yieldData, [1, 2]).at([1, -1]);
    expect(p.se!).toBeCloseTo(ref.se, 9);
    expect(p.ci![0]).toBeCloseTo(ref.ci[0], 8);
    expect(p.ci![1]).toBeCloseTo(ref.ci[1], 8);
    expect(p.pi![0]).toBeCloseTo(ref.pi[0], 8);
    expect(p.pi![1]).toBeCloseTo(ref.pi[1], 8);
    expect(p.level).toBe(0.95);
  });

  it('inside the range: no flag; the caution is carried as data', () => {
    expect(p.outside).toBe(false);
    expect(p.outsideFactors).toEqual([]);
    expect(p.caution).toBe(CAUTION);
  });

  it('a numeric factor not given is held at its center, and the result says so', () => {
    const q = predict(yieldModel, { A: 40 });
    expect(q.settings[1]).toMatchObject({ real: 155, coded: 0, source: 'center' });
    expect(q.messages).toContain('Temperature was not given: held at its center, 155 degF.');
  });

  it('outside the tested range: flagged, naming the factor and how far out', () => {
    const q = predict(yieldModel, { Time: 50, Temperature: 155 });
    expect(q.outside).toBe(true);
    expect(q.outsideFactors[0]).toMatchObject({ name: 'Time', beyond: 10, coded: 3 }); // (50 - 35) / 5 = 3, by hand
    expect(q.messages.join(' ')).toMatch(/Time = 50 min is outside the tested range \(30 to 40 min\): 10 min above the high setting/);
    expect(q.messages.join(' ')).toMatch(/extrapolation/);
  });
});

describe('predict with interactions and a categorical factor (invented data)', () => {
  it('contributions sorted by size; baseline plus contributions equals the fit exactly', () => {
    const p = predict(glossModel, { A: 185, B: 'gloss', Time: 12 });
    const sizes = p.contributions.map((c) => Math.abs(c.value));
    expect(sizes).toEqual([...sizes].sort((a, b) => b - a));
    expect(p.contributions.map((c) => c.letters).sort()).toEqual(['A', 'AB', 'AC', 'B', 'BC', 'C']);
    let sum = p.baseline;
    for (const c of p.contributions) sum += c.value;
    expect(sum).toBe(p.fit);
    // each contribution is coef x product of coded values: AB at (0.25, +1) -> 0.25 coef_AB
    const ab = p.contributions.find((c) => c.letters === 'AB')!;
    expect(ab.product).toBeCloseTo(0.25, 15);
    expect(ab.value).toBe(ab.coef * ab.product);
  });

  it('intervals against the reference library at off-corner settings', () => {
    const p = predict(glossModel, { A: 172, B: 'matte', C: 19 });
    const ref = referenceModel(gloss, glossTerms).at(p.settings.map((s) => s.coded));
    expect(p.fit).toBeCloseTo(ref.fit, 9);
    expect(p.se!).toBeCloseTo(ref.se, 9);
    expect(p.pi![1]).toBeCloseTo(ref.pi[1], 8);
  });

  it('refuses a level the factor does not have, a value between its levels, and a missing categorical factor', () => {
    expect(() => predict(glossModel, { A: 185, B: 'silk' })).toThrow(/Powder needs "matte" or "gloss", got "silk"/);
    expect(() => predict(glossModel, { A: 185, B: 0.5 })).toThrow(/no setting between them/);
    expect(() => predict(glossModel, { A: 185 })).toThrow(/Powder is categorical and has no center/);
  });

  it('property: baseline + contributions = fit exactly, and the fit matches the reference, on random non-orthogonal designs (fast-check)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 2 ** 31 - 1 }), fc.integer({ min: 2, max: 4 }), (seed, k) => {
        const r = lcg(seed);
        const terms = termsUpToOrder(k, 2);
        const n = terms.length + 5;
        const coded = Array.from({ length: n }, () => Array.from({ length: k }, () => (r() - 0.5) * 2));
        const y = coded.map((x) => 3 * x[0] - x[1] + 2 * x[0] * x[1] + r()); // invented
        const data = responseData(Array.from({ length: k }, (_, i) => numeric(`F${i + 1}`, 0, 10)), coded, y);
        const model = analyze(data, { terms }).model;
        const at = Object.fromEntries(Array.from({ length: k }, (_, i) => [`F${i + 1}`, r() * 14 - 2]));
        const p = predict(model, at);
        let sum = p.baseline;
        for (const c of p.contributions) sum += c.value;
        expect(sum).toBe(p.fit);
        const ref = referenceModel(data, terms).at(p.settings.map((s) => s.coded));
        expect(Math.abs(p.fit - ref.fit)).toBeLessThan(1e-8 * Math.max(1, Math.abs(ref.fit)));
        expect(Math.abs(p.se! - ref.se)).toBeLessThan(1e-8 * Math.max(1, ref.se));
      }),
      { numRuns: 60 },
    );
  });
});

describe('predict: residual df 0, blocks and curvature notes', () => {
  it('with residual df 0 the intervals are null and the result says why (Montgomery 8th ed., Example 6.2 under the full model)', () => {
    const data = fixtureData('montgomery-8e-ex6-2-filtration-2x4.csv', {
      factors: ['Temperature', 'Pressure', 'Concentration', 'Stirring'],
      response: 'Filtration rate',
    });
    const p = predict(analyze(data, { terms: termsUpToOrder(4, 4) }).model, { A: 1, B: 1, C: 1, D: 1 });
    expect(p.se).toBeNull();
    expect(p.ci).toBeNull();
    expect(p.pi).toBeNull();
    expect(p.messages.join(' ')).toMatch(/residual df 0/);
    expect(JSON.stringify(p)).not.toContain('NaN');
  });

  it('notes a blocked model (an average block) and significant curvature', () => {
    const m = handModel([numeric('A')], [1], [5, 1], { blockColumns: 0, curvatureP: 0.001 });
    expect(modelNotes(m, 0.05).join(' ')).toMatch(/Curvature is significant \(p = 0.0010\)/);
    expect(modelNotes({ ...m, curvatureP: 0.2 }, 0.05)).toEqual([]);
    const blocked = { ...m, blockColumns: 1, coef: Float64Array.from([5, 9, 1]), covUnscaled: new Float64Array([0.1, 0, 0, 0, 0.1, 0, 0, 0, 0.1]) };
    const p = predict(blocked, { A: 200 }); // coded +1
    expect(p.fit).toBe(6); // 5 + 1 x 1: the block column is 0 for an average block
    expect(p.messages).toContain('The prediction is for an average block.');
  });

  it('centerNotes: degenerate: nothing held gives no notes', () => {
    expect(centerNotes(parseSettings(yieldModel.factors, { A: 30, B: 160 }))).toEqual([]);
  });

  it('degenerate: predictSettings refuses settings that do not match the model', () => {
    expect(() => predictSettings(yieldModel, [])).toThrow(InputError);
    expect(() => predictSettings(yieldModel, [])).toThrow(/one setting per factor \(2\), got 0/);
  });
});

describe('predict: a term the runs cannot separate is labeled with what it estimates', () => {
  it('C carries C + AB in a half fraction with C = AB (defining relation I = ABC; Montgomery 8th ed., section 8.2)', () => {
    const factors = defineFactors([
      { kind: 'numeric', name: 'Speed', low: 10, high: 20 },
      { kind: 'numeric', name: 'Feed', low: 1, high: 2 },
      { kind: 'numeric', name: 'Depth', low: 0.5, high: 1 },
    ]);
    const coded = [[-1, -1, 1], [1, -1, -1], [-1, 1, -1], [1, 1, 1], [0, 0, 0]];
    const a = analyze(
      { factors, response: 'Finish', coded, y: [10, 14, 11, 19, 13], blocks: null, labels: ['1', '2', '3', '4', '5'], messages: [] },
      { terms: parseTerms('A + B + C + A:B', factors) },
    );
    const p = predict(a.model, { Speed: 20, Feed: 2, Depth: 1 });
    expect(p.contributions.find((c) => c.letters === 'C')!.estimates).toBe('C + AB');
    // the fitted value at a run of the fraction is that run's fitted value from the analysis
    expect(p.fit).toBeCloseTo(a.runs[3].fitted, 10);
  });
});

describe('predict with squares: Montgomery 8th ed., Example 11.2 (central composite design, yield), full quadratic model', () => {
  const data = fixtureData('montgomery-8e-ex11-2-ccd-yield.csv', { factors: ['Time', 'Temperature'], response: 'Yield', levels: { Time: ['80', '90'], Temperature: ['170', '180'] } });
  const model = analyze(data, { terms: parseTerms('quadratic', data.factors) }).model;
  // ml-regression-multivariate-linear 2.0.4 on the columns x1, x2, x1 x2, x1^2, x2^2 written by hand
  const ref = referenceColumnsModel(data, (x) => [x[0], x[1], x[0] * x[1], x[0] * x[0], x[1] * x[1]]);

  it('fit, se and both intervals equal the reference at real settings, inside and outside the range', () => {
    for (const [time, temp] of [[85, 175], [87, 176.5], [78, 182], [95, 165]]) {
      const p = predict(model, { Time: time, Temperature: temp });
      const r = ref.at([(time - 85) / 5, (temp - 175) / 5]);
      // 1e-7 absolute on values near 80: the reference library's own rounding is about 1e-9 here
      expect(p.fit).toBeCloseTo(r.fit, 7);
      expect(p.se!).toBeCloseTo(r.se, 7);
      expect(p.ci![0]).toBeCloseTo(r.ci[0], 7);
      expect(p.pi![1]).toBeCloseTo(r.pi[1], 7);
    }
  });

  it('significant curvature: the note says the squares allow for it, not that a first-order model is biased', () => {
    const notes = modelNotes({ ...model, curvatureP: 0.001 }, 0.05).join(' ');
    expect(notes).toMatch(/the model's square terms \(A\^2, B\^2\) allow for it/i);
    expect(notes).not.toMatch(/first-order/);
    expect(modelNotes({ ...model, terms: [1, 2, 3], curvatureP: 0.001 }, 0.05).join(' ')).toMatch(/first-order model is biased/);
  });

  it('a square contributes coef x (coded setting)^2, and the contributions add up to the fit', () => {
    const p = predict(model, { Time: 90, Temperature: 172.5 }); // coded (1, -0.5)
    const sq = Object.fromEntries(p.contributions.map((c) => [c.letters, c]));
    expect(sq['A^2'].product).toBe(1);
    expect(sq['B^2'].product).toBe(0.25); // (-0.5)^2, by hand
    expect(sq['B^2'].value).toBeCloseTo(0.25 * sq['B^2'].coef, 14);
    expect(sq['B^2'].name).toBe('Temperature^2');
    expect(p.contributions.reduce((s, c) => s + c.value, p.baseline)).toBe(p.fit);
    expect(p.fit).toBeCloseTo(ref.at([1, -0.5]).fit, 7);
  });
});

describe('predict: the tested range of a central composite design reaches its axial runs', () => {
  // Montgomery 8th ed., Example 11.2: axial runs at coded +-1.414 (fixture typed in from memory)
  const data = fixtureData('montgomery-8e-ex11-2-ccd-yield.csv', { factors: ['Time', 'Temperature'], response: 'Yield', levels: { Time: ['80', '90'], Temperature: ['170', '180'] } });
  const model = analyze(data, { terms: parseTerms('quadratic', data.factors) }).model;

  it('a setting at coded 1.4 on an axis is inside; 1.5 is outside, with the extrapolation note', () => {
    expect(model.extent?.[0]).toBeCloseTo(1.414, 3);
    // coded 1.4 of Time 80..90: 85 + 1.4 x 5 = 92 min (by hand)
    const inside = predict(model, { Time: 92, Temperature: 175 });
    expect(inside.outside).toBe(false);
    expect(inside.messages.some((m) => /extrapolation/.test(m))).toBe(false);
    // coded 1.5: 85 + 1.5 x 5 = 92.5 min
    const out = predict(model, { Time: 92.5, Temperature: 175 });
    expect(out.outside).toBe(true);
    expect(out.outsideFactors.map((o) => o.name)).toEqual(['Time']);
  });

  it('a two-level fit of the same runs without the axial pair keeps the factorial box', () => {
    const rows = data.coded.map((c, i) => ({ c, y: data.y[i] })).filter(({ c }) => Math.abs(c[0]) <= 1 + 1e-9 && Math.abs(c[1]) <= 1 + 1e-9);
    const box = analyze({ ...data, coded: rows.map((r) => r.c), y: rows.map((r) => r.y), labels: rows.map((_, i) => String(i + 1)) }, { terms: [1, 2] }).model;
    expect(box.extent).toEqual([1, 1]);
    expect(predict(box, { Time: 92, Temperature: 175 }).outside).toBe(true);
  });
});
