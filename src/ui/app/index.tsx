/**
 * The app shell: the title bar, the warnings about this browser and other tabs, and the screen
 * the address asks for (see models/router-model.ts for the routes).
 */
import { useModel } from '@preact/signals';
import { useEffect } from 'preact/hooks';
import type { Store } from '../../store/store.ts';
import { ProblemBox } from '../components/problem-box/index.tsx';
import { AppModel } from '../models/app-model.ts';
import { href, RouterModel, type Route } from '../models/router-model.ts';
import { AnalysisScreen } from '../screens/analysis/index.tsx';
import { ExportScreen } from '../screens/export/index.tsx';
import { NewStudyScreen } from '../screens/new-study/index.tsx';
import { QuickCardScreen } from '../screens/quick-card/index.tsx';
import { RunFormScreen } from '../screens/run-form/index.tsx';
import { RunSheetScreen } from '../screens/run-sheet/index.tsx';
import { StudiesScreen } from '../screens/studies/index.tsx';

export type AppProps = Record<string, never>;

function Screen({ route, store }: { route: Route; store: Store }) {
  switch (route.name) {
    case 'studies':
      return <StudiesScreen store={store} />;
    case 'sheet':
      return <RunSheetScreen store={store} studyId={route.studyId} />;
    case 'run':
      return <RunFormScreen store={store} studyId={route.studyId} plannedRun={route.plannedRun} />;
    case 'analysis':
      return <AnalysisScreen store={store} studyId={route.studyId} />;
    case 'predict':
      return <QuickCardScreen store={store} studyId={route.studyId} />;
    case 'export':
      return <ExportScreen store={store} studyId={route.studyId} />;
    case 'new':
      return <NewStudyScreen store={store} />;
    case 'missing':
      return (
        <section>
          <h2>No such page</h2>
          <p>The address "{route.path}" is not a page of Trialbook.</p>
          <a class="btn primary block" href={href.studies()}>
            Go to the studies
          </a>
        </section>
      );
  }
}

export function App(_props: AppProps) {
  const app = useModel(AppModel);
  const router = useModel(RouterModel);
  useEffect(() => void app.start(), []);
  const secure = typeof window !== 'undefined' && window.isSecureContext;
  const store = app.store.value;
  return (
    <main class="shell">
      <h1>
        <a href={href.studies()} class="home">
          Trialbook
        </a>
      </h1>
      {!secure && (
        <p class="warning" role="alert">
          This page was opened over plain http on a network address, so the browser allows no offline use and no
          lasting storage here. Records typed now may be lost. Open Trialbook from its https address, or from
          localhost on this computer.
        </p>
      )}
      {app.closed.value && (
        <p class="warning" role="alert">
          {app.closed.value}
        </p>
      )}
      {app.blocked.value && (
        <p class="warning" role="alert">
          {app.blocked.value}
        </p>
      )}
      {app.seedProblem.value && <p class="warning">{app.seedProblem.value}</p>}
      {app.problem.value && <ProblemBox problem={app.problem.value} />}
      {!store && !app.problem.value && <p class="quiet">Opening the records on this device…</p>}
      {store && <Screen key={router.key.value} route={router.route.value} store={store} />}
    </main>
  );
}
