/**
 * The rules a factor must meet when it is declared (planning on the phone, `design --factor`, a
 * study made from a CSV of runs), on top of defineFactors' checks. They apply at creation only:
 * a study already stored or in a backup is read as it is, so that no record becomes unreadable.
 *
 * - Its name and its level labels contain no comma, colon or equals sign: the command line
 *   separates factors with commas (--factors A,B), levels and interaction names with colons
 *   (160:200, A:B in --terms and --generators) and a name from its value with an equals sign
 *   (--at "Temperature=180", --levels, --generators "E=ABCD"), so a name holding one of them could
 *   not be named by the other commands.
 * - Nor any control character (Unicode category Cc, or a bidirectional formatting character):
 *   it cannot be typed on a form and it would change how a terminal shows a report.
 * - A numeric factor's low setting is below its high one: the low is coded -1, and a reversed
 *   pair would turn every effect's sign silently.
 * - Its range is wide enough to code reliably: the round-off of a setting, about
 *   Number.EPSILON * max(|low|, |high|), stays within SETTING_TOLERANCE of half the range, so
 *   a coded setting is accurate to that tolerance (1000 to 1000.0000001 is refused).
 * Source: common practice (the separators are this tool's own option syntax).
 */
import { InputError } from '../errors.ts';
import type { FactorSpec } from './factor.ts';
import { SETTING_TOLERANCE } from '../tolerance.ts';

/** The characters the command line uses as separators, with what each separates. */
export const RESERVED_NAME_CHARACTERS: readonly { readonly char: string; readonly word: string; readonly use: string }[] = [
  { char: ',', word: 'a comma', use: 'separates factors and settings (--factors A,B)' },
  { char: ':', word: 'a colon', use: 'separates levels and joins names in an interaction (160:200, A:B)' },
  { char: '=', word: 'an equals sign', use: 'joins a name to its value (--at "Temperature=180", --generators "E=ABCD")' },
];

const CONTROL = /[\u0000-\u001f\u007f-\u009f\u061c\u200e\u200f\u202a-\u202e\u2066-\u2069]/;

/**
 * What is wrong with a factor name or level label as a new name, or null when nothing is.
 * `what` names it in the message, such as 'The factor name "A,B"'.
 * Example: namingProblem('Temp, C', 'The factor name "Temp, C"') ->
 *   'The factor name "Temp, C" contains a comma, which Trialbook keeps ...'.
 */
export function namingProblem(text: string, what: string): string | null {
  const found = RESERVED_NAME_CHARACTERS.filter((r) => text.includes(r.char));
  if (found.length > 0) {
    const words = found.map((r) => `${r.word} ("${r.char}")`).join(' and ');
    const uses = found.map((r) => `${r.word} ${r.use}`).join('; ');
    return `${what} contains ${words}, which Trialbook keeps as a separator (${uses}); names and levels cannot contain a comma, a colon or an equals sign, so choose another, such as "${suggestion(text)}"`;
  }
  const c = CONTROL.exec(text);
  if (c) {
    return `${what} contains the control character U+${c[0].charCodeAt(0).toString(16).toUpperCase().padStart(4, '0')}, which cannot be typed or shown; remove it`;
  }
  return null;
}

function suggestion(text: string): string {
  return text.replace(/\s*[,:=]\s*/g, ' ').replace(/\s+/g, ' ').trim() || 'Factor';
}

/**
 * Checks a factor as it is declared: its name and level labels (namingProblem) and, for a
 * numeric factor, a low setting below the high one. Throws InputError naming the factor and
 * what came; returns nothing. Cost: linear in the name lengths.
 * Example: checkNewFactor({kind:'numeric', name:'Temperature', low:200, high:160}) throws
 *   'Temperature: the low setting (200) is above the high setting (160); the low is coded -1 ...'.
 */
export function checkNewFactor(spec: FactorSpec): void {
  checkFactor(spec, true);
}

/**
 * checkNewFactor with messages that leave the factor's name out, for a caller that names the
 * factor its own way (the planning form: "Factor A (Temperature): ...").
 * Example: checkNewFactorUnnamed({kind:'numeric', name:'Temp, C', low:1, high:2}) throws 'its name "Temp, C" contains a comma ...'.
 */
export function checkNewFactorUnnamed(spec: FactorSpec): void {
  checkFactor(spec, false);
}

function checkFactor(spec: FactorSpec, named: boolean): void {
  const name = spec.name.trim();
  const lead = named ? `${name}: ` : '';
  const problem = namingProblem(name, named ? `The factor name "${name}"` : `its name "${name}"`);
  if (problem) throw new InputError(problem);
  if (spec.kind === 'categorical') {
    for (const level of spec.levels) {
      const p = namingProblem(level.trim(), named ? `The level "${level.trim()}" of ${name}` : `its level "${level.trim()}"`);
      if (p) throw new InputError(p);
    }
    return;
  }
  const unit = CONTROL.exec(spec.unit ?? '');
  if (unit) throw new InputError(`${named ? `The unit of ${name}` : 'its unit'} contains the control character U+${unit[0].charCodeAt(0).toString(16).toUpperCase().padStart(4, '0')}, which cannot be typed or shown; remove it`);
  if (spec.low > spec.high) {
    throw new InputError(
      `${lead}the low setting (${spec.low}) is above the high setting (${spec.high}); the low is coded -1 and must be the smaller, so give ${spec.high} as the low and ${spec.low} as the high`,
    );
  }
  const size = Math.max(Math.abs(spec.low), Math.abs(spec.high));
  const half = spec.high / 2 - spec.low / 2;
  if (spec.low < spec.high && Number.EPSILON * size > SETTING_TOLERANCE * half) {
    throw new InputError(
      `${lead}the range ${spec.low} to ${spec.high} is too narrow to code reliably: coding divides by half the range (${half}), so the round-off of settings near ${size} ` +
        `would exceed the ${SETTING_TOLERANCE} within which two coded settings count as the same; widen the range, or give the factor as an offset from a reference (for example 0 to ${spec.high - spec.low} above ${spec.low})`,
    );
  }
}
