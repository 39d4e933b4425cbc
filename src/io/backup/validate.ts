/**
 * Checks a backup's payload, field by field, before anything is imported. Each failure is an
 * InputError naming where in the file it is ("payload.revisions[3].readings[0][1]") and what was
 * needed. The rules are the ones written in trialbook-backup.schema.json, plus what a schema
 * cannot say: ids unique, every revision's study and planned run present, parents within the
 * same logged run, settings that fit their factors.
 */
import { InputError } from '../../core/errors.ts';
import { defineFactors, type Factor, type FactorSpec } from '../../core/factor/factor.ts';
import { MAX_FACTORS } from '../../core/factor/letters.ts';
import type { DesignRun } from '../../core/design/design.ts';
import type { Response } from '../../core/study/response.ts';
import { checkRunValues, describe, type RunRevision, type StoredDesign, type StudyRecord } from '../../core/study/study.ts';

/** Longest text accepted in any field (a note of a few pages); longer means a damaged file. */
export const MAX_TEXT = 100_000;
/** Most planned runs in one study. */
export const MAX_PLANNED_RUNS = 100_000;

type Obj = Record<string, unknown>;

function fail(path: string, what: string, got: unknown): never {
  throw new InputError(`${path}: needs ${what}, got ${describe(got)}`);
}

export function obj(v: unknown, path: string): Obj {
  if (typeof v !== 'object' || v === null || Array.isArray(v)) fail(path, 'an object', v);
  return v as Obj;
}

export function list(v: unknown, path: string, max = Number.MAX_SAFE_INTEGER): unknown[] {
  if (!Array.isArray(v)) fail(path, 'a list', v);
  if (v.length > max) throw new InputError(`${path}: holds at most ${max} items, got ${v.length}`);
  return v;
}

export function text(v: unknown, path: string, opts: { nonEmpty?: boolean } = {}): string {
  if (typeof v !== 'string') fail(path, 'text', v);
  if (v.length > MAX_TEXT) throw new InputError(`${path}: text of at most ${MAX_TEXT} characters, got ${v.length}`);
  if (opts.nonEmpty && v.trim() === '') fail(path, 'non-empty text', v);
  return v;
}

export function id(v: unknown, path: string): string {
  if (typeof v !== 'string' || !/^[A-Za-z0-9_-]{1,100}$/.test(v)) fail(path, 'an id (1 to 100 letters, digits, - or _)', v);
  return v;
}

/** Longest date and time text accepted (an ISO 8601 time with fractions and offset is under 40). */
export const MAX_TIME = 40;

export function time(v: unknown, path: string): string {
  if (typeof v !== 'string' || v.length > MAX_TIME || Number.isNaN(Date.parse(v))) fail(path, 'a date and time (ISO 8601)', v);
  return v;
}

export function finite(v: unknown, path: string): number {
  if (typeof v !== 'number' || !Number.isFinite(v)) fail(path, 'a finite number', v);
  return v;
}

export function int(v: unknown, path: string, min: number, max = Number.MAX_SAFE_INTEGER): number {
  if (typeof v !== 'number' || !Number.isSafeInteger(v) || v < min || v > max) fail(path, `a whole number from ${min} to ${max}`, v);
  return v;
}

function bool(v: unknown, path: string): boolean {
  if (typeof v !== 'boolean') fail(path, 'true or false', v);
  return v;
}

function oneOf<T extends string>(v: unknown, path: string, options: readonly T[]): T {
  if (typeof v !== 'string' || !options.includes(v as T)) fail(path, options.map((o) => `"${o}"`).join(' or '), v);
  return v as T;
}

function texts(v: unknown, path: string): string[] {
  return list(v, path, 100_000).map((s, i) => text(s, `${path}[${i}]`));
}

/** Refuses members that the format does not have (a typo or a newer writer would otherwise be silently dropped). */
export function only(o: Obj, path: string, allowed: readonly string[]): void {
  for (const k of Object.keys(o)) if (!allowed.includes(k)) throw new InputError(`${path}: has no field "${k.slice(0, 40)}" in this format`);
}

