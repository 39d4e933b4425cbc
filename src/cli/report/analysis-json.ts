/** The analyze command's JSON: the keys the README documents, with nulls where a value is unavailable. */
import type { Analysis } from '../../core/fit/analysis.ts';

export function analysisJson(a: Analysis): Record<string, unknown> {
  const residualDfZero = a.df.residual === 0;
  return {
    response: a.response,
    n: a.n,
    method: a.method,
    coding: Object.fromEntries(a.coding.map((c) => [c.name, { letter: c.letter, kind: c.kind, low: c.low, high: c.high, scale: c.scale, ...(c.unit ? { unit: c.unit } : {}) }])),
    intercept: { coef: a.intercept.coef, se: a.intercept.se, t: a.intercept.t, p: a.intercept.p, vif: null },
    terms: a.terms.map((t) => ({
      name: t.name,
      letters: t.letters,
      coef: t.coef,
      effect: t.effect,
      se: t.se,
      t: t.t,
      p: t.p,
      ci: t.ci,
      vif: t.vif ?? null,
      ...(residualDfZero ? { lenthT: t.lenthT ?? null } : {}),
      ...(t.estimates ? { estimates: t.estimates } : {}),
    })),
    // The published key of a block's offset is `effect` (kept for the command line's readers; the glossary calls it a block offset).
    blocks: a.blocks === null ? null : a.blocks.map((b) => ({ block: b.block, effect: b.offset })),
    df: { model: a.df.model, blocks: a.df.blocks, residual: a.df.residual, pureError: a.df.pureError, lackOfFit: a.df.lackOfFit },
    sigma: a.sigma,
    r2: a.r2,
    r2adj: a.r2adj,
    r2pred: a.r2pred,
    anova: a.anova,
    ...(a.anovaAdjusted ? { anovaAdjusted: a.anovaAdjusted } : {}),
    ...(a.lenth ? { lenth: { pse: a.lenth.pse, me: a.lenth.me, sme: a.lenth.sme, m: a.lenth.m, df: a.lenth.df, effects: a.lenth.effects } } : {}),
    ...(a.curvature ? { curvature: a.curvature } : {}),
    ...(a.aliased.length > 0 ? { aliased: a.aliased } : {}),
    runs: a.runs.map((r) => ({ run: r.label, y: r.y, fitted: r.fitted, residual: r.residual, leverage: r.leverage, studentized: r.studentized, deleted: r.deleted, kind: r.kind })),
    halfNormal: a.halfNormal,
    transform: a.transform.token,
    lowerBound: a.transform.lowerBound,
    boxCox: a.boxCox ? { lambda: a.boxCox.lambda, ci: a.boxCox.ci, suggestion: a.boxCox.suggestion } : null,
    warnings: a.warnings,
    // The same conclusions as typed data (kind and figures), for programs that read the JSON.
    verdicts: a.verdicts,
  };
}
