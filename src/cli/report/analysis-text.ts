/** The analyze command's readable report, in Trialbook's own plain-words layout. */
import { isSquare } from '../../core/model/term.ts';
import type { Analysis, AnovaTable } from '../../core/fit/analysis.ts';
import { combinationLabel } from '../../core/fit/combination-label.ts';
import { effectWords } from '../../core/text/effect-words.ts';
import { pValue } from '../../core/text/p-value.ts';
import { curvatureStatement, lenthStatement, verdictText } from '../../core/text/verdict-text.ts';
import { zeroIfRoundoff } from '../../core/text/roundoff-zero.ts';
import { lenthTableDifferences, lenthTableText, responseScale } from '../../core/text/lenth-table-effects.ts';
import { num, table } from './numbers.ts';
import { boundNoteCommand } from '../../core/text/bound-text.ts';

function anovaText(t: AnovaTable): string {
  return table(
    ['source', 'df', 'sum of squares', 'mean square', 'F', 'p'],
    t.rows.map((r) => [r.source, String(r.df), num(r.ss, 6), num(r.ms, 6), num(r.f), pValue(r.p)]),
  );
}

export interface AnalysisTextOptions {
  /** The response's unit, written beside the effects and their intervals. */
  readonly unit?: string;
  /** True when the coding came from the file (no --levels): a categorical factor's -1 is its first label in file order. */
  readonly codingFromFileOrder?: boolean;
}

/**
 * The table of effects, in Trialbook's own layout: ranked by size, largest first; for each, the
 * effect in the response's units, its 95% interval (2 x the coefficient's t interval; with no
 * residual df, the effect +- Lenth's margin of error), its p and the verdict in the phone's words
 * (core/text/effect-words.ts).
 */
export function effectsTable(a: Analysis, unit?: string): string[] {
  const u = unit ? ` ${unit}` : '';
  // Figures that are zero up to round-off print as 0 (core/text/lenth-table-effects.ts), on the scale of the responses.
  const scale = responseScale(a);
  const z = (x: number) => zeroIfRoundoff(x, scale);
  const marks = new Map((a.lenth?.effects ?? []).map((e) => [e.letters, e.mark ?? null]));
  const byLenth = a.df.residual === 0 && a.lenth !== null;
  const rows = [...a.terms]
    .sort((x, y) => Math.abs(y.effect) - Math.abs(x.effect))
    .map((t, i) => {
      const letters = t.estimates ?? t.letters;
      const interval = t.ci ? [z(2 * t.ci[0]), z(2 * t.ci[1])] : byLenth ? [z(t.effect - a.lenth!.me), z(t.effect + a.lenth!.me)] : null;
      const words = effectWords(t.p, byLenth ? (marks.get(letters) ?? null) : undefined) ?? 'no test possible';
      return [`${i + 1}. ${t.name} (${letters})`, `${num(z(t.effect))}${u}`, interval ? `${num(interval[0])} to ${num(interval[1])}${u}` : '-', pValue(t.p), words];
    });
  const how = byLenth ? "95% interval: effect +- Lenth's margin of error; verdict by Lenth's method" : "95% interval from the t distribution on the residual df; verdict by p: clear < 0.01, likely < 0.05, possible < 0.10";
  return [
    `Effects, largest first (effect: the change from -1 to +1 with the other factors at 0; ${how})`,
    ...table(['effect of, by size', 'size', '95% interval', 'p', 'verdict'], rows).split('\n'),
  ];
}

/** The coefficients in coded units as the fitted equation, one term a line, in model order. */
export function fittedEquation(a: Analysis): string[] {
  const scale = responseScale(a);
  const out = [`Fitted equation in coded units (each letter from -1 to +1${a.blocks ? ', for an average block' : ''})`];
  out.push(`  ${a.response} = ${num(a.intercept.coef)}`);
  for (const t of a.terms) {
    const c = t.coef;
    const sign = c < 0 ? '-' : '+';
    out.push(`      ${sign} ${num(Math.abs(zeroIfRoundoff(c, scale)))} ${t.estimates ? `[${t.estimates}]` : t.letters}`);
  }
  return out;
}

