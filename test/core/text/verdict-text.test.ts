import { describe, expect, it } from 'vitest';
import type { CurvatureVerdict, Verdict, VerdictKind } from '../../../src/core/fit/verdicts.ts';
import { curvatureNote, curvatureStatement, lenthStatement, verdictText } from '../../../src/core/text/verdict-text.ts';
import { sourceFiles, withoutComments } from '../../helpers/source-files.ts';

const flat: CurvatureVerdict = { kind: 'curvature', outcome: 'flat', reason: null, p: 0.8137, alpha: 0.05, estimate: -0.035, nCenter: 5, nFactorial: 4 };

/** One sample of every verdict kind, with fragments its sentence must hold (and nothing outside the text module may). */
const samples: Record<VerdictKind, { verdict: Verdict; fragments: string[] }[]> = {
  'near-replicates': [{ verdict: { kind: 'near-replicates', groups: 8 }, fragments: ['in 8 of them the actual settings differ slightly', 'the residual sum of squares may then fall below pure error'] }],
  'off-levels': [
    { verdict: { kind: 'off-levels', runs: 2, planned: false }, fragments: ['2 runs have settings more than 0.1 coded from every level'] },
    { verdict: { kind: 'off-levels', runs: 1, planned: true }, fragments: ['1 run has a setting more than 0.1 coded from the planned level'] },
  ],
  collinear: [
    {
      verdict: { kind: 'collinear', limit: 10, terms: [{ letters: 'AD + BC', vif: 66.8, runs: ['7', '4', '6'] }] },
      fragments: ['The estimate for AD + BC is unsteady', 'variance inflation factor 66.8, above 10', 'Runs 7, 4 and 6 do most to cause it'],
    },
    { verdict: { kind: 'collinear', limit: 10, terms: [{ letters: 'B', vif: 12, runs: ['3'] }] }, fragments: ['Run 3 does most to cause it: check its logged settings'] },
  ],
  'not-orthogonal': [{ verdict: { kind: 'not-orthogonal' }, fragments: ['sequential sums of squares depend on the order of terms'] }],
  curvature: [
    { verdict: { ...flat, outcome: 'curved', p: 0.0021 }, fragments: ['Curvature is significant (p = 0.0021)', 'Add axial runs for a second-order design'] },
    { verdict: flat, fragments: ['No clear curvature (p = 0.8137)', 'center runs agree with the factorial average'] },
    { verdict: { ...flat, outcome: 'untestable', reason: 'no-repeats', p: null }, fragments: ['The curvature test needs repeated runs'] },
    { verdict: { ...flat, outcome: 'untestable', reason: 'no-spread', p: null }, fragments: ['the repeated runs agree exactly, so pure error is zero'] },
  ],
  'lack-of-fit': [
    { verdict: { kind: 'lack-of-fit', outcome: 'significant', p: 0.01, alpha: 0.05 }, fragments: ['Lack of fit is significant (p = 0.0100)'] },
    { verdict: { kind: 'lack-of-fit', outcome: 'not-significant', p: 0.8137, alpha: 0.05 }, fragments: ['No clear lack of fit'] },
  ],
  'lenth-weak': [{ verdict: { kind: 'lenth-weak', m: 3, advised: 7 }, fragments: ['has only 3 effects to work from (7 or more are advised)'] }],
  'no-residual-df': [
    { verdict: { kind: 'no-residual-df' }, fragments: ['so standard errors, t and p are not available', "use Lenth's method"] },
    { verdict: { kind: 'no-residual-df', secondOrder: true }, fragments: ['so standard errors, t and p are not available', 'fit fewer terms or add runs'] },
  ],
  squares: [
    {
      // p-values invented for the wording only
      verdict: { kind: 'squares', alpha: 0.05, terms: [{ name: 'Time^2', letters: 'A^2', p: 0.0008 }, { name: 'Temperature^2', letters: 'B^2', p: 0.2 }] },
      fragments: ["The model's squares test the bend along each factor: Time^2 (A^2) p = 0.0008 and Temperature^2 (B^2) p = 0.2000", "the squares' columns overlap with the intercept"],
    },
  ],
  'partial-aliasing': [
    // 1/3 is the largest correlation of a 12-run design (Lin and Draper 1992, from memory).
    { verdict: { kind: 'partial-aliasing', runs: 12, largestCorrelation: 1 / 3 }, fragments: ['This is a 12-run Plackett-Burman screening design', 'partly mixed with two-factor interactions (correlations up to 1/3)'] },
  ],
  aliased: [
    {
      verdict: { kind: 'aliased', count: 1, carried: [{ letters: 'C', estimates: 'C + AB' }], withInterceptOrBlocks: false },
      fragments: ['1 model term cannot be separated from others with these runs', 'the estimate shown for C is of C + AB'],
    },
  ],
};

