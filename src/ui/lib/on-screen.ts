/**
 * What the open screen holds that is not saved anywhere else, as a file to download at once when
 * the device's records are gone (storage-cleared.ts). Only a screen that holds typing registers,
 * and the download carries only what it returns: nothing else the page still has in memory.
 */
import { computed, signal } from '@preact/signals';

/** A file of what is on screen: its name and its text. */
export interface OnScreenFile {
  readonly name: string;
  readonly text: string;
}

const providers = signal<ReadonlyMap<string, () => OnScreenFile | null>>(new Map());

/** True while some screen can give what it shows as a file. */
export const hasOnScreen = computed(() => providers.value.size > 0);

/** Registers (or with null, removes) the screen `key`'s file of what it shows. */
export function registerOnScreen(key: string, provide: (() => OnScreenFile | null) | null): void {
  const next = new Map(providers.peek());
  if (provide) next.set(key, provide);
  else next.delete(key);
  providers.value = next;
}

/** The files of what the open screens show, now. */
export function onScreenFiles(): OnScreenFile[] {
  return [...providers.peek().values()].map((p) => p()).filter((f): f is OnScreenFile => f !== null);
}
