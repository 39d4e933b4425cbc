/**
 * A quadratic model's answer in one compact block: the stationary point (real settings, fitted
 * value, its nature in plain words, inside or outside the tested box), the best setting inside
 * the tested box for the response's goal with its prediction interval, the ANOVA grouped by kind
 * of term, and the standing caution beside the settings. When the stationary point is no answer
 * by itself (a saddle, a ridge, outside the tested box, or none), the ridge analysis as a compact
 * table: radius, settings and the fitted response on each ring.
 */
import type { KindRow, TermKind } from '../../../core/fit/anova-by-kind.ts';
import type { Factor } from '../../../core/factor/factor.ts';
import type { SecondOrderAnalysis } from '../../../core/optimum/second-order-analysis.ts';
import type { Response } from '../../../core/study/response.ts';
import { pPhrase } from '../../../core/text/p-value.ts';
import { bestSettingHeading, NO_STATIONARY_POINT, natureName, natureWords, stationaryPlaceWords } from '../../../core/text/second-order-text.ts';
import { SETTING_TOLERANCE } from '../../../core/tolerance.ts';
import { RIDGE_BEYOND_ONE, ridgeCaption, ridgeReason } from '../../../core/text/ridge-text.ts';
import { num, setting, withUnit } from '../../lib/format.ts';
import { CautionBox } from '../caution-box/index.tsx';
import './style.css';

export type SecondOrderSummaryProps = {
  readonly so: SecondOrderAnalysis;
  readonly factors: readonly Factor[];
  readonly response: Response;
  /** The ANOVA by kind of term, or null when the table has no such reading. */
  readonly byKind: readonly KindRow[] | null;
};

const KIND_LABELS: Record<TermKind, string> = {
  linear: 'Main effects',
  'two-factor': 'Interactions',
  quadratic: 'Squares (curvature)',
};

function Settings({ factors, real, testid }: { factors: readonly Factor[]; real: readonly number[]; testid: string }) {
  return (
    <ul class="so-settings" data-testid={testid}>
      {factors.map((f, i) => (
        <li key={f.name}>
          <span class="so-name">{f.name}</span> <strong>{setting(Number(real[i].toPrecision(4)), f.kind === 'numeric' ? f.unit : undefined)}</strong>
        </li>
      ))}
    </ul>
  );
}

/** The ridge analysis, one row a ring; factor columns in the factors' order, headed by name and unit. */
function RidgeTable({ so, factors, response, reason }: { so: SecondOrderAnalysis; factors: readonly Factor[]; response: Response; reason: string }) {
  const beyond = so.ridge.some((r) => r.radius > 1 + SETTING_TOLERANCE);
  return (
    <section class="so-ridge" aria-labelledby="so-ridge-h">
      <h3 id="so-ridge-h">Ridge analysis</h3>
      <p>{reason}</p>
      <table class="so-ridge-table" data-testid="so-ridge">
        <caption>{ridgeCaption(so.ridgeSense, response.name)}</caption>
        <thead>
          <tr>
            <th scope="col">Radius</th>
            {factors.map((f) => (
              <th scope="col" key={f.name}>
                {f.name}
                {f.kind === 'numeric' && f.unit ? <span class="so-ridge-unit"> {f.unit}</span> : null}
              </th>
            ))}
            <th scope="col">
              {response.name}
              {response.unit ? <span class="so-ridge-unit"> {response.unit}</span> : null}
            </th>
          </tr>
        </thead>
        <tbody>
          {so.ridge.map((r) => (
            <tr key={r.radius}>
              <th scope="row">
                {num(r.radius, 2)}
                {r.radius > 1 + SETTING_TOLERANCE ? '*' : ''}
              </th>
              {r.real.map((v, i) => (
                <td key={factors[i].name}>{num(v)}</td>
              ))}
              <td class="so-ridge-fit">{num(r.fit)}</td>
            </tr>
          ))}
        </tbody>
      </table>
      {beyond && <p class="quiet">{RIDGE_BEYOND_ONE}</p>}
    </section>
  );
}

export function SecondOrderSummary({ so, factors, response, byKind }: SecondOrderSummaryProps) {
  const st = so.canonical.stationary;
  const best = so.optimum;
  const ridgeWhy = so.ridge.length > 0 ? ridgeReason(so.canonical.nature, st ? st.inside : null) : null;
  return (
    <div class="so-summary">
      <section class="so-card" aria-labelledby="so-best-h">
        <h3 id="so-best-h">{bestSettingHeading(so.goal, response.name)}</h3>
        <Settings factors={factors} real={best.real} testid="so-best" />
        <p class="so-fit">
          Predicted <strong data-testid="so-best-fit">{withUnit(best.fit, response.unit)}</strong>
          {best.pi && (
            <>
              {' '}
              · one new run between {num(best.pi[0])} and {withUnit(best.pi[1], response.unit)} (95%)
            </>
          )}
        </p>
        <CautionBox lines={so.caution} compact />
      </section>
      <section class="so-card" aria-labelledby="so-stat-h">
        <h3 id="so-stat-h">
          Stationary point: <span data-testid="so-nature">{natureName(so.canonical.nature)}</span>
        </h3>
        {st ? (
          <>
            <Settings factors={factors} real={st.real} testid="so-stationary" />
            <p class="so-fit">
              Fitted <strong>{withUnit(st.fit, response.unit)}</strong>
            </p>
            <p>{natureWords(so.canonical.nature)}</p>
            <p class={st.inside ? 'so-place' : 'so-place so-outside'} data-testid="so-place">
              {stationaryPlaceWords(st.inside)}
            </p>
          </>
        ) : (
          <p>{NO_STATIONARY_POINT}</p>
        )}
      </section>
      {ridgeWhy && <RidgeTable so={so} factors={factors} response={response} reason={ridgeWhy} />}
      {byKind && byKind.length > 0 && (
        <table class="so-kinds">
          <caption>Variation explained, by kind of term</caption>
          <thead>
            <tr>
              <th scope="col">Kind</th>
              <th scope="col">df</th>
              <th scope="col">Sum of squares</th>
              <th scope="col">Test</th>
            </tr>
          </thead>
          <tbody>
            {byKind.map((r) => (
              <tr key={r.kind}>
                <th scope="row">{KIND_LABELS[r.kind]}</th>
                <td>{r.df}</td>
                <td>{num(r.ss)}</td>
                <td>{r.p === null ? '–' : pPhrase(r.p)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </div>
  );
}
