import { describe, expect, it } from 'vitest';
import { upgradeStudyRecord } from '../../../src/core/records/upgrade-study-record.ts';

// An INVENTED version-1 study record, cut to the fields the upgrade touches.
const v1 = {
  id: 's-1',
  responses: [{ name: 'Gloss', goal: 'maximize' }],
  design: {
    runs: [
      { run: 1, yates: 1, replicate: 1, block: 1, kind: 'factorial', coded: [-1] },
      { run: 2, yates: null, replicate: 1, block: 2, kind: 'center', coded: [0] },
    ],
    seed: 7,
  },
};

describe('upgradeStudyRecord', () => {
  it('adds each run\'s origin block (its block), renames yates to standardOrder and adds each response\'s lower bound (null); kinds stay', () => {
    expect(upgradeStudyRecord(v1)).toEqual({
      id: 's-1',
      responses: [{ name: 'Gloss', goal: 'maximize', lowerBound: null }],
      design: {
        runs: [
          { run: 1, standardOrder: 1, replicate: 1, block: 1, originBlock: 1, kind: 'factorial', coded: [-1] },
          { run: 2, standardOrder: null, replicate: 1, block: 2, originBlock: 2, kind: 'center', coded: [0] },
        ],
        seed: 7,
      },
    });
  });
  it('does not change its input, and a second pass changes nothing more', () => {
    const copy = structuredClone(v1);
    const once = upgradeStudyRecord(copy);
    expect(copy).toEqual(v1);
    expect(upgradeStudyRecord(once)).toEqual(once);
  });
  it('gives back what is not a study as it came (degenerate input), for the checks to refuse', () => {
    expect(upgradeStudyRecord(null)).toBe(null);
    expect(upgradeStudyRecord('x')).toBe('x');
    expect(upgradeStudyRecord({ id: 'a' })).toEqual({ id: 'a' });
  });
});
