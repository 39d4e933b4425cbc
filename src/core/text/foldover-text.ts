/**
 * The words shown before a foldover block is added to a study, and the note kept with the block:
 * how the resolution changes, what the combined runs separate (the foldover note of
 * design-text.ts) and the combined plan's summary (designSummary), so the phone says what the
 * planning form and the command line say about a folded plan.
 */
import { romanResolution } from '../design/defining-relation.ts';
import type { FoldoverBlockPlan } from '../study/foldover-block.ts';
import { designNoteText, designSummary } from './design-text.ts';

/**
 * How the resolution changes, in one sentence. Cost O(1).
 * Example: foldoverChangeText({ resolutionBefore: 3, resolutionAfter: 4, runs: 8 runs }) ->
 * "The runs planned so far are resolution III; with these 8 folded runs the study is resolution IV."
 */
export function foldoverChangeText(p: Pick<FoldoverBlockPlan, 'resolutionBefore' | 'resolutionAfter' | 'runs'>): string {
  const before = p.resolutionBefore === null ? 'a full factorial' : `resolution ${romanResolution(p.resolutionBefore)}`;
  const after =
    p.resolutionAfter === null
      ? 'a full factorial: every main effect and interaction is estimated on its own, apart from the block difference'
      : `resolution ${romanResolution(p.resolutionAfter)}`;
  return `The runs planned so far are ${before}; with these ${p.runs.length} folded runs the study is ${after}.`;
}

/**
 * Everything to read before adding the block: the change, the foldover note, the combined
 * summary. Cost O(length of the alias lists).
 * Example: for the mirror image of a 2^(7-4) -> [change sentence, "Foldover: runs 9 to 16 ...", "16 runs (2 blocks), resolution IV (with its foldover): ..."].
 */
export function foldoverPreview(p: FoldoverBlockPlan): string[] {
  return [foldoverChangeText(p), designNoteText(p.note), designSummary(p.summary)];
}

/**
 * The note stored with the added block: the foldover sentence and its run-order seed.
 * Example: "Foldover: runs 9 to 16 in standard order are the mirror image ... Run order seed 7."
 */
export function foldoverBlockNote(p: FoldoverBlockPlan): string {
  return `${designNoteText(p.note)} Run order seed ${p.seed}.`;
}
