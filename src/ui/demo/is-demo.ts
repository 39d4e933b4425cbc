/**
 * Whether a study is the invented demo: its own file, so the screens that mark the demo do not
 * load the demo study (demo-study.ts, which brings the backup import) with them.
 */
import type { StudyPlan } from '../../core/study/study.ts';

/** True for a study of invented demo data (the demo says so in its title or purpose). */
export function isDemo(study: Pick<StudyPlan, 'title' | 'purpose'>): boolean {
  return /^\s*invented demo/i.test(study.title) || /invented demo data/i.test(study.purpose);
}
