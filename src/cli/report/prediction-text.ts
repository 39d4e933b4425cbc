/**
 * The predict command's readable report: settings in real and coded units, the fit and its
 * intervals, the make-up of the fit. Also the pieces the solve and path reports share.
 */
import type { Prediction } from '../../core/predict/predict.ts';
import { intervalText, valueText } from '../../core/text/interval-text.ts';
import { num, table } from './numbers.ts';
import type { FactorSetting } from '../../core/predict/parse-settings.ts';

/**
 * The readable prediction report: settings table, fit, se, CI and PI, then the make-up of the
 * fit (baseline and contributions, largest first), messages and the caution. Nulls print as '-'.
 * Example: predictionText(p) starts with 'Prediction of Yield'.
 */
export function predictionText(p: Prediction): string {
  const pct = `${Math.round(p.level * 100)}%`;
  const out: string[] = [];
  out.push(`Prediction of ${p.response}${p.outside ? '  (OUTSIDE THE TESTED RANGE)' : ''}`);
  out.push('');
  out.push(settingsTable(p.settings));
  out.push('');
  out.push(`  fitted value                 ${fitValue(p.fit)}`);
  out.push(`  standard error of the fit    ${seText(p.se, p.transformed?.se)}`);
  out.push(`  ${pct} confidence interval      ${interval(p.ci)}   (for the mean response at these settings)`);
  out.push(`  ${pct} prediction interval      ${interval(p.pi)}   (for one new run)`);
  out.push('');
  out.push('How the fitted value is made up (coefficient x product of coded settings, largest first)');
  const rows = [
    ['baseline (fit at the center)', '', '', num(p.baseline)],
    ...p.contributions.map((c) => [`${c.estimates ?? c.letters}  ${c.name}`, num(c.coef), signedNum(c.product), signedNum(c.value)]),
    ['fitted value', '', '', fitValue(p.fit)],
  ];
  out.push(
    table(['term', 'coefficient', 'product', 'contribution'], rows)
      .split('\n')
      .map((l) => '  ' + l)
      .join('\n'),
  );
  out.push(...messagesAndCaution(p.messages, p.caution));
  return out.join('\n');
}


/** A number with its sign, 4 significant digits: signedNum(0.6) -> '+0.6', signedNum(-1) -> '-1', signedNum(0) -> '0'. */
export function signedNum(x: number): string {
  return x > 0 ? `+${num(x)}` : num(x);
}

/** The settings table (factor, real setting with unit, coded value, how it was chosen), indented two spaces. */
export function settingsTable(settings: readonly FactorSetting[]): string {
  return table(
    ['factor', 'setting', 'coded', 'how'],
    settings.map((s) => [
      `${s.letter}  ${s.name}`,
      typeof s.real === 'number' ? `${num(s.real)}${s.unit ? ' ' + s.unit : ''}` : s.real,
      signedNum(s.coded),
      { given: 'given', center: 'center (not given)', default: 'chosen by rule', free: 'solved for' }[s.source],
    ]),
  )
    .split('\n')
    .map((l) => '  ' + l)
    .join('\n');
}

/** The 'Notes' block (only when there are messages) and the 'Caution' block, as lines. */
export function messagesAndCaution(messages: readonly string[], caution: readonly string[]): string[] {
  const out: string[] = [];
  if (messages.length > 0) {
    out.push('', 'Notes');
    for (const m of messages) out.push(`  - ${m}`);
  }
  out.push('', 'Caution');
  for (const c of caution) out.push(`  - ${c}`);
  return out;
}

/** An interval as 'lo to hi', an open end in words, or '-' when null: interval([1, 2]) -> '1 to 2'; interval([1, Infinity]) -> '1 or more (no upper limit)'. */
export function interval(iv: readonly [number, number] | null): string {
  return intervalText(iv, (x) => num(x));
}

/** The standard error, or under a transform the one on the fitted scale, said so: seText(null, 0.02) -> '- (0.02 on the fitted scale)'. */
export function seText(se: number | null, fittedScale: number | null | undefined): string {
  return fittedScale === undefined ? num(se) : `${num(se)} (${num(fittedScale)} on the fitted scale)`;
}

/** A fitted value, in words when it has no finite value (beyond a negative power's domain). */
export function fitValue(x: number | null): string {
  return valueText(x, (v) => num(v));
}
