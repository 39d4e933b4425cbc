/** A row of large buttons of which one is chosen (a categorical level, a response, a model). */
import './style.css';
export type ChoiceButtonsProps<T extends string | number> = {
  /** Read out before the buttons, and shown unless hidden. */
  readonly label: string;
  readonly hideLabel?: boolean;
  readonly options: readonly { readonly value: T; readonly label: string }[];
  readonly value: T;
  readonly onChoose: (value: T) => void;
  readonly disabled?: boolean;
};

export function ChoiceButtons<T extends string | number>({ label, hideLabel, options, value, onChoose, disabled }: ChoiceButtonsProps<T>) {
  return (
    <div class="choice" role="group" aria-label={label}>
      {!hideLabel && <div class="choice-label">{label}</div>}
      <div class="choice-row">
        {options.map((o) => (
          <button
            type="button"
            key={String(o.value)}
            class={o.value === value ? 'choice-btn chosen' : 'choice-btn'}
            aria-pressed={o.value === value}
            disabled={disabled}
            onClick={() => onChoose(o.value)}
          >
            {o.label}
          </button>
        ))}
      </div>
    </div>
  );
}
