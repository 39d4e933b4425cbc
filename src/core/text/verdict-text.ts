/**
 * Every sentence the analysis says about its runs, in one place: the warnings made from the
 * analysis's verdicts, the curvature, lack-of-fit and Lenth statements of the screens and the
 * text report, and the curvature note that predictions and the path of steepest ascent carry.
 * The core, the command line and the screens import these, so one finding has one wording.
 * Sources of the tests behind the words: Montgomery, Design and Analysis of Experiments, 8th ed.,
 * sections 6.8 (curvature) and 10.7 (lack of fit); Lenth (1989), Technometrics 31, 469-473.
 */
import type { LenthResult } from '../fit/lenth.ts';
import type { CurvatureVerdict, Verdict } from '../fit/verdicts.ts';
import { shortNumber } from './number-text.ts';
import { correlationText, PARTIAL_ALIASING_NOTE } from './screening-text.ts';
import { pPhrase } from './p-value.ts';

/** The finding of a significant curvature test, shared by the analysis, predictions and the path. */
function curvedFinding(p: number | null): string {
  return `Curvature is significant (${pPhrase(p)}): the center runs differ from the factorial average, so this first-order model is biased near the center.`;
}

/** The same finding when the model holds squares, which allow for the curvature. */
function curvatureModeled(p: number | null, squares: readonly string[]): string {
  return `Curvature is significant (${pPhrase(p)}): the center runs differ from the factorial average; the model's square terms (${squares.join(', ')}) allow for it.`;
}

/**
 * What the curvature test found, in one sentence (the screens' fit list, the text report).
 * Cost O(1). Example: for p = 0.8137 over 5 center runs and estimate -0.035 ->
 * "No clear curvature (p = 0.8137): the 5 center runs agree with the factorial average (difference -0.035)";
 * with unit '%', "(difference -0.035 %)".
 */
export function curvatureStatement(v: CurvatureVerdict, unit?: string): string {
  if (v.outcome === 'curved') return (v.squares ?? []).length > 0 ? curvatureModeled(v.p, v.squares!) : curvedFinding(v.p);
  if (v.outcome === 'flat') {
    const size = `${shortNumber(v.estimate)}${unit ? ` ${unit}` : ''}`;
    return `No clear curvature (${pPhrase(v.p)}): the ${v.nCenter} center run${v.nCenter === 1 ? '' : 's'} agree${v.nCenter === 1 ? 's' : ''} with the factorial average (difference ${size}).`;
  }
  return v.reason === 'no-spread'
    ? 'The curvature test cannot be made: the repeated runs agree exactly, so pure error is zero.'
    : 'The curvature test needs repeated runs (pure error); none were found.';
}

/**
 * The note a prediction or a path carries when the model's curvature test was significant.
 * Cost O(1). Example: curvatureNote(0.001, 'prediction') starts "Curvature is significant (p = 0.0010)".
 */
export function curvatureNote(p: number, use: 'prediction' | 'path', squares: readonly string[] = []): string {
  if (squares.length > 0) return curvatureModeled(p, squares);
  return (
    curvedFinding(p) +
    (use === 'prediction'
      ? ' A prediction between the corners carries that bias as well.'
      : ' The region may already be near an optimum, so the first-order path points less reliably; a second-order design may serve better.')
  );
}

/**
 * One verdict as a sentence: the text of the analysis's `warnings` and of its plain statements.
 * Cost O(length of the verdict's lists). Example: verdictText({ kind: 'lenth-weak', m: 3, advised: 7 }) ->
 * "Lenth's method has only 3 effects to work from (7 or more are advised), so it is weak here."
 */