describe('verdictText: one sentence per verdict', () => {
  for (const [kind, cases] of Object.entries(samples)) {
    for (const { verdict, fragments } of cases) {
      it(`${kind}${'outcome' in verdict ? ` (${verdict.outcome})` : ''}`, () => {
        const text = verdictText(verdict);
        for (const f of fragments) expect(text).toContain(f);
      });
    }
  }

  it('a second-order no-residual-df note never names Lenth\'s method', () => {
    expect(verdictText({ kind: 'no-residual-df', secondOrder: true })).not.toMatch(/Lenth/);
  });

  it('an aliasing verdict with nothing carried still reads as a sentence (degenerate input)', () => {
    const text = verdictText({ kind: 'aliased', count: 2, carried: [], withInterceptOrBlocks: true });
    expect(text).toBe('2 model terms cannot be separated from others with these runs: some terms are confounded with the intercept or blocks');
  });

  it('the curvature statement is the warning without its advice, and one center run reads in the singular', () => {
    const curved: CurvatureVerdict = { ...flat, outcome: 'curved', p: 0.0021 };
    expect(verdictText(curved).startsWith(curvatureStatement(curved))).toBe(true);
    expect(curvatureStatement(curved)).not.toMatch(/axial/);
    expect(curvatureStatement({ ...flat, nCenter: 1 })).toMatch(/the 1 center run agrees/);
  });

  it('the difference found is given in the response unit when there is one (common practice)', () => {
    expect(curvatureStatement(flat, '%')).toMatch(/\(difference -0\.035 %\)\.$/);
    expect(curvatureStatement(flat)).toMatch(/\(difference -0\.035\)\.$/);
  });

  it('predictions and the path open their curvature note with the same finding', () => {
    const finding = curvatureStatement({ ...flat, outcome: 'curved', p: 0.001 });
    expect(curvatureNote(0.001, 'prediction').startsWith(finding)).toBe(true);
    expect(curvatureNote(0.001, 'path').startsWith(finding)).toBe(true);
    expect(curvatureNote(0.001, 'path')).toMatch(/second-order design/);
  });

  it("Lenth's statement: figures, then the marked effects largest first, or that none is marked", () => {
    // Figures of the unreplicated 2^4 (Montgomery 8th ed., Example 6.2; PSE recomputed by hand from the printed effects).
    const l = { m: 15, df: 5, pse: 2.625, me: 6.748, sme: 13.7 };
    const [head, tail] = lenthStatement(l, [
      { letters: 'C', effect: 9.875, mark: 'likely' },
      { letters: 'B', effect: 3.125 },
      { letters: 'A', effect: 21.625, mark: 'active' },
    ]);
    expect(head).toBe("Lenth's method over 15 effects (d = 5 df): pseudo standard error 2.625, margin of error 6.748, simultaneous margin 13.7");
    expect(tail).toBe('beyond the margins: A 21.63 (beyond the simultaneous margin); C 9.875 (beyond the margin of error)');
    expect(lenthStatement(l, [])[1]).toBe('no effect is beyond the margin of error');
  });
});

/** Fragments of the design builder's sentences (core/text/design-text.ts). */
const designFragments = [
  // The planning form's sentences (core/text/plan-form-text.ts).
  'is not the letter of a factor above',
  'in the fully randomized order of the same seed',
  'the low and the high setting are both',
  'Give each factor a name of its own',
  'Generators from the minimum aberration catalog',
  'in standard order are',
  'It separates no pair of main effects',
  'is repeated at every combination of',
  'do not divide evenly over',
  'Randomizing the run order protects the effects from drifts',
  'was drawn for this plan and is recorded with it',
  'has become a split-plot',
  'the highest-order effect (Montgomery',
  'the best found, not proven best',
  'main effects are clear of two-factor interactions',
  'main effects are aliased with two-factor interactions',
  'cannot be told from the block differences',
  'so they need numeric factors',
  'lower means steadier predictions',
  'before making the run',
  'the response falls away in every direction',
  'so do not move the process there on this result alone',
];

describe('one wording: verdict and design sentences live only in src/core/text', () => {
  const files = sourceFiles('src').map((f) => ({ ...f, code: withoutComments(f.text) }));
  const textModules = files.filter((f) => f.path.startsWith('src/core/text/'));
  const others = files.filter((f) => !f.path.startsWith('src/core/text/'));
  // Literal pieces of the sentences as the source spells them (the samples above show them filled in).
  const analysisFragments = [
    'the actual settings differ slightly',
    'sequential sums of squares depend on the order of terms',
    'Curvature is significant',
    'Add axial runs for a second-order design',
    'No clear curvature',
    'with the factorial average',
    'The curvature test needs repeated runs',
    'the repeated runs agree exactly',
    'Lack of fit is significant',
    'No clear lack of fit',
    'effects to work from',
    'so standard errors, t and p are not available',
    'cannot be separated from others with these runs',
    'the estimate shown for',
    'beyond the simultaneous margin',
    'pseudo standard error',
  ];
  const all = [...analysisFragments, ...designFragments];

  it('the scan has real fragments to look for (a check of the check)', () => {
    expect(all.every((f) => f.length >= 12)).toBe(true);
    expect(others.length).toBeGreaterThan(50);
  });

  for (const fragment of all) {
    it(`"${fragment}"`, () => {
      expect(textModules.some((f) => f.code.includes(fragment)), 'in a text module').toBe(true);
      expect(others.filter((f) => f.code.includes(fragment)).map((f) => f.path)).toEqual([]);
    });
  }
});
