/**
 * The main job shared by the command line and the action: config → data → search → gate →
 * report. This file only orchestrates; each stage lives in its folder.
 */
import { displayPath } from './common/paths.js';
import { EXIT } from './common/exit-codes.js';
import { secondsFromMs } from './common/format.js';
import { loadConfig, settleTarget } from './config/index.js';
import { loadData } from './data/index.js';
import { checkOutputFolder, writeOutput } from './files/output.js';
import { readBaseline, runGateStage, type BaselineRecord, type Verdict } from './gate/index.js';
import { costShapeOf, deviceCost } from './device/index.js';
import { modelDocument, serializeModel } from './model/index.js';
import { dataStageReport, searchStageReport } from './report/assemble.js';
import { dataSummaryText } from './report/data-summary.js';
import { renderMarkdown, renderText, withGate, type RenderContext, type Report } from './report/index.js';
import { runSearch } from './search/index.js';
import type { ProgressEvent } from './search/types.js';
import { TOOL_VERSION } from './version.js';

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
  /** File of the running bundle, started again as the search's worker threads; null: search in this thread. */
  workerEntry?: string | null;
  /** Commit the data came from, for the baseline history. */
  commit?: string | null;
  /** Who shows the result (for hints that fit): the command line or the action. */
  surface?: RenderContext['surface'];
  /** The config file as the user named it, for commands in hints; null or absent when it was the default. */
  configShown?: string | null;
  onProgress?: (event: ProgressEvent) => void;
  /** Plain log lines (phase changes, per-width results); they quote repository strings, escaped. */
  log?: (line: string) => void;
}

export interface JobResult {
  report: Report;
  verdict: Verdict;
  /** Markdown for the pull-request comment (without the hidden marker) and the job summary. */
  markdown: string;
  /** Plain text for a terminal, 80 columns. */
  text: string;
  /** Path of the baseline written, or null. */
  baselineWritten: string | null;
  /**
   * Baseline mode: what was written ({file as the user wrote it, width, historyEntries}) or why
   * nothing was ({notWritten}); null in check mode. The shells print it (report/baseline-record.ts).
   */
  baselineRecord: BaselineRecord | null;
  /** Path of the witness written, or null. */
  modelWritten: string | null;
  /** 0 pass/improved/new, 1 fail/inconclusive. */
  exitCode: typeof EXIT.ok | typeof EXIT.gate;
}

export async function runJob(options: JobOptions): Promise<JobResult> {
  const timing: Record<string, number> = {};

  const loaded = await loadConfig(options.configPath, options.root);
  // Fail on an unwritable output before minutes of work, not after.
  if (options.reportPath) await checkOutputFolder(options.reportPath, 'report', options.root);
  if (options.modelPath) await checkOutputFolder(options.modelPath, 'model', options.root);
  const baselinePath = options.baselinePath ?? loaded.gate.baseline;
  const baselineShown = options.baselinePath
    ? displayPath(loaded.root, options.baselinePath)
    : loaded.gate.baselineAsWritten;
  // A corrupt baseline is the user's to fix before minutes of search, not after.
  const previous = await readBaseline(baselinePath, baselineShown);

  const data = await timed(timing, 'loadSeconds', () => loadData(loaded));
  const config = settleTarget(loaded, data.dataset.task, data.dataset.encoding.target.classes);
  options.log?.(dataSummaryText(config, data, dataStageReport(config, data, timing)));

  const search = await timed(timing, 'searchSeconds', () =>
    runSearch(data.dataset, config.search, config.target, {
      workers: options.workers ?? null,
      workerEntry: options.workerEntry ?? null,
      judgingFolded: data.judgingFolded,
      ...(options.onProgress ? { onProgress: options.onProgress } : {}),
    }),
  );
  timing.growthSeconds = search.timing.growthSeconds;
  timing.pruneSeconds = search.timing.pruneSeconds;

  const cost = search.witness === null ? null : deviceCost(costShapeOf(search.witness.network, data.dataset.encoding));
  const gate = await runGateStage({
    mode: options.mode,
    result: search,
    cost,
    loaded: data,
    config,
    baselinePath,
    baselineShown,
    previous,
    commit: options.commit ?? null,
    date: new Date(),
    toolVersion: TOOL_VERSION,
  });
  const report = withGate(
    searchStageReport(dataStageReport(config, data, timing), search, config.search.required, {
      encoding: data.dataset.encoding,
      target: config.target,
    }),
    gate.outcome,
    gate.gate,
  );

  let modelWritten: string | null = null;
  if (options.modelPath) {
    if (search.witness === null) {
      options.log?.('model not written: no network met the target');
    } else {
      const backing = { on: search.judging.on, adequate: search.width !== null };
      const calibration = { x: data.dataset.xTrain, rows: data.dataset.trainRows };
      const provenance = {
        tool: { name: 'neuron-budget' as const, version: TOOL_VERSION },
        data: data.fingerprint,
        config: displayPath(config.root, config.file),
      };
      const doc = modelDocument(search.witness, data.dataset.encoding, config.target, backing, calibration, provenance);
      await writeOutput(options.modelPath, serializeModel(doc), 'model', config.root);
      modelWritten = options.modelPath;
    }
  }
  if (options.reportPath) {
    await writeOutput(options.reportPath, `${JSON.stringify(report, null, 2)}\n`, 'report', config.root);
  }
  const verdict = report.verdict;
  const context: RenderContext = {
    surface: options.surface ?? 'cli',
    mode: options.mode,
    configShown: options.configShown ?? null,
    baselineFile: displayPath(loaded.root, baselinePath),
    baseline: gate.record,
  };
  return {
    report,
    verdict,
    markdown: renderMarkdown(report, { context }),
    text: renderText(report, context),
    baselineWritten: gate.written,
    baselineRecord: gate.record,
    modelWritten,
    exitCode: verdict === 'fail' || verdict === 'inconclusive' ? EXIT.gate : EXIT.ok,
  };
}

async function timed<T>(timing: Record<string, number>, name: string, work: () => Promise<T>): Promise<T> {
  const start = performance.now();
  try {
    return await work();
  } finally {
    timing[name] = secondsFromMs(performance.now() - start);
  }
}
