/**
 * Settings in real units, as a person gives them ("Temperature = 185, Powder = gloss"), checked
 * and turned into coded values for the model.
 */
import { InputError } from '../errors.ts';
import { parseNumber, toCoded, toReal } from '../factor/coding.ts';
import { findFactor, type CategoricalFactor, type Factor } from '../factor/factor.ts';
import { readSetting } from '../factor/read-setting.ts';
import { shownSetting } from '../factor/shown-setting.ts';

export type SettingValue = number | string;

/** Factor name or letter -> real setting (a number, or a level label for a categorical factor). */
export type SettingsInput = Readonly<Record<string, SettingValue>> | ReadonlyArray<readonly [string, SettingValue]>;

export interface FactorSetting {
  readonly name: string;
  readonly letter: string;
  readonly kind: 'numeric' | 'categorical';
  /** Real setting: a number, or the level label of a categorical factor. */
  readonly real: number | string;
  readonly coded: number;
  readonly unit?: string;
  /**
   * 'given' by the person; 'center' for a numeric factor not given (held at its center);
   * 'default' for a categorical factor set by the caller's rule; 'free' for a factor left to be
   * found (coded 0 here as a placeholder).
   */
  readonly source: 'given' | 'center' | 'default' | 'free';
}

export interface ParseSettingsOptions {
  /** Indices of factors the caller will set itself (solved for); they must not be given. */
  readonly free?: readonly number[];
  /**
   * Level for a categorical factor that is not given; undefined (or no rule) means it must be
   * given, since a categorical factor has no center.
   */
  readonly categoricalDefault?: (factor: CategoricalFactor, index: number) => -1 | 1 | undefined;
}

/**
 * A real setting as text for messages: a number to 4 significant digits with its unit, or the
 * label as it is (common practice for readable reports). Cost O(1).
 * Example: formatSetting(157.0968, 'degF') -> '157.1 degF'; formatSetting('gloss') -> 'gloss'.
 */
export function formatSetting(value: number | string, unit?: string): string {
  if (typeof value === 'string') return value;
  const s = String(shownSetting(value));
  return unit ? `${s} ${unit}` : s;
}

/** One setting as a plain object literal (no spreads or closures: this runs on every prediction a screen makes). */
function makeSetting(f: Factor, real: number | string, coded: number, source: FactorSetting['source']): FactorSetting {
  const s: { -readonly [K in keyof FactorSetting]: FactorSetting[K] } = { name: f.name, letter: f.letter, kind: f.kind, real, coded, source };
  if (f.kind === 'numeric' && f.unit) s.unit = f.unit;
  return s;
}

function entries(input: SettingsInput): (readonly [string, SettingValue])[] {
  if (Array.isArray(input)) return input as (readonly [string, SettingValue])[];
  return Object.entries(input as Readonly<Record<string, SettingValue>>);
}

/**
 * The coded value of one given setting. Text goes through the one reader of typed settings
 * (readSetting in factor/read-setting.ts: strict numbers, a positive number on a log scale, a
 * categorical factor's level by name), so a setting typed on a screen and one given to the
 * command line are checked by the same rule in the same words; a number is coded as it is.
 * Two checks are this function's own: an empty setting, and a number for a categorical factor
 * (it has nothing between its levels), which would otherwise read as an unknown level.
 */
function codeOne(f: Factor, value: SettingValue): number {
  if (typeof value === 'string' && value.trim() === '') throw new InputError(`${f.name} needs a setting, got an empty one`);
  if (f.kind === 'categorical') {
    const label = String(value).trim().toLowerCase();
    const isLabel = f.levels.some((l) => l.toLowerCase() === label);
    if (!isLabel && (typeof value === 'number' || Number.isFinite(parseNumber(String(value))))) {
      throw new InputError(
        `${f.name} is categorical: it has the two levels "${f.levels[0]}" and "${f.levels[1]}" and no setting between them, got ${value}`,
      );
    }
  }
  if (typeof value === 'string') return toCoded(f, readSetting(f, value));
  if (!Number.isFinite(value)) throw new InputError(`${f.name} needs a finite number, got ${value}`);
  return toCoded(f, value);
}

/**
 * Resolves settings given by factor name (case-insensitive) or letter into one setting per
 * factor, in declared order. Rule: a numeric factor that is not given is held at its center
 * (coded 0; the geometric mean on a log scale); a categorical factor has no center, so it must be
 * given unless the caller supplies a default level. Coding: x = (u - M) / D (Montgomery, Design
 * and Analysis of Experiments, 8th ed., section 6.7; see factor/coding.ts). Cost O(k * given).
 * Throws InputError for an unknown factor, a factor given twice, a free factor that is given, an
 * empty or unreadable number, a level a categorical factor does not have, a number for a
 * categorical factor (it has nothing between its levels), or a missing categorical factor.
 * Example: with A = Temperature 160..200 and B = Powder (matte, gloss),
 * parseSettings(factors, { A: 190, Powder: 'gloss' }).map((s) => s.coded) -> [0.5, 1].
 */
export function parseSettings(factors: readonly Factor[], input: SettingsInput, options: ParseSettingsOptions = {}): FactorSetting[] {
  if (factors.length === 0) throw new InputError('Settings need a model with at least one factor, got none');
  const given = new Map<number, { key: string; value: SettingValue }>();
  for (const [key, value] of entries(input)) {
    const f = findFactor(factors, String(key));
    if (!f) {
      throw new InputError(
        `No factor is named or lettered "${key}"; the factors are ${factors.map((x) => `${x.letter} (${x.name})`).join(', ')}`,
      );
    }
    const i = factors.indexOf(f);
    const before = given.get(i);
    if (before) throw new InputError(`${f.name} is given twice (as "${before.key}" and "${key}"); give it once`);
    if (options.free?.includes(i)) throw new InputError(`${f.name} is the factor to be found, so it takes no setting; got "${key}=${value}"`);
    given.set(i, { key: String(key), value });
  }
  return factors.map((f, i): FactorSetting => {
    const g = given.get(i);
    if (options.free?.includes(i)) return makeSetting(f, f.kind === 'numeric' ? (toReal(f, 0) as number) : f.levels[0], 0, 'free');
    if (g) {
      const coded = codeOne(f, g.value);
      const real = f.kind === 'categorical' ? toReal(f, coded) : typeof g.value === 'number' ? g.value : (readSetting(f, g.value) as number);
      return makeSetting(f, real, coded, 'given');
    }
    if (f.kind === 'numeric') return makeSetting(f, toReal(f, 0) as number, 0, 'center');
    const level = options.categoricalDefault?.(f, i);
    if (level === undefined) {
      throw new InputError(`${f.name} is categorical and has no center: give its level ("${f.levels[0]}" or "${f.levels[1]}")`);
    }
    return makeSetting(f, toReal(f, level), level, 'default');
  });
}
