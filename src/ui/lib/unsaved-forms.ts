/**
 * What the open forms hold that is not yet saved as a record, so that an update of the app is
 * offered only when reloading cannot lose anyone's typing (house rule: updates wait for the
 * person). Typing already kept as a draft on the device comes back after a reload; typing still
 * being written, or whose draft could not be written, would be lost.
 */
import { computed, signal } from '@preact/signals';

/** A form's typing: none unsaved, kept as a draft on the device, or held only in the page. */
export type TypingState = 'none' | 'kept' | 'unsaved';

const open = signal<ReadonlyMap<string, Exclude<TypingState, 'none'>>>(new Map());

/** True while any form holds typing that a reload would lose. */
export const anyUnsaved = computed(() => [...open.value.values()].includes('unsaved'));

/** True while any form holds typing not saved as a record but kept as a draft (it comes back after a reload). */
export const anyKeptAsDraft = computed(() => [...open.value.values()].includes('kept'));

/** Records the typing state of the form `key`. */
export function markTyping(key: string, state: TypingState): void {
  const now = open.peek();
  if ((now.get(key) ?? 'none') === state) return;
  const next = new Map(now);
  if (state === 'none') next.delete(key);
  else next.set(key, state);
  open.value = next;
}

/** Marks the form `key` as holding typing a reload would lose, or nothing unsaved. */
export function markUnsaved(key: string, unsaved: boolean): void {
  markTyping(key, unsaved ? 'unsaved' : 'none');
}
