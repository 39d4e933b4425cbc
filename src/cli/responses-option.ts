/**
 * The --responses option of optimize: one entry per response, NAME:GOAL:LOW:HIGH for max and
 * min, NAME:target:LOW:T:HIGH for a target, each optionally ending with :w=WEIGHT and the shapes
 * :r= (max, min) or :s= and :t= (target).
 */
import { InputError } from '../core/errors.ts';
import { parseNumber } from '../core/factor/coding.ts';
import { checkDesirability, type DesirabilitySpec } from '../core/optimum/desirability.ts';

function number(text: string, what: string, entry: string): number {
  const v = parseNumber(text.trim());
  if (!Number.isFinite(v)) throw new InputError(`--responses "${entry}": ${what} needs a number, got "${text}"`);
  return v;
}

/**
 * Reads --responses into desirability settings, checked. Throws InputError, quoting the entry,
 * for too few parts, an unknown goal, a part that is not a number, an unknown or repeated extra
 * (w, r, s, t), a name given twice, and what checkDesirability refuses.
 * Example: parseResponses('Y1:max:60:75:w=2') -> [{ name: 'Y1', goal: 'max', low: 60, high: 75, weight: 2 }].
 */
export function parseResponses(text: string): DesirabilitySpec[] {
  const entries = text.split(',').map((e) => e.trim()).filter((e) => e !== '');
  if (entries.length === 0) throw new InputError('--responses needs at least one entry such as "Yield:max:78:81"; got none');
  const out = entries.map((entry) => {
    const parts = entry.split(':').map((p) => p.trim());
    const [name, goalText] = parts;
    if (!name || !goalText) throw new InputError(`--responses "${entry}": expected NAME:GOAL:LOW:HIGH (or NAME:target:LOW:T:HIGH)`);
    const goal = goalText.toLowerCase();
    if (goal !== 'max' && goal !== 'min' && goal !== 'target') throw new InputError(`--responses "${entry}": the goal is max, min or target, got "${goalText}"`);
    const nums = goal === 'target' ? 3 : 2;
    const values = parts.slice(2, 2 + nums);
    if (values.length < nums || values.some((v) => v.includes('='))) {
      throw new InputError(`--responses "${entry}": ${goal === 'target' ? 'a target needs LOW:T:HIGH' : `${goal} needs LOW:HIGH`}, got ${parts.length - 2} part${parts.length - 2 === 1 ? '' : 's'} after the goal`);
    }
    const extras: Record<string, number> = {};
    for (const x of parts.slice(2 + nums)) {
      const m = /^([wrst])\s*=\s*(.+)$/.exec(x);
      if (!m) throw new InputError(`--responses "${entry}": after the limits come w=WEIGHT, r=, s= or t=, got "${x}"`);
      if (m[1] in extras) throw new InputError(`--responses "${entry}": ${m[1]}= is given twice`);
      extras[m[1]] = number(m[2], `${m[1]}=`, entry);
    }
    const [a, b, c] = values.map((v, i) => number(v, ['LOW', goal === 'target' ? 'T' : 'HIGH', 'HIGH'][i], entry));
    const spec: DesirabilitySpec = {
      name,
      goal,
      low: a,
      high: goal === 'target' ? c : b,
      ...(goal === 'target' ? { target: b } : {}),
      ...(extras.w !== undefined ? { weight: extras.w } : {}),
      ...(extras.r !== undefined ? { r: extras.r } : {}),
      ...(extras.s !== undefined ? { s: extras.s } : {}),
      ...(extras.t !== undefined ? { t: extras.t } : {}),
    };
    checkDesirability(spec);
    return spec;
  });
  const seen = new Set<string>();
  for (const s of out) {
    const key = s.name.toLowerCase();
    if (seen.has(key)) throw new InputError(`--responses names ${s.name} twice`);
    seen.add(key);
  }
  return out;
}
