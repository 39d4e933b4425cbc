/**
 * The record checks of a study (see checkStudy below): the domain rules every stored study and
 * every study in a backup obeys, applied by the store on every write and by the backup reader.
 */
import { InputError } from '../errors.ts';
import { defineFactors, type Factor, type FactorSpec } from '../factor/factor.ts';
import { MAX_FACTORS } from '../factor/letters.ts';
import { RUN_KINDS, type DesignRun } from '../design/design.ts';
import { PLACKETT_BURMAN_RUNS } from '../design/plackett-burman.ts';
import type { Response } from '../study/response.ts';
import type { StoredDesign, StudyRecord } from '../study/study.ts';
import { MAX_PLANNED_RUNS, fail, finite, id, int, list, obj, oneOf, only, text, texts, time } from './field-checks.ts';

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
    only(o, p, ['name', 'unit', 'goal', 'target', 'lowerBound']);
    const goal = oneOf(o.goal, `${p}.goal`, ['maximize', 'minimize', 'target'] as const);
    if (!('lowerBound' in o)) fail(`${p}.lowerBound`, 'a number or null (null: no lower bound)', undefined);
    const lowerBound = o.lowerBound === null ? null : finite(o.lowerBound, `${p}.lowerBound`);
    const res: Response = {
      name: text(o.name, `${p}.name`, { nonEmpty: true }),
      goal,
      ...(o.unit !== undefined ? { unit: text(o.unit, `${p}.unit`) } : {}),
      ...(o.target !== undefined ? { target: finite(o.target, `${p}.target`) } : {}),
      lowerBound,
    };
    if (goal === 'target' && res.target === undefined) fail(`${p}.target`, 'a target value (the goal is "target")', undefined);
    if (lowerBound !== null && res.target !== undefined && res.target < lowerBound) {
      throw new InputError(`${p}.target: needs a target at or above the lower bound ${lowerBound}, got ${res.target}`);
    }
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

/**
 * Checks one planned run: run number, standard-order index or null, replicate, block and block of
 * origin (whole numbers from 1), kind (one of RUN_KINDS) and one finite coded setting per factor.
 * Method: the rules of trialbook-backup.schema.json (common practice). Cost O(factors).
 * Throws InputError naming the path. Example: checkPlannedRun({ ...run, kind: 'star' }, 'r', 2)
 * throws 'r.kind: needs "factorial" or "center" or ... , got "star"'.
 */
export function checkPlannedRun(r: unknown, p: string, nFactors: number): DesignRun {
  const ro = obj(r, p);
  only(ro, p, ['run', 'standardOrder', 'replicate', 'block', 'originBlock', 'kind', 'coded']);
  const coded = list(ro.coded, `${p}.coded`).map((c, j) => finite(c, `${p}.coded[${j}]`));
  if (coded.length !== nFactors) fail(`${p}.coded`, `one coded setting per factor (${nFactors})`, `${coded.length} settings`);
  return {
    run: int(ro.run, `${p}.run`, 1, MAX_PLANNED_RUNS),
    standardOrder: ro.standardOrder === null ? null : int(ro.standardOrder, `${p}.standardOrder`, 1),
    replicate: int(ro.replicate, `${p}.replicate`, 1),
    block: int(ro.block, `${p}.block`, 1),
    originBlock: int(ro.originBlock, `${p}.originBlock`, 1),
    kind: oneOf(ro.kind, `${p}.kind`, RUN_KINDS),
    coded,
  };
}

function design(v: unknown, path: string, nFactors: number): StoredDesign {
  const o = obj(v, path);
  only(o, path, ['runs', 'generators', 'definingRelation', 'resolution', 'wordLengths', 'aliases', 'blockWords', 'seed', 'summary', 'notes', 'screening']);
  const runs = list(o.runs, `${path}.runs`, MAX_PLANNED_RUNS).map((r, i) => checkPlannedRun(r, `${path}.runs[${i}]`, nFactors));
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
    ...(o.screening !== undefined ? { screening: screening(o.screening, `${path}.screening`, nFactors, runs) } : {}),
  };
}

/**
 * The optional screening entry of a design: a Plackett-Burman plan of 12, 20 or 24 factorial
 * runs per replicate, with fewer factors than runs and every factorial run's standard-order
 * index within the table (the analysis reads its contrast columns by that index).
 */
function screening(v: unknown, path: string, nFactors: number, runs: readonly DesignRun[]): NonNullable<StoredDesign['screening']> {
  const o = obj(v, path);
  only(o, path, ['kind', 'runs', 'source']);
  const kind = oneOf(o.kind, `${path}.kind`, ['plackett-burman'] as const);
  const n = int(o.runs, `${path}.runs`, 12, 24);
  if (!(PLACKETT_BURMAN_RUNS as readonly number[]).includes(n)) fail(`${path}.runs`, `one of ${PLACKETT_BURMAN_RUNS.join(', ')} runs`, n);
  if (nFactors > n - 1) fail(path, `at most ${n - 1} factors for a ${n}-run design`, nFactors);
  runs.forEach((r, i) => {
    if (r.kind === 'factorial' && (r.standardOrder === null || r.standardOrder > n)) fail(`${path.replace(/\.screening$/, '')}.runs[${i}].standardOrder`, `a standard-order index from 1 to ${n} (a ${n}-run Plackett-Burman design)`, r.standardOrder);
  });
  return { kind, runs: n, source: text(o.source, `${path}.source`, { nonEmpty: true }) };
}

/**
 * Checks a study record, field by field, as it is stored and as a backup carries it: id, device
 * and time; title and purpose; factors (letters A, B, ... in order, skipping I; two different
 * levels); responses (names differ; a target when the goal is "target"; a lower bound that is a
 * finite number or null, with the target at or above it); the design (at least one planned run,
 * run numbers unique, kind one of RUN_KINDS, block and block of origin whole numbers from 1, one
 * coded setting per factor). Method: the rules of trialbook-backup.schema.json plus what a
 * schema cannot say (common practice). Cost: linear in the planned runs. Returns the record
 * rebuilt from the checked fields only. Throws InputError at the first problem, naming its path.
 * Example: checkStudy({ ...study, title: ' ' }, 'study') throws 'study.title: needs non-empty text, got " "'.
 */
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
