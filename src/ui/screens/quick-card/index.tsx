/**
 * The quick card: what the fitted model predicts at the settings on the sliders, before anyone
 * changes a setting on the machine. The predicted value with its 95% intervals stays at the top
 * while the sliders move, in a dense block (so the first setting shows below it on a small phone);
 * the caution is always shown with it, in one short line with the full text a tap away.
 */
import { useModel } from '@preact/signals';
import type { Prediction } from '../../../core/predict/predict.ts';
import { CAUTION_MORE, CAUTION_SHORT } from '../../../core/text/caution-short.ts';
import { intervalText } from '../../../core/text/interval-text.ts';
import { OVERALL_D_LABEL, RESPONSES_AT_LIMITS, RESPONSES_AT_SETTINGS } from '../../../core/text/responses-at-settings-text.ts';
import type { Response } from '../../../core/study/response.ts';
import type { Store } from '../../../store/store.ts';
import { hrefTo } from '../../app/routes.ts';
import { BarList } from '../../components/bar-list/index.tsx';
import { CautionBox } from '../../components/caution-box/index.tsx';
import { ChoiceButtons } from '../../components/choice-buttons/index.tsx';
import { ContourCard } from '../../components/contour-card/index.tsx';
import { FactorControl } from '../../components/factor-control/index.tsx';
import { StudyPending } from '../../components/study-pending/index.tsx';
import { StudyHeader } from '../../components/study-header/index.tsx';
import { num, signed, termLabel, withUnit } from '../../lib/format.ts';
import { useHeightProperty } from '../../lib/use-height-property.ts';
import { QuickCardModel, SLIDER_REACH } from '../../models/quick-card-model.ts';
import type { ResponsesAtSettings } from '../../models/responses-at-settings.ts';
import { MODEL_CHOICES, QUADRATIC_CHOICE, TRANSFORM_CHOICES } from '../../models/study-analysis-model.ts';
import { shownStudy, useStudyAnalysis } from '../../lib/use-study-analysis.ts';
import './style.css';

export type QuickCardScreenProps = { readonly store: Store; readonly studyId: string };

function interval(i: readonly [number, number] | null, unit: string | undefined): string {
  // An open end (beyond a negative power's back-transform) reads in words, never as a dash or "Infinity".
  if (i && Number.isFinite(i[0]) && Number.isFinite(i[1])) return `${num(i[0])} – ${withUnit(i[1], unit)}`;
  return intervalText(i, (x) => num(x), unit ? ` ${unit}` : '', 'not available');
}

function PredictionPanel({ p, response }: { p: Prediction; response: Response }) {
  const pct = Math.round(p.level * 100);
  return (
    <div class={p.outside ? 'predicted outside' : 'predicted'} aria-live="polite">
      <div class="predicted-head">
        <span class="predicted-label">Predicted {response.name}</span>
        <span class="predicted-value" data-testid="predicted-value">
          {withUnit(p.fit, response.unit)}
        </span>
      </div>
      <dl class="intervals">
        <div>
          <dt>{pct}% CI (average)</dt>
          <dd data-testid="ci">{interval(p.ci, response.unit)}</dd>
        </div>
        <div>
          <dt>{pct}% PI (one run)</dt>
          <dd data-testid="pi">{interval(p.pi, response.unit)}</dd>
        </div>
      </dl>
      {p.outside && (
        <p class="outside-warning" role="alert">
          ⚠ Outside the tested range
        </p>
      )}
    </div>
  );
}

/** Every response at the card's settings: its prediction and d, then the overall D (a word where there is no number). */
function AllResponses({ block, href, count }: { block: ResponsesAtSettings; href: string; count: number }) {
  return (
    <section class="all-at" aria-labelledby="all-at-h" data-testid="all-at">
      <h3 id="all-at-h">{RESPONSES_AT_SETTINGS}</h3>
      <table class="all-at-table">
        <thead>
          <tr>
            <th scope="col">Response</th>
            <th scope="col">Predicted</th>
            <th scope="col">d</th>
          </tr>
        </thead>
        <tbody>
          {block.rows.map((r) => (
            <tr key={r.name} data-testid="all-at-row">
              <th scope="row">{r.name}</th>
              {/* No model to use: one word across both columns. */}
              {r.fit === null ? (
                <td class="word" colSpan={2}>
                  {r.fitWord}
                </td>
              ) : (
                <>
                  <td class="num">{withUnit(r.fit, r.unit)}</td>
                  <td class={r.d === null ? 'word' : 'num'}>{r.d === null ? r.dWord : num(r.d, 3)}</td>
                </>
              )}
            </tr>
          ))}
        </tbody>
      </table>
      {block.D !== null ? (
        <p class="all-at-overall">
          <span>{OVERALL_D_LABEL}</span>
          <strong data-testid="all-at-D">{num(block.D, 3)}</strong>
        </p>
      ) : (
        <p class="all-at-missing" data-testid="all-at-missing">{block.missing}</p>
      )}
      <p class="quiet">{RESPONSES_AT_LIMITS}</p>
      <a class="btn ghost block" href={href}>All {count} responses at once ›</a>
    </section>
  );
}

