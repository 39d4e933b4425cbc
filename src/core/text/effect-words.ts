/**
 * The verdict on one effect in plain words, shared by the phone's analysis screen and the
 * command line's report so that both say the same thing: from the t test's p, "clear" below
 * 0.01, "likely" below 0.05, "possible" below 0.10, "within the noise" otherwise; from Lenth's
 * method (no residual df), "beyond the simultaneous margin", "beyond the margin" or "within the
 * margin". The cut-offs 0.01, 0.05 and 0.10 are common practice for reading p-values.
 */

/** The p-value cut-offs, strongest first, with their words (common practice). */
export const EFFECT_WORDS = [
  { below: 0.01, words: 'clear' },
  { below: 0.05, words: 'likely' },
  { below: 0.1, words: 'possible' },
] as const;

/** The words for an effect whose p is at or above every cut-off. */
export const WITHIN_NOISE = 'within the noise';

/** Lenth's marks (lenth-step.ts) in words. */
export const LENTH_WORDS = { active: 'beyond the simultaneous margin', likely: 'beyond the margin', none: 'within the margin' } as const;

/**
 * The verdict on an effect: by its p when there is one; else by Lenth's mark when Lenth's method
 * was applied (`lenthMark` null for none); else null (no test possible).
 * Cost O(1). Example: effectWords(0.003) -> "clear"; effectWords(0.07) -> "possible";
 * effectWords(null, 'active') -> "beyond the simultaneous margin"; effectWords(null) -> null.
 */
export function effectWords(p: number | null | undefined, lenthMark?: 'likely' | 'active' | null): string | null {
  if (p !== null && p !== undefined && Number.isFinite(p)) {
    for (const c of EFFECT_WORDS) if (p < c.below) return c.words;
    return WITHIN_NOISE;
  }
  if (lenthMark === undefined) return null;
  return lenthMark === null ? LENTH_WORDS.none : LENTH_WORDS[lenthMark];
}
