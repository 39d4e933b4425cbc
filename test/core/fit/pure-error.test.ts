import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { labelGroups, pureError, pureErrorOfGroups, settingGroups } from '../../../src/core/fit/pure-error.ts';
import { SETTING_TOLERANCE } from '../../../src/core/tolerance.ts';
import { fixtureData } from '../../helpers/fixtures.ts';

describe('pure error (Montgomery 8th ed., section 10.7; Draper and Smith, 3rd ed., ch. 2.1)', () => {
  it('the replicated 2^3 plasma etch runs give the printed error sum of squares, 18,020.50 on 8 df (Montgomery 8th ed., Table 6.6)', () => {
    const d = fixtureData('montgomery-8e-ex6-1-plasma-etch-2x3.csv', { factors: ['Gap', 'Flow', 'Power'], response: 'Etch rate' });
    const pe = pureError(d.coded, d.y, null);
    expect(pe.ss).toBeCloseTo(18020.5, 8);
    expect(pe.df).toBe(8);
    expect(pe.groups).toBe(8);
  });

  it('five center runs of the section 6.8 example: SS 0.172 on 4 df (MS 0.0430, printed)', () => {
    const d = fixtureData('montgomery-8e-ex6-6-center-points.csv', { factors: ['Time', 'Temperature'], response: 'Yield' });
    const pe = pureError(d.coded, d.y, null);
    expect(pe.df).toBe(4);
    expect(pe.ss / pe.df).toBeCloseTo(0.043, 10);
  });

  it('settingGroups: settings equal within SETTING_TOLERANCE share a group, a different block does not', () => {
    const g = settingGroups([[1, 1], [1, 1 + 1e-12], [1, 1.001], [1, 1]], [1, 1, 1, 2]);
    expect(g[0]).toBe(g[1]);
    expect(g[2]).not.toBe(g[0]);
    expect(g[3]).not.toBe(g[0]);
    expect(new Set(g).size).toBe(3);
  });

  it('settingGroups numbers the groups as the built-in stable sort with the same comparison does (property, fast-check)', () => {
    // Reference: Array.prototype.sort (stable, ECMAScript 2019) with the comparison stated in
    // pure-error.ts, group numbers given in sorted order. Settings from a few levels (some a hair
    // apart, within the tolerance) so that runs repeat.
    const level = fc.constantFrom(-1, 0, 1, 0.5, 1 + 1e-12, -1 - 1e-12);
    const runs = fc.integer({ min: 1, max: 3 }).chain((k) =>
      fc.array(fc.record({ row: fc.array(level, { minLength: k, maxLength: k }), block: fc.integer({ min: 1, max: 3 }) }), { minLength: 1, maxLength: 70 }),
    );
    fc.assert(
      fc.property(runs, fc.boolean(), (list, blocked) => {
        const coded = list.map((r) => r.row);
        const blocks = blocked ? list.map((r) => r.block) : null;
        const compare = (a: number, b: number): number => {
          if (blocks && blocks[a] !== blocks[b]) return blocks[a] - blocks[b];
          for (let f = 0; f < coded[a].length; f++) {
            const d = coded[a][f] - coded[b][f];
            if (Math.abs(d) > SETTING_TOLERANCE) return d;
          }
          return 0;
        };
        const order = coded.map((_, i) => i).sort(compare);
        const expected = new Array<number>(coded.length);
        let g = -1;
        order.forEach((r, i) => {
          if (i === 0 || compare(order[i - 1], r) !== 0) g++;
          expected[r] = g;
        });
        expect([...settingGroups(coded, blocks)]).toEqual(expected);
      }),
    );
  });

  it('labelGroups: one group per label within a block', () => {
    expect([...labelGroups(['p1', 'p2', 'p1', 'p1'], null)]).toEqual([0, 1, 0, 0]);
    expect([...labelGroups(['p1', 'p2', 'p1', 'p1'], [1, 1, 1, 2])]).toEqual([0, 1, 0, 2]);
  });

  it('pureErrorOfGroups: the sum of squares about each group mean, by hand', () => {
    // groups {1, 3} and {10, 14, 18}: SS = 2 + 32 = 34 on 1 + 2 df; the single run 7 adds nothing.
    const pe = pureErrorOfGroups(Int32Array.from([0, 0, 1, 1, 1, 2]), [1, 3, 10, 14, 18, 7]);
    expect(pe.ss).toBe(34);
    expect(pe.df).toBe(3);
    expect(pe.groups).toBe(2);
  });

  it('degenerate input: no runs, or no repeats, give no pure error', () => {
    expect(pureError([], [], null)).toEqual({ ss: 0, df: 0, groups: 0, groupOf: new Int32Array(0) });
    const none = pureError([[-1], [1]], [1, 2], null);
    expect(none.df).toBe(0);
    expect(none.ss).toBe(0);
  });
});
