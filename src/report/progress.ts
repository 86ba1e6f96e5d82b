/** Search progress as one plain line, at most one every few seconds, for the step log and for a terminal that is not interactive. */
import { formatMetric } from '../common/format.js';
import type { ProgressEvent } from '../search/types.js';

const PROGRESS_INTERVAL_MS = 5000;

/** One line per event; metrics in the one format every screen uses (formatMetric). */
export function progressLine(e: ProgressEvent): string {
  if (e.kind === 'start') {
    return e.phase === 'growth' ? `growth: starting at width ${e.width}` : `prune: starting from width ${e.width}`;
  }
  const best = e.best === null ? 'none yet' : formatMetric(e.best);
  return `${e.phase}: width ${e.width}, restart ${e.restart + 1}, epoch ${e.epoch}, best so far ${best}`;
}

/**
 * Returns a progress handler that prints through `print`, at most once per `intervalMs`
 * (the first event always prints: the search sends one as each phase starts, so a log shows a
 * line at once rather than after the first training). `now` is injectable for tests.
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
