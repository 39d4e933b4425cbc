/**
 * A response's desirability as a person types it on the phone: a goal (maximize, minimize,
 * target or ignore) and its values in the words of the floor, an acceptable value and an ideal
 * one (for a target: the lowest and highest acceptable values around it), with an importance
 * weight and a shape. Read into the settings of desirability.ts (Derringer and Suich 1980,
 * Journal of Quality Technology 12, 214-219): maximize LOW = acceptable, HIGH = ideal; minimize
 * LOW = ideal, HIGH = acceptable; target LOW, T, HIGH. Also the starting values, from the
 * response's goal in the study and the values logged for it.
 */
import { InputError } from '../errors.ts';
import { readNumber } from '../factor/read-setting.ts';
import type { Response } from '../study/response.ts';
import { entryFieldWhat, entryOrderMessage, positiveMessage, targetOrderMessage, type DesirabilityGoalChoice, type EntryRole } from '../text/desirability-text.ts';
import type { DesirabilitySpec } from './desirability.ts';

/** What the fields of one response hold, as typed. */
export interface DesirabilityEntry {
  readonly goal: DesirabilityGoalChoice;
  /** Maximize, minimize: the acceptable value (d = 0 there); target: the lowest acceptable value. */
  readonly acceptable: string;
  /** Maximize, minimize: the ideal value (d = 1 there); target: the target. */
  readonly ideal: string;
  /** Target only: the highest acceptable value. */
  readonly highest: string;
  readonly weight: string;
  /** r for maximize and minimize; s (below the target) for a target. */
  readonly shape: string;
  /** t, above the target. */
  readonly shapeAbove: string;
}

function read(response: string, role: EntryRole, text: string): number {
  return readNumber(text, entryFieldWhat(response, role));
}

function positive(response: string, role: 'weight' | 'shape' | 'shapeAbove', text: string): number {
  const v = read(response, role, text);
  if (!(v > 0)) throw new InputError(positiveMessage(response, role, v));
  return v;
}

/**
 * The desirability settings of one typed entry, or null for the goal 'ignore'. Numbers as
 * readNumber reads them (a comma may be the decimal mark). Cost O(1).
 * Throws InputError, naming the response and the field, for a field that is not a number, values
 * out of order (maximize: acceptable < ideal; minimize: ideal < acceptable; target: lowest <
 * target < highest), or an importance or shape not above 0.
 * Example: readDesirabilityEntry('Gloss', { goal: 'max', acceptable: '60', ideal: '75',
 * highest: '', weight: '1', shape: '1', shapeAbove: '1' }) -> { name: 'Gloss', goal: 'max', low: 60,
 * high: 75, weight: 1, r: 1 }.
 */
export function readDesirabilityEntry(response: string, e: DesirabilityEntry): DesirabilitySpec | null {
  if (e.goal === 'ignore') return null;
  if (e.goal === 'target') {
    const low = read(response, 'lowest', e.acceptable);
    const target = read(response, 'target', e.ideal);
    const high = read(response, 'highest', e.highest);
    if (!(low < target && target < high)) throw new InputError(targetOrderMessage(response, low, target, high));
    return { name: response, goal: 'target', low, target, high, weight: positive(response, 'weight', e.weight), s: positive(response, 'shape', e.shape), t: positive(response, 'shapeAbove', e.shapeAbove) };
  }
  const acceptable = read(response, 'acceptable', e.acceptable);
  const ideal = read(response, 'ideal', e.ideal);
  if (e.goal === 'max' ? !(acceptable < ideal) : !(ideal < acceptable)) throw new InputError(entryOrderMessage(response, e.goal, acceptable, ideal));
  const [low, high] = e.goal === 'max' ? [acceptable, ideal] : [ideal, acceptable];
  return { name: response, goal: e.goal, low, high, weight: positive(response, 'weight', e.weight), r: positive(response, 'shape', e.shape) };
}

/** A field of an entry that holds a number. */
export type EntryField = Exclude<keyof DesirabilityEntry, 'goal'>;

/** What is wrong with an entry: the field to mark ('order' marks the value fields together) and the message. */
export interface EntryProblem {
  readonly field: EntryField | 'order';
  readonly message: string;
}

