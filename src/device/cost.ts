/**
 * What a network costs on the device: the one definition of parameters, multiply-accumulates,
 * flash bytes and RAM bytes, for the float32 and the int8 form.
 *
 * Flash counts, byte for byte, the constant objects the exported C (export-c.ts) declares for
 * one path: `storedObjects` lists them, the exporter declares exactly these, and a test sums
 * their sizes from the compiled object file. Each path is counted on its own (a device ships
 * one of them). Not counted: code (instructions, including the straight-line encoding of each
 * feature and any constant the compiler folds into an instruction), alignment padding between
 * objects, and the C library (tanhf/expf on the float path).
 *
 * RAM counts the activation buffers of one inference, all alive for the whole call: the
 * encoded input vector and the hidden vector, in the path's type (float32: 4 bytes each; int8:
 * 1 byte each). Not counted: the caller's `features` and `outputs` arrays (the outputs are
 * computed in place there), scalars and loop counters, the stack frame and the C library's
 * stack use.
 */
import type { Encoding } from '../data/types.js';

/** What the cost depends on. */
export interface CostShape {
  /** Network inputs after encoding (D). */
  inputs: number;
  /** Hidden neurons (H). */
  width: number;
  /** Network outputs (K). */
  outputs: number;
  /** Numeric features (each one standardised on the device). */
  numericFeatures: number;
  /** Categorical features (each one one-hot encoded on the device). */
  categoricalFeatures: number;
  /** Regression: the float path stores the target's mean and standard deviation. */
  regression: boolean;
}

export interface DeviceCost {
  /** D·H + H + H·K + K. */
  parameters: number;
  /** Multiply-accumulates per inference: D·H + H·K. */
  macs: number;
  flashBytes: { float32: number; int8: number };
  ramBytes: { float32: number; int8: number };
}

export type CType = 'float' | 'int8_t' | 'int32_t';

const C_TYPE_BYTES: Record<CType, number> = { float: 4, int8_t: 1, int32_t: 4 };

/** One constant object of the exported C: `NAME_<suffix>`, `count` elements of `type`. */
export interface StoredObject {
  suffix: string;
  type: CType;
  count: number;
  /** What it holds, for the cost breakdown. */
  role: string;
  /** A single value, declared as a scalar rather than an array. */
  scalar?: true;
}

/** Entries of the activation lookup table (indexed by an int8 pre-activation). */
export const LUT_ENTRIES = 256;

/** The constant objects each path of the exported C declares, in declaration order. */
export function storedObjects(s: CostShape): { float32: StoredObject[]; int8: StoredObject[] } {
  const { inputs: D, width: H, outputs: K } = s;
  const float32: StoredObject[] = [];
  const int8: StoredObject[] = [];
  if (s.numericFeatures > 0) {
    float32.push({ suffix: 'f_in_mean', type: 'float', count: s.numericFeatures, role: 'feature means' });
    float32.push({ suffix: 'f_in_std', type: 'float', count: s.numericFeatures, role: 'feature deviations' });
  }
  float32.push(
    { suffix: 'f_w1', type: 'float', count: H * D, role: 'hidden weights' },
    { suffix: 'f_b1', type: 'float', count: H, role: 'hidden biases' },
    { suffix: 'f_w2', type: 'float', count: K * H, role: 'output weights' },
    { suffix: 'f_b2', type: 'float', count: K, role: 'output biases' },
  );
  if (s.regression) float32.push({ suffix: 'f_target', type: 'float', count: 2, role: 'target mean and deviation' });

  if (s.numericFeatures > 0) {
    int8.push({ suffix: 'q_in_mean', type: 'float', count: s.numericFeatures, role: 'feature means' });
    int8.push({ suffix: 'q_in_mul', type: 'float', count: s.numericFeatures, role: '1 / (deviation · input scale)' });
  }
  int8.push({ suffix: 'q_in_zero', type: 'int8_t', count: 1, role: 'input zero-point', scalar: true });
  if (s.categoricalFeatures > 0)
    int8.push({ suffix: 'q_in_one', type: 'int8_t', count: 1, role: 'code of a one-hot 1', scalar: true });
  int8.push(
    { suffix: 'q_w1', type: 'int8_t', count: H * D, role: 'hidden weights' },
    { suffix: 'q_b1', type: 'int32_t', count: H, role: 'hidden biases (zero-point folded in)' },
    { suffix: 'q_m0', type: 'int32_t', count: H, role: 'requantisation multipliers M0' },
    { suffix: 'q_shift', type: 'int8_t', count: H, role: 'requantisation shifts n' },
    { suffix: 'q_act_zero', type: 'int8_t', count: 1, role: 'pre-activation zero-point', scalar: true },
    { suffix: 'q_lut', type: 'int8_t', count: LUT_ENTRIES, role: 'activation lookup table' },
    { suffix: 'q_w2', type: 'int8_t', count: K * H, role: 'output weights' },
    { suffix: 'q_b2', type: 'int32_t', count: K, role: 'output biases (zero-point folded in)' },
    { suffix: 'q_out_scale', type: 'float', count: K, role: 'output dequantisation scales' },
  );
  return { float32, int8 };
}

export function objectBytes(o: StoredObject): number {
  return o.count * C_TYPE_BYTES[o.type];
}

function sumBytes(objects: StoredObject[]): number {
  return objects.reduce((n, o) => n + objectBytes(o), 0);
}

export function deviceCost(s: CostShape): DeviceCost {
  const { inputs: D, width: H, outputs: K } = s;
  const stored = storedObjects(s);
  return {
    parameters: D * H + H + H * K + K,
    macs: D * H + H * K,
    flashBytes: { float32: sumBytes(stored.float32), int8: sumBytes(stored.int8) },
    ramBytes: { float32: 4 * (D + H), int8: D + H },
  };
}

/** The cost shape of a network of `width` hidden neurons on data encoded as `encoding`. */
export function costShapeOf(net: { inputs: number; width: number; outputs: number }, encoding: Encoding): CostShape {
  return {
    inputs: net.inputs,
    width: net.width,
    outputs: net.outputs,
    numericFeatures: encoding.features.filter((f) => f.kind === 'numeric').length,
    categoricalFeatures: encoding.features.filter((f) => f.kind === 'categorical').length,
    regression: encoding.target.task === 'regression',
  };
}
