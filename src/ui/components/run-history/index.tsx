/**
 * A logged run's revisions, newest first: when and where each was saved, its values, what changed
 * from the revision before it, and a large button to bring an earlier one back (asked in the
 * page, never in a pop-up). Restoring adds a new revision; nothing is deleted.
 */
import { useModel } from '@preact/signals';
import { useEffect } from 'preact/hooks';
import type { StudyRecord } from '../../../core/study/study.ts';
import type { Store } from '../../../store/store.ts';
import { num, setting, when } from '../../lib/format.ts';
import { HISTORY_PAGE, RunHistoryModel } from '../../models/run-history-model.ts';
import { ProblemBox } from '../problem-box/index.tsx';
import './style.css';

export type RunHistoryProps = {
  readonly store: Store;
  readonly study: StudyRecord;
  readonly runId: string;
  /** True while the form holds typing that is not saved: restoring waits. */
  readonly unsaved: boolean;
  /** Called after a restore wrote a new revision (the form reopens from it). */
  readonly onRestored: () => void;
  /** The person chose to save the typing first (the form is shown again). */
  readonly onSaveFirst: () => void;
  /** The person chose to throw the typing away. */
  readonly onDiscard: () => void;
  readonly onClose: () => void;
};

const shortId = (id: string) => id.slice(0, 8);

export function RunHistory({ store, study, runId, unsaved, onRestored, onSaveFirst, onDiscard, onClose }: RunHistoryProps) {
  const model = useModel(() => new RunHistoryModel(store, study, runId));
  useEffect(() => void model.load(), []);
  const entries = model.entries.value;
  const confirming = model.confirming.value;
  const busy = model.restoreState.value === 'restoring';
  const last = model.lastRestore.value;
  // The question and its buttons come into view under the thumb that asked.
  useEffect(() => {
    if (confirming) document.querySelector('.history-confirm')?.scrollIntoView({ block: 'nearest' });
  }, [confirming, unsaved]);

  return (
    <section class="run-history" aria-labelledby="history-title">
      <div class="history-head">
        <h3 id="history-title" class="group-title">
          History ({entries.length} {entries.length === 1 ? 'revision' : 'revisions'})
        </h3>
        <button type="button" class="btn" onClick={onClose}>
          Back to the form
        </button>
      </div>
      <p class="quiet">Newest first. Restoring brings an earlier revision back as a new revision; nothing is deleted.</p>
      {last && (
        <p class="notice" role="status">
          Revision {last.from} restored as revision {last.to}. The form shows it now.
        </p>
      )}
      {model.problem.value && <ProblemBox problem={model.problem.value} />}
      {model.revisions.value === null && !model.problem.value && <p class="quiet">Reading the history…</p>}
      <ol class="history-list">
        {model.shownEntries.value.map((e) => {
          const r = e.revision;
          const asking = confirming === r.id;
          return (
            <li key={r.id} class={e.isCurrent ? 'history-item current' : 'history-item'} data-revision={e.number}>
              <div class="history-item-head">
                <span class="history-no">Revision {e.number}</span>
                {e.isCurrent && <span class="mark current-mark">Current</span>}
                {e.restoredFromNumber !== null && <span class="mark restored-mark">Restored from revision {e.restoredFromNumber}</span>}
              </div>
              <p class="history-when">
                Saved {when(r.savedAt)} · device {shortId(r.device)}
                {r.device === store.device ? ' (this one)' : ''}
              </p>
              {e.sharesParent && <p class="history-fork">{e.forkOnThisDevice ? 'Changed in two places on this device (two tabs or windows) from the same revision; both kept.' : 'Changed on two devices from the same revision; both kept.'}</p>}
              <p class="history-changes">
                {e.first ? 'First revision.' : e.changes.length === 0 ? 'No values changed.' : `Changed: ${e.changes.join(', ')}`}
              </p>
              <dl class="history-values">
                {study.factors.map((f, i) => (
                  <div key={f.name}>
                    <dt>{f.name}</dt>
                    <dd>{setting(r.actual[i], f.kind === 'numeric' ? f.unit : undefined)}</dd>
                  </div>
                ))}
                {study.responses.map((resp, i) => (
                  <div key={resp.name}>
                    <dt>{resp.name}</dt>
                    <dd>{(r.readings[i] ?? []).length === 0 ? 'not measured' : `${r.readings[i].map((x) => num(x, 6)).join('; ')}${resp.unit ? ` ${resp.unit}` : ''}`}</dd>
                  </div>
                ))}
                <div>
                  <dt>Notes</dt>
                  <dd class="history-notes">{r.notes === '' ? 'none' : r.notes}</dd>
                </div>
                <div>
                  <dt>In the analysis</dt>
                  <dd>{r.excluded ? `excluded: ${r.reason}` : 'used'}</dd>
                </div>
              </dl>
              {!e.isCurrent &&
                (asking ? (
                  unsaved ? (
                    <div class="history-confirm" role="group" aria-label="Unsaved typing">
                      <p>The form holds typing that is not saved. Save it or discard it before restoring.</p>
                      <button type="button" class="btn primary big block" onClick={onSaveFirst}>
                        Save my typing first
                      </button>
                      <button type="button" class="btn big block" onClick={onDiscard}>
                        Discard my typing
                      </button>
                      <button type="button" class="btn ghost block" onClick={() => model.ask(null)}>
                        Cancel
                      </button>
                    </div>
                  ) : (
                    <div class="history-confirm" role="group" aria-label={`Restore revision ${e.number}?`}>
                      <p>Restore revision {e.number}? Its values become a new current revision; every revision stays kept.</p>
                      <button
                        type="button"
                        class="btn primary big block"
                        disabled={busy}
                        onClick={() =>
                          void model.restore().then((ok) => {
                            if (!ok) return;
                            onRestored();
                            // Show the new current revision, at the top of the list.
                            document.getElementById('history-title')?.scrollIntoView({ block: 'start' });
                          })
                        }
                      >
                        {busy ? 'Restoring…' : `Yes, restore revision ${e.number}`}
                      </button>
                      <button type="button" class="btn ghost block" disabled={busy} onClick={() => model.ask(null)}>
                        Cancel
                      </button>
                    </div>
                  )
                ) : (
                  <button type="button" class="btn big block" disabled={busy} onClick={() => model.ask(r.id)}>
                    Restore this revision
                  </button>
                ))}
            </li>
          );
        })}
      </ol>
      {model.hiddenCount.value > 0 && (
        <button type="button" class="btn big block" onClick={() => model.showOlder()}>
          Show {Math.min(HISTORY_PAGE, model.hiddenCount.value)} older revisions ({model.hiddenCount.value} not shown)
        </button>
      )}
    </section>
  );
}
