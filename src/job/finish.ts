/**
 * What every stage that ends in a search result does last (check, baseline, merge): compare
 * with the baseline, assemble the report, write the witness and the report, and render the screens.
 */
import { EXIT } from '../common/exit-codes.js';
import { displayPath } from '../common/paths.js';
import { costShapeOf, deviceCost } from '../device/index.js';
import { writeOutput } from '../files/output.js';
import { runGateStage, type BaselineRecord, type Verdict } from '../gate/index.js';
import { modelDocument, serializeModel } from '../model/index.js';
import { dataStageReport, searchStageReport } from '../report/assemble.js';
import { renderMarkdown, renderText, withGate, type RenderContext, type Report } from '../report/index.js';
import type { SearchResult } from '../search/types.js';
import { TOOL_VERSION } from '../version.js';
import type { PreparedJob } from './prepare.js';

export interface FinishOptions {
  mode: 'check' | 'baseline';
  /** Where to write the JSON report (absolute), or null. */
  reportPath?: string | null;
  /** Where to write the witness network (absolute), or null. */
  modelPath?: string | null;
  /** Commit the data came from, for the baseline history. */
  commit?: string | null;
  /** Who shows the result (for hints that fit): the command line or the action. */
  surface?: RenderContext['surface'];
  /** The config file as the user named it, for commands in hints; null or absent when it was the default. */
  configShown?: string | null;
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

export async function finishJob(job: PreparedJob, search: SearchResult, options: FinishOptions): Promise<JobResult> {
  const { config, data, timing } = job;
  timing.growthSeconds = search.timing.growthSeconds;
  timing.pruneSeconds = search.timing.pruneSeconds;
  const cost = search.witness === null ? null : deviceCost(costShapeOf(search.witness.network, data.dataset.encoding));
  const gate = await runGateStage({
    mode: options.mode,
    result: search,
    cost,
    loaded: data,
    config,
    baselinePath: job.baselinePath,
    baselineShown: job.baselineShown,
    previous: job.previous,
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
    baselineFile: job.baselineFile,
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
