/** The solve command's readable report. */
import { formatSetting } from '../../core/predict/parse-settings.ts';
import type { Solution } from '../../core/predict/solve-for-target.ts';
import { num } from './numbers.ts';
import { fitValue, interval, seText, messagesAndCaution, settingsTable, signedNum } from './prediction-text.ts';

/**
 * The readable solve report: the answer (or the nearest setting and what would be needed), the
 * span the range reaches, the settings, the fit and its intervals, messages and the caution.
 * Example: solveText(s) starts with 'Setting of Time for Yield = 41'.
 */
export function solveText(s: Solution): string {
  const pct = `${Math.round(s.level * 100)}%`;
  const unit = s.factor.unit ? ` ${s.factor.unit}` : '';
  const out: string[] = [];
  out.push(`Setting of ${s.factor.name} for ${s.response} = ${num(s.target)}`);
  out.push('');
  out.push(
    s.reachable
      ? `  ${s.factor.name} = ${num(s.setting)}${unit} (coded ${signedNum(s.coded)}) gives the target.`
      : `  Not reachable inside the tested range; nearest setting ${s.factor.name} = ${num(s.setting)}${unit} (coded ${signedNum(s.coded)}).`,
  );
  if (s.needed) {
    out.push(`  The model would need ${s.factor.name} = ${s.needed.real === null ? 'a setting far outside the range' : formatSetting(s.needed.real, s.factor.unit)} (coded ${signedNum(s.needed.coded)}), outside the tested range.`);
  }
  out.push(`  The tested range of ${s.factor.name} reaches ${interval(s.span)} at these settings (slope ${num(s.slope)} per coded unit${s.transformed ? ` on the fitted scale` : ''}).`);
  out.push('');
  out.push(settingsTable(s.settings));
  out.push('');
  out.push(`  fitted value there           ${fitValue(s.fit)}`);
  out.push(`  standard error of the fit    ${seText(s.se, s.transformed?.se)}`);
  out.push(`  ${pct} confidence interval      ${interval(s.ci)}   (for the mean response)`);
  out.push(`  ${pct} prediction interval      ${interval(s.pi)}   (for one new run)`);
  out.push(...messagesAndCaution(s.messages, s.caution));
  return out.join('\n');
}
