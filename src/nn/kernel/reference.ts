/**
 * The plain float64 forward and backward passes: the definition the fast kernel is checked
 * against, and the path used where no WebAssembly is available. Per-row loss:
 *   linear   ½ Σ_k (z_k − t_k)²
 *   logistic softplus(z) − t·z           (binary cross-entropy on the logit)
 *   softmax  log Σ_k e^{z_k} − z_t        (cross-entropy)
 */
import type { Activation } from '../../config/types.js';
import { detExp, detLog, detLogistic, detSoftplus, detTanh } from './detmath.js';
import { layoutOf, type Head, type Shape } from './layout.js';

import {
  ACT_LOGISTIC,
  ACT_RELU,
  ACT_TANH,
  GRAD_BLOCK_ROWS,
  HEAD_LINEAR,
  HEAD_LOGISTIC,
  HEAD_SOFTMAX,
} from './constants.js';

export { HEAD_LINEAR, HEAD_LOGISTIC, HEAD_SOFTMAX } from './constants.js';

export function activationCode(a: Activation): number {
  return a === 'tanh' ? ACT_TANH : a === 'logistic' ? ACT_LOGISTIC : ACT_RELU;
}
export function headCode(h: Head): number {
  return h === 'linear' ? HEAD_LINEAR : h === 'logistic' ? HEAD_LOGISTIC : HEAD_SOFTMAX;
}

/** Scratch memory for one network width, allocated once outside the epoch loop. */
export interface Scratch {
  a: Float64Array;
  h: Float64Array;
  /** Hidden deltas of the rows of the current gradient block (GRAD_BLOCK_ROWS × width). */
  dh: Float64Array;
  /** Block sums of one input's weight gradient (width). */
  acc: Float64Array;
  z: Float64Array;
  dz: Float64Array;
}

export function makeScratch(width: number, outputs: number): Scratch {
  return {
    a: new Float64Array(width),
    h: new Float64Array(width),
    dh: new Float64Array(GRAD_BLOCK_ROWS * width),
    acc: new Float64Array(width),
    z: new Float64Array(outputs),
    dz: new Float64Array(outputs),
  };
}

/** Hidden pre-activations a and activations h of row p. */
function hiddenRow(
  act: number,
  D: number,
  H: number,
  params: Float64Array,
  b1: number,
  x: Float64Array,
  p: number,
  a: Float64Array,
  h: Float64Array,
): void {
  for (let j = 0; j < H; j++) a[j] = params[b1 + j];
  const xo = p * D;
  for (let i = 0; i < D; i++) {
    const xi = x[xo + i];
    const wo = i * H;
    for (let j = 0; j < H; j++) a[j] += xi * params[wo + j];
  }
  if (act === ACT_TANH) for (let j = 0; j < H; j++) h[j] = detTanh(a[j]);
  else if (act === ACT_LOGISTIC) for (let j = 0; j < H; j++) h[j] = detLogistic(a[j]);
  else for (let j = 0; j < H; j++) h[j] = a[j] > 0 ? a[j] : 0;
}

function outputRow(
  H: number,
  K: number,
  params: Float64Array,
  w2: number,
  b2: number,
  h: Float64Array,
  z: Float64Array,
): void {
  for (let k = 0; k < K; k++) z[k] = params[b2 + k];
  for (let j = 0; j < H; j++) {
    const hj = h[j];
    const wo = w2 + j * K;
    for (let k = 0; k < K; k++) z[k] += hj * params[wo + k];
  }
}

/**
 * Loss of one row from its logits z; writes dLoss/dz into dz. `t` is the class index
 * (classification) or the standardised target (regression).
 */
function headLossAndDelta(head: number, K: number, z: Float64Array, t: number, dz: Float64Array): number {
  if (head === HEAD_LINEAR) {
    const d = z[0] - t;
    dz[0] = d;
    return 0.5 * d * d;
  }
  if (head === HEAD_LOGISTIC) {
    dz[0] = detLogistic(z[0]) - t;
    return detSoftplus(z[0]) - t * z[0];
  }
  let m = z[0];
  for (let k = 1; k < K; k++) if (z[k] > m) m = z[k];
  let s = 0;
  for (let k = 0; k < K; k++) {
    const e = detExp(z[k] - m);
    dz[k] = e;
    s += e;
  }
  const inv = 1 / s;
  for (let k = 0; k < K; k++) dz[k] *= inv;
  dz[t] -= 1;
  return detLog(s) - (z[t] - m);
}

