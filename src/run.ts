/**
 * The main job shared by the command line and the action: config → data → search →
 * gate → report. (Contract stub; integration fills it in.)
 */
import type { ProgressEvent } from './search/types.js';
import type { Report, Verdict } from './report/types.js';

export interface JobOptions {
  /** Absolute path of the config file. */
  configPath: string;
  /** Absolute workspace root no path may leave. */
  root: string;
  mode: 'check' | 'baseline';
  /** Override of the config's baseline path (absolute), or null. */
  baselinePath?: string | null;
  /** Where to write the JSON report (absolute), or null. */
  reportPath?: string | null;
  /** Where to write the witness network (absolute), or null. */
  modelPath?: string | null;
  /** Worker threads; null: config, else available parallelism. */
  workers?: number | null;
  /** Commit the data came from, for the baseline history. */
  commit?: string | null;
  onProgress?: (event: ProgressEvent) => void;
  /** Plain log lines (phase changes, per-width results). */
  log?: (line: string) => void;
}

export interface JobResult {
  report: Report;
  verdict: Verdict | null;
  /** Markdown for the pull-request comment (without the hidden marker) and the job summary. */
  markdown: string;
  /** Plain text for a terminal, 80 columns. */
  text: string;
  /** Path of the baseline written, or null. */
  baselineWritten: string | null;
  /** Path of the witness written, or null. */
  modelWritten: string | null;
  /** 0 pass/improved/new, 1 fail/inconclusive. */
  exitCode: 0 | 1;
}

export declare function runJob(options: JobOptions): Promise<JobResult>;
