/**
 * The analysis of one response of a two-level experiment, as a composition of steps that each
 * take and return plain data: check the runs (validate-response.ts), fit (choose-fit.ts),
 * estimates and aliases (estimate-terms.ts), repeats and pure error (repeats.ts), the ANOVA
 * tables (anova-tables.ts), curvature from center points (curvature.ts), Lenth's method and the
 * half-normal points (lenth-step.ts), variance inflation factors (vif.ts), per-run diagnostics (diagnostics.ts), and last the verdicts
 * (analysis-verdicts.ts), from which the warnings are written (core/text/verdict-text.ts).
 * With a transform (response-transform.ts) every figure is on the transformed scale of y - L
 * (L the response's lower bound); `boxCox` is always about the untransformed y - L (box-cox.ts).
 * Conventions (stated in the README): the fit uses every run, center points included, with the
 * model's terms only, so the intercept is the fitted value at the center; effect = 2 x coef;
 * each ANOVA table names its type.
 * Sources: Montgomery, Design and Analysis of Experiments, 8th ed., chapters 6-8 and 10;
 * Lenth (1989), Technometrics 31, 469-473; formulas in the files each step calls.
 * The response's scale is taken out before the fit and put back after it (response-scale.ts; a
 * response within 2^+-64 of [1, 2) is analysed as it is, which gives the same bits): a
 * change of unit by a power of two scales every effect exactly, and t, F and p stay the same, from
 * 1e-300 to 1e300; a sum of squares beyond binary64 is null.
 * Cost: dominated by the fit (O(n p^2) by QR) and, when Lenth applies, the saturated fit.
 * Throws InputError for a non-numeric value, a factor with one setting, a constant response,
 * fewer runs than the intercept and main effects need, or a term naming a missing factor.
 * Example: analyze(the 2^2 yield data of Montgomery 8th ed., section 6.2) -> method 'yates',
 * effects A 8.333, B -5, AB 1.667; warnings [].
 */
import { isSquare, type Term } from '../model/term.ts';
import type { ResponseData } from '../study/response-data.ts';
import { verdictText } from '../text/verdict-text.ts';
import type { Analysis, FittedModel } from './analysis.ts';
import { analysisVerdicts } from './analysis-verdicts.ts';
import { anovaTables } from './anova-tables.ts';
import { chooseFit } from './choose-fit.ts';
import { codingRows } from './coding-rows.ts';
import { adjustedCurvature, cellKinds, curvature, runKinds } from './curvature.ts';
import { runDiagnostics } from './diagnostics.ts';
import { estimateTerms } from './estimate-terms.ts';
import { lenthStep, withLenthT } from './lenth-step.ts';
import { screeningStep } from './screening-step.ts';
import { findRepeats } from './repeats.ts';
import { boxCoxOn } from './box-cox.ts';
import { modelMatrix, type Column } from './columns.ts';
import { householderQr } from '../linalg/householder-qr.ts';
import { residualSsBasis, residualSsQr, residualSsYates } from './residual-ss.ts';
import { RANK_TOLERANCE } from '../tolerance.ts';
import { NO_TRANSFORM, transformResponses, type ResponseTransform } from './response-transform.ts';
import { validateResponseData } from './validate-response.ts';
import { analysisScaleExponent, pow2Scaler, scaleAnalysisBack, scaledByPow2, scaleExponent } from './response-scale.ts';
import { boxExtent, testedExtent } from '../predict/tested-extent.ts';
import { columnVifs, VIF_LIMIT, vifDrivers } from './vif.ts';
import { isWarning } from './verdicts.ts';

export interface AnalyzeOptions {
  /** Model terms (bit masks); default: main effects and two-factor interactions (main effects only for a Plackett-Burman plan). */
  readonly terms?: readonly Term[];
  /** Significance level for warnings and marks (common practice: 0.05). */
  readonly alpha?: number;
  /** Force the general QR path (tests compare it with the Yates path). */
  readonly forceQr?: boolean;
  /** Transform of the response minus its lower bound (response-transform.ts); default none. */
  readonly transform?: ResponseTransform;
}

