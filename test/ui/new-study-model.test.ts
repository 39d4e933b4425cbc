import { describe, expect, it } from 'vitest';
import { buildDesign } from '../../src/core/design/build-design.ts';
import { planPower } from '../../src/core/plan/power.ts';
import { powerInWords } from '../../src/core/plan/power-words.ts';
import { choiceName, factorMessage, fractionOptions, plackettBurmanRunsOf, powerView, responsesOf } from '../../src/ui/models/new-study-model.ts';

const three = ['A1', 'B1', 'C1'].map((name) => ({ kind: 'numeric' as const, name, low: 0, high: 1 }));

describe('the planning form: design choices and the power of the plan', () => {
  it('offers the full factorial, the catalog fractions, then the Plackett-Burman designs that take k factors', () => {
    expect(fractionOptions(4).map((o) => o.value)).toEqual(['full', '1/2', 'pb-12', 'pb-20', 'pb-24']);
    // 12 factors: a 12-run design has only 11 columns (Plackett and Burman 1946).
    expect(fractionOptions(12).map((o) => o.value).filter((v) => v.startsWith('pb-'))).toEqual(['pb-20', 'pb-24']);
    // Over the 15 factors of the catalog only screening designs are left.
    expect(fractionOptions(19).map((o) => o.value)).toEqual(['pb-20', 'pb-24']);
    expect(plackettBurmanRunsOf('pb-20')).toBe(20);
    expect(plackettBurmanRunsOf('1/2')).toBeNull();
    expect(['full', '1/4', 'pb-24'].map(choiceName)).toEqual(['the full factorial', 'the 1/4 fraction', 'the 24-run Plackett-Burman design']);
  });

  it("gives the core's sentence for a ready plan, and waits while a field is blank", () => {
    // A 2^3 with 4 center runs, the default model (main effects and two-factor interactions).
    const design = buildDesign({ factors: three, centerRuns: 4, seed: 1 });
    const v = powerView(design, '2', '1');
    expect(v).toEqual({ state: 'ready', power: planPower(design, { effect: 2, sigma: 1 }), words: powerInWords(planPower(design, { effect: 2, sigma: 1 })) });
    expect(powerView(design, '', '1').state).toBe('waiting');
    expect(powerView(null, '2', '1').state).toBe('waiting');
  });

  it('bad input: an effect of 0, a negative sigma or text gets the message and no power', () => {
    const design = buildDesign({ factors: three, centerRuns: 4, seed: 1 });
    expect(powerView(design, '0', '1')).toEqual({ state: 'error', message: 'The effect to detect must be a number greater than 0, got 0' });
    expect(powerView(design, '2', '-1')).toEqual({ state: 'error', message: 'The run-to-run standard deviation (sigma) must be a number greater than 0, got -1' });
    expect(powerView(design, 'big', '1').state).toBe('error');
  });

  it('bad input: more factors than a 12-run design takes is refused by the builder with the count it takes', () => {
    const twelve = Array.from({ length: 12 }, (_, i) => ({ kind: 'numeric' as const, name: `F${i + 1}`, low: 0, high: 1 }));
    expect(() => buildDesign({ factors: twelve, plackettBurman: 12 })).toThrow('A 12-run Plackett-Burman design takes up to 11 factors, got 12');
  });
});

const row = (over: Partial<Parameters<typeof factorMessage>[0]>) => ({ key: 1, kind: 'numeric' as const, name: 'Pressure', unit: 'kPa', low: '100', high: '120', levelA: '', levelB: '', ...over });

describe('factorMessage: the planning form refuses what a new factor may not be', () => {
  it('a range too narrow to code reliably is refused at planning, naming the factor', () => {
    expect(factorMessage(row({}), 0)).toBeNull();
    expect(factorMessage(row({ low: '1000', high: '1000.0000001' }), 0)).toMatch(/^Factor A \(Pressure\): the range 1000 to 1000.0000001 is too narrow to code reliably/);
  });
  it('a name the command line could not use is refused (the same rule as design --factor)', () => {
    expect(factorMessage(row({ name: 'Temp, C' }), 0)).toMatch(/^Factor A \(Temp, C\): its name "Temp, C" contains a comma/);
  });
  it('names the factor by the letter of its row, as the fields do (never "Factor 1")', () => {
    expect(factorMessage(row({ name: '' }), 2)).toBe('Factor C: type a name for this factor, such as Temperature.');
    expect(factorMessage(row({ low: '200', high: '160' }), 8)).toMatch(/^Factor J \(Pressure\): the low setting \(200\) is above the high setting \(160\)/);
  });
});

const response = (over: Partial<Parameters<typeof responsesOf>[0][number]>) => ({ key: 1, name: 'Gloss', unit: 'GU', goal: 'maximize' as const, target: '', floor: 'none' as const, lowerBound: '', ...over });

describe('responsesOf: the form says in plain words what a response row lacks', () => {
  it('no response, no name, two of one name, a target that is not a number', () => {
    expect(() => responsesOf([])).toThrow('Add a response: what you will measure at each run.');
    expect(() => responsesOf([response({}), response({ name: ' ' })])).toThrow('Response 2: type a name for what you will measure, such as Thickness.');
    expect(() => responsesOf([response({}), response({ name: 'gloss' })])).toThrow('Response 1 and response 2 are both called "gloss". Give each response a name of its own.');
    expect(() => responsesOf([response({ goal: 'target', target: '7o' })])).toThrow('Gloss: the target "7o" is not a number. Type digits, with a point or a comma for decimals.');
    expect(responsesOf([response({ goal: 'target', target: '7,5' })])[0].target).toBe(7.5);
  });
});
