/**
 * The shape of a two-level design plan, shared by the design builder, the store, the files and
 * the screens. A plan lists its runs in run order; each run carries its coded planned settings
 * in the factors' declared order.
 */
import type { Factor } from '../factor/factor.ts';
import type { DesignNote } from './design-note.ts';

export interface DesignRun {
  /** Position in the run order, from 1. */
  readonly run: number;
  /** Standard-order (Yates) index of its factorial point within one replicate, from 1; null for a center run. */
  readonly yates: number | null;
  /** Replicate of the whole design, from 1. */
  readonly replicate: number;
  /** Block, from 1 (1 when unblocked). */
  readonly block: number;
  readonly kind: 'factorial' | 'center';
  /** Coded planned settings, one per factor in declared order. */
  readonly coded: readonly number[];
}

export interface Design {
  readonly factors: readonly Factor[];
  readonly runs: readonly DesignRun[];
  /** Generators as typed or from the catalogue, e.g. "E=ABCD", "F=-ABC"; empty for a full factorial. */
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
  /** Seed of the randomised run order; null when standard order was kept. */
  readonly seed: number | null;
  /** Plain-words summary shown before the person commits. */
  readonly summary: string;
  /** Warnings and notes about the plan (split-plot warning, center runs with categorical factors ...), in words. */
  readonly notes: readonly string[];
  /** The same notes as typed data, in the same order (core/text/design-text.ts writes `notes` from them). */
  readonly noteFacts: readonly DesignNote[];
  /** The foldover the plan includes: 'all' (the mirror image), the letter of the factor whose signs were switched, or null. */
  readonly foldover: 'all' | string | null;
}
