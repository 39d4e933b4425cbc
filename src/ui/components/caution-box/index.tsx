/**
 * The standing caution shown with every prediction, always visible. The lines are the core's own
 * words (CAUTION, or a result's `caution`), shown as they come. Where it must stay on screen in
 * little height (the quick card's sticky prediction), `short` gives it as one short line that
 * stays visible, with the full lines one tap away on that line itself.
 */
import './style.css';
export type CautionBoxProps = {
  readonly lines: readonly string[];
  /** One paragraph instead of a list, to take less height where it stays on screen. */
  readonly compact?: boolean;
  /** The caution in one short line (core/text/caution-short.ts), with a tap on it opening the full lines. */
  readonly short?: { readonly line: string; readonly more: string };
};

export function CautionBox({ lines, compact, short }: CautionBoxProps) {
  if (short) {
    return (
      <section class="caution folded" aria-label="Caution">
        <details>
          <summary>
            <span class="caution-line">
              <span aria-hidden="true">⚠ </span>
              {short.line}
            </span>
            <span class="caution-more">{short.more}</span>
          </summary>
          <ul>
            {lines.map((l) => (
              <li key={l}>{l}</li>
            ))}
          </ul>
        </details>
      </section>
    );
  }
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
