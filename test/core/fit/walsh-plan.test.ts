import { describe, expect, it } from 'vitest';
import { modelColumns, modelMatrix, type Column } from '../../../src/core/fit/columns.ts';
import { defineFactors } from '../../../src/core/factor/factor.ts';
import { chooseFit } from '../../../src/core/fit/choose-fit.ts';
import { fitOnPlan } from '../../../src/core/fit/fit-on-plan.ts';
import { fitQr } from '../../../src/core/fit/fit-qr.ts';
import { nominalSettings } from '../../../src/core/fit/nominal-settings.ts';
import { saturatedEffects } from '../../../src/core/fit/saturated-effects.ts';
import { walshPlan } from '../../../src/core/fit/walsh-plan.ts';
import { termsUpToOrder } from '../../../src/core/model/formula.ts';
import { compareTerms, squareTerm, termValue } from '../../../src/core/model/term.ts';
import { fixtureData } from '../../helpers/fixtures.ts';

function lcg(seed: number) {
  let s = seed >>> 0;
  return () => (s = (Math.imul(s, 1664525) + 1013904223) >>> 0) / 2 ** 32;
}

/** The 2^k runs in standard order (factor 1 changing fastest, -1 first). */
function full(k: number): number[][] {
  return Array.from({ length: 1 << k }, (_, c) => Array.from({ length: k }, (_, f) => ((c >> f) & 1 ? 1 : -1)));
}

function columnsUpTo(k: number, order: number): Column[] {
  return modelColumns([], termsUpToOrder(k, order).sort(compareTerms));
}

/** The general path: Householder QR of the nominal matrix (fit-qr.ts), as fit-on-plan.ts makes it. */
function byQr(columns: readonly Column[], rows: number[][]) {
  return fitQr(columns, modelMatrix(columns, rows, null), rows.map(() => 0), true);
}

function expectSamePlan(columns: readonly Column[], rows: number[][], k: number): boolean {
  const fast = walshPlan(columns, rows, k);
  if (!fast) return false;
  const qr = byQr(columns, rows);
  expect([...fast.kept]).toEqual([...qr.kept]);
  expect(fast.aliased.map((a) => a.column)).toEqual(qr.aliased.map((a) => a.column));
  fast.aliased.forEach((a, i) => {
    const q = qr.aliased[i].combination;
    expect(a.combination.map((w) => w.column)).toEqual(q.map((w) => w.column));
    a.combination.forEach((w, j) => expect(w.weight).toBeCloseTo(q[j].weight, 10));
  });
  return true;
}