export function QuickCardScreen({ store, studyId }: QuickCardScreenProps) {
  const shared = useStudyAnalysis(store, studyId);
  const model = useModel(() => new QuickCardModel(shared));
  // Measured for the scroll padding that keeps a focused field clear of the sticky block (style.css).
  const stickyRef = useHeightProperty('--sticky-top-height');
  const open = shownStudy(shared);
  if (!open) return <StudyPending shared={shared} />;
  const { study, shown, response } = open;
  const result = model.prediction.value;
  const p = result && result.ok ? result.prediction : null;
  const analysis = model.analysis.value;
  const transform = shown.settings.value.transform;
  const modelLabel = ([...MODEL_CHOICES, QUADRATIC_CHOICE].find((c) => c.value === shown.settings.value.model)?.label ?? '') + (transform === 'none' ? '' : `, ${TRANSFORM_CHOICES.find((c) => c.value === transform)?.label.toLowerCase()} scale`);
  return (
    <section class="quick">
      <StudyHeader study={study} current="quickCard" />
      <h2>Quick card</h2>
      {study.responses.length > 1 && <a class="btn ghost" href={hrefTo('severalResponses', { studyId })}>All {study.responses.length} responses at once ›</a>}
      <ChoiceButtons
        label="Response"
        options={study.responses.map((r, i) => ({ value: i, label: r.name }))}
        value={shown.index}
        onChoose={(i) => shared.show(i)}
      />
      {result && !result.ok && (
        <p class="problem input" role="alert">
          {result.message}
        </p>
      )}
      {/* The prediction and the caution stay on screen together while the sliders move. */}
      <div class="sticky-top" ref={stickyRef}>
        {p && <PredictionPanel p={p} response={response} />}
        {/* The caution in one short line that stays visible; its full text is one tap on that line. */}
        <CautionBox lines={model.caution.value} short={{ line: CAUTION_SHORT, more: CAUTION_MORE }} />
      </div>
      <h3>Settings</h3>
      {study.factors.map((f, i) => (
        <FactorControl
          key={f.name}
          factor={f}
          index={i}
          value={model.settings.value[i]}
          text={model.texts.value[i]}
          coded={model.coded.value[i]}
          error={model.fieldErrors.value[i]}
          reach={Math.max(SLIDER_REACH, (analysis?.ok ? analysis.analysis.model.extent?.[i] ?? 1 : 1) + 0.1)}
          extent={analysis?.ok ? analysis.analysis.model.extent?.[i] ?? 1 : 1}
          onCoded={(x) => model.setCoded(i, x)}
          onText={(t) => model.setText(i, t)}
          onLevel={(l) => model.setLevel(i, l)}
        />
      ))}
      {p && p.messages.length > 0 && (
        <ul class="warnings" aria-label="About this prediction">
          {p.messages.map((m) => (
            <li key={m}>{m}</li>
          ))}
        </ul>
      )}
      <button type="button" class="btn block" onClick={() => model.reset()}>
        Back to the center
      </button>
      {model.allResponses.value && <AllResponses block={model.allResponses.value} href={hrefTo('severalResponses', { studyId })} count={study.responses.length} />}
      {p && (
        <>
          <h3>Where the prediction comes from</h3>
          <p class="baseline">
            Baseline (the center): <strong>{withUnit(p.baseline, response.unit)}</strong>, plus each term's contribution:
          </p>
          <BarList
            label={`Contributions to ${response.name}`}
            rows={p.contributions.map((c) => ({
              key: String(c.term),
              label: `${termLabel(c.name)} (${c.letters})`,
              value: c.value,
              shown: `${signed(c.value)}${response.unit ? ' ' + response.unit : ''}`,
              ...(c.estimates ? { detail: `Carries ${c.estimates}.` } : {}),
            }))}
          />
          <p class="quiet">
            Baseline plus these {p.contributions.length} contributions gives {withUnit(p.fit, response.unit)}.
            {analysis && analysis.ok ? ` Model: ${modelLabel.toLowerCase()} (as chosen on the Effects screen), fitted to ${analysis.analysis.n} logged runs.` : ''}
          </p>
        </>
      )}
      {p && analysis && analysis.ok && (
        <ContourCard model={analysis.analysis.model} runs={analysis.data.coded} held={model.coded.value} settings={model.settings.value} responseLabel={response.unit ? `${response.name} (${response.unit})` : response.name} />
      )}
    </section>
  );
}
