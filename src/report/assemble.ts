/**
 * Assembles the JSON report, stage by stage: the data stage's facts, then the search's
 * findings (the gate's part is filled by withGate in json.ts). Pure.
 */
import type { Config } from '../config/types.js';
import type { LoadedData } from '../data/types.js';
import { displayPath } from '../common/paths.js';
import type { SearchResult, TrainingTask } from '../search/types.js';
import { TOOL_NAME, TOOL_VERSION } from '../version.js';
import type { ReportDraft, ReportSource, ReportWitness } from './types.js';

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
    },
    search: null,
    changes: null,
    timing: { ...timing },
  };
}

/** The data-stage report with the search's findings filled in (verdict and baseline come from the gate). */
export function searchStageReport(report: ReportDraft, search: SearchResult, required: number): ReportDraft {
  return {
    ...report,
    reasons: [],
    width: search.width,
    metric: { ...report.metric, value: search.metric },
    search: {
      outcome: search.outcome,
      grownWidth: search.grownWidth,
      required,
      widths: search.widths,
      pruning: search.pruning.map((p) => ({ ...p, source: shownSource(p.source) })),
      trainings: search.trainings,
      notes: search.notes,
      judging: search.judging,
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
