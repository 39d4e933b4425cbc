/**
 * The device's database: its tables, and its schema versions oldest first. Each version after
 * the first states its tables and, when data must change shape, an upgrade() that does it; a
 * fixture database of every earlier version lives in test/fixtures/ and a test opens it with the
 * current code and checks that nothing is lost. This is the only file that declares the schema.
 *
 * Tables (version 1; version 2 keeps them and changes the shape of the study records; version 3
 * adds setAside):
 *   studies    id -> StudyRecord (title, purpose, factors, responses, design with planned runs and seed)
 *   revisions  id -> RunRevision: the append-only history of every logged run (indexed by run and study)
 *   runs       id -> LoggedRun: the current state of each logged run, decided from its revisions
 *   drafts     runId -> Draft: what was typed in a run's form and not yet saved (versions 1 to 4)
 *   formDrafts formId -> Draft: what was typed in one open run form and not yet saved, one per
 *              form (version 5; indexed by run and study), so tabs on one run never share one
 *   meta       key -> value: device id, last exports, the answer to the persistent-storage request
 *   setAside   key -> SetAsideRow: records of an imported file that clash with stored ones (same id,
 *              other content), kept apart with the field that differs (version 3)
 *   blocks     id -> AddedBlock: planned runs added to a study after its plan (version 4; indexed by study)
 */
import { Dexie, type DexieOptions, type Table, type Transaction } from 'dexie';
import type { AddedBlock } from '../core/study/added-block.ts';
import type { LoggedRun, RunRevision, StudyRecord } from '../core/study/study.ts';
import type { RunForm } from '../core/study/run-form.ts';
import { upgradeStudyRecord } from '../core/records/upgrade-study-record.ts';
import type { SetAside } from '../io/backup/merge.ts';

/** A run form's unsaved typing, kept on every change until the run is saved. */
export interface Draft {
  /** The open form's own id (kept in the tab's session, so a reload of that tab finds it again). */
  readonly formId: string;
  /** The logged run's id, fixed when the form opened. */
  readonly runId: string;
  readonly studyId: string;
  readonly plannedRun: number;
  /** The id the saved revision will take, fixed when the form opened, so a retry saves once. */
  readonly revisionId: string;
  /** The revisions current when the form opened (empty for a new run). */
  readonly parents: readonly string[];
  /** The fields as typed. */
  readonly form: RunForm;
  /** Wall-clock time of the last change, ISO 8601 (shown only). */
  readonly updatedAt: string;
}

/** A record of an imported file that was not merged, kept apart so that nothing is lost. */
export interface SetAsideRow extends SetAside {
  /** The kind, the record's id and the SHA-256 of its canonical JSON: the same record set aside
   * twice (the same file imported again) is one row. */
  readonly key: string;
  /** The device that wrote the file, when the file says. */
  readonly fromDevice: string | null;
  /** When it was set aside, by the store's clock, ISO 8601 (shown only). */
  readonly setAsideAt: string;
}

export interface MetaRow {
  readonly key: string;
  readonly value: unknown;
}

export interface SchemaVersion {
  readonly version: number;
  readonly stores: Record<string, string | null>;
  /** Data changes for this version, run inside the upgrade transaction. */
  readonly upgrade?: (tx: Transaction) => Promise<void> | void;
}

/** Every schema version, oldest first. */
export const SCHEMA: readonly SchemaVersion[] = [
  {
    version: 1,
    stores: {
      studies: 'id',
      revisions: 'id, runId, studyId',
      runs: 'id, studyId',
      drafts: 'runId, studyId',
      meta: 'key',
    },
  },
  {
    // Study records gain each planned run's block of origin (its block) and each response's
    // lower bound (null); run kinds become an open list, so stored kinds stay as they are.
    version: 2,
    stores: {},
    upgrade: async (tx) => {
      await tx
        .table('studies')
        .toCollection()
        .modify((study, ref) => {
          ref.value = upgradeStudyRecord(study);
        });
    },
  },
  {
    // Records of an imported file that clash with stored ones are kept apart, not refused.
    version: 3,
    stores: { setAside: 'key, id, studyId' },
  },
  {
    // Planned runs added later (path, foldover, confirmation) are records of their own; no data changes.
    version: 4,
    stores: { blocks: 'id, studyId' },
  },
  {
    // A draft per open form, not per run: a third tab on a run no longer takes over a second
    // tab's typing. The primary key changes, so the drafts move to a table of their own; a
    // draft kept before forms had ids takes its run's id as its form's id (one per run then).
    version: 5,
    stores: { drafts: null, formDrafts: 'formId, runId, studyId' },
    upgrade: async (tx) => {
      const old = await tx.table('drafts').toArray();
      await tx.table('formDrafts').bulkAdd(old.map((d: Omit<Draft, 'formId'>) => ({ formId: d.runId, ...d })));
    },
  },
];

/** The schema version this code opens. */
export const SCHEMA_VERSION = SCHEMA[SCHEMA.length - 1].version;

/** The database's name in the browser. */
export const DB_NAME = 'trialbook';

/** Declares all schema versions on a Dexie instance (the harness adds test versions after them). */
export function declareSchema(db: Dexie): void {
  for (const v of SCHEMA) {
    const version = db.version(v.version).stores(v.stores);
    if (v.upgrade) version.upgrade(v.upgrade);
  }
}

export class TrialbookDB extends Dexie {
  declare studies: Table<StudyRecord, string>;
  declare revisions: Table<RunRevision, string>;
  declare runs: Table<LoggedRun, string>;
  declare formDrafts: Table<Draft, string>;
  declare meta: Table<MetaRow, string>;
  declare setAside: Table<SetAsideRow, string>;
  declare blocks: Table<AddedBlock, string>;

  /** Opens with strict durability: a write is reported done only once it is on disk. */
  constructor(name: string = DB_NAME, options: DexieOptions = {}, declare: (db: Dexie) => void = declareSchema) {
    super(name, { ...options, chromeTransactionDurability: 'strict', autoOpen: false });
    declare(this);
  }
}
