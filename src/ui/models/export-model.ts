/**
 * Files out and in: the JSON backup (one study or all) and a study's CSV, downloaded or handed
 * to the share sheet, the import of a backup file (a merge: nothing is overwritten), and what
 * the store says about keeping records safe (last export, persistent storage).
 */
import { computed, createModel, signal, type ReadonlySignal } from '@preact/signals';
import type { StudyRecord } from '../../core/study/study.ts';
import { writeBackup } from '../../io/backup/backup.ts';
import { exportStudyCsv, payloadOf } from '../../store/files.ts';
import { importBackupFile } from '../import-worker/import-bridge.ts';
import type { ImportProgress } from '../import-worker/protocol.ts';
import { markExported, safetyStatus, type SafetyStatus } from '../../store/status.ts';
import { listStudies } from '../../store/studies.ts';
import type { Store } from '../../store/store.ts';
import { problemOf, type Problem } from '../lib/problem.ts';
import { canShareFiles, fileName, mimeOf, saveText, type SaveOutcome } from '../lib/save-file.ts';

export interface BackupFile {
  readonly text: string;
  /** Notes the export once the file is out (shared or downloaded, not cancelled). */
  noteSaved(): Promise<void>;
}

/**
 * The backup text of these studies (all when none), with the note of the export kept for when
 * the file is really out: a cancelled share sheet leaves the backup reminder as it was. The time
 * is taken before the records are read. When the store cannot write the note (a full storage
 * refuses even that small write), the file still comes out and the reminder stays due.
 */
export async function backupFile(store: Store, studyIds?: readonly string[]): Promise<BackupFile> {
  const at = store.now().toISOString();
  const payload = await payloadOf(store, studyIds);
  const text = await writeBackup(payload, { device: store.device, exportedAt: at, scope: studyIds ? 'study' : 'all' });
  const ids = payload.studies.map((s) => s.id);
  return { text, noteSaved: () => markExported(store, ids, at).catch(() => undefined) };
}

/** The sentence for what became of a file. */
function savedSentence(outcome: SaveOutcome, name: string): string {
  if (outcome === 'shared') return `${name} was handed to the share sheet. Keep it somewhere other than this phone.`;
  if (outcome === 'cancelled') return 'Sharing was cancelled; nothing was sent and the backup reminder stays as it was.';
  return `${name} is downloading. Keep it somewhere other than this phone.`;
}

/** The backup, the runs CSV, or the confirmation verdicts' CSV saved beside it. */
export type FileKind = 'json' | 'csv' | 'confirmations';

export const ExportModel = createModel((store: Store, studyId: string | null) => {
  const studies = signal<StudyRecord[]>([]);
  const status = signal<SafetyStatus | null>(null);
  const problem = signal<Problem | null>(null);
  const done = signal<string | null>(null);
  const busy = signal(false);

  async function refresh() {
    const all = await listStudies(store);
    studies.value = all;
    try {
      status.value = await safetyStatus(store);
    } catch {
      status.value = null;
    }
  }

  async function fileOf(id: string | null, kind: FileKind): Promise<{ text: string; name: string; title: string; noteSaved(): Promise<void> }> {
    const study = id ? studies.peek().find((s) => s.id === id) : undefined;
    if (id && !study) throw new Error(`there is no study with id "${id}" on this device`);
    const title = study ? study.title : 'all studies';
    if (kind === 'confirmations') {
      if (!id) throw new Error('the confirmation verdicts belong to one study; choose a study');
      // Loaded when asked: it runs the analysis (the first screen's code stays small).
      const { exportConfirmationsCsv } = await import('../../store/confirmations-file.ts');
      return { text: await exportConfirmationsCsv(store, id, { bom: true }), name: fileName(`${title} confirmations`, 'csv'), title: `${title}, confirmation verdicts`, noteSaved: async () => undefined };
    }
    if (kind === 'csv') {
      if (!id) throw new Error('a CSV holds one study; choose a study');
      return { text: await exportStudyCsv(store, id, { bom: true }), name: fileName(title, 'csv'), title, noteSaved: async () => undefined };
    }
    const backup = await backupFile(store, id ? [id] : undefined);
    return { text: backup.text, name: fileName(title, 'json'), title, noteSaved: backup.noteSaved };
  }

  const importProgress = signal<ImportProgress | null>(null);

  async function run(task: () => Promise<string | null>) {
    if (busy.peek()) return;
    busy.value = true;
    problem.value = null;
    done.value = null;
    try {
      done.value = await task();
      await refresh();
    } catch (err) {
      problem.value = problemOf(err);
    } finally {
      busy.value = false;
    }
  }

  return {
    studies: studies as ReadonlySignal<StudyRecord[]>,
    /** The study this screen was opened for, or null for all. */
    focus: computed(() => (studyId ? studies.value.find((s) => s.id === studyId) ?? null : null)),
    status: status as ReadonlySignal<SafetyStatus | null>,
    problem: problem as ReadonlySignal<Problem | null>,
    /** What the last action did, in a sentence. */
    done: done as ReadonlySignal<string | null>,
    busy: busy as ReadonlySignal<boolean>,
    canShare: computed(() => canShareFiles()),

    async load() {
      try {
        await refresh();
      } catch (err) {
        problem.value = problemOf(err);
      }
    },
    /** The file through the share sheet where the browser accepts it, else downloaded. */
    save(id: string | null, kind: FileKind) {
      return run(async () => {
        const f = await fileOf(id, kind);
        const outcome = await saveText(f.text, f.name, mimeOf(kind === 'json' ? 'json' : 'csv'), `Trialbook: ${f.title}`);
        if (outcome !== 'cancelled') await f.noteSaved();
        return savedSentence(outcome, f.name);
      });
    },
    /** How far the running import has come, or null. */
    importProgress: importProgress as ReadonlySignal<ImportProgress | null>,
    /** Imports a backup file off the page's thread (a worker), with progress; a file above the size limit is refused before it is read. */
    importFile(file: File) {
      return run(async () => {
        try {
          const report = await importBackupFile(store, file, (p) => (importProgress.value = p));
          return `${file.name}: ${report.summary}`;
        } finally {
          importProgress.value = null;
        }
      });
    },
  };
});
