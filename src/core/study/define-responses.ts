/**
 * The responses of a study as a person declares them: each needs a name (names differ, case
 * ignored), may have a unit, and has a goal; a target goal needs a target value. The same rules
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
}

const GOALS: readonly Response['goal'][] = ['maximize', 'minimize', 'target'];

/**
 * Checks response declarations and returns them as a study keeps them: names and units trimmed,
 * an empty unit dropped, a target only with the target goal. Common practice: every quality
 * characteristic of a designed experiment is named, measured in one unit and has a goal
 * (larger, smaller or nominal is best).
 * Throws InputError for no responses, an empty or repeated name, an unknown goal, or a target
 * goal without a readable, finite target.
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
    const out: Response = { name, goal: r.goal, ...(unit ? { unit } : {}) };
    if (r.goal !== 'target') return out;
    const t = r.target;
    if (t === undefined || (typeof t === 'string' && t.trim() === '')) throw new InputError(`${name}: the goal is a target, so it needs a target value`);
    const target = typeof t === 'number' ? t : readNumber(t, `${name}: the target`);
    if (!Number.isFinite(target)) throw new InputError(`${name}: the target needs a finite number, got ${target}`);
    return { ...out, target };
  });
}
