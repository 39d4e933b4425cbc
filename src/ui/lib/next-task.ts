/**
 * A promise settled in a new task of the event loop (a zero-delay timer), for work on the page's
 * main thread that is split into parts: between the parts the browser paints and answers input.
 * Chained promises all run in one task, however many there are, and a task over 50 ms blocks the
 * page (the long-task threshold that total blocking time counts: https://web.dev/articles/tbt).
 */
export function nextTask(): Promise<void> {
  return new Promise((resolve) => setTimeout(resolve, 0));
}
