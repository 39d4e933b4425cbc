import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { analyze } from '../../../src/core/fit/analyze.ts';
import { analysisScaleExponent, SCALE_FREE_EXPONENT, scaledByPow2, scaleExponent, timesPow2 } from '../../../src/core/fit/response-scale.ts';
import { defineFactors } from '../../../src/core/factor/factor.ts';
import { termsUpToOrder } from '../../../src/core/model/formula.ts';
import { InputError } from '../../../src/core/errors.ts';
import type { Analysis } from '../../../src/core/fit/analysis.ts';
import type { ResponseData } from '../../../src/core/study/response-data.ts';
import { fixtureData } from '../../helpers/fixtures.ts';

describe('scaleExponent and timesPow2 (IEEE 754 binary64, section 3.4: a power of two changes only the exponent)', () => {
  it('gives the binary exponent of the largest magnitude', () => {
    expect(scaleExponent([1])).toBe(0);
    expect(scaleExponent([-2, 1.5])).toBe(1);
    expect(scaleExponent([0.75])).toBe(-1);
    // 2^1023 is the largest power of two (binary64); 2^-1074 the smallest subnormal.
    expect(scaleExponent([Number.MAX_VALUE])).toBe(1023);
    expect(scaleExponent([2 ** -1074])).toBe(-1074);
    // Just below a power of two, where log2 rounds up (1 - 2^-53 has exponent -1).
    expect(scaleExponent([1 - 2 ** -53])).toBe(-1);
    expect(scaleExponent([2 ** 600 * (1 - 2 ** -53)])).toBe(599);
  });

  it('degenerate input: all zeros or nothing gives 0', () => {
    expect(scaleExponent([0, -0])).toBe(0);
    expect(scaleExponent([])).toBe(0);
  });

  it('scaledByPow2 equals timesPow2 entry by entry, inside binary64\'s normal powers and beyond them (IEEE 754: exact either way)', () => {
    const v = [1.5, -3.25e-200, 7e300, 2 ** -1074, 0];
    for (const e of [0, -5, 1023, -1022, -2046, 1500]) expect(Array.from(scaledByPow2(v, e))).toEqual(v.map((x) => timesPow2(x, e)));
  });
  it('timesPow2 is exact over the whole range, even where 2^e alone would overflow', () => {
    expect(timesPow2(Number.MAX_VALUE, -2046)).toBe(Number.MAX_VALUE / 2 ** 1023 / 2 ** 1023);
    expect(timesPow2(2 ** -1074, 1074)).toBe(1);
    fc.assert(
      fc.property(fc.double({ min: 1, max: 2, maxExcluded: true, noNaN: true }), fc.integer({ min: -1022, max: 1023 }), (m, e) => {
        const x = timesPow2(m, e);
        expect(timesPow2(x, -e)).toBe(m);
        expect(scaleExponent([x])).toBe(e);
      }),
    );
  });
});

function factorsOf(k: number) {
  return defineFactors(Array.from({ length: k }, (_, i) => ({ kind: 'numeric' as const, name: `F${i + 1}`, low: 0, high: 10 })));
}

function fullFactorial(k: number): number[][] {
  return Array.from({ length: 1 << k }, (_, c) => Array.from({ length: k }, (_, f) => ((c >> f) & 1 ? 1 : -1)));
}

/** Replicated or not, with or without center runs, a few runs dropped or not (then the QR path): invented data. */
const experiment = fc
  .record({ k: fc.integer({ min: 2, max: 4 }), r: fc.integer({ min: 1, max: 2 }), c: fc.integer({ min: 0, max: 3 }), drop: fc.integer({ min: 0, max: 2 }) })
  .chain(({ k, r, c, drop }) => {
    const coded = [...Array.from({ length: r }, () => fullFactorial(k)).flat(), ...Array.from({ length: c }, () => Array(k).fill(0))].slice(drop);
    return fc.record({
      k: fc.constant(k),
      coded: fc.constant(coded),
      // Hundredths from -100 to 100: every value times 2^-1000 is still a normal double.
      y: fc.array(fc.integer({ min: -10000, max: 10000 }).map((v) => v / 100), { minLength: coded.length, maxLength: coded.length }),
    });
  })
  .filter(({ y }) => new Set(y).size > 2);

