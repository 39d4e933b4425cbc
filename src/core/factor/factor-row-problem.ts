/**
 * What is wrong with one factor as typed on a planning form, as a typed problem the form words
 * (core/text/plan-form-text.ts) and acts on (a reversed pair offers a swap). The checks are the
 * rules of a new factor (defineFactors, checkNewFactor), caught in the order a person fills the
 * row in: name, settings, then the rules about their values. Source: common practice.
 */
import { InputError } from '../errors.ts';
import { defineFactors, type FactorSpec } from './factor.ts';
import { checkNewFactorUnnamed } from './new-factor.ts';
import { parseTypedNumber } from './read-setting.ts';

/** One factor row as typed: every box as text. */
export interface FactorRow {
  readonly kind: 'numeric' | 'categorical';
  readonly name: string;
  readonly unit: string;
  readonly low: string;
  readonly high: string;
  /** The two named levels of a categorical factor (the first is coded -1). */
  readonly levelA: string;
  readonly levelB: string;
}

export type FactorRowProblem =
  | { readonly kind: 'no-name' }
  | { readonly kind: 'missing'; readonly which: 'low' | 'high' | 'levelA' | 'levelB' }
  | { readonly kind: 'not-a-number'; readonly which: 'low' | 'high'; readonly text: string }
  /** The low above the high: the form offers to swap them. */
  | { readonly kind: 'reversed'; readonly low: number; readonly high: number }
  | { readonly kind: 'equal'; readonly value: number }
  | { readonly kind: 'same-level-names'; readonly level: string }
  /** Another rule of a new factor (a reserved character, a range too narrow to code), in the core's words. */
  | { readonly kind: 'rule'; readonly message: string };

/**
 * The row as the core's factor declaration; throws InputError for a setting that is not a number.
 * Example: factorRowSpec({kind:'numeric', name:' Speed ', unit:'', low:'2', high:'4,5', ...}) -> {kind:'numeric', name:' Speed ', low:2, high:4.5}.
 */
export function factorRowSpec(row: FactorRow): FactorSpec {
  if (row.kind === 'categorical') return { kind: 'categorical', name: row.name, levels: [row.levelA, row.levelB] };
  const unit = row.unit.trim();
  const low = parseTypedNumber(row.low);
  const high = parseTypedNumber(row.high);
  if (!Number.isFinite(low) || !Number.isFinite(high)) throw new InputError(`The ${Number.isFinite(low) ? 'high' : 'low'} setting is not a number`);
  return { kind: 'numeric', name: row.name, low, high, ...(unit ? { unit } : {}) };
}

/**
 * The first problem of a factor row, or null when it is a valid new factor. Cost: linear in the
 * lengths of the texts. Throws nothing for bad input (it is the answer), only for a bug.
 * Example: factorRowProblem({kind:'numeric', name:'Temperature', unit:'', low:'200', high:'160', levelA:'', levelB:''})
 *   -> {kind:'reversed', low:200, high:160}.
 */
export function factorRowProblem(row: FactorRow): FactorRowProblem | null {
  if (row.name.trim() === '') return { kind: 'no-name' };
  if (row.kind === 'numeric') {
    for (const which of ['low', 'high'] as const) {
      const text = row[which].trim();
      if (text === '') return { kind: 'missing', which };
      if (!Number.isFinite(parseTypedNumber(text))) return { kind: 'not-a-number', which, text };
    }
    const low = parseTypedNumber(row.low);
    const high = parseTypedNumber(row.high);
    if (low > high) return { kind: 'reversed', low, high };
    if (low === high) return { kind: 'equal', value: low };
  } else {
    if (row.levelA.trim() === '') return { kind: 'missing', which: 'levelA' };
    if (row.levelB.trim() === '') return { kind: 'missing', which: 'levelB' };
    if (row.levelA.trim().toLowerCase() === row.levelB.trim().toLowerCase()) return { kind: 'same-level-names', level: row.levelA.trim() };
  }
  try {
    const spec = factorRowSpec(row);
    defineFactors([spec]);
    checkNewFactorUnnamed(spec);
    return null;
  } catch (err) {
    if (err instanceof InputError) return { kind: 'rule', message: err.message };
    throw err;
  }
}

/**
 * The row with its low and high exchanged (nothing else changes); a categorical row's two
 * levels likewise. Example: swapLowHigh({..., low:'200', high:'160'}) -> {..., low:'160', high:'200'}.
 */
export function swapLowHigh<T extends FactorRow>(row: T): T {
  return row.kind === 'numeric' ? { ...row, low: row.high, high: row.low } : { ...row, levelA: row.levelB, levelB: row.levelA };
}

/**
 * The first two rows with the same name (case and surrounding spaces ignored), as their
 * indices, or null. Example: sameNames(['Speed', 'Feed', ' speed']) -> [0, 2].
 */
export function sameNames(names: readonly string[]): [number, number] | null {
  const seen = new Map<string, number>();
  for (let i = 0; i < names.length; i++) {
    const key = names[i].trim().toLowerCase();
    if (key === '') continue;
    const j = seen.get(key);
    if (j !== undefined) return [j, i];
    seen.set(key, i);
  }
  return null;
}
