/**
 * The Next runs screen's note when the response cannot be fitted yet: the fit's own reason as a
 * finished sentence, then what to do. The fit's reasons end without a full stop (they are also
 * joined into longer messages), so the stop is added here once instead of running two sentences
 * together ("... are needed Log more runs").
 */

/**
 * Cost O(length of the reason).
 * Example: logMoreRunsText('Gloss: 0 runs cannot estimate even the intercept and 3 main effects; at least 4 runs are needed')
 * -> 'Gloss: 0 runs ... at least 4 runs are needed. Log more runs, then come back here.'
 */
export function logMoreRunsText(reason: string): string {
  const finished = reason.trim().replace(/[\s.;:,]+$/, '');
  return `${finished}. Log more runs, then come back here.`;
}
