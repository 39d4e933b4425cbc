import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { drawSeed, MAX_SEED, pcg32 } from '../../../src/core/design/random.ts';
import { InputError } from '../../../src/core/errors.ts';

// The reference demo of PCG32 (O'Neill, pcg-c-basic, pcg32-demo "Round 1"), seeded with state 42
// and stream 54: six raw outputs, then 65 coin tosses with pcg32_boundedrand_r(2) and 33 dice
// rolls with pcg32_boundedrand_r(6) + 1.
const DEMO_OUTPUTS = [0xa15c02b7, 0x7b47f409, 0xba1d3330, 0x83d2f293, 0xbfa4784b, 0xcbed606e];
const DEMO_COINS = 'HHTTTHTHHHTHTTTHHHHHTTTHHHTHTHTHTTHTTTHHHHHHTTTTHHTTTTTHTTTTTTTHT';
const DEMO_ROLLS = '3 4 1 1 2 2 3 2 4 3 2 4 3 3 5 2 3 1 3 1 5 1 4 1 5 6 4 6 6 2 6 3 3';

describe('pcg32', () => {
  it('reproduces the reference demo outputs, coins and rolls (pcg32-demo, Round 1)', () => {
    const rng = pcg32(42, 54);
    expect(DEMO_OUTPUTS.map(() => rng.next())).toEqual(DEMO_OUTPUTS);
    let coins = '';
    for (let i = 0; i < 65; i++) coins += rng.bounded(2) ? 'H' : 'T';
    expect(coins).toBe(DEMO_COINS);
    const rolls: number[] = [];
    for (let i = 0; i < 33; i++) rolls.push(rng.bounded(6) + 1);
    expect(rolls.join(' ')).toBe(DEMO_ROLLS);
  });

  it('uses stream 54 by default, so seed 42 alone gives the demo vector', () => {
    expect(pcg32(42).next()).toBe(0xa15c02b7);
  });

  it('gives the same numbers for the same seed, and numbers in range', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: MAX_SEED }), fc.integer({ min: 1, max: 1000 }), (seed, bound) => {
        const a = pcg32(seed);
        const b = pcg32(seed);
        for (let i = 0; i < 20; i++) {
          const x = a.bounded(bound);
          expect(x).toBe(b.bounded(bound));
          expect(x >= 0 && x < bound).toBe(true);
        }
      }),
      { numRuns: 50 },
    );
  });

  it('refuses degenerate seeds and bounds', () => {
    expect(() => pcg32(-1)).toThrow(InputError);
    expect(() => pcg32(1.5)).toThrow(/whole number from 0/);
    expect(() => pcg32(Number.MAX_SAFE_INTEGER + 2)).toThrow(InputError);
    expect(() => pcg32(1, -3)).toThrow(/stream/);
    expect(() => pcg32(1).bounded(0)).toThrow(/bound from 1/);
    expect(pcg32(1).bounded(1)).toBe(0);
  });
});

describe('drawSeed', () => {
  it('draws a 32-bit seed from crypto.getRandomValues', () => {
    const s = drawSeed();
    expect(Number.isInteger(s) && s >= 0 && s < 2 ** 32).toBe(true);
  });

  it('refuses to guess when the platform has no random source', () => {
    const saved = Object.getOwnPropertyDescriptor(globalThis, 'crypto');
    Object.defineProperty(globalThis, 'crypto', { value: undefined, configurable: true, writable: true });
    try {
      expect(() => drawSeed()).toThrow(/give a seed/);
    } finally {
      if (saved) Object.defineProperty(globalThis, 'crypto', saved);
    }
  });
});
