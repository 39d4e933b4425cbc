/** The studies on this device, newest first, each with how far its runs have got. */
import { useModel } from '@preact/signals';
import { useEffect } from 'preact/hooks';
import type { Store } from '../../../store/store.ts';
import { DemoBadge } from '../../components/demo-badge/index.tsx';
import { ProblemBox } from '../../components/problem-box/index.tsx';
import { when } from '../../lib/when.ts';
import { hrefTo } from '../../app/routes.ts';
import { StudiesModel } from '../../models/studies-model.ts';

export type StudiesScreenProps = { readonly store: Store };

export function StudiesScreen({ store }: StudiesScreenProps) {
  const model = useModel(() => new StudiesModel(store));
  useEffect(() => void model.load(), []);
  const problem = model.problem.value;
  return (
    <section>
      <h2>Studies</h2>
      <a class="btn primary block" href={hrefTo('newStudy', {})}>
        Plan a new study
      </a>
      {/* Above the list, so the list arriving from the store moves nothing on screen (layout shift 0). */}
      <a class="btn block" href={hrefTo('export', {})}>
        Export or import files
      </a>
      {problem && <ProblemBox problem={problem} />}
      {model.loading.value && <p class="quiet">Reading the studies on this device…</p>}
      {!model.loading.value && !problem && model.summaries.value.length === 0 && <p>There are no studies on this device yet.</p>}
      <ul class="cards">
        {model.summaries.value.map(({ study, planned, logged, demo }) => (
          <li key={study.id} class="card">
            <h3 class="card-title">{study.title}</h3>
            {demo && <DemoBadge compact />}
            <p class="card-line">
              <strong>
                {logged} of {planned}
              </strong>{' '}
              planned runs logged
            </p>
            <p class="card-line quiet">
              {study.factors.length} factors · {study.responses.map((r) => r.name).join(', ')} · made {when(study.createdAt)}
            </p>
            <a class="btn primary block" href={hrefTo('runSheet', { studyId: study.id })} aria-label={`Open ${study.title}`}>
              Open study
            </a>
          </li>
        ))}
      </ul>
    </section>
  );
}
