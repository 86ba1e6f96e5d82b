/**
 * The C functions of the firmware export: the float32 path, the int8 path and their helpers.
 * The int8 path does what int8-forward.ts simulates, operation for operation.
 */
import type { Task } from '../config/types.js';
import type { Encoding } from '../data/types.js';
import type { NetworkJson } from '../nn/index.js';
import type { Int8Network } from './quantize.js';
import { INPUT_STEP_LIMIT, PRE_ACTIVATION_LIMIT } from './int8-forward.js';

/** The parts of a model document the export needs. */
export interface FirmwareModel {
  task: Task;
  encoding: Encoding;
  network: NetworkJson;
  int8: Int8Network | null;
}

function encodeStatements(model: FirmwareModel, name: string, int8Path: boolean): string[] {
  const out: string[] = [];
  let offset = 0;
  let m = 0;
  model.encoding.features.forEach((f, i) => {
    if (f.kind === 'numeric') {
      out.push(
        int8Path
          ? `  {\n    const float d = features[${i}] - ${name}_q_in_mean[${m}];\n    const float t = d * ${name}_q_in_mul[${m}];\n    xq[${offset}] = ${name}_input_code(t);\n  }`
          : `  x[${offset}] = (features[${i}] - ${name}_f_in_mean[${m}]) / ${name}_f_in_std[${m}];`,
      );
      m++;
      offset++;
    } else {
      const n = f.categories.length;
      out.push(
        `  c = ${name}_category(features[${i}], ${n});`,
        int8Path
          ? `  for (j = 0; j < ${n}; j++) xq[${offset} + j] = j == c ? ${name}_q_in_one : ${name}_q_in_zero;`
          : `  for (j = 0; j < ${n}; j++) x[${offset} + j] = j == c ? 1.0f : 0.0f;`,
      );
      offset += n;
    }
  });
  return out;
}

export function helpers(name: string, hasNumeric: boolean, hasCategorical: boolean): string[] {
  const out: string[] = [];
  if (hasCategorical) {
    out.push(
      `/* A raw categorical value as a category index: a whole number in [0, n), else -1. */`,
      `static int ${name}_category(float v, int n) {`,
      `  if (v >= 0.0f && v < (float)n) {`,
      `    const int c = (int)v;`,
      `    if ((float)c == v) return c;`,
      `  }`,
      `  return -1;`,
      `}`,
      ``,
    );
  }
  if (hasNumeric) {
    out.push(
      `/* Input steps to an int8 code: clamp, round half away from zero (t - trunc(t) is exact), add the zero-point. */`,
      `static int8_t ${name}_input_code(float t) {`,
      `  int32_t i;`,
      `  float f;`,
      `  if (!(t > -${INPUT_STEP_LIMIT}.0f)) t = -${INPUT_STEP_LIMIT}.0f;`,
      `  else if (t > ${INPUT_STEP_LIMIT}.0f) t = ${INPUT_STEP_LIMIT}.0f;`,
      `  i = (int32_t)t;`,
      `  f = t - (float)i;`,
      `  if (f >= 0.5f) i++;`,
      `  else if (f <= -0.5f) i--;`,
      `  i += ${name}_q_in_zero;`,
      `  return (int8_t)(i < -128 ? -128 : i > 127 ? 127 : i);`,
      `}`,
      ``,
    );
  }
  out.push(
    `/*`,
    ` * acc * M with M = m0 * 2^-31 * 2^-shift: a saturating left shift when shift < 0, the fixed-point`,
    ` * multiply (nudge, then division by 2^31 truncating toward zero) and a rounding right shift (ties`,
    ` * away from zero) when shift > 0: gemmlowp's SaturatingRoundingDoublingHighMul and RoundingDivideByPOT.`,
    ` */`,
    `static int32_t ${name}_requantize(int32_t acc, int32_t m0, int shift) {`,
    `  int64_t x = acc;`,
    `  int64_t ab;`,
    `  int32_t high, mask, remainder, threshold, floor_shift;`,
    `  if (m0 == 0) return 0;`,
    `  if (shift < 0) {`,
    `    x *= (int64_t)1 << -shift;`,
    `    if (x > INT32_MAX) x = INT32_MAX;`,
    `    if (x < INT32_MIN) x = INT32_MIN;`,
    `  }`,
    `  if (x == INT32_MIN && m0 == INT32_MIN) return INT32_MAX;`,
    `  ab = x * (int64_t)m0;`,
    `  high = (int32_t)((ab + (ab >= 0 ? ((int64_t)1 << 30) : (1 - ((int64_t)1 << 30)))) / ((int64_t)1 << 31));`,
    `  if (shift <= 0) return high;`,
    `  mask = (int32_t)(((int64_t)1 << shift) - 1);`,
    `  remainder = (int32_t)((uint32_t)high & (uint32_t)mask);`,
    `  threshold = (mask >> 1) + (high < 0 ? 1 : 0);`,
    `  floor_shift = high >= 0 ? (high >> shift) : ~((~high) >> shift);`,
    `  return floor_shift + (remainder > threshold ? 1 : 0);`,
    `}`,
    ``,
  );
  return out;
}

