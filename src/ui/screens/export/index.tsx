/**
 * Files out and in: the JSON backup (with the whole history) and the CSV of a study, through
 * the share sheet where the browser accepts the file, else downloaded; a backup from another device merged in (nothing here is overwritten).
 */
import { MAX_BACKUP_TEXT } from '../../../io/backup/size-limit.ts';
import type { ImportProgress } from '../../import-worker/protocol.ts';
import { useModel, useSignal } from '@preact/signals';
import { useEffect, useRef } from 'preact/hooks';
import type { StudyRecord } from '../../../core/study/study.ts';
import type { Store } from '../../../store/store.ts';
import { DemoBadge } from '../../components/demo-badge/index.tsx';
import { ProblemBox } from '../../components/problem-box/index.tsx';
import { SetAsideLink } from '../../components/set-aside-link/index.tsx';
import { StudyHeader } from '../../components/study-header/index.tsx';
import { when } from '../../lib/format.ts';
import { ExportModel } from '../../models/export-model.ts';
import { hrefTo } from '../../app/routes.ts';
import { isDemo } from '../../demo/is-demo.ts';
import './style.css';

/** Without a study id: every study on this device. */
export type ExportScreenProps = { readonly store: Store; readonly studyId?: string | null };

/** The import's progress in words. */
function progressText(p: ImportProgress): string {
  if (p.stage === 'reading') return `Reading the file… ${Math.round(p.fraction * 100)} %`;
  return p.stage === 'checking' ? 'Checking the file (format, checksum, every record)…' : 'Merging the records…';
}

export function ExportScreen({ store, studyId }: ExportScreenProps) {
  const model = useModel(() => new ExportModel(store, studyId ?? null));
  useEffect(() => void model.load(), []);
  const focus = model.focus.value;
  const studies: readonly StudyRecord[] = focus ? [focus] : model.studies.value;
  const status = model.status.value;
  const busy = model.busy.value;
  const problem = model.problem.value;
  const share = model.canShare.value;
  // An import's outcome is shown beside the file picker at the foot of the screen, an export's at the top.
  const lastWasImport = useSignal(false);
  const importOutcome = useRef<HTMLDivElement>(null);
  // Brought into view when it comes: the picker sits at the foot of the screen, the message below it.
  useEffect(() => importOutcome.current?.scrollIntoView?.({ block: 'nearest' }), [lastWasImport.value, model.done.value, problem]);
  const outcome = (
    <>
      {problem && <ProblemBox problem={problem} />}
      {model.done.value && (
        <p class="notice" role="status">
          {model.done.value}
        </p>
      )}
    </>
  );
  const save = (id: string | null, kind: Parameters<typeof model.save>[1]) => {
    lastWasImport.value = false;
    void model.save(id, kind);
  };
  return (
    <section>
      {focus ? <StudyHeader study={focus} current="export" /> : <a class="back" href={hrefTo('studies', {})}>‹ All studies</a>}
      <h2>Export</h2>
      <p>The backup (JSON) keeps everything, history included, and can be imported on another device. The CSV is for a spreadsheet or the desktop analysis.</p>
      {!lastWasImport.value && outcome}
      {status && status.persistence.asked && status.persistence.granted === false && (
        <p class="warning">This browser keeps Trialbook's records only as long as it has room. Export a backup often.</p>
      )}
      <ul class="cards">
        {studies.map((s) => {
          const due = status?.backupDue.find((b) => b.studyId === s.id);
          return (
            <li class="card" key={s.id}>
              <h3 class="card-title">{s.title}</h3>
              {isDemo(s) && <DemoBadge compact />}
              <p class="card-line quiet">Last exported: {status?.lastExports[s.id] ? when(status.lastExports[s.id]) : 'never'}</p>
              {due && <p class="card-line due">A backup is due: runs logged here since {when(due.unexportedSince)} are in no backup yet. Download or share one now.</p>}
              <button type="button" class="btn primary block" disabled={busy} onClick={() => save(s.id, 'json')}>
                {share ? 'Save or share backup (JSON)' : 'Download backup (JSON)'}
              </button>
              <button type="button" class="btn block" disabled={busy} onClick={() => save(s.id, 'csv')}>
                {share ? 'Save or share CSV' : 'Download CSV'}
              </button>
              {s.design.runs.some((r) => r.kind === 'confirmation') && (
                <button type="button" class="btn block" disabled={busy} onClick={() => save(s.id, 'confirmations')}>
                  {share ? 'Save or share confirmation verdicts (CSV)' : 'Download confirmation verdicts (CSV)'}
                </button>
              )}
            </li>
          );
        })}
      </ul>
      {!focus && model.studies.value.length > 1 && (
        <button type="button" class="btn block" disabled={busy} onClick={() => save(null, 'json')}>
          {share ? 'Save or share one backup of all studies' : 'Download one backup of all studies'}
        </button>
      )}
      <h3>Import a backup</h3>
      <p class="quiet">A backup file from another phone or tab is merged in: new runs and revisions are added, and nothing here is overwritten. Files up to {MAX_BACKUP_TEXT}.</p>
      {model.importProgress.value && (
        <p class="notice" role="status">
          {progressText(model.importProgress.value)}
        </p>
      )}
      <SetAsideLink store={store} after={model.done.value} />
      <label class="btn block file-pick">
        Choose a backup file
        <input
          type="file"
          accept=".json,application/json"
          disabled={busy}
          onChange={(e) => {
            const input = e.currentTarget as HTMLInputElement;
            const file = input.files?.[0];
            if (file) {
              lastWasImport.value = true;
              void model.importFile(file).then(() => (input.value = ''));
            }
          }}
        />
      </label>
      {lastWasImport.value && <div ref={importOutcome}>{outcome}</div>}
    </section>
  );
}
