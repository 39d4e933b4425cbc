/**
 * The page's one link to the service worker (sw/build.mjs): registers it in production builds on
 * secure pages, and reports when a new version is installed and waiting. The new version takes
 * over only when the person asks (applyUpdate), which sends SKIP_WAITING and reloads once the new
 * worker controls the page.
 */
import { signal, type ReadonlySignal } from '@preact/signals';

const waiting = signal<ServiceWorker | null>(null);

/** The installed new version waiting for the person's go-ahead, or null. */
export const updateWaiting: ReadonlySignal<ServiceWorker | null> = waiting;

function watch(reg: ServiceWorkerRegistration): void {
  // An update found while a worker already controls the page is a new version; the first install is not.
  if (reg.waiting && navigator.serviceWorker.controller) waiting.value = reg.waiting;
  reg.addEventListener('updatefound', () => {
    const worker = reg.installing;
    worker?.addEventListener('statechange', () => {
      if (worker.state === 'installed' && navigator.serviceWorker.controller) waiting.value = worker;
    });
  });
}

/** Registers the service worker; does nothing in development or where the browser offers none. */
export function registerServiceWorker(): void {
  if (!import.meta.env.PROD || !('serviceWorker' in navigator) || !window.isSecureContext) return;
  window.addEventListener('load', () => {
    navigator.serviceWorker.register('/sw.js').then(watch, (err: unknown) => {
      console.warn('Trialbook: the offline copy could not be installed', err);
    });
  });
}

/** Lets the waiting version take over, then reloads into it. */
export function applyUpdate(): void {
  const worker = waiting.peek();
  if (!worker) return;
  let reloaded = false;
  navigator.serviceWorker.addEventListener('controllerchange', () => {
    if (reloaded) return;
    reloaded = true;
    window.location.reload();
  });
  worker.postMessage({ type: 'SKIP_WAITING' });
}
