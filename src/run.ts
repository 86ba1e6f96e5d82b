/**
 * The main job shared by the command line and the action: config → data → search →
 * gate → report. Each stage is one function that adds to the job state; for now the job
 * stops after the data stage (the search and gate stages slot in after `dataStage`).
 */
import { stat } from 'node:fs/promises';
import { dirname } from 'node:path';
import { displayPath, keyPosition, loadConfig } from './config/index.js';
import type { Config, MetricName, Task } from './config/types.js';
import { loadData } from './data/index.js';
import type { LoadedData } from './data/types.js';
import { UserError } from './errors.js';
import { writeFileAtomic } from './files/atomic.js';
import type { Report, Verdict } from './report/types.js';
import { readBaseline, runGateStage } from './gate/index.js';
import { modelDocument, serializeModel } from './model/index.js';
import { renderMarkdown, renderText, withGate } from './report/index.js';
import { runSearch } from './search/index.js';
import type { ProgressEvent, SearchResult } from './search/types.js';
import { TOOL_NAME, TOOL_VERSION } from './version.js';

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

export async function runJob(options: JobOptions): Promise<JobResult> {
  const timing: Record<string, number> = {};

  const config = await loadConfig(options.configPath, options.root);
  // Fail on an unwritable output before minutes of work, not after.
  if (options.reportPath) await checkOutputFolder(options.reportPath, 'report', options.root);
  if (options.modelPath) await checkOutputFolder(options.modelPath, 'model', options.root);
  const baselinePath = options.baselinePath ?? config.gate.baseline;
  const baselineShown = options.baselinePath
    ? displayPath(config.root, options.baselinePath)
    : config.gate.baselineAsWritten;
  // A corrupt baseline is the user's to fix before minutes of search, not after.
  const previous = await readBaseline(baselinePath, baselineShown);

  const data = await timed(timing, 'loadSeconds', () => loadData(config));
  await checkMetricFitsTask(config, data.dataset.task);
  options.log?.(dataSummaryText(config, data, dataStageReport(config, data, timing)));

  const search = await timed(timing, 'searchSeconds', () =>
    runSearch(data.dataset, config.search, config.target, {
      workers: options.workers ?? null,
      workerEntry: options.workerEntry ?? null,
      ...(options.onProgress ? { onProgress: options.onProgress } : {}),
    }),
  );
  timing.growthSeconds = search.timing.growthSeconds;
  timing.pruneSeconds = search.timing.pruneSeconds;

  const gate = await runGateStage({
    mode: options.mode,
    result: search,
    loaded: data,
    config,
    baselinePath,
    baselineShown,
    previous,
    commit: options.commit ?? null,
    date: new Date(),
    toolVersion: TOOL_VERSION,
  });
  if (gate.notWritten !== null) options.log?.(`baseline not written: ${gate.notWritten}`);
  const report = withGate(searchStageReport(dataStageReport(config, data, timing), search), gate.outcome, gate.gate);

  let modelWritten: string | null = null;
  if (options.modelPath) {
    if (search.witness === null) {
      options.log?.('model not written: no network reached the target');
    } else {
      const doc = modelDocument(search.witness, data.dataset.encoding, config.target);
      await writeOutput(options.modelPath, serializeModel(doc), 'model', config.root);
      modelWritten = options.modelPath;
    }
  }
  if (options.reportPath)
    await writeOutput(options.reportPath, `${JSON.stringify(report, null, 2)}\n`, 'report', config.root);
  const verdict = report.verdict;
  return {
    report,
    verdict,
    markdown: renderMarkdown(report),
    text: renderText(report),
    baselineWritten: gate.written,
    modelWritten,
    exitCode: verdict === 'fail' || verdict === 'inconclusive' ? 1 : 0,
  };
}

/** The data-stage report with the search's findings filled in (verdict and baseline come from the gate). */
function searchStageReport(report: Report, search: SearchResult): Report {
  return {
    ...report,
    reasons: [],
    width: search.width,
    metric: { ...report.metric, value: search.metric },
    search: {
      outcome: search.outcome,
      grownWidth: search.grownWidth,
      widths: search.widths,
      pruning: search.pruning,
      trainings: search.trainings,
      note: search.note,
    },
  };
}

/** Writes an output file atomically; a refusal by the file system is the user's to fix, not a bug. */
async function writeOutput(path: string, text: string, what: string, root: string): Promise<void> {
  try {
    await writeFileAtomic(path, text);
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    const reasons: Record<string, string> = {
      EACCES: 'permission denied',
      EPERM: 'permission denied',
      EROFS: 'the file system is read-only',
      ENOSPC: 'no space left on the device',
      EISDIR: 'it is a folder',
      ENOENT: 'its folder does not exist',
      ENOTDIR: 'a part of the path is not a folder',
    };
    const reason = code === undefined ? undefined : reasons[code];
    if (reason === undefined) throw error;
    const shown = displayPath(root, path);
    throw new UserError(`${what} file ${shown}: cannot be written (${reason}); nothing was written`, { file: shown });
  }
}

async function timed<T>(timing: Record<string, number>, name: string, work: () => Promise<T>): Promise<T> {
  const start = performance.now();
  try {
    return await work();
  } finally {
    timing[name] = Math.round(performance.now() - start) / 1000;
  }
}