export function verdictText(v: Verdict): string {
  switch (v.kind) {
    case 'off-levels':
      return v.planned
        ? `${v.runs} run${v.runs === 1 ? ' has a setting' : 's have settings'} more than 0.1 coded from the planned level: ${v.runs === 1 ? 'it counts' : 'each counts'} as a point of its own, not as a repeat of the plan.`
        : `${v.runs} run${v.runs === 1 ? ' has a setting' : 's have settings'} more than 0.1 coded from every level (-1, 0, +1 in the coding shown): ${v.runs === 1 ? 'it counts' : 'each counts'} as a point of its own; check the coding.`;
    case 'collinear':
      return v.terms
        .map((t) => {
          const runs = t.runs.length === 0 ? '' : ` Run${t.runs.length === 1 ? '' : 's'} ${listWords(t.runs)} do${t.runs.length === 1 ? 'es' : ''} most to cause it: check ${t.runs.length === 1 ? 'its' : 'their'} logged settings.`;
          return `The estimate for ${t.letters} is unsteady: its column of settings nearly repeats a mix of the other terms' columns (variance inflation factor ${shortNumber(t.vif)}, above ${v.limit}), so small changes in the readings move it a lot.${runs}`;
        })
        .join(' ');
    case 'near-replicates':
      return `Pure error comes from repeats of the same planned point; in ${v.groups} of them the actual settings differ slightly, so pure error and lack of fit are approximate (each group is treated as runs at one point), and the residual sum of squares may then fall below pure error.`;
    case 'not-orthogonal':
      return 'The runs are not orthogonal (missing runs, off-target settings or unequal blocks), so sequential sums of squares depend on the order of terms; the adjusted table gives each term after all others.';
    case 'curvature':
      if (v.outcome === 'curved' && (v.squares ?? []).length > 0) return curvatureModeled(v.p, v.squares!);
      return v.outcome === 'curved'
        ? `${curvedFinding(v.p)} Add axial runs for a second-order design before relying on predictions inside the range.`
        : curvatureStatement(v);
    case 'lack-of-fit':
      return v.outcome === 'significant'
        ? `Lack of fit is significant (${pPhrase(v.p)}): the model misses something the repeated runs show.`
        : `No clear lack of fit (${pPhrase(v.p)}): the model agrees with what the repeated runs show.`;
    case 'lenth-weak':
      return `Lenth's method has only ${v.m} effects to work from (${v.advised} or more are advised), so it is weak here.`;
    case 'no-residual-df':
      return v.secondOrder
        ? 'No runs are left over to estimate the noise, so standard errors, t and p are not available; fit fewer terms or add runs.'
        : "No runs are left over to estimate the noise, so standard errors, t and p are not available; use Lenth's method or fewer terms.";
    case 'squares':
      return `${squaresFinding(v)} In a second-order design the squares' columns overlap with the intercept and with each other, so sequential sums of squares depend on the order of terms; the adjusted table, like each term's t test, takes each term after all the others.`;
    case 'partial-aliasing':
      return `This is a ${v.runs}-run Plackett-Burman screening design, so the main effects are estimated clear of each other but partly mixed with two-factor interactions (correlations up to ${correlationText(v.largestCorrelation)}). ${PARTIAL_ALIASING_NOTE}`;
    case 'aliased': {
      const parts = v.carried.map((c) => `the estimate shown for ${c.letters} is of ${c.estimates}`);
      if (v.withInterceptOrBlocks) parts.push('some terms are confounded with the intercept or blocks');
      return `${v.count} model term${v.count > 1 ? 's' : ''} cannot be separated from others with these runs: ${parts.join('; ')}`;
    }
  }
}

/**
 * The squares' own tests, as the second-order model's curvature finding (Montgomery 8th ed.,
 * section 11.3: each coefficient's t test in the fitted second-order model).
 * Example: for Time^2 p 0.0001 and Temperature^2 p 0.0008 -> "The model's squares test the bend
 * along each factor: Time^2 (A^2) p < 0.001, Temperature^2 (B^2) p = 0.0008; p below 0.05 shows a bend."
 */
export function squaresFinding(v: Extract<Verdict, { kind: 'squares' }>): string {
  const each = v.terms.map((t) => `${t.name} (${t.letters}) ${t.p === null ? 'without a test' : pPhrase(t.p)}`);
  return `The model's squares test the bend along each factor: ${listWords(each)}; p below ${v.alpha} shows a bend.`;
}

/** "2", "2 and 5", "2, 5 and 7". */
function listWords(items: readonly string[]): string {
  return items.length <= 1 ? items.join('') : `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`;
}

/** A Lenth effect as the statement needs it. */
export interface MarkedEffect {
  readonly letters: string;
  readonly effect: number;
  readonly mark?: 'likely' | 'active';
}

/**
 * What Lenth's method gives, as two lines: its figures, then the effects beyond its margins
 * (largest first) or that none is. Numbers in `shortNumber` form.
 * Cost O(m). Example: for m = 15, PSE 2.625 -> first line
 * "Lenth's method over 15 effects (d = 5 df): pseudo standard error 2.625, margin of error 6.748, simultaneous margin 13.7".
 */
export function lenthStatement(l: LenthResult, effects: readonly MarkedEffect[]): [string, string] {
  const head = `Lenth's method over ${l.m} effects (d = ${shortNumber(l.df)} df): pseudo standard error ${shortNumber(l.pse)}, margin of error ${shortNumber(l.me)}, simultaneous margin ${shortNumber(l.sme)}`;
  const marked = [...effects].sort((a, b) => Math.abs(b.effect) - Math.abs(a.effect)).filter((e) => e.mark);
  const tail =
    marked.length > 0
      ? `beyond the margins: ${marked.map((e) => `${e.letters} ${shortNumber(e.effect)} (${e.mark === 'active' ? 'beyond the simultaneous margin' : 'beyond the margin of error'})`).join('; ')}`
      : 'no effect is beyond the margin of error';
  return [head, tail];
}