export function analysisText(a: Analysis, options: AnalysisTextOptions = {}): string {
  const out: string[] = [];
  // Figures that are zero up to round-off beside the response's own scale print as 0.
  const scale = responseScale(a);
  const z = (x: number | null | undefined) => (x === null || x === undefined ? x : zeroIfRoundoff(x, scale));
  const how = a.method === 'yates' ? "Yates' algorithm (complete, balanced factorial)" : 'least squares (Householder QR)';
  out.push(`Analysis of ${a.response}: ${a.n} runs, fitted by ${how}, in coded units`);
  if (a.transform.lambda !== 1) {
    const minus = a.transform.lowerBound !== null ? ` minus its lower bound ${a.transform.lowerBound}` : '';
    out.push(`Fitted on the ${a.transform.token} scale of ${a.response}${minus}: (y'^L - 1)/L with L = ${a.transform.lambda} (log at 0); effects and tables are on that scale`);
  }
  if (a.transform.lowerBound !== null) out.push(boundNoteCommand(a.response, a.transform.lowerBound));
  if (a.boxCox) {
    const [lo, hi] = a.boxCox.ci;
    out.push(`Box-Cox power for ${a.response}${a.transform.lowerBound !== null && a.transform.lowerBound !== 0 ? ` minus its bound ${num(a.transform.lowerBound)}` : ''}: ${num(a.boxCox.lambda)} (95% interval ${lo === null ? 'below -3' : num(lo)} to ${hi === null ? 'above 3' : num(hi)}); suggested transform: ${a.boxCox.suggestion}`);
  }
  out.push('');
  out.push('Coding used (real setting -> coded value)');
  for (const c of a.coding) {
    const unit = c.unit ? ` ${c.unit}` : '';
    const log = c.scale === 'log' ? ', log scale' : '';
    const order = c.kind === 'categorical' && options.codingFromFileOrder ? `; "${c.low}" is -1 as the first label in the file: give --levels to choose` : '';
    out.push(`  ${c.letter}  ${c.name}: ${c.low}${unit} -> -1, ${c.high}${unit} -> +1${c.kind === 'numeric' ? `${log}, center 0` : ` (two named levels${order})`}`);
  }
  out.push('');
  out.push(...effectsTable(a, options.unit));
  out.push('');
  out.push(...fittedEquation(a));
  if (a.blocks) out.push(`  block offsets (sum to zero): ${a.blocks.map((b) => `block ${b.block} ${num(b.offset)}`).join(', ')}`);
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
    out.push(`Curvature from ${c.nCenter} center runs: factorial minus center, adjusted for the model terms = ${num(c.estimate)}, std error ${num(c.se)}, t ${num(c.t)}, p ${pValue(c.p)}`);
    const v = a.verdicts.find((x) => x.kind === 'curvature');
    if (v && v.kind === 'curvature') out.push(`  ${curvatureStatement(v, options.unit)}`);
  }
  // A second-order model's curvature is in its squares: their own tests, said in one note.
  const squares = a.verdicts.find((x) => x.kind === 'squares');
  if (squares) {
    out.push('');
    out.push(verdictText(squares));
  }
  // A significant lack of fit is among the notes below; the plain statement is given here.
  const lof = a.verdicts.find((x) => x.kind === 'lack-of-fit' && x.outcome === 'not-significant');
  if (lof) {
    out.push('');
    out.push(verdictText(lof));
  }
  // Lenth's method judges the effects of an unreplicated two-level factorial; with squares in the
  // model the squares' own tests and lack of fit speak instead (the JSON keeps \`lenth\`).
  if (a.lenth && !a.model.terms.some(isSquare)) {
    const l = a.lenth;
    const effects = l.effects.map((e) => ({ ...e, effect: zeroIfRoundoff(e.effect, scale) }));
    const [figures, marked] = lenthStatement({ ...l, pse: zeroIfRoundoff(l.pse, scale), me: zeroIfRoundoff(l.me, scale), sme: zeroIfRoundoff(l.sme, scale) }, effects);
    out.push('');
    out.push(figures);
    out.push(`  ${marked}`);
    // Lenth's effects come from the saturated fit over the factorial runs; where one differs
    // from the table's effect of the same term (beyond round-off), each is labelled (the one rule
    // of core/text/lenth-table-effects.ts, which the Effects screen applies too).
    const label = lenthTableText(lenthTableDifferences(a, num), num);
    if (label !== null) out.push(`  ${label}`);
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
