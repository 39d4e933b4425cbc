/**
 * The Lenth step of the analysis: when the factorial runs are not replicated (no two share a
 * planned point or their settings, blocks aside), Lenth's method over every effect those runs
 * can estimate (saturated-effects.ts), and the half-normal points, each marked when beyond
 * Lenth's margin of error ('likely') or simultaneous margin ('active'). Without Lenth the
 * half-normal points are the model's own effects, unmarked (the label of an aliased one is the
 * combination it carries). Sources: Lenth (1989), Technometrics 31, 469-473; Daniel (1959),
 * Technometrics 1, 311-341 (half-normal plot).
 * Cost O(n r T) for the saturated fit (see saturated-effects.ts) plus O(m log m).
 * With `contrasts` (a Plackett-Burman plan) Lenth's method runs over those orthogonal columns instead
 * (contrast-effects.ts), never over partly aliased interactions.
 * Example: the unreplicated 2^4 filtration data (Montgomery 8th ed., Example 6.2) -> m 15, PSE 2.625,
 * marked A, C, D, AC and AD.
 */
import type { Factor } from '../factor/factor.ts';
import { isProduct, termLetters, termName } from '../model/term.ts';
import type { EffectPoint, TermEstimate } from './analysis.ts';
import { combinationLabel } from './combination-label.ts';
import { contrastEffects } from './contrast-effects.ts';
import { bySize, halfNormalQuantiles } from './half-normal.ts';
import { lenth, type LenthResult } from './lenth.ts';
import { labelGroups, settingGroups } from './pure-error.ts';
import { saturatedEffects, type SaturatedEffect } from './saturated-effects.ts';
import type { QrFactor } from '../linalg/householder-qr.ts';

export interface LenthStep {
  /** Lenth's figures, or null when the factorial runs are replicated or too few (fewer than 2). */
  readonly lenth: LenthResult | null;
  /** Effects sorted by size, smallest first, with half-normal quantiles and marks. */
  readonly halfNormal: readonly EffectPoint[];
}

export interface LenthInput {
  readonly factors: readonly Factor[];
  readonly coded: readonly (readonly number[])[];
  readonly y: readonly number[];
  readonly points?: readonly string[] | null;
  /** Block of each run, or null when unblocked. */
  readonly blocks: readonly number[] | null;
  /** Each run's kind (curvature.ts runKinds). */
  readonly kinds: readonly ('factorial' | 'center' | 'other')[];
  /** Repeat groups (repeats.ts), used as they are when unblocked. */
  readonly groups: Int32Array;
  /** Nominal coded settings of each run (nominal-settings.ts), when they differ from the actual ones. */
  readonly nominal?: readonly (readonly number[])[] | null;
  /** The model's estimates, for the half-normal points when Lenth does not apply. */
  readonly terms: readonly TermEstimate[];
  /** The model's factorisations, which the saturated fits resume from when its columns lead theirs (saturated-effects.ts). */
  readonly prefix?: { readonly nominal?: QrFactor; readonly actual?: QrFactor };
  /**
   * Orthogonal contrast columns to judge instead of the saturated set (a Plackett-Burman plan's
   * N - 1 columns, the unused ones included): one value per run, with each column's name and
   * letters. Absent: the saturated set of saturated-effects.ts.
   */
  readonly contrasts?: { readonly columns: readonly (readonly number[])[]; readonly labels: readonly { readonly name: string; readonly letters: string }[] };
}

const product = isProduct; // a local: module bindings are getters under some loaders, read per term

