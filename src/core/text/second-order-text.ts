/**
 * The sentences the phone shows about a second-order design and a quadratic model: the
 * comparison of a design before it is made, the warning on an axial run outside the factorial
 * range, and the canonical analysis and best setting in plain words a technician reads in
 * seconds. The readings of the eigenvalue signs follow Montgomery, Design and Analysis of
 * Experiments, 8th ed., section 11.3.2 (from memory); the ridge rule is canonical-analysis.ts's.
 */
import type { Factor } from '../factor/factor.ts';
import type { Goal } from '../optimum/box-optimum.ts';
import type { SurfaceNature } from '../optimum/canonical-analysis.ts';
import { formatSetting } from '../predict/parse-settings.ts';
import { shortNumber } from './number-text.ts';

/**
 * Why the second-order designs cannot be offered: the categorical factors by name.
 * Example: secondOrderNeedsNumeric(['Powder']) -> 'Second-order designs set each factor between
 * and beyond its levels, so they need numeric factors: Powder has named levels. Change it to
 * numbers, or remove it, to plan one.'
 */
export function secondOrderNeedsNumeric(names: readonly string[]): string {
  const one = names.length === 1;
  return `Second-order designs set each factor between and beyond its levels, so they need numeric factors: ${names.join(', ')} ${one ? 'has' : 'have'} named levels. Change ${one ? 'it' : 'them'} to numbers, or remove ${one ? 'it' : 'them'}, to plan one.`;
}

/**
 * The scaled prediction variance N Var(y-hat)/sigma^2 in words (Myers, Montgomery and
 * Anderson-Cook, Response Surface Methodology, 3rd ed., section 8.1, from memory).
 * Example: predictionVarianceWords(2.6, 3.2) -> 'Scaled prediction variance 2.6 at the center and
 * 3.2 at distance 1 (lower means steadier predictions).'
 */
export function predictionVarianceWords(center: number, atOne: number): string {
  return `Scaled prediction variance ${shortNumber(center, 3)} at the center and ${shortNumber(atOne, 3)} at distance 1 (lower means steadier predictions).`;
}

/** When the runs cannot estimate the full quadratic model, so no prediction variance exists. */
export const NO_FULL_QUADRATIC = 'These runs cannot estimate the full second-order model: add center runs or choose another design.';

/**
 * The run form's warning on one axial run whose setting lies outside the factorial range, with
 * the check the technician makes before running it.
 * Example: axialRunOutsideText(Temperature 160..200 degC, 208.28) -> 'This axial run sets
 * Temperature to 208.3 degC, outside the factorial range 160 to 200 degC: check it is within the
 * machine's rated limits before making the run.'
 */
export function axialRunOutsideText(factor: Factor, value: number): string {
  const range = factor.kind === 'numeric' ? `${formatSetting(factor.low)} to ${formatSetting(factor.high, factor.unit)}` : '';
  const unit = factor.kind === 'numeric' ? factor.unit : undefined;
  return `This axial run sets ${factor.name} to ${formatSetting(value, unit)}, outside the factorial range ${range}: check it is within the machine's rated limits before making the run.`;
}

/**
 * The nature of the fitted surface in plain words.
 * Example: natureWords('maximum') -> 'The fitted surface has a top: the response falls away in
 * every direction from it.'
 */
export function natureWords(nature: SurfaceNature): string {
  switch (nature) {
    case 'maximum':
      return 'The fitted surface has a top: the response falls away in every direction from it.';
    case 'minimum':
      return 'The fitted surface has a bottom: the response rises in every direction from it.';
    case 'saddle':
      return 'The fitted surface is a saddle: the response rises in some directions and falls in others, so the stationary point is neither the best nor the worst.';
    case 'ridge':
      return 'The fitted surface is a ridge: along one direction the response hardly changes, so a line of settings gives nearly the same result.';
  }
}

/** One word for the nature, for a heading. Example: natureName('saddle') -> 'saddle'. */
export function natureName(nature: SurfaceNature): string {
  return nature === 'maximum' ? 'maximum' : nature === 'minimum' ? 'minimum' : nature === 'saddle' ? 'saddle' : 'ridge';
}