function factor(v: unknown, path: string): FactorSpec & { letter: string } {
  const o = obj(v, path);
  const kind = oneOf(o.kind, `${path}.kind`, ['numeric', 'categorical'] as const);
  const name = text(o.name, `${path}.name`, { nonEmpty: true });
  const letter = text(o.letter, `${path}.letter`);
  if (kind === 'numeric') {
    only(o, path, ['kind', 'name', 'letter', 'low', 'high', 'unit', 'scale']);
    const spec: FactorSpec & { letter: string } = {
      kind,
      name,
      letter,
      low: finite(o.low, `${path}.low`),
      high: finite(o.high, `${path}.high`),
      ...(o.unit !== undefined ? { unit: text(o.unit, `${path}.unit`) } : {}),
      ...(o.scale !== undefined ? { scale: oneOf(o.scale, `${path}.scale`, ['linear', 'log'] as const) } : {}),
    };
    return spec;
  }
  only(o, path, ['kind', 'name', 'letter', 'levels']);
  const levels = list(o.levels, `${path}.levels`);
  if (levels.length !== 2) fail(`${path}.levels`, 'two level names', levels);
  return { kind, name, letter, levels: [text(levels[0], `${path}.levels[0]`), text(levels[1], `${path}.levels[1]`)] };
}

function factors(v: unknown, path: string): Factor[] {
  const specs = list(v, path, MAX_FACTORS).map((f, i) => factor(f, `${path}[${i}]`));
  let defined: Factor[];
  try {
    defined = defineFactors(specs.map(({ letter: _l, ...spec }) => spec as FactorSpec));
  } catch (err) {
    if (err instanceof InputError) throw new InputError(`${path}: ${err.message}`);
    throw err;
  }
  defined.forEach((f, i) => {
    if (f.letter !== specs[i].letter) fail(`${path}[${i}].letter`, `"${f.letter}" (letters go A, B, ... in order, skipping I)`, specs[i].letter);
    if (f.name !== specs[i].name) fail(`${path}[${i}].name`, 'a name without surrounding spaces', specs[i].name);
    if (f.kind === 'categorical' && (f.levels[0] !== (specs[i] as Factor & { kind: 'categorical' }).levels[0] || f.levels[1] !== (specs[i] as Factor & { kind: 'categorical' }).levels[1])) {
      fail(`${path}[${i}].levels`, 'level names without surrounding spaces', (specs[i] as Factor & { kind: 'categorical' }).levels.join(', '));
    }
  });
  return specs as Factor[];
}

function responses(v: unknown, path: string): Response[] {
  const out = list(v, path, 1000).map((r, i) => {
    const p = `${path}[${i}]`;
    const o = obj(r, p);
    only(o, p, ['name', 'unit', 'goal', 'target']);
    const goal = oneOf(o.goal, `${p}.goal`, ['maximize', 'minimize', 'target'] as const);
    const res: Response = {
      name: text(o.name, `${p}.name`, { nonEmpty: true }),
      goal,
      ...(o.unit !== undefined ? { unit: text(o.unit, `${p}.unit`) } : {}),
      ...(o.target !== undefined ? { target: finite(o.target, `${p}.target`) } : {}),
    };
    if (goal === 'target' && res.target === undefined) fail(`${p}.target`, 'a target value (the goal is "target")', undefined);
    return res;
  });
  if (out.length === 0) fail(path, 'at least one response', out);
  const seen = new Set<string>();
  out.forEach((r, i) => {
    const k = r.name.trim().toLowerCase();
    if (seen.has(k)) throw new InputError(`${path}[${i}].name: response names must differ, got "${r.name}" twice`);
    seen.add(k);
  });
  return out;
}

