/**
 * The records that imports set aside (same id as a record here, other content; or built on such
 * a record): each in plain words (what it is, which study and run, why, when, from which device),
 * all of them saved to one file, and one removed only after the person says yes twice (a button,
 * then a confirmation naming it). Nothing on this screen changes a study or a run.
 */
import { useModel } from '@preact/signals';
import { useEffect } from 'preact/hooks';
import { SET_ASIDE_INTRO, SET_ASIDE_NONE, setAsideConfirm, setAsideFrom, setAsideWhat, setAsideWhy } from '../../../core/text/set-aside-text.ts';
import type { Store } from '../../../store/store.ts';
import { hrefTo } from '../../app/routes.ts';
import { ProblemBox } from '../../components/problem-box/index.tsx';
import { canShareFiles } from '../../lib/save-file.ts';
import { when } from '../../lib/when.ts';
import { SetAsideModel } from '../../models/set-aside-model.ts';
import './style.css';

export type SetAsideScreenProps = { readonly store: Store };

export function SetAsideScreen({ store }: SetAsideScreenProps) {
  const model = useModel(() => new SetAsideModel(store));
  useEffect(() => void model.load(), []);
  const rows = model.rows.value ?? [];
  const busy = model.busy.value;
  const confirming = model.confirming.value;
  const share = canShareFiles();
  return (
    <section>
      <a class="back" href={hrefTo('export', {})}>
        ‹ Export and import
      </a>
      <h2>Set-aside records</h2>
      <p>{SET_ASIDE_INTRO}</p>
      {model.problem.value && <ProblemBox problem={model.problem.value} />}
      {model.done.value && (
        <p class="notice" role="status">
          {model.done.value}
        </p>
      )}
      {model.loading.value && <p class="quiet">Reading the set-aside records…</p>}
      {!model.loading.value && !model.problem.value && rows.length === 0 && <p>{SET_ASIDE_NONE}</p>}
      {rows.length > 0 && (
        <button type="button" class="btn primary block" disabled={busy} onClick={() => void model.saveAll()}>
          {share ? `Save or share the ${rows.length} records (JSON)` : `Download the ${rows.length} records (JSON)`}
        </button>
      )}
      <ul class="cards">
        {rows.map((r) => {
          const title = model.titleOf(r.studyId);
          const what = setAsideWhat(r, title);
          return (
            <li key={r.key} class="card set-aside-card" data-key={r.key}>
              <h3 class="card-title">{what}</h3>
              <p class="card-line">{setAsideWhy(r)}</p>
              {model.valuesOf(r.key) && <p class="card-line set-aside-values">{model.valuesOf(r.key)}</p>}
              <p class="card-line set-aside-reason">{r.reason}</p>
              <p class="card-line quiet">
                Set aside {when(r.setAsideAt)}. {setAsideFrom(r)}
              </p>
              {confirming === r.key ? (
                <div class="set-aside-confirm" role="alertdialog" aria-label={`Remove ${what}?`}>
                  <p>{setAsideConfirm(r, title, model.saved.value.has(r.key))}</p>
                  <button type="button" class="btn primary block" disabled={busy} onClick={() => model.cancelRemove()}>
                    Keep it
                  </button>
                  <button type="button" class="btn block set-aside-remove" disabled={busy} onClick={() => void model.confirmRemove(r.key)}>
                    Yes, remove it
                  </button>
                </div>
              ) : (
                <button type="button" class="btn ghost block" disabled={busy} onClick={() => model.askRemove(r.key)} aria-label={`Remove ${what}…`}>
                  Remove…
                </button>
              )}
            </li>
          );
        })}
      </ul>
    </section>
  );
}
