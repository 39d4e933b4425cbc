import { describe, expect, it } from 'vitest';
import { yatesCells } from '../../../src/core/fit/fit-yates.ts';
import { findRepeats } from '../../../src/core/fit/repeats.ts';
import { fixtureData } from '../../helpers/fixtures.ts';

const etch = fixtureData('montgomery-8e-ex6-1-plasma-etch-2x3.csv', { factors: ['Gap', 'Flow', 'Power'], response: 'Etch rate' });
const points = etch.coded.map((row) => row.join(','));

describe('findRepeats', () => {
  it('exact repeats, found by settings, by Yates cell or by planned point, give the printed pure error (Montgomery 8th ed., Table 6.6: 18,020.50 on 8 df)', () => {
    const bySettings = findRepeats({ coded: etch.coded, y: etch.y, blocks: null, cells: null, k: 3 });
    const byCell = findRepeats({ coded: etch.coded, y: etch.y, blocks: null, cells: yatesCells(etch.coded, 3), k: 3 });
    const byPoint = findRepeats({ coded: etch.coded, y: etch.y, points, blocks: null, cells: null, k: 3 });
    for (const r of [bySettings, byCell, byPoint]) {
      expect(r.pure.ss).toBeCloseTo(18020.5, 8);
      expect(r.pure.df).toBe(8);
      expect(r.nearReplicates).toBe(0);
    }
  });

  it('counts the planned repeats whose actual settings differ slightly (near replicates)', () => {
    // Invented setting errors on the second run of the first three points only.
    const seen = new Map<string, number>();
    const off = etch.coded.map((row, i) => {
      const n = (seen.get(points[i]) ?? 0) + 1;
      seen.set(points[i], n);
      return n === 2 && seen.size <= 3 ? row.map((v) => v + 0.01) : row;
    });
    const r = findRepeats({ coded: off, y: etch.y, points, blocks: null, cells: null, k: 3 });
    expect(r.pure.df).toBe(8);
    expect(r.nearReplicates).toBe(3);
    expect(findRepeats({ coded: off, y: etch.y, blocks: null, cells: null, k: 3 }).pure.df).toBe(5);
  });

  it('on the Yates path all center runs form one group; blocks split groups', () => {
    const c = fixtureData('montgomery-8e-ex6-6-center-points.csv', { factors: ['Time', 'Temperature'], response: 'Yield' });
    const r = findRepeats({ coded: c.coded, y: c.y, blocks: null, cells: yatesCells(c.coded, 2), k: 2 });
    expect(r.pure.df).toBe(4);
    expect(new Set([...r.groups].slice(4)).size).toBe(1);
    const blocked = findRepeats({ coded: etch.coded, y: etch.y, blocks: etch.y.map((_, i) => (i % 2) + 1), cells: null, k: 3 });
    expect(blocked.pure.df).toBe(0); // each pair of repeats sits in two blocks in this file's order
  });

  it('degenerate input: no runs give no repeats', () => {
    const r = findRepeats({ coded: [], y: [], blocks: null, cells: null, k: 2 });
    expect(r.pure.df).toBe(0);
    expect(r.groups.length).toBe(0);
  });
});
