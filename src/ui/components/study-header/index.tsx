/** A study screen's heading: the title, the demo mark when it is invented, and the study's tabs. */
import type { StudyRecord } from '../../../core/study/study.ts';
import { href } from '../../models/router-model.ts';
import { isDemo } from '../../seed/demo-seed.ts';
import { DemoBadge } from '../demo-badge/index.tsx';

export type StudyTab = 'sheet' | 'analysis' | 'predict' | 'export';

export type StudyHeaderProps = {
  readonly study: StudyRecord;
  /** The tab to mark as current; null shows no tabs (the run form keeps its screen for the form). */
  readonly current: StudyTab | null;
  /** Where the back link goes; the studies list unless given. */
  readonly back?: { readonly href: string; readonly label: string };
};

const TABS: readonly { readonly tab: StudyTab; readonly label: string; readonly to: (id: string) => string }[] = [
  { tab: 'sheet', label: 'Runs', to: href.sheet },
  { tab: 'analysis', label: 'Effects', to: href.analysis },
  { tab: 'predict', label: 'Predict', to: href.predict },
  { tab: 'export', label: 'Export', to: href.export },
];

export function StudyHeader({ study, current, back }: StudyHeaderProps) {
  return (
    <header class="study-header">
      <a class="back" href={back?.href ?? href.studies()}>
        ‹ {back?.label ?? 'All studies'}
      </a>
      <p class="study-title">{study.title}</p>
      {isDemo(study) && <DemoBadge compact />}
      {current !== null && (
      <nav class="tabs" aria-label="Study">
        {TABS.map((t) => (
          <a key={t.tab} class={t.tab === current ? 'tab current' : 'tab'} href={t.to(study.id)} aria-current={t.tab === current ? 'page' : undefined}>
            {t.label}
          </a>
        ))}
      </nav>
      )}
    </header>
  );
}