function data(k: number, coded: number[][], y: number[]): ResponseData {
  return { factors: factorsOf(k), response: 'y', coded, y, blocks: null, labels: y.map((_, i) => String(i + 1)), messages: [] };
}

/** Every figure of b is the figure of a times 2^k (in the response's unit), 4^k (sums of squares), or the same (the rest). */
function expectScaled(a: Analysis, b: Analysis, k: number) {
  const s = (x: number | null) => (x === null ? null : timesPow2(x, k));
  const ss = (x: number | null) => {
    if (x === null || x === 0) return x;
    const v = timesPow2(x, 2 * k);
    return Number.isFinite(v) && Math.abs(v) >= 2 ** -1022 ? v : null;
  };
  expect(b.method).toBe(a.method);
  expect(b.intercept.coef).toBe(s(a.intercept.coef));
  b.terms.forEach((t, i) => {
    const u = a.terms[i];
    expect(t.effect).toBe(s(u.effect));
    expect(t.coef).toBe(s(u.coef));
    expect(t.se).toBe(s(u.se));
    expect(t.ci).toEqual(u.ci === null ? null : [s(u.ci[0]), s(u.ci[1])]);
    expect(t.t).toBe(u.t);
    expect(t.p).toBe(u.p);
    expect(t.vif).toBe(u.vif);
  });
  expect(b.sigma).toBe(s(a.sigma));
  expect([b.r2, b.r2adj, b.r2pred]).toEqual([a.r2, a.r2adj, a.r2pred]);
  b.anova.rows.forEach((r, i) => {
    const u = a.anova.rows[i];
    expect([r.source, r.df, r.f, r.p]).toEqual([u.source, u.df, u.f, u.p]);
    expect(r.ss).toBe(ss(u.ss));
    expect(r.ms).toBe(ss(u.ms));
  });
  b.runs.forEach((r, i) => {
    const u = a.runs[i];
    expect([r.y, r.fitted, r.residual]).toEqual([s(u.y), s(u.fitted), s(u.residual)]);
    expect([r.leverage, r.studentized, r.deleted]).toEqual([u.leverage, u.studentized, u.deleted]);
  });
  expect(b.halfNormal.map((p) => p.effect)).toEqual(a.halfNormal.map((p) => s(p.effect)));
  expect(b.halfNormal.map((p) => p.mark)).toEqual(a.halfNormal.map((p) => p.mark));
  expect(b.lenth?.pse ?? null).toBe(s(a.lenth?.pse ?? null));
  expect(b.curvature?.estimate ?? null).toBe(s(a.curvature?.estimate ?? null));
  expect(b.curvature?.p ?? null).toBe(a.curvature?.p ?? null);
  expect(b.verdicts.map((v) => v.kind)).toEqual(a.verdicts.map((v) => v.kind));
  expect(b.boxCox).toEqual(a.boxCox);
  expect(Array.from(b.model.coef)).toEqual(Array.from(a.model.coef, (c) => timesPow2(c, k)));
}

describe('analyze is exact under a power-of-two change of unit, from 1e-300 to 1e300 (fast-check)', () => {
  it('effects, standard errors and intervals of y 2^k are those of y times 2^k; t, F, p, R^2 and the verdicts are unchanged', () => {
    fc.assert(
      fc.property(experiment, fc.integer({ min: -1000, max: 990 }), ({ k, coded, y }, shift) => {
        const terms = termsUpToOrder(k, 2);
        const a = analyze(data(k, coded, y), { terms });
        const b = analyze(data(k, coded, y.map((v) => timesPow2(v, shift))), { terms });
        expectScaled(a, b, shift);
      }),
      { numRuns: 150 },
    );
  }, 60_000); // 150 pairs of analyses: seconds on a busy shared machine

  it('the end points: 2^-1000 (9.3e-302) and 2^990 (1.0e298) (the fixed cases of the property above)', () => {
    const y = [3.1, 4.7, 2.2, 8.9, 5.5, 1.25, 7.75, 6.5];
    const terms = termsUpToOrder(3, 2);
    const a = analyze(data(3, fullFactorial(3), y), { terms });
    for (const shift of [-1000, 990]) expectScaled(a, analyze(data(3, fullFactorial(3), y.map((v) => timesPow2(v, shift))), { terms }), shift);
  });
});

