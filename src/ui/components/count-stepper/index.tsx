/** A whole-number box with large − and + buttons beside it (center runs, replicates). */
import './style.css';
export type CountStepperProps = {
  readonly id: string;
  readonly label: string;
  /** The text in the box (what the person typed, read by the model). */
  readonly value: string;
  readonly min: number;
  readonly max?: number;
  readonly hint?: string;
  readonly onChange: (text: string) => void;
};

export function CountStepper({ id, label, value, min, max, hint, onChange }: CountStepperProps) {
  const n = /^\s*\d+\s*$/.test(value) ? Number(value) : null;
  const step = (d: number) => {
    const next = Math.max(min, (n ?? min) + d);
    onChange(String(max === undefined ? next : Math.min(max, next)));
  };
  return (
    <div class="field">
      <label for={id} class="field-name">
        {label}
      </label>
      {hint && <p class="quiet field-hint">{hint}</p>}
      <div class="stepper">
        <button type="button" class="btn square" aria-label={`One fewer: ${label}`} disabled={n !== null && n <= min} onClick={() => step(-1)}>
          −
        </button>
        <input id={id} class="num stepper-box" type="text" inputMode="numeric" autocomplete="off" value={value} onInput={(e) => onChange((e.currentTarget as HTMLInputElement).value)} />
        <button type="button" class="btn square" aria-label={`One more: ${label}`} disabled={n !== null && max !== undefined && n >= max} onClick={() => step(1)}>
          +
        </button>
      </div>
    </div>
  );
}
