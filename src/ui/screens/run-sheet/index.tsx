/**
 * A study's run sheet: the planned runs in run order, each with its planned settings in real
 * units (and the actual one beside it where the logged run differs), whether it is logged or
 * excluded, and one big button to log it (or to review what was logged). From 1000 px wide the
 * cards give way to a table with planned and actual settings and responses; on paper it is a
 * table to fill in beside the machine.
 */
import { useModel } from '@preact/signals';
import { useEffect } from 'preact/hooks';
import type { Store } from '../../../store/store.ts';
import { ProblemBox } from '../../components/problem-box/index.tsx';
import { DivergedNote } from '../../components/diverged-note/index.tsx';
import { RunTable } from '../../components/run-table/index.tsx';
import { StudyHeader } from '../../components/study-header/index.tsx';
import { setting, withUnit } from '../../lib/format.ts';
import { hrefTo } from '../../app/routes.ts';
import { awaitsReading, RunSheetModel } from '../../models/run-sheet-model.ts';
import { RUN_KIND_NAMES } from '../../../core/design/design.ts';
import type { Setting } from '../../../core/study/study.ts';
import { SETTING_TOLERANCE } from '../../../core/tolerance.ts';
import './style.css';

/** True when a logged setting is not the planned one (numbers compared with the core's setting tolerance, relative). */
function settingDiffers(actual: Setting, planned: Setting): boolean {
  if (typeof actual === 'number' && typeof planned === 'number') return Math.abs(actual - planned) > SETTING_TOLERANCE * Math.max(1, Math.abs(planned));
  return actual !== planned;
}

export type RunSheetScreenProps = { readonly store: Store; readonly studyId: string };

export function RunSheetScreen({ store, studyId }: RunSheetScreenProps) {
  const model = useModel(() => new RunSheetModel(store, studyId));
  useEffect(() => void model.load(), []);
  const study = model.study.value;
  const problem = model.problem.value;
  if (problem) return <ProblemBox problem={problem} />;
  if (!study) return <p class="quiet">Reading the study…</p>;
  const rows = model.rows.value;
  const next = model.nextRun.value;
  return (
    <section class="run-sheet wide">
      <StudyHeader study={study} current="runSheet" />
      {study.purpose && <p class="purpose">{study.purpose}</p>}
      <p class="progress">
        <strong>
          {model.loggedCount.value} of {rows.length}
        </strong>{' '}
        planned runs logged{next !== null ? ` · next: run ${next}` : ' · all logged'}
      </p>
      <RunTable study={study} rows={rows} class="wide-only screen-only" />
      <RunTable study={study} rows={rows} blank class="print-only" />
      <ol class="runs phone-only screen-only">
        {rows.map((row) => {
          const logged = row.logged.length > 0;
          const waiting = awaitsReading(row);
          return (
            <li key={row.run} class={logged ? (row.excluded ? 'run-card excluded' : 'run-card logged') : 'run-card'} data-run={row.run}>
              <div class="run-head">
                <span class="run-no">Run {row.run}</span>
                <span class="run-kind">{RUN_KIND_NAMES[row.kind]}</span>
                <span class={logged && !waiting ? (row.excluded ? 'run-state out' : 'run-state done') : 'run-state'}>{logged ? (row.excluded ? '⊘ Excluded' : waiting ? 'Settings logged · no reading yet' : 'Logged ✓') : 'Not logged'}</span>
              </div>
              <dl class="settings">
                {study.factors.map((f, i) => {
                  const unit = f.kind === 'numeric' ? f.unit : undefined;
                  const actual = logged ? row.logged[0].actual[i] : undefined;
                  const differs = actual !== undefined && settingDiffers(actual, row.planned[i]);
                  return (
                    <div class="setting" key={f.name}>
                      <dt>{f.name}</dt>
                      <dd>
                        {!differs && <span>{setting(row.planned[i], unit)}</span>}
                        {differs && (
                          <>
                            <span class="actual">actual {setting(actual, unit)}</span> <span class="planned-was">planned {setting(row.planned[i], unit)}</span>
                          </>
                        )}
                      </dd>
                    </div>
                  );
                })}
              </dl>
              {logged && !row.excluded && (
                <p class="run-result">
                  {study.responses.map((r, i) => `${r.name} ${withUnit(row.means[i], r.unit)}`).join(' · ')}
                </p>
              )}
              {row.excluded && <p class="run-result excluded-note">Left out of the analysis. Reason: {row.logged[0].reason}</p>}
              {row.farOutside.map((t) => (
                <p key={t} class="far-note">
                  <strong>Far outside the plan.</strong> {t}.
                </p>
              ))}
              {row.diverged && <DivergedNote study={study} diverged={row.diverged} />}
              {row.hasDraft && <p class="draft-note">Typing not saved yet is waiting in this run's form.</p>}
              <a class={logged ? 'btn block' : 'btn primary block'} href={hrefTo('runForm', { studyId: study.id, plannedRun: row.run })}>
                {logged ? `Review run ${row.run}` : `Log run ${row.run}`}
              </a>
            </li>
          );
        })}
      </ol>
    </section>
  );
}