describe('scaling back keeps the shape of the analysis (invented data, fast-check)', () => {
  // The scale-back rebuilds each term and run; an analysis already on scale (largest |y| in [1, 2))
  // is returned as it is, so its keys are the reference: every term (lenthT, estimates and vif
  // included when present) and every run must come back with the same keys in the same order.
  it('terms, runs and the intercept of y 2^k have the keys of those of y, in order', () => {
    fc.assert(
      fc.property(experiment, fc.integer({ min: -1000, max: 990 }).filter((v) => v !== 0), ({ k, coded, y }, shift) => {
        const e = scaleExponent(y);
        const onScale = y.map((v) => timesPow2(v, -e));
        const terms = termsUpToOrder(k, k);
        const a = analyze(data(k, coded, onScale), { terms });
        const b = analyze(data(k, coded, onScale.map((v) => timesPow2(v, shift))), { terms });
        expect(b.terms.map((t) => Object.keys(t))).toEqual(a.terms.map((t) => Object.keys(t)));
        expect(b.runs.map((r) => Object.keys(r))).toEqual(a.runs.map((r) => Object.keys(r)));
        expect(Object.keys(b.intercept)).toEqual(Object.keys(a.intercept));
        expect(b.terms.map((t) => t.lenthT ?? null)).toEqual(a.terms.map((t) => t.lenthT ?? null));
        expect(b.terms.map((t) => t.estimates ?? null)).toEqual(a.terms.map((t) => t.estimates ?? null));
      }),
      { numRuns: 100 },
    );
  }, 60_000);
});

describe('analyze: Montgomery, Design and Analysis of Experiments, 8th ed., Example 6.1 (2^3 plasma etch, n = 2) in units 1e200 and 1e-200 apart', () => {
  const base = fixtureData('montgomery-8e-ex6-1-plasma-etch-2x3.csv', { factors: ['Gap', 'Flow', 'Power'], response: 'Etch rate' });
  const terms = termsUpToOrder(3, 3);
  const a = analyze(base, { terms });
  // Printed (Table 6.5): A = -101.625, B = 7.375, C = 306.125, AB = -24.875, AC = -153.625, BC = -2.125, ABC = 5.625;
  // F_A 18.34, F_C 166.41, F_AC 41.91 (Table 6.6).
  const printed: Record<string, number> = { A: -101.625, B: 7.375, C: 306.125, AB: -24.875, AC: -153.625, BC: -2.125, ABC: 5.625 };
  for (const unit of [1e200, 1e-200]) {
    it(`times ${unit}: the printed effects times ${unit}, the same t, F and p; sums of squares beyond binary64 are null`, () => {
      const b = analyze({ ...base, y: base.y.map((v) => v * unit) }, { terms });
      for (const t of b.terms) {
        expect(t.effect / unit).toBeCloseTo(printed[t.letters], 9);
        const u = a.terms.find((x) => x.term === t.term)!;
        // 1e200 is not a power of two: each reading is rounded once, so t and p agree to about 1e-13 relative.
        expect(Math.abs(t.t! - u.t!)).toBeLessThan(1e-12 * Math.abs(u.t!));
        expect(Math.abs(t.p! - u.p!)).toBeLessThan(1e-10 * u.p! + 1e-300);
      }
      const f = (x: Analysis, s: string) => x.anova.rows.find((r) => r.source === s)!;
      expect(f(b, 'Gap').f).toBeCloseTo(18.34, 2);
      expect(f(b, 'Power').f).toBeCloseTo(166.41, 2);
      expect(f(b, 'Gap:Power').f).toBeCloseTo(41.91, 2);
      // SS_T 531,420.9375 (Table 6.6) times 1e400 or 1e-400: beyond what a double holds.
      expect(f(b, 'Total').ss).toBeNull();
      expect(b.sigma! / unit).toBeCloseTo(Math.sqrt(18020.5 / 8), 8);
      expect(b.warnings).toEqual(a.warnings);
    });
  }

  it('degenerate input: a response equal in every run is refused at any scale, and so is one that is not finite', () => {
    for (const v of [1e-300, 1, 1e300]) {
      expect(() => analyze({ ...base, y: base.y.map(() => v) }, { terms })).toThrow(InputError);
    }
    expect(() => analyze({ ...base, y: base.y.map((v, i) => (i === 0 ? Infinity : v)) }, { terms })).toThrow(/needs a number/);
  });

  it('responses at 1e-300 that differ by 20% are analyzed (issue: tiny responses refused as constant)', () => {
    const y = base.y.map((_, i) => (i % 2 ? 1.2e-300 : 1e-300));
    expect(() => analyze({ ...base, y }, { terms })).not.toThrow();
  });
});

