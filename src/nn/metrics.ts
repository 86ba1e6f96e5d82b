/** Metrics of a network's logits against encoded targets. Regression errors are in the target's original units. */
import type { MetricName } from '../config/types.js';
import { HEAD_LINEAR, HEAD_LOGISTIC, rowLoss } from './kernel/reference.js';

export interface Metrics {
  /** Mean per-row loss (cross-entropy for classification, ½·squared error in standardised units for regression). */
  loss: number;
  /** Classification only (NaN for regression). */
  accuracy: number;
  /** Regression only (NaN for classification), in original units. */
  rmse: number;
  mae: number;
  maxAbsError: number;
}

export function computeMetrics(
  head: number,
  K: number,
  logits: Float64Array,
  y: Float64Array,
  rows: number,
  targetStd: number,
): Metrics {
  let loss = 0;
  for (let p = 0; p < rows; p++) loss += rowLoss(head, K, logits, p * K, y[p]);
  loss /= rows;
  const metric = (name: MetricName): number => targetMetric(name, head, K, logits, y, rows, targetStd);
  if (head === HEAD_LINEAR) {
    return { loss, accuracy: NaN, rmse: metric('rmse'), mae: metric('mae'), maxAbsError: metric('max-abs-error') };
  }
  // A network whose loss is not finite has no accuracy.
  return { loss, accuracy: Number.isFinite(loss) ? metric('accuracy') : NaN, rmse: NaN, mae: NaN, maxAbsError: NaN };
}

/** One metric without building the whole record (used inside the epoch loop). */
export function targetMetric(
  name: MetricName,
  head: number,
  K: number,
  logits: Float64Array,
  y: Float64Array,
  rows: number,
  targetStd: number,
): number {
  if (name === 'accuracy') {
    if (head === HEAD_LINEAR) return NaN;
    let correct = 0;
    for (let p = 0; p < rows; p++) {
      let cls = 0;
      if (head === HEAD_LOGISTIC) {
        const z = logits[p];
        if (z !== z) return NaN;
        cls = z > 0 ? 1 : 0;
      } else {
        const o = p * K;
        for (let k = 0; k < K; k++) if (logits[o + k] !== logits[o + k]) return NaN;
        for (let k = 1; k < K; k++) if (logits[o + k] > logits[o + cls]) cls = k;
      }
      if (cls === y[p]) correct++;
    }
    return correct / rows;
  }
  if (head !== HEAD_LINEAR) return NaN;
  let se = 0;
  let ae = 0;
  let maxAe = 0;
  for (let p = 0; p < rows; p++) {
    const d = (logits[p] - y[p]) * targetStd;
    const a = d < 0 ? -d : d;
    se += d * d;
    ae += a;
    if (a > maxAe || a !== a) maxAe = a;
  }
  return name === 'rmse' ? Math.sqrt(se / rows) : name === 'mae' ? ae / rows : maxAe;
}

export function metricValue(m: Metrics, name: MetricName): number {
  switch (name) {
    case 'accuracy':
      return m.accuracy;
    case 'rmse':
      return m.rmse;
    case 'mae':
      return m.mae;
    case 'max-abs-error':
      return m.maxAbsError;
  }
}
