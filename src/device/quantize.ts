/**
 * int8 post-training quantisation of a trained network, after the integer-only scheme of
 * Jacob et al. 2018 (section 2: real = S·(q − Z), int32 accumulation, the multiplier
 * M = S1·S2/S3 as M0·2^−n) with symmetric per-output-channel weights (Krishnamoorthi 2018,
 * "Quantizing deep convolutional networks for efficient inference: A whitepaper").
 *
 * The scheme, stage by stage (S scale, Z zero-point, q = clamp(Z + round(r / S))):
 *   inputs   one scale for the whole encoded input vector, asymmetric: S_x = (hi − lo) / 255,
 *            Z_x = round(−128 − lo / S_x), [lo, hi] the range over the calibration rows widened
 *            to hold 0 (so that a one-hot 0 is exact, as the paper requires of real zero).
 *   weights  per hidden neuron (and per output), symmetric: S_w = max|w| / 127, Z = 0, q in
 *            [−127, 127]. int32 biases at scale S_in · S_w, zero-point 0 (paper, section 2.4).
 *   hidden   the int32 accumulator is requantised by M_j = S_x · S_w[j] / S_a to an int8
 *            pre-activation (scale S_a, zero-point Z_a), which indexes a 256-entry table of the
 *            activation's int8 output (scale S_h, zero-point Z_h). See `activationRanges`.
 *   output   the int32 accumulator times a float32 scale S_h · S_w (regression: times the
 *            target's deviation too, with the target's mean folded into the int32 bias) is the
 *            dequantised logit or value the head uses.
 * Every rounding is round-half-away-from-zero (fixed-point.ts), done on exact values.
 */
import type { Activation } from '../config/types.js';
import type { Encoding } from '../data/types.js';
import type { Head, NetworkJson } from '../nn/index.js';
import { detLog, detLogistic, detTanh } from '../nn/kernel/detmath.js';
import { clamp, quantizeMultiplier, roundHalfAway } from './fixed-point.js';
import { LUT_ENTRIES } from './cost.js';

/** How one raw feature becomes int8 inputs on the device. */
export type Int8Feature =
  | {
      kind: 'numeric';
      /** float32 mean subtracted from the raw value. */
      mean: number;
      /** float32 1 / (std · S_x): the centred value times this is the input in quantisation steps. */
      multiplier: number;
    }
  | { kind: 'categorical'; categories: number };

export interface QuantParams {
  scale: number;
  zeroPoint: number;
}

export interface Int8Network {
  inputs: number;
  width: number;
  outputs: number;
  activation: Activation;
  head: Head;
  input: QuantParams & {
    /** Code of a one-hot 1: clamp(Z_x + round(1 / S_x)). A one-hot 0 is Z_x. */
    one: number;
    /** One entry per raw feature, in feature order. */
    features: Int8Feature[];
  };
  hidden: {
    /** width rows of inputs int8 weights (row j: hidden neuron j), in [−127, 127]. */
    weights: number[][];
    /** S_w per hidden neuron; weight zero-point 0. */
    weightScales: number[];
    /** int32 biases at scale S_x · S_w[j], zero-point 0 (before the input zero-point is folded in). */
    bias: number[];
    /** M0 per hidden neuron: round(M0 · 2^31), in [2^30, 2^31), or 0. */
    multiplier: number[];
    /** n per hidden neuron (M = M0 · 2^−n): a right shift when positive, a left shift when negative. */
    shift: number[];
    /** The int8 pre-activation that indexes the table. */
    preActivation: QuantParams;
    /** The int8 hidden activation the table holds. */
    activation: QuantParams;
    /** 256 int8 entries: table[q + 128] is the activation code of pre-activation code q. */
    table: number[];
  };
  output: {
    /** outputs rows of width int8 weights. */
    weights: number[][];
    weightScales: number[];
    /** int32 biases at scale S_h · S_w[k] (regression: plus the target mean over its deviation). */
    bias: number[];
    /** float32 per output: logit (or value in target units) per accumulator step. */
    scale: number[];
  };
}

/** Encoded rows to calibrate the activation ranges on (the training rows). */
export interface Calibration {
  /** rows × inputs, encoded as the network sees them. */
  x: Float64Array;
  rows: number;
}

/** Largest |int32 bias|; with at most MAX_QUANT_INPUTS terms of |q_w·q_x| ≤ 127·128 the accumulator stays in int32. */
export const BIAS_LIMIT = 2 ** 30;
const MAX_QUANT_INPUTS = 16384;

