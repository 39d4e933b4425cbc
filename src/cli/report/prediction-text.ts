/**
 * The predict command's readable report: settings in real and coded units, the fit and its
 * intervals, the make-up of the fit. Also the pieces the solve and path reports share.
 */
import type { Prediction } from '../../core/predict/predict.ts';
import { num, table } from './numbers.ts';
import type { FactorSetting } from '../../core/predict/parse-settings.ts';

export function predictionText(p: Prediction): string {
  const pct = `${Math.round(p.level * 100)}%`;
  const out: string[] = [];
  out.push(`Prediction of ${p.response}${p.outside ? '  (OUTSIDE THE TESTED RANGE)' : ''}`);
  out.push('');
  out.push(settingsTable(p.settings));
  out.push('');
  out.push(`  fitted value                 ${num(p.fit)}`);
  out.push(`  standard error of the fit    ${num(p.se)}`);
  out.push(`  ${pct} confidence interval      ${interval(p.ci)}   (for the mean response at these settings)`);
  out.push(`  ${pct} prediction interval      ${interval(p.pi)}   (for one new run)`);
  out.push('');
  out.push('How the fitted value is made up (coefficient x product of coded settings, largest first)');
  const rows = [
    ['baseline (fit at the center)', '', '', num(p.baseline)],
    ...p.contributions.map((c) => [`${c.letters}  ${c.name}`, num(c.coef), signedNum(c.product), signedNum(c.value)]),
    ['fitted value', '', '', num(p.fit)],
  ];
  out.push(
    table(['term', 'coefficient', 'product', 'contribution'], rows)
      .split('\n')
      .map((l) => '  ' + l)
      .join('\n'),
  );
  out.push(...notesAndCaution(p.messages, p.caution));
  return out.join('\n');
}


export function signedNum(x: number): string {
  return x > 0 ? `+${num(x)}` : num(x);
}

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

export function notesAndCaution(messages: readonly string[], caution: readonly string[]): string[] {
  const out: string[] = [];
  if (messages.length > 0) {
    out.push('', 'Notes');
    for (const m of messages) out.push(`  - ${m}`);
  }
  out.push('', 'Caution');
  for (const c of caution) out.push(`  - ${c}`);
  return out;
}

export function interval(iv: readonly [number, number] | null): string {
  return iv ? `${num(iv[0])} to ${num(iv[1])}` : '-';
}
