/** The analyze command's readable report, in Trialbook's own plain-words layout. */
import type { Analysis, AnovaTable } from '../../core/fit/analysis.ts';
import { combinationLabel } from '../../core/fit/combination-label.ts';
import { pValue } from '../../core/text/p-value.ts';
import { curvatureStatement, lenthStatement, verdictText } from '../../core/text/verdict-text.ts';
import { zeroIfRoundoff } from '../../core/text/roundoff-zero.ts';
import { num, table } from './numbers.ts';

function anovaText(t: AnovaTable): string {
  return table(
    ['source', 'df', 'sum of squares', 'mean square', 'F', 'p'],
    t.rows.map((r) => [r.source, String(r.df), num(r.ss, 6), num(r.ms, 6), num(r.f), pValue(r.p)]),
  );
}

export function analysisText(a: Analysis): string {
  const out: string[] = [];
  // Figures that are zero up to round-off beside the response's own scale print as 0.
  let scale = 0;
  for (const r of a.runs) scale = Math.max(scale, Math.abs(r.y));
  const z = (x: number | null | undefined) => (x === null || x === undefined ? x : zeroIfRoundoff(x, scale));
  const how = a.method === 'yates' ? "Yates' algorithm (complete, balanced factorial)" : 'least squares (Householder QR)';
  out.push(`Analysis of ${a.response}: ${a.n} runs, fitted by ${how}, in coded units`);
  out.push('');
  out.push('Coding used (real setting -> coded value)');
  for (const c of a.coding) {
    const unit = c.unit ? ` ${c.unit}` : '';
    const log = c.scale === 'log' ? ', log scale' : '';
    out.push(`  ${c.letter}  ${c.name}: ${c.low}${unit} -> -1, ${c.high}${unit} -> +1${c.kind === 'numeric' ? `${log}, center 0` : ' (two named levels)'}`);
  }
  out.push('');
  out.push('Effects (effect = 2 x coefficient: the change from -1 to +1 with the other factors at 0)');
  const lenthCol = a.df.residual === 0;
  // A pseudo standard error that is itself round-off (an exact fit) gives no Lenth t.
  const lenthRoundoff = a.lenth !== null && zeroIfRoundoff(a.lenth.pse, scale) === 0;
  const head = ['term', 'letters', 'effect', 'coefficient', 'std error', 't', 'p', '95% CI of coefficient'];
  if (lenthCol) head.push('Lenth t');
  const rows = [
    ['Intercept (fit at center)', 'I', '-', num(a.intercept.coef), num(a.intercept.se), num(a.intercept.t), pValue(a.intercept.p), '-', ...(lenthCol ? ['-'] : [])],
    ...[...a.terms]
      .sort((x, y) => Math.abs(y.effect) - Math.abs(x.effect))
      .map((t) => [
        t.name,
        t.estimates ?? t.letters,
        num(z(t.effect)),
        num(z(t.coef)),
        num(t.se),
        num(t.t),
        pValue(t.p),
        t.ci ? `${num(z(t.ci[0]))} to ${num(z(t.ci[1]))}` : '-',
        ...(lenthCol ? [lenthRoundoff ? '-' : num(t.lenthT)] : []),
      ]),
  ];
  out.push(table(head, rows));
  if (a.blocks) out.push(`  block effects (sum to zero): ${a.blocks.map((b) => `block ${b.block} ${num(b.effect)}`).join(', ')}`);
  out.push('');
  out.push('How well the model fits');
  out.push(`  noise (residual SD)               ${num(a.sigma)}   on ${a.df.residual} residual df`);
  out.push(`  explained (R^2)                   ${num(a.r2)}`);
  out.push(`  explained, for model size (adj R^2) ${num(a.r2adj)}`);
  out.push(`  cross-validated (predicted R^2)   ${num(a.r2pred)}`);
  out.push('');
  out.push('ANOVA, sequential sums of squares (each term after those above it)');
  out.push(anovaText(a.anova));
  if (a.anovaAdjusted) {
    out.push('');
    out.push('ANOVA, adjusted sums of squares (each term after all the others)');
    out.push(anovaText(a.anovaAdjusted));
  }
  if (a.curvature) {
    const c = a.curvature;
    out.push('');
    out.push(`Curvature from ${c.nCenter} center runs: factorial mean - center mean = ${num(c.estimate)}, std error ${num(c.se)}, t ${num(c.t)}, p ${pValue(c.p)}`);
    const v = a.verdicts.find((x) => x.kind === 'curvature');
    if (v && v.kind === 'curvature') out.push(`  ${curvatureStatement(v)}`);
  }
  // A significant lack of fit is among the notes below; the plain statement is given here.
  const lof = a.verdicts.find((x) => x.kind === 'lack-of-fit' && x.outcome === 'not-significant');
  if (lof) {
    out.push('');
    out.push(verdictText(lof));
  }
  if (a.lenth) {
    const l = a.lenth;
    const effects = l.effects.map((e) => ({ ...e, effect: zeroIfRoundoff(e.effect, scale) }));
    const [figures, marked] = lenthStatement({ ...l, pse: zeroIfRoundoff(l.pse, scale), me: zeroIfRoundoff(l.me, scale), sme: zeroIfRoundoff(l.sme, scale) }, effects);
    out.push('');
    out.push(figures);
    out.push(`  ${marked}`);
    // Lenth's effects come from the saturated fit over the factorial runs; where one differs
    // from the table's effect of the same term (beyond round-off), each is labelled.
    const table = new Map(a.terms.map((t) => [t.estimates ?? t.letters, zeroIfRoundoff(t.effect, scale)]));
    const differ = effects.filter((e) => table.has(e.letters) && num(table.get(e.letters)) !== num(e.effect));
    if (differ.length > 0) {
      out.push(
        `  Lenth's effects are those of the saturated fit over the factorial runs only; the effects table's are the model's over all runs: ${differ.map((e) => `${e.letters} ${num(e.effect)} (Lenth) and ${num(table.get(e.letters))} (table)`).join('; ')}`,
      );
    }
  }
  if (a.aliased.length > 0) {
    out.push('');
    out.push('Terms these runs cannot separate');
    for (const t of a.aliased) {
      out.push(`  ${t.letters} = ${combinationLabel(t.combination)}`);
    }
  }
  if (a.warnings.length > 0) {
    out.push('');
    out.push('Notes');
    for (const w of a.warnings) out.push(`  * ${w}`);
  }
  return out.join('\n');
}
