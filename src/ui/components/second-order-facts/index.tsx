/**
 * What a person compares before committing to a second-order design: run count, axial distance,
 * rotatable or not, whether the blocks are orthogonal to the model, the scaled prediction
 * variance at the center and at distance 1, and the axial settings in real units, with the
 * core's warning for each outside the factorial range and then the standing caution.
 */
import type { SecondOrderProperties } from '../../../core/design/second-order-plan.ts';
import { formatSetting } from '../../../core/predict/parse-settings.ts';
import { NO_FULL_QUADRATIC, predictionVarianceWords } from '../../../core/text/second-order-text.ts';
import { CautionBox } from '../caution-box/index.tsx';
import './style.css';

export type SecondOrderFactsProps = { readonly facts: SecondOrderProperties };

function yesNo(v: boolean): string {
  return v ? 'Yes' : 'No';
}

export function SecondOrderFacts({ facts }: SecondOrderFactsProps) {
  return (
    <div class="so-facts">
      <dl class="plan-facts">
        <div>
          <dt>Runs</dt>
          <dd data-testid="so-runs">{facts.runs}</dd>
        </div>
        {facts.alpha !== null && (
          <div>
            <dt>Axial distance</dt>
            <dd data-testid="so-alpha">{formatSetting(facts.alpha)}</dd>
          </div>
        )}
        <div>
          <dt>Rotatable</dt>
          <dd data-testid="so-rotatable">{yesNo(facts.rotatable)}</dd>
        </div>
        {facts.blocksOrthogonal !== null && (
          <div>
            <dt>Blocks orthogonal to the model</dt>
            <dd data-testid="so-blocks">{yesNo(facts.blocksOrthogonal)}</dd>
          </div>
        )}
        {facts.spv && (
          <>
            <div>
              <dt>Prediction variance at the center</dt>
              <dd data-testid="so-spv-center">{formatSetting(Number(facts.spv.center.toPrecision(3)))}</dd>
            </div>
            <div>
              <dt>… at distance 1</dt>
              <dd data-testid="so-spv-one">{formatSetting(Number(facts.spv.axis.toPrecision(3)))}</dd>
            </div>
          </>
        )}
      </dl>
      <p class="quiet so-spv-words">{facts.spv ? predictionVarianceWords(facts.spv.center, facts.spv.axis) : NO_FULL_QUADRATIC}</p>
      {facts.axialSettings.length > 0 && (
        <table class="so-axial">
          <caption>Axial settings</caption>
          <thead>
            <tr>
              <th scope="col">Factor</th>
              <th scope="col">Low axial</th>
              <th scope="col">High axial</th>
            </tr>
          </thead>
          <tbody>
            {facts.axialSettings.map((a) => (
              <tr key={a.name} class={a.outside ? 'outside' : undefined}>
                <th scope="row">{a.name}</th>
                <td>{formatSetting(a.low, a.unit)}</td>
                <td>{formatSetting(a.high, a.unit)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
      {facts.warnings.length > 0 && (
        <>
          <div role="alert">
            <ul class="so-warnings">
              {facts.warnings.map((w) => (
                <li key={w}>{w}</li>
              ))}
            </ul>
          </div>
          <CautionBox lines={facts.caution} compact />
        </>
      )}
    </div>
  );
}
