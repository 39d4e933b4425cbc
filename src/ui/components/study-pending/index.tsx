/** What a study screen shows until its study is read (see lib/use-study-analysis.ts): the problem reading it, else that it is being read. */
import type { StudyAnalysis } from '../../models/study-analysis-model.ts';
import { ProblemBox } from '../problem-box/index.tsx';

export type StudyPendingProps = { readonly shared: StudyAnalysis };

export function StudyPending({ shared }: StudyPendingProps) {
  const problem = shared.problem.value;
  return problem ? <ProblemBox problem={problem} /> : <p class="quiet">Reading the runs…</p>;
}
