/**
 * The screen switch: each route of the table (routes.ts) with its screen, one line per screen.
 * The record's type names every route, so a route added to the table without a screen does not
 * compile. Every screen is lazy (lazy-screen.tsx): its code, and the core and packages only it
 * needs, arrive when it is first shown or preloaded, so the first screen carries none of it.
 */
import type { ComponentType } from 'preact';
import type { Store } from '../../store/store.ts';
import { MissingScreen } from '../screens/missing/index.tsx';
import { StudiesScreen } from '../screens/studies/index.tsx';
import { lazyScreen, type LazyScreen } from './lazy-screen.tsx';
import { ROUTE_NAMES, type Route, type RouteName, type RouteParams } from './routes.ts';
import { nextTask } from '../lib/next-task.ts';

const SCREENS: { readonly [N in RouteName]: LazyScreen<RouteParams<N> & { readonly store: Store }> } = {
  // The studies list is the usual first screen and its first card the page's largest paint: its
  // code (about 2.5 KB gzip) comes with the first chunk rather than one more round trip after it.
  studies: lazyScreen(() => Promise.resolve(StudiesScreen)),
  newStudy: lazyScreen(() => import('../screens/new-study/index.tsx').then((m) => m.NewStudyScreen)),
  runSheet: lazyScreen(() => import('../screens/run-sheet/index.tsx').then((m) => m.RunSheetScreen)),
  runForm: lazyScreen(() => import('../screens/run-form/index.tsx').then((m) => m.RunFormScreen)),
  analysis: lazyScreen(() => import('../screens/analysis/index.tsx').then((m) => m.AnalysisScreen)),
  quickCard: lazyScreen(() => import('../screens/quick-card/index.tsx').then((m) => m.QuickCardScreen)),
  nextRuns: lazyScreen(() => import('../screens/next-runs/index.tsx').then((m) => m.NextRunsScreen)),
  severalResponses: lazyScreen(() => import('../screens/several-responses/index.tsx').then((m) => m.SeveralResponsesScreen)),
  export: lazyScreen(() => import('../screens/export/index.tsx').then((m) => m.ExportScreen)),
  setAside: lazyScreen(() => import('../screens/set-aside/index.tsx').then((m) => m.SetAsideScreen)),
};

export type RouteScreenProps = { readonly route: Route; readonly store: Store };

/** The screen the route names, with its address parameters as props. */
export function RouteScreen({ route, store }: RouteScreenProps) {
  if (route.name === 'missing') return <MissingScreen path={route.path} />;
  // The parser gave exactly the parameters of this route's patterns, which are the screen's props.
  const Screen = SCREENS[route.name] as ComponentType<{ readonly store: Store }>;
  return <Screen store={store} {...route.params} />;
}

/** Starts fetching the code of the route's screen (the app calls it at start, beside opening the store). */
export function preloadScreen(route: Route): Promise<void> {
  return route.name === 'missing' ? Promise.resolve() : SCREENS[route.name].preload();
}

/**
 * Fetches every screen's code, one after another in table order (so each fetch takes the
 * network alone, and its code runs in a task of its own); the app calls it when idle after the first screen, so every screen opens
 * offline later. A screen that fails is skipped here and offers a retry when it is opened.
 */
export async function preloadAllScreens(): Promise<void> {
  for (const name of ROUTE_NAMES) {
    await SCREENS[name].preload();
    await nextTask(); // each screen's code runs in a task of its own, not all in one long one
  }
}
