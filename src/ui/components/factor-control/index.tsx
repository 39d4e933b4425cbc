/**
 * One factor's setting on the quick card: a numeric factor by a slider (in coded units, so a log
 * scale spreads evenly) and a number field in real units with the coded value beside it (and a
 * sign button where the setting may be negative: core/factor/negative-allowed.ts); a
 * categorical factor by its two levels as two buttons.
 */
import { toReal } from '../../../core/factor/coding.ts';
import type { Factor } from '../../../core/factor/factor.ts';
import { negativeAllowed } from '../../../core/factor/negative-allowed.ts';
import { isOutside } from '../../../core/predict/outside-range.ts';
import type { Setting } from '../../../core/study/study.ts';
import { coded as codedText, setting as settingText } from '../../lib/format.ts';
import { ChoiceButtons } from '../choice-buttons/index.tsx';
import { SignToggle } from '../sign-toggle/index.tsx';
import { NumberInput } from '../number-input/index.tsx';
import './style.css';

export type FactorControlProps = {
  readonly factor: Factor;
  readonly index: number;
  readonly value: Setting;
  /** What the number field holds (may be half typed). */
  readonly text: string;
  readonly coded: number;
  readonly error: string | null;
  /** Reach of the slider in coded units (e.g. 1.5: half a range beyond each tested end). */
  readonly reach: number;
  /** Half-width of the tested range in coded units: 1, or a central composite design's axial distance (core/predict/tested-extent.ts). */
  readonly extent?: number;
  readonly onCoded: (x: number) => void;
  readonly onText: (text: string) => void;
  readonly onLevel: (label: string) => void;
};

export function FactorControl({ factor, index, value, text, coded, error, reach, extent = 1, onCoded, onText, onLevel }: FactorControlProps) {
  if (factor.kind === 'categorical') {
    return (
      <div class="factor">
        <ChoiceButtons
          label={`${factor.name} (${factor.letter})`}
          options={factor.levels.map((l) => ({ value: l, label: l }))}
          value={String(value)}
          onChoose={onLevel}
        />
      </div>
    );
  }
  const id = `factor-${index}`;
  const outside = isOutside(coded, extent);
  // Axial ends are irrational (e.g. 1.414 coded): shown to 4 significant digits.
  const end = (x: number) => settingText(extent === 1 ? (toReal(factor, x) as number) : Number((toReal(factor, x) as number).toPrecision(4)), factor.unit);
  const low = end(-extent);
  const high = end(extent);
  // The tested part of the track, drawn as a band: [-extent, +extent] within [-reach, +reach].
  const band = `${((reach - extent) / (2 * reach)) * 100}%`;
  return (
    <div class={outside ? 'factor outside' : 'factor'}>
      <label for={id} class="factor-name">
        {factor.name} ({factor.letter})
      </label>
      <div class="factor-entry">
        <NumberInput id={id} value={text} invalid={!!error} onText={onText} />
        {factor.unit && <span class="unit">{factor.unit}</span>}
        {negativeAllowed({ kind: 'setting', factor }) && <SignToggle text={text} what={factor.name} controls={id} onText={onText} />}
        <span class="coded" data-testid={`coded-${index}`}>
          coded {codedText(coded)}
        </span>
      </div>
      <input
        class="slider"
        type="range"
        min={-reach}
        max={reach}
        step={0.05}
        value={Math.max(-reach, Math.min(reach, coded))}
        aria-label={`${factor.name} slider`}
        aria-valuetext={settingText(typeof value === 'number' ? value : Number(value), factor.unit)}
        style={{ '--band': band } as Record<string, string>}
        onInput={(e) => onCoded(Number((e.currentTarget as HTMLInputElement).value))}
      />
      <div class="range-note">
        Tested {low} to {high}
      </div>
      {outside && <p class="outside-note">Outside the tested range</p>}
      {error && (
        <p class="field-error" role="alert">
          {error}
        </p>
      )}
    </div>
  );
}
