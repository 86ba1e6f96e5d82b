/**
 * Assembles the JSON report, stage by stage: the data stage's facts, then the search's
 * findings (the gate's part is filled by withGate in json.ts). Pure.
 */
import type { Config, TargetConfig } from '../config/types.js';
import { costShapeOf, deviceCost } from '../device/index.js';
import type { Encoding, LoadedData } from '../data/types.js';
import { displayPath } from '../common/paths.js';
import type { SearchResult, TrainingTask } from '../search/types.js';
import { TOOL_NAME, TOOL_VERSION } from '../version.js';
import type { ReportDevice, ReportDraft, ReportSource, ReportWitness } from './types.js';

/** The report with the data stage's facts; verdict and search come later. */
export function dataStageReport(config: Config, data: LoadedData, timing: Record<string, number>): ReportDraft {
  const ds = data.dataset;
  const classes = data.profile.classes;
  return {
    schema: 'neuron-budget/report@2',
    tool: { name: TOOL_NAME, version: TOOL_VERSION },
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
      judgingRows: ds.judgingRows,
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
      targetSpread: data.targetSpread,
    },
    search: null,
    device: null,
    changes: null,
    timing: { ...timing },
  };
}

/** The data-stage report with the search's findings filled in (verdict and baseline come from the gate). */
export function searchStageReport(
  report: ReportDraft,
  search: SearchResult,
  required: number,
  context: { encoding: Encoding; target: TargetConfig },
): ReportDraft {
  const { encoding } = context;
  const costOf = (width: number) =>
    deviceCost(costShapeOf({ inputs: report.data.inputs, width, outputs: report.data.outputs }, encoding));
  return {
    ...report,
    device: deviceOf(search, context, report.data.inputs, report.data.outputs),
    reasons: [],
    width: search.width,
    metric: { ...report.metric, value: search.metric },
    search: {
      outcome: search.outcome,
      grownWidth: search.grownWidth,
      required,
      widths: search.widths.map((w) => ({ ...w, cost: costOf(w.width) })),
      pruning: search.pruning.map((p) => ({ ...p, source: shownSource(p.source) })),
      trainings: search.trainings,
      notes: search.notes,
      judging: search.judging,
      start: search.start,
      witness: witnessOf(search),
    },
  };
}

/** Restarts are 0-based inside the search (they seed its streams) and counted from 1 on every screen and file. */
function shownSource(task: TrainingTask): ReportSource {
  return { width: task.width, restart: task.restart + 1 };
}

function witnessOf(search: SearchResult): ReportWitness | null {
  const w = search.witness;
  if (w === null) return null;
  return {
    width: w.network.width,
    how: w.how,
    source: shownSource(w.source),
    judged: w.judged,
    steering: w.steering,
    train: w.train,
    met: w.met,
    adequate: search.width !== null,
  };
}

function deviceOf(
  search: SearchResult,
  context: { encoding: Encoding; target: TargetConfig },
  inputs: number,
  outputs: number,
): ReportDevice | null {
  const w = search.witness;
  const a = search.appraisal;
  if (w === null || a === null) return null;
  const width = w.network.width;
  const labels = context.encoding.target.classes;
  const floors = context.target.recallFloors ?? null;
  const finite = (v: number | undefined): number | null => (v === undefined || !Number.isFinite(v) ? null : v);
  return {
    precision: context.target.precision ?? 'float32',
    inputs,
    width,
    outputs,
    cost: deviceCost(costShapeOf({ inputs, width, outputs }, context.encoding)),
    metric: { float32: a.float32, int8: a.int8 },
    classes:
      labels === null || a.confusion === null
        ? null
        : labels.map((label, c) => ({
            label,
            rows: a.confusion![c].reduce((s, v) => s + v, 0),
            recall: finite(a.recall?.[c]),
            precision: finite(a.precision?.[c]),
            floor: floors === null || floors[c] <= 0 ? null : floors[c],
          })),
    confusion: a.confusion,
  };
}
