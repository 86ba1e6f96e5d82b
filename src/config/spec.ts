/**
 * Every config key the validator accepts, with its rule, default and description, as data.
 * The validator walks this table; a test walks it against schema/neuron-budget.schema.json
 * so the two cannot drift apart.
 */

import { AUTO_MAX_CLASSES } from '../common/metric.js';

/** Marks a key the user must give. */
export const REQUIRED = Symbol('required');
/** Marks a key whose default depends on another key (the description says how). */
export const DERIVED = Symbol('derived');

export type ValueRule =
  | { kind: 'integer'; min: number; max: number; nullable?: boolean }
  | { kind: 'number'; min: number; max: number; exclusiveMin?: boolean; exclusiveMax?: boolean; nullable?: boolean }
  | { kind: 'enum'; values: readonly string[]; nullable?: boolean }
  | { kind: 'boolean' }
  /** A non-empty text value (a column name). */
  | { kind: 'text' }
  /** A single character other than a quote or a line break. */
  | { kind: 'character' }
  /** A path, relative to the config file's folder, that must stay inside the workspace. */
  | { kind: 'path' }
  /** A list of distinct non-empty texts, with at least `minItems` of them. */
  | { kind: 'text-list'; minItems: number; nullable?: boolean }
  /** A recall floor: a number in (0, 1] for every class, or a mapping of class labels to such numbers. */
  | { kind: 'recall'; nullable?: boolean };

export type DefaultValue = string | number | boolean | null | string[] | typeof REQUIRED | typeof DERIVED;

export interface KeySpec {
  /** Kebab-case name as written in the file; the typed config calls it by its camelCase form. */
  name: string;
  /**
   * Whether the key changes the search's answer. Two runs that differ in such a key answer
   * different questions, so the gate says so (gate/settings.ts). Keys that only change how long
   * the search takes (workers, time budget), where the data file lives (the data are compared by
   * content), or how the answer is judged (gate) do not.
   */
  changesResult: boolean;
  rule: ValueRule;
  default: DefaultValue;
  description: string;
}

export interface SectionSpec {
  name: 'data' | 'target' | 'search' | 'gate';
  required: boolean;
  description: string;
  keys: readonly KeySpec[];
}

/** Largest width the search may try: the gate is for small networks on small devices. */
const WIDTH_LIMIT = 1024;
const EPOCH_LIMIT = 10_000_000;

