/**
 * Design generators of a regular two-level fraction: each generated factor's column is the
 * product of basic factors' columns, possibly sign-reversed ("E=ABCD", "F=-ABC"). The basic
 * factors are those no generator defines; they form a full factorial. Generator X = s*W gives the
 * defining word I = s*XW (Montgomery, Design and Analysis of Experiments, 8th ed., section 8.3;
 * Box, Hunter and Hunter, Statistics for Experimenters, 2nd ed., chapter 6).
 */
import { InputError } from '../errors.ts';
import type { Factor } from '../factor/factor.ts';
import { termFactors } from '../model/term.ts';
import { formatWord, lettersOf, parseWord, wordLength, type Word } from './word.ts';

export interface Generator {
  /** Index of the generated factor in declared order. */
  readonly factor: number;
  /** The product of basic factors it equals, with its sign (the generated factor not included). */
  readonly product: Word;
  /** Written in letters, e.g. "E=ABCD" or "F=-ABC". */
  readonly text: string;
}

/** The defining word of a generator: X = s*W gives I = s*XW. Example: E=ABCD -> ABCDE. */
export function generatorWord(g: Generator): Word {
  return { mask: g.product.mask | (1 << g.factor), sign: g.product.sign };
}

/**
 * Most generators `k` factors can take: the largest p with k <= 2^(k-p) - 1, since 2^(k-p) runs
 * carry at most 2^(k-p) - 1 factor columns that are not the constant (a saturated design).
 * Example: maxGenerators(7) -> 4 (the 8-run 2^(7-4)); maxGenerators(2) -> 0.
 */
export function maxGenerators(k: number): number {
  let p = 0;
  while (p + 1 < k && k <= 2 ** (k - p - 1) - 1) p++;
  return p;
}

/**
 * Reads and checks generators typed by a person, e.g. ["E=ABCD", "F=-ABC"] or
 * ["Gloss=Temperature:Speed"]. The left side is one factor (letter or name); the right side an
 * optional sign and a product of two or more basic factors (letters run together, or names
 * joined by ':').
 * Throws InputError, saying which generator and why, for: no generators; more generators than
 * the run count allows (see maxGenerators); a malformed or unknown factor; a factor generated
 * twice; a generated factor used on a right side (its own or another's); a product of one factor
 * (a copy of it); two generators giving the same column (dependent generators, also when one is
 * the sign-reversed other).
 * Example: parseGenerators(['D=ABC'], fourFactors) -> [{factor:3, product:{mask:0b111,sign:1}, text:'D=ABC'}].
 */
export function parseGenerators(texts: readonly string[], factors: readonly Factor[]): Generator[] {
  const items = texts.map((t) => t.trim()).filter((t) => t !== '');
  if (items.length === 0) throw new InputError('Generators: at least one is needed, such as E=ABCD, got none');
  const k = factors.length;
  const pMax = maxGenerators(k);
  if (items.length > pMax) {
    const m = k - items.length;
    throw new InputError(
      `${items.length} generators for ${k} factors leave ${m} basic factor${m === 1 ? '' : 's'} (${2 ** Math.max(m, 0)} runs), ` +
        `which can carry at most ${Math.max(2 ** Math.max(m, 0) - 1, 0)} factors; ${k} factors take at most ${pMax} generator${pMax === 1 ? '' : 's'}`,
    );
  }
  const letters = lettersOf(factors);
  const raw = items.map((text) => {
    const eq = text.indexOf('=');
    if (eq <= 0 || eq === text.length - 1 || text.indexOf('=', eq + 1) >= 0) {
      throw new InputError(`Generator "${text}": expected FACTOR=PRODUCT such as E=ABCD or F=-ABC`);
    }
    const left = parseWord(text.slice(0, eq), factors, `Generator "${text}"`);
    if (left.sign < 0 || wordLength(left.mask) !== 1) {
      throw new InputError(`Generator "${text}": the left side must be one factor, such as E, got "${text.slice(0, eq).trim()}"`);
    }
    const product = parseWord(text.slice(eq + 1), factors, `Generator "${text}"`);
    return { text, factor: termFactors(left.mask)[0], product };
  });
  const generatedBy = new Map<number, string>();
  for (const g of raw) {
    const prev = generatedBy.get(g.factor);
    if (prev !== undefined) throw new InputError(`${letters[g.factor]} is generated twice ("${prev}" and "${g.text}"); each factor takes at most one generator`);
    generatedBy.set(g.factor, g.text);
  }
  const basic = factors.map((_, i) => i).filter((i) => !generatedBy.has(i));
  const basicText = basic.map((i) => letters[i]).join(', ');
  const out: Generator[] = [];
  for (const g of raw) {
    if ((g.product.mask >> g.factor) & 1) {
      throw new InputError(`Generator "${g.text}": ${letters[g.factor]} cannot appear in its own product`);
    }
    for (const i of termFactors(g.product.mask)) {
      const other = generatedBy.get(i);
      if (other !== undefined) {
        throw new InputError(`Generator "${g.text}": ${letters[i]} is itself generated ("${other}"); write the product from the basic factors ${basicText}`);
      }
    }
    if (wordLength(g.product.mask) < 2) {
      throw new InputError(`Generator "${g.text}" makes ${letters[g.factor]} a copy of ${formatWord(g.product, letters)}; the product needs two or more basic factors`);
    }
    const twin = out.find((h) => h.product.mask === g.product.mask);
    if (twin) {
      const rev = twin.product.sign !== g.product.sign;
      throw new InputError(
        `Generators "${twin.text}" and "${g.text}" are dependent: they give ${letters[twin.factor]} and ${letters[g.factor]} the same column` +
          `${rev ? ' (sign-reversed)' : ''}, so their effects could not be told apart`,
      );
    }
    out.push({ factor: g.factor, product: g.product, text: `${letters[g.factor]}=${formatWord(g.product, letters)}` });
  }
  return out;
}
