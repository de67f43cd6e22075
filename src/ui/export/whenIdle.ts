/**
 * Runs `task` when the page is idle (requestIdleCallback, at most 500 ms later), or on a timer
 * where the browser has no idle callbacks. Returns the cancel function, for an effect's clean-up.
 */
export function whenIdle(task: () => void): () => void {
  if (typeof requestIdleCallback === 'function') {
    const id = requestIdleCallback(task, { timeout: 500 });
    return () => cancelIdleCallback(id);
  }
  const id = setTimeout(task, 0);
  return () => clearTimeout(id);
}
