/**
 * The run form's warning on an axial run whose setting lies outside the factorial range: one
 * line per such factor in the core's words, then the standing caution, shown before the person
 * makes the run.
 */
import { toReal } from '../../../core/factor/coding.ts';
import type { Factor } from '../../../core/factor/factor.ts';
import { CAUTION } from '../../../core/predict/caution.ts';
import { isOutside } from '../../../core/predict/outside-range.ts';
import { axialRunOutsideText } from '../../../core/text/second-order-text.ts';
import { CautionBox } from '../caution-box/index.tsx';
import './style.css';

export type AxialWarningProps = {
  readonly factors: readonly Factor[];
  /** The planned run's coded settings. */
  readonly coded: readonly number[];
};

export function AxialWarning({ factors, coded }: AxialWarningProps) {
  const lines = factors.flatMap((f, i) => (f.kind === 'numeric' && isOutside(coded[i]) ? [axialRunOutsideText(f, toReal(f, coded[i]) as number)] : []));
  if (lines.length === 0) return null;
  return (
    <div class="axial-warning">
      <div role="alert">
        <ul>
          {lines.map((l) => (
            <li key={l}>{l}</li>
          ))}
        </ul>
      </div>
      <CautionBox lines={CAUTION} compact />
    </div>
  );
}
