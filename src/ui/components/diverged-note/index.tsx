/**
 * A run with two (or more) current revisions: where it was changed, the value each revision
 * holds and which one is used; on the run form, a button per revision to keep it as a new
 * revision (every revision stays in the history).
 */
import type { DivergedRun } from '../../../core/study/diverged-runs.ts';
import type { StudyRecord } from '../../../core/study/study.ts';
import { divergedPlaces, revisionValuesText } from '../../../core/text/diverged-text.ts';
import './style.css';

export type DivergedNoteProps = {
  readonly study: StudyRecord;
  readonly diverged: DivergedRun;
  /** When given, each revision gets a button that keeps it as a new revision. */
  readonly onKeep?: (revisionId: string) => void;
  /** True while a keep is being saved (the buttons wait). */
  readonly busy?: boolean;
};

export function DivergedNote({ study, diverged, onKeep, busy }: DivergedNoteProps) {
  const all = [...diverged.others, diverged.current];
  const n = all.length;
  return (
    <div class="diverged" role="group" aria-label={`Run ${diverged.plannedRun} has ${n} current revisions`}>
      <p class="diverged-head">
        <strong>{n} current revisions</strong>: {divergedPlaces(diverged)} from the same revision. {n === 2 ? 'Both are' : 'All are'} kept.
      </p>
      <ul class="diverged-list">
        {[diverged.current, ...diverged.others].map((r) => (
          <li key={r.id} data-revision={r.id}>
            <span class="diverged-which">{r.id === diverged.current.id ? 'Used now:' : 'Other:'}</span> {revisionValuesText(study, r, all)}
            {onKeep && (
              <button type="button" class="btn block" disabled={busy} onClick={() => onKeep(r.id)}>
                {r.id === diverged.current.id ? 'Keep the one used now' : 'Keep this one instead'}
              </button>
            )}
          </li>
        ))}
      </ul>
    </div>
  );
}
