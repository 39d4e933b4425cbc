/**
 * The sentences of the several-responses screen: what each goal's values mean, what went wrong
 * with a typed value, and, when no setting inside the tested box brings every response within
 * its acceptable values (overall desirability 0), which responses fall short and by how much.
 * The meaning of d follows Derringer and Suich (1980), Journal of Quality Technology 12, 214-219.
 */
import { shortNumber } from './number-text.ts';

/** A response's goal on the several-responses screen; 'ignore' leaves it out of the overall desirability. */
export type DesirabilityGoalChoice = 'max' | 'min' | 'target' | 'ignore';

/** The value a field holds, named in messages. */
export type EntryRole = 'acceptable' | 'ideal' | 'target' | 'lowest' | 'highest' | 'weight' | 'shape' | 'shapeAbove';

const ROLE_WORDS: Record<EntryRole, string> = {
  acceptable: 'the acceptable value',
  ideal: 'the ideal value',
  target: 'the target',
  lowest: 'the lowest acceptable value',
  highest: 'the highest acceptable value',
  weight: 'the importance',
  shape: 'the shape',
  shapeAbove: 'the shape above the target',
};

/**
 * The field's name inside a reading message ("Gloss: the acceptable value"), for readNumber.
 * Example: entryFieldWhat('Gloss', 'ideal') -> 'Gloss: the ideal value'.
 */
export function entryFieldWhat(response: string, role: EntryRole): string {
  return `${response}: ${ROLE_WORDS[role]}`;
}

function withUnit(x: number, unit: string | undefined): string {
  return unit ? `${shortNumber(x)} ${unit}` : shortNumber(x);
}

/**
 * Why a maximize or minimize entry's two values are out of order, and what to type instead.
 * Example: entryOrderMessage('Gloss', 'max', 80, 70) -> 'Gloss: to maximize, the ideal value must
 * be above the acceptable one, got acceptable 80 and ideal 70. Type an ideal value above 80.'
 */
export function entryOrderMessage(response: string, goal: 'max' | 'min', acceptable: number, ideal: number): string {
  const side = goal === 'max' ? 'above' : 'below';
  return `${response}: to ${goal === 'max' ? 'maximize' : 'minimize'}, the ideal value must be ${side} the acceptable one, got acceptable ${shortNumber(acceptable)} and ideal ${shortNumber(ideal)}. Type an ideal value ${side} ${shortNumber(acceptable)}.`;
}

/**
 * Why a target entry's three values are out of order.
 * Example: targetOrderMessage('Thickness', 60, 85, 80) -> 'Thickness: the target must lie between
 * the lowest and the highest acceptable values, got 60, 85 and 80. Type them so that lowest <
 * target < highest.'
 */
export function targetOrderMessage(response: string, lowest: number, target: number, highest: number): string {
  return `${response}: the target must lie between the lowest and the highest acceptable values, got ${shortNumber(lowest)}, ${shortNumber(target)} and ${shortNumber(highest)}. Type them so that lowest < target < highest.`;
}

/**
 * Why an importance or shape is refused.
 * Example: positiveMessage('Gloss', 'weight', 0) -> 'Gloss: the importance must be a number above
 * 0, got 0. 1 is the usual choice.'
 */
export function positiveMessage(response: string, role: 'weight' | 'shape' | 'shapeAbove', value: number): string {
  return `${response}: ${ROLE_WORDS[role]} must be a number above 0, got ${shortNumber(value)}. 1 is the usual choice.`;
}

/** After a refused value: the result shown is the one from before it. */
export const STILL_USES_BEFORE = 'The best setting shown still uses the values from before this change.';

/**
 * What a goal's values mean, under its fields.
 * Example: goalMeaning('max') -> 'Desirability d is 0 at or below the acceptable value and 1 at or
 * above the ideal value, rising in a straight line between (shape 1).'
 */
export function goalMeaning(goal: DesirabilityGoalChoice): string {
  switch (goal) {
    case 'max':
      return 'Desirability d is 0 at or below the acceptable value and 1 at or above the ideal value, rising in a straight line between (shape 1).';
    case 'min':
      return 'Desirability d is 1 at or below the ideal value and 0 at or above the acceptable value, falling in a straight line between (shape 1).';
    case 'target':
      return 'Desirability d is 1 at the target and 0 at or beyond the lowest and highest acceptable values, in straight lines between (shape 1).';
    case 'ignore':
      return 'Left out of the overall desirability; its prediction is still shown at the best setting.';
  }
}

