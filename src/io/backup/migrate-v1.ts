/**
 * Backup format version 1 to version 2, a pure step on the parsed document (after its checksum
 * was verified against the version-1 payload). Version 2 adds, in each study, the block of
 * origin of every planned run (equal to its block), its standard-order index renamed from
 * `yates` to `standardOrder`, and the lower bound of every response (null),
 * by the same record upgrade the store's schema version 2 applies (upgradeStudyRecord in core).
 * Run kinds stay as they were; revisions do not change. The document's formatVersion is set by
 * migrateBackup, and every field is checked after the last step.
 * Example: backupV1ToV2(v1).payload.studies[0].design.runs[0].originBlock -> that run's block.
 */
import { upgradeStudyRecord } from '../../core/records/upgrade-study-record.ts';

type Doc = Record<string, unknown>;

/** The version-2 form of a version-1 document (a new object; the input is not changed). */
export function backupV1ToV2(doc: Doc): Doc {
  const payload = doc.payload;
  if (typeof payload !== 'object' || payload === null || Array.isArray(payload)) return doc;
  const p = payload as Doc;
  if (!Array.isArray(p.studies)) return doc;
  return { ...doc, payload: { ...p, studies: p.studies.map(upgradeStudyRecord) } };
}
