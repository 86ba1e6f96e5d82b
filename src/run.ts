/**
 * The main job shared by the command line and the action: config → data → search → gate →
 * report. This file only orchestrates; each stage lives in its folder (job/ has the steps every
 * stage shares, and the matrix stages plan, shard and merge).
 */
import { finishJob, type FinishOptions, type JobResult } from './job/finish.js';
import { prepareJob, timed } from './job/prepare.js';
import { runSearch } from './search/index.js';
import type { ProgressEvent } from './search/types.js';

export type { JobResult } from './job/finish.js';

export interface JobOptions extends FinishOptions {
  /** Absolute path of the config file. */
  configPath: string;
  /** Absolute workspace root no path may leave. */
  root: string;
  /** Override of the config's baseline path (absolute), or null. */
  baselinePath?: string | null;
  /** Worker threads; null: config, else available parallelism. */
  workers?: number | null;
  /** File of the running bundle, started again as the search's worker threads; null: search in this thread. */
  workerEntry?: string | null;
  onProgress?: (event: ProgressEvent) => void;
  /** Plain log lines (phase changes, per-width results); they quote repository strings, escaped. */
  log?: (line: string) => void;
}

export async function runJob(options: JobOptions): Promise<JobResult> {
  const job = await prepareJob({
    ...options,
    outputs: [
      [options.reportPath, 'report'],
      [options.modelPath, 'model'],
    ],
  });
  const search = await timed(job.timing, 'searchSeconds', () =>
    runSearch(job.data.dataset, job.config.search, job.config.target, {
      workers: options.workers ?? null,
      workerEntry: options.workerEntry ?? null,
      judgingFolded: job.data.judgingFolded,
      start: job.start,
      ...(options.onProgress ? { onProgress: options.onProgress } : {}),
    }),
  );
  return finishJob(job, search, options);
}
