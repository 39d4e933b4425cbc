/**
 * The shape of a two-level design plan, shared by the design builder, the store, the files and
 * the screens. A plan lists its runs in run order; each run carries its coded planned settings
 * in the factors' declared order.
 */
import type { Factor } from '../factor/factor.ts';
import type { DesignNote } from './design-note.ts';

/**
 * Every kind a planned run can be, the one list that the record checks, the backup schema and
 * the screens follow. A two-level plan makes factorial and center runs; an augmented plan adds
 * axial runs (the star points of a central composite design), runs along a path of steepest
 * ascent, and confirmation runs at a predicted setting. Source: common practice (Montgomery,
 * Design and Analysis of Experiments, 8th ed., sections 11.2-11.4, from memory).
 */
export const RUN_KINDS = ['factorial', 'center', 'axial', 'path', 'confirmation'] as const;

/** The kind of a planned run: one of RUN_KINDS. */
export type RunKind = (typeof RUN_KINDS)[number];

/**
 * The words every screen and report uses for each run kind, one set everywhere; files and JSON
 * keep the tokens of RUN_KINDS. Example: RUN_KIND_NAMES.factorial -> 'factorial point'.
 */
export const RUN_KIND_NAMES: Readonly<Record<RunKind, string>> = {
  factorial: 'factorial point',
  center: 'center point',
  axial: 'axial point',
  path: 'path run',
  confirmation: 'confirmation run',
};

/** True when the value is one of RUN_KINDS. Example: isRunKind('axial') -> true; isRunKind('star') -> false. */
export function isRunKind(v: unknown): v is RunKind {
  return typeof v === 'string' && (RUN_KINDS as readonly string[]).includes(v);
}

export interface DesignRun {
  /** Position in the run order, from 1. */
  readonly run: number;
  /** Standard-order (Yates) index of its factorial point within one replicate, from 1; null for a center run. */
  readonly standardOrder: number | null;
  /** Replicate of the whole design, from 1. */
  readonly replicate: number;
  /** Block, from 1 (1 when unblocked). */
  readonly block: number;
  /**
   * Block of origin: the block this run was planned in when it was added to the study. For a
   * plan made in one go it equals `block`; when a plan is augmented later (axial runs, a path,
   * confirmation runs, a foldover added afterwards) the added runs carry the block they were
   * added as, so an analysis can tell the original runs from the later ones even when `block`
   * is renumbered. Never changes once the run is planned.
   */
  readonly originBlock: number;
  readonly kind: RunKind;
  /** Coded planned settings, one per factor in declared order. */
  readonly coded: readonly number[];
}

export interface Design {
  readonly factors: readonly Factor[];
  readonly runs: readonly DesignRun[];
  /** Generators as typed or from the catalog, e.g. "E=ABCD", "F=-ABC"; empty for a full factorial. */
  readonly generators: readonly string[];
  /** Every word of the defining relation with its sign, e.g. ["ABCE", "-ABDF", ...]. */
  readonly definingRelation: readonly string[];
  /** Resolution, or null for a full factorial. */
  readonly resolution: number | null;
  /** Word length -> number of words of that length in the defining relation. */
  readonly wordLengths: Readonly<Record<number, number>>;
  /** Alias chains of the main effects and two-factor interactions, each shortest word first. */
  readonly aliases: readonly (readonly string[])[];
  /** Interaction words confounded with blocks (the generators and all their products). */
  readonly blockWords: readonly string[];
  /** Seed of the randomized run order; null when standard order was kept. */
  readonly seed: number | null;
  /** Plain-words summary shown before the person commits. */
  readonly summary: string;
  /** Warnings and notes about the plan (split-plot warning, center runs with categorical factors ...), in words. */
  readonly notes: readonly string[];
  /**
   * Present only for a screening design that is not a regular fraction: a Plackett-Burman design
   * of `runs` factorial runs per replicate, which has no defining relation (generators,
   * definingRelation and aliases are empty; see plackett-burman.ts for its partial aliasing).
   */
  readonly screening?: { readonly kind: 'plackett-burman'; readonly runs: number; readonly source: string };
  /** The same notes as typed data, in the same order (core/text/design-text.ts writes `notes` from them). */
  readonly noteFacts: readonly DesignNote[];
  /** The foldover the plan includes: 'all' (the mirror image), the letter of the factor whose signs were switched, or null. */
  readonly foldover: 'all' | string | null;
}
