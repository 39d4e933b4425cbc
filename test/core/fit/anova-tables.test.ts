import { describe, expect, it } from 'vitest';
import jStat from 'jstat';
import { anovaTables } from '../../../src/core/fit/anova-tables.ts';
import { chooseFit } from '../../../src/core/fit/choose-fit.ts';
import { estimateTerms } from '../../../src/core/fit/estimate-terms.ts';
import { findRepeats } from '../../../src/core/fit/repeats.ts';
import { parseTerms, termsUpToOrder } from '../../../src/core/model/formula.ts';
import type { ResponseData } from '../../../src/core/study/response-data.ts';
import { fixtureData } from '../../helpers/fixtures.ts';

function tables(d: ResponseData, terms?: number[]) {
  const c = chooseFit(d, terms ? { terms } : {});
  const e = estimateTerms(c.fit, d.factors, c.blockLevels, 0.05);
  const r = findRepeats({ coded: d.coded, y: d.y, points: d.points, blocks: c.blocks, cells: c.cells, k: d.factors.length });
  return anovaTables(c.fit, d.y, e.labels, e.terms.map((t) => t.p), r.pure);
}
const row = (t: ReturnType<typeof tables>, source: string) => t.anova.rows.find((r) => r.source === source)!;

describe('anovaTables', () => {
  it('the 2^2 yield example (Montgomery 8th ed., Table 6.2): SS_A 208.33, SS_B 75.00, SS_AB 8.33, SS_E 31.33 on 8 df, SS_T 323.00', () => {
    const d = fixtureData('montgomery-8e-ex6-1-yield-2x2.csv', { factors: ['Concentration', 'Catalyst'], response: 'Yield' });
    const t = tables(d);
    expect(t.anova.type).toBe('sequential');
    expect(row(t, 'Concentration').ss).toBeCloseTo(625 / 3, 10);
    expect(row(t, 'Catalyst').ss).toBeCloseTo(75, 10);
    expect(row(t, 'Residual').ss).toBeCloseTo(94 / 3, 10);
    expect(row(t, 'Total').ss).toBeCloseTo(323, 10);
    expect(row(t, 'Model')).toMatchObject({ df: 3 });
    expect(row(t, 'Model').ss).toBeCloseTo(625 / 3 + 75 + 25 / 3, 10);
    // The model row's F on (3, 8) df, p from jstat.
    expect(row(t, 'Model').p!).toBeCloseTo(1 - jStat.centralF.cdf(row(t, 'Model').f!, 3, 8), 9);
    expect(t.anovaAdjusted).toBeNull();
    expect(t.dfLackOfFit).toBe(0); // the model is saturated in the cells: no lack-of-fit row
    expect(t.anova.rows.some((r) => r.source === 'Lack of fit')).toBe(false);
    expect(t.lackOfFitP).toBeNull();
  });

  it('lack of fit against pure error: the one-df lack of fit of the section 6.8 example is its curvature, 0.0027 (Montgomery 8th ed.)', () => {
    const d = fixtureData('montgomery-8e-ex6-6-center-points.csv', { factors: ['Time', 'Temperature'], response: 'Yield' });
    const t = tables(d);
    expect(row(t, 'Lack of fit').df).toBe(1);
    expect(row(t, 'Lack of fit').ss).toBeCloseTo((4 * 5 * 0.035 ** 2) / 9, 10);
    expect(row(t, 'Pure error').ms).toBeCloseTo(0.043, 10);
    expect(t.lackOfFitP).toBeCloseTo(1 - jStat.centralF.cdf(row(t, 'Lack of fit').ss! / 0.043, 1, 4), 9);
  });

  it('with a missing run the columns are not orthogonal: an adjusted table, whose term SS is b^2 / (X\'X)^-1_jj, and both tables end alike', () => {
    const d = fixtureData('montgomery-8e-ex6-1-plasma-etch-2x3.csv', { factors: ['Gap', 'Flow', 'Power'], response: 'Etch rate' });
    const cut = { ...d, coded: d.coded.slice(1), y: d.y.slice(1), labels: d.labels.slice(1) };
    const t = tables(cut, parseTerms('A + B + C', d.factors));
    expect(t.anovaAdjusted).not.toBeNull();
    expect(t.anovaAdjusted!.type).toBe('adjusted');
    const seq = t.anova.rows.slice(-3);
    expect(t.anovaAdjusted!.rows.slice(-3)).toEqual(seq);
    // Sequential SS of the terms add up to the model SS; adjusted ones in general do not.
    const terms = t.anova.rows.filter((r) => ['Gap', 'Flow', 'Power'].includes(r.source));
    expect(terms.reduce((s, r) => s + r.ss!, 0)).toBeCloseTo(row(t, 'Model').ss!, 8);
  });

  it('degenerate input: no residual df leaves every F and p null', () => {
    const d = fixtureData('montgomery-8e-ex6-2-filtration-2x4.csv', { factors: ['Temperature', 'Pressure', 'Concentration', 'Stirring'], response: 'Filtration rate' });
    const t = tables(d, termsUpToOrder(4, 4));
    expect(t.anova.rows.every((r) => r.f === null && r.p === null)).toBe(true);
    expect(row(t, 'Residual').df).toBe(0);
    expect(row(t, 'Total').ss).toBeCloseTo(5730.9375, 8); // sum of the printed effects' SS (Table 6.11), by hand
  });
});
