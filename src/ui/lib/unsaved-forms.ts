/**
 * Which forms hold input that is not yet saved as a record, so that an update of the app is
 * offered only when reloading cannot interrupt anyone (house rule: updates wait for the person).
 */
import { computed, signal } from '@preact/signals';

const open = signal<ReadonlySet<string>>(new Set());

/** True while any form holds unsaved input. */
export const anyUnsaved = computed(() => open.value.size > 0);

/** Marks the form `key` as holding unsaved input, or not. */
export function markUnsaved(key: string, unsaved: boolean): void {
  if (open.peek().has(key) === unsaved) return;
  const next = new Set(open.peek());
  if (unsaved) next.add(key);
  else next.delete(key);
  open.value = next;
}
