import { describe, expect, it } from 'vitest';
import { analysisVerdicts, type VerdictInput } from '../../../src/core/fit/analysis-verdicts.ts';
import { analyze } from '../../../src/core/fit/analyze.ts';
import { LENTH_MIN_CONTRASTS } from '../../../src/core/fit/lenth.ts';
import { isWarning } from '../../../src/core/fit/verdicts.ts';
import { verdictText } from '../../../src/core/text/verdict-text.ts';
import { termsUpToOrder } from '../../../src/core/model/formula.ts';
import { fixtureData } from '../../helpers/fixtures.ts';

const quiet: VerdictInput = {
  alpha: 0.05,
  nearReplicates: 0,
  orthogonal: true,
  curvature: null,
  pureErrorDf: 0,
  lackOfFitP: null,
  lenth: null,
  dfResidual: 4,
  aliased: [],
  aliasedWithInterceptOrBlocks: false,
  terms: [],
};
const curv = { estimate: -0.035, se: 0.139, t: -0.25, p: 0.8137, ss: 0.0027, nFactorial: 4, nCenter: 5 };

describe('analysisVerdicts', () => {
  it('nothing to say for orthogonal runs with residual df and no tests to report (degenerate input)', () => {
    expect(analysisVerdicts(quiet)).toEqual([]);
  });

  it('every verdict, in the order the warnings are read', () => {
    const v = analysisVerdicts({
      ...quiet,
      nearReplicates: 2,
      orthogonal: false,
      curvature: { ...curv, p: 0.001 },
      pureErrorDf: 4,
      lackOfFitP: 0.01,
      lenth: { m: 3, df: 1, pse: 1, me: 12, sme: 36 },
      dfResidual: 0,
      aliased: [{ name: 'Speed:Feed', letters: 'AB', combination: [{ name: 'Depth', letters: 'C', weight: 1 }] }],
      terms: [{ term: 4, name: 'Depth', letters: 'C', coef: 1, se: null, t: null, p: null, ci: null, effect: 2, estimates: 'C + AB' }],
    });
    expect(v.map((x) => x.kind)).toEqual(['near-replicates', 'not-orthogonal', 'curvature', 'lack-of-fit', 'lenth-weak', 'no-residual-df', 'aliased']);
    expect(v.every(isWarning)).toBe(true);
    expect(v[4]).toEqual({ kind: 'lenth-weak', m: 3, advised: LENTH_MIN_CONTRASTS });
    expect(v[6]).toMatchObject({ count: 1, carried: [{ letters: 'C', estimates: 'C + AB' }] });
  });

  it('curvature and lack of fit that are not significant are plain statements, not warnings; p = alpha is not significant (common practice: p < alpha)', () => {
    const v = analysisVerdicts({ ...quiet, curvature: { ...curv, p: 0.05 }, pureErrorDf: 4, lackOfFitP: 0.05 });
    expect(v).toMatchObject([{ kind: 'curvature', outcome: 'flat' }, { kind: 'lack-of-fit', outcome: 'not-significant' }]);
    expect(v.some(isWarning)).toBe(false);
  });

  it('an untestable curvature says why: no repeats, or repeats that agree exactly', () => {
    expect(analysisVerdicts({ ...quiet, curvature: { ...curv, se: null, t: null, p: null } })[0]).toMatchObject({ outcome: 'untestable', reason: 'no-repeats' });
    expect(analysisVerdicts({ ...quiet, curvature: { ...curv, se: 0, t: null, p: null }, pureErrorDf: 4 })[0]).toMatchObject({ outcome: 'untestable', reason: 'no-spread' });
  });

  it("analyze's warnings are its messages, then its warning verdicts in words (the section 6.8 example with five center runs: a flat curvature)", () => {
    const d = fixtureData('montgomery-8e-ex6-6-center-points.csv', { factors: ['Time', 'Temperature'], response: 'Yield' });
    const a = analyze({ ...d, messages: ['1 excluded run skipped'] });
    expect(a.verdicts.find((v) => v.kind === 'curvature')).toMatchObject({ outcome: 'flat', nCenter: 5 });
    expect(a.warnings).toEqual(['1 excluded run skipped', ...a.verdicts.filter(isWarning).map(verdictText)]);
    const f = fixtureData('montgomery-8e-ex6-2-filtration-2x4.csv', { factors: ['Temperature', 'Pressure', 'Concentration', 'Stirring'], response: 'Filtration rate' });
    expect(analyze(f, { terms: termsUpToOrder(4, 4) }).verdicts.map((v) => v.kind)).toEqual(['no-residual-df']);
  });
});
