/**
 * The pseudo-random generator behind randomized run orders: PCG32, the XSH-RR member of the PCG
 * family (O'Neill 2014, "PCG: A Family of Simple Fast Space-Efficient Statistically Good
 * Algorithms for Random Number Generation", Harvey Mudd College report HMC-CS-2014-0905), exactly
 * as in the minimal reference implementation `pcg32_random_r` / `pcg32_srandom_r` /
 * `pcg32_boundedrand_r`. It uses only integer arithmetic (64-bit state held as a BigInt), so the
 * same seed gives the same numbers on every device and engine.
 *
 *   state' = state * 6364136223846793005 + inc  (mod 2^64), inc = 2*stream + 1
 *   output = rotr32(((state >> 18) ^ state) >> 27, state >> 59)   (computed from the old state)
 *
 * Test vector: seeded with state 42 and stream 54 the first outputs are 0xa15c02b7, 0x7b47f409,
 * 0xba1d3330, 0x83d2f293, 0xbfa4784b, 0xcbed606e (the reference demo's "Round 1").
 */
import { InputError } from '../errors.ts';

const MASK64 = (1n << 64n) - 1n;
/** The 64-bit LCG multiplier of the reference implementation (O'Neill 2014). */
const MULTIPLIER = 6364136223846793005n;

/** Stream (sequence) used for run orders: 54, the reference demo's, so seed 42 reproduces its vector. */
export const RUN_ORDER_STREAM = 54;

/** Largest seed accepted: seeds are whole numbers from 0 to 2^53 - 1, so they survive JSON. */
export const MAX_SEED = Number.MAX_SAFE_INTEGER;

export interface Pcg32 {
  /** Next 32-bit output, as a number from 0 to 2^32 - 1. */
  next(): number;
  /**
   * Unbiased whole number from 0 to bound - 1 by rejection, as the reference
   * `pcg32_boundedrand_r`: draws below (2^32 - bound) mod bound are rejected.
   * Throws InputError unless 1 <= bound <= 2^32.
   * Example: pcg32(42, 54) then 65 draws of bounded(2) give the demo's coin tosses.
   */
  bounded(bound: number): number;
}

function checkSeed(seed: number, what: string): bigint {
  if (!Number.isSafeInteger(seed) || seed < 0) {
    throw new InputError(`The ${what} must be a whole number from 0 to ${MAX_SEED}, got ${seed}`);
  }
  return BigInt(seed);
}

/**
 * PCG32 seeded as the reference `pcg32_srandom_r(rng, initstate, initseq)`: state = 0,
 * inc = 2*initseq + 1, step, state += initstate, step. Cost: a few BigInt operations per draw.
 * Throws InputError for a seed or stream that is not a whole number from 0 to 2^53 - 1.
 * Example: pcg32(42, 54).next() -> 0xa15c02b7 (2707161783).
 */
export function pcg32(initState: number, initSeq: number = RUN_ORDER_STREAM): Pcg32 {
  const s0 = checkSeed(initState, 'seed');
  const inc = ((checkSeed(initSeq, 'stream') << 1n) | 1n) & MASK64;
  let state = 0n;
  const step = (): number => {
    const old = state;
    state = (old * MULTIPLIER + inc) & MASK64;
    const xorshifted = Number((((old >> 18n) ^ old) >> 27n) & 0xffffffffn);
    const rot = Number(old >> 59n);
    return ((xorshifted >>> rot) | (xorshifted << ((32 - rot) & 31))) >>> 0;
  };
  step();
  state = (state + s0) & MASK64;
  step();
  return {
    next: step,
    bounded(bound: number): number {
      if (!Number.isInteger(bound) || bound < 1 || bound > 2 ** 32) {
        throw new InputError(`A bounded draw needs a whole bound from 1 to 2^32, got ${bound}`);
      }
      const threshold = (2 ** 32 - bound) % bound;
      for (;;) {
        const r = step();
        if (r >= threshold) return r % bound;
      }
    },
  };
}

/**
 * Draws a fresh seed from the platform's cryptographic source (globalThis.crypto.getRandomValues,
 * present in browsers and in Node 20 and later): a whole number from 0 to 2^32 - 1, so it is short
 * to write down. Math.random is never used. Throws InputError when no such source exists, asking
 * for a seed instead.
 * Example: drawSeed() -> 3005918226 (any value; record it in the plan).
 */
export function drawSeed(): number {
  const c = (globalThis as { crypto?: { getRandomValues?: (a: Uint32Array) => Uint32Array } }).crypto;
  if (!c || typeof c.getRandomValues !== 'function') {
    throw new InputError('This device offers no random source (crypto.getRandomValues) to draw a seed from; give a seed, e.g. 7');
  }
  const a = new Uint32Array(1);
  c.getRandomValues(a);
  return a[0];
}
