/**
 * The record checks of one revision of a logged run (see checkRevision below), applied by the
 * store on every write and by the backup reader.
 */
import { InputError } from '../errors.ts';
import { MAX_FACTORS } from '../factor/letters.ts';
import { checkRunValues, plannedRunOf, type RunRevision, type StudyRecord } from '../study/study.ts';
import { MAX_IMPORTED_REV, MAX_PLANNED_RUNS, bool, finite, id, int, list, obj, only, revisionCounter, text, time } from './field-checks.ts';

const REVISION_FIELDS = ['id', 'runId', 'studyId', 'plannedRun', 'rev', 'device', 'parents', 'restoredFrom', 'savedAt', 'actual', 'readings', 'loggedAt', 'operator', 'notes', 'excluded', 'reason'];

/**
 * Checks a revision of a logged run against its study, as it is stored and as a backup carries
 * it: ids, the study present in `studies`, the planned run in that study's plan, a counter from
 * 1 (to MAX_IMPORTED_REV for a revision from a file, `maxRev` for one saved here), parents as
 * ids, times (ISO 8601, isIsoDateTime), and its values by checkRunValues (one actual setting per factor that
 * fits it, finite readings per response, an excluded run with a reason). Method: the rules of
 * trialbook-backup.schema.json plus what a schema cannot say (common practice). Cost: linear in
 * the readings (the plan's runs are indexed once per plan, by plannedRunOf). Returns the revision rebuilt from the checked fields (categorical labels spelled
 * as declared). Throws InputError at the first problem, naming its path.
 * Example: checkRevision({ ...r, rev: 0 }, 'r', studies) throws "r.rev: needs a whole number from 1 to ...".
 */
export function checkRevision(v: unknown, path: string, studies: ReadonlyMap<string, StudyRecord>, maxRev: number = MAX_IMPORTED_REV): RunRevision {
  const o = obj(v, path);
  only(o, path, REVISION_FIELDS);
  const studyId = id(o.studyId, `${path}.studyId`);
  const study = studies.get(studyId);
  if (!study) throw new InputError(`${path}.studyId: needs a study in this file, got "${studyId}", which it does not hold`);
  const plannedRun = int(o.plannedRun, `${path}.plannedRun`, 1, MAX_PLANNED_RUNS);
  if (!plannedRunOf(study, plannedRun)) {
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
    rev: revisionCounter(o.rev, `${path}.rev`, maxRev),
    device: id(o.device, `${path}.device`),
    parents: list(o.parents, `${path}.parents`, 1000).map((p, i) => id(p, `${path}.parents[${i}]`)),
    restoredFrom: o.restoredFrom === null ? null : id(o.restoredFrom, `${path}.restoredFrom`),
    savedAt: time(o.savedAt, `${path}.savedAt`),
    ...checked,
  };
}
