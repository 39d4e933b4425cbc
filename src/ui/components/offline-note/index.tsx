/**
 * A quiet mark beside the app's title while the browser reports no network: saving works anyway,
 * because every record is kept on this device (navigator.onLine and the online and offline
 * events; https://developer.mozilla.org/docs/Web/API/Navigator/onLine). A browser that says
 * "online" may still have no working connection, so the line only ever claims what is safe.
 */
import { useSignal } from '@preact/signals';
import { useEffect } from 'preact/hooks';
import './style.css';

export type OfflineNoteProps = Record<string, never>;

export function OfflineNote(_props: OfflineNoteProps) {
  const offline = useSignal(typeof navigator !== 'undefined' && navigator.onLine === false);
  useEffect(() => {
    const update = () => void (offline.value = navigator.onLine === false);
    update();
    window.addEventListener('online', update);
    window.addEventListener('offline', update);
    return () => {
      window.removeEventListener('online', update);
      window.removeEventListener('offline', update);
    };
  }, []);
  // The live region stays in the page (empty, no height) so that a change is announced without taking the focus.
  return (
    <div class="offline-slot" aria-live="polite">
      {offline.value && (
        <p class="offline-note">
          <span class="offline-words">
            <strong>Offline</strong> <span>saving still works</span>
          </span>
        </p>
      )}
    </div>
  );
}
