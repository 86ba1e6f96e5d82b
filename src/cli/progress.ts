/** Search progress on stderr: one line redrawn in place on a terminal; elsewhere a plain line every few seconds. */
import { formatMetric } from '../common/format.js';
import { progressLine, throttledProgress } from '../report/progress.js';
import type { ProgressEvent } from '../search/types.js';

export function progressPrinter(stream: NodeJS.WriteStream): {
  onProgress?: (e: ProgressEvent) => void;
  done: () => void;
} {
  if (!stream.isTTY) {
    // The same throttled line the action logs: the first event at once, then one every few seconds.
    const print = throttledProgress((line) => stream.write(`progress: ${line}\n`));
    return { onProgress: print, done: () => undefined };
  }
  let last = 0;
  let drawn = false;
  return {
    onProgress: (e) => {
      const now = performance.now();
      if (now - last < 100) return; // display only: at most ten redraws a second
      last = now;
      const best = e.best === null ? '' : ` · best ${formatMetric(e.best)}`;
      const line =
        e.kind === 'start'
          ? progressLine(e)
          : `${e.phase} · width ${e.width} · restart ${e.restart + 1} · epoch ${e.epoch}${best}`;
      stream.write(`\r\x1b[2K${line}`);
      drawn = true;
    },
    done: () => {
      if (drawn) stream.write('\r\x1b[2K');
    },
  };
}
