/**
 * The sentences of the quick card's block "All responses at these settings": each response's
 * prediction and its desirability d, and the overall desirability D (Derringer and Suich 1980,
 * Journal of Quality Technology 12, 214-219), at the card's settings.
 */

/** The block's heading. */
export const RESPONSES_AT_SETTINGS = 'All responses at these settings';

/** Where the limits of d come from, in one line under the heading. */
export const RESPONSES_AT_LIMITS = "d uses each response's goal with limits from the logged values; set them on the all-responses screen.";

/** The label of the overall desirability. */
export const OVERALL_D_LABEL = 'Overall D';

/** In place of a number: why a response gives none on this block. */
export type NoValueReason = 'not-fitted' | 'transformed' | 'no-limits' | 'not-available';

const WORDS: Record<NoValueReason, string> = {
  'not-fitted': 'not fitted yet',
  transformed: 'transformed scale',
  'no-limits': 'no limits yet',
  'not-available': 'not available',
};

/**
 * The plain word shown instead of a number.
 * Example: noValueWord('transformed') -> 'transformed scale'.
 */
export function noValueWord(reason: NoValueReason): string {
  return WORDS[reason];
}

/**
 * Why there is no overall D, naming the responses without a d and what to do.
 * Example: overallMissing(['Gloss']) -> 'No overall D: Gloss has no d here. Open the all-responses
 * screen to see why and to set its goal or limits.'
 */
export function overallMissing(names: readonly string[]): string {
  const who = names.length === 1 ? `${names[0]} has` : `${names.slice(0, -1).join(', ')} and ${names[names.length - 1]} have`;
  return `No overall D: ${who} no d here. Open the all-responses screen to see why and to set ${names.length === 1 ? 'its' : 'their'} goal or limits.`;
}
