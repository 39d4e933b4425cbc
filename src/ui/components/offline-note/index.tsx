/**
 * A quiet line while the phone has no network: saving works all the same, since every record is
 * kept on the device. Follows the browser's online and offline events
 * (https://developer.mozilla.org/en-US/docs/Web/API/Navigator/onLine).
 */
import { useEffect, useState } from 'preact/hooks';
import './style.css';

export type OfflineNoteProps = Record<string, never>;

export function OfflineNote(_props: OfflineNoteProps) {
  const [online, setOnline] = useState(typeof navigator === 'undefined' ? true : navigator.onLine);
  useEffect(() => {
    const on = () => setOnline(true);
    const off = () => setOnline(false);
    window.addEventListener('online', on);
    window.addEventListener('offline', off);
    return () => {
      window.removeEventListener('online', on);
      window.removeEventListener('offline', off);
    };
  }, []);
  if (online) return null;
  return (
    <p class="offline-note" aria-live="polite">
      Offline: runs are still saved on this phone.
    </p>
  );
}
