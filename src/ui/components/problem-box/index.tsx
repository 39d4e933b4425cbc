/** A message about what went wrong, with the offer of a backup export when the storage failed. */
import type { Problem } from '../../lib/problem.ts';

export type ProblemBoxProps = {
  readonly problem: Problem;
  /** Called by the export button (shown only when the problem offers an export). */
  readonly onExport?: () => void;
  readonly exportBusy?: boolean;
};

export function ProblemBox({ problem, onExport, exportBusy }: ProblemBoxProps) {
  return (
    <div class={problem.kind === 'input' ? 'problem input' : 'problem'} role="alert">
      <p>{problem.message}</p>
      {problem.offerExport && onExport && (
        <button type="button" class="btn" onClick={onExport} disabled={exportBusy}>
          Export a backup now
        </button>
      )}
    </div>
  );
}