export const CONFIG_SPEC: readonly SectionSpec[] = [
  {
    name: 'data',
    required: true,
    description: 'The CSV file the networks learn from and how to read it.',
    keys: [
      {
        name: 'path',
        changesResult: false,
        rule: { kind: 'path' },
        default: REQUIRED,
        description: 'CSV file with a header row, relative to this config file. Must stay inside the workspace.',
      },
      {
        name: 'target',
        changesResult: true,
        rule: { kind: 'text' },
        default: REQUIRED,
        description: 'Column to predict.',
      },
      {
        name: 'features',
        changesResult: true,
        rule: { kind: 'text-list', minItems: 1, nullable: true },
        default: null,
        description: 'Columns used as inputs. Default: every column except the target and the ignored ones.',
      },
      {
        name: 'ignore',
        changesResult: true,
        rule: { kind: 'text-list', minItems: 0 },
        default: [],
        description: 'Columns never used as inputs (identifiers, timestamps).',
      },
      {
        name: 'task',
        changesResult: true,
        rule: { kind: 'enum', values: ['auto', 'classification', 'regression'] },
        default: 'auto',
        description: `auto: decided from the target column: text, or numbers with at most ${AUTO_MAX_CLASSES} distinct values, is classification; other numbers are regression.`,
      },
      {
        name: 'validation',
        changesResult: true,
        rule: { kind: 'number', min: 0, max: 1, exclusiveMax: true },
        default: 0.25,
        description:
          'Fraction of rows (per class) held out to steer training: when a training stops, and whether a pruning step is kept. 0 steers on the training rows.',
      },
      {
        name: 'judging',
        changesResult: true,
        rule: { kind: 'number', min: 0, max: 1, exclusiveMax: true },
        default: DERIVED,
        description:
          'Fraction of rows (per class) held out to judge whether a network meets the target; they never steer training. Default: 0.2 (at most half of what validation leaves), or 0 when data.validation is 0 (then the target is judged on the training rows). 0 with validation above 0 judges on the validation rows, which is optimistic.',
      },
      {
        name: 'delimiter',
        changesResult: true,
        rule: { kind: 'character' },
        default: ',',
        description: 'Field separator: one character (write "\\t" in double quotes for a tab).',
      },
      {
        name: 'max-categories',
        changesResult: true,
        rule: { kind: 'integer', min: 1, max: 10_000 },
        default: 20,
        description: 'Most distinct values a text feature may have; each becomes one input.',
      },
      {
        name: 'missing',
        changesResult: true,
        rule: { kind: 'enum', values: ['error', 'drop'] },
        default: 'error',
        description: 'An empty feature value: error stops with its location; drop skips the row and counts it.',
      },
    ],
  },
  {
    name: 'target',
    required: true,
    description: 'What a network must reach on the validation rows.',
    keys: [
      {
        name: 'metric',
        changesResult: true,
        rule: { kind: 'enum', values: ['accuracy', 'rmse', 'mae', 'max-abs-error'] },
        default: DERIVED,
        description:
          'accuracy for classification; rmse, mae or max-abs-error for regression. Default: follows the task, accuracy for classification and rmse for regression (with data.task auto, the task found in the data).',
      },
      {
        name: 'threshold',
        changesResult: true,
        rule: { kind: 'number', min: 0, max: Number.MAX_VALUE, exclusiveMin: true },
        default: REQUIRED,
        description:
          "accuracy: at least this (above 0, at most 1); error metrics: at most this, in the target column's units. Checked against the metric in effect: with data.task auto and no target.metric, once the data show the task.",
      },
      {
        name: 'precision',
        changesResult: true,
        rule: { kind: 'enum', values: ['float32', 'int8'] },
        default: 'float32',
        description:
          'Which form of a network must meet the target: float32, or int8 (its post-training quantised form, as the exported C runs it).',
      },
      {
        name: 'min-recall',
        changesResult: true,
        rule: { kind: 'recall', nullable: true },
        default: null,
        description:
          'Classification: the least recall a network needs besides the metric, for every class (a number) or per named class (a mapping, e.g. bearing_wear: 0.9). null: none.',
      },
    ],
  },
  {
    name: 'search',
    required: false,
    description: 'How the smallest adequate width is searched for.',
    keys: [
      {
        name: 'min-width',
        changesResult: true,
        rule: { kind: 'integer', min: 1, max: WIDTH_LIMIT },
        default: 1,
        description: 'First width the growth phase tries.',
      },
      {
        name: 'max-width',
        changesResult: true,
        rule: { kind: 'integer', min: 1, max: WIDTH_LIMIT },
        default: 16,
        description: 'Last width the growth phase tries; at least min-width.',
      },
      {
        name: 'restarts',
        changesResult: true,
        rule: { kind: 'integer', min: 1, max: 1000 },
        default: 10,
        description: 'Seeded trainings per width.',
      },
      {
        name: 'required',
        changesResult: true,
        rule: { kind: 'integer', min: 1, max: 1000 },
        default: 3,
        description:
          'Trainings per width that must reach the target for the width to count as adequate; at most restarts.',
      },
      {
        name: 'max-epochs',
        changesResult: true,
        rule: { kind: 'integer', min: 1, max: EPOCH_LIMIT },
        default: 3000,
        description: 'Epochs after which one training gives up.',
      },
      {
        name: 'seed',
        changesResult: true,
        rule: { kind: 'integer', min: 0, max: 4_294_967_295 },
        default: 1,
        description: 'Base seed of every random choice (split, initial weights); same seed, same result.',
      },
      {
        name: 'growth',
        changesResult: true,
        rule: { kind: 'enum', values: ['fresh', 'in-place'] },
        default: 'fresh',
        description: 'fresh: new seeded networks at each width; in-place: add neurons to the networks already trained.',
      },
      {
        name: 'start',
        changesResult: false,
        rule: { kind: 'enum', values: ['baseline', 'min-width'] },
        default: 'baseline',
        description:
          'baseline: with a baseline of the same settings, decide its width and the one below first, and move only as far as the answer needs; min-width: try every width from min-width up.',
      },
      {
        name: 'activation',
        changesResult: true,
        rule: { kind: 'enum', values: ['tanh', 'logistic', 'relu'] },
        default: 'tanh',
        description: 'Hidden-layer activation function.',
      },
      {
        name: 'optimizer',
        changesResult: true,
        rule: { kind: 'enum', values: ['lbfgs', 'irprop+', 'adam', 'backprop'] },
        default: 'lbfgs',
        description:
          'lbfgs (full-batch L-BFGS with a strong Wolfe line search), irprop+ (full batch), adam, or backprop (backpropagation with momentum).',
      },
      {
        name: 'weight-decay',
        changesResult: true,
        rule: { kind: 'number', min: 0, max: 1000 },
        default: 0.0001,
        description:
          'L2 penalty on the weights (not the biases): the summed loss gains weight-decay/2 × the sum of squared weights. 0 turns it off.',
      },
      {
        name: 'init',
        changesResult: true,
        rule: { kind: 'enum', values: ['nguyen-widrow', 'glorot', 'he'], nullable: true },
        default: null,
        description: 'Initial weights. Default (null): Nguyen-Widrow for tanh and logistic, He for relu.',
      },
      {
        name: 'check-every',
        changesResult: true,
        rule: { kind: 'integer', min: 1, max: EPOCH_LIMIT },
        default: 10,
        description: 'Epochs between checks of the validation rows; at most max-epochs.',
      },
      {
        name: 'patience',
        changesResult: true,
        rule: { kind: 'integer', min: 1, max: EPOCH_LIMIT },
        default: 200,
        description:
          'A training stops when its validation loss has not improved (by 0.1%) for this many epochs: early stopping, and the bound on polishing a network that met the target.',
      },
      {
        name: 'prune',
        changesResult: true,
        rule: { kind: 'boolean' },
        default: true,
        description: 'Whether to remove hidden neurons from the adequate network while it still reaches the target.',
      },
      {
        name: 'prune-epochs',
        changesResult: true,
        rule: { kind: 'integer', min: 0, max: EPOCH_LIMIT },
        default: 200,
        description: 'Epochs of retraining after each neuron removed.',
      },
      {
        name: 'time-budget',
        changesResult: false,
        rule: { kind: 'number', min: 0, max: 31_536_000, exclusiveMin: true, nullable: true },
        default: null,
        description: 'Wall-clock seconds the search may take; when spent the verdict is inconclusive. null: no limit.',
      },
      {
        name: 'max-trainings',
        changesResult: true,
        rule: { kind: 'integer', min: 1, max: 100_000_000, nullable: true },
        default: null,
        description: 'Most trainings the search may run; when spent the verdict is inconclusive. null: no limit.',
      },
      {
        name: 'workers',
        changesResult: false,
        rule: { kind: 'integer', min: 1, max: 256, nullable: true },
        default: null,
        description: 'Worker threads. null: one per available CPU core. Results do not depend on it.',
      },
    ],
  },
  {
    name: 'gate',
    required: false,
    description: 'How the result is judged against the committed baseline and the device budget.',
    keys: [
      {
        name: 'baseline',
        changesResult: false,
        rule: { kind: 'path' },
        default: 'neuron-budget.baseline.json',
        description: 'Baseline file, relative to this config file. Must stay inside the workspace.',
      },
      {
        name: 'max-width',
        changesResult: false,
        rule: { kind: 'integer', min: 1, max: WIDTH_LIMIT, nullable: true },
        default: null,
        description: 'Hard device budget: a smallest adequate width above it fails. null: no budget.',
      },
      {
        name: 'max-flash-bytes',
        changesResult: false,
        rule: { kind: 'integer', min: 1, max: 1_000_000_000, nullable: true },
        default: null,
        description:
          'Device budget: flash bytes for the weights of the witness in target.precision form (as the exported C stores them); above it fails. null: no budget.',
      },
      {
        name: 'max-ram-bytes',
        changesResult: false,
        rule: { kind: 'integer', min: 1, max: 1_000_000_000, nullable: true },
        default: null,
        description:
          'Device budget: RAM bytes for the activations of one inference in target.precision form; above it fails. null: no budget.',
      },
      {
        name: 'max-macs',
        changesResult: false,
        rule: { kind: 'integer', min: 1, max: 1_000_000_000_000, nullable: true },
        default: null,
        description: 'Device budget: multiply-accumulates per inference; above it fails. null: no budget.',
      },
      {
        name: 'allowed-growth',
        changesResult: false,
        rule: { kind: 'integer', min: 0, max: WIDTH_LIMIT },
        default: 0,
        description: 'Neurons the width may grow over the baseline before the verdict is fail.',
      },
      {
        name: 'metric-tolerance',
        changesResult: false,
        rule: { kind: 'number', min: 0, max: Number.MAX_VALUE },
        // 0.02 is common practice for "noticeably worse" with a few hundred validation rows; no source.
        default: 0.02,
        description:
          'How much worse the metric at the chosen width may get against the baseline before it is flagged (accuracy: below 1).',
      },
    ],
  },
];
