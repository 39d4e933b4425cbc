import { describe, expect, it } from 'vitest';
import {
  aliasListText,
  catalogGeneratorsHint,
  countText,
  factorCalled,
  factorRowText,
  generatorCountText,
  hardToChangeText,
  NO_RESPONSE_TEXT,
  notOfferedText,
  responseLowestMissingText,
  responseNameText,
  responseNumberText,
  sameFactorNamesText,
  sameResponseNamesText,
  seedText,
  tooFewFactorsText,
} from '../../../src/core/text/plan-form-text.ts';

// The wording is the form's own (common practice: name the field, say what to do).
describe('the planning form names a factor as its fields do', () => {
  it('by letter, with its name when it has one', () => {
    expect(factorCalled('A', ' Temperature ')).toBe('Factor A (Temperature)');
    expect(factorCalled('J', '')).toBe('Factor J');
  });

  it('every row problem opens with the factor and says what to do', () => {
    expect(factorRowText({ kind: 'reversed', low: 200, high: 160 }, 'A', 'Temperature')).toBe(
      'Factor A (Temperature): the low setting (200) is above the high setting (160). The low must be the smaller number: tap "Swap low and high", or type them again.',
    );
    expect(factorRowText({ kind: 'equal', value: 180 }, 'B', 'Oven')).toBe('Factor B (Oven): the low and the high setting are both 180. Type two different settings, the smaller as the low.');
    expect(factorRowText({ kind: 'same-level-names', level: 'matte' }, 'C', 'Finish')).toMatch(/^Factor C \(Finish\): both levels are called "matte"\. Give the two levels different names/);
    expect(factorRowText({ kind: 'missing', which: 'levelB' }, 'C', 'Finish')).toBe('Factor C (Finish): type the second level.');
    expect(factorRowText({ kind: 'no-name' }, 'D', '')).toBe('Factor D: type a name for this factor, such as Temperature.');
    expect(factorRowText({ kind: 'rule', message: 'its name "a,b" contains a comma' }, 'E', 'a,b')).toBe('Factor E (a,b): its name "a,b" contains a comma');
  });

  it('two factors with one name, and too few factors, in plain words', () => {
    expect(sameFactorNamesText(['A', 'C'], ' Speed')).toBe('Factor A and factor C are both called "Speed". Give each factor a name of its own.');
    expect(tooFewFactorsText(1)).toMatch(/^Add a second factor/);
    expect(tooFewFactorsText(0)).toMatch(/^Add two factors/);
  });

  it('no message on the form reads "got" or "expected" (written for a person, not a developer)', () => {
    const texts = [countText('Center runs', 0, '-1'), seedText('12a'), generatorCountText(2, 1, '1/2'), catalogGeneratorsHint(['E=ABCD'])];
    for (const t of texts) expect(t).not.toMatch(/\bgot\b|\bexpected\b/);
    // No-break spaces keep each generator on one line.
    expect(catalogGeneratorsHint(['E=ABC', 'F=BCD'])).toContain('(E\u00a0=\u00a0ABC, F\u00a0=\u00a0BCD)');
  });
});

describe('aliasListText', () => {
  it('lists chains that join effects, then how many more; a lone effect is left out (degenerate input)', () => {
    // The chains of the 2^(4-1) with I = ABCD (Montgomery, 8th ed., section 8.2: AB = CD, AC = BD, AD = BC).
    expect(aliasListText([['AB', 'CD'], ['AD'], ['AC', 'BD'], ['AD', 'BC']], 2)).toEqual(['AB = CD', 'AC = BD', 'and 1 more chain']);
    expect(aliasListText([], 8)).toEqual([]);
  });
});

describe('hardToChangeText', () => {
  it('says how often the factor changes, against the unsorted order, that the seed is recorded, and the cost', () => {
    const t = hardToChangeText('Factor A (Oven)', 1, 7, 4242);
    expect(t).toContain('Factor A (Oven) changes 1 time in this run order (7 times in the fully randomized order of the same seed)');
    expect(t).toContain('seed 4242 is recorded with the plan');
    expect(t).toContain('the runs are not fully randomized');
    expect(hardToChangeText('Factor B', 2, null, null)).toContain('standard order within each of its settings');
  });
});

describe('responses and the design choice on the form', () => {
  it('each says what to do, naming the response by its number or name', () => {
    expect(responseNameText(2)).toBe('Response 2: type a name for what you will measure, such as Thickness.');
    expect(sameResponseNamesText(1, 3, 'Gloss ')).toBe('Response 1 and response 3 are both called "Gloss". Give each response a name of its own.');
    expect(responseNumberText('Thickness', 'target', ' abc ')).toBe('Thickness: the target "abc" is not a number. Type digits, with a point or a comma for decimals.');
    expect(responseLowestMissingText('')).toBe('A response: type the lowest value it can take, or choose "No lowest value".');
    expect(notOfferedText('the 1/4 fraction', 4)).toBe('The 1/4 fraction is not offered for 4 factors; choose one of the above.');
    expect(NO_RESPONSE_TEXT).not.toMatch(/\bgot\b/);
  });
});