async function checkOutputFolder(path: string, what: string, root: string): Promise<void> {
  const folder = dirname(path);
  const shown = displayPath(root, folder);
  const info = await stat(folder).catch(() => null);
  if (info === null)
    throw new UserError(`${what} file ${displayPath(root, path)}: folder ${shown} does not exist`, {
      file: displayPath(root, path),
    });
  if (!info.isDirectory())
    throw new UserError(`${what} file ${displayPath(root, path)}: ${shown} is not a folder`, {
      file: displayPath(root, path),
    });
  const target = await stat(path).catch(() => null);
  if (target?.isDirectory())
    throw new UserError(`${what} file ${displayPath(root, path)}: is a folder, expected a file name`, {
      file: displayPath(root, path),
    });
}

/** With data.task auto the task is only known after reading; the metric must suit it. */
async function checkMetricFitsTask(config: Config, task: Task): Promise<void> {
  const metric: MetricName = config.target.metric;
  const fits = task === 'classification' ? metric === 'accuracy' : metric !== 'accuracy';
  if (fits) return;
  const shownConfig = displayPath(config.root, config.file);
  const at = await keyPosition(config.file, 'target.metric');
  const where = at ? `${shownConfig}:${at.line}:${at.column}` : shownConfig;
  const hint =
    task === 'classification'
      ? 'set target.metric to accuracy, or data.task to regression'
      : "set target.metric to rmse, mae or max-abs-error (with a threshold in the target's units), or data.task to classification";
  throw new UserError(
    `${where}: target.metric: the target column "${config.data.target}" was read as ${task}, which cannot be judged by ${metric}; ${hint}`,
    { file: shownConfig, key: 'target.metric', ...(at ? { line: at.line, column: at.column } : {}) },
  );
}

function dataStageReport(config: Config, data: LoadedData, timing: Record<string, number>): Report {
  const ds = data.dataset;
  const classes = data.profile.classes;
  return {
    schema: 'neuron-budget/report@1',
    tool: { name: TOOL_NAME, version: TOOL_VERSION },
    verdict: null,
    reasons: [],
    width: null,
    metric: { name: config.target.metric, value: null, threshold: config.target.threshold },
    baseline: null,
    data: {
      file: displayPath(config.root, config.data.path),
      rows: data.rows,
      droppedRows: data.droppedRows,
      trainRows: ds.trainRows,
      validationRows: ds.validationRows,
      inputs: ds.inputs,
      outputs: ds.outputs,
      task: ds.task,
      fingerprint: data.fingerprint,
      classes:
        classes === null
          ? null
          : Object.keys(classes)
              .sort()
              .map((label) => ({ label, count: classes[label] })),
    },
    search: null,
    changes: null,
    timing: { ...timing },
  };
}

// ---- data-stage rendering (moves to src/report once the full renderers cover it) -------

function inputsLine(data: LoadedData): string {
  const features = data.dataset.encoding.features;
  const numeric = features.filter((f) => f.kind === 'numeric').length;
  const categorical = features.filter((f) => f.kind === 'categorical');
  const parts = [`${numeric} numeric`];
  if (categorical.length > 0) {
    const oneHot = categorical
      .map((f) => (f.kind === 'categorical' ? `${f.name} → ${f.categories.length}` : ''))
      .join(', ');
    parts.push(`${categorical.length} categorical (${oneHot})`);
  }
  return `${data.dataset.inputs} after encoding: ${parts.join(', ')}`;
}

function splitLine(config: Config, report: Report): string {
  const d = report.data;
  if (d.validationRows === 0) return `${d.trainRows} training rows, judged on themselves (data.validation is 0)`;
  const how = d.task === 'classification' ? 'stratified by class, ' : '';
  return `${d.trainRows} training / ${d.validationRows} validation (${how}seed ${config.search.seed})`;
}

function dataSummaryText(config: Config, data: LoadedData, report: Report): string {
  const d = report.data;
  const rows: [string, string][] = [
    ['config', displayPath(config.root, config.file)],
    ['data', d.file],
    ['rows', `${d.rows} used${d.droppedRows > 0 ? `, ${d.droppedRows} dropped for missing values` : ''}`],
    ['split', splitLine(config, report)],
    ['inputs', inputsLine(data)],
    [
      'task',
      `${d.task}${d.classes ? `, ${d.classes.length} classes` : ''}; ${d.outputs} network output${d.outputs === 1 ? '' : 's'}`,
    ],
  ];
  if (d.classes) {
    const width = Math.max(...d.classes.map((c) => c.label.length));
    d.classes.forEach((c, i) => {
      const share = ((100 * c.count) / d.rows).toFixed(1);
      rows.push([
        i === 0 ? 'classes' : '',
        `${c.label.padEnd(width)}  ${String(c.count).padStart(7)}  ${share.padStart(5)}%`,
      ]);
    });
  }
  rows.push([
    'target',
    `${report.metric.name} ${report.metric.name === 'accuracy' ? '≥' : '≤'} ${report.metric.threshold}`,
  ]);
  rows.push(['fingerprint', d.fingerprint]);
  const body = rows.map(([k, v]) => `  ${k.padEnd(12)}${v}`).join('\n');
  return `${TOOL_NAME} ${TOOL_VERSION} · data summary\n${body}`;
}
