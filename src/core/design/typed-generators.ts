/**
 * Generators as a person types them in one box on the planning form: "E = ABCD", several
 * separated by commas or semicolons, letters in either case, an optional minus sign before the
 * product ("F = -ABC"). The shape and the letters are checked here with plain messages; the
 * rules of a set of generators (a factor made twice, dependent generators ...) are those of
 * parseGenerators (Montgomery, Design and Analysis of Experiments, 8th ed., section 8.3).
 */
import { InputError } from '../errors.ts';
import type { Factor } from '../factor/factor.ts';
import { generatorCountText, generatorLeftText, generatorLetterText, generatorRuleText, generatorShapeText } from '../text/plan-form-text.ts';
import { parseGenerators } from './generators.ts';

/**
 * Splits and checks the typed generators for `factors` and a 1/2^p fraction (`fraction` written
 * as "1/4", `p` generators needed). Returns them written as the core keeps them ("E=ABCD").
 * An empty box returns null (the catalog's generators apply). Cost: linear in the text.
 * Throws InputError, in plain words with what to do, for a piece without one equals sign, a
 * character that is not a factor letter, a left side of more than one letter, the wrong count,
 * or a set parseGenerators refuses.
 * Example: readTypedGenerators('e = abcd', fiveFactors, '1/2', 1) -> ['E=ABCD'].
 */
export function readTypedGenerators(text: string, factors: readonly Factor[], fraction: string, p: number): string[] | null {
  const pieces = text.split(/[,;\n]/).map((t) => t.trim()).filter((t) => t !== '');
  if (pieces.length === 0) return null;
  const letters = factors.map((f) => f.letter);
  const known = new Set(letters);
  const out = pieces.map((piece) => {
    const sides = piece.split('=');
    if (sides.length !== 2 || sides[0].trim() === '' || sides[1].trim() === '') throw new InputError(generatorShapeText(piece));
    const left = sides[0].replace(/\s+/g, '').toUpperCase();
    const right = sides[1].replace(/\s+/g, '').toUpperCase();
    const product = right.startsWith('-') ? right.slice(1) : right;
    for (const ch of [...left, ...product]) if (!known.has(ch)) throw new InputError(generatorLetterText(piece, ch, letters));
    if (left.length !== 1) throw new InputError(generatorLeftText(piece));
    return `${left}=${right}`;
  });
  if (out.length !== p) throw new InputError(generatorCountText(out.length, p, fraction));
  try {
    return parseGenerators(out, factors).map((g) => g.text);
  } catch (err) {
    if (err instanceof InputError) throw new InputError(generatorRuleText(err.message));
    throw err;
  }
}
