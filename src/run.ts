/**
 * The main job shared by the command line and the action: config → data → search → gate →
 * report. This file only orchestrates; each stage lives in its folder (job/ has the steps every
 * stage shares, and the matrix stages plan, shard and merge).
 */
import { finishJob, type FinishOptions, type JobResult } from './job/finish.js';
import { prepareReportJob, searchJob, type Running } from './job/prepare.js';

export type { JobResult } from './job/finish.js';

export interface JobOptions extends FinishOptions, Running {
  /** Absolute path of the config file. */
  configPath: string;
  /** Absolute workspace root no path may leave. */
  root: string;
  /** Override of the config's baseline path (absolute), or null. */
  baselinePath?: string | null;
  /** Plain log lines (phase changes, per-width results); they quote repository strings, escaped. */
  log?: (line: string) => void;
}

export async function runJob(options: JobOptions): Promise<JobResult> {
  const job = await prepareReportJob(options);
  return finishJob(job, await searchJob(job, options), options);
}