/** What the importance and shape do, inside the folded part of a response's entry. */
export const WEIGHT_SHAPE_MEANING =
  'Importance weighs this response in the overall desirability (2 counts it twice as much as 1). A shape above 1 asks for values nearer the ideal before d rises; below 1, d rises sooner.';

/** Under the screen's heading. */
export const SEVERAL_INTRO = 'Set what you want of each response; the best compromise inside the tested box is below. Each response uses the model chosen for it on the Effects screen.';

/** When a prediction interval cannot be given at the best setting. */
export const NO_INTERVAL = 'not available (no runs left over to estimate the noise)';

/**
 * How the best setting was found, from the search's own description.
 * Example: howFound('compass search ...', 'a corner of the box') -> 'Found by compass search ...;
 * it started from a corner of the box. It is the best found, not a proven optimum.'
 */
export function howFound(method: string, bestStart: string): string {
  return `Found by ${method}; it started from ${bestStart}. It is the best found, not a proven optimum.`;
}

/** When every response is set to ignore. */
export const NOTHING_TO_OPTIMIZE = 'Every response is set to Ignore: give at least one response a goal to find a best setting.';

/** When the study has a single response. */
export const ONE_RESPONSE_ONLY = 'This study has one response: the best setting for it is on the Effects screen with the quadratic model, and this screen weighs several responses.';

/**
 * A response whose chosen analysis has a transform: the search works on the response as measured.
 * Example: transformedMessage('Gloss') -> 'Gloss is analyzed on a transformed scale (chosen on the
 * Effects screen), which this screen cannot weigh yet. Choose "As measured" for it there, or set
 * its goal to Ignore here.'
 */
export function transformedMessage(response: string): string {
  return `${response} is analyzed on a transformed scale (chosen on the Effects screen), which this screen cannot weigh yet. Choose "As measured" for it there, or set its goal to Ignore here.`;
}

/**
 * A response whose analysis cannot be used, with the analysis's own reason.
 * Example: notFittedMessage('Gloss', 'No runs logged yet.') -> 'Gloss cannot be used yet: No runs
 * logged yet. Set its goal to Ignore to weigh the others.'
 */
export function notFittedMessage(response: string, reason: string): string {
  return `${response} cannot be used yet: ${reason} Set its goal to Ignore to weigh the others.`;
}

/** One response outside its acceptable values at the point found. */
export interface Shortfall {
  readonly name: string;
  readonly unit?: string;
  readonly fit: number;
  /** The acceptable value it misses. */
  readonly limit: number;
  readonly side: 'below' | 'above';
}

/**
 * The plain words for an overall desirability of 0: no setting found inside the tested box
 * brings every response within its acceptable values; the point shown comes nearest; which
 * responses miss, and what to change.
 * Example: noSettingMeetsAll([{ name: 'Gloss', unit: 'GU', fit: 62, limit: 70, side: 'below' }])
 * -> 'No setting inside the tested box brings every response within its acceptable values
 * (overall desirability 0). At the nearest setting found, Gloss is predicted at 62 GU, below its
 * acceptable 70 GU. Widen that limit, set a response to Ignore, or, where the machine's rated
 * limits allow, plan runs beyond the tested box.'
 */
export function noSettingMeetsAll(short: readonly Shortfall[]): string {
  const head = 'No setting inside the tested box brings every response within its acceptable values (overall desirability 0).';
  const parts = short.map((s) => `${s.name} is predicted at ${withUnit(s.fit, s.unit)}, ${s.side} its acceptable ${withUnit(s.limit, s.unit)}`);
  const which = parts.length === 0 ? '' : ` At the nearest setting found, ${parts.length === 1 ? parts[0] : `${parts.slice(0, -1).join('; ')} and ${parts[parts.length - 1]}`}.`;
  return `${head}${which} Widen ${short.length > 1 ? 'those limits' : 'that limit'}, set a response to Ignore, or, where the machine's rated limits allow, plan runs beyond the tested box.`;
}

/**
 * The overall desirability in words, beside its number.
 * Example: overallWords(1) -> 'Every response at its ideal value.'; overallWords(0.58) -> 'Every
 * response within its acceptable values.'
 */
export function overallWords(D: number): string {
  if (D >= 1) return 'Every response at its ideal value.';
  if (D > 0) return 'Every response within its acceptable values.';
  return 'Some response outside its acceptable values.';
}
