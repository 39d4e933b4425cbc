/**
 * Where the built app serves the demo backup, and reading it. Its own small file so that the app
 * can start reading the demo file on a first start at once, beside opening the store and before
 * the demo's code (which brings the backup import) has arrived.
 */

/** Where the built app serves the demo backup (relative to the page). */
export const DEMO_FILE = 'demo-study.json';

/** The demo file's address for this page. */
export function demoUrl(): string {
  return new URL(DEMO_FILE, document.baseURI).href;
}

/** Reads the demo file's text; refuses an HTTP error with its status. */
export async function fetchDemoText(url = demoUrl()): Promise<string> {
  const res = await fetch(url, { cache: 'no-cache' });
  if (!res.ok) throw new Error(`the demo study file could not be read (HTTP ${res.status})`);
  return res.text();
}
