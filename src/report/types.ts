import type { MetricName, Task } from '../config/types.js';
import type { PruneStep, SearchOutcome, WidthSummary } from '../search/types.js';
import type { BaselineWidth, DataChanges, HistoryEntry } from '../gate/types.js';

export type { Verdict } from '../gate/types.js';
import type { Verdict } from '../gate/types.js';

/**
 * The JSON report (CLI --report, action output `report`). Everything outside `timing`
 * is identical for identical inputs, whatever the machine.
 */
export interface Report {
  schema: 'neuron-budget/report@1';
  tool: { name: 'neuron-budget'; version: string };
  verdict: Verdict;
  reasons: string[];
  width: number | null;
  metric: { name: MetricName; value: number | null; threshold: number };
  baseline: {
    width: number | null;
    metric: number | null;
    /** Baseline file as written in the config. */
    file?: string;
    /** Success at the baseline's width: restarts that reached the target, restarts run. */
    reached?: number | null;
    restarts?: number | null;
    rows?: number;
    /** Search time recorded in the baseline file (an input, so not a figure of this run). */
    searchSeconds?: number | null;
    toolVersion?: string;
    /** false when the result-changing settings differ from the baseline's. */
    sameSettings?: boolean;
    /** Settings that differ, as `key: before → after`. */
    settingsChanged?: string[];
    widths?: BaselineWidth[];
    history?: HistoryEntry[];
  } | null;
  /** Gate settings the verdict was judged with (filled by the gate). */
  gate?: { maxWidth: number | null; allowedGrowth: number; metricTolerance: number; baselineFile: string } | null;
  data: {
    file: string;
    rows: number;
    droppedRows: number;
    trainRows: number;
    validationRows: number;
    inputs: number;
    outputs: number;
    task: Task;
    fingerprint: string;
    classes: { label: string; count: number }[] | null;
  };
  search: {
    outcome: SearchOutcome | null;
    grownWidth: number | null;
    widths: WidthSummary[];
    pruning: PruneStep[];
    trainings: number;
    note: string | null;
  } | null;
  /** Data changes against the baseline (filled by the gate); null without a baseline. */
  changes: DataChanges | null;
  timing: Record<string, number>;
}

/** The report while it is being assembled: everything but the gate's verdict. */
export type ReportDraft = Omit<Report, 'verdict'>;
