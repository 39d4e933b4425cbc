/** A study screen's heading: the title, the demo mark when it is invented, and the study's tabs. */
import type { StudyRecord } from '../../../core/study/study.ts';
import { hrefTo, STUDY_TABS, type StudyTabName } from '../../app/routes.ts';
import { isDemo } from '../../demo/is-demo.ts';
import { DemoBadge } from '../demo-badge/index.tsx';
import './style.css';

export type StudyHeaderProps = {
  readonly study: StudyRecord;
  /** The screen whose tab is marked as current; null shows no tabs (the run form keeps its screen for the form). */
  readonly current: StudyTabName | null;
  /** Where the back link goes; the studies list unless given. */
  readonly back?: { readonly href: string; readonly label: string };
};

export function StudyHeader({ study, current, back }: StudyHeaderProps) {
  return (
    <header class="study-header">
      <a class="back" href={back?.href ?? hrefTo('studies', {})}>
        ‹ {back?.label ?? 'All studies'}
      </a>
      <p class="study-title">{study.title}</p>
      {isDemo(study) && <DemoBadge compact />}
      {current !== null && (
        <nav class="tabs" aria-label="Study">
          {STUDY_TABS.map((t) => (
            <a key={t.name} class={t.name === current ? 'tab current' : 'tab'} href={hrefTo(t.name, { studyId: study.id })} aria-current={t.name === current ? 'page' : undefined}>
              {t.label}
            </a>
          ))}
        </nav>
      )}
    </header>
  );
}