function design(v: unknown, path: string, nFactors: number): StoredDesign {
  const o = obj(v, path);
  only(o, path, ['runs', 'generators', 'definingRelation', 'resolution', 'wordLengths', 'aliases', 'blockWords', 'seed', 'summary', 'notes']);
  const runs = list(o.runs, `${path}.runs`, MAX_PLANNED_RUNS).map((r, i): DesignRun => {
    const p = `${path}.runs[${i}]`;
    const ro = obj(r, p);
    only(ro, p, ['run', 'yates', 'replicate', 'block', 'kind', 'coded']);
    const coded = list(ro.coded, `${p}.coded`).map((c, j) => finite(c, `${p}.coded[${j}]`));
    if (coded.length !== nFactors) fail(`${p}.coded`, `one coded setting per factor (${nFactors})`, `${coded.length} settings`);
    return {
      run: int(ro.run, `${p}.run`, 1, MAX_PLANNED_RUNS),
      yates: ro.yates === null ? null : int(ro.yates, `${p}.yates`, 1),
      replicate: int(ro.replicate, `${p}.replicate`, 1),
      block: int(ro.block, `${p}.block`, 1),
      kind: oneOf(ro.kind, `${p}.kind`, ['factorial', 'center'] as const),
      coded,
    };
  });
  if (runs.length === 0) fail(`${path}.runs`, 'at least one planned run', runs);
  const seen = new Map<number, number>();
  runs.forEach((r, i) => {
    if (seen.has(r.run)) throw new InputError(`${path}.runs[${i}].run: run numbers must differ, got ${r.run} twice (also at runs[${seen.get(r.run)}])`);
    seen.set(r.run, i);
  });
  const wl = obj(o.wordLengths, `${path}.wordLengths`);
  const wordLengths: Record<number, number> = {};
  for (const [k, n] of Object.entries(wl)) {
    if (!/^[1-9]\d?$/.test(k)) throw new InputError(`${path}.wordLengths: needs word lengths as keys, got "${k.slice(0, 20)}"`);
    wordLengths[Number(k)] = int(n, `${path}.wordLengths.${k}`, 0);
  }
  return {
    runs,
    generators: texts(o.generators, `${path}.generators`),
    definingRelation: texts(o.definingRelation, `${path}.definingRelation`),
    resolution: o.resolution === null ? null : int(o.resolution, `${path}.resolution`, 1, 100),
    wordLengths,
    aliases: list(o.aliases, `${path}.aliases`).map((a, i) => texts(a, `${path}.aliases[${i}]`)),
    blockWords: texts(o.blockWords, `${path}.blockWords`),
    seed: o.seed === null ? null : finite(o.seed, `${path}.seed`),
    summary: text(o.summary, `${path}.summary`),
    notes: texts(o.notes, `${path}.notes`),
  };
}

/** A study record from a file; throws InputError at the first problem. */
export function checkStudy(v: unknown, path: string): StudyRecord {
  const o = obj(v, path);
  only(o, path, ['id', 'device', 'createdAt', 'title', 'purpose', 'factors', 'responses', 'design']);
  const f = factors(o.factors, `${path}.factors`);
  return {
    id: id(o.id, `${path}.id`),
    device: id(o.device, `${path}.device`),
    createdAt: time(o.createdAt, `${path}.createdAt`),
    title: text(o.title, `${path}.title`, { nonEmpty: true }),
    purpose: text(o.purpose, `${path}.purpose`),
    factors: f,
    responses: responses(o.responses, `${path}.responses`),
    design: design(o.design, `${path}.design`, f.length),
  };
}

const REVISION_FIELDS = ['id', 'runId', 'studyId', 'plannedRun', 'rev', 'device', 'parents', 'restoredFrom', 'savedAt', 'actual', 'readings', 'loggedAt', 'operator', 'notes', 'excluded', 'reason'];

