/**
 * "Add axial runs" on the Next screen: from a logged two-level study, the axial block of a
 * central composite design (axial runs and their center runs) as a new block of the same study.
 * Before the tap it shows what the augmented design can estimate, the axial settings in real
 * units, a warning for each past the factorial range, and the standing caution.
 */
import { nameWithUnit } from '../../../core/study/name-with-unit.ts';
import { useModel } from '@preact/signals';
import { CAUTION } from '../../../core/predict/caution.ts';
import type { Store } from '../../../store/store.ts';
import { setting } from '../../lib/format.ts';
import { AxialBlockModel, type AxialChoice } from '../../models/axial-block-model.ts';
import type { StudyAnalysis } from '../../models/study-analysis-model.ts';
import { shownStudy } from '../../lib/use-study-analysis.ts';
import { CautionBox } from '../caution-box/index.tsx';
import { ChoiceButtons } from '../choice-buttons/index.tsx';
import { CountStepper } from '../count-stepper/index.tsx';
import { SaveOutcome } from '../save-outcome/index.tsx';
import './style.css';

export type AddAxialRunsProps = { readonly store: Store; readonly shared: StudyAnalysis };

const DISTANCES: readonly { readonly value: AxialChoice; readonly label: string }[] = [
  { value: 'orthogonal', label: 'Blocks orthogonal' },
  { value: 'rotatable', label: 'Rotatable' },
  { value: 'face', label: 'On the faces (±1)' },
];

export function AddAxialRuns({ store, shared }: AddAxialRunsProps) {
  const model = useModel(() => new AxialBlockModel(store, shared));
  const study = shownStudy(shared)?.study;
  if (!study) return null;
  const existing = model.existing.value;
  const p = model.preview.value;
  const saving = model.saving.value;
  return (
    <section class="next-part add-axial" aria-labelledby="axial-h">
      <h3 id="axial-h">Add axial runs</h3>
      <p class="quiet">
        Turns this two-level study into a central composite design, for a model with squares: runs on each axis and more center runs, added to the run sheet as a new block. The runs already logged are kept and used.
      </p>
      <SaveOutcome saved={model.saved.value} problem={model.saveProblem.value} />
      {existing.length > 0 ? (
        !model.saved.value && (
          <p class="quiet" data-testid="axial-done">
            This study has its axial runs already: runs {existing[0].run} to {existing[existing.length - 1].run}, with their center runs, in block {existing[0].block}.
          </p>
        )
      ) : (
        <>
          <ChoiceButtons label="How far out the axial runs go" options={DISTANCES} value={model.distance.value} onChoose={(d) => model.chooseDistance(d)} />
          <CountStepper id="axial-centers" label="Center runs in the new block" value={model.centers.value} min={0} max={20} onChange={(t) => model.setCenters(t)} />
          {p && !p.ok && (
            <p class="problem input" role="alert">
              {p.message}
            </p>
          )}
          {p && p.ok && (
            <div class={p.value.properties.warnings.length > 0 ? 'result-card outside' : 'result-card'} data-testid="axial-preview">
              <p class="result-main">
                {p.value.added.length} new runs: {p.value.added.length - p.value.added.filter((r) => r.kind === 'center').length} axial, {p.value.added.filter((r) => r.kind === 'center').length} center
              </p>
              <ul class="axial-about">
                {p.value.notes.slice(0, p.value.notes.length - p.value.properties.warnings.length - (p.value.properties.warnings.length > 0 ? p.value.properties.caution.length : 0)).map((n) => (
                  <li key={n}>{n}</li>
                ))}
              </ul>
              <table class="axial-table">
                <caption>Axial settings (coded ±{Number(p.value.alpha.toPrecision(4))})</caption>
                <thead>
                  <tr>
                    <th scope="col">Factor</th>
                    <th scope="col">Low</th>
                    <th scope="col">High</th>
                  </tr>
                </thead>
                <tbody>
                  {p.value.properties.axialSettings.map((s) => (
                    <tr key={s.name} class={s.outside ? 'outside' : ''}>
                      {/* The unit goes with the name, so a narrow phone never breaks a number from its unit. */}
                      <th scope="row">{nameWithUnit(s.name, s.unit)}</th>
                      <td>{setting(s.low)}</td>
                      <td>{setting(s.high)}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
              {p.value.properties.warnings.length > 0 && (
                <ul class="warnings" data-testid="axial-warnings">
                  {p.value.properties.warnings.map((w) => (
                    <li key={w}>⚠ {w}</li>
                  ))}
                </ul>
              )}
              <CautionBox lines={CAUTION} compact />
              <button type="button" class="btn primary block" disabled={saving} onClick={() => model.add(study.id)}>
                Add the {p.value.added.length} runs to the run sheet
              </button>
            </div>
          )}
        </>
      )}
    </section>
  );
}
