import type { Task } from '../config/types.js';

/** How one input column becomes network inputs; enough to run a model on raw rows. */
export type FeatureEncoding =
  | { kind: 'numeric'; name: string; mean: number; std: number }
  | { kind: 'categorical'; name: string; categories: string[] };

export interface TargetEncoding {
  name: string;
  task: Task;
  /** Classification: class labels in index order (stable: sorted by label). */
  classes: string[] | null;
  /** Regression: y_encoded = (y - mean) / std; metrics are reported in original units. */
  mean: number;
  std: number;
}

export interface Encoding {
  /** In input order; a categorical feature takes categories.length consecutive inputs. */
  features: FeatureEncoding[];
  target: TargetEncoding;
}

/**
 * The data as the networks see it. Arrays are row-major and allocated on
 * SharedArrayBuffer so worker threads read them without copies.
 */
export interface EncodedDataset {
  task: Task;
  /** Network inputs after encoding (D). */
  inputs: number;
  /** Network output units: classes for 3+ classes, 1 for two classes (logistic), 1 for regression. */
  outputs: number;
  trainRows: number;
  /** Rows that steer training; 0 when data.validation is 0 (then the training rows steer). */
  validationRows: number;
  /**
   * Rows that judge whether a network meets the target, never seen by training; 0 when
   * data.judging is 0 (then the validation rows judge, or the training rows when there are none).
   */
  judgingRows: number;
  xTrain: Float64Array; // trainRows * inputs
  /** Classification: class index per row; regression: standardised target per row. */
  yTrain: Float64Array; // trainRows
  xValidation: Float64Array; // validationRows * inputs
  yValidation: Float64Array; // validationRows
  xJudging: Float64Array; // judgingRows * inputs
  yJudging: Float64Array; // judgingRows
  /**
   * The rows that judge (judging rows, else validation rows, else training rows) as a device gets
   * them: rows × features, float32, a numeric feature's raw value or a categorical feature's index.
   * Optional: datasets built in code without raw rows cannot judge an int8 form.
   */
  rawJudged?: Float32Array;
  encoding: Encoding;
}

export interface NumericProfile {
  kind: 'numeric';
  mean: number;
  std: number;
  min: number;
  max: number;
  missing: number;
}

export interface CategoricalProfile {
  kind: 'categorical';
  /** Count per category, keys sorted; a null-prototype object (the keys are the file's strings). */
  counts: Record<string, number>;
  missing: number;
}

/** A summary of the data as used, for comparison with the baseline's. */
export interface DataProfile {
  rows: number;
  /** Rows per class (classification), keys sorted; null for regression. Null-prototype, as every table here. */
  classes: Record<string, number> | null;
  /** Every column used (features and target) in file order. */
  columns: string[];
  /** Per feature, keyed by column name (null-prototype). */
  features: Record<string, NumericProfile | CategoricalProfile>;
}

/** The spread of a regression target over the rows used, in its own units: the scale an error threshold is read against. */
export interface TargetSpread {
  mean: number;
  /** Population standard deviation (as the profile's); a network predicting the mean has about this rmse. */
  std: number;
  min: number;
  max: number;
}

export interface LoadedData {
  dataset: EncodedDataset;
  /** Rows kept after dropping rows with missing values (when allowed). */
  rows: number;
  droppedRows: number;
  /** sha256 hex of the canonical form of the data as used. */
  fingerprint: string;
  profile: DataProfile;
  /** Regression: the target's spread over every row used (training, validation and judging); null for classification. */
  targetSpread: TargetSpread | null;
  /**
   * Which kept rows (0-based, file order) went to training and to validation, both
   * ascending; dataset row i of xTrain is kept row train[i].
   */
  splitRows?: { train: Int32Array; validation: Int32Array; judging: Int32Array };
  /** data.judging asked for judging rows but a class was too small: judged on the validation rows. */
  judgingFolded: boolean;
}
