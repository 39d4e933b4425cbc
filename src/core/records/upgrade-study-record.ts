/**
 * A study record as the first record shape wrote it (store schema version 1, backup format
 * version 1), brought to the current shape: each planned run gains its block of origin, equal to
 * its block (a plan of that time was always made in one go, never augmented), its standard-order
 * index moves from the field `yates` to `standardOrder` (same value), and each response
 * gains its lower bound, null (none was recorded). Run kinds stay as they were ("factorial",
 * "center"), both of which are in RUN_KINDS. Fields already present are kept, so the step can
 * run twice. Nothing else changes; the record checks run after it.
 * Method: common practice for a versioned record (add new fields with their neutral value).
 * Cost: linear in the planned runs and responses. Throws nothing: a value that is not a study
 * comes back as it was, for the checks to refuse with their own message.
 * Example: upgradeStudyRecord({ ..., design: { runs: [{ run: 1, yates: 3, block: 2, ... }] } }).design.runs[0]
 *   -> { run: 1, standardOrder: 3, block: 2, originBlock: 2, ... }.
 */

type Obj = Record<string, unknown>;

const isObj = (v: unknown): v is Obj => typeof v === 'object' && v !== null && !Array.isArray(v);

/** A planned run with its block of origin and its standard-order index under the current name. */
function upgradePlannedRun(run: unknown): unknown {
  if (!isObj(run)) return run;
  let out: Obj = run;
  if (!('originBlock' in out)) out = { ...out, originBlock: out.block };
  if ('yates' in out && !('standardOrder' in out)) {
    const { yates, ...rest } = out;
    out = { ...rest, standardOrder: yates };
  }
  return out;
}

/** The study with the fields of the current record shape added (a new object; the input is not changed). */
export function upgradeStudyRecord(study: unknown): unknown {
  if (!isObj(study)) return study;
  const out: Obj = { ...study };
  if (Array.isArray(study.responses)) {
    out.responses = study.responses.map((r) => (isObj(r) && !('lowerBound' in r) ? { ...r, lowerBound: null } : r));
  }
  const design = study.design;
  if (isObj(design) && Array.isArray(design.runs)) {
    out.design = {
      ...design,
      runs: design.runs.map(upgradePlannedRun),
    };
  }
  return out;
}