const square = isSquare; // a local: module bindings are getters under some loaders, read per term

export function analyze(raw: ResponseData, options: AnalyzeOptions = {}): Analysis {
  validateResponseData(raw);
  const transform = options.transform ?? NO_TRANSFORM;
  const bound = raw.lowerBound ?? null;
  // The fit is made on (y'^lambda - 1) / lambda, y' = y - L (response-transform.ts); none leaves y as it is.
  const fitted = transform.lambda === 1 ? raw : { ...raw, y: transformResponses(raw.y, transform.lambda, bound ?? 0, raw.response) };
  if (fitted !== raw) validateResponseData(fitted);
  // The response's scale comes out before the fit and goes back after it (response-scale.ts), so
  // that sums of squares stay finite at any magnitude and every figure scales exactly.
  const e = analysisScaleExponent(fitted.y); // 0 when y needs no rescaling (response-scale.ts)
  const yp = bound === null ? raw.y : raw.y.map((v) => v - bound);
  const ep = scaleExponent(yp);
  const ypScaled = scaledByPow2(yp, -ep);
  const inner = analyzeOnScale(e === 0 ? fitted : { ...fitted, y: fitted.y.map(pow2Scaler(-e)) }, ypScaled, transform, bound, options);
  const out = scaleAnalysisBack(inner, e);
  return { ...out, warnings: [...fitted.messages, ...out.verdicts.filter(isWarning).map(verdictText)] };
}

