/**
 * The app shell: the title bar, the offline note, the warnings about this browser and other tabs, and the screen
 * the address asks for (the route table is routes.ts, the screen switch route-screen.tsx).
 */
import { useModel } from '@preact/signals';
import { useEffect } from 'preact/hooks';
import { OfflineNote } from '../components/offline-note/index.tsx';
import { ProblemBox } from '../components/problem-box/index.tsx';
import { AppModel } from '../models/app-model.ts';
import { RouterModel } from './router-model.ts';
import { RouteScreen } from './route-screen.tsx';
import { hrefTo } from './routes.ts';

export type AppProps = Record<string, never>;

export function App(_props: AppProps) {
  const app = useModel(AppModel);
  const router = useModel(RouterModel);
  useEffect(() => void app.start(), []);
  const secure = typeof window !== 'undefined' && window.isSecureContext;
  const store = app.store.value;
  return (
    <main class="shell">
      <div class="title-bar">
        <h1>
          <a href={hrefTo('studies', {})} class="home">
            Trialbook
          </a>
        </h1>
        <OfflineNote />
      </div>
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
      {store && <RouteScreen key={router.key.value} route={router.route.value} store={store} />}
    </main>
  );
}
