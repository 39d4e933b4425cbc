/**
 * In-app navigation by the address's hash: #/, #/study/ID, #/study/ID/run/N,
 * #/study/ID/analysis, #/study/ID/predict, #/export (all studies), #/study/ID/export and #/new
 * (plan a new study).
 */
import { computed, createModel, effect, signal } from '@preact/signals';

export type Route =
  | { readonly name: 'studies' }
  | { readonly name: 'sheet'; readonly studyId: string }
  | { readonly name: 'run'; readonly studyId: string; readonly plannedRun: number }
  | { readonly name: 'analysis'; readonly studyId: string }
  | { readonly name: 'predict'; readonly studyId: string }
  | { readonly name: 'export'; readonly studyId: string | null }
  | { readonly name: 'new' }
  | { readonly name: 'missing'; readonly path: string };

/** The route of a hash ('#/study/abc/run/3' -> run 3 of study abc). */
export function parseRoute(hash: string): Route {
  const path = hash.replace(/^#/, '').replace(/\/+$/, '') || '/';
  const parts = path.split('/').filter((p) => p !== '').map((p) => decodeURIComponent(p));
  if (parts.length === 0) return { name: 'studies' };
  if (parts[0] === 'export' && parts.length === 1) return { name: 'export', studyId: null };
  if (parts[0] === 'new' && parts.length === 1) return { name: 'new' };
  if (parts[0] === 'study' && parts.length >= 2) {
    const studyId = parts[1];
    if (parts.length === 2) return { name: 'sheet', studyId };
    if (parts.length === 3 && parts[2] === 'analysis') return { name: 'analysis', studyId };
    if (parts.length === 3 && parts[2] === 'predict') return { name: 'predict', studyId };
    if (parts.length === 3 && parts[2] === 'export') return { name: 'export', studyId };
    if (parts.length === 4 && parts[2] === 'run' && /^\d+$/.test(parts[3])) return { name: 'run', studyId, plannedRun: Number(parts[3]) };
  }
  return { name: 'missing', path };
}

/** Hash links for the screens. */
export const href = {
  studies: () => '#/',
  sheet: (id: string) => `#/study/${encodeURIComponent(id)}`,
  run: (id: string, n: number) => `#/study/${encodeURIComponent(id)}/run/${n}`,
  analysis: (id: string) => `#/study/${encodeURIComponent(id)}/analysis`,
  predict: (id: string) => `#/study/${encodeURIComponent(id)}/predict`,
  export: (id?: string | null) => (id ? `#/study/${encodeURIComponent(id)}/export` : '#/export'),
  newStudy: () => '#/new',
};

export const RouterModel = createModel(() => {
  const hash = signal(location.hash);
  effect(() => {
    const onChange = () => {
      hash.value = location.hash;
      window.scrollTo(0, 0);
    };
    window.addEventListener('hashchange', onChange);
    return () => window.removeEventListener('hashchange', onChange);
  });
  return {
    route: computed(() => parseRoute(hash.value)),
    /** The hash as text, so screens can be keyed by it. */
    key: computed(() => hash.value || '#/'),
    go(to: string) {
      location.hash = to;
    },
  };
});
