/**
 * Several responses at once: for each response its goal (maximize, minimize, target or ignore)
 * with its acceptable and ideal values, importance and shape; then the best compromise setting
 * inside the tested box (real units and coded), each response's prediction with its prediction
 * interval and desirability d, the overall desirability D, plain words when no setting meets
 * every limit, and the standing caution. Responses are stacked one card each, the result below.
 */
import { useModel } from '@preact/signals';
import { useEffect } from 'preact/hooks';
import type { Factor } from '../../../core/factor/factor.ts';
import type { DesirabilityEntry } from '../../../core/optimum/desirability-entry.ts';
import { goalMeaning, howFound, NO_INTERVAL, ONE_RESPONSE_ONLY, SEVERAL_INTRO, overallWords, STILL_USES_BEFORE, WEIGHT_SHAPE_MEANING, type DesirabilityGoalChoice } from '../../../core/text/desirability-text.ts';
import { intervalText } from '../../../core/text/interval-text.ts';
import type { Store } from '../../../store/store.ts';
import { hrefTo } from '../../app/routes.ts';
import { CautionBox } from '../../components/caution-box/index.tsx';
import { ChoiceButtons } from '../../components/choice-buttons/index.tsx';
import { ProblemBox } from '../../components/problem-box/index.tsx';
import { StudyHeader } from '../../components/study-header/index.tsx';
import { coded, num, setting, withUnit } from '../../lib/format.ts';
import { SeveralResponsesModel, type ResponseRow, type SeveralResponses, type SeveralResult } from '../../models/several-responses-model.ts';
import { openStudyAnalysis } from '../../models/study-analysis-model.ts';
import { NumberInput } from '../../components/number-input/index.tsx';
import './style.css';

export type SeveralResponsesScreenProps = { readonly store: Store; readonly studyId: string };

const GOALS: readonly { readonly value: DesirabilityGoalChoice; readonly label: string }[] = [
  { value: 'max', label: 'Maximize' },
  { value: 'min', label: 'Minimize' },
  { value: 'target', label: 'Target' },
  { value: 'ignore', label: 'Ignore' },
];

type Field = Exclude<keyof DesirabilityEntry, 'goal'>;

const VALUE_FIELDS: readonly Field[] = ['acceptable', 'ideal', 'highest'];

/** Whether a field holds the entry's problem ('order' is the value fields together). */
function invalid(row: ResponseRow, field: Field): boolean {
  return row.errorField === field || (row.errorField === 'order' && VALUE_FIELDS.includes(field));
}

/** The problem's message, where it belongs: under the value fields, or under importance and shape. */
function ErrorNote({ row, part }: { row: ResponseRow; part: 'values' | 'more' }) {
  if (row.error === null || row.entry.goal === 'ignore' || row.errorField === null) return null;
  const inValues = row.errorField === 'order' || VALUE_FIELDS.includes(row.errorField);
  if (inValues !== (part === 'values')) return null;
  return (
    <p class="field-error" id={`mr-${row.index}-error`} role="alert">
      {row.error} {STILL_USES_BEFORE}
    </p>
  );
}

function NumberField({ m, row, field, label }: { m: SeveralResponses; row: ResponseRow; field: Field; label: string }) {
  const id = `mr-${row.index}-${field}`;
  return (
    <div class="mr-field">
      <label class="field-name" for={id}>
        <span class="mr-hidden">{row.name}: </span>
        {label}
      </label>
      <NumberInput id={id} value={row.entry[field]} invalid={invalid(row, field)} describedBy={invalid(row, field) ? `mr-${row.index}-error` : undefined} onText={(t) => m.setField(row.name, field, t)} />
    </div>
  );
}

function ResponseCard({ m, row }: { m: SeveralResponses; row: ResponseRow }) {
  const g = row.entry.goal;
  const u = row.unit ? ` (${row.unit})` : '';
  return (
    <fieldset class="mr-card" aria-labelledby={`mr-${row.index}-name`}>
      <h4 class="mr-name" id={`mr-${row.index}-name`}>
        {row.name}
        {row.unit && <span class="mr-unit"> {row.unit}</span>}
      </h4>
      <p class="quiet mr-model">Model: {row.modelLabel.toLowerCase()}</p>
      <ChoiceButtons label={`Goal for ${row.name}`} hideLabel options={GOALS} value={g} onChoose={(v) => m.setGoal(row.name, v)} />
      {row.unusable && g !== 'ignore' && (
        <p class="problem" role="alert">
          {row.unusable}
        </p>
      )}
      {g !== 'ignore' && (
        <div class={g === 'target' ? 'mr-fields three' : 'mr-fields'}>
          {g === 'target' ? (
            <>
              <NumberField m={m} row={row} field="acceptable" label={`Lowest${u}`} />
              <NumberField m={m} row={row} field="ideal" label={`Target${u}`} />
              <NumberField m={m} row={row} field="highest" label={`Highest${u}`} />
            </>
          ) : (
            <>
              <NumberField m={m} row={row} field="acceptable" label={`Acceptable${u}`} />
              <NumberField m={m} row={row} field="ideal" label={`Ideal${u}`} />
            </>
          )}
        </div>
      )}
      <ErrorNote row={row} part="values" />
      <p class="quiet mr-meaning">{goalMeaning(g)}</p>
      {g !== 'ignore' && (
        // Opened when its fields hold the problem, so the message is never folded away.
        <details class="mr-more" open={row.errorField !== null && !VALUE_FIELDS.includes(row.errorField as Field) && row.errorField !== 'order' ? true : undefined}>
          <summary>Importance and shape</summary>
          <p class="quiet">{WEIGHT_SHAPE_MEANING}</p>
          <div class={g === 'target' ? 'mr-fields three' : 'mr-fields'}>
            <NumberField m={m} row={row} field="weight" label="Importance" />
            <NumberField m={m} row={row} field="shape" label={g === 'target' ? 'Shape below' : 'Shape'} />
            {g === 'target' && <NumberField m={m} row={row} field="shapeAbove" label="Shape above" />}
          </div>
          <ErrorNote row={row} part="more" />
        </details>
      )}
    </fieldset>
  );
}