describe('walshPlan', () => {
  it("the module's example: the 2^3 less (+1, +1, +1) keeps I..BC and ABC = -(I + A + B + C + AB + AC + BC) on the seven runs, as QR finds", () => {
    const rows = full(3).filter((r) => !r.every((v) => v === 1));
    const cols = columnsUpTo(3, 3);
    const plan = walshPlan(cols, rows, 3)!;
    expect([...plan.kept]).toEqual([0, 1, 2, 3, 4, 5, 6]);
    expect(plan.aliased).toHaveLength(1);
    expect(plan.aliased[0].column).toBe(7);
    expect(plan.aliased[0].combination.map((w) => w.column)).toEqual([0, 1, 2, 3, 4, 5, 6]);
    for (const w of plan.aliased[0].combination) expect(w.weight).toBeCloseTo(-1, 12);
    // Direct check on the runs: the ABC column equals the combination.
    for (const r of rows) expect(termValue(0b111, r)).toBe(-(1 + r[0] + r[1] + r[2] + r[0] * r[1] + r[0] * r[2] + r[1] * r[2]));
    expect(expectSamePlan(cols, rows, 3)).toBe(true);
  });

  it('the 2^4 filtration runs (Montgomery 8th ed., Example 6.2) less any one or two runs: the same kept columns and chains as QR of the nominal matrix', () => {
    const d = fixtureData('montgomery-8e-ex6-2-filtration-2x4.csv', { factors: ['Temperature', 'Pressure', 'Concentration', 'Stirring'], response: 'Filtration rate' });
    const rows = d.coded.map((r) => [...r]);
    let used = 0;
    for (let a = 0; a < 16; a++) {
      for (let b = a; b < 16; b++) {
        const kept = rows.filter((_, i) => i !== a && i !== b);
        for (const order of [2, 3, 4]) if (expectSamePlan(columnsUpTo(4, order), kept, 4)) used++;
      }
    }
    expect(used).toBe(136 * 3);
  });

  it('floor-like plans (random 2^k less up to 12 runs, random model order): whenever it answers, the same as QR; it answers for most', () => {
    const r = lcg(7);
    let used = 0;
    const cases = 300;
    for (let c = 0; c < cases; c++) {
      const k = 2 + Math.floor(r() * 5);
      const n = 1 << k;
      const drop = Math.min(12, Math.floor(r() * (n / 2)));
      const gone = new Set<number>();
      while (gone.size < drop) gone.add(Math.floor(r() * n));
      const rows = full(k).filter((_, i) => !gone.has(i));
      const order = 1 + Math.floor(r() * k);
      if (expectSamePlan(columnsUpTo(k, order), rows, k)) used++;
    }
    expect(used).toBeGreaterThan(cases * 0.8);
  });

  it('declines what it is not made for: a center run, a repeated run, a setting off +-1, a square, a block column, a half fraction', () => {
    const rows = full(3).slice(1);
    const cols = columnsUpTo(3, 2);
    expect(walshPlan(cols, rows, 3)).not.toBeNull();
    expect(walshPlan(cols, [...rows, [0, 0, 0]], 3)).toBeNull();
    expect(walshPlan(cols, [...rows.slice(1), rows[1]], 3)).toBeNull();
    expect(walshPlan(cols, [[0.98, -1, -1], ...rows.slice(1)], 3)).toBeNull();
    expect(walshPlan(modelColumns([], [1, 2, squareTerm(0)]), rows, 3)).toBeNull();
    expect(walshPlan(modelColumns([1, 2], [1, 2, 4]), rows, 3)).toBeNull();
    expect(walshPlan(cols, full(3).filter((r) => r[0] * r[1] * r[2] === 1), 3)).toBeNull();
  });

  it('floor-like data (2^5 less two runs, settings off target by up to 0.05): the model fit and the saturated effects equal those of the general path', () => {
    const r = lcg(11);
    const k = 5;
    const nominal = full(k).filter((_, i) => i !== 6 && i !== 21);
    const coded = nominal.map((row) => row.map((v) => v + (r() - 0.5) * 0.1));
    const y = coded.map((x) => 20 + 3 * x[0] - 2 * x[1] + x[0] * x[2] + (r() - 0.5));
    const factors = defineFactors(['Temperature', 'Pressure', 'Flow', 'Speed', 'Time'].map((name) => ({ kind: 'numeric' as const, name, low: 100, high: 200 })));
    const data = { factors, response: 'y', coded, y, blocks: null, labels: coded.map((_, i) => String(i + 1)), messages: [] };
    const choice = chooseFit(data, { terms: termsUpToOrder(k, 3) });
    // Both the model's plan and the saturated set's are of the kind walsh-plan.ts answers for.
    expect(walshPlan(choice.fit.columns, nominal, k)).not.toBeNull();
    expect(walshPlan(columnsUpTo(k, 4), nominal, k)).not.toBeNull();
    expect(nominalSettings(coded).nominal).toEqual(nominal);
    const general = fitOnPlan(choice.fit.columns, modelMatrix(choice.fit.columns, nominal, null), modelMatrix(choice.fit.columns, coded, null), y);
    expect([...choice.fit.kept]).toEqual([...general.kept]);
    expect(choice.fit.aliased.map((a) => a.column)).toEqual(general.aliased.map((a) => a.column));
    choice.fit.coef.forEach((b, i) => expect(b).toBeCloseTo(general.coef[i], 12));
    expect(choice.fit.rss).toBeCloseTo(general.rss, 12);

    // Saturated set: every product up to order 4 (enough to use up the 30 runs), by QR on the nominal runs, then on the actual ones.
    const sat = saturatedEffects(k, nominal, y, null, coded);
    const cols = columnsUpTo(k, 4);
    const plan = byQr(cols, nominal);
    expect(plan.kept.length).toBe(nominal.length);
    const keptCols = Array.from(plan.kept, (j) => cols[j]);
    const act = fitQr(keptCols, modelMatrix(keptCols, coded, null), y, true);
    const expected = keptCols.flatMap((c, j) => (c.kind === 'term' ? [{ term: c.term, effect: 2 * act.coef[j] }] : []));
    expect(sat.map((s) => s.term)).toEqual(expected.map((e) => e.term));
    sat.forEach((s, i) => expect(s.effect).toBeCloseTo(expected[i].effect, 10));
  });
});
