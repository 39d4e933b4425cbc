/**
 * Signed values as horizontal bars drawn from a middle line: positive to the right, negative to
 * the left, the length proportional to the size. The sign is also written, so the color is
 * never the only cue.
 */
import './style.css';
export type BarRow = {
  readonly key: string;
  readonly label: string;
  readonly value: number;
  /** The value as shown (with sign and unit). */
  readonly shown: string;
  /** A line under the bar in plain words. */
  readonly detail?: string;
  /** Drawn faint: a term the runs do not show to matter. */
  readonly faint?: boolean;
};

export type BarListProps = {
  readonly rows: readonly BarRow[];
  readonly label: string;
};

export function BarList({ rows, label }: BarListProps) {
  const max = rows.reduce((m, r) => Math.max(m, Math.abs(r.value)), 0) || 1;
  return (
    <ol class="bars" aria-label={label}>
      {rows.map((r) => {
        const half = (Math.abs(r.value) / max) * 50;
        const style = r.value >= 0 ? { left: '50%', width: `${half}%` } : { left: `${50 - half}%`, width: `${half}%` };
        return (
          <li key={r.key} class={r.faint ? 'bar-row faint' : 'bar-row'}>
            <div class="bar-head">
              <span class="bar-label">{r.label}</span>
              <span class="bar-value">{r.shown}</span>
            </div>
            <div class="bar-track" aria-hidden="true">
              <div class="bar-mid" />
              <div class={r.value >= 0 ? 'bar up' : 'bar down'} style={style} />
            </div>
            {r.detail && <div class="bar-detail">{r.detail}</div>}
          </li>
        );
      })}
    </ol>
  );
}
