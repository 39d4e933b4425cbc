/**
 * The responses of a study as a person declares them: each needs a name (names differ, case
 * ignored), may have a unit, and has a goal; a target goal needs a target value; it may have a
 * lowest value it can take (0 for one that cannot be negative). The same rules
 * for the planning form and any other place that makes a study.
 */
import { InputError } from '../errors.ts';
import { readNumber } from '../factor/read-setting.ts';
import type { Response } from './response.ts';

/** What a person declares for one response; a target may still be typed text. */
export interface ResponseSpec {
  readonly name: string;
  readonly unit?: string;
  readonly goal: Response['goal'];
  /** Needed when the goal is 'target': a number, or the text typed for it. Ignored otherwise. */
  readonly target?: number | string;
  /** The lowest value the response can take: a number, the text typed for it, or null / empty for none. */
  readonly lowerBound?: number | string | null;
}

const GOALS: readonly Response['goal'][] = ['maximize', 'minimize', 'target'];

/**
 * Checks response declarations and returns them as a study keeps them: names and units trimmed,
 * an empty unit dropped, a target only with the target goal, a lower bound only when given
 * (transforms of the analysis then work on y minus it; fit/response-transform.ts). Common practice: every quality
 * characteristic of a designed experiment is named, measured in one unit and has a goal
 * (larger, smaller or nominal is best).
 * Throws InputError for no responses, an empty or repeated name, an unknown goal, a target
 * goal without a readable, finite target, a lower bound that is not a finite number, or a target
 * below the lower bound.
 * Example: defineResponses([{ name: ' Gloss ', unit: 'GU', goal: 'maximize' }]) ->
 * [{ name: 'Gloss', unit: 'GU', goal: 'maximize' }].
 */
export function defineResponses(specs: readonly ResponseSpec[]): Response[] {
  if (specs.length === 0) throw new InputError('A study needs at least one response (what you will measure), got none');
  const seen = new Map<string, number>();
  return specs.map((r, i) => {
    const name = r.name.trim();
    if (name === '') throw new InputError(`Response ${i + 1} needs a name (what you will measure)`);
    const key = name.toLowerCase();
    const before = seen.get(key);
    if (before !== undefined) throw new InputError(`Response names must differ, got "${name}" twice (responses ${before + 1} and ${i + 1})`);
    seen.set(key, i);
    if (!GOALS.includes(r.goal)) throw new InputError(`${name}: the goal is maximize, minimize or target, got "${String(r.goal)}"`);
    const unit = r.unit?.trim() ?? '';
    const lowerBound = boundOf(r.lowerBound, name);
    const out: Response = { name, goal: r.goal, ...(unit ? { unit } : {}), ...(lowerBound !== null ? { lowerBound } : {}) };
    if (r.goal !== 'target') return out;
    const t = r.target;
    if (t === undefined || (typeof t === 'string' && t.trim() === '')) throw new InputError(`${name}: the goal is a target, so it needs a target value`);
    const target = typeof t === 'number' ? t : readNumber(t, `${name}: the target`);
    if (!Number.isFinite(target)) throw new InputError(`${name}: the target needs a finite number, got ${target}`);
    if (lowerBound !== null && target < lowerBound) {
      throw new InputError(`${name}: the target ${target} is below the lowest value it can take (${lowerBound}); raise the target or change the lowest value`);
    }
    return { ...out, target };
  });
}

/** A declared lower bound: null for none (absent, null or empty text), else a finite number. */
function boundOf(b: number | string | null | undefined, name: string): number | null {
  if (b === undefined || b === null || (typeof b === 'string' && b.trim() === '')) return null;
  const v = typeof b === 'number' ? b : readNumber(b, `${name}: the lowest value`);
  if (!Number.isFinite(v)) throw new InputError(`${name}: the lowest value needs a finite number, got ${v}`);
  return v;
}