export function floatPath(model: FirmwareModel, name: string): string[] {
  const N = name.toUpperCase();
  const net = model.network;
  const hasCategorical = model.encoding.features.some((f) => f.kind === 'categorical');
  const activation =
    net.activation === 'tanh'
      ? 'tanhf(a)'
      : net.activation === 'logistic'
        ? '1.0f / (1.0f + expf(-a))'
        : 'a > 0.0f ? a : 0.0f';
  const out = [
    `int ${name}_predict(const float features[${N}_FEATURES], float outputs[${N}_OUTPUTS]) {`,
    `  float x[${N}_INPUTS];`,
    `  float h[${N}_HIDDEN];`,
    `  int i, j, k;`,
    ...(hasCategorical ? [`  int c;`] : []),
    ...encodeStatements(model, name, false),
    `  for (j = 0; j < ${N}_HIDDEN; j++) {`,
    `    float a = ${name}_f_b1[j];`,
    `    for (i = 0; i < ${N}_INPUTS; i++) a += ${name}_f_w1[j][i] * x[i];`,
    `    h[j] = ${activation};`,
    `  }`,
    `  for (k = 0; k < ${N}_OUTPUTS; k++) {`,
    `    float z = ${name}_f_b2[k];`,
    `    for (j = 0; j < ${N}_HIDDEN; j++) z += ${name}_f_w2[k][j] * h[j];`,
    `    outputs[k] = z;`,
    `  }`,
  ];
  if (net.head === 'softmax') {
    out.push(
      `  {`,
      `    float m = outputs[0], s = 0.0f;`,
      `    int best = 0;`,
      `    for (k = 1; k < ${N}_OUTPUTS; k++) if (outputs[k] > m) m = outputs[k];`,
      `    for (k = 0; k < ${N}_OUTPUTS; k++) {`,
      `      outputs[k] = expf(outputs[k] - m);`,
      `      s += outputs[k];`,
      `    }`,
      `    for (k = 0; k < ${N}_OUTPUTS; k++) outputs[k] /= s;`,
      `    for (k = 1; k < ${N}_OUTPUTS; k++) if (outputs[k] > outputs[best]) best = k;`,
      `    return best;`,
      `  }`,
    );
  } else if (net.head === 'logistic') {
    out.push(`  outputs[0] = 1.0f / (1.0f + expf(-outputs[0]));`, `  return outputs[0] > 0.5f ? 1 : 0;`);
  } else {
    out.push(`  outputs[0] = outputs[0] * ${name}_f_target[1] + ${name}_f_target[0];`, `  return 0;`);
  }
  out.push(`}`, ``);
  return out;
}

export function int8Path(model: FirmwareModel, name: string): string[] {
  const N = name.toUpperCase();
  const head = model.network.head;
  const hasCategorical = model.encoding.features.some((f) => f.kind === 'categorical');
  const out = [
    `int ${name}_predict_int8(const float features[${N}_FEATURES], float outputs[${N}_OUTPUTS]) {`,
    `  int8_t xq[${N}_INPUTS];`,
    `  int8_t hq[${N}_HIDDEN];`,
    `  int i, j, k;`,
    ...(hasCategorical ? [`  int c;`] : []),
    ...(head === 'softmax' ? [`  int best = 0;`] : []),
    ...encodeStatements(model, name, true),
    `  for (j = 0; j < ${N}_HIDDEN; j++) {`,
    `    int32_t acc = ${name}_q_b1[j], r;`,
    `    for (i = 0; i < ${N}_INPUTS; i++) acc += (int32_t)${name}_q_w1[j][i] * (int32_t)xq[i];`,
    `    r = ${name}_requantize(acc, ${name}_q_m0[j], ${name}_q_shift[j]);`,
    `    if (r < -${PRE_ACTIVATION_LIMIT}) r = -${PRE_ACTIVATION_LIMIT};`,
    `    else if (r > ${PRE_ACTIVATION_LIMIT}) r = ${PRE_ACTIVATION_LIMIT};`,
    `    r += ${name}_q_act_zero;`,
    `    if (r < -128) r = -128;`,
    `    else if (r > 127) r = 127;`,
    `    hq[j] = ${name}_q_lut[r + 128];`,
    `  }`,
    `  for (k = 0; k < ${N}_OUTPUTS; k++) {`,
    `    int32_t acc = ${name}_q_b2[k];`,
    `    for (j = 0; j < ${N}_HIDDEN; j++) acc += (int32_t)${name}_q_w2[k][j] * (int32_t)hq[j];`,
    `    outputs[k] = (float)acc * ${name}_q_out_scale[k];`,
    `  }`,
  ];
  if (head === 'softmax') {
    out.push(`  for (k = 1; k < ${N}_OUTPUTS; k++) if (outputs[k] > outputs[best]) best = k;`, `  return best;`);
  } else if (head === 'logistic') {
    out.push(`  return outputs[0] > 0.0f ? 1 : 0;`);
  } else {
    out.push(`  return 0;`);
  }
  out.push(`}`, ``);
  return out;
}
