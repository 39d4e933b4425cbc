/**
 * Next runs: what to do after the analysis, on the phone. Solve for a target, follow a path of
 * steepest ascent or descent, turn the path's steps into planned runs, plan confirmation runs at
 * a chosen setting, and see whether the logged confirmation runs confirm the model. Every
 * proposed setting comes with the standing caution.
 */
import { useModel, useSignal } from '@preact/signals';
import { useEffect } from 'preact/hooks';
import { intervalText } from '../../../core/text/interval-text.ts';
import { pathNeedsFirstOrder } from '../../../core/text/second-order-text.ts';
import { hrefTo } from '../../app/routes.ts';
import type { Store } from '../../../store/store.ts';
import { AddAxialRuns } from '../../components/add-axial-runs/index.tsx';
import { CautionBox } from '../../components/caution-box/index.tsx';
import { ChoiceButtons } from '../../components/choice-buttons/index.tsx';
import { CountStepper } from '../../components/count-stepper/index.tsx';
import { StudyPending } from '../../components/study-pending/index.tsx';
import { StudyHeader } from '../../components/study-header/index.tsx';
import { num, setting, withUnit } from '../../lib/format.ts';
import { NextRunsModel } from '../../models/next-runs-model.ts';
import { shownStudy, useStudyAnalysis } from '../../lib/use-study-analysis.ts';
import { CAUTION } from '../../../core/predict/caution.ts';
import { FoldoverPart, isFraction } from './foldover-part.tsx';
import { PathChart } from '../../components/path-chart/index.tsx';
import { SaveOutcome } from '../../components/save-outcome/index.tsx';
import { logMoreRunsText } from '../../../core/text/log-more-runs.ts';
import { NumberInput } from '../../components/number-input/index.tsx';
import './style.css';

export type NextRunsScreenProps = { readonly store: Store; readonly studyId: string };

function range(i: readonly [number, number] | null, unit: string | undefined): string {
  return intervalText(i, (x) => num(x), unit ? ` ${unit}` : '', 'not available (no runs left over to estimate the noise)');
}

