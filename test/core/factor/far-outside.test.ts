import { describe, expect, it } from 'vitest';
import { defineFactors } from '../../../src/core/factor/factor.ts';
import { FAR_OUTSIDE_CODED, farOutsideSettings } from '../../../src/core/factor/far-outside.ts';
import { farOutsideText } from '../../../src/core/text/far-outside-text.ts';

const factors = defineFactors([
  { kind: 'numeric', name: 'Oven temperature', low: 160, high: 200, unit: '°C' },
  { kind: 'categorical', name: 'Powder', levels: ['matte', 'gloss'] },
  { kind: 'numeric', name: 'Line speed', low: 2, high: 4, unit: 'm/min' },
]);

describe('farOutsideSettings', () => {
  it('finds 1600 typed in a 160 to 200 range: coded (1600 - 180) / 20 = 71 (by hand)', () => {
    const far = farOutsideSettings(factors, [1600, 'matte', 3]);
    expect(far).toEqual([{ factor: 0, value: 1600, coded: 71 }]);
    expect(farOutsideText('Run 4', factors[0], far[0])).toBe(
      'Run 4: Oven temperature 1600 °C is far outside the planned range 160 to 200 °C (coded 71); check it for a typing slip',
    );
  });
  it('leaves settings inside, at the edge and a little outside alone; flags just past the limit on either side', () => {
    // Coded 3 is 180 + 3 * 20 = 240 (by hand): not beyond the limit; 240.01 is.
    expect(FAR_OUTSIDE_CODED).toBe(3);
    expect(farOutsideSettings(factors, [240, 'gloss', 4])).toEqual([]);
    expect(farOutsideSettings(factors, [161, 'gloss', 1.5])).toEqual([]);
    expect(farOutsideSettings(factors, [240.01, 'gloss', 3]).map((f) => f.factor)).toEqual([0]);
    // Line speed -1 in 2 to 4: (-1 - 3) / 1 = -4 (by hand).
    expect(farOutsideSettings(factors, [180, 'gloss', -1]).map((f) => [f.factor, f.coded])).toEqual([[2, -4]]);
  });
  it('degenerate input: categorical levels, missing and non-finite settings are skipped', () => {
    expect(farOutsideSettings(factors, [])).toEqual([]);
    expect(farOutsideSettings(factors, [Number.NaN, 'matte', Number.POSITIVE_INFINITY])).toEqual([]);
  });
});

describe('the analysis data names a far-outside setting with its run', () => {
  it('a run logged at 1600 in a 160 to 200 range is named in the notes', async () => {
    const { coatingPlan } = await import('../../store/helpers.ts');
    const { responseDataFromRuns } = await import('../../../src/core/study/run-data.ts');
    const { currentRun } = await import('../../../src/core/study/study.ts');
    const plan = coatingPlan();
    const runs = plan.design.runs.slice(0, 8).map((p, i) =>
      currentRun([{
        id: `r${i}`, runId: `run${i}`, studyId: 's', plannedRun: p.run, rev: 1, device: 'd', parents: [], restoredFrom: null, savedAt: '2024-05-02T12:00:00.000Z',
        // Invented readings; run 4 has the slipped digit.
        actual: [p.run === 4 ? 1600 : 180 + 20 * p.coded[0], 3 + p.coded[1], 40 + 10 * p.coded[2]], readings: [[70 + i], [90]], loggedAt: null, operator: null, notes: '', excluded: false, reason: '',
      }]),
    );
    const data = responseDataFromRuns(plan, runs, 'Film thickness');
    expect(data.messages.filter((n: string) => /far outside/.test(n))).toEqual([
      'Run 4: Oven temperature 1600 °C is far outside the planned range 160 to 200 °C (coded 71); check it for a typing slip',
    ]);
  });
});
