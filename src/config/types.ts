/**
 * The validated config, every default filled in and every path absolute. Each section has one
 * field per key of src/config/spec.ts, named in camelCase (spec.ts is the only list of keys).
 */
import type { MetricName, Task } from '../common/metric.js';

export type { MetricName, Task } from '../common/metric.js';
export type Activation = 'tanh' | 'logistic' | 'relu';
export type Optimizer = 'lbfgs' | 'irprop+' | 'adam' | 'backprop';
export type Init = 'nguyen-widrow' | 'glorot' | 'he';
export type GrowthMode = 'fresh' | 'in-place';
export type SearchStart = 'baseline' | 'min-width';

export interface DataConfig {
  /** Absolute path of the CSV file. */
  path: string;
  /** Path as written in the config, relative to the config's folder (for messages). */
  pathAsWritten: string;
  target: string;
  /** null: every column but target and ignore. */
  features: string[] | null;
  ignore: string[];
  task: 'auto' | Task;
  /** Fraction held out to steer training, in [0, 1); 0 steers on the training rows. */
  validation: number;
  /** Fraction held out to judge the target, in [0, 1); 0 judges on the validation rows (training rows when validation is 0). */
  judging: number;
  delimiter: string;
  /** Most distinct values a categorical feature may have. */
  maxCategories: number;
  /** What to do with a row whose feature value is empty. */
  missing: 'error' | 'drop';
}

/** target.min-recall as written: one floor for every class, or floors for named classes. */
export type RecallRule = { every: number } | { classes: { label: string; min: number }[] };

export interface TargetConfig {
  metric: MetricName;
  /** accuracy: at least this; error metrics: at most this (in the target's units). */
  threshold: number;
  /** Which form of a network must meet the target; the config always fills it (absent: float32). */
  precision?: 'float32' | 'int8';
  /** The least recall per class, as written; null or absent: none. */
  minRecall?: RecallRule | null;
  /**
   * The least recall per class index, once the data named the classes (0 where none applies);
   * null for regression or without target.min-recall.
   */
  recallFloors?: number[] | null;
}

export interface SearchConfig {
  minWidth: number;
  maxWidth: number;
  restarts: number;
  required: number;
  maxEpochs: number;
  seed: number;
  growth: GrowthMode;
  /** Where growth begins: at the matching baseline's width when there is one, or always at min-width. */
  start: SearchStart;
  activation: Activation;
  optimizer: Optimizer;
  /** null: the activation's usual initialisation (Nguyen-Widrow for tanh/logistic, He for ReLU). */
  init: Init | null;
  /** The validation (steering) rows are checked every this many epochs. */
  checkEvery: number;
  /** Epochs without a real improvement of the validation loss before a training stops. */
  patience: number;
  /** L2 penalty λ on the weights. */
  weightDecay: number;
  /** Epochs of retraining after each pruning step. */
  pruneEpochs: number;
  /** Whether to run the prune phase at all. */
  prune: boolean;
  /** Overall wall-clock budget in seconds; null = none. */
  timeBudget: number | null;
  /** Cap on the number of trainings; null = none. */
  maxTrainings: number | null;
  /** Worker threads; null = the machine's available parallelism. */
  workers: number | null;
}

export interface GateConfig {
  /** Absolute path of the baseline file. */
  baseline: string;
  baselineAsWritten: string;
  /** Hard device budget; null = none. */
  maxWidth: number | null;
  /** Neurons the width may grow over the baseline before the verdict is fail. */
  allowedGrowth: number;
  /** How much worse the metric at the chosen width may get before it is flagged. */
  metricTolerance: number;
  /** Device budgets in bytes and operations (target.precision form); null = none. */
  maxFlashBytes: number | null;
  maxRamBytes: number | null;
  maxMacs: number | null;
}

/** Where a key is written in the config file. */
export interface KeyPosition {
  line: number;
  column: number;
}

export interface Config {
  /** Absolute path of the config file. */
  file: string;
  /** Absolute workspace root that no path may leave. */
  root: string;
  data: DataConfig;
  target: TargetConfig;
  search: SearchConfig;
  gate: GateConfig;
  /** Where each written section and key is (dotted key, e.g. `target.metric`), from the one parse. */
  positions: ReadonlyMap<string, KeyPosition>;
  /** Whether target.metric was written; if not, it follows the task found in the data. */
  metricGiven: boolean;
}
