/**
 * The analysis of one response in plain words: the effects ranked by size with a bar each, the
 * interaction chart of a two-factor term the person picks, how much of the variation the model
 * accounts for, the curvature check from the center runs, the residual charts, and the
 * analysis's warnings.
 */
import { useModel } from '@preact/signals';
import type { Analysis, RunDiagnostics, TermEstimate } from '../../../core/fit/analysis.ts';
import type { Factor } from '../../../core/factor/factor.ts';
import { isSquare, termFactors, type Term } from '../../../core/model/term.ts';
import { anovaByKind } from '../../../core/fit/anova-by-kind.ts';
import { squareMeaning } from '../../../core/text/second-order-text.ts';
import { SecondOrderSummary } from '../../components/second-order-summary/index.tsx';
import { secondOrderView } from '../../models/second-order-view.ts';
import { nameWithUnit } from '../../../core/study/name-with-unit.ts';
import type { Response } from '../../../core/study/response.ts';
import type { Store } from '../../../store/store.ts';
import { BarList, type BarRow } from '../../components/bar-list/index.tsx';
import { ChoiceButtons } from '../../components/choice-buttons/index.tsx';
import { HalfNormalChart } from '../../components/half-normal-chart/index.tsx';
import { InteractionChart } from '../../components/interaction-chart/index.tsx';
import { ResidualChart } from '../../components/residual-chart/index.tsx';
import { StudyPending } from '../../components/study-pending/index.tsx';
import { StudyHeader } from '../../components/study-header/index.tsx';
import { pPhrase } from '../../../core/text/p-value.ts';
import { effectWords, LENTH_WORDS, WITHIN_NOISE } from '../../../core/text/effect-words.ts';
import { effectShown, lenthTableDifferences, lenthTermText } from '../../../core/text/lenth-table-effects.ts';
import { curvatureStatement } from '../../../core/text/verdict-text.ts';
import { num, percent, setting, signed, termLabel, withUnit } from '../../lib/format.ts';
import { AnalysisModel, twoFactorTerms } from '../../models/analysis-model.ts';
import { modelChoicesFor, TRANSFORM_CHOICES } from '../../models/study-analysis-model.ts';
import { shownStudy, useStudyAnalysis } from '../../lib/use-study-analysis.ts';
import { interactionLines } from './interaction-lines.ts';
import { hrefTo } from '../../app/routes.ts';
import { boundNote, boxCoxText } from '../../../core/text/bound-text.ts';
import './style.css';

export type AnalysisScreenProps = { readonly store: Store; readonly studyId: string };

/** How clearly a term stands out from the run-to-run noise, in the words the text report uses (core/text/effect-words.ts). */
export function strength(t: TermEstimate, lenthMark?: 'likely' | 'active' | null): { words: string; faint: boolean } {
  const words = effectWords(t.p, lenthMark);
  if (words === null) return { words: 'No noise estimate from these runs, so no test', faint: false };
  const said = words[0].toUpperCase() + words.slice(1);
  if (t.p === null) return { words: `${said} of Lenth's method`, faint: words === LENTH_WORDS.none };
  return { words: `${said} (${pPhrase(t.p)})`, faint: words === WITHIN_NOISE };
}

function levelText(f: Factor, end: 0 | 1): string {
  if (f.kind === 'categorical') return f.levels[end];
  return setting(end === 0 ? f.low : f.high, f.unit);
}

/** What an effect means, in a sentence. */
export function meaning(t: TermEstimate, factors: readonly Factor[], response: Response): string {
  const fs = termFactors(t.term).map((i) => factors[i]);
  if (isSquare(t.term)) return squareMeaning(fs[0].name, response.name, t.coef, response.unit);
  if (fs.length === 1) {
    const f = fs[0];
    const size = withUnit(Math.abs(t.effect), response.unit, 3);
    if (t.effect === 0) return `From ${levelText(f, 0)} to ${levelText(f, 1)}, ${response.name} does not change.`;
    return `From ${levelText(f, 0)} to ${levelText(f, 1)}, ${response.name} ${t.effect >= 0 ? 'rises' : 'falls'} by ${size}.`;
  }
  if (fs.length === 2) {
    // With y = ... + b_AB x_A x_B, A's effect at B high minus at B low is 4 b_AB = 2 x the AB effect.
    const change = withUnit(2 * Math.abs(t.effect), response.unit, 3);
    return `The effect of ${fs[0].name} is ${change} ${t.effect >= 0 ? 'larger' : 'smaller'} with ${fs[1].name} high than with it low.`;
  }
  return `The effect of ${fs[0].name} depends on ${fs.slice(1).map((f) => f.name).join(' and ')} together.`;
}

