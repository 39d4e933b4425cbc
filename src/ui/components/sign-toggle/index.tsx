/**
 * A large "+/−" button beside a number field, for the phones whose decimal keypad has no minus
 * key. It flips the sign of what is typed (core/factor/flip-sign.ts) and hands the new text to
 * the field's own handler, so the field's reading and its draft work as for typed text. Its name
 * says what a tap will do ("Make Offset negative", then "Make Offset positive").
 */
import { flipSign, isNegativeText } from '../../../core/factor/flip-sign.ts';
import './style.css';

export type SignToggleProps = {
  /** What the field holds now. */
  readonly text: string;
  /** The field's name, for the button's name. */
  readonly what: string;
  /** The id of the field it changes. */
  readonly controls: string;
  readonly disabled?: boolean;
  readonly onText: (text: string) => void;
};

export function SignToggle({ text, what, controls, disabled, onText }: SignToggleProps) {
  const negative = isNegativeText(text);
  return (
    <button
      type="button"
      class={negative ? 'btn ghost sign-toggle negative' : 'btn ghost sign-toggle'}
      aria-label={negative ? `Make ${what} positive` : `Make ${what} negative`}
      aria-controls={controls}
      disabled={disabled}
      // The focus (and with it the phone's keypad) stays in the field being typed.
      onMouseDown={(e) => e.preventDefault()}
      onClick={() => onText(flipSign(text))}
    >
      <span aria-hidden="true">+/−</span>
    </button>
  );
}