const INT8_MIN = -128;
const INT8_MAX = 127;

/**
 * Pre-activation range and activation codes per activation. The calibrated range is
 * R = max |a| over the calibration rows (ReLU: max a), clipped where the activation is within
 * half an output step of its limit (beyond that every pre-activation gives the same code):
 *   tanh      a in [−R, R], S_a = R/127, Z_a = 0; h in [−tanh R, tanh R], S_h = tanh(R)/127, Z_h = 0
 *             (odd function: symmetric codes). Clip: atanh(1 − 1/254) = ln(507)/2 ≈ 3.11.
 *   logistic  a in [−R, R], S_a = R/127, Z_a = 0; h in [0, σ(R)] (widened to hold 0),
 *             S_h = σ(R)/255, Z_h = −128. Clip: σ(a) = 1 − 1/510 at a = ln(509) ≈ 6.23.
 *   relu      a in [0, R], S_a = R/255, Z_a = −128 (a negative pre-activation clamps to code
 *             −128, which is relu's 0); h = a: S_h = S_a, Z_h = −128.
 * The output range is the image of the pre-activation range, so it needs no calibration of its own.
 */
export function activationRanges(
  activation: Activation,
  calibrated: number,
): { preActivation: QuantParams; activation: QuantParams } {
  if (activation === 'relu') {
    const r = calibrated > 0 && Number.isFinite(calibrated) ? calibrated : 1;
    const s = r / 255;
    return { preActivation: { scale: s, zeroPoint: INT8_MIN }, activation: { scale: s, zeroPoint: INT8_MIN } };
  }
  const clip = activation === 'tanh' ? detLog(507) / 2 : detLog(509);
  const r = calibrated > 0 && calibrated < clip ? calibrated : clip;
  const preActivation = { scale: r / 127, zeroPoint: 0 };
  if (activation === 'tanh') return { preActivation, activation: { scale: detTanh(r) / 127, zeroPoint: 0 } };
  return { preActivation, activation: { scale: detLogistic(r) / 255, zeroPoint: INT8_MIN } };
}

function activate(activation: Activation, a: number): number {
  if (activation === 'tanh') return detTanh(a);
  if (activation === 'logistic') return detLogistic(a);
  return a > 0 ? a : 0;
}

/** q = clamp(Z + round(r / S)) into int8. */
export function quantizeValue(r: number, p: QuantParams): number {
  return clamp(p.zeroPoint + roundHalfAway(r / p.scale), INT8_MIN, INT8_MAX);
}

/** r = S · (q − Z) (the paper's eq. 1). */
export function dequantizeValue(q: number, p: QuantParams): number {
  return p.scale * (q - p.zeroPoint);
}

/**
 * The asymmetric int8 parameters of the range [lo, hi], widened to hold 0, with the
 * zero-point rounded to an integer so that real 0 is exactly representable.
 */
export function rangeParams(lo: number, hi: number): QuantParams {
  let a = Math.min(lo, 0);
  let b = Math.max(hi, 0);
  if (!(b > a)) {
    a = 0;
    b = 1;
  }
  const scale = (b - a) / 255;
  return { scale, zeroPoint: clamp(roundHalfAway(INT8_MIN - a / scale), INT8_MIN, INT8_MAX) };
}

/** The table of activation codes for every int8 pre-activation code. */
export function activationTable(activation: Activation, pre: QuantParams, out: QuantParams): number[] {
  const table: number[] = [];
  for (let q = INT8_MIN; q < INT8_MIN + LUT_ENTRIES; q++) {
    table.push(quantizeValue(activate(activation, dequantizeValue(q, pre)), out));
  }
  return table;
}

/**
 * One layer's symmetric per-output-channel weights and int32 biases. The scale is at least
 * |bias| / (S_in · BIAS_LIMIT), so the bias always fits (coarser weights only when they are
 * negligible beside the bias); an all-zero channel gets scale 1.
 */
export function quantizeLayer(
  weights: readonly (readonly number[])[],
  bias: readonly number[],
  inputScale: number,
): { weights: number[][]; scales: number[]; bias: number[] } {
  const scales: number[] = [];
  const qWeights: number[][] = [];
  const qBias: number[] = [];
  weights.forEach((row, j) => {
    let maxAbs = 0;
    for (const w of row) maxAbs = Math.max(maxAbs, Math.abs(w));
    let s = Math.max(maxAbs / INT8_MAX, Math.abs(bias[j]) / (inputScale * BIAS_LIMIT));
    if (!(s > 0) || !Number.isFinite(s)) s = 1;
    scales.push(s);
    qWeights.push(row.map((w) => clamp(roundHalfAway(w / s), -INT8_MAX, INT8_MAX)));
    qBias.push(clamp(roundHalfAway(bias[j] / (inputScale * s)), -BIAS_LIMIT, BIAS_LIMIT));
  });
  return { weights: qWeights, scales, bias: qBias };
}

