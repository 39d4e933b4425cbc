// References: Cohen, Statistical Power Analysis for the Behavioral Sciences, 2nd ed. (1988),
// Tables 2.3.5 and 2.4.1 (two-sample t test, two-sided 0.05), values as reprinted in teaching
// material (see test/core/dist/noncentral-t.test.ts); jstat 1.9.6 (noncentral t and t quantile)
// for the power formula; ml-regression-multivariate-linear 2.0.4 for the coefficients' standard
// errors sigma sqrt([(X'X)^-1]_jj) of non-orthogonal and blocked models.
import { describe, expect, it } from 'vitest';
import jStat from 'jstat';
import MLR from 'ml-regression-multivariate-linear';
import { InputError } from '../../../src/core/errors.ts';
import { buildDesign, type DesignSpec } from '../../../src/core/design/build-design.ts';
import type { Design } from '../../../src/core/design/design.ts';
import { blockLevels, modelColumns, modelMatrix } from '../../../src/core/fit/columns.ts';
import { defaultPowerTerms, planPower } from '../../../src/core/plan/power.ts';
import type { Term } from '../../../src/core/model/term.ts';
import { mask } from '../design/helpers.ts';

const numeric = (k: number) => Array.from({ length: k }, (_, i) => ({ kind: 'numeric' as const, name: `X${i + 1}`, low: 0, high: 10 }));
const plan = (spec: Omit<DesignSpec, 'factors'> & { k: number }): Design => buildDesign({ factors: numeric(spec.k), seed: 3, ...spec });

/** Power by the formula with jstat's distributions (an independent evaluation). */
function jstatPower(effect: number, sigma: number, se: number, df: number, level = 0.05): number {
  const c = jStat.studentt.inv(1 - level / 2, df);
  const ncp = effect / 2 / se;
  return 1 - jStat.noncentralt.cdf(c, df, ncp) + jStat.noncentralt.cdf(-c, df, ncp);
}

/**
 * sigma sqrt([(X'X)^-1]_jj) of each model term by ml-regression-multivariate-linear: its stdErrors
 * are s sqrt([(X'X)^-1]_jj) with s its residual standard error, so the ratio is sqrt(c_jj). The
 * intercept is the library's; blocks enter as effect-coded columns as in the analysis.
 */
function referenceCjj(d: Design, terms: readonly Term[]): number[] {
  const blocks = d.runs.map((r) => r.block);
  const levels = blockLevels(blocks);
  const cols = modelColumns(levels, terms).slice(1); // the library adds the intercept
  const n = d.runs.length;
  const x = modelMatrix(cols, d.runs.map((r) => r.coded), levels.length > 1 ? blocks : null);
  const rows = d.runs.map((_, i) => cols.map((__, j) => x[j * n + i]));
  // Any response with residual spread will do; the ratio does not depend on it.
  const y = d.runs.map((_, i) => [Math.sin(1.7 * i) + 0.3 * Math.cos(5.1 * i * i)]);
  const m = new MLR(rows, y, { intercept: true, statistics: true });
  const offset = cols.length - terms.length;
  return terms.map((_, j) => (m.stdErrors[offset + j] / m.stdError) ** 2);
}

