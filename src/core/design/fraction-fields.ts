/**
 * The fields of a design record that describe its two-level fraction, written from the
 * generators and the defining relation in one way for every design that has a factorial part
 * (a factorial or fraction, and the cube of a central composite design): the generators as
 * typed, the relation's words in letters, the resolution (the shortest word's length) and the
 * word-length pattern (Box and Hunter 1961, Technometrics 3, 311-351).
 */
import type { Design } from './design.ts';
import { resolution, wordLengthPattern } from './defining-relation.ts';
import type { Generator } from './generators.ts';
import { formatWord, type Word } from './word.ts';

export type FractionFields = Pick<Design, 'generators' | 'definingRelation' | 'resolution' | 'wordLengths'>;

/**
 * The fraction's fields of a design record. `letters` are the factors' letters in declared order.
 * Cost O(words x factors).
 * Example: generators [E=ABCD] with relation [ABCDE] -> { generators: ['E=ABCD'],
 * definingRelation: ['ABCDE'], resolution: 5, wordLengths: {5: 1} }; a full factorial -> [], [], null, {}.
 */
export function fractionFields(generators: readonly Generator[], relation: readonly Word[], letters: readonly string[]): FractionFields {
  return {
    generators: generators.map((g) => g.text),
    definingRelation: relation.map((w) => formatWord(w, letters)),
    resolution: resolution(relation),
    wordLengths: wordLengthPattern(relation),
  };
}