/**
 * Where the stationary point lies, against the tested box [-1, +1] on every factor.
 * Example: stationaryPlaceWords(false) -> 'It lies outside the tested box: the model has not been
 * checked there, so do not move the process there on this result alone.'
 */
export function stationaryPlaceWords(inside: boolean): string {
  return inside
    ? 'It lies inside the tested box.'
    : 'It lies outside the tested box: the model has not been checked there, so do not move the process there on this result alone.';
}

/** When B is singular: no single stationary point. */
export const NO_STATIONARY_POINT = 'The fitted surface has no single stationary point (its curvature is zero along some direction).';

/**
 * The heading of the best setting for a response's goal.
 * Example: bestSettingHeading({ kind: 'max' }, 'Yield') -> 'Highest Yield inside the tested box'.
 */
export function bestSettingHeading(goal: Goal, response: string): string {
  if (goal.kind === 'max') return `Highest ${response} inside the tested box`;
  if (goal.kind === 'min') return `Lowest ${response} inside the tested box`;
  return `${response} nearest the target ${shortNumber(goal.target)} inside the tested box`;
}

/**
 * Why the second-order block is missing for a chosen model: the model has no squares, or the
 * study holds a categorical factor.
 * Example: secondOrderNotAvailable() -> 'The stationary point and the best setting need the
 * quadratic model: choose it above.'
 */
export function secondOrderNotAvailable(): string {
  return 'The stationary point and the best setting need the quadratic model: choose it above.';
}

/**
 * Why the quadratic model is not offered for a study's runs (core/design/supports-quadratic.ts),
 * with what to do where it is asked for: on the Effects screen, the Next tab's axial runs; on the
 * command line, the terms the runs can estimate or `augment --axial`.
 * Example: quadraticNotSupported() -> 'The quadratic model needs runs at three or more settings
 * of each factor (a central composite or Box-Behnken design) and numeric factors only.'
 */
export function quadraticNotSupported(where?: 'screen' | 'command'): string {
  const need = 'The quadratic model needs runs at three or more settings of each factor (a central composite or Box-Behnken design) and numeric factors only.';
  if (where === 'screen') return `${need} These runs cannot estimate it: to fit curvature, add axial runs on the Next tab.`;
  if (where === 'command') {
    return `${need} These runs cannot estimate it: list the terms they can estimate in --terms (for example "A*B + A^2"), or add axial runs to the study with augment --axial.`;
  }
  return need;
}

/**
 * What a square term means on the Effects screen: with y-hat = ... + b x^2, at either end of the
 * range (x = -1 or +1) the square adds b, so the response sits |b| above or below the straight
 * line through the center (Montgomery 8th ed., section 11.3, from memory).
 * Example: squareMeaning('Time', 'Yield', -1.376, '%') -> 'Curvature of Time: at its low and high
 * settings Yield sits 1.376 % below a straight line through the center.'
 */
export function squareMeaning(factor: string, response: string, coef: number, unit?: string): string {
  const size = `${shortNumber(Math.abs(coef))}${unit ? ` ${unit}` : ''}`;
  return `Curvature of ${factor}: at its low and high settings ${response} sits ${size} ${coef >= 0 ? 'above' : 'below'} a straight line through the center.`;
}

/**
 * Why the Next screen offers no path of steepest ascent for a model with squares: the path is the
 * first-order direction from the center (Montgomery 8th ed., section 11.2), while a second-order
 * model has its own best setting, found on the fitted surface (section 11.3). Common practice.
 * Example: pathNeedsFirstOrder('Yield') -> 'The model on Effects has squares, so the best setting for Yield ...'.
 */
export function pathNeedsFirstOrder(response: string): string {
  return `The model on Effects has squares, so the best setting for ${response} is found on the fitted surface: see the quick card's best setting and contour chart. A path of steepest ascent follows a model without squares; choose one on Effects to plan a path.`;
}
