import { describe, expect, it } from 'vitest';
import { modelColumns, modelMatrix } from '../../../src/core/fit/columns.ts';
import { runKinds } from '../../../src/core/fit/curvature.ts';
import { runDiagnostics } from '../../../src/core/fit/diagnostics.ts';
import { fitQr } from '../../../src/core/fit/fit-qr.ts';
import { termsUpToOrder } from '../../../src/core/model/formula.ts';
import { fixtureData } from '../../helpers/fixtures.ts';

const d = fixtureData('montgomery-8e-ex6-6-center-points.csv', { factors: ['Time', 'Temperature'], response: 'Yield' });
const cols = modelColumns([], [1, 2]);
const fit = fitQr(cols, modelMatrix(cols, d.coded, null), d.y);
const mean = d.y.reduce((s, v) => s + v, 0) / d.y.length;
const ssT = d.y.reduce((s, v) => s + (v - mean) ** 2, 0);
const sigma = Math.sqrt(fit.rss / fit.dfResidual);
const diag = runDiagnostics(fit, d.y, d.labels, runKinds(d.factors, d.coded), sigma, ssT);

describe('runDiagnostics', () => {
  it('R^2 and adjusted R^2 by their definitions (Montgomery 8th ed., section 10.3)', () => {
    expect(diag.r2).toBeCloseTo(1 - fit.rss / ssT, 14);
    expect(diag.r2adj!).toBeCloseTo(1 - fit.rss / 6 / (ssT / 8), 14);
    expect(diag.runs.map((r) => r.kind)).toEqual(['factorial', 'factorial', 'factorial', 'factorial', 'center', 'center', 'center', 'center', 'center']);
  });

  it('PRESS: e_i / (1 - h_i) equals the miss of a refit without run i, so predicted R^2 matches nine leave-one-out refits', () => {
    let press = 0;
    for (let i = 0; i < d.y.length; i++) {
      const keep = d.y.map((_, j) => j).filter((j) => j !== i);
      const f = fitQr(cols, modelMatrix(cols, keep.map((j) => d.coded[j]), null), keep.map((j) => d.y[j]));
      const pred = f.coef[0] + f.coef[1] * d.coded[i][0] + f.coef[2] * d.coded[i][1];
      press += (d.y[i] - pred) ** 2;
    }
    expect(diag.r2pred!).toBeCloseTo(1 - press / ssT, 10);
  });

  it('the deleted residual equals the residual over the noise of a refit without the run (Belsley, Kuh and Welsch 1980, Eq. 2.26)', () => {
    const i = 2;
    const keep = d.y.map((_, j) => j).filter((j) => j !== i);
    const f = fitQr(cols, modelMatrix(cols, keep.map((j) => d.coded[j]), null), keep.map((j) => d.y[j]));
    const s = Math.sqrt(f.rss / f.dfResidual);
    const r = diag.runs[i];
    expect(r.deleted!).toBeCloseTo(r.residual / (s * Math.sqrt(1 - r.leverage)), 10);
    expect(r.studentized!).toBeCloseTo(r.residual / (sigma * Math.sqrt(1 - r.leverage)), 12);
  });

  it('degenerate input: a saturated fit (every leverage 1) gives null studentized residuals, adjusted and predicted R^2', () => {
    const f = fixtureData('montgomery-8e-ex6-2-filtration-2x4.csv', { factors: ['Temperature', 'Pressure', 'Concentration', 'Stirring'], response: 'Filtration rate' });
    const all = modelColumns([], termsUpToOrder(4, 4));
    const sat = fitQr(all, modelMatrix(all, f.coded, null), f.y);
    const m = f.y.reduce((s, v) => s + v, 0) / 16;
    const out = runDiagnostics(sat, f.y, f.labels, runKinds(f.factors, f.coded), null, f.y.reduce((s, v) => s + (v - m) ** 2, 0));
    expect(out.runs.every((r) => r.studentized === null && r.deleted === null)).toBe(true);
    expect(out.r2pred).toBeNull();
    expect(out.r2adj).toBeNull();
    expect(out.r2).toBeCloseTo(1, 12);
  });
});
