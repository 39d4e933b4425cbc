/** The path command's readable report: the direction, then one row per step. */
import type { SteepestPath } from '../../core/predict/steepest-path.ts';
import { num, table } from './numbers.ts';
import { fitValue, interval, messagesAndCaution, signedNum } from './prediction-text.ts';

/**
 * The readable path report: each factor's coefficient and step (coded and real), then one row per
 * step with the real settings, the prediction, its interval and the outside mark; messages, caution.
 * Example: pathText(p) starts with 'Path of steepest ascent for Yield'.
 */
export function pathText(p: SteepestPath): string {
  const out: string[] = [];
  const unit = (i: number) => (p.factors[i].unit ? ` ${p.factors[i].unit}` : '');
  out.push(`Path of steepest ${p.sense} for ${p.response}, base factor ${p.base.name}, ${p.steps.length - 1} steps`);
  out.push('');
  out.push('Step in each factor (coded step proportional to its main-effect coefficient)');
  out.push(
    table(
      ['factor', 'coefficient', 'coded step', 'real step'],
      p.factors.map((f, i) => [
        `${f.letter}  ${f.name}`,
        num(f.coef),
        f.moving ? signedNum(p.direction[i]) : 'held',
        f.moving ? (f.scale === 'log' ? `x ${num(p.realStep[i])}` : `${signedNum(p.realStep[i])}${unit(i)}`) : 'held',
      ]),
    )
      .split('\n')
      .map((l) => '  ' + l)
      .join('\n'),
  );
  out.push('');
  const head = ['step', ...p.factors.map((f) => f.name), 'predicted', `${Math.round(p.level * 100)}% prediction interval`, ''];
  const rows = p.steps.map((s) => [
    s.step === 0 ? '0 (origin)' : String(s.step),
    ...s.real.map((v, i) => (typeof v === 'number' ? `${num(v)}${unit(i)}` : v)),
    fitValue(s.fit),
    interval(s.pi),
    s.outside ? 'outside tested range' : '',
  ]);
  out.push(
    table(head, rows)
      .split('\n')
      .map((l) => '  ' + l)
      .join('\n'),
  );
  out.push(...messagesAndCaution(p.messages, p.caution));
  return out.join('\n');
}
