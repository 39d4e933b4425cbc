/**
 * Planned runs added to a study later. The study is INVENTED (test/helpers/invented-study.ts).
 */
import { describe, expect, it } from 'vitest';
import { InputError } from '../../../src/core/errors.ts';
import { addedRuns, withAddedBlocks } from '../../../src/core/study/added-block.ts';
import { inventedBlock as block, inventedStudy } from '../../helpers/invented-study.ts';

describe('addedRuns: numbered after the plan, in a new block', () => {
  it('continues run and block numbers', () => {
    const runs = addedRuns(inventedStudy(), [
      { kind: 'path', coded: [1.5, 0.8] },
      { kind: 'path', coded: [3, 1.6] },
    ]);
    expect(runs).toEqual([
      { run: 6, standardOrder: null, replicate: 1, block: 2, originBlock: 2, kind: 'path', coded: [1.5, 0.8] },
      { run: 7, standardOrder: null, replicate: 1, block: 2, originBlock: 2, kind: 'path', coded: [3, 1.6] },
    ]);
  });
  it('after an earlier block, numbers go on from it', () => {
    const first = block('b-1', addedRuns(inventedStudy(), [{ kind: 'path', coded: [2, 1] }]));
    const plan = withAddedBlocks(inventedStudy(), [first]);
    const next = addedRuns(plan, [{ kind: 'confirmation', coded: [1, 1] }]);
    expect(next[0]).toMatchObject({ run: 7, block: 3, originBlock: 3, kind: 'confirmation' });
  });
  it('refuses nothing to add, a wrong count of settings, a setting that is not finite', () => {
    expect(() => addedRuns(inventedStudy(), [])).toThrow(/at least one run, got none/);
    expect(() => addedRuns(inventedStudy(), [{ kind: 'path', coded: [1] }])).toThrow(/one coded setting per factor \(2\), got 1/);
    expect(() => addedRuns(inventedStudy(), [{ kind: 'path', coded: [1, Number.NaN] }])).toThrow(/Time needs a finite number/);
  });
});

describe('withAddedBlocks: the plan as screens and analyses read it', () => {
  it('keeps the study as it is and appends the runs in run order, whatever the order of the blocks', () => {
    const s = inventedStudy();
    const b1 = block('b-1', addedRuns(s, [{ kind: 'path', coded: [2, 1] }]));
    const b2 = block('a-2', addedRuns(withAddedBlocks(s, [b1]), [{ kind: 'confirmation', coded: [1, 1] }]), 'confirmation');
    const one = withAddedBlocks(s, [b1, b2]);
    const two = withAddedBlocks(s, [b2, b1]);
    expect(one).toEqual(two);
    expect(one.design.runs.map((r) => r.run)).toEqual([1, 2, 3, 4, 5, 6, 7]);
    expect(s.design.runs).toHaveLength(5);
    expect(withAddedBlocks(s, [])).toBe(s);
  });
  it('two blocks made from the same plan on two devices clash on run numbers: refused, naming both', () => {
    const s = inventedStudy();
    const a = block('b-a', addedRuns(s, [{ kind: 'path', coded: [2, 1] }]));
    const b = block('b-b', addedRuns(s, [{ kind: 'confirmation', coded: [1, 1] }]), 'confirmation');
    expect(() => withAddedBlocks(s, [a, b])).toThrow(InputError);
    expect(() => withAddedBlocks(s, [a, b])).toThrow(/Run 6 .* planned twice: in the path block b-a .* and in the confirmation block b-b/);
  });
});

