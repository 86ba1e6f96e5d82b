/** The worker-thread count a user may ask for, read the same way by the command line and the action. */

export const MAX_WORKERS = 256;

/** A whole number from 1 to MAX_WORKERS, or null when `text` is not one. */
export function parseWorkerCount(text: string): number | null {
  if (!/^[0-9]+$/.test(text)) return null;
  const n = Number(text);
  return n >= 1 && n <= MAX_WORKERS ? n : null;
}
