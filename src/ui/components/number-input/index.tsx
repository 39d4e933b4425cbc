/**
 * A number typed on a phone: a text field with the decimal keypad (inputmode="decimal"), no
 * autocomplete, and the typed text handed on as it is, so each screen reads it with the core's
 * own rules (a decimal comma, a minus sign) and keeps the person's typing in its draft. The one
 * markup every number field of the app shares.
 */
export type NumberInputProps = {
  readonly id: string;
  readonly value: string;
  readonly onText: (text: string) => void;
  readonly invalid?: boolean;
  /** The id of the message that explains the field's problem, when there is one. */
  readonly describedBy?: string;
  /** A name for a field without a label element of its own. */
  readonly ariaLabel?: string;
};

export function NumberInput({ id, value, onText, invalid, describedBy, ariaLabel }: NumberInputProps) {
  return (
    <input
      id={id}
      class="num"
      type="text"
      inputMode="decimal"
      autocomplete="off"
      value={value}
      aria-label={ariaLabel}
      aria-invalid={invalid ? true : undefined}
      aria-describedby={describedBy}
      onInput={(e) => onText((e.currentTarget as HTMLInputElement).value)}
    />
  );
}
