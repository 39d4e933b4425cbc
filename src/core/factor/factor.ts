/**
 * Factors in real units. A numeric factor has a low and a high setting (optionally coded on a
 * log scale); a categorical factor has exactly two named levels, the first coded -1.
 */
import { InputError } from '../errors.ts';
import { factorLetters } from './letters.ts';

export interface NumericFactor {
  readonly kind: 'numeric';
  readonly name: string;
  /** A, B, C ... in declared order, skipping I. */
  readonly letter: string;
  readonly low: number;
  readonly high: number;
  readonly unit?: string;
  /** 'log': coded on log(u), so the center is the geometric mean of low and high. */
  readonly scale?: 'linear' | 'log';
}

export interface CategoricalFactor {
  readonly kind: 'categorical';
  readonly name: string;
  readonly letter: string;
  /** levels[0] is coded -1, levels[1] is coded +1. */
  readonly levels: readonly [string, string];
}

export type Factor = NumericFactor | CategoricalFactor;

/** What a person declares; the letter is assigned from the declared order. */
export type FactorSpec =
  | Omit<NumericFactor, 'letter'>
  | Omit<CategoricalFactor, 'letter'>;

/**
 * Validates factor declarations and assigns their letters in declared order.
 * Throws InputError for an empty or duplicate name, equal levels, a non-finite setting, or a
 * log scale on a setting that is not positive.
 * Example: defineFactors([{kind:'numeric',name:'Temperature',low:160,high:200}])[0].letter -> 'A'.
 */
export function defineFactors(specs: readonly FactorSpec[]): Factor[] {
  if (specs.length === 0) throw new InputError('A study needs at least one factor, got none');
  const letters = factorLetters(specs.length);
  const seen = new Map<string, number>();
  return specs.map((spec, i) => {
    const name = spec.name.trim();
    if (name === '') throw new InputError(`Factor ${i + 1} needs a name, got an empty one`);
    const key = name.toLowerCase();
    if (seen.has(key)) {
      throw new InputError(`Factor names must differ, got "${name}" twice (factors ${seen.get(key)! + 1} and ${i + 1})`);
    }
    seen.set(key, i);
    if (spec.kind === 'numeric') {
      const { low, high } = spec;
      if (!Number.isFinite(low) || !Number.isFinite(high)) {
        throw new InputError(`${name} needs numeric low and high settings, got ${low} and ${high}`);
      }
      if (low === high) throw new InputError(`${name} needs two different levels, got ${low} and ${high}`);
      if (spec.scale === 'log' && (low <= 0 || high <= 0)) {
        throw new InputError(`${name} on a log scale needs positive settings, got ${low} and ${high}`);
      }
      return { ...spec, name, letter: letters[i] } as NumericFactor;
    }
    const [a, b] = spec.levels.map((l) => l.trim());
    if (!a || !b) throw new InputError(`${name} needs two named levels, got "${spec.levels[0]}" and "${spec.levels[1]}"`);
    if (a.toLowerCase() === b.toLowerCase()) throw new InputError(`${name} needs two different levels, got "${a}" and "${b}"`);
    return { kind: 'categorical', name, letter: letters[i], levels: [a, b] } as CategoricalFactor;
  });
}

/** Finds a factor by name (case-insensitive) or letter; undefined when none matches. */
export function findFactor(factors: readonly Factor[], nameOrLetter: string): Factor | undefined {
  const key = nameOrLetter.trim().toLowerCase();
  return factors.find((f) => f.name.toLowerCase() === key) ?? factors.find((f) => f.letter.toLowerCase() === key);
}
