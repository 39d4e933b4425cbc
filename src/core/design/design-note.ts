/**
 * What the design builder says about a plan, as typed data (a kind and its facts), never as
 * text: the sentences are written from these by one module (core/text/design-text.ts), so the
 * command line, the phone's planning screen and the stored plan say the same thing.
 * Letters and words are already formatted ("AB", "-ABD"); names are the factors' names.
 */
import type { Word } from './word.ts';

/** Where a plan's block words came from (see blocking.ts for the sources). */
export type BlockOrigin =
  | { readonly kind: 'unblocked' }
  | { readonly kind: 'given' }
  /** Montgomery, Design and Analysis of Experiments, 8th ed., Table 7.8. */
  | { readonly kind: 'table' }
  /** The k-factor interaction, for 2 blocks of a full factorial beyond the table. */
  | { readonly kind: 'highest-order'; readonly k: number }
  /** The defining words of the minimum aberration 2^(k-q) fraction. */
  | { readonly kind: 'minimum-aberration'; readonly k: number; readonly q: number }
  /** A search over alias sets; `stopped` when it ended at `budget` candidates (best found, not proven best). */
  | { readonly kind: 'search'; readonly stopped: boolean; readonly budget: number };

export type DesignNote =
  /** Generators from the minimum aberration catalog and its source. */
  | { readonly kind: 'catalog-generators'; readonly source: string }
  | { readonly kind: 'block-words'; readonly words: readonly string[]; readonly origin: BlockOrigin }
  | {
      readonly kind: 'foldover';
      /** 'all' for the mirror image, else the letter and name of the factor whose signs were switched. */
      readonly fold: 'all' | { readonly letter: string; readonly name: string };
      /** Standard-order indices of the folded half. */
      readonly from: number;
      readonly to: number;
      /** More than two blocks per replicate: the folded half is several blocks. */
      readonly severalBlocks: boolean;
      /** Pairs of low-order effects the combined design separates, [shorter, longer]. */
      readonly separated: readonly (readonly [string, string])[];
      /** The first defining word confounded with the halves. */
      readonly droppedWord: string;
    }
  /** Center runs repeated at every combination of categorical levels. */
  | { readonly kind: 'center-categorical'; readonly factors: readonly string[]; readonly centerRuns: number; readonly perReplicate: number }
  | { readonly kind: 'center-uneven'; readonly centerRuns: number; readonly blocks: number }
  | { readonly kind: 'blocked-two-factor'; readonly words: readonly string[] }
  | { readonly kind: 'standard-order' }
  | { readonly kind: 'seed-drawn'; readonly seed: number }
  /** Hard-to-change factors kept sorted: the plan has become a split-plot. */
  | { readonly kind: 'split-plot'; readonly factors: readonly string[] }
  /** A Plackett-Burman plan: where its generating row comes from and how many of its columns the factors take. */
  | { readonly kind: 'screening-generator'; readonly source: string; readonly factors: number; readonly columns: number }
  /** The partial-aliasing caution of a Plackett-Burman plan. */
  | { readonly kind: 'partial-aliasing' }
  /** A central composite design's factorial part from the catalog, and its source. */
  | { readonly kind: 'factorial-part-source'; readonly source: string }
  /** A Box-Behnken design's rows and their source. */
  | { readonly kind: 'box-behnken-table' }
  /** Axial runs set a factor outside its factorial range (real settings, already rounded). */
  | {
      readonly kind: 'axial-outside';
      readonly name: string;
      readonly unit?: string;
      readonly low: number;
      readonly high: number;
      readonly factorialLow: number;
      readonly factorialHigh: number;
    }
  /** The standing caution (core/predict/caution.ts), shown with settings beyond the tested range. */
  | { readonly kind: 'standing-caution' };

/** What the plan's summary is written from. */
export interface SummaryInput {
  readonly letters: readonly string[];
  readonly totalRuns: number;
  readonly factorialRuns: number;
  readonly centerRuns: number;
  readonly replicates: number;
  /** Blocks per replicate (1 when unblocked). */
  readonly blocks: number;
  readonly resolution: number | null;
  /** Alias chains of the main effects and two-factor interactions, shortest word first. */
  readonly chains: readonly (readonly Word[])[];
  /** One word per alias set confounded with blocks. */
  readonly blockWords: readonly number[];
  readonly seed: number | null;
  readonly folded: boolean;
}
