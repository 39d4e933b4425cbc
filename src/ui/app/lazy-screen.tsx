/**
 * A screen whose code loads on first use, so the first screen downloads only its own code: the
 * module arrives when the screen is first shown or when preload() asks for it (the app preloads
 * every screen when idle, so a phone that goes offline after one visit can still open them all,
 * even before the service worker has finished its precache). Meanwhile a one-line status says the
 * screen is opening; a module that cannot be fetched says so and offers to try again, and no
 * record is touched either way. Once loaded, the screen renders at once, with no loading line.
 */
import type { ComponentType, JSX } from 'preact';
import { useEffect, useState } from 'preact/hooks';
import './lazy-screen.css';

export interface LazyScreen<P> {
  (props: P): JSX.Element;
  /** Fetches the screen's module in the background (once; after a failure it waits for the screen itself or "Try again") and resolves when done. */
  preload(): Promise<void>;
}

/**
 * Wraps a loader of a screen component ('() => import(path).then((m) => m.Screen)') as a component.
 * Example: lazyScreen(() => import('../screens/studies/index.tsx').then((m) => m.StudiesScreen)).
 */
export function lazyScreen<P>(load: () => Promise<ComponentType<P>>): LazyScreen<P> {
  let screen: ComponentType<P> | null = null;
  let pending: Promise<void> | null = null;
  let failure: string | null = null;

  /** `retry`: try again after a failure (the screen's own mount, or "Try again"); a background
   * preload leaves a failure as it is, so the message on screen does not flicker away. */
  function fetchScreen(retry: boolean): Promise<void> {
    if (screen) return Promise.resolve();
    if (failure !== null && pending === null && !retry) return Promise.resolve();
    if (pending === null) failure = null;
    pending ??= load().then(
      (s) => {
        screen = s;
        failure = null;
      },
      (err: unknown) => {
        failure = err instanceof Error ? err.message : String(err);
        pending = null;
      },
    );
    return pending;
  }

  function Lazy(props: P): JSX.Element {
    const [, setRenders] = useState(0);
    const rerender = () => setRenders((n) => n + 1);
    const ready = screen;
    useEffect(() => {
      if (ready) return;
      let live = true;
      void fetchScreen(true).then(() => live && rerender());
      // A screen opened again after a failure first rendered that old failure; the fetch just
      // started replaces it with the status line at once, so "Try again" is never on screen while a
      // fetch is running (a tap then joined the running fetch, made before the network was back,
      // and the screen failed again though the network had returned).
      rerender();
      return () => void (live = false);
    }, [ready]);
    if (ready) {
      const Screen = ready as ComponentType<Record<string, unknown>>;
      return <Screen {...(props as Record<string, unknown>)} />;
    }
    if (failure !== null && pending === null) {
      return (
        <div class="problem" role="alert">
          <p>
            This screen could not be loaded ({failure}). It needs the network once, on the first visit; the records on
            this device are not affected.
          </p>
          <button type="button" class="btn" onClick={() => {
              void fetchScreen(true).then(rerender);
              rerender();
            }}>
            Try again
          </button>
        </div>
      );
    }
    return (
      <p class="quiet screen-loading" role="status">
        Opening the screen…
      </p>
    );
  }
  const preload = () => fetchScreen(false);
  return Object.assign(Lazy, { preload });
}
