/**
 * The analysis of one response of a two-level experiment: least squares in coded units on the
 * actual settings, effects, standard errors, ANOVA with pure error and lack of fit, curvature
 * from center points, and Lenth's method when the factorial runs are not replicated.
 * Conventions (stated in the README): the fit uses every run, center points included, with the
 * model's terms only, so the intercept is the fitted value at the center; effect = 2 x coef;
 * each ANOVA table names its type.
 * Sources: Montgomery, Design and Analysis of Experiments, 8th ed., chapters 6-8 and 10;
 * Lenth (1989), Technometrics 31, 469-473; formulas in the files each step calls.
 * Throws InputError for a non-numeric value, a factor with one setting, a constant response, or
 * fewer runs than the intercept and main effects need.
 */
import { InputError } from '../errors.ts';
import { fUpperP } from '../dist/f-dist.ts';
import { tQuantile, tTwoSidedP } from '../dist/student-t.ts';
import { toReal } from '../factor/coding.ts';
import { defaultTerms } from '../model/formula.ts';
import { checkTerms, compareTerms, isProduct, isSquare, termLetters, termName, type Term } from '../model/term.ts';
import type { ResponseData } from '../study/response-data.ts';
import { CONSTANT_TOLERANCE } from '../tolerance.ts';
import { inverseQuadraticForm } from '../linalg/small-solve.ts';
import type {
  AliasedTerm,
  Analysis,
  AnovaRow,
  AnovaTable,
  CodingRow,
  EffectPoint,
  Estimate,
  FittedModel,
  RunDiagnostics,
  TermEstimate,
} from './analysis.ts';
import { blockLevels, modelColumns, modelMatrix, type Column } from './columns.ts';
import { combinationLabel } from './combination-label.ts';
import { curvature as curvatureTest, runKinds } from './curvature.ts';
import { fitQr } from './fit-qr.ts';
import { fitYates, yatesCells } from './fit-yates.ts';
import { halfNormalQuantiles } from './half-normal.ts';
import { lenth, LENTH_MIN_CONTRASTS } from './lenth.ts';
import type { LinearFit } from './linear-fit.ts';
import { labelGroups, pureErrorOfGroups, settingGroups } from './pure-error.ts';
import { saturatedEffects } from './saturated-effects.ts';
import { tIntervals } from './t-intervals.ts';

export interface AnalyzeOptions {
  /** Model terms (bit masks); default: main effects and two-factor interactions. */
  readonly terms?: readonly Term[];
  /** Significance level for warnings and marks (common practice: 0.05). */
  readonly alpha?: number;
  /** Force the general QR path (tests compare it with the Yates path). */
  readonly forceQr?: boolean;
}

/** Leverage this close to 1 means the run alone determines its fitted value (common practice). */
const LEVERAGE_ONE = 1 - 1e-9;

function fmt(x: number): string {
  return Number.isInteger(x) ? String(x) : x.toPrecision(4);
}

function validate(data: ResponseData): void {
  const { factors, coded, y, response } = data;
  const n = y.length;
  if (coded.length !== n) throw new InputError(`${response}: ${n} responses but ${coded.length} rows of settings`);
  if (n < factors.length + 1) {
    throw new InputError(
      `${response}: ${n} runs cannot estimate even the intercept and ${factors.length} main effects; at least ${factors.length + 1} runs are needed`,
    );
  }
  const label = (i: number) => data.labels[i] ?? String(i + 1);
  for (let i = 0; i < n; i++) {
    if (!Number.isFinite(y[i])) throw new InputError(`${response}, run ${label(i)}: needs a number, got ${y[i]}`);
    const row = coded[i];
    if (row.length !== factors.length) throw new InputError(`Run ${label(i)}: ${row.length} settings for ${factors.length} factors`);
    for (let f = 0; f < row.length; f++) {
      if (!Number.isFinite(row[f])) throw new InputError(`Run ${label(i)}: ${factors[f].name} needs a number, got ${row[f]}`);
    }
  }
  for (let f = 0; f < factors.length; f++) {
    const first = coded[0][f];
    if (coded.every((row) => row[f] === first)) {
      const real = factors[f].kind === 'categorical' ? toReal(factors[f], first) : fmt(toReal(factors[f], first) as number);
      throw new InputError(`${factors[f].name} has the same setting (${real}) in every run, so its effect cannot be estimated`);
    }
  }
  let lo = Infinity;
  let hi = -Infinity;
  for (const v of y) (lo = Math.min(lo, v)), (hi = Math.max(hi, v));
  if (hi - lo <= CONSTANT_TOLERANCE * Math.max(1, Math.abs(hi))) {
    throw new InputError(`${response} is the same (${fmt(lo)}) in every run: there is no variation to analyse`);
  }
}