describe('planPower', () => {
  it('gives sigma / sqrt(Nf) for a balanced column with center runs, and the power formula with jstat', () => {
    // 2^3 with 4 center runs, 12 runs, main effects only: Nf = 8, df = 12 - 4 = 8.
    const d = plan({ k: 3, centerRuns: 4 });
    const p = planPower(d, { effect: 2, sigma: 1, terms: [mask('A'), mask('B'), mask('C')] });
    expect(p.residualDf).toBe(8);
    expect(p.standardError).toBeCloseTo(2 / Math.sqrt(8), 14); // twice the coefficient's sigma / sqrt(Nf)
    expect(p.power!).toBeCloseTo(jstatPower(2, 1, 1 / Math.sqrt(8), 8), 6);
    expect(p.significance).toBe(0.05);
    expect(p.target).toBe(0.8);
  });

  it('reproduces Cohen (1988) through the two-sample t test: A alone on a replicated 2^2', () => {
    // With the model A only, r copies of a 2^2 are two groups of n = 2r runs: the effect's
    // standard error is sigma sqrt(2/n) and df = 2n - 2, the two-sample t test exactly.
    const base = plan({ k: 2 });
    const a = { terms: [mask('A')] };
    // Table 2.4.1: d = 0.5 needs n = 64 per group (r = 32), d = 0.8 needs 26 (r = 13).
    expect(planPower(base, { effect: 0.5, sigma: 1, ...a }).replicatesNeeded).toBe(32);
    expect(planPower(base, { effect: 0.8, sigma: 1, ...a }).replicatesNeeded).toBe(13);
    // Table 2.3.5: d = 0.5 with n = 80 per group (r = 40, 160 runs) has power .88.
    const p = planPower(plan({ k: 2, replicates: 40 }), { effect: 0.5, sigma: 1, ...a });
    expect(p.residualDf).toBe(158);
    expect(Math.abs(p.power! - 0.88)).toBeLessThanOrEqual(0.015);
  });

  it('finds the smallest effect at the target power (the power there equals the target, by jstat)', () => {
    const d = plan({ k: 4, fraction: '1/2', centerRuns: 3 });
    const p = planPower(d, { effect: 1, sigma: 0.8, power: 0.9, significance: 0.1 });
    const se = p.standardError / 2;
    expect(jstatPower(p.smallestEffect!, 0.8, se, p.residualDf, 0.1)).toBeCloseTo(0.9, 6);
    expect(planPower(d, { effect: p.smallestEffect!, sigma: 0.8, power: 0.9, significance: 0.1 }).power!).toBeCloseTo(0.9, 8);
  });

  it('counts replicates as copies of the plan: the closed form equals building the replicated plan', () => {
    for (const spec of [{ k: 3, centerRuns: 2 }, { k: 4, blocks: 2 }, { k: 5, fraction: '1/2' }, { k: 7, plackettBurman: 12, centerRuns: 1 }]) {
      const one = planPower(plan(spec), { effect: 1.2, sigma: 1 });
      expect(one.replicatesNeeded).not.toBeNull();
      const r = one.replicatesNeeded!;
      const at = planPower(plan({ ...spec, replicates: r }), { effect: 1.2, sigma: 1 });
      expect(at.power!).toBeGreaterThanOrEqual(0.8);
      expect(at.residualDf).toBe(referenceDf(plan({ ...spec, replicates: r }), at.terms));
      if (r > 1) {
        const fewer = planPower(plan({ ...spec, replicates: r - 1 }), { effect: 1.2, sigma: 1 });
        expect(fewer.power === null || fewer.power < 0.8).toBe(true);
      }
    }
  });

  it('matches the reference standard errors for blocked and non-orthogonal models', () => {
    // Blocked 2^4 in 2 blocks, 2 replicates (4 blocks): ABCD is confounded with blocks.
    const blocked = plan({ k: 4, blocks: 2, replicates: 2, centerRuns: 2 });
    const p1 = planPower(blocked, { effect: 1, sigma: 1 });
    expect(p1.standardError).toBeCloseTo(2 * Math.sqrt(Math.max(...referenceCjj(blocked, p1.terms).slice(0, 4))), 10);
    // 12-run Plackett-Burman with 5 factors and two interactions: partly aliased, not orthogonal.
    const pb = plan({ k: 5, plackettBurman: 12 });
    const terms = [mask('A'), mask('B'), mask('C'), mask('D'), mask('E'), mask('AB'), mask('CD')];
    const p2 = planPower(pb, { effect: 1, sigma: 1, terms });
    const ref = referenceCjj(pb, terms).slice(0, 5);
    expect(p2.standardError).toBeCloseTo(2 * Math.sqrt(Math.max(...ref)), 10);
    expect(Math.max(...ref)).toBeGreaterThan(1 / 12 + 1e-6); // the interactions cost precision
    expect(p2.mainEffect).toBe([mask('A'), mask('B'), mask('C'), mask('D'), mask('E')][ref.indexOf(Math.max(...ref))]);
  });

  it('says no test is possible when the model leaves no residual degrees of freedom', () => {
    // 2^(4-1) with the default model: 4 main effects + AB, AC, AD = 7 terms in 8 runs.
    const d = plan({ k: 4, fraction: '1/2' });
    const p = planPower(d, { effect: 2, sigma: 1 });
    expect(p.terms.length).toBe(7);
    expect(p.residualDf).toBe(0);
    expect(p.power).toBeNull();
    expect(p.smallestEffect).toBeNull();
    expect(p.replicatesNeeded).toBeGreaterThanOrEqual(2);
  });

  it('uses main effects and the estimable two-factor interactions by default; main effects for Plackett-Burman', () => {
    expect(defaultPowerTerms(plan({ k: 4, fraction: '1/2' }))).toEqual([mask('A'), mask('B'), mask('C'), mask('D'), mask('AB'), mask('AC'), mask('AD')]);
    expect(defaultPowerTerms(plan({ k: 3, fraction: undefined }))).toHaveLength(6);
    // 2^(3-1), I = ABC: every interaction repeats a main effect.
    expect(defaultPowerTerms(plan({ k: 3, generators: ['C=AB'] }))).toEqual([mask('A'), mask('B'), mask('C')]);
    const pb = planPower(plan({ k: 7, plackettBurman: 12 }), { effect: 3, sigma: 1 });
    expect(pb.terms).toHaveLength(7);
    expect(pb.residualDf).toBe(4);
    expect(pb.standardError).toBeCloseTo(2 / Math.sqrt(12), 14);
  });

  it('says when the run limit is reached before the target', () => {
    const p = planPower(plan({ k: 3 }), { effect: 0.01, sigma: 5 });
    expect(p.replicatesNeeded).toBeNull();
  });

  it('refuses bad input with what was needed and what came', () => {
    const d = plan({ k: 3 });
    expect(() => planPower(d, { effect: 0, sigma: 1 })).toThrow(/The effect to detect must be a number greater than 0, got 0/);
    expect(() => planPower(d, { effect: 1, sigma: -1 })).toThrow(/sigma\) must be a number greater than 0, got -1/);
    expect(() => planPower(d, { effect: NaN, sigma: 1 })).toThrow(InputError);
    expect(() => planPower(d, { effect: 1, sigma: 1, significance: 1 })).toThrow(/significance level must be a probability between 0 and 1 .* got 1/);
    expect(() => planPower(d, { effect: 1, sigma: 1, power: 0.04 })).toThrow(/target power must be above the significance level/);
    expect(() => planPower(d, { effect: 1, sigma: 1, terms: [mask('AB')] })).toThrow(/at least one main effect/);
    expect(() => planPower(d, { effect: 1, sigma: 1, terms: [mask('D')] })).toThrow(/made of the plan's 3 factors/);
    const half = plan({ k: 3, generators: ['C=AB'] });
    expect(() => planPower(half, { effect: 1, sigma: 1, terms: [mask('A'), mask('B'), mask('C'), mask('AB')] })).toThrow(/cannot separate AB from the blocks or the other terms/);
  });
});

/** Residual df n - rank by the reference fit's design (intercept, blocks, terms). */
function referenceDf(d: Design, terms: readonly Term[]): number {
  const levels = blockLevels(d.runs.map((r) => r.block));
  return d.runs.length - modelColumns(levels, terms).length;
}
