/**
 * Every sentence the planning form shows about what was typed: a factor named by its letter and
 * name as its fields are ("Factor A (Temperature)"), what is missing or wrong in a factor row,
 * typed generators, a hard-to-change factor and the counts and seed. Each says what to do next,
 * in plain words (common practice: a message names the field and the fix).
 */
import type { FactorRowProblem } from '../factor/factor-row-problem.ts';

/**
 * A factor as the form's fields name it: its letter, then its name in brackets when it has one.
 * Example: factorCalled('A', 'Temperature') -> 'Factor A (Temperature)'; factorCalled('B', ' ') -> 'Factor B'.
 */
export function factorCalled(letter: string, name: string): string {
  const n = name.trim();
  return n === '' ? `Factor ${letter}` : `Factor ${letter} (${n})`;
}

const WHICH_WORD = { low: 'low setting', high: 'high setting', levelA: 'first level', levelB: 'second level' } as const;

/**
 * The sentence for one factor row's problem, naming the factor by letter and name.
 * Example: factorRowText({kind:'reversed', low:200, high:160}, 'A', 'Temperature') ->
 * 'Factor A (Temperature): the low setting (200) is above the high setting (160). The low must be
 * the smaller number: tap "Swap low and high", or type them again.'
 */
export function factorRowText(p: FactorRowProblem, letter: string, name: string): string {
  const who = factorCalled(letter, name);
  switch (p.kind) {
    case 'no-name':
      return `${who}: type a name for this factor, such as Temperature.`;
    case 'missing':
      return `${who}: type the ${WHICH_WORD[p.which]}.`;
    case 'not-a-number':
      return `${who}: the ${WHICH_WORD[p.which]} "${p.text}" is not a number. Type digits, with a point or a comma for decimals.`;
    case 'reversed':
      return `${who}: the low setting (${p.low}) is above the high setting (${p.high}). The low must be the smaller number: tap "Swap low and high", or type them again.`;
    case 'equal':
      return `${who}: the low and the high setting are both ${p.value}. Type two different settings, the smaller as the low.`;
    case 'same-level-names':
      return `${who}: both levels are called "${p.level}". Give the two levels different names, such as matte and gloss.`;
    case 'rule':
      return `${who}: ${p.message}`;
  }
}

/**
 * Two factors with one name. Example: sameFactorNames(['A','C'], 'Speed') ->
 * 'Factor A and factor C are both called "Speed". Give each factor a name of its own.'
 */
export function sameFactorNamesText(letters: readonly [string, string], name: string): string {
  return `Factor ${letters[0]} and factor ${letters[1]} are both called "${name.trim()}". Give each factor a name of its own.`;
}

/** Fewer than two factors. */
export function tooFewFactorsText(count: number): string {
  return count === 0 ? 'Add two factors: a two-level design needs at least two.' : 'Add a second factor: a two-level design needs at least two.';
}

/** A count box that does not hold a whole number. Example: countText('Center runs', 0, 'x') -> 'Center runs: type a whole number, 0 or more ("x" is not one).' */
export function countText(what: string, min: number, typed: string): string {
  return `${what}: type a whole number, ${min} or more ("${typed.trim()}" is not one).`;
}

/** A seed box that does not hold a whole number. */
export function seedText(typed: string): string {
  return `The seed "${typed.trim()}" is not a whole number. Type digits only, or leave the box blank to draw a seed.`;
}

/** The title box left blank. */
export const NO_TITLE_TEXT = 'Give the study a title, so it can be found in the list of studies.';

// Typed generators.

/** What the generators box says when it is blank: the catalog's generators are used. */
export function catalogGeneratorsHint(generators: readonly string[]): string {
  return `Blank: the catalog's generators (${generators.map(spaced).join(', ')}) are used. Type your own to replace them.`;
}

/** "E=ABCD" written as people read it: "E = ABCD" (no-break spaces, so a line never breaks inside it). */
export function spaced(generator: string): string {
  return generator.replace('=', '\u00a0=\u00a0');
}

/** A generator without exactly one equals sign or without a side. */
export function generatorShapeText(typed: string): string {
  return `"${typed}" is not a generator. Write the factor it makes, an equals sign and the product of other factors' letters, such as E = ABCD.`;
}

/** A character in a generator that is not a factor letter. */
export function generatorLetterText(typed: string, bad: string, letters: readonly string[]): string {
  return `In "${typed}", "${bad}" is not the letter of a factor above. Use the letters ${letters.join(', ')} (a minus sign may come before the product).`;
}

