/**
 * The app shell: the title bar, the offline note, the warnings about this browser and other tabs, and the screen
 * the address asks for (the route table is routes.ts, the screen switch route-screen.tsx).
 */
import { useModel } from '@preact/signals';
import { useEffect } from 'preact/hooks';
import { OfflineNote } from '../components/offline-note/index.tsx';
import { ProblemBox } from '../components/problem-box/index.tsx';
import { onScreenFiles, hasOnScreen } from '../lib/on-screen.ts';
import { downloadText } from '../lib/save-file.ts';
import { storageCleared } from '../lib/storage-cleared.ts';
import { AppModel } from '../models/app-model.ts';
import { RouterModel } from './router-model.ts';
import { whenIdle } from '../lib/when-idle.ts';
import { preloadAllScreens, preloadScreen, RouteScreen } from './route-screen.tsx';
import { hrefTo } from './routes.ts';

export type AppProps = Record<string, never>;

/** How long after the store is ready the other screens' code starts to load (common practice: after the first screen has settled). */
const PRELOAD_AFTER_MS = 1500;

/** Downloads what the open screen holds (and nothing else), at once. */
function downloadOnScreen() {
  for (const f of onScreenFiles()) downloadText(f.text, f.name, 'application/json');
}

export function App(_props: AppProps) {
  const app = useModel(AppModel);
  const router = useModel(RouterModel);
  useEffect(() => {
    // The address's screen loads beside the store; the others a while after the store is open (and
    // the demo study added on a first start), when the page is idle, so that they do not share the
    // network with what the first screen reads and shows (the studies list reads the store after
    // it opens, and its first card is the page's largest paint).
    let cancel = () => {};
    let live = true;
    void Promise.all([app.start(), preloadScreen(router.route.value)]).then(() => {
      if (!live) return;
      const timer = window.setTimeout(() => (cancel = whenIdle(() => void preloadAllScreens())), PRELOAD_AFTER_MS);
      cancel = () => window.clearTimeout(timer);
    });
    return () => {
      live = false;
      cancel();
    };
  }, []);
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
      {app.closed.value && storageCleared.value === null && (
        <p class="warning" role="alert">
          {app.closed.value}
        </p>
      )}
      {storageCleared.value !== null && (
        <div class="warning records-gone" role="alert">
          <p>{storageCleared.value}</p>
          {hasOnScreen.value ? (
            <button type="button" class="btn primary big block" onClick={downloadOnScreen}>
              Download what is on this screen
            </button>
          ) : (
            <p>This screen holds no typing of its own.</p>
          )}
        </div>
      )}
      {app.recordsGone.value && (
        <p class="warning" role="alert">
          {app.recordsGone.value}
        </p>
      )}
      {app.blocked.value && (
        <p class="warning" role="alert">
          {app.blocked.value}
        </p>
      )}
      {app.demoProblem.value && <p class="warning">{app.demoProblem.value}</p>}
      {app.problem.value && <ProblemBox problem={app.problem.value} />}
      {!store && !app.problem.value && <p class="quiet">Opening the records on this device…</p>}
      {store && <RouteScreen key={router.key.value} route={router.route.value} store={store} />}
    </main>
  );
}
