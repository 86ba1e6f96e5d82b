/**
 * The int8 inference exactly as the exported C runs it (export-c.ts, NAME_predict_int8), so
 * that both give the same bits. The only float operations are the ones the C performs, each
 * rounded to float32 with Math.fround: the centring of a raw numeric feature (x − mean), its
 * scaling into quantisation steps (· multiplier), the int32 accumulator's conversion to float
 * and the output's dequantisation (· scale). Everything else is integer arithmetic.
 *
 * None of these float steps is a product feeding a sum, so a C compiler that contracts
 * a·b + c into a fused multiply-add cannot change them; they need IEEE 754 single precision
 * with each assignment rounded to float (FLT_EVAL_METHOD 0, or a compiler that honours C99's
 * rounding on assignment, as GCC does in its ISO modes).
 */
import { UserError } from '../common/errors.js';
import type { Encoding } from '../data/types.js';
import { clamp, multiplyByQuantizedMultiplier } from './fixed-point.js';
import { foldZeroPoint, type Int8Network } from './quantize.js';

/** A raw value's clamp before it is rounded to an integer (keeps the C's float → int conversion defined). */
export const INPUT_STEP_LIMIT = 512;
/** The requantised pre-activation's clamp before its zero-point is added (keeps the C's sum in int32). */
export const PRE_ACTIVATION_LIMIT = 255;

/** A raw CSV row: column name → cell text. */
export type Row = Readonly<Record<string, string>>;

export interface Int8Result {
  /** Class index per row (regression: 0). */
  classes: Int32Array;
  /** rows × outputs: dequantised logits (classification) or values in the target's units (regression). */
  outputs: Float32Array;
}

/**
 * A value in input quantisation steps to its int8 code: clamp t to ±512 (NaN to −512), round
 * half away from zero through truncation (t − trunc(t) is exact in float32), add Z, clamp.
 */
export function inputCode(t: number, zeroPoint: number): number {
  let v = t;
  if (!(v > -INPUT_STEP_LIMIT)) v = -INPUT_STEP_LIMIT;
  else if (v > INPUT_STEP_LIMIT) v = INPUT_STEP_LIMIT;
  let i = Math.trunc(v);
  const f = Math.fround(v - i);
  if (f >= 0.5) i++;
  else if (f <= -0.5) i--;
  return clamp(zeroPoint + i, -128, 127);
}

/** A categorical feature's raw value as a category index: a whole number in [0, n), else −1 (all zeros). */
export function categoryIndex(v: number, n: number): number {
  if (v >= 0 && v < n) {
    const c = Math.trunc(v);
    if (c === v) return c;
  }
  return -1;
}

/** Codes of every row, for checks: inputs (rows × inputs), pre-activations and hidden activations (rows × width). */
export interface Int8Trace {
  inputs: Int32Array;
  preActivation: Int32Array;
  hidden: Int32Array;
}

/**
 * Run the int8 network on `rows` rows of raw features (rows × features, float32 values).
 * With `trace`, also records the input and hidden codes of every row.
 */
export function int8Forward(
  q: Int8Network,
  features: ArrayLike<number>,
  rows: number,
  trace: Int8Trace | null = null,
): Int8Result {
  const F = q.input.features.length;
  const D = q.inputs;
  const H = q.width;
  const K = q.outputs;
  const b1 = foldZeroPoint(q.hidden.bias, q.hidden.weights, q.input.zeroPoint);
  const b2 = foldZeroPoint(q.output.bias, q.output.weights, q.hidden.activation.zeroPoint);
  const requant = q.hidden.multiplier.map((multiplier, j) => ({ multiplier, shift: q.hidden.shift[j] }));
  const zx = q.input.zeroPoint;
  const za = q.hidden.preActivation.zeroPoint;
  const xq = new Int32Array(D);
  const hq = new Int32Array(H);
  const classes = new Int32Array(rows);
  const outputs = new Float32Array(rows * K);
  for (let p = 0; p < rows; p++) {
    let c = 0;
    for (let f = 0; f < F; f++) {
      const v = Math.fround(features[p * F + f]);
      const e = q.input.features[f];
      if (e.kind === 'numeric') {
        const d = Math.fround(v - e.mean);
        xq[c++] = inputCode(Math.fround(d * e.multiplier), zx);
      } else {
        const k = categoryIndex(v, e.categories);
        for (let j = 0; j < e.categories; j++) xq[c + j] = j === k ? q.input.one : zx;
        c += e.categories;
      }
    }
    for (let j = 0; j < H; j++) {
      const w = q.hidden.weights[j];
      let acc = b1[j];
      for (let i = 0; i < D; i++) acc += w[i] * xq[i];
      const r = clamp(multiplyByQuantizedMultiplier(acc, requant[j]), -PRE_ACTIVATION_LIMIT, PRE_ACTIVATION_LIMIT);
      const code = clamp(za + r, -128, 127);
      hq[j] = q.hidden.table[code + 128];
      if (trace) trace.preActivation[p * H + j] = code;
    }
    if (trace) {
      trace.inputs.set(xq, p * D);
      trace.hidden.set(hq, p * H);
    }
    let best = 0;
    for (let k = 0; k < K; k++) {
      const w = q.output.weights[k];
      let acc = b2[k];
      for (let j = 0; j < H; j++) acc += w[j] * hq[j];
      const z = Math.fround(Math.fround(acc) * q.output.scale[k]);
      outputs[p * K + k] = z;
      if (z > outputs[p * K + best]) best = k;
    }
    classes[p] = q.head === 'softmax' ? best : q.head === 'logistic' ? (outputs[p * K] > 0 ? 1 : 0) : 0;
  }
  return { classes, outputs };
}

/**
 * Raw CSV rows as the device's raw features (rows × features, float32): a numeric feature's
 * number, a categorical feature's category index (−1 for a category the model has not seen,
 * which encodes as all zeros, as encodeRows does).
 */
export function rawFeatureRows(encoding: Encoding, rows: readonly Row[]): Float32Array {
  const F = encoding.features.length;
  const out = new Float32Array(rows.length * F);
  rows.forEach((row, r) => {
    encoding.features.forEach((f, i) => {
      const cell = row[f.name];
      if (cell === undefined) throw new UserError(`row ${r + 1}: column "${f.name}" is missing`, { key: f.name });
      const text = cell.trim();
      if (f.kind === 'categorical') {
        out[r * F + i] = f.categories.indexOf(text);
        return;
      }
      const v = text === '' ? Number.NaN : Number(text);
      if (!Number.isFinite(v)) {
        throw new UserError(`row ${r + 1}, column "${f.name}": expected a number, found "${cell}"`, { key: f.name });
      }
      out[r * F + i] = v;
    });
  });
  return out;
}