/** The left side of a generator names more than one factor, or has a sign. */
export function generatorLeftText(typed: string): string {
  return `In "${typed}", the left side must be one factor letter, such as E.`;
}

/** The number of typed generators does not fit the chosen fraction. */
export function generatorCountText(typed: number, needed: number, fraction: string): string {
  return `The ${fraction} fraction takes ${needed} generator${needed === 1 ? '' : 's'}; ${typed} ${typed === 1 ? 'was' : 'were'} typed. Type ${needed}, separated by commas, or choose another fraction.`;
}

/** A rule of generators the core refused (a factor made twice, dependent generators ...), with what to do. */
export function generatorRuleText(coreMessage: string): string {
  return `These generators cannot be used: ${coreMessage.replace(/\.$/, '')}. Change them, or clear the box to use the catalog's.`;
}

/** Typed generators with a design that takes none. */
export const GENERATORS_NEED_FRACTION_TEXT = 'Generators apply to a fraction only: choose a fraction above, or clear the Generators box.';

/**
 * The alias chains that join two or more effects, one line each, up to `shown`, then how many
 * more (an effect alone in its chain is left out: it is aliased with nothing listed). Example:
 * aliasListText([['AB','CD'],['AD'],['AC','BD']], 8) -> ['AB = CD', 'AC = BD'].
 */
export function aliasListText(chains: readonly (readonly string[])[], shown: number): string[] {
  const joined = chains.filter((c) => c.length > 1);
  const lines = joined.slice(0, shown).map((c) => c.join(' = '));
  const more = joined.length - shown;
  if (more > 0) lines.push(`and ${more} more chain${more === 1 ? '' : 's'}`);
  return lines;
}

// A hard-to-change factor.

/**
 * What sorting by a hard-to-change factor costs, and what it saves, in plain words: the runs are
 * grouped by its setting (shuffled within each group), so it changes seldom, but the order is not
 * fully randomized and its effect looks more certain than it is (a split-plot: Montgomery, Design
 * and Analysis of Experiments, 8th ed., section 14.5, from memory). The seed is still recorded.
 * Example: hardToChangeText('Factor A (Oven temperature)', 1, 7, 4242) -> '... changes 1 time in this run order (7 times in the fully randomized order of the same seed) ...'.
 */
export function hardToChangeText(who: string, changes: number, unsortedChanges: number | null, seed: number | null): string {
  const times = (n: number) => `${n} time${n === 1 ? '' : 's'}`;
  const saved = unsortedChanges === null ? '' : ` (${times(unsortedChanges)} in the fully randomized order of the same seed)`;
  const order = seed === null ? 'The runs keep standard order within each of its settings.' : `The runs are shuffled within each of its settings, and seed ${seed} is recorded with the plan.`;
  return (
    `${who} changes ${times(changes)} in this run order${saved}. ${order} ` +
    `The cost: the runs are not fully randomized, so a drift during the experiment can be mistaken for its effect, and its effect will look more certain than it is.`
  );
}

/** The choice of "no hard-to-change factor". */
export const NO_HARD_FACTOR_TEXT = 'None: every factor is randomized.';

// Responses and the design choice.

/** No response left on the form. */
export const NO_RESPONSE_TEXT = 'Add a response: what you will measure at each run.';

/** A response row without a name. Example: responseNameText(2) -> 'Response 2: type a name for what you will measure, such as Thickness.' */
export function responseNameText(n: number): string {
  return `Response ${n}: type a name for what you will measure, such as Thickness.`;
}

/** Two responses with one name. */
export function sameResponseNamesText(a: number, b: number, name: string): string {
  return `Response ${a} and response ${b} are both called "${name.trim()}". Give each response a name of its own.`;
}

/** A response's target or lowest value that is not a number. */
export function responseNumberText(name: string, what: 'target' | 'lowest value', typed: string): string {
  return `${name.trim()}: the ${what} "${typed.trim()}" is not a number. Type digits, with a point or a comma for decimals.`;
}

/** "Another lowest value" chosen with its box left blank. */
export function responseLowestMissingText(name: string): string {
  return `${name.trim() || 'A response'}: type the lowest value it can take, or choose "No lowest value".`;
}

/** A design choice kept from before that the form no longer offers for this many factors. */
export function notOfferedText(choice: string, factors: number): string {
  const what = choice.charAt(0).toUpperCase() + choice.slice(1);
  return `${what} is not offered for ${factors} factors; choose one of the above.`;
}
