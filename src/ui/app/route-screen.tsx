/**
 * The screen switch: each route of the table (routes.ts) with its screen. The record's type names
 * every route, so a route added to the table without a screen does not compile.
 */
import type { ComponentType } from 'preact';
import type { Store } from '../../store/store.ts';
import { AnalysisScreen } from '../screens/analysis/index.tsx';
import { ExportScreen } from '../screens/export/index.tsx';
import { MissingScreen } from '../screens/missing/index.tsx';
import { NewStudyScreen } from '../screens/new-study/index.tsx';
import { NextRunsScreen } from '../screens/next-runs/index.tsx';
import { QuickCardScreen } from '../screens/quick-card/index.tsx';
import { RunFormScreen } from '../screens/run-form/index.tsx';
import { RunSheetScreen } from '../screens/run-sheet/index.tsx';
import { StudiesScreen } from '../screens/studies/index.tsx';
import type { Route, RouteName, RouteParams } from './routes.ts';

const SCREENS: { readonly [N in RouteName]: ComponentType<RouteParams<N> & { readonly store: Store }> } = {
  studies: StudiesScreen,
  newStudy: NewStudyScreen,
  runSheet: RunSheetScreen,
  runForm: RunFormScreen,
  analysis: AnalysisScreen,
  quickCard: QuickCardScreen,
  nextRuns: NextRunsScreen,
  export: ExportScreen,
};

export type RouteScreenProps = { readonly route: Route; readonly store: Store };

/** The screen the route names, with its address parameters as props. */
export function RouteScreen({ route, store }: RouteScreenProps) {
  if (route.name === 'missing') return <MissingScreen path={route.path} />;
  // The parser gave exactly the parameters of this route's patterns, which are the screen's props.
  const Screen = SCREENS[route.name] as ComponentType<{ readonly store: Store }>;
  return <Screen store={store} {...route.params} />;
}