/** The analysis of a response already scaled (largest magnitude in [1, 2)); `yp` the Box-Cox response, scaled alike; warnings left empty. */
function analyzeOnScale(data: ResponseData, yp: ArrayLike<number>, transform: ResponseTransform, bound: number | null, options: AnalyzeOptions): Analysis {
  const { factors, coded, y } = data;
  const alpha = options.alpha ?? 0.05;
  const screening = screeningStep(data);
  const { blockLevels, blocks, cells, fit, nominal: plan } = chooseFit(data, screening && !options.terms ? { ...options, terms: screening.terms } : options);
  // The nominal plan decides repeats, center runs and Lenth's set (nominal-settings.ts).
  const nominal = plan.exact ? null : plan.nominal;
  const vifs = columnVifs(fit, coded, blocks);
  const est = estimateTerms(fit, factors, blockLevels, alpha, vifs);
  const keptColumns: Column[] = [];
  for (let j = 0; j < fit.kept.length; j++) keptColumns.push(fit.columns[fit.kept[j]]);
  const vifLimit = VIF_LIMIT; // a local: module bindings are getters under some loaders, read here once per term
  const collinear: { letters: string; vif: number; runs: string[] }[] = [];
  for (const t of est.terms) {
    if (t.vif != null && t.vif > vifLimit) collinear.push({ letters: t.estimates ?? t.letters, vif: t.vif, runs: vifDrivers(keptColumns, coded, blocks, y, keptColumns.findIndex((c) => c.kind === 'term' && c.term === t.term), data.labels) });
  }
  const repeats = findRepeats({ coded, y, points: data.points, blocks, cells, k: factors.length, nominal });
  const pe = repeats.pure;
  const tables = anovaTables(fit, y, est.labels, est.terms.map((t) => t.p), pe);
  const kinds = cells && !nominal ? cellKinds(factors, cells) : runKinds(factors, nominal ?? coded);
  // On Yates' path every term column is 0 at the center runs and balanced over the factorial
  // ones, so the adjusted curvature is exactly the mean difference (curvature.ts): no side fit.
  const curv = cells ? curvature(kinds, y, pe) : adjustedCurvature(keptColumns, coded, blocks, kinds, y, pe);
  // The saturated fits of Lenth's step resume from the model's own factorisations where its columns lead theirs.
  const prefix = { nominal: fit.planQr ?? fit.qr, actual: fit.qr };
  const lenthOut = lenthStep({ factors, coded, y, points: data.points, blocks, kinds, groups: repeats.groups, terms: est.terms, nominal, prefix, ...(screening ? { contrasts: screening.contrasts } : {}) });
  const terms = fit.dfResidual === 0 && lenthOut.lenth ? withLenthT(est.terms, lenthOut.lenth.pse) : est.terms;
  const diag = runDiagnostics(fit, y, data.labels, kinds, est.sigma, tables.ssTotal);
  const verdicts = analysisVerdicts({
    alpha,
    nearReplicates: repeats.nearReplicates,
    offLevels: { runs: plan.away, planned: Boolean(data.planned) },
    orthogonal: fit.orthogonal,
    collinear: { limit: VIF_LIMIT, terms: collinear },
    curvature: curv,
    squares: est.terms.filter((t) => square(t.term)).map((t) => t.letters),
    pureErrorDf: pe.df,
    lackOfFitP: tables.lackOfFitP,
    lenth: lenthOut.lenth,
    dfResidual: fit.dfResidual,
    aliased: est.aliased,
    aliasedWithInterceptOrBlocks: est.aliasedWithInterceptOrBlocks,
    terms,
    partialAliasing: screening?.partialAliasing ?? null,
  });

  // Box-Cox refits the same columns to each power of y': one factorisation serves them all.
  const refit = cells ? residualSsYates(cells, factors.length, termColumns(fit.columns)) : fit.basis ? residualSsBasis(fit.basis, y.length, fit.kept.length) : residualSsQr(fit.qr ?? householderQr(modelMatrix(keptColumns, coded, blocks), y.length, keptColumns.length, RANK_TOLERANCE));
  const bc = boxCoxOn(refit, yp);
  const model: FittedModel = {
    factors,
    response: data.response,
    terms: terms.map((t) => t.term),
    estimates: terms.map((t) => t.estimates ?? null),
    coef: fit.coef,
    blockColumns: tables.dfBlocks,
    covUnscaled: fit.covUnscaled,
    sigma: est.sigma,
    dfResidual: fit.dfResidual,
    pValues: termPValues(terms),
    curvatureP: curv?.p ?? null,
    extent: cells ? boxExtent(factors.length) : testedExtent(factors, coded),
    transform: { token: transform.token, lambda: transform.lambda, lowerBound: bound, suggestion: bc?.suggestion ?? null },
  };
  return {
    response: data.response,
    n: y.length,
    method: fit.method,
    coding: codingRows(factors),
    intercept: est.intercept,
    terms,
    blocks: est.blockOffsets,
    df: { model: tables.dfModel, blocks: tables.dfBlocks, residual: fit.dfResidual, pureError: pe.df > 0 ? pe.df : null, lackOfFit: tables.dfLackOfFit },
    sigma: est.sigma,
    r2: diag.r2,
    r2adj: diag.r2adj,
    r2pred: diag.r2pred,
    anova: tables.anova,
    anovaAdjusted: tables.anovaAdjusted,
    lenth: lenthOut.lenth ? { ...lenthOut.lenth, effects: lenthOut.halfNormal } : null,
    curvature: curv ? { estimate: curv.estimate, se: curv.se, t: curv.t, p: curv.p, nFactorial: curv.nFactorial, nCenter: curv.nCenter } : null,
    aliased: est.aliased,
    runs: diag.runs,
    halfNormal: lenthOut.halfNormal,
    verdicts,
    warnings: [],
    transform: model.transform!,
    boxCox: bc,
    model,
  };
}

/** Each term's p-value by term, filled in one pass (no array of pairs). */
function termPValues(terms: readonly { readonly term: Term; readonly p?: number | null }[]): Map<Term, number | null> {
  const out = new Map<Term, number | null>();
  for (const t of terms) out.set(t.term, t.p ?? null);
  return out;
}

/** The term masks of the model's columns, in order (a plain loop: flatMap's arrays cost more than the rest of the step). */
function termColumns(columns: readonly Column[]): Int32Array {
  let count = 0;
  for (const c of columns) if (c.kind === 'term') count++;
  const out = new Int32Array(count);
  let j = 0;
  for (const c of columns) if (c.kind === 'term') out[j++] = c.term;
  return out;
}
