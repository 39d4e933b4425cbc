/**
 * The --goal option of analyze: max, min or target=T, and the default when it is not given (the
 * study's own goal for a response in a backup, else max).
 */
import { InputError } from '../core/errors.ts';
import { parseNumber } from '../core/factor/coding.ts';
import type { Goal } from '../core/optimum/box-optimum.ts';
import type { Response } from '../core/study/response.ts';

/**
 * Reads --goal: "max", "min" or "target=T" (T a number). Throws InputError otherwise.
 * Example: parseGoal('target=79') -> { kind: 'target', target: 79 }.
 */
export function parseGoal(text: string): Goal {
  const t = text.trim().toLowerCase();
  if (t === 'max' || t === 'maximize' || t === 'maximise') return { kind: 'max' };
  if (t === 'min' || t === 'minimize' || t === 'minimise') return { kind: 'min' };
  const m = /^target\s*=\s*(.+)$/.exec(t);
  if (m) {
    const v = parseNumber(m[1].trim());
    if (!Number.isFinite(v)) throw new InputError(`--goal target=T needs a number T, got "${m[1].trim()}"`);
    return { kind: 'target', target: v };
  }
  throw new InputError(`--goal takes max, min or target=T, got "${text}"`);
}

/** The goal a study gives a response. Example: goalOfResponse({ name: 'Y', goal: 'minimize' }) -> { kind: 'min' }. */
export function goalOfResponse(r: Response): Goal {
  if (r.goal === 'minimize') return { kind: 'min' };
  if (r.goal === 'target' && r.target !== undefined) return { kind: 'target', target: r.target };
  return { kind: 'max' };
}
