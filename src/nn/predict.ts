/** Running a network on encoded rows. */
import type { MetricName } from '../common/metric.js';
import { headCode, headOutputs, makeScratch, referenceForward } from './kernel/reference.js';
import { defaultKernel } from './kernel/select.js';
import { targetMetric } from './metrics.js';
import { fromJson } from './network.js';
import type { NetworkJson } from './types.js';

/** Run a network on encoded rows; returns rows * outputs head outputs (probabilities or standardised values). */
export function predict(net: NetworkJson, x: Float64Array, rows: number): Float64Array {
  const { shape, params } = fromJson(net);
  const K = shape.outputs;
  const logits = new Float64Array(rows * K);
  referenceForward(shape, params, x, rows, logits, null, makeScratch(shape.width, K));
  const out = new Float64Array(rows * K);
  const head = headCode(shape.head);
  for (let p = 0; p < rows; p++) headOutputs(head, K, logits, p * K, out, p * K);
  return out;
}

/** The network's `metric` on encoded rows (regression errors in the target's units, via its std). */
export function metricOn(
  net: NetworkJson,
  x: Float64Array,
  y: Float64Array,
  rows: number,
  metric: MetricName,
  targetStd: number,
): number {
  if (rows === 0) return Number.NaN;
  const { shape, params } = fromJson(net);
  const logits = new Float64Array(rows * shape.outputs);
  defaultKernel().forward(shape, params, x, rows, logits, null);
  return targetMetric(metric, headCode(shape.head), shape.outputs, logits, y, rows, targetStd);
}

/** The class each row is given: the largest logit, or logit > 0 for a logistic head. */
export function classesOn(net: NetworkJson, x: Float64Array, rows: number): Int32Array {
  const { shape, params } = fromJson(net);
  const K = shape.outputs;
  const logits = new Float64Array(rows * K);
  defaultKernel().forward(shape, params, x, rows, logits, null);
  const out = new Int32Array(rows);
  for (let p = 0; p < rows; p++) {
    if (K === 1) out[p] = logits[p] > 0 ? 1 : 0;
    else {
      let best = 0;
      for (let k = 1; k < K; k++) if (logits[p * K + k] > logits[p * K + best]) best = k;
      out[p] = best;
    }
  }
  return out;
}
