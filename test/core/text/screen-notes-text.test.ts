import { describe, expect, it } from 'vitest';
import { analyze } from '../../../src/core/fit/analyze.ts';
import { parseTerms } from '../../../src/core/model/formula.ts';
import { screenNotes, screenVerdictNote } from '../../../src/core/text/screen-notes-text.ts';
import { verdictText } from '../../../src/core/text/verdict-text.ts';
import { quadraticNotSupported } from '../../../src/core/text/second-order-text.ts';
import { fixtureData } from '../../helpers/fixtures.ts';
import { laserData } from '../../helpers/half-fraction.ts';

const allText = (notes: ReturnType<typeof screenNotes>) => notes.map((n) => [n.text, ...(n.list ?? [])].join(' ')).join(' ');

// The half fraction's alias structure (I = ABCD: AB = CD, AC = BD, AD = BC) is from Montgomery,
// Design and Analysis of Experiments, 8th ed., section 8.2; its responses are invented (test/helpers/half-fraction.ts).
describe('screenNotes: the Effects screen says the verdicts in its own words', () => {
  const off = analyze(laserData(0.9)); // Power logged at 89 where the plan said 90

  it('never speaks of the adjusted table the screen does not show, where the command line does', () => {
    expect(off.warnings.join(' ')).toMatch(/adjusted table/);
    const notes = screenNotes([], off.verdicts);
    expect(allText(notes)).not.toMatch(/adjusted table|sequential sums of squares/);
    expect(allText(notes)).toMatch(/each test on this screen allows for all the other terms/);
  });

  it('the count of terms that cannot be separated equals the list under it, and lists exactly the aliased terms', () => {
    const note = screenNotes([], off.verdicts).find((n) => n.list)!;
    // The plan confounds three pairs: BC, BD and CD are left out (AD = BC, AC = BD, AB = CD).
    expect(off.aliased.map((t) => t.letters).sort()).toEqual(['BC', 'BD', 'CD']);
    expect(note.text).toMatch(/cannot separate 3 model terms/);
    expect(note.list).toHaveLength(3);
    expect(note.list!.map((s) => s.split(' ')[0]).sort()).toEqual(['BC', 'BD', 'CD']);
    expect(note.list).toContain('CD cannot be told apart from AB');
  });

  it('keeps the run messages first, in order', () => {
    const notes = screenNotes(['2 excluded runs skipped'], off.verdicts);
    expect(notes[0]).toEqual({ text: '2 excluded runs skipped' });
  });

  it('one term left out reads in the singular and its list has one item', () => {
    const n = screenVerdictNote({ kind: 'aliased', count: 1, carried: [{ letters: 'C', estimates: 'C + AB' }], withInterceptOrBlocks: false, terms: [{ letters: 'AB', equals: 'C' }] })!;
    expect(n.text).toMatch(/^These runs cannot separate 1 model term from others, so it has no bar of its own/);
    expect(n.list).toEqual(['AB cannot be told apart from C']);
  });

  it('degenerate input: no verdicts and no messages give no notes; a plain statement is not a note', () => {
    expect(screenNotes([], [])).toEqual([]);
    expect(screenVerdictNote({ kind: 'lack-of-fit', outcome: 'not-significant', p: 0.5, alpha: 0.05 })).toBeNull();
  });
});

describe('screenNotes: a significant curvature without squares says the way on', () => {
  // Montgomery 8th ed., section 6.8 (2^2 with five center runs), with 2 added to the center runs
  // (an invented shift) so that the curvature test is significant.
  const data = fixtureData('montgomery-8e-ex6-6-center-points.csv', { factors: ['Time', 'Temperature'], response: 'Yield' });
  const bent = analyze({ ...data, y: data.y.map((v, i) => (i >= 4 ? v + 2 : v)) });

  it('on runs that cannot fit squares: why the quadratic model is not offered, and axial runs', () => {
    const text = allText(screenNotes([], bent.verdicts, { quadraticOffered: false }));
    expect(text).toMatch(/Curvature is significant/);
    expect(text).toContain(quadraticNotSupported('screen'));
  });

  it('on runs that can: the quadratic model above, not axial runs', () => {
    const text = allText(screenNotes([], bent.verdicts, { quadraticOffered: true }));
    expect(text).toMatch(/Choose the quadratic model above/);
    expect(text).not.toMatch(/axial/);
  });
});

describe('screenNotes of a second-order model (Montgomery 8th ed., Example 11.2, central composite design)', () => {
  const data = fixtureData('montgomery-8e-ex11-2-ccd-yield.csv', { factors: ['Time', 'Temperature'], response: 'Yield', levels: { Time: ['80', '90'], Temperature: ['170', '180'] } });
  const a = analyze(data, { terms: parseTerms('quadratic', data.factors) });
  const notes = screenNotes([], a.verdicts);

  it("speaks of the squares' own tests and lack of fit, never of Lenth's method or two-level orthogonality", () => {
    const text = allText(notes);
    expect(text).not.toMatch(/Lenth/);
    expect(text).not.toMatch(/missing runs|off target|not orthogonal/);
    expect(text).toMatch(/The model's squares test the bend along each factor: Time\^2 \(A\^2\) p/);
    // Lack of fit with 3 and 4 df is not significant here (Montgomery 8th ed., Example 11.2, from memory: P about 0.29)
    expect(text).toMatch(/No clear lack of fit \(p = 0\.2[0-9]+\)/);
  });

  it("the squares' p-values in the note are the model's own t tests", () => {
    const v = a.verdicts.find((x) => x.kind === 'squares')!;
    expect(v.kind === 'squares' && v.terms.map((t) => t.p)).toEqual(a.terms.filter((t) => t.letters.endsWith('^2')).map((t) => t.p));
    expect(verdictText(v)).toMatch(/adjusted table/); // the command line's variant may name its table
  });
});