export function NextRunsScreen({ store, studyId }: NextRunsScreenProps) {
  const shared = useStudyAnalysis(store, studyId);
  const model = useModel(() => new NextRunsModel(store, shared));
  useEffect(() => void model.refreshBlocks(studyId), []);
  // Which add button's question is open, and which button the last add came from (hooks before the early return).
  const asking = useSignal<string | null>(null);
  const lastAdd = useSignal<string | null>(null);
  const open = shownStudy(shared);
  if (!open) return <StudyPending shared={shared} />;
  const { study, shown, response } = open;
  const numeric = study.factors.flatMap((f, i) => (f.kind === 'numeric' ? [{ value: i, label: f.name }] : []));
  const path = model.path.value;
  const solution = model.solution.value;
  const base = model.pathBase.value;
  const baseFactor = base !== null ? study.factors[base] : null;
  const saving = model.saving.value;
  // Added runs stay in the study for good, so each add button asks first, beside itself, and the
  // outcome is shown there too (the status line at the top says it to screen readers).
  const count = model.confirmCountText.value.trim();
  // A count the model will refuse is left out of the question; the refusal comes with the yes.
  const counted = /^\d+$/.test(count) ? `${count} confirmation ${count === '1' ? 'run' : 'runs'}` : 'confirmation runs';
  const ask = (key: string, question: string, yes: () => void) =>
    asking.value === key ? (
      <div class="add-question" role="alertdialog" aria-label={question}>
        <p>
          <strong>{question}</strong> Added runs stay in the study for good; a run not made can be left unlogged.
        </p>
        <button
          type="button"
          class="btn primary big block"
          disabled={saving}
          onClick={() => {
            asking.value = null;
            lastAdd.value = key;
            yes();
          }}
        >
          Yes, add them
        </button>
        <button type="button" class="btn big block" onClick={() => (asking.value = null)}>
          Not now
        </button>
      </div>
    ) : lastAdd.value === key && !saving && (model.saved.value || model.saveProblem.value) ? (
      <p class={model.saved.value ? 'saved-note' : 'problem input'}>{model.saved.value ?? model.saveProblem.value}</p>
    ) : null;
  return (
    <section class="next-runs">
      <StudyHeader study={study} current="nextRuns" />
      <h2>Next runs</h2>
      <ChoiceButtons label="Response" options={study.responses.map((r, i) => ({ value: i, label: r.name }))} value={shown.index} onChoose={(i) => shared.show(i)} />
      {model.modelProblem.value && (
        <p class="problem input" role="alert">
          {logMoreRunsText(model.modelProblem.value)}
        </p>
      )}
      <SaveOutcome saved={model.saved.value} problem={model.saveProblem.value} />

      <section class="next-part" aria-labelledby="solve-h">
        <h3 id="solve-h">Solve for a target</h3>
        <p class="quiet">The setting of one factor that gives a target, the others held at their centers (categorical factors at their first level).</p>
        {numeric.length > 0 && <ChoiceButtons label="Factor to move" options={numeric} value={model.solveIndex.value ?? -1} onChoose={(i) => model.setSolveFactor(i)} />}
        <div class="field">
          <label class="field-name" for="solve-target">
            Target {response.name}
            {response.unit ? ` (${response.unit})` : ''}
          </label>
          <NumberInput id="solve-target" value={model.targetText.value} onText={(t) => model.setTarget(t)} />
        </div>
        {solution && !solution.ok && (
          <p class="problem input" role="alert">
            {solution.message}
          </p>
        )}
        {solution && solution.ok && (
          <div class={solution.value.reachable ? 'result-card' : 'result-card outside'} data-testid="solve-result">
            <p class="result-main">
              {solution.value.factor.name}: <strong class="nowrap">{setting(solution.value.setting, solution.value.factor.unit)}</strong>
              {solution.value.reachable ? '' : ' (the nearest the tested range allows)'}
            </p>
            <p>
              Predicted {response.name} there: {withUnit(solution.value.fit, response.unit)}; 95% interval for one run: {range(solution.value.pi, response.unit)}.
            </p>
            {solution.value.messages.length > 0 && (
              <ul class="warnings">
                {solution.value.messages.map((m) => (
                  <li key={m}>{m}</li>
                ))}
              </ul>
            )}
            <button type="button" class="btn block" disabled={saving} onClick={() => (asking.value = 'solve')}>
              Plan confirmation runs at this setting
            </button>
            {ask('solve', `Add ${counted} at ${solution.value.factor.name} ${setting(solution.value.setting, solution.value.factor.unit)} to the run sheet?`, () => model.addConfirmation(study.id, { from: 'solve' }))}
          </div>
        )}
      </section>

      <section class="next-part" aria-labelledby="path-h">
        <h3 id="path-h">Path of steepest {model.pathSense.value}</h3>
        <p class="quiet">Steps from the center in the direction the main effects point, to find where {response.name} stops improving.</p>
        {model.pathNeedsFirstOrder.value ? (
          <p class="quiet" data-testid="path-needs-first-order">
            {pathNeedsFirstOrder(response.name)} <a href={hrefTo('quickCard', { studyId: study.id })}>Open the quick card</a>
          </p>
        ) : (
          <>
            <ChoiceButtons
              label="Direction"
              options={[
                { value: 'ascent', label: 'Larger (ascent)' },
                { value: 'descent', label: 'Smaller (descent)' },
              ]}
              value={model.pathSense.value}
              onChoose={(s) => model.setPathSense(s)}
            />
            {numeric.length > 0 && <ChoiceButtons label="Base factor" options={numeric} value={base ?? -1} onChoose={(i) => model.setPathBase(i)} />}
            <div class="field">
              <label class="field-name" for="path-step">
                Step of {baseFactor?.name ?? 'the base factor'}
                {baseFactor?.kind === 'numeric' && baseFactor.unit ? ` (${baseFactor.unit})` : ''}
              </label>
              <NumberInput id="path-step" value={model.pathStepText.value} onText={(t) => model.setPathStep(t)} />
            </div>
            <CountStepper id="path-steps" label="Number of steps" value={model.pathStepsText.value} min={1} max={20} onChange={(t) => model.setPathSteps(t)} />
            {path && !path.ok && model.pathStepText.value.trim() !== '' && (
              <p class="problem input" role="alert">
                {path.message}
              </p>
            )}
            {path && path.ok && (
              <>
                <ol class="path-steps" data-testid="path-steps">
                  {path.value.steps.map((s) => (
                    <li key={s.step} class={s.outside ? 'path-step outside' : 'path-step'}>
                      <div class="step-head">
                        <span class="step-no">{s.step === 0 ? 'Center' : `Step ${s.step}`}</span>
                        {s.outside && <span class="outside-mark">⚠ outside the tested range</span>}
                      </div>
                      <p class="step-settings">
                        {study.factors.map((f, i) => (
                          <span class="nowrap" key={f.name}>
                            {i > 0 ? ' · ' : ''}
                            {f.name} {setting(s.real[i], f.kind === 'numeric' ? f.unit : undefined)}
                          </span>
                        ))}
                      </p>
                      <p>
                        Predicted {withUnit(s.fit, response.unit)}; 95% for one run {range(s.pi, response.unit)}
                      </p>
                      {s.step > 0 && (
                        <button type="button" class="btn ghost" disabled={saving} onClick={() => (asking.value = `step-${s.step}`)}>
                          Confirm at step {s.step}
                        </button>
                      )}
                      {s.step > 0 && ask(`step-${s.step}`, `Add ${counted} at path step ${s.step} to the run sheet?`, () => model.addConfirmation(study.id, { from: 'path', step: s.step }))}
                    </li>
                  ))}
                </ol>
                {path.value.messages.length > 0 && (
                  <ul class="warnings">
                    {path.value.messages.map((m) => (
                      <li key={m}>{m}</li>
                    ))}
                  </ul>
                )}
                <button type="button" class="btn primary block" disabled={saving || model.pathAdded.value} onClick={() => (asking.value = 'path')}>
                  {model.pathAdded.value ? 'These steps are on the run sheet' : `Add the ${path.value.steps.length - 1} steps as planned runs`}
                </button>
                {ask('path', `Add the ${path.value.steps.length - 1} steps to the run sheet as planned runs?`, () => model.addPath(study.id))}
          </>
        )}
          </>
        )}
        {model.pathPoints.value.map((pts, k) => (
          <div key={k}>
          {pts.some((p) => p.observed !== null) && <PathChart points={pts} response={`${response.name}${response.unit ? ` (${response.unit})` : ''}`} title={`Path runs ${pts[0]?.run ?? ''} to ${pts[pts.length - 1]?.run ?? ''}: observed and predicted ${response.name} by step`} />}
          <table class="path-table" aria-label={`Path runs ${pts[0]?.run ?? ''} to ${pts[pts.length - 1]?.run ?? ''}: observed against predicted`}>
            <thead>
              <tr>
                <th scope="col">Run</th>
                <th scope="col">Step</th>
                <th scope="col">Predicted</th>
                <th scope="col">Observed</th>
              </tr>
            </thead>
            <tbody>
              {pts.map((p) => (
                <tr key={p.run}>
                  <td>{p.run}</td>
                  <td>{p.step}</td>
                  <td>{num(p.predicted)}</td>
                  <td>{p.observed === null ? 'not logged' : num(p.observed)}</td>
                </tr>
              ))}
            </tbody>
          </table>
          </div>
        ))}
      </section>

      {isFraction(study) && <FoldoverPart store={store} study={study} onAdded={() => Promise.all([shared.load(), model.refreshBlocks(study.id)]).then(() => undefined)} />}

      <section class="next-part" aria-labelledby="confirm-h">
        <h3 id="confirm-h">Confirmation runs</h3>
        <p class="quiet">Runs at a chosen setting, judged against the model fitted without them: their mean should fall inside the 95% interval for the mean of that many new runs.</p>
        <CountStepper id="confirm-count" label="How many confirmation runs to plan" value={model.confirmCountText.value} min={1} max={20} onChange={(t) => model.setConfirmCount(t)} />
        {model.confirmations.value.length === 0 && <p class="quiet">None planned yet: choose a setting above (a solved setting or a path step).</p>}
        {model.confirmations.value.map((c) => (
          <div class="result-card" key={c.key} data-testid="confirmation">
            <p class="result-main">{c.place}</p>
            {c.note && <p class="quiet">{c.note}</p>}
            {c.progress && <p>{c.progress}</p>}
            <p class={c.outcome === 'confirmed' ? 'verdict good' : c.outcome === 'not-confirmed' ? 'verdict bad' : c.outcome === 'cannot-judge' ? 'problem input' : ''} role={c.outcome === 'cannot-judge' ? 'alert' : undefined}>
              {c.verdict}
            </p>
            {model.confirmationScale.value && (c.outcome === 'confirmed' || c.outcome === 'not-confirmed') && <p class="quiet">{model.confirmationScale.value}</p>}
          </div>
        ))}
      </section>
      <AddAxialRuns store={store} shared={shared} />
      <CautionBox lines={CAUTION} />
    </section>
  );
}
