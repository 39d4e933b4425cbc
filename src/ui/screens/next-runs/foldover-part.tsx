/**
 * The foldover part of the Next tab: from a fractional study, choose the mirror image or one
 * factor's foldover, read what the combined runs would separate (the core's words) before
 * anything is written, then add the folded runs as a new block of the same study. Everything is
 * local (the store), so it works offline; after the block is on disk the plan is read again, so
 * the preview then speaks of the runs as they now are.
 */
import { useSignal } from '@preact/signals';
import { useState } from 'preact/hooks';
import { drawSeed } from '../../../core/design/random.ts';
import type { Foldover } from '../../../core/design/foldover.ts';
import { planFoldoverBlock, type FoldoverBlockPlan } from '../../../core/study/foldover-block.ts';
import type { StudyRecord } from '../../../core/study/study.ts';
import { foldoverBlockNote, foldoverPreview } from '../../../core/text/foldover-text.ts';
import { addPlannedRuns } from '../../../store/added-blocks.ts';
import type { Store } from '../../../store/store.ts';
import { hrefTo } from '../../app/routes.ts';
import { ChoiceButtons } from '../../components/choice-buttons/index.tsx';
import { problemOf } from '../../lib/problem.ts';

export type FoldoverPartProps = {
  readonly store: Store;
  /** The study's plan with the blocks added so far. */
  readonly study: StudyRecord;
  /** Called once a block is on disk, so the screen reads the plan and its blocks again. */
  readonly onAdded: () => Promise<void>;
};

type Planned = { readonly ok: true; readonly plan: FoldoverBlockPlan } | { readonly ok: false; readonly message: string };

/** True for a study whose own plan is a regular fraction (the part is not shown otherwise). */
export function isFraction(study: StudyRecord): boolean {
  return study.design.definingRelation.length > 0 && !study.design.screening;
}

export function FoldoverPart({ store, study, onAdded }: FoldoverPartProps) {
  const fold = useSignal<Foldover>('all');
  // One seed per visit, so the preview and the runs added agree; a new visit draws another.
  const [seed, setSeed] = useState(drawSeed);
  const saving = useSignal(false);
  const saved = useSignal<string | null>(null);
  const saveProblem = useSignal<string | null>(null);

  // Worked out on each render: at most 128 runs, far below a frame's time.
  let p: Planned;
  try {
    p = { ok: true, plan: planFoldoverBlock(study, fold.value, seed) };
  } catch (err) {
    p = { ok: false, message: problemOf(err).message };
  }

  async function add() {
    if (saving.peek() || !p.ok) return;
    saving.value = true;
    saved.value = null;
    saveProblem.value = null;
    try {
      const block = await addPlannedRuns(store, study.id, 'foldover', p.plan.runs, foldoverBlockNote(p.plan));
      const first = block.runs[0].run;
      const last = block.runs[block.runs.length - 1].run;
      saved.value = `Added runs ${first} to ${last} to the run sheet as block ${block.runs[0].block}. Log them there like any other run.`;
      setSeed(drawSeed());
      await onAdded();
    } catch (err) {
      saveProblem.value = problemOf(err).message;
    } finally {
      saving.value = false;
    }
  }

  const nextBlock = Math.max(...study.design.runs.map((r) => Math.max(r.block, r.originBlock))) + 1;
  const options: { value: Foldover; label: string }[] = [
    { value: 'all', label: 'Mirror image (every sign switched)' },
    ...study.factors.map((f, i) => ({ value: i, label: `Switch ${f.letter} only (${f.name})` })),
  ];
  return (
    <section class="next-part" aria-labelledby="fold-h" data-testid="foldover">
      <h3 id="fold-h">Foldover</h3>
      <p class="quiet">A second set of runs with signs switched, to separate effects this fraction cannot tell apart. They are added as a block of their own.</p>
      <ChoiceButtons label="Which signs to switch" options={options} value={fold.value} onChoose={(v) => (fold.value = v)} disabled={saving.value} />
      {!p.ok && (
        <p class="problem input" role="alert">
          {p.message}
        </p>
      )}
      {p.ok && (
        <div class="result-card" data-testid="foldover-preview">
          <p class="result-main">
            {p.plan.runs.length} new runs, as block {nextBlock}
          </p>
          {foldoverPreview(p.plan).map((line) => (
            <p key={line}>{line}</p>
          ))}
          <button type="button" class="btn primary block" disabled={saving.value} onClick={() => void add()}>
            Add these {p.plan.runs.length} runs to the run sheet
          </button>
        </div>
      )}
      {saved.value && (
        <>
          <p class="saved-note" role="status">
            {saved.value}
          </p>
          <a class="btn block" href={hrefTo('runSheet', { studyId: study.id })}>
            Open the run sheet
          </a>
        </>
      )}
      {saveProblem.value && (
        <p class="problem input" role="alert">
          {saveProblem.value}
        </p>
      )}
    </section>
  );
}
