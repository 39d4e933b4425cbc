import { describe, expect, it } from 'vitest';
import { InputError } from '../../../src/core/errors.ts';
import { factorRowProblem, factorRowSpec, sameNames, swapLowHigh, type FactorRow } from '../../../src/core/factor/factor-row-problem.ts';

const row = (over: Partial<FactorRow>): FactorRow => ({ kind: 'numeric', name: 'Temperature', unit: '°C', low: '160', high: '200', levelA: '', levelB: '', ...over });
const cat = (a: string, b: string): FactorRow => row({ kind: 'categorical', name: 'Finish', levelA: a, levelB: b });

// The rules are those of a new factor (common practice: the low is coded -1 and must be the smaller).
describe('factorRowProblem: the first thing wrong with a factor row as typed', () => {
  it('a complete row has no problem, with a comma as the decimal mark too', () => {
    expect(factorRowProblem(row({}))).toBeNull();
    expect(factorRowProblem(row({ low: '0,5', high: '1,5' }))).toBeNull();
    expect(factorRowProblem(cat('matte', 'gloss'))).toBeNull();
  });

  it('a blank row asks for the name first (degenerate input), then each missing box', () => {
    expect(factorRowProblem(row({ name: ' ', low: '', high: '' }))).toEqual({ kind: 'no-name' });
    expect(factorRowProblem(row({ low: ' ' }))).toEqual({ kind: 'missing', which: 'low' });
    expect(factorRowProblem(row({ high: '' }))).toEqual({ kind: 'missing', which: 'high' });
    expect(factorRowProblem(cat('', 'gloss'))).toEqual({ kind: 'missing', which: 'levelA' });
    expect(factorRowProblem(cat('matte', ''))).toEqual({ kind: 'missing', which: 'levelB' });
  });

  it('a low of 200 above a high of 160 is reversed; equal settings and equal level names are refused', () => {
    expect(factorRowProblem(row({ low: '200', high: '160' }))).toEqual({ kind: 'reversed', low: 200, high: 160 });
    expect(factorRowProblem(row({ low: '180', high: '180,0' }))).toEqual({ kind: 'equal', value: 180 });
    expect(factorRowProblem(cat('Matte ', 'matte'))).toEqual({ kind: 'same-level-names', level: 'Matte' });
  });

  it('text that is not a number is named with the box it is in', () => {
    expect(factorRowProblem(row({ high: '2oo' }))).toEqual({ kind: 'not-a-number', which: 'high', text: '2oo' });
  });

  it("other rules of a new factor come in the core's words without the factor's name (the form names it)", () => {
    const p = factorRowProblem(row({ name: 'Temp, C' }));
    expect(p?.kind).toBe('rule');
    expect(p?.kind === 'rule' && p.message).toMatch(/^its name "Temp, C" contains a comma/);
    const narrow = factorRowProblem(row({ low: '1000', high: '1000.0000001' }));
    expect(narrow?.kind === 'rule' && narrow.message).toMatch(/^the range 1000 to 1000.0000001 is too narrow to code reliably/);
  });
});

describe('swapLowHigh and factorRowSpec', () => {
  it('the swap exchanges only the two settings (or the two level names); swapped back it is the row again', () => {
    const r = row({ low: '200', high: '160' });
    expect(swapLowHigh(r)).toEqual({ ...r, low: '160', high: '200' });
    expect(swapLowHigh(swapLowHigh(r))).toEqual(r);
    expect(factorRowProblem(swapLowHigh(r))).toBeNull();
    expect(swapLowHigh(cat('matte', 'gloss'))).toEqual(cat('gloss', 'matte'));
  });

  it('the spec reads the typed settings; text is refused (degenerate input)', () => {
    expect(factorRowSpec(row({ low: '0,5' }))).toEqual({ kind: 'numeric', name: 'Temperature', low: 0.5, high: 200, unit: '°C' });
    expect(() => factorRowSpec(row({ low: 'x' }))).toThrow(InputError);
  });
});

describe('sameNames', () => {
  it('finds the first two rows with one name, ignoring case, spaces and blank names', () => {
    expect(sameNames(['Speed', 'Feed', ' speed '])).toEqual([0, 2]);
    expect(sameNames(['', ' ', 'Feed'])).toBeNull();
    expect(sameNames([])).toBeNull();
  });
});
