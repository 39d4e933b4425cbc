/**
 * Runs a task once the page is idle: requestIdleCallback where the browser has it, else after a
 * short timeout (Safari ships no requestIdleCallback:
 * https://developer.mozilla.org/en-US/docs/Web/API/Window/requestIdleCallback#browser_compatibility).
 * Returns a function that cancels the task if it has not run.
 */
export function whenIdle(task: () => void, { timeout = 3000 } = {}): () => void {
  if (typeof window.requestIdleCallback === 'function') {
    const id = window.requestIdleCallback(task, { timeout });
    return () => window.cancelIdleCallback(id);
  }
  const id = window.setTimeout(task, 1000);
  return () => window.clearTimeout(id);
}