export function lenthStep(input: LenthInput): LenthStep {
  const { factors, coded, y, points, blocks, kinds, groups, terms, nominal } = input;
  const factorialRows: number[] = [];
  for (let i = 0; i < kinds.length; i++) if (kinds[i] === 'factorial') factorialRows.push(i);
  // Unreplicated: no two factorial runs share their planned point or settings (blocks aside).
  const unblockedGroups = !blocks ? groups : nominal ? settingGroups(nominal, null) : points ? labelGroups(points, null) : settingGroups(coded, null);
  const unreplicated = allDistinct(factorialRows, unblockedGroups);
  // The half-normal chart shows two-level contrasts only: products of distinct factors, never a square.
  let effects: { name: string; letters: string; effect: number }[] = terms.filter((t) => product(t.term)).map((t) => ({ name: t.name, letters: t.estimates ?? t.letters, effect: t.effect }));
  let result: LenthResult | null = null;
  if (factorialRows.length >= 2 && unreplicated && input.contrasts) {
    const { columns, labels } = input.contrasts;
    const est = contrastEffects(
      columns.map((c) => factorialRows.map((i) => c[i])),
      factorialRows.map((i) => y[i]),
    );
    if (est.length > 0) {
      result = lenth(est.map((e) => e.effect));
      effects = est.map((e) => ({ ...labels[e.column], effect: e.effect }));
    }
  } else if (factorialRows.length >= 2 && unreplicated) {
    // Every run factorial (the common case): the runs as they are, no copies.
    const every = factorialRows.length === coded.length;
    const pick = <T,>(list: readonly T[]): readonly T[] => (every ? list : factorialRows.map((i) => list[i]));
    const sat = saturatedEffects(factors.length, pick(nominal ?? coded), pick(y), blocks ? pick(blocks) : null, nominal ? pick(coded) : undefined, input.prefix);
    if (sat.length > 0) {
      const sizes: number[] = [];
      for (const e of sat) sizes.push(e.effect);
      result = lenth(sizes);
      const labels = saturatedLabels(sat, factors);
      effects = [];
      for (let j = 0; j < sat.length; j++) effects.push({ name: labels[j].name, letters: labels[j].letters, effect: sat[j].effect });
    }
  }
  const l = result;
  const mark = (effect: number): 'likely' | 'active' | undefined =>
    l === null ? undefined : Math.abs(effect) > l.sme ? 'active' : Math.abs(effect) > l.me ? 'likely' : undefined;
  const order = bySize(effects.map((e) => e.effect));
  const q = halfNormalQuantiles(order.length);
  const halfNormal: EffectPoint[] = [];
  for (let i = 0; i < order.length; i++) {
    const e = effects[order[i]];
    const mk = mark(e.effect);
    halfNormal.push(mk ? { name: e.name, letters: e.letters, effect: e.effect, quantile: q[i], mark: mk } : { name: e.name, letters: e.letters, effect: e.effect, quantile: q[i] });
  }
  return { lenth: result, halfNormal };
}

/* One-entry memo of the saturated set's labels: they depend only on the factors' names and
 * letters and on the set's terms and alias chains, the same at every analysis of a study. */
let memoLabels: { key: Float64Array; names: readonly string[]; labels: readonly { readonly name: string; readonly letters: string }[] } | null = null;

/** Name and letters ("AB + CD") of each saturated effect, as termName, termLetters and combinationLabel write them. */
function saturatedLabels(sat: readonly SaturatedEffect[], factors: readonly Factor[]): readonly { readonly name: string; readonly letters: string }[] {
  let size = 0;
  for (const e of sat) size += 2 + 2 * e.aliases.length;
  const key = new Float64Array(size);
  let o = 0;
  for (const e of sat) {
    key[o++] = e.term;
    key[o++] = e.aliases.length;
    for (const a of e.aliases) {
      key[o++] = a.term;
      key[o++] = a.weight;
    }
  }
  const names: string[] = [];
  for (const f of factors) names.push(f.name, f.letter);
  if (memoLabels && sameStrings(memoLabels.names, names) && sameNumbers(memoLabels.key, key)) return memoLabels.labels;
  const labels = sat.map((e) => ({
    name: termName(e.term, factors),
    letters: combinationLabel([{ letters: termLetters(e.term, factors), weight: 1 }, ...e.aliases.map((a) => ({ letters: termLetters(a.term, factors), weight: a.weight }))]),
  }));
  memoLabels = { key, names, labels };
  return labels;
}

function sameStrings(a: readonly string[], b: readonly string[]): boolean {
  if (a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return false;
  return true;
}

/** Entry for entry Object.is (terms and weights; -0 and 0 are written alike, but kept apart here to be safe). */
function sameNumbers(a: Float64Array, b: Float64Array): boolean {
  if (a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) if (!Object.is(a[i], b[i])) return false;
  return true;
}

/** True when no two of the runs share a group (stops at the first repeat). */
function allDistinct(rows: readonly number[], groups: Int32Array): boolean {
  let size = 0;
  for (let i = 0; i < rows.length; i++) if (groups[rows[i]] >= size) size = groups[rows[i]] + 1;
  const seen = new Uint8Array(size);
  for (let i = 0; i < rows.length; i++) {
    const g = groups[rows[i]];
    if (seen[g]) return false;
    seen[g] = 1;
  }
  return true;
}

/**
 * With no residual df, each term's effect over Lenth's pseudo standard error (Lenth 1989, the
 * "t-like ratio"); the terms unchanged when the PSE is 0. Cost O(p).
 * Example: effect 21.625 with PSE 2.625 -> lenthT 8.238.
 */
export function withLenthT(terms: readonly TermEstimate[], pse: number): TermEstimate[] {
  return pse > 0 ? terms.map((t) => ({ ...t, lenthT: t.effect / pse })) : [...terms];
}
