import type { MetricName, Task } from '../config/types.js';
import type { TargetSpread } from '../data/types.js';
import type { DeviceCost } from '../device/index.js';
import type { JudgingRows, SearchOutcome, WalkReport, WidthSummary } from '../search/types.js';
import type { BaselineWidth, DataChanges, HistoryEntry } from '../gate/types.js';

export type { Verdict } from '../gate/types.js';
import type { Verdict } from '../gate/types.js';

/**
 * The JSON report (CLI --report, action output `report`). Everything outside `timing`
 * is identical for identical inputs, whatever the machine.
 */
export interface Report {
  schema: 'neuron-budget/report@2';
  tool: { name: 'neuron-budget'; version: string };
  verdict: Verdict;
  reasons: string[];
  width: number | null;
  /** The witness's metric on the rows that judged it (`search.judging`), after its training was polished. */
  metric: { name: MetricName; value: number | null; threshold: number };
  baseline: {
    width: number | null;
    metric: number | null;
    /** Baseline file as written in the config. */
    file?: string;
    /** Networks of the baseline's width that met the target, and the fresh restarts run there. */
    met?: number | null;
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
  gate?: {
    maxWidth: number | null;
    /** Device budgets for the form in `device.precision` (null: none set). */
    maxFlashBytes: number | null;
    maxRamBytes: number | null;
    maxMacs: number | null;
    allowedGrowth: number;
    metricTolerance: number;
    baselineFile: string;
  } | null;
  data: {
    file: string;
    rows: number;
    droppedRows: number;
    trainRows: number;
    validationRows: number;
    judgingRows: number;
    inputs: number;
    outputs: number;
    task: Task;
    fingerprint: string;
    classes: { label: string; count: number }[] | null;
    /**
     * Regression: the target's mean, standard deviation, minimum and maximum over the rows used,
     * in its own units, to read an error threshold against (rmse ≤ 6 on a target whose std is 4
     * admits a network worse than always predicting the mean); null for classification.
     */
    targetSpread: TargetSpread | null;
  };
  search: {
    outcome: SearchOutcome;
    /** Smallest width adequate on fresh restarts alone (where growth stopped); null if none. */
    grownWidth: number | null;
    /** Networks of one width that must meet the target for the width to be adequate (search.required). */
    required: number;
    /** Every width decided, with what a network of that width costs on the device. */
    widths: ReportWidth[];
    pruning: ReportPruneStep[];
    trainings: number;
    /** Why no width is adequate, or how far an unfinished search got. */
    notes: string[];
    judging: JudgingRows;
    /** Where the growth walk began (min-width, or a matching baseline's width) and which widths it decided. */
    start: WalkReport;
    /** The network behind `width` (or, when none is adequate, the best that met the target), or null. */
    witness: ReportWitness | null;
  } | null;
  /** The witness on the device: its cost, its metric in both forms, and per class; null without a witness. */
  device: ReportDevice | null;
  /** Data changes against the baseline (filled by the gate); null without a baseline. */
  changes: DataChanges | null;
  timing: Record<string, number>;
}

/** The report while it is being assembled: everything but the gate's verdict. */
export type ReportDraft = Omit<Report, 'verdict'>;

/** A training as screens and files name it: its width and its restart, counted from 1. */
export interface ReportSource {
  width: number;
  restart: number;
}

export interface ReportPruneStep {
  source: ReportSource;
  /** Width before the removal. */
  width: number;
  /** The neuron removed (0-based index in the network before the step). */
  neuron: number;
  steeringBefore: number;
  steeringAfter: number;
  /** true: the removal was kept; false: it was undone (the steering rows no longer met the target). */
  accepted: boolean;
  judged: number | null;
}

export interface ReportWitness {
  width: number;
  how: 'fresh' | 'pruned';
  source: ReportSource;
  /** On the judging rows (the figure that decides), the steering rows and the training rows. */
  judged: number;
  steering: number;
  train: number;
  met: boolean;
  /** Its width is adequate (false only when no width is: then it is the best network that met the target). */
  adequate: boolean;
}

export interface ReportWidth extends WidthSummary {
  /** What a network of this width costs on the device (src/device/cost.ts). */
  cost: DeviceCost;
}

export interface ReportDevice {
  /** The form that must meet the target (target.precision); the byte budgets apply to it. */
  precision: 'float32' | 'int8';
  inputs: number;
  width: number;
  outputs: number;
  cost: DeviceCost;
  /** The witness's metric on the rows that judged it, in both forms (int8 null without raw rows). */
  metric: { float32: number; int8: number | null };
  /** Classification: per class, on the rows that judged it, in the form that decides. */
  classes:
    { label: string; rows: number; recall: number | null; precision: number | null; floor: number | null }[] | null;
  /** Classification: rows of true class (row) predicted as class (column), in `classes` order. */
  confusion: number[][] | null;
}
