/**
 * Changing a trained network's width without changing what it computes more than it must:
 * a new neuron enters with zero outgoing weights; a removed neuron's mean activation is folded
 * into the output biases (compensated ablation), and the saliency of every neuron is the exact
 * loss increase that removal causes, computed in one pass over the training rows.
 */
import type { EncodedDataset } from '../data/types.js';
import type { Kernel } from './kernel/kernel.js';
import { layoutOf, type Shape } from './kernel/layout.js';
import { rowLoss } from './kernel/reference.js';
import { initHiddenNeuron, resizeIndexMap, resizeParams } from './network.js';
import type { Init } from '../config/types.js';
import type { Rng } from './types.js';

/** The new shape and parameters after a resize, and where each old parameter went (−1: dropped). */
export interface Resized {
  shape: Shape;
  params: Float64Array;
  map: Int32Array;
}

/** Hidden activations of every training row (rows × width); the logits go into `logits`. */
function hiddenActivations(
  kernel: Kernel,
  shape: Shape,
  params: Float64Array,
  data: EncodedDataset,
  logits: Float64Array,
): Float64Array {
  const hidden = new Float64Array(data.trainRows * shape.width);
  kernel.forward(shape, params, data.xTrain, data.trainRows, logits, hidden);
  return hidden;
}

function columnMeans(hidden: Float64Array, rows: number, width: number): Float64Array {
  const mean = new Float64Array(width);
  for (let p = 0; p < rows; p++) for (let j = 0; j < width; j++) mean[j] += hidden[p * width + j];
  for (let j = 0; j < width; j++) mean[j] /= rows;
  return mean;
}

/** Appends a hidden neuron with fresh input weights (as `init` draws them) and zero outgoing weights. */
export function withNeuronAdded(shape: Shape, params: Float64Array, init: Init, rng: Rng): Resized {
  const map = resizeIndexMap(shape, -1);
  const grown = resizeParams(params, shape, -1);
  const next: Shape = { ...shape, width: shape.width + 1 };
  initHiddenNeuron(grown, layoutOf(next), next.inputs, next.width, shape.width, init, rng);
  return { shape: next, params: grown, map };
}

/** Removes hidden neuron j, folding its mean activation over the training rows into the output biases. */
export function withNeuronRemoved(
  kernel: Kernel,
  shape: Shape,
  params: Float64Array,
  data: EncodedDataset,
  j: number,
): Resized {
  if (!Number.isInteger(j) || j < 0 || j >= shape.width) {
    throw new RangeError(`no hidden neuron ${j} in a network of width ${shape.width}`);
  }
  const logits = new Float64Array(data.trainRows * shape.outputs);
  const mean = columnMeans(hiddenActivations(kernel, shape, params, data, logits), data.trainRows, shape.width);
  const lay = layoutOf(shape);
  const folded = params.slice();
  for (let k = 0; k < shape.outputs; k++) folded[lay.b2 + k] += folded[lay.w2 + j * shape.outputs + k] * mean[j];
  return {
    shape: { ...shape, width: shape.width - 1 },
    params: resizeParams(folded, shape, j),
    map: resizeIndexMap(shape, j),
  };
}

/** Compensated-ablation loss increase per hidden neuron (mean per training row), in one pass. */
export function saliencies(
  kernel: Kernel,
  shape: Shape,
  params: Float64Array,
  data: EncodedDataset,
  head: number,
): Float64Array {
  const H = shape.width;
  const K = shape.outputs;
  const N = data.trainRows;
  const logits = new Float64Array(N * K);
  const hidden = hiddenActivations(kernel, shape, params, data, logits);
  const mean = columnMeans(hidden, N, H);
  const lay = layoutOf(shape);
  const out = new Float64Array(H);
  const z = new Float64Array(K);
  const y = data.yTrain;
  for (let p = 0; p < N; p++) {
    const base = rowLoss(head, K, logits, p * K, y[p]);
    for (let j = 0; j < H; j++) {
      const d = hidden[p * H + j] - mean[j];
      for (let k = 0; k < K; k++) z[k] = logits[p * K + k] - d * params[lay.w2 + j * K + k];
      out[j] += rowLoss(head, K, z, 0, y[p]) - base;
    }
  }
  for (let j = 0; j < H; j++) out[j] /= N;
  return out;
}
