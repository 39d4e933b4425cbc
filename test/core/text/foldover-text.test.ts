/**
 * The words before a foldover block. The study is INVENTED; the resolution change of the mirror
 * image of a 2^(7-4) resolution III fraction (III to IV) is from Montgomery, Design and Analysis
 * of Experiments, 8th ed., section 8.6.1 (from memory).
 */
import { describe, expect, it } from 'vitest';
import { buildDesign } from '../../../src/core/design/build-design.ts';
import { planFoldoverBlock } from '../../../src/core/study/foldover-block.ts';
import { studyPlan } from '../../../src/core/study/study.ts';
import { foldoverBlockNote, foldoverChangeText, foldoverPreview } from '../../../src/core/text/foldover-text.ts';

const factors = Array.from({ length: 7 }, (_, i) => ({ kind: 'numeric' as const, name: `X${i + 1}`, low: 0, high: 1 }));
const plan = studyPlan('Invented', 'INVENTED', [{ name: 'Y', goal: 'maximize', lowerBound: null }], buildDesign({ factors, generators: ['D=AB', 'E=AC', 'F=BC', 'G=ABC'], seed: 1 }));

describe('foldover words', () => {
  const p = planFoldoverBlock(plan, 'all', 9);
  it('say the resolution before and after', () => {
    expect(foldoverChangeText(p)).toBe('The runs planned so far are resolution III; with these 8 folded runs the study is resolution IV.');
  });
  it('a full factorial after the fold is said so', () => {
    expect(foldoverChangeText({ resolutionBefore: 3, resolutionAfter: null, runs: p.runs.slice(0, 4) })).toMatch(/with these 4 folded runs the study is a full factorial/);
  });
  it('preview: the change, what is separated, the combined summary (16 runs, 2 blocks)', () => {
    const [change, note, summary] = foldoverPreview(p);
    expect(change).toMatch(/resolution IV/);
    expect(note).toMatch(/^Foldover: runs 9 to 16 in standard order are the mirror image/);
    expect(note).toMatch(/separates A from BD/);
    expect(summary).toMatch(/^16 runs \(2 blocks\), resolution IV \(with its foldover\): main effects are clear of two-factor interactions/);
  });
  it('the stored note carries the seed', () => {
    expect(foldoverBlockNote(p)).toMatch(/Run order seed 9\.$/);
  });
});
