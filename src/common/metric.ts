/**
 * The target metrics and what "better" and "meets the target" mean for each: one definition,
 * used by the engine, the search, the gate and every screen.
 */

export type Task = 'classification' | 'regression';
export type MetricName = 'accuracy' | 'rmse' | 'mae' | 'max-abs-error';

/**
 * With data.task auto, a numeric target with at most this many distinct values is read as class
 * labels (0/1/2), any other numeric target as a measurement (a rule of thumb, no source).
 */
export const AUTO_MAX_CLASSES = 10;

const ERROR_METRICS: readonly MetricName[] = ['rmse', 'mae', 'max-abs-error'];

/** A metric and the threshold a network must reach. */
export interface Threshold {
  metric: MetricName;
  /** accuracy: at least this; error metrics: at most this (in the target's units). */
  threshold: number;
}

/** Accuracy is better when higher; the error metrics when lower. */
export function higherIsBetter(metric: MetricName): boolean {
  return metric === 'accuracy';
}

/** True when `value` meets the target (accuracy: ≥ threshold; error metrics: ≤ threshold). NaN never does. */
export function meetsThreshold(value: number, target: Threshold): boolean {
  if (!(value === value)) return false;
  return higherIsBetter(target.metric) ? value >= target.threshold : value <= target.threshold;
}

/** True when `a` is strictly better than `b` for this metric; a finite value beats NaN. */
export function isBetter(metric: MetricName, a: number, b: number): boolean {
  if (!(a === a)) return false;
  if (!(b === b)) return true;
  return higherIsBetter(metric) ? a > b : a < b;
}

/** The metrics that can judge a task. */
export function metricsFor(task: Task): readonly MetricName[] {
  return task === 'classification' ? ['accuracy'] : ERROR_METRICS;
}

export function metricFitsTask(metric: MetricName, task: Task): boolean {
  return metricsFor(task).includes(metric);
}

/** The metric used when the config names none. */
export function defaultMetric(task: Task): MetricName {
  return task === 'regression' ? 'rmse' : 'accuracy';
}

/** "≥" for accuracy, "≤" for the error metrics. */
export function comparator(metric: MetricName): '≥' | '≤' {
  return higherIsBetter(metric) ? '≥' : '≤';
}
