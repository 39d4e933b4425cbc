/**
 * Typing of this run kept by other forms (another tab, or a tab since closed): when it was typed
 * and what it holds, with a button to take it into this form and one to throw it away (asked
 * twice). Nothing here is taken over without the person's tap, so no tab's typing is lost.
 */
import { useSignal } from '@preact/signals';
import { plannedSettings, type Setting, type StudyRecord } from '../../../core/study/study.ts';
import type { Draft } from '../../../store/db.ts';
import { when } from '../../lib/when.ts';
import './style.css';

export type OtherTypingProps = {
  readonly study: StudyRecord;
  readonly drafts: readonly Draft[];
  /** True while this form holds typing of its own (taking other typing would replace it). */
  readonly ownTyping: boolean;
  readonly busy?: boolean;
  readonly onTake: (formId: string) => void;
  readonly onDiscard: (formId: string) => void;
};

/** What a draft holds, in the run form's own words: readings, settings changed from the plan, notes. */
function typed(study: StudyRecord, d: Draft): string {
  const parts = study.responses.map((r, i) => `${r.name}: ${d.form.readings[i]?.trim() || 'nothing typed'}`);
  const planned = plannedOrNull(study, d.plannedRun);
  study.factors.forEach((f, i) => {
    const v = d.form.actual[i]?.trim() ?? '';
    if (planned === null || v !== String(planned[i])) parts.push(`${f.name}: ${v || 'nothing typed'}${f.kind === 'numeric' && f.unit && v ? ` ${f.unit}` : ''}`);
  });
  if (d.form.notes.trim()) parts.push(`notes: ${d.form.notes.trim()}`);
  if (d.form.excluded) parts.push('marked to be excluded');
  return parts.join(' · ');
}

/** The planned settings of the run, or null when the plan at hand does not hold it (every setting is then listed). */
function plannedOrNull(study: StudyRecord, plannedRun: number): readonly Setting[] | null {
  try {
    return plannedSettings(study, plannedRun);
  } catch {
    return null;
  }
}

export function OtherTyping({ study, drafts, ownTyping, busy, onTake, onDiscard }: OtherTypingProps) {
  const asking = useSignal<string | null>(null);
  if (drafts.length === 0) return null;
  const one = drafts.length === 1;
  return (
    <div class="other-typing" role="group" aria-label={one ? 'Typing from another tab' : `Typing from ${drafts.length} other tabs`}>
      <p class="other-typing-head">
        <strong>{one ? 'Typing for this run was not saved' : `Typing for this run was not saved in ${drafts.length} places`}</strong>, in another
        tab or in a tab since closed. {one ? 'It is' : 'Each is'} kept as it is until you use it here or throw it away.
      </p>
      <ul class="other-typing-list">
        {drafts.map((d) => (
          <li key={d.formId} data-form={d.formId}>
            <span class="other-typing-when">Typed {when(d.updatedAt)}:</span> {typed(study, d)}
            {asking.value === d.formId ? (
              <>
                <p class="other-typing-ask">Throw this typing away? It cannot be brought back.</p>
                <button type="button" class="btn block" disabled={busy} onClick={() => (asking.value = null)}>
                  No, keep it
                </button>
                <button type="button" class="btn block" disabled={busy} onClick={() => ((asking.value = null), onDiscard(d.formId))}>
                  Yes, throw it away
                </button>
              </>
            ) : (
              <>
                <button type="button" class="btn block" disabled={busy || ownTyping} onClick={() => onTake(d.formId)}>
                  Use this typing here
                </button>
                <button type="button" class="btn block" disabled={busy} onClick={() => (asking.value = d.formId)}>
                  Throw it away…
                </button>
              </>
            )}
          </li>
        ))}
      </ul>
      {ownTyping && <p class="quiet">This form holds typing of its own: save or discard it before using other typing here.</p>}
    </div>
  );
}
