/**
 * A stored time as the screens show it. Its own file (format.ts re-exports it) so the studies
 * list, which shows only times, loads none of the number and setting formatting.
 */

/** A stored ISO time as the phone's local date and time, or a dash. */
export function when(iso: string | null | undefined): string {
  if (!iso) return '–';
  const d = new Date(iso);
  if (Number.isNaN(d.getTime())) return iso;
  return d.toLocaleString(undefined, { year: 'numeric', month: 'short', day: 'numeric', hour: '2-digit', minute: '2-digit' });
}
