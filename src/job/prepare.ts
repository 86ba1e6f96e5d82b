/**
 * What every stage of the main job does first (check, baseline, plan, shard, merge): read the
 * config, check the outputs can be written, read the baseline, load the data, and choose where
 * the growth walk starts. Everything a stage decides from afterwards is in the result.
 */
import { realpathSync } from 'node:fs';
import { resolve } from 'node:path';
import { UserError } from '../common/errors.js';
import { displayPath } from '../common/paths.js';
import { secondsFromMs } from '../common/format.js';
import { loadConfig, settleTarget } from '../config/index.js';
import type { Config } from '../config/types.js';
import { loadData } from '../data/index.js';
import type { LoadedData } from '../data/types.js';
import { checkOutputFolder } from '../files/output.js';
import { readBaseline, resultSettings, settingsDifferences, type Baseline } from '../gate/index.js';
import { dataStageReport } from '../report/assemble.js';
import { dataSummaryText } from '../report/data-summary.js';
import { runSearch, type SearchOptions } from '../search/index.js';
import { chooseStart, type StartChoice } from '../search/start.js';
import type { ProgressEvent, SearchResult } from '../search/types.js';

export interface PrepareOptions {
  /** Absolute path of the config file. */
  configPath: string;
  /** Absolute workspace root no path may leave. */
  root: string;
  /** Override of the config's baseline path (absolute), or null. */
  baselinePath?: string | null;
  /** Output files the stage will write (absolute), checked before any work: [path, what]. */
  outputs?: readonly (readonly [string | null | undefined, string])[];
  /** Files the stage reads besides the config, data and baseline (a plan, parts): [path, what]. */
  reads?: readonly (readonly [string, string])[];
  log?: (line: string) => void;
}

export interface PreparedJob {
  config: Config;
  data: LoadedData;
  /** The baseline read (null when there is none yet). */
  previous: Baseline | null;
  baselinePath: string;
  /** The baseline file as the user wrote it. */
  baselineShown: string;
  /** The baseline file relative to the workspace, for hints. */
  baselineFile: string;
  start: StartChoice;
  /** Wall-clock seconds so far (loadSeconds). */
  timing: Record<string, number>;
}

export async function prepareJob(options: PrepareOptions): Promise<PreparedJob> {
  const timing: Record<string, number> = {};
  const loaded = await loadConfig(options.configPath, options.root);
  // Fail on an unwritable output before minutes of work, not after.
  for (const [path, what] of options.outputs ?? []) if (path) await checkOutputFolder(path, what, options.root);
  const baselinePath = options.baselinePath ?? loaded.gate.baseline;
  const reads: (readonly [string, string])[] = [
    [loaded.file, 'config file'],
    [loaded.data.path, 'data file'],
    [baselinePath, 'baseline file'],
    ...(options.reads ?? []),
  ];
  refuseOverwritingInputs(options.outputs ?? [], reads, loaded.root);
  const baselineShown = options.baselinePath
    ? displayPath(loaded.root, options.baselinePath)
    : loaded.gate.baselineAsWritten;
  // A corrupt baseline is the user's to fix before minutes of search, not after.
  const previous = await readBaseline(baselinePath, baselineShown);

  const data = await timed(timing, 'loadSeconds', () => loadData(loaded));
  const config = settleTarget(loaded, data.dataset.task, data.dataset.encoding.target.classes);
  options.log?.(dataSummaryText(config, data, dataStageReport(config, data, timing)));
  return {
    config,
    data,
    previous,
    baselinePath,
    baselineShown,
    baselineFile: displayPath(loaded.root, baselinePath),
    start: startFor(config, previous),
    timing,
  };
}

/** Same file: the same absolute path, or (when both exist) the same file through a link. */
function sameFile(a: string, b: string): boolean {
  if (resolve(a) === resolve(b)) return true;
  try {
    return realpathSync(a) === realpathSync(b);
  } catch {
    return false;
  }
}

/** An output written over a file the run reads would destroy it (`--report readings.csv`). */
function refuseOverwritingInputs(
  outputs: readonly (readonly [string | null | undefined, string])[],
  reads: readonly (readonly [string, string])[],
  root: string,
): void {
  for (const [out, what] of outputs) {
    if (!out) continue;
    const hit = reads.find(([input]) => sameFile(out, input));
    if (hit !== undefined)
      throw new UserError(
        `${what} file ${displayPath(root, out)} is the ${hit[1]} this run reads; write the ${what} to another file`,
        { file: displayPath(root, out) },
      );
  }
}

/** The stages that end in a report (check, baseline, merge) check its folder, and the model's, first. */
export function prepareReportJob(
  options: PrepareOptions & { reportPath?: string | null; modelPath?: string | null },
): Promise<PreparedJob> {
  return prepareJob({
    ...options,
    outputs: [
      [options.reportPath, 'report'],
      [options.modelPath, 'model'],
    ],
  });
}

/** How a stage runs the search here: threads, the bundle that starts them, progress. */
export interface Running {
  /** Worker threads; null: config, else available parallelism. */
  workers?: number | null;
  /** File of the running bundle, started again as the search's worker threads; null: search in this thread. */
  workerEntry?: string | null;
  onProgress?: (event: ProgressEvent) => void;
}

/** The whole search on the prepared job, timed; `more` adds outcomes computed elsewhere (merge). */
export function searchJob(
  job: PreparedJob,
  running: Running,
  more: Pick<SearchOptions, 'known' | 'onLocalWork'> = {},
): Promise<SearchResult> {
  return timed(job.timing, 'searchSeconds', () =>
    runSearch(job.data.dataset, job.config.search, job.config.target, {
      ...searchOptions(job, running),
      ...more,
    }),
  );
}

/** The search options every stage passes (shard runs its own tasks with them). */
export function searchOptions(job: PreparedJob, running: Running): SearchOptions {
  return {
    workers: running.workers ?? null,
    workerEntry: running.workerEntry ?? null,
    judgingFolded: job.data.judgingFolded,
    start: job.start,
    ...(running.onProgress ? { onProgress: running.onProgress } : {}),
  };
}

/** Where growth starts: at a baseline that answers the same question, else at min-width. */
function startFor(config: Config, previous: Baseline | null): StartChoice {
  const s = config.search;
  return chooseStart({
    start: s.start,
    growth: s.growth,
    minWidth: s.minWidth,
    maxWidth: s.maxWidth,
    baselineWidth: previous === null ? null : (previous.result.grownWidth ?? previous.result.width),
    settingsChanged: previous === null ? [] : settingsDifferences(previous.config.settings, resultSettings(config)),
  });
}

async function timed<T>(timing: Record<string, number>, name: string, work: () => Promise<T>): Promise<T> {
  const start = performance.now();
  try {
    return await work();
  } finally {
    timing[name] = secondsFromMs(performance.now() - start);
  }
}
