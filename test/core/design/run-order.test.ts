import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { pcg32 } from '../../../src/core/design/random.ts';
import { fisherYatesShuffle, orderRuns } from '../../../src/core/design/run-order.ts';
import { InputError } from '../../../src/core/errors.ts';

// The reference demo of PCG32 (O'Neill, pcg-c-basic, pcg32-demo "Round 1") deals 52 cards with
// this shuffle after 6 raw outputs, 65 coin tosses and 33 dice rolls; cards are numbered
// 0..51 and printed as "A23456789TJQK"[card / 4] + "hcds"[card % 4].
const DEMO_DEAL =
  'Qd Ks 6d 3s 3d 4c 3h Td Kc 5c Jh Kd Jd As 4s 4h Ad Th Ac Jc 7s Qs ' +
  '2s 7h Kh 2d 6c Ah 4d Qh 9h 6s 5s 2c 9c Ts 8d 9s 3c 8c Js 5d 2h 6h ' +
  '7d 8s 9d 5h 8h Qc 7c Tc';

describe('fisherYatesShuffle', () => {
  it('deals the reference demo cards (pcg32-demo, Round 1)', () => {
    const rng = pcg32(42, 54);
    for (let i = 0; i < 6; i++) rng.next();
    for (let i = 0; i < 65; i++) rng.bounded(2);
    for (let i = 0; i < 33; i++) rng.bounded(6);
    const cards = fisherYatesShuffle(Array.from({ length: 52 }, (_, i) => i), rng);
    const text = cards.map((c) => 'A23456789TJQK'[Math.floor(c / 4)] + 'hcds'[c % 4]).join(' ');
    expect(text).toBe(DEMO_DEAL);
  });

  it('returns a permutation, and leaves empty and one-item lists alone', () => {
    fc.assert(
      fc.property(fc.array(fc.integer(), { maxLength: 40 }), fc.nat(), (xs, seed) => {
        const out = fisherYatesShuffle([...xs], pcg32(seed));
        expect([...out].sort((a, b) => a - b)).toEqual([...xs].sort((a, b) => a - b));
      }),
      { numRuns: 50 },
    );
    expect(fisherYatesShuffle([], pcg32(1))).toEqual([]);
    expect(fisherYatesShuffle(['x'], pcg32(1))).toEqual(['x']);
  });
});

describe('orderRuns', () => {
  const runs = Array.from({ length: 12 }, (_, i) => ({ id: i, block: i < 6 ? 1 : 2, coded: [i % 2 ? 1 : -1, i % 3 === 0 ? 0 : 1] }));

  it('keeps blocks in order and shuffles within them; the same seed gives the same order', () => {
    fc.assert(
      fc.property(fc.nat(), (seed) => {
        const a = orderRuns(runs, { seed });
        const b = orderRuns(runs, { seed });
        expect(a.map((r) => r.id)).toEqual(b.map((r) => r.id));
        expect(a.slice(0, 6).every((r) => r.block === 1)).toBe(true);
        expect(a.slice(6).every((r) => r.block === 2)).toBe(true);
      }),
      { numRuns: 30 },
    );
  });

  it('keeps standard order without a seed', () => {
    expect(orderRuns(runs, { seed: null }).map((r) => r.id)).toEqual(runs.map((r) => r.id));
  });

  it('keeps a hard-to-change factor sorted low to high within each block', () => {
    const out = orderRuns(runs, { seed: 5, sortBy: [1] });
    for (const b of [1, 2]) {
      const levels = out.filter((r) => r.block === b).map((r) => r.coded[1]);
      expect(levels).toEqual([...levels].sort((x, y) => x - y));
    }
  });

  it('handles no runs, and refuses an unknown sort factor', () => {
    expect(orderRuns([], { seed: 1 })).toEqual([]);
    expect(() => orderRuns(runs, { seed: 1, sortBy: [5] })).toThrow(InputError);
  });
});