function codingRows(data: ResponseData): CodingRow[] {
  return data.factors.map((f) =>
    f.kind === 'numeric'
      ? { name: f.name, letter: f.letter, kind: f.kind, low: f.low, high: f.high, scale: f.scale ?? 'linear', ...(f.unit ? { unit: f.unit } : {}) }
      : { name: f.name, letter: f.letter, kind: f.kind, low: f.levels[0], high: f.levels[1], scale: 'linear' },
  );
}

function columnLabel(c: Column, data: ResponseData): { name: string; letters: string } {
  if (c.kind === 'intercept') return { name: 'Intercept', letters: 'I' };
  if (c.kind === 'block') return { name: `Block ${c.block}`, letters: `Block ${c.block}` };
  return { name: termName(c.term, data.factors), letters: termLetters(c.term, data.factors) };
}

export function analyze(data: ResponseData, options: AnalyzeOptions = {}): Analysis {
  validate(data);
  const { factors, coded, y } = data;
  const n = y.length;
  const k = factors.length;
  const alpha = options.alpha ?? 0.05;
  const terms = [...new Set(options.terms ?? defaultTerms(k))].sort(compareTerms);
  checkTerms(terms, factors);
  const levels = blockLevels(data.blocks);
  const blocks = levels.length > 1 ? data.blocks : null;
  const usedLevels = blocks ? levels : [];
  const columns = modelColumns(usedLevels, terms);
  const warnings: string[] = [...data.notes];

  // Yates' algorithm holds for products of two-level columns only: any square takes the QR path.
  const cells = !blocks && !options.forceQr && !terms.some(isSquare) ? yatesCells(coded, k) : null;
  const fit: LinearFit = cells ? fitYates(columns, terms, cells, k, y) : fitQr(columns, modelMatrix(columns, coded, blocks), y);
  const m = fit.kept.length;
  const dfRes = fit.dfResidual;
  const sigma = dfRes > 0 ? Math.sqrt(fit.rss / dfRes) : null;
  const tq = dfRes > 0 ? tQuantile(1 - alpha / 2, dfRes) : null;

  const estimate = (j: number): Estimate => {
    const coef = fit.coef[j];
    if (sigma === null || tq === null) return { coef, se: null, t: null, p: null, ci: null };
    const { se, ciLo, ciHi } = tIntervals(coef, fit.covUnscaled[j * m + j], sigma, tq);
    if (se === 0) return { coef, se, t: null, p: null, ci: [ciLo!, ciHi!] };
    const t = coef / se!;
    return { coef, se, t, p: tTwoSidedP(t, dfRes), ci: [ciLo!, ciHi!] };
  };

  // Names and letters of every column, computed once.
  const labels = fit.columns.map((c) => columnLabel(c, data));

  // Which estimable column carries which inseparable terms.
  const carried = new Map<number, { letters: string; weight: number }[]>();
  const aliased: AliasedTerm[] = [];
  for (const a of fit.aliased) {
    const label = labels[a.column];
    aliased.push({
      ...label,
      combination: a.combination.map((w) => ({ ...labels[w.column], weight: w.weight })),
    });
    for (const w of a.combination) {
      const list = carried.get(w.column) ?? [];
      list.push({ letters: label.letters, weight: w.weight });
      carried.set(w.column, list);
    }
  }

  const intercept = estimate(0);
  const termEstimates: TermEstimate[] = [];
  const blockEffects: { block: number; effect: number }[] = [];
  let blockSum = 0;
  for (let j = 0; j < m; j++) {
    const c = fit.columns[fit.kept[j]];
    if (c.kind === 'block') {
      blockEffects.push({ block: c.block, effect: fit.coef[j] });
      blockSum += fit.coef[j];
    }
    if (c.kind !== 'term') continue;
    const label = labels[fit.kept[j]];
    const extra = carried.get(fit.kept[j]);
    const est = estimate(j);
    // Built field by field: object spreads are slow on this hot path (see test/bench).
    const base = { term: c.term, name: label.name, letters: label.letters, coef: est.coef, se: est.se, t: est.t, p: est.p, ci: est.ci, effect: 2 * est.coef };
    termEstimates.push(extra ? { ...base, estimates: combinationLabel([{ letters: label.letters, weight: 1 }, ...extra]) } : base);
  }
  if (blocks) blockEffects.push({ block: levels[levels.length - 1], effect: -blockSum });

  // Sums of squares.
  let mean = 0;
  for (const v of y) mean += v;
  mean /= n;
  let ssTot = 0;
  for (const v of y) ssTot += (v - mean) ** 2;
  const msRes = dfRes > 0 ? fit.rss / dfRes : null;
  const fRow = (source: string, df: number, ss: number): AnovaRow => {
    const ms = df > 0 ? ss / df : null;
    const f = ms !== null && msRes !== null && msRes > 0 ? ms / msRes : null;
    return { source, df, ss, ms, f, p: f !== null ? fUpperP(f, df, dfRes) : null };
  };
  let ssBlocksSeq = 0;
  let dfBlocks = 0;
  let ssModel = 0;
  let dfModel = 0;
  const termRowsSeq: AnovaRow[] = [];
  const termRowsAdj: AnovaRow[] = [];
  const blockIdx: number[] = [];
  for (let j = 1; j < m; j++) {
    const c = fit.columns[fit.kept[j]];
    if (c.kind === 'block') {
      ssBlocksSeq += fit.seqSS[j];
      dfBlocks++;
      blockIdx.push(j);
    } else if (c.kind === 'term') {
      ssModel += fit.seqSS[j];
      dfModel++;
      const name = labels[fit.kept[j]].name;
      if (fit.orthogonal && msRes !== null && msRes > 0) {
        // Orthogonal columns: the one-df F is the square of the term's t, so its p is the t-test's.
        termRowsSeq.push({ source: name, df: 1, ss: fit.seqSS[j], ms: fit.seqSS[j], f: fit.seqSS[j] / msRes, p: termEstimates[dfModel - 1].p });
      } else termRowsSeq.push(fRow(name, 1, fit.seqSS[j]));
      termRowsAdj.push(fRow(name, 1, (fit.coef[j] * fit.coef[j]) / fit.covUnscaled[j * m + j]));
    }
  }
  // Repeats: runs of one planned point when the plan is known, else runs at identical settings
  // (on the Yates path, the runs sharing a cell, or all center runs).
  const groups = data.points
    ? labelGroups(data.points, blocks)
    : cells
      ? Int32Array.from(cells, (c) => (c < 0 ? 1 << k : c))
      : settingGroups(coded, blocks);
  const pe = pureErrorOfGroups(groups, y);
  if (data.points && pe.df > 0) {
    // Repeats of a planned point run at slightly different actual settings: near replicates.
    const exact = settingGroups(coded, blocks);
    const near = new Set<number>();
    const firstExact = new Map<number, number>();
    for (let i = 0; i < n; i++) {
      const f = firstExact.get(groups[i]);
      if (f === undefined) firstExact.set(groups[i], exact[i]);
      else if (f !== exact[i]) near.add(groups[i]);
    }
    if (near.size > 0) {
      warnings.push(
        `Pure error comes from repeats of the same planned point; in ${near.size} of them the actual settings differ slightly, so pure error and lack of fit are approximate (each group is treated as runs at one point).`,
      );
    }
  }
  const dfLof = dfRes - pe.df;
  const tail: AnovaRow[] = [{ source: 'Residual', df: dfRes, ss: fit.rss, ms: msRes, f: null, p: null }];
  let lofP: number | null = null;
  if (pe.df > 0 && dfLof > 0) {
    const ssLof = Math.max(0, fit.rss - pe.ss);
    const msPe = pe.ss / pe.df;
    const f = msPe > 0 ? ssLof / dfLof / msPe : null;
    lofP = f !== null ? fUpperP(f, dfLof, pe.df) : null;
    tail.push({ source: 'Lack of fit', df: dfLof, ss: ssLof, ms: ssLof / dfLof, f, p: lofP });
  }
  if (pe.df > 0) tail.push({ source: 'Pure error', df: pe.df, ss: pe.ss, ms: pe.ss / pe.df, f: null, p: null });
  tail.push({ source: 'Total', df: n - 1, ss: ssTot, ms: null, f: null, p: null });
  const head = (blocksSS: number): AnovaRow[] => [
    ...(dfBlocks > 0 ? [fRow('Blocks', dfBlocks, blocksSS)] : []),
    fRow('Model', dfModel, ssModel),
  ];
  const anova: AnovaTable = { type: 'sequential', rows: [...head(ssBlocksSeq), ...termRowsSeq, ...tail] };
  let anovaAdjusted: AnovaTable | null = null;
  if (!fit.orthogonal) {
    let ssBlocksAdj = ssBlocksSeq;
    if (blockIdx.length > 0) {
      const sub = new Float64Array(blockIdx.length * blockIdx.length);
      const b = blockIdx.map((j) => fit.coef[j]);
      blockIdx.forEach((ja, a) => blockIdx.forEach((jb, bb) => (sub[bb * blockIdx.length + a] = fit.covUnscaled[jb * m + ja])));
      ssBlocksAdj = inverseQuadraticForm(sub, blockIdx.length, b);
    }
    anovaAdjusted = { type: 'adjusted', rows: [...head(ssBlocksAdj), ...termRowsAdj, ...tail] };
    warnings.push(
      'The runs are not orthogonal (missing runs, off-target settings or unequal blocks), so sequential sums of squares depend on the order of terms; the adjusted table gives each term after all others.',
    );
  }

  // Curvature from center points.
  const kinds = runKinds(factors, coded);
  const curv = curvatureTest(kinds, y, pe);
  if (curv && curv.p !== null && curv.p < alpha && !terms.some(isSquare)) {
    warnings.push(
      `Curvature is significant (p = ${fmt(curv.p)}): the center runs differ from the factorial average, so this first-order model is biased near the center. Add axial runs for a second-order design before relying on predictions inside the range.`,
    );
  }
  if (curv && curv.p === null) warnings.push('The curvature test needs repeated runs (pure error); none were found.');
  if (lofP !== null && lofP < alpha) warnings.push(`Lack of fit is significant (p = ${fmt(lofP)}): the model misses something the repeated runs show.`);

  // Lenth's method when the factorial runs are not replicated.
  let lenthOut: Analysis['lenth'] = null;
  const factorialRows: number[] = [];
  kinds.forEach((kd, i) => kd === 'factorial' && factorialRows.push(i));
  // Unreplicated: no two factorial runs share their planned point or settings (blocks aside).
  const unblockedGroups = !blocks ? groups : data.points ? labelGroups(data.points, null) : settingGroups(coded, null);
  const distinctPoints = new Set(factorialRows.map((i) => unblockedGroups[i])).size;
  // The half-normal chart shows two-level contrasts only: products of distinct factors, never a square.
  let effectsForChart: { name: string; letters: string; effect: number }[] = termEstimates.filter((t) => isProduct(t.term)).map((t) => ({
    name: t.name,
    letters: t.estimates ?? t.letters,
    effect: t.effect,
  }));
  let lenthResult: ReturnType<typeof lenth> | null = null;
  if (factorialRows.length >= 2 && distinctPoints === factorialRows.length) {
    const sat = saturatedEffects(
      k,
      factorialRows.map((i) => coded[i]),
      factorialRows.map((i) => y[i]),
      blocks ? factorialRows.map((i) => blocks[i]) : null,
    );
    if (sat.length > 0) {
      lenthResult = lenth(sat.map((s) => s.effect));
      effectsForChart = sat.map((s) => ({
        name: termName(s.term, factors),
        letters: combinationLabel([{ letters: termLetters(s.term, factors), weight: 1 }, ...s.aliases.map((a) => ({ letters: termLetters(a.term, factors), weight: a.weight }))]),
        effect: s.effect,
      }));
      if (lenthResult.m < LENTH_MIN_CONTRASTS) {
        warnings.push(`Lenth's method has only ${lenthResult.m} effects to work from (7 or more are advised), so it is weak here.`);
      }
    }
  }
  const mark = (effect: number): 'likely' | 'active' | undefined =>
    lenthResult === null ? undefined : Math.abs(effect) > lenthResult.sme ? 'active' : Math.abs(effect) > lenthResult.me ? 'likely' : undefined;
  const sorted = [...effectsForChart].sort((a, b) => Math.abs(a.effect) - Math.abs(b.effect));
  const q = halfNormalQuantiles(sorted.length);
  const halfNormal: EffectPoint[] = sorted.map((e, i) => {
    const mk = mark(e.effect);
    return mk ? { name: e.name, letters: e.letters, effect: e.effect, quantile: q[i], mark: mk } : { name: e.name, letters: e.letters, effect: e.effect, quantile: q[i] };
  });
  if (lenthResult) lenthOut = { ...lenthResult, effects: halfNormal };
  if (dfRes === 0) {
    warnings.push('No runs are left over to estimate the noise, so standard errors, t and p are not available; use Lenth\'s method or fewer terms.');
    if (lenthResult && lenthResult.pse > 0) {
      for (let i = 0; i < termEstimates.length; i++) termEstimates[i] = { ...termEstimates[i], lenthT: termEstimates[i].effect / lenthResult.pse };
    }
  }
  if (aliased.length > 0) {
    warnings.push(
      `${aliased.length} model term${aliased.length > 1 ? 's' : ''} cannot be separated from others with these runs: ` +
        termEstimates.filter((t) => t.estimates).map((t) => `the estimate shown for ${t.letters} is of ${t.estimates}`).join('; ') +
        (aliased.some((a) => a.combination.some((c) => c.letters === 'I' || c.letters.startsWith('Block'))) ? '; some terms are confounded with the intercept or blocks' : ''),
    );
  }

  // Per-run diagnostics and fit statistics.
  let press = 0;
  let pressOk = true;
  const runs: RunDiagnostics[] = [];
  for (let i = 0; i < n; i++) {
    const h = fit.leverage[i];
    const e = fit.residuals[i];
    if (h >= LEVERAGE_ONE) pressOk = false;
    else press += (e / (1 - h)) ** 2;
    const r = sigma !== null && sigma > 0 && h < LEVERAGE_ONE ? e / (sigma * Math.sqrt(1 - h)) : null;
    runs.push({
      label: data.labels[i] ?? String(i + 1),
      y: y[i],
      fitted: fit.fitted[i],
      residual: e,
      leverage: h,
      studentized: r,
      // Belsley, Kuh and Welsch, Regression Diagnostics (1980), Eq. 2.26; Montgomery, Peck and Vining,
      // Introduction to Linear Regression Analysis, 5th ed., section 4.2.3 (R-student).
      deleted: r !== null && dfRes > 1 && dfRes - r * r > 0 ? r * Math.sqrt((dfRes - 1) / (dfRes - r * r)) : null,
      kind: kinds[i],
    });
  }
  const r2 = 1 - fit.rss / ssTot;
  const r2adj = dfRes > 0 ? 1 - fit.rss / dfRes / (ssTot / (n - 1)) : null;
  const r2pred = pressOk ? 1 - press / ssTot : null;

  const pValues = new Map<Term, number | null>(termEstimates.map((t) => [t.term, t.p ?? null]));
  const model: FittedModel = {
    factors,
    response: data.response,
    terms: termEstimates.map((t) => t.term),
    estimates: termEstimates.map((t) => t.estimates ?? null),
    coef: fit.coef,
    blockColumns: dfBlocks,
    covUnscaled: fit.covUnscaled,
    sigma,
    dfResidual: dfRes,
    pValues,
    curvatureP: curv?.p ?? null,
  };

  return {
    response: data.response,
    n,
    method: fit.method,
    coding: codingRows(data),
    intercept,
    terms: termEstimates,
    blocks: blocks ? blockEffects : null,
    df: { model: dfModel, blocks: dfBlocks, residual: dfRes, pureError: pe.df > 0 ? pe.df : null, lackOfFit: pe.df > 0 ? dfLof : null },
    sigma,
    r2,
    r2adj,
    r2pred,
    anova,
    anovaAdjusted,
    lenth: lenthOut,
    curvature: curv ? { estimate: curv.estimate, se: curv.se, t: curv.t, p: curv.p, nFactorial: curv.nFactorial, nCenter: curv.nCenter } : null,
    aliased,
    runs,
    halfNormal,
    warnings,
    model,
  };
}