describe('the scale-free window: a response within 2^+-64 of [1, 2) is analysed as it is, and that gives the bits of the scaled analysis (IEEE 754, sections 3.4 and 5.4)', () => {
  it('analysisScaleExponent is 0 inside the window and scaleExponent outside it', () => {
    expect(SCALE_FREE_EXPONENT).toBe(64);
    expect(analysisScaleExponent([100])).toBe(0); // 100 = 1.5625 x 2^6
    expect(analysisScaleExponent([timesPow2(1.5, 64)])).toBe(0);
    expect(analysisScaleExponent([timesPow2(1.5, 65)])).toBe(65);
    expect(analysisScaleExponent([timesPow2(1.5, -64)])).toBe(0);
    expect(analysisScaleExponent([timesPow2(1.5, -65)])).toBe(-65);
  });

  // Montgomery 8th ed., Example 6.1 (2^3 plasma etch, n = 2; Yates' path), the same with its first
  // run lost (QR path), and with one setting logged off its level (the fit on the plan): each
  // analysed as it is (largest |y| about 2^10) against its copies moved just outside the window
  // either way, which are analysed on the scaled response.
  const base = fixtureData('montgomery-8e-ex6-1-plasma-etch-2x3.csv', { factors: ['Gap', 'Flow', 'Power'], response: 'Etch rate' });
  const lost = { ...base, coded: base.coded.slice(1), y: base.y.slice(1), labels: base.labels.slice(1) };
  const off = { ...base, coded: base.coded.map((row, i) => (i === 2 ? [row[0] * 0.97, row[1], row[2]] : row)) };
  const center = { ...base, coded: [...base.coded, [0, 0, 0], [0, 0, 0]], y: [...base.y, 600, 640], labels: [...base.labels, 'c1', 'c2'] };
  const terms = termsUpToOrder(3, 2);
  for (const [name, d] of [['complete, Yates', base], ['with center runs', center], ['a lost run, QR', lost], ['a setting off its level', off]] as const) {
    it(`${name}: shifts that put the response just inside and just outside the window either way scale every figure exactly`, () => {
      const e = scaleExponent(d.y);
      expect(analysisScaleExponent(d.y)).toBe(0);
      const a = analyze(d, { terms });
      for (const shift of [-SCALE_FREE_EXPONENT - e - 1, -SCALE_FREE_EXPONENT - e, SCALE_FREE_EXPONENT - e, SCALE_FREE_EXPONENT - e + 1]) {
        expectScaled(a, analyze({ ...d, y: d.y.map((v) => timesPow2(v, shift)) }, { terms }), shift);
      }
    });
  }
});
