import { describe, expect, it } from 'vitest';
import { analysisText } from '../../../src/cli/report/analysis-text.ts';
import { analyze } from '../../../src/core/fit/analyze.ts';
import { termsUpToOrder } from '../../../src/core/model/formula.ts';
import { curvatureStatement, verdictText } from '../../../src/core/text/verdict-text.ts';
import { fixtureData } from '../../helpers/fixtures.ts';

describe('analysisText: the report says what the core says, in the same words', () => {
  it('curvature and lack of fit of the section 6.8 example (Montgomery 8th ed.): p 0.8137 for both, stated once each', () => {
    const d = fixtureData('montgomery-8e-ex6-6-center-points.csv', { factors: ['Time', 'Temperature'], response: 'Yield' });
    const a = analyze(d);
    const text = analysisText(a);
    const curv = a.verdicts.find((v) => v.kind === 'curvature');
    expect(curv?.kind).toBe('curvature');
    if (curv?.kind === 'curvature') expect(text).toContain(curvatureStatement(curv));
    expect(text).toContain('No clear curvature (p = 0.8137)');
    expect(text).toContain('No clear lack of fit (p = 0.8137)');
    expect(text).toContain('p 0.8137'); // the figures line, in the table format
    for (const w of a.warnings) expect(text).toContain(w);
  });

  it("Lenth's lines for the unreplicated 2^4 (Montgomery 8th ed., Example 6.2), largest effect first", () => {
    const d = fixtureData('montgomery-8e-ex6-2-filtration-2x4.csv', { factors: ['Temperature', 'Pressure', 'Concentration', 'Stirring'], response: 'Filtration rate' });
    const a = analyze(d, { terms: termsUpToOrder(4, 4) });
    const text = analysisText(a);
    expect(text).toContain("Lenth's method over 15 effects (d = 5 df): pseudo standard error 2.625");
    expect(text).toMatch(/beyond the margins: A 21\.63 \(beyond the simultaneous margin\); AC -18\.13/);
    expect(text).toContain(verdictText({ kind: 'no-residual-df' }));
  });

  it('degenerate input: a significant lack of fit is told once, among the notes', () => {
    const d = fixtureData('montgomery-8e-ex6-6-center-points.csv', { factors: ['Time', 'Temperature'], response: 'Yield' });
    // Invented: the center runs moved up by 2, so the first-order model misses them.
    const a = analyze({ ...d, y: d.y.map((v, i) => (i >= 4 ? v + 2 : v)) });
    const lof = a.verdicts.find((v) => v.kind === 'lack-of-fit')!;
    expect(lof).toMatchObject({ outcome: 'significant' });
    const text = analysisText(a);
    expect(text.split(verdictText(lof)).length - 1).toBe(1);
  });
});