function effectRows(ranked: readonly TermEstimate[], a: Analysis, factors: readonly Factor[], response: Response): BarRow[] {
  // The report's rule (core/text/lenth-table-effects.ts): round-off zeros are 0, and a term that
  // Lenth's list gives another number than the bar says so beside it.
  const shownNumber = (x: number) => signed(x);
  const differs = new Map(lenthTableDifferences(a, shownNumber).map((d) => [d.letters, d]));
  const unit = response.unit ? ' ' + response.unit : '';
  return ranked.map((raw) => {
    const t = { ...raw, effect: effectShown(a, raw.effect) };
    const letters = t.estimates ?? t.letters;
    const s = strength(t, a.lenth ? (a.lenth.effects.find((e) => e.letters === letters)?.mark ?? null) : undefined);
    const carries = t.estimates ? ` Carries ${t.estimates}: these runs cannot tell them apart.` : '';
    const d = differs.get(letters);
    const lenth = d ? ` ${lenthTermText(d, (x) => shownNumber(x) + unit)}.` : '';
    return {
      key: String(t.term),
      label: `${termLabel(t.name)} (${t.letters})`,
      value: t.effect,
      shown: `${shownNumber(t.effect)}${unit}`,
      detail: `${meaning(t, factors, response)} ${s.words}.${carries}${lenth}`,
      faint: s.faint,
    };
  });
}

/** |deleted (externally studentized) residual| above this marks a run that stands out (common practice). */
const STANDS_OUT = 3;

function standsOut(r: RunDiagnostics): boolean {
  return r.deleted !== null && Math.abs(r.deleted) > STANDS_OUT;
}

function InteractionSection({ a, term, response, onChoose }: { a: Analysis; term: Term | null; response: Response; onChoose: (t: Term) => void }) {
  const two = twoFactorTerms(a);
  if (term === null || two.length === 0) {
    return <p class="quiet">This model has no two-factor interactions; choose “With interactions” above to see how one factor's effect depends on another.</p>;
  }
  const view = interactionLines(a, term);
  return (
    <>
      {two.length > 1 && (
        <ChoiceButtons label="Interaction" options={two.map((t) => ({ value: t.term, label: `${termLabel(t.name)} (${t.letters})` }))} value={term} onChoose={onChoose} />
      )}
      <p class="quiet">
        {response.name} as the model predicts it: {view.across.name} across, one line for {view.held.name} low and one for it high.
      </p>
      <InteractionChart
        acrossName={view.across.name}
        acrossLabels={view.acrossLabels}
        heldName={view.held.name}
        lines={view.lines}
        responseLabel={nameWithUnit(response.name, response.unit)}
        othersNote={view.others.length > 0 ? `Held: ${view.others.join('; ')}.` : ''}
      />
    </>
  );
}

function ResidualSection({ a, response }: { a: Analysis; response: Response }) {
  if (a.df.residual === 0) {
    return <p class="quiet">No runs are left over after fitting this model, so every residual is zero and there is nothing to plot; fit fewer terms to see them.</p>;
  }
  const marked = a.runs.filter(standsOut);
  const common = (r: RunDiagnostics) => ({ label: r.label, residual: r.residual, residualShown: signed(r.residual), marked: standsOut(r) });
  return (
    <>
      <p class="quiet">A residual is a run's value minus the model's fitted value for it.</p>
      <ResidualChart
        title="Residual against fitted value"
        points={a.runs.map((r) => ({ ...common(r), x: r.fitted, xShown: num(r.fitted) }))}
        xLabel={nameWithUnit('Fitted value', response.unit)}
        yLabel={nameWithUnit('Residual', response.unit)}
        xColumn="Fitted value"
        caption="Look for a funnel or a curve; points scattered evenly about zero are what you want."
      />
      <ResidualChart
        title="Residual against run order"
        points={a.runs.map((r, i) => ({ ...common(r), x: i + 1, xShown: String(i + 1) }))}
        xLabel="Run (run-sheet order)"
        yLabel={nameWithUnit('Residual', response.unit)}
        xColumn="Place"
        caption="Runs in run-sheet order (by planned run number, not the time logged); look for a drift or a step."
        order
      />
      <div class="residual-verdict" aria-live="polite">
        {a.sigma === null ? (
          <p>Studentized residuals need an estimate of the noise, which these runs do not give.</p>
        ) : marked.length === 0 ? (
          <p>No run stands out: every residual, measured against the noise of the other runs, is between −{STANDS_OUT} and +{STANDS_OUT} standard errors.</p>
        ) : (
          marked.map((r) => (
            <p key={r.label} class="warning">
              <strong>Run {r.label} stands out</strong>: {signed(r.deleted!, 2)} standard errors from its fitted value, against the noise of the other runs (beyond ±{STANDS_OUT}). Check its log for a slip or an upset before trusting the fit.
            </p>
          ))
        )}
      </div>
    </>
  );
}

