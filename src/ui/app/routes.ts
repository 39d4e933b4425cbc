/**
 * The one route table: every screen's name, its address pattern(s) and, for the study tabs, its
 * tab label. The parser (parseRoute), the links (hrefTo), the study tabs (STUDY_TABS) and the
 * address parameters of each screen (RouteParams, read from the patterns) all come from it;
 * route-screen.tsx maps each name to its screen, and the compiler refuses a name without one.
 * The table names no component, so the screens import hrefTo from here without an import cycle.
 * Addresses are hashes: '#/study/abc/run/3' is run 3 of study abc.
 */
import { InputError } from '../../core/errors.ts';

/** What a `:name` segment of a pattern holds: any text, or a whole number. */
const PARAM_KINDS = { studyId: 'text', plannedRun: 'whole' } as const;

interface RouteSpec {
  /** Address patterns, tried in order; ':studyId' and ':plannedRun' are parameters (PARAM_KINDS). */
  readonly paths: readonly string[];
  /** The label of the study tab that opens this screen; absent for screens without a tab. */
  readonly tab?: string;
}

/** The table. Study tabs appear in this order. */
export const ROUTES = {
  studies: { paths: ['/'] },
  newStudy: { paths: ['/new'] },
  runSheet: { paths: ['/study/:studyId'], tab: 'Runs' },
  runForm: { paths: ['/study/:studyId/run/:plannedRun'] },
  analysis: { paths: ['/study/:studyId/analysis'], tab: 'Effects' },
  quickCard: { paths: ['/study/:studyId/predict'], tab: 'Predict' },
  nextRuns: { paths: ['/study/:studyId/next'], tab: 'Next' },
  // Several responses weighed at once; reached from the quick card, no tab of its own.
  severalResponses: { paths: ['/study/:studyId/responses'] },
  // One screen, two addresses: a study's files, or every study's.
  export: { paths: ['/study/:studyId/export', '/export'], tab: 'Export' },
  // The records imports set aside (reached from the export screen when there are any).
  setAside: { paths: ['/set-aside'] },
} as const satisfies Record<string, RouteSpec>;

export type RouteName = keyof typeof ROUTES;

/** The parameter names of one pattern ('/study/:studyId/run/:plannedRun' -> 'studyId' | 'plannedRun'). */
type ParamNames<P extends string> = P extends `${string}:${infer N}/${infer R}` ? N | ParamNames<`/${R}`> : P extends `${string}:${infer N}` ? N : never;

/** The parameters one pattern fills: whole numbers for 'whole' kinds, text otherwise. */
type ParamsOf<P extends string> = { readonly [K in ParamNames<P>]: K extends keyof typeof PARAM_KINDS ? ((typeof PARAM_KINDS)[K] extends 'whole' ? number : string) : string };

/** A screen's address parameters, one shape per pattern (export: a study's id, or none). */
export type RouteParams<N extends RouteName> = (typeof ROUTES)[N]['paths'][number] extends infer P ? (P extends string ? ParamsOf<P> : never) : never;

export type Route = { [N in RouteName]: { readonly name: N; readonly params: RouteParams<N> } }[RouteName] | { readonly name: 'missing'; readonly path: string };

export const ROUTE_NAMES = Object.keys(ROUTES) as RouteName[];

/** The screens with a study tab (each opens with the study's id). */
export type StudyTabName = { [N in RouteName]: (typeof ROUTES)[N] extends { readonly tab: string } ? N : never }[RouteName];

/** The study tabs, in table order: the screens with a tab label. */
export const STUDY_TABS: readonly { readonly name: StudyTabName; readonly label: string }[] = ROUTE_NAMES.flatMap((name) => {
  const spec: RouteSpec = ROUTES[name];
  return spec.tab === undefined ? [] : [{ name: name as StudyTabName, label: spec.tab }];
});

function segments(path: string): string[] {
  return path.split('/').filter((p) => p !== '');
}

function paramOf(segment: string): keyof typeof PARAM_KINDS | null {
  if (!segment.startsWith(':')) return null;
  const name = segment.slice(1);
  if (!(name in PARAM_KINDS)) throw new InputError(`Route pattern parameter ":${name}" is not one of ${Object.keys(PARAM_KINDS).join(', ')}`);
  return name as keyof typeof PARAM_KINDS;
}

function match(pattern: string, parts: readonly string[]): Record<string, string | number> | null {
  const want = segments(pattern);
  if (want.length !== parts.length) return null;
  const params: Record<string, string | number> = {};
  for (let i = 0; i < want.length; i++) {
    const p = paramOf(want[i]);
    if (p === null) {
      if (want[i] !== parts[i]) return null;
    } else if (PARAM_KINDS[p] === 'whole') {
      if (!/^\d+$/.test(parts[i])) return null;
      params[p] = Number(parts[i]);
    } else params[p] = parts[i];
  }
  return params;
}

/**
 * The route of an address hash: the first table entry whose pattern matches, else 'missing'.
 * Trailing and doubled slashes are ignored; a segment that is not valid percent-encoding is missing.
 * Example: parseRoute('#/study/abc/run/3') -> { name: 'runForm', params: { studyId: 'abc', plannedRun: 3 } }.
 */
export function parseRoute(hash: string): Route {
  const path = hash.replace(/^#/, '').replace(/\/+$/, '') || '/';
  let parts: string[];
  try {
    parts = segments(path).map((p) => decodeURIComponent(p));
  } catch {
    return { name: 'missing', path };
  }
  for (const name of ROUTE_NAMES) {
    for (const pattern of ROUTES[name].paths) {
      const params = match(pattern, parts);
      if (params) return { name, params } as Route;
    }
  }
  return { name: 'missing', path };
}

/**
 * The address of a screen: the first of its patterns whose parameters are all given, filled in
 * (text percent-encoded). Throws InputError when no pattern fits or a run number is not whole.
 * Example: hrefTo('runForm', { studyId: 'a b', plannedRun: 3 }) -> '#/study/a%20b/run/3'.
 */
export function hrefTo<N extends RouteName>(name: N, params: RouteParams<N>): string {
  const given = params as Record<string, unknown>;
  for (const pattern of ROUTES[name].paths as readonly string[]) {
    const parts = segments(pattern);
    const needs = parts.map(paramOf).filter((p) => p !== null);
    if (!needs.every((p) => given[p] !== undefined && given[p] !== null)) continue;
    const filled = parts.map((s) => {
      const p = paramOf(s);
      if (p === null) return s;
      const v = given[p];
      if (PARAM_KINDS[p] === 'whole' && !(typeof v === 'number' && Number.isSafeInteger(v) && v >= 0)) {
        throw new InputError(`A link to ${name} needs ${p} as a whole number, got ${String(v)}`);
      }
      return encodeURIComponent(String(v));
    });
    return '#/' + filled.join('/');
  }
  throw new InputError(`A link to ${name} needs ${ROUTES[name].paths.join(' or ')}, got ${JSON.stringify(params)}`);
}
