/**
 * The standing caution shown with every prediction, always visible (never folded away). The
 * lines are the core's own words (CAUTION, or a result's `caution`), shown as they come.
 */
import './style.css';
export type CautionBoxProps = {
  readonly lines: readonly string[];
  /** One paragraph instead of a list, to take less height where it stays on screen. */
  readonly compact?: boolean;
};

export function CautionBox({ lines, compact }: CautionBoxProps) {
  if (compact) {
    return (
      <section class="caution compact" aria-label="Caution">
        <p>
          {lines.map((l, i) => (
            <span key={l}>
              {i > 0 ? ' ' : ''}
              {l}
            </span>
          ))}
        </p>
      </section>
    );
  }
  return (
    <section class="caution" aria-label="Caution">
      <h3>Caution</h3>
      <ul>
        {lines.map((l) => (
          <li key={l}>{l}</li>
        ))}
      </ul>
    </section>
  );
}
