/**
 * Per-class figures of a network on a set of rows: the confusion matrix (rows: true class,
 * columns: predicted class), recall and precision per class, and whether recall floors hold.
 * Overall accuracy can hide a rare class that is never caught; these say so.
 */
import type { MetricName } from '../common/metric.js';

/** counts[t][p]: rows of true class t predicted as p. */
export function confusion(predicted: ArrayLike<number>, truth: ArrayLike<number>, classes: number): number[][] {
  const counts = Array.from({ length: classes }, () => new Array<number>(classes).fill(0));
  for (let r = 0; r < truth.length; r++) counts[truth[r]][predicted[r]]++;
  return counts;
}

/** Recall per class: correct / rows of that class; NaN for a class with no rows. */
export function recalls(counts: number[][]): number[] {
  return counts.map((row, c) => {
    const n = row.reduce((s, v) => s + v, 0);
    return n === 0 ? Number.NaN : row[c] / n;
  });
}

/** Precision per class: correct / rows predicted as that class; NaN when none was. */
export function precisions(counts: number[][]): number[] {
  return counts.map((_, c) => {
    const n = counts.reduce((s, row) => s + row[c], 0);
    return n === 0 ? Number.NaN : counts[c][c] / n;
  });
}

/** Every class with a floor above 0 reaches it; a class absent from the rows cannot be checked and passes. */
export function recallsHold(counts: number[][], floors: readonly number[]): boolean {
  const r = recalls(counts);
  return floors.every((min, c) => min <= 0 || Number.isNaN(r[c]) || r[c] >= min);
}

/** The target metric from predictions: class indices (accuracy) or values in the target's units (errors). */
export function metricOfPredictions(
  metric: MetricName,
  predicted: ArrayLike<number>,
  truth: ArrayLike<number>,
): number {
  const n = truth.length;
  if (n === 0) return Number.NaN;
  if (metric === 'accuracy') {
    let correct = 0;
    for (let r = 0; r < n; r++) if (predicted[r] === truth[r]) correct++;
    return correct / n;
  }
  let se = 0;
  let ae = 0;
  let max = 0;
  for (let r = 0; r < n; r++) {
    const d = Math.abs(predicted[r] - truth[r]);
    se += d * d;
    ae += d;
    if (d > max || d !== d) max = d;
  }
  return metric === 'rmse' ? Math.sqrt(se / n) : metric === 'mae' ? ae / n : max;
}
