/**
 * The record checks of a study: what every stored study and every study in a backup obeys.
 * The study here is INVENTED (a made-up 2^2 plan with one center run).
 */
import { describe, expect, it } from 'vitest';
import { InputError } from '../../../src/core/errors.ts';
import { RUN_KINDS } from '../../../src/core/design/design.ts';
import { checkStudy } from '../../../src/core/records/check-study.ts';
import { inventedStudy } from '../../helpers/invented-study.ts';
import { factorialRuns, plainDesign } from '../../helpers/plain-design.ts';

function study(): any {
  return {
    ...inventedStudy(),
    factors: [
      { kind: 'numeric', name: 'Temperature', letter: 'A', low: 160, high: 200, unit: '°C' },
      { kind: 'categorical', name: 'Powder', letter: 'B', levels: ['matte', 'gloss'] },
    ],
    responses: [
      { name: 'Thickness', unit: 'µm', goal: 'target', target: 70, lowerBound: 0 },
      { name: 'Gloss', goal: 'maximize', lowerBound: null },
    ],
    // Standard order of a 2^2 (Montgomery, 8th ed., section 6.2): (1), a, b, ab; then a center
    // run, the categorical factor at its first level.
    design: plainDesign([...factorialRuns(2), { run: 5, standardOrder: null, replicate: 1, block: 1, originBlock: 1, kind: 'center', coded: [0, -1] }], 'Full factorial in 2 factors (invented test plan).'),
  };
}

describe('checkStudy', () => {
  it('gives back a good record as it is', () => {
    expect(checkStudy(study(), 'study')).toEqual(study());
  });

  it('takes every run kind of the one list, and refuses any other, listing the kinds', () => {
    for (const kind of RUN_KINDS) {
      const s = study();
      s.design.runs[4].kind = kind;
      expect(checkStudy(s, 'study').design.runs[4].kind).toBe(kind);
    }
    const s = study();
    s.design.runs[4].kind = 'star';
    expect(() => checkStudy(s, 'study')).toThrow('study.design.runs[4].kind: needs "factorial" or "center" or "axial" or "path" or "confirmation", got "star"');
  });

  it('needs each planned run\'s block of origin, a whole number from 1, which may differ from its block', () => {
    const later = study();
    later.design.runs[4] = { ...later.design.runs[4], block: 2, originBlock: 2, kind: 'axial' };
    later.design.runs[3] = { ...later.design.runs[3], block: 2 }; // renumbered, planned in block 1
    const checked = checkStudy(later, 'study');
    expect(checked.design.runs.map((r) => [r.block, r.originBlock])).toEqual([[1, 1], [1, 1], [1, 1], [2, 1], [2, 2]]);
    const missing = study();
    delete missing.design.runs[0].originBlock;
    expect(() => checkStudy(missing, 'study')).toThrow(/^study\.design\.runs\[0\]\.originBlock: needs a whole number from 1 to \d+, got nothing$/);
    const zero = study();
    zero.design.runs[2].originBlock = 0;
    expect(() => checkStudy(zero, 'study')).toThrow(/^study\.design\.runs\[2\]\.originBlock: needs a whole number from 1/);
  });

  it('needs each response\'s lower bound: a finite number or null, with a target at or above it', () => {
    const missing = study();
    delete missing.responses[1].lowerBound;
    expect(() => checkStudy(missing, 'study')).toThrow('study.responses[1].lowerBound: needs a number or null (null: no lower bound), got nothing');
    for (const bad of [Number.NaN, Number.POSITIVE_INFINITY, '0', true]) {
      const s = study();
      s.responses[0].lowerBound = bad;
      expect(() => checkStudy(s, 'study'), String(bad)).toThrow(/^study\.responses\[0\]\.lowerBound: needs a finite number, got /);
    }
    const below = study();
    below.responses[0].lowerBound = 75;
    expect(() => checkStudy(below, 'study')).toThrow('study.responses[0].target: needs a target at or above the lower bound 75, got 70');
    const negative = study();
    negative.responses[1].lowerBound = -40; // a response may have a negative floor (a temperature difference)
    expect(checkStudy(negative, 'study').responses[1].lowerBound).toBe(-40);
  });

  it('refuses a field the format does not have, and throws only InputError', () => {
    const s = study();
    s.design.runs[0].origin = 1;
    expect(() => checkStudy(s, 'study')).toThrow('study.design.runs[0]: has no field "origin" in this format');
    expect(() => checkStudy(null, 'study')).toThrow(InputError);
    expect(() => checkStudy({}, 'study')).toThrow(InputError);
  });
});

describe('checkStudy: the screening entry of a Plackett-Burman plan', () => {
  // A 12-run Plackett-Burman plan keeps its factorial runs' standard-order indexes 1..12 (Plackett and Burman 1946).
  function screened(): any {
    const s = study();
    s.design.screening = { kind: 'plackett-burman', runs: 12, source: 'Plackett and Burman (1946)' };
    return s;
  }

  it('keeps the optional field as it came, and leaves a plan without it unchanged', () => {
    expect(checkStudy(screened(), 'study').design.screening).toEqual({ kind: 'plackett-burman', runs: 12, source: 'Plackett and Burman (1946)' });
    expect('screening' in checkStudy(study(), 'study').design).toBe(false);
  });

  it('refuses a run count the paper does not give, an unknown kind, a missing source or an extra field', () => {
    const bad: [string, (s: any) => void, string][] = [
      ['16 runs', (s) => (s.design.screening.runs = 16), 'study.design.screening.runs: needs one of 12, 20, 24 runs, got 16'],
      ['kind', (s) => (s.design.screening.kind = 'hadamard'), 'study.design.screening.kind: needs "plackett-burman", got "hadamard"'],
      ['source', (s) => delete s.design.screening.source, 'study.design.screening.source: needs text, got nothing'],
      ['extra', (s) => (s.design.screening.rows = 12), 'study.design.screening: has no field "rows" in this format'],
    ];
    for (const [what, change, message] of bad) {
      const s = screened();
      change(s);
      expect(() => checkStudy(s, 'study'), what).toThrow(message);
    }
  });

  it('refuses more factors than the design has columns, and a standard-order index outside its table', () => {
    const small = screened();
    small.design.runs[1].standardOrder = 13;
    expect(() => checkStudy(small, 'study')).toThrow('study.design.runs[1].standardOrder: needs a standard-order index from 1 to 12 (a 12-run Plackett-Burman design), got 13');
    const wide = screened();
    wide.design.screening.runs = 12;
    wide.factors = Array.from({ length: 12 }, (_, i) => ({ kind: 'numeric', name: `F${i}`, letter: 'ABCDEFGHJKLM'[i], low: 0, high: 1 }));
    wide.design.runs.forEach((r: any) => (r.coded = new Array(12).fill(r.kind === 'center' ? 0 : 1)));
    expect(() => checkStudy(wide, 'study')).toThrow('study.design.screening: needs at most 11 factors for a 12-run design, got 12');
  });
});