/** bias − Z · Σ weights: the accumulator then sums weight · code directly (the paper's section 2.3). */
export function foldZeroPoint(
  bias: readonly number[],
  weights: readonly (readonly number[])[],
  zero: number,
): number[] {
  return bias.map((b, j) => b - zero * weights[j].reduce((s, w) => s + w, 0));
}

function checkFinite(net: NetworkJson): void {
  const all = [...net.hiddenWeights.flat(), ...net.hiddenBias, ...net.outputWeights.flat(), ...net.outputBias];
  if (!all.every(Number.isFinite)) throw new RangeError('cannot quantise a network with non-finite weights');
}

/** Largest |a| (ReLU: largest a) of the hidden pre-activations over the calibration rows, in float64. */
function calibratePreActivation(net: NetworkJson, cal: Calibration): number {
  const D = net.inputs;
  let extreme = 0;
  for (let p = 0; p < cal.rows; p++) {
    for (let j = 0; j < net.width; j++) {
      let a = net.hiddenBias[j];
      const w = net.hiddenWeights[j];
      for (let i = 0; i < D; i++) a += cal.x[p * D + i] * w[i];
      const v = net.activation === 'relu' ? a : Math.abs(a);
      if (v > extreme) extreme = v;
    }
  }
  return extreme;
}

function inputRange(cal: Calibration, D: number): QuantParams {
  let lo = 0;
  let hi = 0;
  for (let q = 0; q < cal.rows * D; q++) {
    const v = cal.x[q];
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  return rangeParams(lo, hi);
}

/** The int8 form of `net`, its activation ranges calibrated on `calibration` (the training rows). */
export function quantizeNetwork(net: NetworkJson, encoding: Encoding, calibration: Calibration): Int8Network {
  const D = net.inputs;
  const H = net.width;
  const K = net.outputs;
  if (D > MAX_QUANT_INPUTS || H > MAX_QUANT_INPUTS) {
    throw new RangeError(`int8 quantisation takes at most ${MAX_QUANT_INPUTS} inputs and hidden neurons`);
  }
  if (calibration.rows < 1) throw new RangeError('int8 quantisation needs at least one calibration row');
  checkFinite(net);
  const encoded = encoding.features.reduce((n, f) => n + (f.kind === 'numeric' ? 1 : f.categories.length), 0);
  if (encoded !== D) throw new RangeError(`the encoding gives ${encoded} inputs, the network takes ${D}`);

  const input = inputRange(calibration, D);
  const features: Int8Feature[] = encoding.features.map((f) =>
    f.kind === 'numeric'
      ? {
          kind: 'numeric',
          mean: Math.fround(f.mean),
          multiplier: Math.fround(1 / ((f.std > 0 ? f.std : 1) * input.scale)),
        }
      : { kind: 'categorical', categories: f.categories.length },
  );

  const hidden = quantizeLayer(net.hiddenWeights, net.hiddenBias, input.scale);
  const ranges = activationRanges(net.activation, calibratePreActivation(net, calibration));
  const multipliers = hidden.scales.map((s) => quantizeMultiplier((input.scale * s) / ranges.preActivation.scale));

  const t = encoding.target;
  const regression = t.task === 'regression';
  const outBias = net.outputBias.map((b) => (regression ? b + t.mean / t.std : b));
  const S_h = ranges.activation.scale;
  const output = quantizeLayer(net.outputWeights, outBias, S_h);

  return {
    inputs: D,
    width: H,
    outputs: K,
    activation: net.activation,
    head: net.head,
    input: { ...input, one: quantizeValue(1, input), features },
    hidden: {
      weights: hidden.weights,
      weightScales: hidden.scales,
      bias: hidden.bias,
      multiplier: multipliers.map((m) => m.multiplier),
      shift: multipliers.map((m) => m.shift),
      preActivation: ranges.preActivation,
      activation: ranges.activation,
      table: activationTable(net.activation, ranges.preActivation, ranges.activation),
    },
    output: {
      weights: output.weights,
      weightScales: output.scales,
      bias: output.bias,
      scale: output.scales.map((s) => Math.fround(S_h * s * (regression ? t.std : 1))),
    },
  };
}
