import { describe, expect, it } from 'vitest';
import { joinNegativeValues, parseCommandArgs } from '../../src/cli/args.ts';

const OPTIONS = { step: { type: 'string' }, target: { type: 'string' }, json: { type: 'boolean' } } as const;

describe('negative option values need no --opt= quoting', () => {
  it('joins a negative number to the option before it', () => {
    expect(joinNegativeValues(['--step', '-10', '--target', '-0.5e-3', '--json'], OPTIONS)).toEqual(['--step=-10', '--target=-0.5e-3', '--json']);
    const { values } = parseCommandArgs(['--step', '-10', '--target', '-.5'], OPTIONS);
    expect(values).toEqual({ step: '-10', target: '-.5' });
  });
  it('leaves everything else to parseArgs: a boolean option, words, a value already joined, after "--"', () => {
    expect(joinNegativeValues(['--json', '-1'], OPTIONS)).toEqual(['--json', '-1']);
    expect(joinNegativeValues(['--step', '-h'], OPTIONS)).toEqual(['--step', '-h']);
    expect(joinNegativeValues(['--step=-3', '-4'], OPTIONS)).toEqual(['--step=-3', '-4']);
    expect(joinNegativeValues(['--', '--step', '-4'], OPTIONS)).toEqual(['--', '--step', '-4']);
    expect(joinNegativeValues([], OPTIONS)).toEqual([]);
    expect(() => parseCommandArgs(['--step', '-x'], OPTIONS)).toThrow(/--step/);
  });
});

describe('parseAssignments', () => {
  it('reads NAME=VALUE lists and refuses a part with two "=" (A=B=1:2)', async () => {
    const { parseAssignments } = await import('../../src/cli/args.ts');
    expect(parseAssignments('Temperature=185, Powder=gloss', '--at')).toEqual([['Temperature', '185'], ['Powder', 'gloss']]);
    expect(() => parseAssignments('A=B=1:2', '--levels')).toThrow('--levels: expected one "=" in NAME=VALUE, got "A=B=1:2"; a name or level cannot contain "="');
    expect(() => parseAssignments('A', '--at')).toThrow(/expected NAME=VALUE, got "A"/);
    expect(parseAssignments('', '--at')).toEqual([]);
  });
});
