/**
 * A plan's power in plain words for the person at the machine: "with these 20 runs and noise of
 * about 1.5, an effect of 2 is found about 2 times in 3", then the smallest effect found at the
 * target power and the replicates that reach it, or, when the model leaves no residual degrees of
 * freedom, that no t test is possible (Lenth's method applies instead). A chance is said as the
 * nearest simple "n times in m" (common practice for speaking of chances to non-statisticians).
 */
import { InputError } from '../errors.ts';
import { MAX_RUNS } from '../design/run-limit.ts';
import type { PlanPower } from './power.ts';

/** Denominators tried for "n times in m" (a design choice: halves, thirds, quarters, fifths and tenths are easy to picture). */
const DENOMINATORS = [2, 3, 4, 5, 10] as const;

/** A number as a person reads it: 3 significant digits, no trailing zeros. Example: num(2.4567) -> "2.46". */
function num(x: number): string {
  return String(Number(x.toPrecision(3)));
}

/**
 * A probability as "n times in m": the fraction n/m (m = 2, 3, 4, 5 or 10) nearest to p,
 * smallest m on a tie; "more than 9 times in 10" or "less than 1 time in 10" where no such
 * fraction is nearer; "almost always, more than 99 times in 100" above 0.99 and "hardly ever,
 * less than 1 time in 100" below 0.01. Throws InputError for p outside 0 to 1.
 * Example: chanceInWords(0.67) -> "about 2 times in 3"; chanceInWords(0.5) -> "about 1 time in 2".
 */
export function chanceInWords(p: number): string {
  if (!(p >= 0 && p <= 1)) throw new InputError(`A chance is a probability from 0 to 1, got ${p}`);
  if (p > 0.99) return 'almost always, more than 99 times in 100';
  if (p < 0.01) return 'hardly ever, less than 1 time in 100';
  let best = { n: 0, m: 1, err: Infinity };
  for (const m of DENOMINATORS) {
    const n = Math.round(p * m);
    const err = Math.abs(p - n / m);
    if (n >= 1 && n < m && err < best.err - 1e-12) best = { n, m, err };
  }
  // Only past 0.95 or below 0.05 does no n/m with 0 < n < m come nearer than 1/10 or 9/10.
  if (best.n === 0) return p < 0.5 ? 'less than 1 time in 10' : 'more than 9 times in 10';
  return `about ${best.n} time${best.n === 1 ? '' : 's'} in ${best.m}`;
}

/**
 * The sentences the planning screen and the design command show under a plan's power.
 * Example: for 20 runs, sigma 1.5, effect 2, power 0.66, target 0.8, smallest effect 2.52,
 * 2 replicates needed -> "With these 20 runs and noise of about 1.5, an effect of 2 is found
 * about 2 times in 3 (power 0.66 at significance 0.05). An effect of 2.52 or more is found with
 * the target power 0.8. 2 replicates of the plan (40 runs) find an effect of 2 with power 0.8 or
 * more."
 */
export function powerInWords(p: PlanPower): string {
  const head = `With these ${p.runs} runs and noise of about ${num(p.sigma)}`;
  const parts: string[] = [];
  if (p.power === null || p.smallestEffect === null) {
    parts.push(
      `${head}, the model leaves no residual degrees of freedom, so no t test of an effect is possible: add replicates or center runs, or judge the effects by Lenth's method (a half-normal plot of the effects) instead.`,
    );
  } else {
    parts.push(`${head}, an effect of ${num(p.effect)} is found ${chanceInWords(p.power)} (power ${num(p.power)} at significance ${num(p.significance)}).`);
    parts.push(`An effect of ${num(p.smallestEffect)} or more is found with the target power ${num(p.target)}.`);
  }
  const perCopy = p.runs / p.replicates;
  if (p.replicatesNeeded === null) {
    parts.push(`No number of replicates within the ${MAX_RUNS}-run limit finds an effect of ${num(p.effect)} with power ${num(p.target)}; a larger effect, less noise or another plan is needed.`);
  } else if (p.power !== null && p.replicatesNeeded <= p.replicates) {
    parts.push(
      p.replicatesNeeded === p.replicates
        ? `The plan as it stands reaches the target power for an effect of ${num(p.effect)}.`
        : `${p.replicatesNeeded} replicate${p.replicatesNeeded === 1 ? '' : 's'} (${p.replicatesNeeded * perCopy} runs) would already reach the target power for an effect of ${num(p.effect)}.`,
    );
  } else {
    parts.push(
      `${p.replicatesNeeded} replicate${p.replicatesNeeded === 1 ? '' : 's'} of the plan (${p.replicatesNeeded * perCopy} runs) find${p.replicatesNeeded === 1 ? 's' : ''} an effect of ${num(p.effect)} with power ${num(p.target)} or more.`,
    );
  }
  return parts.join(' ');
}
