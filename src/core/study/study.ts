/**
 * A study and its logged runs, as the store keeps them and the backup file carries them.
 *
 * A study holds what was planned: title, purpose, factors, responses and the design (its planned
 * runs and seed). Its plan is fixed once made. A logged run is what happened at one planned run:
 * the actual settings in real units, the readings of each response, the time, who logged it,
 * notes, and whether it is excluded and why. Each change to a logged run is a new revision;
 * revisions are never overwritten, so earlier values can be shown and restored.
 *
 * Which revision is current is decided by the revision counter `rev`, then the device id, then
 * the revision id (all compared as plain values), never by wall-clock time: phone clocks
 * disagree, and this order gives the same answer on every device and in every merge order.
 */
import { InputError } from '../errors.ts';
import type { Design, DesignRun } from '../design/design.ts';
import type { Factor } from '../factor/factor.ts';
import { plannedSetting } from '../design/planned-settings.ts';
import type { Response } from './response.ts';
import { isIsoDateTime } from '../records/iso-date-time.ts';

/** A design as a study stores it: the factors live beside it, once; the typed notes and the
 * foldover fact stay with the fresh plan (the stored format keeps the notes in words). */
export type StoredDesign = Omit<Design, 'factors' | 'noteFacts' | 'foldover'>;

/** What a person makes when starting a study (ids and devices are added by the store). */
export interface StudyPlan {
  readonly title: string;
  readonly purpose: string;
  readonly factors: readonly Factor[];
  readonly responses: readonly Response[];
  readonly design: StoredDesign;
}

/** A study's plan from a design made by the design builder (its factors move beside it). */
export function studyPlan(title: string, purpose: string, responses: readonly Response[], design: Design): StudyPlan {
  const { factors, noteFacts: _facts, foldover: _foldover, ...stored } = design;
  return { title, purpose, factors, responses, design: stored };
}

/** A study as stored: the plan with its random id, the device that made it and when. */
export interface StudyRecord extends StudyPlan {
  readonly id: string;
  readonly device: string;
  /** Wall-clock time of creation, ISO 8601; shown to people, never used to order anything. */
  readonly createdAt: string;
}

/** A planned or actual setting in real units: a number, or a categorical factor's level label. */
export type Setting = number | string;

/** What a person records for one logged run. */
export interface RunValues {
  /** Actual settings in real units, one per factor in declared order. */
  readonly actual: readonly Setting[];
  /** Readings of each response, one list per response in declared order; empty when not measured.
   * Several readings are repeat measurements of the same run (their mean is used), not replicates. */
  readonly readings: readonly (readonly number[])[];
  /** When the run was made, ISO 8601, as the person's device gave it; null when not given. */
  readonly loggedAt: string | null;
  /** Who logged it, when given. */
  readonly operator: string | null;
  readonly notes: string;
  readonly excluded: boolean;
  /** Why it is excluded; empty when it is not. */
  readonly reason: string;
}

/** One revision of a logged run: a full snapshot, never changed once written. */
export interface RunRevision extends RunValues {
  /** Random id of this revision. */
  readonly id: string;
  /** Random id of the logged run, fixed when its form first opened. */
  readonly runId: string;
  readonly studyId: string;
  /** The planned run (its run number in the design) that this logged run carries out. */
  readonly plannedRun: number;
  /** Revision counter, from 1; higher is later. */
  readonly rev: number;
  /** Device that wrote this revision. */
  readonly device: string;
  /** The revisions that were current when this one was started (empty for the first). */
  readonly parents: readonly string[];
  /** Set when this revision brings back the values of an earlier one. */
  readonly restoredFrom: string | null;
  /** Wall-clock time of saving, ISO 8601; shown to people, never used to order anything. */
  readonly savedAt: string;
}

/** A logged run as shown: its current revision plus what the history says about it. */
export interface LoggedRun extends Omit<RunRevision, 'id' | 'runId'> {
  /** The logged run's id. */
  readonly id: string;
  /** Id of the current revision. */
  readonly revisionId: string;
  /** Number of revisions in its history. */
  readonly revisions: number;
  /** Ids of the revisions nobody has built on yet; more than one means edits diverged
   * (two phones or two tabs changed the run from the same starting point). */
  readonly heads: readonly string[];
}

/** Total order of revisions: rev, then device id, then revision id. The greatest is current. */
export function compareRevisions(a: Pick<RunRevision, 'rev' | 'device' | 'id'>, b: Pick<RunRevision, 'rev' | 'device' | 'id'>): number {
  if (a.rev !== b.rev) return a.rev - b.rev;
  if (a.device !== b.device) return a.device < b.device ? -1 : 1;
  if (a.id !== b.id) return a.id < b.id ? -1 : 1;
  return 0;
}

/** Revisions that no other revision names as a parent, in revision order. */
export function headsOf(revisions: readonly RunRevision[]): RunRevision[] {
  const built = new Set<string>();
  for (const r of revisions) for (const p of r.parents) built.add(p);
  return revisions.filter((r) => !built.has(r.id)).sort(compareRevisions);
}

/** The current state of one logged run from all its revisions (which must share one runId). */
export function currentRun(revisions: readonly RunRevision[]): LoggedRun {
  if (revisions.length === 0) throw new InputError('A logged run needs at least one revision, got none');
  const sorted = [...revisions].sort(compareRevisions);
  const top = sorted[sorted.length - 1];
  const { id, runId, ...rest } = top;
  return { ...rest, id: runId, revisionId: id, revisions: sorted.length, heads: headsOf(sorted).map((r) => r.id) };
}

