import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { InputError } from '../../../src/core/errors.ts';
import { analyze } from '../../../src/core/fit/analyze.ts';
import { findResponse, responseDataFromRuns } from '../../../src/core/study/run-data.ts';
import type { LoggedRun, StudyPlan } from '../../../src/core/study/study.ts';
import { defineFactors } from '../../../src/core/factor/factor.ts';
import { fixturePath } from '../../helpers/fixtures.ts';
import { factorialRuns, plainDesign } from '../../helpers/plain-design.ts';

// The 2^2 yield example (Montgomery 8th ed., section 6.2; test/fixtures/montgomery-8e-ex6-1-yield-2x2.csv),
// logged here as four runs with the three readings of each corner as repeat readings.
const rows = readFileSync(fixturePath('montgomery-8e-ex6-1-yield-2x2.csv'), 'utf8').trim().split(/\r?\n/).slice(1).map((l) => l.split(',').map(Number));
const factors = defineFactors([
  { kind: 'numeric', name: 'Concentration', low: 15, high: 25, unit: '%' },
  { kind: 'numeric', name: 'Catalyst', low: 1, high: 2, unit: 'lb' },
]);
const plan: StudyPlan = {
  title: 'Yield (Montgomery 8th ed., section 6.2)',
  purpose: 'published example',
  factors,
  responses: [{ name: 'Yield', unit: '%', goal: 'maximize' }, { name: 'Color', goal: 'minimize' }],
  design: plainDesign(factorialRuns(2), ''),
};
const corners = [[15, 1], [25, 1], [15, 2], [25, 2]];
function logged(plannedRun: number, over: Partial<LoggedRun> = {}): LoggedRun {
  const [c, k] = corners[plannedRun - 1];
  return {
    id: `run-${plannedRun}`, revisionId: `r-${plannedRun}`, revisions: 1, heads: [`r-${plannedRun}`], studyId: 's', plannedRun, rev: 1, device: 'd',
    parents: [], restoredFrom: null, savedAt: '2024-05-02T16:00:00Z', actual: [c, k],
    readings: [rows.filter((r) => r[0] === c && r[1] === k).map((r) => r[2]), []],
    loggedAt: null, operator: null, notes: '', excluded: false, reason: '', ...over,
  };
}

describe('responseDataFromRuns', () => {
  it('gives one row per logged run, the mean of its readings, and the printed effects of the means', () => {
    const d = responseDataFromRuns(plan, [4, 2, 3, 1].map((n) => logged(n)), 'yield');
    expect(d.labels).toEqual(['1', '2', '3', '4']); // in planned-run order
    expect(d.y.map((y) => y * 3)).toEqual([80, 100, 60, 90].map((t) => expect.closeTo(t, 10))); // printed treatment totals
    expect(d.coded).toEqual([[-1, -1], [1, -1], [-1, 1], [1, 1]]);
    expect(d.blocks).toBeNull();
    expect(d.messages).toEqual(['4 runs have several readings of Yield: each run\'s mean is used, and repeat readings are not counted as replicates']);
    // Effects of the corner means equal those of the replicated analysis: A = 8.33, B = -5.00, AB = 1.67 (Montgomery 8th ed., section 6.2; from memory).
    const a = analyze(d);
    expect(a.terms.map((t) => t.effect)).toEqual([8.333, -5, 1.667].map((e) => expect.closeTo(e, 2)));
  });
  it('skips excluded runs and runs without a reading of the response, and says so', () => {
    const d = responseDataFromRuns(plan, [logged(1), logged(2, { excluded: true, reason: 'spill' }), logged(3, { readings: [[], [1]] }), logged(4)], 'Yield');
    expect(d.labels).toEqual(['1', '4']);
    expect(d.messages.slice(0, 2)).toEqual(['1 excluded run skipped', '1 run without a value for Yield skipped']);
  });
  it('degenerate input: no logged runs gives empty data; an unknown response is refused listing the names', () => {
    const d = responseDataFromRuns(plan, [], 'Yield');
    expect([d.y, d.coded, d.messages]).toEqual([[], [], []]);
    expect(() => responseDataFromRuns(plan, [], 'Purity')).toThrow(new InputError('Study "Yield (Montgomery 8th ed., section 6.2)" has no response "Purity"; its responses are "Yield", "Color"'));
  });
});

describe('findResponse', () => {
  it('finds by name, case and spaces ignored, with its index', () => {
    expect(findResponse(plan, ' COLOR ').index).toBe(1);
  });
  it('degenerate input: a study with no responses says none', () => {
    expect(() => findResponse({ ...plan, responses: [] }, 'Yield')).toThrow(/its responses are none/);
  });
});
