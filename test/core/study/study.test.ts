import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { InputError } from '../../../src/core/errors.ts';
import { checkRunValues, compareRevisions, currentRun, describe as describeValue, headsOf, meanReading, plannedRunOf, plannedSettings, studyPlan } from '../../../src/core/study/study.ts';
import { buildDesign } from '../../../src/core/design/build-design.ts';
import { fixturePath } from '../../helpers/fixtures.ts';
import { revision, study } from '../records/revision-helpers.ts';

// The three readings at each corner of the 2^2 yield example (Montgomery 8th ed., section 6.2),
// read from the fixture; the printed treatment totals are (1) = 80, a = 100, b = 60, ab = 90.
const rows = readFileSync(fixturePath('montgomery-8e-ex6-1-yield-2x2.csv'), 'utf8').trim().split(/\r?\n/).slice(1).map((l) => l.split(',').map(Number));
const cornerReadings = (conc: number, cat: number) => rows.filter((r) => r[0] === conc && r[1] === cat).map((r) => r[2]);

describe('meanReading', () => {
  it('is the mean of a run\'s repeat readings: the printed totals over n = 3', () => {
    expect(meanReading(cornerReadings(15, 1))! * 3).toBeCloseTo(80, 12); // total (1) = 80, Montgomery 8th ed. section 6.2
    expect(meanReading(cornerReadings(25, 1))! * 3).toBeCloseTo(100, 12); // a = 100
    expect(meanReading(cornerReadings(15, 2))! * 3).toBeCloseTo(60, 12); // b = 60
    expect(meanReading(cornerReadings(25, 2))! * 3).toBeCloseTo(90, 12); // ab = 90
  });
  it('degenerate input: no readings gives null, not NaN', () => {
    expect(meanReading([])).toBeNull();
  });
});

describe('revision order and the current state', () => {
  const a = revision();
  const b = revision({ id: 'r-2', rev: 2, parents: ['r-1'], device: 'd-1', readings: [[70], [81]] });
  const c = revision({ id: 'r-3', rev: 2, parents: ['r-1'], device: 'd-2', readings: [[71], [82]] });
  it('orders by counter, then device, then id; the greatest is current and both heads of a fork are kept', () => {
    expect(compareRevisions(a, b)).toBeLessThan(0);
    expect(compareRevisions(c, b)).toBeGreaterThan(0); // same counter: device d-2 after d-1
    expect(compareRevisions(b, { ...b })).toBe(0);
    expect(headsOf([c, a, b]).map((r) => r.id)).toEqual(['r-2', 'r-3']);
    const run = currentRun([b, c, a]);
    expect(run).toMatchObject({ id: 'run-1', revisionId: 'r-3', revisions: 3, heads: ['r-2', 'r-3'], readings: [[71], [82]] });
  });
  it('degenerate input: a logged run with no revision is refused; one revision is its own head', () => {
    expect(() => currentRun([])).toThrow(new InputError('A logged run needs at least one revision, got none'));
    expect(currentRun([a])).toMatchObject({ revisionId: 'r-1', revisions: 1, heads: ['r-1'] });
  });
});

describe('planned runs of a study', () => {
  it('gives a planned run\'s settings in real units: coded -1 and +1 are the low and high levels', () => {
    // Planned run 8 of the invented helper plan is the corner (+1, +1, +1) in standard order.
    expect(plannedRunOf(study, 8)?.coded).toEqual([1, 1, 1]);
    expect(plannedSettings(study, 8)).toEqual([200, 4, 50]);
    expect(plannedSettings(study, 1)).toEqual([160, 2, 30]);
    expect(plannedSettings(study, 9)).toEqual([180, 3, 40]); // a center run: the midpoints
  });
  it('degenerate input: a run number outside the plan', () => {
    expect(plannedRunOf(study, 0)).toBeUndefined();
    expect(() => plannedSettings(study, 11)).toThrow('Run 11 is not in the plan of "Invented demo: coating line trial" (it has runs 1 to 10)');
  });
});

describe('studyPlan', () => {
  it('keeps the factors once, beside the stored design, and drops the fresh plan\'s typed notes', () => {
    const design = buildDesign({ factors: [{ kind: 'numeric', name: 'Concentration', low: 15, high: 25 }, { kind: 'numeric', name: 'Catalyst', low: 1, high: 2 }], randomize: false });
    const plan = studyPlan(' 2^2 yield ', 'Montgomery 8th ed., section 6.2', [{ name: 'Yield', goal: 'maximize' }], design);
    expect(plan.factors).toBe(design.factors);
    expect(plan.design.runs.length).toBe(4); // 2^2 corners
    expect('factors' in plan.design || 'noteFacts' in plan.design).toBe(false);
  });
});

describe('checkRunValues', () => {
  const values = { actual: [160, 2, 30], readings: [[68.1], []], loggedAt: null, operator: '  ', notes: 'n', excluded: false, reason: 'stale' };
  it('takes sound values: a blank operator becomes none, a reason is kept only for an excluded run', () => {
    expect(checkRunValues(study, values)).toEqual({ ...values, operator: null, reason: '' });
    expect(checkRunValues(study, { ...values, excluded: true, reason: ' conveyor stopped ' }).reason).toBe('conveyor stopped');
  });
  it('refuses what a run cannot hold, naming the field', () => {
    expect(() => checkRunValues(study, { ...values, actual: [160, 2, '30'] })).toThrow('Powder flow: the actual setting needs a finite number, got "30"');
    expect(() => checkRunValues(study, { ...values, readings: [[1]] })).toThrow('Readings: needs one list per response (2), got 1');
    expect(() => checkRunValues(study, { ...values, loggedAt: 'soon' })).toThrow('Time: needs a date and time (ISO 8601, e.g. 2026-03-01T14:05) or nothing, got "soon"');
    expect(() => checkRunValues(study, { ...values, excluded: true, reason: '' })).toThrow('Excluded: an excluded run needs a reason, got none');
  });
  it('degenerate input: no settings at all', () => {
    expect(() => checkRunValues(study, { ...values, actual: [] })).toThrow('Actual settings: needs one per factor (3), got 0');
  });
});

describe('describe (values in messages)', () => {
  it('writes numbers and text as they are, long text cut, others by kind', () => {
    expect([describeValue(null), describeValue(undefined), describeValue(3), describeValue(true), describeValue([1]), describeValue({})]).toEqual(['nothing', 'nothing', '3', 'true', 'a list', 'an object']);
    expect(describeValue('x'.repeat(41))).toBe(JSON.stringify('x'.repeat(40) + '...'));
    expect(describeValue('')).toBe('""'); // degenerate: empty text is shown, not hidden
  });
});