/** A revision from a file, checked against its study; throws InputError at the first problem. */
export function checkRevision(v: unknown, path: string, studies: ReadonlyMap<string, StudyRecord>): RunRevision {
  const o = obj(v, path);
  only(o, path, REVISION_FIELDS);
  const studyId = id(o.studyId, `${path}.studyId`);
  const study = studies.get(studyId);
  if (!study) throw new InputError(`${path}.studyId: needs a study in this file, got "${studyId}", which it does not hold`);
  const plannedRun = int(o.plannedRun, `${path}.plannedRun`, 1, MAX_PLANNED_RUNS);
  if (!study.design.runs.some((r) => r.run === plannedRun)) {
    throw new InputError(`${path}.plannedRun: needs a run of the plan of "${study.title}" (1 to ${study.design.runs.length}), got ${plannedRun}`);
  }
  const actual = list(o.actual, `${path}.actual`, MAX_FACTORS).map((a, i) => {
    if (typeof a === 'number') return finite(a, `${path}.actual[${i}]`);
    return text(a, `${path}.actual[${i}]`);
  });
  const readings = list(o.readings, `${path}.readings`, 1000).map((l, i) =>
    list(l, `${path}.readings[${i}]`, 10_000).map((x, j) => finite(x, `${path}.readings[${i}][${j}]`)),
  );
  const values = {
    actual,
    readings,
    loggedAt: o.loggedAt === null ? null : time(o.loggedAt, `${path}.loggedAt`),
    operator: o.operator === null ? null : text(o.operator, `${path}.operator`),
    notes: text(o.notes, `${path}.notes`),
    excluded: bool(o.excluded, `${path}.excluded`),
    reason: text(o.reason, `${path}.reason`),
  };
  let checked;
  try {
    checked = checkRunValues(study, values);
  } catch (err) {
    if (err instanceof InputError) throw new InputError(`${path}: ${err.message}`);
    throw err;
  }
  return {
    id: id(o.id, `${path}.id`),
    runId: id(o.runId, `${path}.runId`),
    studyId,
    plannedRun,
    rev: int(o.rev, `${path}.rev`, 1),
    device: id(o.device, `${path}.device`),
    parents: list(o.parents, `${path}.parents`, 1000).map((p, i) => id(p, `${path}.parents[${i}]`)),
    restoredFrom: o.restoredFrom === null ? null : id(o.restoredFrom, `${path}.restoredFrom`),
    savedAt: time(o.savedAt, `${path}.savedAt`),
    ...checked,
  };
}

/**
 * Checks that the revisions form whole histories: ids unique, every parent (and restored-from)
 * a revision of the same logged run with a smaller counter, one study and planned run per run.
 */
export function checkHistories(revisions: readonly RunRevision[], path: string): void {
  const byId = new Map<string, number>();
  revisions.forEach((r, i) => {
    if (byId.has(r.id)) throw new InputError(`${path}[${i}].id: revision ids must differ, got "${r.id}" twice (also at [${byId.get(r.id)}])`);
    byId.set(r.id, i);
  });
  const runOf = new Map<string, RunRevision>();
  revisions.forEach((r, i) => {
    const first = runOf.get(r.runId);
    if (!first) runOf.set(r.runId, r);
    else if (first.studyId !== r.studyId || first.plannedRun !== r.plannedRun) {
      throw new InputError(`${path}[${i}]: logged run "${r.runId}" needs one study and planned run in all its revisions, got run ${r.plannedRun} of "${r.studyId}" and run ${first.plannedRun} of "${first.studyId}"`);
    }
    const related = [...r.parents.map((p, j) => [p, `parents[${j}]`] as const), ...(r.restoredFrom ? [[r.restoredFrom, 'restoredFrom'] as const] : [])];
    for (const [pid, field] of related) {
      const at = byId.get(pid);
      if (at === undefined) throw new InputError(`${path}[${i}].${field}: needs a revision in this file, got "${pid}", which it does not hold`);
      const p = revisions[at];
      if (p.runId !== r.runId) throw new InputError(`${path}[${i}].${field}: needs a revision of the same logged run, got one of "${p.runId}"`);
      if (p.rev >= r.rev) throw new InputError(`${path}[${i}].rev: needs a counter above its earlier revision's (${p.rev}), got ${r.rev}`);
    }
  });
}

/** Refuses a second record with the same id in one list. */
export function checkUniqueIds(items: readonly { id: string }[], path: string, what: string): void {
  const seen = new Map<string, number>();
  items.forEach((s, i) => {
    if (seen.has(s.id)) throw new InputError(`${path}[${i}].id: ${what} ids must differ, got "${s.id}" twice (also at [${seen.get(s.id)}])`);
    seen.set(s.id, i);
  });
}
