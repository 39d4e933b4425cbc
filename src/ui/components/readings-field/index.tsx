/**
 * The readings of one response on the run form: one large box per reading (a number keypad has
 * no space key, so each repeat reading gets its own box), a button to add another, and their
 * mean when there are several.
 */
import { negativeAllowed } from '../../../core/factor/negative-allowed.ts';
import { nameWithUnit } from '../../../core/study/name-with-unit.ts';
import type { Response } from '../../../core/study/response.ts';
import { withUnit } from '../../lib/format.ts';
import { SignToggle } from '../sign-toggle/index.tsx';
import { NumberInput } from '../number-input/index.tsx';
import './style.css';

export type ReadingsFieldProps = {
  readonly response: Response;
  readonly index: number;
  readonly boxes: readonly string[];
  readonly mean: number | null;
  readonly error: string | null;
  readonly disabled?: boolean;
  readonly onReading: (j: number, text: string) => void;
  readonly onAdd: () => void;
  readonly onRemove: (j: number) => void;
};

export function ReadingsField({ response, index, boxes, mean, error, disabled, onReading, onAdd, onRemove }: ReadingsFieldProps) {
  const name = nameWithUnit(response.name, response.unit);
  // A sign button where a reading may be negative (no lower bound at or above zero).
  const signed = negativeAllowed({ kind: 'reading', response });
  return (
    <fieldset class="readings" disabled={disabled}>
      <legend>{name}</legend>
      {boxes.map((b, j) => {
        const what = boxes.length === 1 ? `${response.name} reading` : `${response.name} reading ${j + 1}`;
        return (
          <div class="reading" key={j}>
            <NumberInput id={`reading-${index}-${j}`} ariaLabel={what} value={b} invalid={!!error} onText={(t) => onReading(j, t)} />
            {signed && <SignToggle text={b} what={what} controls={`reading-${index}-${j}`} onText={(t) => onReading(j, t)} />}
            {boxes.length > 1 && (
              <button type="button" class="btn ghost square" aria-label={`Remove ${response.name} reading ${j + 1}`} onClick={() => onRemove(j)}>
                ✕
              </button>
            )}
          </div>
        );
      })}
      <div class="readings-foot">
        <button type="button" class="btn ghost" onClick={onAdd}>
          + Another reading
        </button>
        {boxes.filter((b) => b !== '').length > 1 && mean !== null && <span class="mean">Mean {withUnit(mean, response.unit)}</span>}
      </div>
      {error && (
        <p class="field-error" role="alert">
          {error}
        </p>
      )}
    </fieldset>
  );
}