function Meter({ d, label }: { d: number; label: string }) {
  return (
    <div class="mr-meter" role="img" aria-label={`${label} ${num(d, 3)} of 1`}>
      <div class="mr-meter-fill" style={{ width: `${Math.round(Math.max(0, Math.min(1, d)) * 100)}%` }} />
    </div>
  );
}

function Best({ result, factors }: { result: Extract<SeveralResult, { ok: true }>; factors: readonly Factor[] }) {
  const { best } = result;
  return (
    <section class="mr-result" aria-labelledby="mr-best-h" data-testid="mr-result">
      <h3 id="mr-best-h">Best compromise inside the tested box</h3>
      <div class={best.D > 0 ? 'mr-overall' : 'mr-overall zero'}>
        <span class="mr-overall-label">Overall desirability D</span>
        <strong class="mr-overall-value" data-testid="mr-D">
          {num(best.D, 3)}
        </strong>
        <span class="mr-overall-words">{overallWords(best.D)}</span>
      </div>
      {result.noneMeetsAll && (
        <p class="warning" role="status" data-testid="mr-none">
          {result.noneMeetsAll}
        </p>
      )}
      <h4>{best.D > 0 ? 'Setting' : 'Nearest setting found'}</h4>
      <ul class="mr-settings" data-testid="mr-settings">
        {factors.map((f, i) => (
          <li key={f.name}>
            <span class="mr-factor">{f.name}</span>
            <span class="mr-setting">
              <strong>{typeof best.real[i] === 'number' ? setting(Number((best.real[i] as number).toPrecision(4)), f.kind === 'numeric' ? f.unit : undefined) : String(best.real[i])}</strong>
              <span class="mr-coded">coded {coded(best.coded[i])}</span>
            </span>
          </li>
        ))}
      </ul>
      <h4>Each response there</h4>
      <ul class="mr-responses" data-testid="mr-responses">
        {best.responses.map((r, i) => (
          <li key={r.name} class="mr-response">
            <div class="mr-response-head">
              <span class="mr-response-name">{r.name}</span>
              <strong class="mr-response-fit">{withUnit(r.fit, result.units[i])}</strong>
            </div>
            <p class="mr-pi">One new run (95%): {intervalText(r.pi, (x) => num(x), result.units[i] ? ` ${result.units[i]}` : '', NO_INTERVAL)}</p>
            <div class="mr-d">
              <span>d = {num(r.d, 3)}</span>
              <Meter d={r.d} label={`Desirability of ${r.name}`} />
            </div>
          </li>
        ))}
        {result.ignored.map((r) => (
          <li key={r.name} class="mr-response ignored">
            <div class="mr-response-head">
              <span class="mr-response-name">{r.name} (ignored)</span>
              <strong class="mr-response-fit">{withUnit(r.fit, r.unit)}</strong>
            </div>
            <p class="mr-pi">One new run (95%): {intervalText(r.pi, (x) => num(x), r.unit ? ` ${r.unit}` : '', NO_INTERVAL)}</p>
          </li>
        ))}
      </ul>
      <CautionBox lines={best.caution} />
      <p class="quiet mr-how">{howFound(best.search.method, best.search.bestStart)}</p>
    </section>
  );
}

export function SeveralResponsesScreen({ store, studyId }: SeveralResponsesScreenProps) {
  const shared = openStudyAnalysis(store, studyId);
  const m = useModel(() => new SeveralResponsesModel(shared));
  useEffect(() => void shared.load(), []);
  const d = shared.data.value;
  const problem = shared.problem.value;
  if (problem) return <ProblemBox problem={problem} />;
  if (!d) return <p class="quiet">Reading the runs…</p>;
  const { study } = d;
  const result = m.result.value;
  return (
    <section class="several">
      <StudyHeader study={study} current="quickCard" back={{ href: hrefTo('quickCard', { studyId }), label: 'Quick card' }} />
      <h2>Several responses at once</h2>
      <p class="quiet">{SEVERAL_INTRO}</p>
      {study.responses.length < 2 && <p class="notice">{ONE_RESPONSE_ONLY}</p>}
      {m.rows.value.map((row) => (
        <ResponseCard key={row.name} m={m} row={row} />
      ))}
      {result && !result.ok && (
        <>
          <p class="problem" role="alert" data-testid="mr-problem">
            {result.message}
          </p>
          <CautionBox lines={m.caution.value} />
        </>
      )}
      {result && result.ok && <Best result={result} factors={study.factors} />}
      <button type="button" class="btn block" onClick={() => m.reset()}>
        Back to the starting values
      </button>
    </section>
  );
}
