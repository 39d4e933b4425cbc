/**
 * The file of set-aside records: every record an import kept apart (a study's plan or a run's
 * revision that clashed with this device's, or depends on one), each whole as the imported file
 * held it, with why and when it was set aside. It is a record for people (to keep, or to show to
 * whoever manages the records), not a backup: the import does not read it, so it can never put
 * a clashing record over a stored one. The checksum (SHA-256 of the records' canonical JSON, as
 * in backups) shows whether the file was changed since.
 */
import type { RunRevision, StudyRecord } from '../../core/study/study.ts';
import { APP_NAME, APP_VERSION } from '../app-version.ts';
import { payloadChecksum } from './backup.ts';
import type { SetAside } from './merge.ts';

export const SET_ASIDE_FORMAT = 'trialbook-set-aside';
export const SET_ASIDE_VERSION = 1;

/** One record as the file holds it (the store's row without its key). */
export interface SetAsideEntry extends SetAside {
  readonly fromDevice: string | null;
  readonly setAsideAt: string;
}

/**
 * The file's text: a header (format, version, app, time, device, count, checksum) and the
 * records in the order given. Example: writeSetAsideFile([], { device: 'd', exportedAt: t })
 * writes a file with count 0 and records [].
 */
export async function writeSetAsideFile(entries: readonly SetAsideEntry[], header: { readonly device: string; readonly exportedAt: string }): Promise<string> {
  const records = entries.map((e) => ({
    kind: e.kind,
    id: e.id,
    studyId: e.studyId,
    plannedRun: e.plannedRun,
    field: e.field,
    reason: e.reason,
    fromDevice: e.fromDevice,
    setAsideAt: e.setAsideAt,
    record: e.record,
  }));
  const doc = {
    format: SET_ASIDE_FORMAT,
    formatVersion: SET_ASIDE_VERSION,
    app: { name: APP_NAME, version: APP_VERSION },
    exportedAt: header.exportedAt,
    device: header.device,
    count: records.length,
    checksum: { algorithm: 'SHA-256', value: await payloadChecksum(records) },
    records,
  };
  return JSON.stringify(doc, null, 1) + '\n';
}
