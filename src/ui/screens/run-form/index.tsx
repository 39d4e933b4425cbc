/**
 * The form of one run, made for a phone beside the machine: the planned setting beside each
 * actual one, large boxes for the readings, notes, and exclusion with a reason. The typing is
 * kept as a draft on every change; "Saved" appears only once the save is on disk.
 */
import { useModel, useSignal } from '@preact/signals';
import { useEffect, useRef } from 'preact/hooks';
import { RUN_KIND_NAMES } from '../../../core/design/design.ts';
import { negativeAllowed } from '../../../core/factor/negative-allowed.ts';
import type { Store } from '../../../store/store.ts';
import { AxialWarning } from '../../components/axial-warning/index.tsx';
import { ChoiceButtons } from '../../components/choice-buttons/index.tsx';
import { DivergedNote } from '../../components/diverged-note/index.tsx';
import { OtherTyping } from '../../components/other-typing/index.tsx';
import { ProblemBox } from '../../components/problem-box/index.tsx';
import { ReadingsField } from '../../components/readings-field/index.tsx';
import { RunHistory } from '../../components/run-history/index.tsx';
import { SignToggle } from '../../components/sign-toggle/index.tsx';
import { StudyHeader } from '../../components/study-header/index.tsx';
import { setting, when } from '../../lib/format.ts';
import { fileName, mimeOf, saveText } from '../../lib/save-file.ts';
import { problemOf } from '../../lib/problem.ts';
import { readingBoxes, RunFormModel } from '../../models/run-form-model.ts';
import { hrefTo } from '../../app/routes.ts';
import { NumberInput } from '../../components/number-input/index.tsx';
import './style.css';

export type RunFormScreenProps = { readonly store: Store; readonly studyId: string; readonly plannedRun: number };