export function AnalysisScreen({ store, studyId }: AnalysisScreenProps) {
  const shared = useStudyAnalysis(store, studyId);
  const model = useModel(() => new AnalysisModel(shared));
  const open = shownStudy(shared);
  if (!open) return <StudyPending shared={shared} />;
  const { study, shown, response } = open;
  const result = model.result.value;
  const modelChoices = modelChoicesFor(study);
  const so = result && result.ok && shown.settings.value.model === 'quadratic' ? secondOrderView(result, response) : null;
  return (
    <section class="analysis wide">
      <StudyHeader study={study} current="analysis" />
      <h2>Effects</h2>
      <ChoiceButtons
        label="Response"
        options={study.responses.map((r, i) => ({ value: i, label: r.name }))}
        value={shown.index}
        onChoose={(i) => shared.show(i)}
      />
      <ChoiceButtons label="Model" options={modelChoices} value={shown.settings.value.model} onChoose={(c) => shared.chooseModel(shown.index, c)} />
      <ChoiceButtons label="Scale" options={TRANSFORM_CHOICES} value={shown.settings.value.transform} onChoose={(c) => shared.chooseTransform(shown.index, c)} />
      {response.lowerBound !== undefined && response.lowerBound !== null && (
        <p class="quiet" data-testid="bound-note">
          {boundNote(response.name, response.lowerBound)}
        </p>
      )}
      {result && result.ok && result.analysis.boxCox && (
        <p class="quiet" data-testid="box-cox">
          {boxCoxText(result.analysis.boxCox.suggestion, response.name, response.lowerBound ?? null)}
        </p>
      )}
      <p class="print-only">
        Response: {response.name} · Model: {modelChoices.find((c) => c.value === shown.settings.value.model)?.label}
      </p>
      {result && !result.ok && (
        <div class="problem input" role="alert">
          <p>{result.message}</p>
          <a class="btn" href={hrefTo('runSheet', { studyId: study.id })}>
            Go to the run sheet
          </a>
        </div>
      )}
      {result && result.ok && (
        <div class="analysis-grid">
          <p class="lead-figure part-lead">
            {result.analysis.n} runs used · average at the center {withUnit(result.analysis.intercept.coef, response.unit)}
          </p>
          {so && (
            <div class="part part-second-order">
              {so.ok ? <SecondOrderSummary so={so.so} factors={study.factors} response={response} byKind={anovaByKind(result.analysis.anova, result.analysis.terms)} /> : <p class="quiet">{so.message}</p>}
            </div>
          )}
          <div class="part part-effects">
            <h3>Effects, largest first</h3>
            <p class="quiet">Each bar is the change in {response.name} from a factor's low to its high setting, the others held at their centers.</p>
            <BarList label={`Effects on ${response.name}`} rows={effectRows(model.ranked.value, result.analysis, study.factors, response)} />
          </div>
          {result.analysis.halfNormal.length >= 3 && (
            <div class="part part-half-normal">
              <h3>Half-normal plot</h3>
              <HalfNormalChart points={result.analysis.halfNormal} axisLabel={nameWithUnit('Size of effect', response.unit)} />
            </div>
          )}
          <div class="part part-interaction">
            <h3>Interaction chart</h3>
            <InteractionSection a={result.analysis} term={model.interactionTerm.value} response={response} onChoose={(t) => model.chooseInteraction(t)} />
          </div>
          <div class="part part-fit">
            <h3>How well the model fits</h3>
            <ul class="facts">
              <li>
                <strong>R² {percent(result.analysis.r2)}</strong>: the share of the variation in these runs the model accounts for.
              </li>
              <li>
                <strong>Adjusted R² {percent(result.analysis.r2adj)}</strong>: the same, allowing for the number of terms.
              </li>
              <li>
                <strong>Predicted R² {percent(result.analysis.r2pred)}</strong>: how well it would predict a run it had not seen.
              </li>
              <li>
                <strong>Run-to-run noise {withUnit(result.analysis.sigma, response.unit)}</strong> (residual standard deviation, {result.analysis.df.residual} df).
              </li>
              {result.analysis.verdicts.map((v) =>
                v.kind === 'curvature' ? (
                  <li key="curvature">{v.outcome === 'curved' ? <strong>{curvatureStatement(v)}</strong> : curvatureStatement(v, response.unit)}</li>
                ) : null,
              )}
            </ul>
          </div>
          <div class="part part-residuals">
            <h3>Residuals</h3>
            <ResidualSection a={result.analysis} response={response} />
          </div>
          {result.notes.length > 0 && (
            <div class="part part-notes">
              <h3>Notes on these runs</h3>
              <ul class="warnings" data-testid="analysis-notes">
                {result.notes.map((n) => (
                  <li key={n.text}>
                    {n.text}
                    {n.list && (
                      <ul class="note-list">
                        {n.list.map((item) => (
                          <li key={item}>{item}</li>
                        ))}
                      </ul>
                    )}
                  </li>
                ))}
              </ul>
            </div>
          )}
          <a class="btn primary block part-action" href={hrefTo('quickCard', { studyId: study.id })}>
            Check a prediction
          </a>
        </div>
      )}
    </section>
  );
}
