/** In-app navigation by the address's hash; the routes themselves are in routes.ts. */
import { computed, createModel, effect, signal } from '@preact/signals';
import { parseRoute } from './routes.ts';

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
  };
});