const ROLES: Record<'max' | 'min' | 'target', readonly [EntryField, EntryRole][]> = {
  max: [['acceptable', 'acceptable'], ['ideal', 'ideal'], ['weight', 'weight'], ['shape', 'shape']],
  min: [['acceptable', 'acceptable'], ['ideal', 'ideal'], ['weight', 'weight'], ['shape', 'shape']],
  target: [['acceptable', 'lowest'], ['ideal', 'target'], ['highest', 'highest'], ['weight', 'weight'], ['shape', 'shape'], ['shapeAbove', 'shapeAbove']],
};

/**
 * The first problem of an entry, with the field it is in, or null when readDesirabilityEntry
 * reads it (or the goal is 'ignore'): each field in screen order is read alone first, then the
 * order of the values is checked. Same messages as readDesirabilityEntry. Cost O(1).
 * Example: desirabilityEntryProblem('Gloss', { ...entry, weight: '0' }) -> { field: 'weight',
 * message: 'Gloss: the importance must be a number above 0, got 0. 1 is the usual choice.' }.
 */
export function desirabilityEntryProblem(response: string, e: DesirabilityEntry): EntryProblem | null {
  if (e.goal === 'ignore') return null;
  for (const [field, role] of ROLES[e.goal]) {
    try {
      if (role === 'weight' || role === 'shape' || role === 'shapeAbove') positive(response, role, e[field]);
      else read(response, role, e[field]);
    } catch (err) {
      if (err instanceof InputError) return { field, message: err.message };
      throw err;
    }
  }
  try {
    readDesirabilityEntry(response, e);
  } catch (err) {
    if (err instanceof InputError) return { field: 'order', message: err.message };
    throw err;
  }
  return null;
}

function typed(x: number): string {
  return String(Number(x.toPrecision(4)));
}

/**
 * The entry a response starts with: its goal as the study records it (or `goal`, when the person
 * picks another), and values spanning what was logged for it (a starting choice of this tool, for
 * the person to change): maximize, acceptable = the lowest logged value, ideal = the highest;
 * minimize, the mirror image; a target T (the study's, else the middle of the logged values),
 * lowest and highest acceptable at T -/+ the largest distance of a logged value from T (so every
 * logged value lies inside). Values are rounded to 4 significant digits. Where the logged values
 * cannot give two different numbers (none, or all equal to each other or to T), the value fields
 * start empty for the person to fill. Importance and shapes start at 1; 'ignore' keeps the
 * values of the study's goal.
 * Cost O(n). Example: defaultDesirabilityEntry({ name: 'Gloss', goal: 'maximize' }, [71, 88, 80])
 * -> goal 'max', acceptable '71', ideal '88'.
 */
export function defaultDesirabilityEntry(response: Response, logged: readonly number[], goal?: DesirabilityGoalChoice): DesirabilityEntry {
  const ys = logged.filter((y) => Number.isFinite(y));
  const lo = ys.length ? Math.min(...ys) : NaN;
  const hi = ys.length ? Math.max(...ys) : NaN;
  const base = { highest: '', weight: '1', shape: '1', shapeAbove: '1' };
  const studyTarget = response.goal === 'target' && response.target !== undefined && Number.isFinite(response.target) ? response.target : null;
  const studyGoal: DesirabilityGoalChoice = studyTarget !== null ? 'target' : response.goal === 'minimize' ? 'min' : 'max';
  const want = goal ?? studyGoal;
  if (want === 'ignore') return { ...defaultDesirabilityEntry(response, logged, studyGoal), goal: 'ignore' };
  if (want === 'target') {
    const T = studyTarget ?? (ys.length ? Number(((lo + hi) / 2).toPrecision(4)) : NaN);
    if (!Number.isFinite(T)) return { ...base, goal: 'target', acceptable: '', ideal: '' };
    const half = ys.length ? Math.max(hi - T, T - lo) : 0;
    const lowest = Number((T - half).toPrecision(4));
    const highest = Number((T + half).toPrecision(4));
    if (!(half > 0 && lowest < T && T < highest)) return { ...base, goal: 'target', acceptable: '', ideal: typed(T) };
    return { ...base, goal: 'target', acceptable: typed(lowest), ideal: typed(T), highest: typed(highest) };
  }
  if (!(hi > lo) || typed(hi) === typed(lo)) return { ...base, goal: want, acceptable: '', ideal: '' };
  return want === 'max' ? { ...base, goal: want, acceptable: typed(lo), ideal: typed(hi) } : { ...base, goal: want, acceptable: typed(hi), ideal: typed(lo) };
}