/** Head outputs (probabilities or standardised values) from logits. */
export function headOutputs(head: number, K: number, z: Float64Array, zo: number, out: Float64Array, oo: number): void {
  if (head === HEAD_LINEAR) {
    for (let k = 0; k < K; k++) out[oo + k] = z[zo + k];
  } else if (head === HEAD_LOGISTIC) {
    out[oo] = detLogistic(z[zo]);
  } else {
    let m = z[zo];
    for (let k = 1; k < K; k++) if (z[zo + k] > m) m = z[zo + k];
    let s = 0;
    for (let k = 0; k < K; k++) {
      const e = detExp(z[zo + k] - m);
      out[oo + k] = e;
      s += e;
    }
    const inv = 1 / s;
    for (let k = 0; k < K; k++) out[oo + k] *= inv;
  }
}

/**
 * Sum over rows [start, end) of the per-row loss; the summed gradient goes into `grad`
 * (overwritten). No allocation.
 */
export function referenceLossAndGradient(
  shape: Shape,
  params: Float64Array,
  x: Float64Array,
  y: Float64Array,
  start: number,
  end: number,
  grad: Float64Array,
  s: Scratch,
): number {
  const D = shape.inputs;
  const H = shape.width;
  const K = shape.outputs;
  const act = activationCode(shape.activation);
  const head = headCode(shape.head);
  const lay = layoutOf(shape);
  const { a, h, dh, acc, z, dz } = s;
  grad.fill(0);
  let loss = 0;
  for (let p = start; p < end; p++) {
    const q = (p - start) % GRAD_BLOCK_ROWS; // this row's place in its gradient block
    const qo = q * H;
    hiddenRow(act, D, H, params, lay.b1, x, p, a, h);
    outputRow(H, K, params, lay.w2, lay.b2, h, z);
    loss += headLossAndDelta(head, K, z, y[p], dz);
    for (let k = 0; k < K; k++) grad[lay.b2 + k] += dz[k];
    for (let j = 0; j < H; j++) {
      const hj = h[j];
      const wo = lay.w2 + j * K;
      let sum = 0;
      for (let k = 0; k < K; k++) {
        grad[wo + k] += hj * dz[k];
        sum += params[wo + k] * dz[k];
      }
      const fp = act === ACT_TANH ? 1 - hj * hj : act === ACT_LOGISTIC ? hj * (1 - hj) : a[j] > 0 ? 1 : 0;
      dh[qo + j] = sum * fp;
    }
    for (let j = 0; j < H; j++) grad[lay.b1 + j] += dh[qo + j];
    if (q === GRAD_BLOCK_ROWS - 1 || p === end - 1) addInputGradient(D, H, x, p - q, q + 1, dh, acc, grad);
  }
  return loss;
}

/** Adds the block sums Σ_q x[first+q, i]·dh[q, j] (q = 0..n−1 in order, from +0) to the W1 gradient. */
function addInputGradient(
  D: number,
  H: number,
  x: Float64Array,
  first: number,
  n: number,
  dh: Float64Array,
  acc: Float64Array,
  grad: Float64Array,
): void {
  for (let i = 0; i < D; i++) {
    acc.fill(0);
    for (let q = 0; q < n; q++) {
      const xi = x[(first + q) * D + i];
      const qo = q * H;
      for (let j = 0; j < H; j++) acc[j] += xi * dh[qo + j];
    }
    const go = i * H;
    for (let j = 0; j < H; j++) grad[go + j] += acc[j];
  }
}

/**
 * Forward pass over `rows` rows. Writes logits (rows × K) into `logits`; when `hidden`
 * is given, also the hidden activations (rows × H).
 */
export function referenceForward(
  shape: Shape,
  params: Float64Array,
  x: Float64Array,
  rows: number,
  logits: Float64Array,
  hidden: Float64Array | null,
  s: Scratch,
): void {
  const D = shape.inputs;
  const H = shape.width;
  const K = shape.outputs;
  const act = activationCode(shape.activation);
  const lay = layoutOf(shape);
  for (let p = 0; p < rows; p++) {
    hiddenRow(act, D, H, params, lay.b1, x, p, s.a, s.h);
    outputRow(H, K, params, lay.w2, lay.b2, s.h, s.z);
    for (let k = 0; k < K; k++) logits[p * K + k] = s.z[k];
    if (hidden) for (let j = 0; j < H; j++) hidden[p * H + j] = s.h[j];
  }
}

/** Per-row loss from logits (no gradient). */
export function rowLoss(head: number, K: number, z: Float64Array, zo: number, t: number): number {
  if (head === HEAD_LINEAR) {
    const d = z[zo] - t;
    return 0.5 * d * d;
  }
  if (head === HEAD_LOGISTIC) return detSoftplus(z[zo]) - t * z[zo];
  let m = z[zo];
  for (let k = 1; k < K; k++) if (z[zo + k] > m) m = z[zo + k];
  let s = 0;
  for (let k = 0; k < K; k++) s += detExp(z[zo + k] - m);
  return detLog(s) - (z[zo + t] - m);
}
