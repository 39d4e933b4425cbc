/** The second-order section of the analyze report: canonical analysis, ridge and the best setting, with the caution. */
import type { SecondOrderAnalysis } from '../../core/optimum/second-order-analysis.ts';
import { nameWithUnit } from '../../core/study/name-with-unit.ts';
import { intervalText } from '../../core/text/interval-text.ts';
import { num, table } from './numbers.ts';

const interval = (iv: readonly [number, number] | null) => intervalText(iv, (x) => num(x));

export function secondOrderText(s: SecondOrderAnalysis): string {
  const factors = s.canonical.surface.factors;
  const names = factors.map((f) => nameWithUnit(f.name, f.unit));
  const out: string[] = ['Second-order analysis (coded units unless marked real)', ''];
  const st = s.canonical.stationary;
  out.push(`Nature of the surface: ${s.canonical.nature}`);
  if (st) {
    out.push(`Stationary point: ${factors.map((f, i) => `${f.name} ${num(st.real[i])}${f.unit ? ` ${f.unit}` : ''} (coded ${num(st.coded[i])})`).join(', ')}; fit ${num(st.fit)}; ${st.inside ? 'inside' : 'outside'} the factorial box`);
  } else out.push('Stationary point: none (B is singular)');
  out.push('', 'Eigenvalues of B and their unit eigenvectors');
  out.push(table(['Eigenvalue', ...names], s.canonical.eigenvalues.map((l, i) => [num(l), ...s.canonical.eigenvectors[i].map((v) => num(v))])).replace(/^/gm, '  '));
  out.push('', `Ridge of ${s.ridgeSense === 'max' ? 'highest' : 'lowest'} fitted response`);
  out.push(table(['Radius', ...names.map((n) => `${n} real`), 'Fit', '95% PI'], s.ridge.map((p) => [num(p.radius), ...p.real.map((v) => num(v)), num(p.fit), interval(p.pi)])).replace(/^/gm, '  '));
  const o = s.optimum;
  const goal = s.goal.kind === 'target' ? `nearest the target ${num(s.goal.target)}` : s.goal.kind === 'max' ? 'highest fitted response' : 'lowest fitted response';
  out.push('', `Best setting inside the factorial box (${goal})`);
  out.push(`  ${factors.map((f, i) => `${f.name} ${num(o.real[i])}${f.unit ? ` ${f.unit}` : ''} (coded ${num(o.coded[i])})`).join(', ')}`);
  out.push(`  Fit ${num(o.fit)}, 95% CI ${interval(o.ci)}, 95% PI ${interval(o.pi)}`);
  out.push(`  Found by: ${o.method}`);
  if (s.notes.length > 0) {
    out.push('', 'Notes');
    for (const n of s.notes) out.push(`  - ${n}`);
  }
  out.push('', 'Caution');
  for (const c of s.caution) out.push(`  - ${c}`);
  return out.join('\n');
}
