import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import MLR from 'ml-regression-multivariate-linear';
import { analyze } from '../../../src/core/fit/analyze.ts';
import { defineFactors } from '../../../src/core/factor/factor.ts';
import { termsUpToOrder } from '../../../src/core/model/formula.ts';
import { termValue } from '../../../src/core/model/term.ts';
import type { ResponseData } from '../../../src/core/study/response-data.ts';

function factorsOf(k: number) {
  return defineFactors(Array.from({ length: k }, (_, i) => ({ kind: 'numeric' as const, name: `F${i + 1}`, low: 0, high: 10 })));
}

function fullFactorial(k: number): number[][] {
  return Array.from({ length: 1 << k }, (_, c) => Array.from({ length: k }, (_, f) => ((c >> f) & 1 ? 1 : -1)));
}

function data(k: number, coded: number[][], y: number[]): ResponseData {
  return { factors: factorsOf(k), response: 'y', coded, y, blocks: null, labels: y.map((_, i) => String(i + 1)), messages: [] };
}

/** A complete balanced 2^k with r replicates and c center runs, and a response. */
const balanced = fc
  .record({ k: fc.integer({ min: 2, max: 5 }), r: fc.integer({ min: 1, max: 3 }), c: fc.integer({ min: 0, max: 4 }), order: fc.integer({ min: 1, max: 5 }) })
  .chain(({ k, r, c, order }) => {
    const coded = [...Array.from({ length: r }, () => fullFactorial(k)).flat(), ...Array.from({ length: c }, () => Array(k).fill(0))];
    return fc.record({
      k: fc.constant(k),
      order: fc.constant(Math.min(order, k)),
      coded: fc.constant(coded),
      y: fc.array(fc.double({ min: -100, max: 100, noNaN: true }), { minLength: coded.length, maxLength: coded.length }),
    });
  })
  .filter(({ y }) => Math.max(...y) - Math.min(...y) > 1e-6);

describe('analyze: properties (fast-check)', () => {
  it('the Yates path equals the QR path on complete balanced factorials', () => {
    fc.assert(
      fc.property(balanced, ({ k, order, coded, y }) => {
        const terms = termsUpToOrder(k, order);
        const yates = analyze(data(k, coded, y), { terms });
        const qr = analyze(data(k, coded, y), { terms, forceQr: true });
        expect(yates.method).toBe('yates');
        expect(qr.method).toBe('qr');
        const scale = Math.max(1, ...y.map(Math.abs));
        expect(qr.intercept.coef).toBeCloseTo(yates.intercept.coef, 8);
        yates.terms.forEach((t, i) => {
          expect(Math.abs(qr.terms[i].coef - t.coef)).toBeLessThan(1e-9 * scale);
          if (t.se !== null) expect(Math.abs(qr.terms[i].se! - t.se)).toBeLessThan(1e-9 * scale);
        });
        yates.anova.rows.forEach((r, i) => expect(Math.abs(qr.anova.rows[i].ss! - r.ss!)).toBeLessThan(1e-8 * scale * scale * y.length));
        yates.runs.forEach((r, i) => {
          expect(Math.abs(qr.runs[i].fitted - r.fitted)).toBeLessThan(1e-9 * scale);
          expect(qr.runs[i].leverage).toBeCloseTo(r.leverage, 10);
        });
        // The closed forms of Yates' path (run kinds by cell, the factorial box as tested extent,
        // the settings as their own plan) against the general passes over the settings.
        expect(yates.runs.map((r) => r.kind)).toEqual(qr.runs.map((r) => r.kind));
        expect(yates.model.extent).toEqual(qr.model.extent);
        expect(yates.verdicts.map((v) => v.kind)).toEqual(qr.verdicts.map((v) => v.kind));
      }),
      { numRuns: 150 },
    );
  });

  it('shuffling the runs changes nothing', () => {
    fc.assert(
      fc.property(balanced, fc.integer(), ({ k, coded, y }, seed) => {
        const idx = coded.map((_, i) => i);
        let s = seed >>> 0;
        for (let i = idx.length - 1; i > 0; i--) {
          s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
          const j = s % (i + 1);
          [idx[i], idx[j]] = [idx[j], idx[i]];
        }
        const a = analyze(data(k, coded, y));
        const b = analyze(data(k, idx.map((i) => coded[i]), idx.map((i) => y[i])));
        a.terms.forEach((t, i) => expect(b.terms[i].coef).toBeCloseTo(t.coef, 9));
        expect(b.r2).toBeCloseTo(a.r2, 9);
      }),
      { numRuns: 100 },
    );
  });

  it('adding a constant to the response moves only the intercept', () => {
    fc.assert(
      fc.property(balanced, fc.double({ min: -1000, max: 1000, noNaN: true }), ({ k, coded, y }, shift) => {
        const a = analyze(data(k, coded, y));
        const b = analyze(data(k, coded, y.map((v) => v + shift)));
        expect(b.intercept.coef).toBeCloseTo(a.intercept.coef + shift, 6);
        a.terms.forEach((t, i) => expect(b.terms[i].coef).toBeCloseTo(t.coef, 7));
        const ra = a.anova.rows.find((r) => r.source === 'Residual')!;
        const rb = b.anova.rows.find((r) => r.source === 'Residual')!;
        expect(rb.ss).toBeCloseTo(ra.ss!, 5);
      }),
      { numRuns: 100 },
    );
  });
});

describe('analyze: random non-orthogonal runs against ml-regression-multivariate-linear 2.0.4', () => {
  it('coefficients, standard errors and sigma agree', () => {
    const unbalanced = fc
      .record({ k: fc.integer({ min: 2, max: 4 }), extra: fc.integer({ min: 3, max: 10 }) })
      .chain(({ k, extra }) => {
        const n = (1 << k) + extra;
        return fc.record({
          k: fc.constant(k),
          coded: fc.array(fc.array(fc.integer({ min: -120, max: 120 }).map((v) => v / 100), { minLength: k, maxLength: k }), { minLength: n, maxLength: n }),
          y: fc.array(fc.integer({ min: -5000, max: 5000 }).map((v) => v / 100), { minLength: n, maxLength: n }),
        });
      });
    fc.assert(
      fc.property(unbalanced, ({ k, coded, y }) => {
        const terms = termsUpToOrder(k, 2);
        fc.pre(new Set(y).size > 1 && Array.from({ length: k }, (_, f) => new Set(coded.map((r) => r[f])).size > 1).every(Boolean));
        const a = analyze(data(k, coded, y), { terms });
        fc.pre(a.aliased.length === 0 && a.df.residual > 0);
        const x = coded.map((row) => terms.map((t) => termValue(t, row)));
        const ref = new MLR(x, y.map((v) => [v]), { intercept: true, statistics: true });
        // the reference puts the intercept last
        expect(a.intercept.coef).toBeCloseTo(ref.weights[terms.length][0], 6);
        terms.forEach((_, j) => {
          expect(a.terms[j].coef).toBeCloseTo(ref.weights[j][0], 6);
          expect(a.terms[j].se!).toBeCloseTo(ref.stdErrors[j], 6);
        });
        expect(a.sigma!).toBeCloseTo(ref.stdError, 6);
        expect(a.anovaAdjusted).not.toBeNull();
      }),
      { numRuns: 100 },
    );
  });
});