export function RunFormScreen({ store, studyId, plannedRun }: RunFormScreenProps) {
  const model = useModel(() => new RunFormModel(store, studyId, plannedRun));
  const exporting = useSignal(false);
  const exportNote = useSignal<string | null>(null);
  const showHistory = useSignal(false);
  useEffect(() => void model.load(), []);
  // A question about the save opens beside the Save bar, where it could sit under the bar: it is brought into view.
  const farRef = useRef<HTMLDivElement>(null);
  const noReadingRef = useRef<HTMLDivElement>(null);
  useEffect(() => farRef.current?.scrollIntoView?.({ block: 'center' }), [model.confirmingFar.value]);
  useEffect(() => noReadingRef.current?.scrollIntoView?.({ block: 'center' }), [model.confirmingNoReading.value]);

  const state = model.state.value;
  const form = model.form.value;
  const problem = model.problem.value;
  const saveState = model.saveState.value;
  const draftState = model.draftState.value;

  async function exportNow() {
    if (!state) return;
    exporting.value = true;
    try {
      // The export code (with the CSV writer) loads on this rare path only, not with the form.
      const { backupFile } = await import('../../models/export-model.ts');
      const backup = await backupFile(store, [state.study.id]);
      const outcome = await saveText(backup.text, fileName(state.study.title, 'json'), mimeOf('json'), `Trialbook: ${state.study.title}`);
      if (outcome !== 'cancelled') await backup.noteSaved();
      exportNote.value =
        outcome === 'cancelled'
          ? 'Sharing was cancelled; no backup was made. Tap again to export.'
          : `The backup file ${outcome === 'shared' ? 'was handed to the share sheet' : 'is downloading'}. Keep it until the storage problem is solved.`;
    } catch (err) {
      exportNote.value = `The backup could not be made: ${problemOf(err).message}`;
    } finally {
      exporting.value = false;
    }
  }

  if (!state || !form) {
    return problem ? <ProblemBox problem={problem} /> : <p class="quiet">Opening run {plannedRun}…</p>;
  }
  const { study } = state;
  const planned = model.planned.value;
  const runCount = study.design.runs.length;
  const plannedRow = study.design.runs.find((r) => r.run === plannedRun);
  const kind = plannedRow?.kind;
  const busy = saveState === 'saving';
  const nextRun = study.design.runs.some((r) => r.run === plannedRun + 1) ? plannedRun + 1 : null;

  return (
    <section class="run-form">
      <StudyHeader study={study} current={null} back={{ href: hrefTo('runSheet', { studyId: study.id }), label: 'Run sheet' }} />
      <h2 class="run-title">
        Run {plannedRun} <span class="quiet">of {runCount}</span>
        {kind !== undefined && <span class="run-kind"> {RUN_KIND_NAMES[kind]}</span>}
      </h2>
      {kind === 'axial' && plannedRow && <AxialWarning factors={study.factors} coded={plannedRow.coded} />}
      {state.current && (
        <p class="quiet">
          Logged {when(state.current.savedAt)} · {state.current.revisions} {state.current.revisions === 1 ? 'revision' : 'revisions'} kept. Saving adds a new revision; nothing is overwritten.
        </p>
      )}
      {state.current && !showHistory.value && (
        <button type="button" class="btn block history-open" disabled={busy} onClick={() => (showHistory.value = true)}>
          History ({state.current.revisions} {state.current.revisions === 1 ? 'revision' : 'revisions'})
        </button>
      )}
      {state.current && showHistory.value && (
        <RunHistory
          store={store}
          study={study}
          runId={state.runId}
          unsaved={model.dirty.value && saveState !== 'saved'}
          onRestored={() => void model.reload()}
          onSaveFirst={() => {
            showHistory.value = false;
            requestAnimationFrame(() => document.querySelector<HTMLElement>('.run-form .save-bar button[type="submit"]')?.focus());
          }}
          onDiscard={() => void model.discardTyping()}
          onClose={() => (showHistory.value = false)}
        />
      )}
      {model.diverged.value && !showHistory.value && (
        <>
          <DivergedNote study={study} diverged={model.diverged.value} busy={model.keeping.value || busy || (model.dirty.value && saveState !== 'saved')} onKeep={(id) => void model.keepRevision(id)} />
          {model.dirty.value && saveState !== 'saved' && <p class="quiet">Save or discard the typing below before keeping one revision.</p>}
        </>
      )}
      {draftState === 'restored' && <p class="notice">Your earlier typing was kept and is back. It is not saved yet.</p>}
      {!showHistory.value && (
        <OtherTyping
          study={study}
          drafts={model.otherDrafts.value}
          ownTyping={model.ownTyping.value}
          busy={busy}
          onTake={(id) => void model.takeOther(id)}
          onDiscard={(id) => void model.discardOther(id)}
        />
      )}

      <form
        hidden={showHistory.value}
        onSubmit={(e) => {
          e.preventDefault();
          void model.save().then(() => {
            // A refused entry: take the person to the first field that needs them, or, when the
            // message is about the run as a whole (an excluded run needs a reason), to the message.
            if (model.problem.peek()?.kind === 'input') {
              const field = document.querySelector<HTMLElement>('.run-form [aria-invalid="true"]');
              if (field) field.focus();
              else document.querySelector<HTMLElement>('.run-form .problem')?.scrollIntoView?.({ block: 'center' });
            }
          });
        }}
      >
        <fieldset class="group" disabled={busy}>
          <legend>Settings</legend>
          {study.factors.map((f, i) => {
            const plannedText = setting(planned[i], f.kind === 'numeric' ? f.unit : undefined);
            const typed = form.actual[i];
            const differs = model.differs.value[i];
            const error = model.actualErrors.value[i];
            return (
              <div class="field" key={f.name}>
                <div class="field-head">
                  <label for={`actual-${i}`} class="field-name">
                    {f.name}
                  </label>
                  <span class="planned">Planned {plannedText}</span>
                </div>
                {f.kind === 'numeric' ? (
                  <div class="factor-entry">
                    <NumberInput id={`actual-${i}`} value={typed} invalid={!!error} onText={(t) => model.setActual(i, t)} />
                    {f.unit && <span class="unit">{f.unit}</span>}
                    {negativeAllowed({ kind: 'setting', factor: f }) && <SignToggle text={typed} what={`${f.name} actual`} controls={`actual-${i}`} disabled={busy} onText={(t) => model.setActual(i, t)} />}
                  </div>
                ) : (
                  <ChoiceButtons label={`${f.name} actual`} hideLabel options={f.levels.map((l) => ({ value: l, label: l }))} value={typed} onChoose={(v) => model.setActual(i, v)} />
                )}
                {differs && !error && !model.farOutside.value[i] && <p class="differs">Actual differs from the plan: the analysis uses the actual setting.</p>}
                {!error && model.farOutside.value[i] && (
                  <p class="far-outside" role="alert">
                    <strong>Far outside the plan.</strong> {model.farOutside.value[i]}. The analysis would extrapolate every effect through it.
                  </p>
                )}
                {error && (
                  <p class="field-error" role="alert">
                    {error}
                  </p>
                )}
              </div>
            );
          })}
        </fieldset>

        <div class="group">
          <h3 class="group-title">Readings</h3>
          {study.responses.map((r, i) => (
            <ReadingsField
              key={r.name}
              response={r}
              index={i}
              boxes={readingBoxes(form.readings[i])}
              mean={model.means.value[i]}
              error={model.readingErrors.value[i]}
              disabled={busy}
              onReading={(j, t) => model.setReading(i, j, t)}
              onAdd={() => model.addReading(i)}
              onRemove={(j) => model.removeReading(i, j)}
            />
          ))}
        </div>

        <fieldset class="group" disabled={busy}>
          <legend>About the run</legend>
          <div class="field">
            <div class="field-head">
              <span class="field-name">Time of run</span>
              <span class="planned">{form.loggedAt ? when(form.loggedAt) : state.current ? 'not given' : 'the time of saving'}</span>
            </div>
            <button type="button" class="btn" onClick={() => model.setTimeNow()}>
              Set to now
            </button>
          </div>
          <label class="field">
            <span class="field-name">Operator (optional)</span>
            <input class="text" type="text" autocomplete="name" value={form.operator} onInput={(e) => model.setOperator((e.currentTarget as HTMLInputElement).value)} />
          </label>
          <label class="field">
            <span class="field-name">Notes</span>
            <textarea class="text" rows={3} value={form.notes} onInput={(e) => model.setNotes((e.currentTarget as HTMLTextAreaElement).value)} />
          </label>
          <div class="field">
            <ChoiceButtons
              label="Use this run in the analysis?"
              options={[
                { value: 'use', label: 'Use it' },
                { value: 'exclude', label: 'Exclude it' },
              ]}
              value={form.excluded ? 'exclude' : 'use'}
              onChoose={(v) => model.setExcluded(v === 'exclude')}
            />
          </div>
          {form.excluded && (
            <label class="field">
              <span class="field-name">Reason for excluding (needed)</span>
              <textarea class="text" rows={2} value={form.reason} onInput={(e) => model.setReason((e.currentTarget as HTMLTextAreaElement).value)} />
            </label>
          )}
        </fieldset>

        {model.confirmingFar.value && (
          <div class="far-confirm" role="alertdialog" aria-label="Save a setting far outside the plan?" ref={farRef}>
            <p>
              <strong>Save with {model.confirmingFar.value.length === 1 ? 'this setting' : 'these settings'}?</strong>
            </p>
            <ul>
              {model.confirmingFar.value.map((t) => (
                <li key={t}>{t}</li>
              ))}
            </ul>
            <button
              type="button"
              class="btn primary big block"
              onClick={() => {
                // Back to the first setting in question, not left at the bottom of the form.
                const i = model.farOutside.peek().findIndex((x) => x !== null);
                model.cancelFar();
                if (i >= 0) document.getElementById(`actual-${i}`)?.focus();
              }}
            >
              Correct it
            </button>
            <button type="button" class="btn big block" onClick={() => void model.save(true)}>
              Yes, it was run at {model.confirmingFar.value.length === 1 ? 'this setting' : 'these settings'}: save
            </button>
          </div>
        )}
        {model.confirmingNoReading.value && (
          <div class="far-confirm" role="alertdialog" aria-label="Save this run with no reading?" ref={noReadingRef}>
            <p>
              <strong>Save run {plannedRun} with no reading?</strong>
            </p>
            {model.confirmingNoReading.value.dropped.length > 0 ? (
              <>
                <p>This save takes away the readings saved before (they stay in the run's history):</p>
                <ul>
                  {model.confirmingNoReading.value.dropped.map((t) => (
                    <li key={t}>{t}</li>
                  ))}
                </ul>
              </>
            ) : (
              <p>The settings and notes are kept. The analysis leaves this run out until a reading is added.</p>
            )}
            <button
              type="button"
              class="btn primary big block"
              onClick={() => {
                model.cancelNoReading();
                document.getElementById('reading-0-0')?.focus();
              }}
            >
              Type the reading
            </button>
            <button type="button" class="btn big block" onClick={() => void model.save(true, true)}>
              Yes, save with no reading
            </button>
          </div>
        )}
        {problem && <ProblemBox problem={problem} onExport={() => void exportNow()} exportBusy={exporting.value} />}
        {exportNote.value && <p class="notice">{exportNote.value}</p>}

        <div class={saveState === 'saved' ? 'save-bar saved' : 'save-bar'}>
          <p class="save-state" role="status" aria-live="polite">
            {saveState === 'saving'
              ? 'Saving…'
              : saveState === 'saved'
                ? `Saved ✓ run ${plannedRun}${model.lastSave.value?.duplicate ? ' (already saved)' : ''}`
                : draftState === 'failed'
                  ? 'Typing not kept: see the message above'
                  : draftState === 'kept' || draftState === 'keeping' || draftState === 'restored'
                    ? 'Not saved yet (typing kept as a draft)'
                    : state.current
                      ? 'No changes'
                      : 'Not saved yet'}
          </p>
          {saveState === 'saved' ? (
            nextRun !== null ? (
              <a class="btn primary big" href={hrefTo('runForm', { studyId: study.id, plannedRun: nextRun })}>
                Next: run {nextRun}
              </a>
            ) : (
              <a class="btn primary big" href={hrefTo('runSheet', { studyId: study.id })}>
                Run sheet
              </a>
            )
          ) : (
            <button type="submit" class="btn primary big" disabled={busy || !model.dirty.value}>
              {busy ? 'Saving…' : `Save run ${plannedRun}`}
            </button>
          )}
        </div>
      </form>
      {!showHistory.value && saveState === 'saved' && model.lastSave.value?.changedSince && (
        <p class="notice">This run was changed elsewhere after the form opened. Both revisions are kept in its history.</p>
      )}
      {!showHistory.value && saveState === 'saved' && (
        <a class="btn block" href={hrefTo('runSheet', { studyId: study.id })}>
          Back to the run sheet
        </a>
      )}
    </section>
  );
}
