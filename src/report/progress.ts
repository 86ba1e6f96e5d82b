/** Search progress as one plain line, at most one every few seconds, for the step log and for a terminal that is not interactive. */
import type { ProgressEvent } from '../search/types.js';

const PROGRESS_INTERVAL_MS = 5000;

/** @testOnly */
export function progressLine(e: ProgressEvent): string {
  const best = e.best === null ? 'none yet' : String(Number(e.best.toPrecision(4)));
  return `${e.phase}: width ${e.width}, restart ${e.restart + 1}, epoch ${e.epoch}, best so far ${best}`;
}

/**
 * Returns a progress handler that prints through `print`, at most once per `intervalMs`
 * (the first event always prints). `now` is injectable for tests.
 */
export function throttledProgress(
  print: (line: string) => void,
  intervalMs: number = PROGRESS_INTERVAL_MS,
  now: () => number = Date.now,
): (e: ProgressEvent) => void {
  let last = -Infinity;
  return (e) => {
    const t = now();
    if (t - last < intervalMs) return;
    last = t;
    print(progressLine(e));
  };
}
