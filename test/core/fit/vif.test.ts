import MLR from 'ml-regression-multivariate-linear';
import { describe, expect, it } from 'vitest';
import { analyze } from '../../../src/core/fit/analyze.ts';
import { modelColumns, modelMatrix } from '../../../src/core/fit/columns.ts';
import { fitQr } from '../../../src/core/fit/fit-qr.ts';
import { columnVifs, VIF_LIMIT, vifDrivers } from '../../../src/core/fit/vif.ts';
import { verdictText } from '../../../src/core/text/verdict-text.ts';
import { laserData } from '../../helpers/half-fraction.ts';

/** VIF by its definition, 1 / (1 - R^2) of column j on the others and an intercept, with a reference regression library. */
function referenceVif(x: number[][], j: number): number {
  const others = x.map((r) => r.filter((_, c) => c !== j));
  const target = x.map((r) => [r[j]]);
  const ref = new MLR(others, target, { intercept: true });
  const pred = ref.predict(others) as number[][];
  const mean = target.reduce((s, r) => s + r[0], 0) / target.length;
  const sse = target.reduce((s, r, i) => s + (r[0] - pred[i][0]) ** 2, 0);
  const sst = target.reduce((s, r) => s + (r[0] - mean) ** 2, 0);
  return 1 / (sse / sst); // 1 / (1 - R^2)
}

describe('columnVifs (Montgomery, Peck and Vining, 5th ed., section 9.4)', () => {
  it('on runs with off-target settings, each VIF matches 1 / (1 - R^2) from ml-regression-multivariate-linear', () => {
    const d = laserData(0.3); // Power far off its level in run 2, a genuinely different point
    const terms = [1, 2, 4, 8, 3, 5, 9];
    const cols = modelColumns([], terms);
    const fit = fitQr(cols, modelMatrix(cols, d.coded, null), d.y);
    const v = columnVifs(fit, d.coded, null);
    expect(v[0]).toBeNull(); // the intercept
    const x = d.coded.map((r) => terms.map((t) => [0, 1, 2, 3].reduce((p, f) => (t & (1 << f) ? p * r[f] : p), 1)));
    terms.forEach((_, j) => expect(v[j + 1]!).toBeCloseTo(referenceVif(x, j), 8));
  });
  it('an orthogonal design gives VIF 1 for every term (Montgomery, Peck and Vining: orthogonal regressors)', () => {
    const d = laserData();
    const a = analyze(d, { terms: [1, 2, 4, 8, 3, 5, 9] });
    a.terms.forEach((t) => expect(t.vif!).toBeCloseTo(1, 10));
  });
  it('a term above the limit is named with the runs that drive it, in words', () => {
    // run 2 at 0.2 instead of 1 (far off): the default model can now separate AD from BC, barely
    const a = analyze(laserData(0.2));
    const high = a.terms.filter((t) => (t.vif ?? 0) > VIF_LIMIT);
    expect(high.length).toBeGreaterThan(0);
    const v = a.verdicts.find((x) => x.kind === 'collinear');
    expect(v).toBeDefined();
    if (v?.kind !== 'collinear') return;
    // the runs named are those whose removal lowers that VIF most, checked with the reference definition
    const d = laserData(0.2);
    const terms = a.terms.map((t) => t.term);
    const j = terms.indexOf(high[0].term);
    const x = d.coded.map((r) => terms.map((t) => [0, 1, 2, 3].reduce((p, f) => (t & (1 << f) ? p * r[f] : p), 1)));
    const full = referenceVif(x, j);
    expect(high[0].vif!).toBeCloseTo(full, 8);
    const without = v.terms[0].runs.map((label) => referenceVif(x.filter((_, i) => d.labels[i] !== label), j));
    without.forEach((w, i) => {
      expect(w).toBeLessThan(full);
      if (i > 0) expect(w).toBeGreaterThanOrEqual(without[i - 1] - 1e-9);
    });
    expect(v.terms[0].runs.length).toBeGreaterThan(0);
    expect(verdictText(v)).toMatch(/variance inflation factor .* above 10/);
    expect(a.warnings.join(' ')).toMatch(/check (its|their) logged settings/);
  });
  it('degenerate input: a constant column has no VIF; no runs named when none lowers it', () => {
    const cols = modelColumns([], [1, 2]);
    const coded = [[1, 1], [1, -1], [1, 1], [1, -1]];
    const y = [1, 2, 3, 5];
    const fit = fitQr(cols, modelMatrix(cols, coded, null), y);
    // A is constant: QR drops it as a copy of the intercept, B remains with VIF 1
    expect(columnVifs(fit, coded, null).slice(1)).toEqual([1]);
    expect(vifDrivers(cols, [[1, 1], [-1, -1], [1, -1], [-1, 1]], null, y, 1, ['1', '2', '3', '4'])).toEqual([]);
  });
});

describe('columnVifs found again from a kept factorisation', () => {
  it('gives the reference VIFs again for another response on the same runs, and follows a changed (X\'X)^-1', () => {
    // Floor-like runs: a 2^3 with two settings off target and one lost run (invented), terms A, B, C, AB.
    const coded = [[-1, -1, -1], [1, -1, -1], [-1, 1, -1], [1, 1, -1], [-1, -1, 1], [0.8, -1, 1], [-1, 1, 1.1]];
    const cols = modelColumns([], [1, 2, 4, 3]);
    const x = coded.map((r) => [r[0], r[1], r[2], r[0] * r[1]]);
    const first = columnVifs(fitQr(cols, modelMatrix(cols, coded, null), [1, 2, 3, 4, 5, 6, 7]), coded, null);
    const fit2 = fitQr(cols, modelMatrix(cols, coded, null), [7, 1, 6, 2, 5, 3, 4]);
    const again = columnVifs(fit2, coded, null);
    expect(again).toEqual(first);
    for (let j = 0; j < 4; j++) expect(again[j + 1]!).toBeCloseTo(referenceVif(x, j), 8);
    // A fit on the same factorisation whose (X'X)^-1 diagonal differs is worked out afresh, not recalled.
    const cov = fit2.covUnscaled.slice();
    cov[2 * 5 + 2] *= 2;
    expect(columnVifs({ ...fit2, covUnscaled: cov }, coded, null)[2]).toBeCloseTo(2 * again[2]!, 12);
  });
});