/** Mean of a run's readings of one response; null when it has none. */
export function meanReading(readings: readonly number[]): number | null {
  if (readings.length === 0) return null;
  let s = 0;
  for (const v of readings) s += v;
  return s / readings.length;
}

/** Each plan's runs by run number, made once per plan (plans never change once made). */
const runIndex = new WeakMap<readonly DesignRun[], ReadonlyMap<number, DesignRun>>();

/**
 * The design's planned run with this run number, or undefined. Cost: a lookup in an index of the
 * plan's runs, made on the first call for a plan, so checking a long history stays linear.
 */
export function plannedRunOf(study: StudyPlan, plannedRun: number): DesignRun | undefined {
  let index = runIndex.get(study.design.runs);
  if (!index) {
    index = new Map(study.design.runs.map((r) => [r.run, r]));
    runIndex.set(study.design.runs, index);
  }
  return index.get(plannedRun);
}

/**
 * Checks a run's values against its study: one actual setting per factor (a finite number, or
 * one of a categorical factor's two levels), one list of finite readings per response, text
 * fields as text. Returns the values with categorical labels spelled as declared and text
 * trimmed; throws InputError naming the field otherwise.
 */
export function checkRunValues(study: Pick<StudyPlan, 'factors' | 'responses'>, v: RunValues): RunValues {
  const { factors, responses } = study;
  if (!Array.isArray(v.actual) || v.actual.length !== factors.length) {
    throw new InputError(`Actual settings: needs one per factor (${factors.length}), got ${Array.isArray(v.actual) ? v.actual.length : typeof v.actual}`);
  }
  const actual = factors.map((f, i) => {
    const a = v.actual[i];
    if (f.kind === 'numeric') {
      if (typeof a !== 'number' || !Number.isFinite(a)) throw new InputError(`${f.name}: the actual setting needs a finite number, got ${describe(a)}`);
      if (f.scale === 'log' && a <= 0) throw new InputError(`${f.name}: coded on a log scale, the actual setting needs a positive number, got ${a}`);
      return a;
    }
    const label = typeof a === 'string' ? f.levels.find((l) => l.toLowerCase() === a.trim().toLowerCase()) : undefined;
    if (label === undefined) throw new InputError(`${f.name}: the actual setting needs "${f.levels[0]}" or "${f.levels[1]}", got ${describe(a)}`);
    return label;
  });
  if (!Array.isArray(v.readings) || v.readings.length !== responses.length) {
    throw new InputError(`Readings: needs one list per response (${responses.length}), got ${Array.isArray(v.readings) ? v.readings.length : typeof v.readings}`);
  }
  const readings = responses.map((r, i) => {
    const list = v.readings[i];
    if (!Array.isArray(list)) throw new InputError(`${r.name}: the readings need a list of numbers, got ${describe(list)}`);
    return list.map((x, j) => {
      if (typeof x !== 'number' || !Number.isFinite(x)) throw new InputError(`${r.name}: reading ${j + 1} needs a finite number, got ${describe(x)}`);
      return x;
    });
  });
  if (v.loggedAt !== null && (typeof v.loggedAt !== 'string' || !isIsoDateTime(v.loggedAt))) {
    throw new InputError(`Time: needs a date and time (ISO 8601, e.g. 2026-03-01T14:05) or nothing, got ${describe(v.loggedAt)}`);
  }
  if (v.operator !== null && typeof v.operator !== 'string') throw new InputError(`Operator: needs text or nothing, got ${describe(v.operator)}`);
  if (typeof v.notes !== 'string') throw new InputError(`Notes: needs text, got ${describe(v.notes)}`);
  if (typeof v.excluded !== 'boolean') throw new InputError(`Excluded: needs true or false, got ${describe(v.excluded)}`);
  if (typeof v.reason !== 'string') throw new InputError(`Reason: needs text, got ${describe(v.reason)}`);
  const reason = v.reason.trim();
  if (v.excluded && reason === '') throw new InputError('Excluded: an excluded run needs a reason, got none');
  const operator = v.operator === null ? null : v.operator.trim() || null;
  return { actual, readings, loggedAt: v.loggedAt, operator, notes: v.notes, excluded: v.excluded, reason: v.excluded ? reason : '' };
}

/** The planned settings of a planned run in real units (what the form starts from). */
export function plannedSettings(study: StudyPlan, plannedRun: number): Setting[] {
  const run = plannedRunOf(study, plannedRun);
  if (!run) throw new InputError(`Run ${plannedRun} is not in the plan of "${study.title}" (it has runs 1 to ${study.design.runs.length})`);
  return study.factors.map((f, i) => plannedSetting(f, run.coded[i]));
}

/** Short description of a value for messages: numbers and text as they are, others by type. */
export function describe(v: unknown): string {
  if (v === null) return 'nothing';
  if (v === undefined) return 'nothing';
  if (typeof v === 'string') return JSON.stringify(v.length > 40 ? v.slice(0, 40) + '...' : v);
  if (typeof v === 'number') return String(v);
  if (typeof v === 'boolean') return String(v);
  if (Array.isArray(v)) return 'a list';
  return typeof v === 'object' ? 'an object' : typeof v;
}
