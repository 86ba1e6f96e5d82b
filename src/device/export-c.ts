/**
 * Firmware export: a model as C99 source, NAME.h and NAME.c, with a float32 and an int8 path.
 * No dynamic allocation, nothing beyond the C standard library (math.h on the float path).
 * The constant objects are exactly those cost.ts counts (`storedObjects`), and the int8 path
 * does exactly what int8-forward.ts simulates, operation for operation.
 */
import { UserError } from '../common/errors.js';
import { checkCName, commentText, floatLiteral, intLiteral } from './c-text.js';
import { costShapeOf, storedObjects, type CType, type StoredObject } from './cost.js';
import { floatPath, helpers, int8Path, type FirmwareModel } from './c-code.js';
import { foldZeroPoint, type Int8Network } from './quantize.js';

export type { FirmwareModel } from './c-code.js';

/** Where the model came from, for the header comment (untrusted text: escaped there). */
export interface Provenance {
  toolVersion: string;
  dataFingerprint: string;
  config: string;
}

export interface CFiles {
  /** NAME.h and NAME.c. */
  headerFile: string;
  sourceFile: string;
  header: string;
  source: string;
}

export const DEFAULT_C_NAME = 'nb_model';

const q = (s: string): string => `"${commentText(s)}"`;

function checkModel(model: FirmwareModel): Int8Network {
  const net = model.network;
  const int8 = model.int8;
  if (int8 === null) {
    throw new UserError('model: no int8 network (key "int8" is null); write the model again with this version');
  }
  const values = [...net.hiddenWeights.flat(), ...net.hiddenBias, ...net.outputWeights.flat(), ...net.outputBias];
  if (!values.every(Number.isFinite)) throw new UserError('model: network weights must be finite numbers');
  if (int8.inputs !== net.inputs || int8.width !== net.width || int8.outputs !== net.outputs) {
    throw new UserError('model: the int8 network does not have the shape of the float network', { key: 'int8' });
  }
  return int8;
}

function headerText(model: FirmwareModel, name: string, p: Provenance): string {
  const N = name.toUpperCase();
  const net = model.network;
  const enc = model.encoding;
  const classes = enc.target.classes ?? [];
  const regression = model.task === 'regression';
  const act = net.activation;
  const lines: string[] = [
    `/*`,
    ` * ${name}.h: a neural network for the device, written by neuron-budget ${commentText(p.toolVersion, 32)}.`,
    ` * Do not edit: export it again from the model file instead.`,
    ` *`,
    ` * Data fingerprint: ${commentText(p.dataFingerprint, 80)}`,
    ` * Config: ${commentText(p.config, 120)}`,
    ` * Network: ${net.inputs} inputs after encoding, ${net.width} hidden neurons (${act}), ${net.outputs} output${
      net.outputs === 1 ? '' : 's'
    } (${net.head} head).`,
    ` *`,
    ` * features[] holds the raw values, in this order:`,
  ];
  enc.features.forEach((f, i) => {
    if (f.kind === 'numeric') {
      lines.push(` *   [${i}] ${q(f.name)}: a number, standardised on the device`);
    } else {
      lines.push(` *   [${i}] ${q(f.name)}: the category's index, one-hot encoded on the device:`);
      f.categories.forEach((c, k) => lines.push(` *         ${k} = ${q(c)}`));
    }
  });
  if (enc.features.some((f) => f.kind === 'categorical')) {
    lines.push(` * A category index that is not a whole number in range encodes as no category (all zeros).`);
  }
  lines.push(` *`);
  if (regression) {
    lines.push(
      ` * Both functions return 0 and write the prediction of ${q(enc.target.name)}, in its own units, to outputs[0].`,
    );
  } else {
    lines.push(` * Both functions return the class index of ${q(enc.target.name)}:`);
    classes.forEach((c, k) => lines.push(` *         ${k} = ${q(c)}`));
    lines.push(
      ` * ${name}_predict: the float32 network; outputs[] gets ${
        net.head === 'softmax' ? 'the probability of each class, in class order' : 'the probability of class 1'
      }.`,
      ` * ${name}_predict_int8: the int8 network; outputs[] gets the dequantised logit${
        net.outputs === 1 ? ' of class 1 (class 1 when it is above 0)' : ' of each class (the largest wins)'
      }.`,
    );
  }
  lines.push(
    ` * The int8 path is integer arithmetic apart from the input scaling and the output's dequantisation;`,
    ` * its outputs equal neuron-budget's simulation of it bit for bit on IEEE 754 single precision with`,
    ` * each assignment rounded to float (FLT_EVAL_METHOD 0, or GCC in an ISO mode such as -std=c99).`,
    ` * The float path runs the trained network in float32 arithmetic; it needs tanhf and expf (link -lm).`,
    ` */`,
    `#ifndef ${N}_H`,
    `#define ${N}_H`,
    ``,
    `#ifdef __cplusplus`,
    `extern "C" {`,
    `#endif`,
    ``,
    `#define ${N}_FEATURES ${enc.features.length}`,
    `#define ${N}_OUTPUTS ${net.outputs}`,
    `#define ${N}_INPUTS ${net.inputs}`,
    `#define ${N}_HIDDEN ${net.width}`,
  );
  if (!regression) lines.push(`#define ${N}_CLASSES ${classes.length}`);
  lines.push(
    ``,
    `int ${name}_predict(const float features[${N}_FEATURES], float outputs[${N}_OUTPUTS]);`,
    `int ${name}_predict_int8(const float features[${N}_FEATURES], float outputs[${N}_OUTPUTS]);`,
    ``,
    `#ifdef __cplusplus`,
    `}`,
    `#endif`,
    ``,
    `#endif`,
    ``,
  );
  return lines.join('\n');
}

/** Values wrapped into lines of at most ~100 characters, indented. */
function wrap(values: string[], indent: string): string {
  const lines: string[] = [];
  let line = '';
  for (const v of values) {
    if (line !== '' && line.length + v.length + 2 > 100 - indent.length) {
      lines.push(`${indent}${line},`);
      line = '';
    }
    line = line === '' ? v : `${line}, ${v}`;
  }
  if (line !== '') lines.push(`${indent}${line}`);
  return lines.join('\n');
}

function literal(type: CType, v: number): string {
  return type === 'float' ? floatLiteral(v) : intLiteral(v);
}

function declare(name: string, o: StoredObject, values: number[] | number[][]): string {
  const decl = `static const ${o.type} ${name}_${o.suffix}`;
  const flat = values.flat();
  if (flat.length !== o.count) throw new Error(`internal: ${o.suffix} has ${flat.length} values, expected ${o.count}`);
  const cells = (row: number[], indent: string): string =>
    wrap(
      row.map((v) => literal(o.type, v)),
      indent,
    );
  if (o.scalar) return `${decl} = ${literal(o.type, flat[0])};`;
  if (isMatrix(values)) {
    const rows = values.map((r) => `  {\n${cells(r, '    ')}\n  }`);
    return `${decl}[${values.length}][${values[0].length}] = {\n${rows.join(',\n')}\n};`;
  }
  return `${decl}[${o.count}] = {\n${cells(flat, '  ')}\n};`;
}

function isMatrix(values: number[] | number[][]): values is number[][] {
  return Array.isArray(values[0]);
}

/** The values of each stored object, keyed by suffix. */
function objectValues(model: FirmwareModel, int8: Int8Network): Record<string, number[] | number[][]> {
  const net = model.network;
  const enc = model.encoding;
  const numeric = enc.features.flatMap((f) => (f.kind === 'numeric' ? [f] : []));
  const qNumeric = int8.input.features.flatMap((f) => (f.kind === 'numeric' ? [f] : []));
  const f = (v: number): number => Math.fround(v);
  const rows = (m: number[][]): number[][] => m.map((r) => r.map(f));
  return {
    f_in_mean: numeric.map((e) => f(e.mean)),
    f_in_std: numeric.map((e) => f(e.std > 0 ? e.std : 1)),
    f_w1: rows(net.hiddenWeights),
    f_b1: net.hiddenBias.map(f),
    f_w2: rows(net.outputWeights),
    f_b2: net.outputBias.map(f),
    f_target: [f(enc.target.mean), f(enc.target.std)],
    q_in_mean: qNumeric.map((e) => e.mean),
    q_in_mul: qNumeric.map((e) => e.multiplier),
    q_in_zero: [int8.input.zeroPoint],
    q_in_one: [int8.input.one],
    q_w1: int8.hidden.weights,
    q_b1: foldZeroPoint(int8.hidden.bias, int8.hidden.weights, int8.input.zeroPoint),
    q_m0: int8.hidden.multiplier,
    q_shift: int8.hidden.shift,
    q_act_zero: [int8.hidden.preActivation.zeroPoint],
    q_lut: int8.hidden.table,
    q_w2: int8.output.weights,
    q_b2: foldZeroPoint(int8.output.bias, int8.output.weights, int8.hidden.activation.zeroPoint),
    q_out_scale: int8.output.scale,
  };
}

function sourceText(model: FirmwareModel, int8: Int8Network, name: string, p: Provenance): string {
  const stored = storedObjects(costShapeOf(model.network, model.encoding));
  const values = objectValues(model, int8);
  const numeric = model.encoding.features.some((f) => f.kind === 'numeric');
  const categorical = model.encoding.features.some((f) => f.kind === 'categorical');
  const s = int8.hidden;
  return [
    `/*`,
    ` * ${name}.c: written by neuron-budget ${commentText(p.toolVersion, 32)}; see ${name}.h. Do not edit.`,
    ` *`,
    ` * int8 scheme: input scale ${int8.input.scale.toPrecision(6)}, zero-point ${int8.input.zeroPoint};`,
    ` * pre-activation scale ${s.preActivation.scale.toPrecision(6)}, zero-point ${s.preActivation.zeroPoint};`,
    ` * hidden activation scale ${s.activation.scale.toPrecision(6)}, zero-point ${s.activation.zeroPoint};`,
    ` * symmetric per-neuron int8 weights, int32 biases (zero-points folded in), ${model.network.activation} by table.`,
    ` */`,
    `#include "${name}.h"`,
    `#include <math.h>`,
    `#include <stdint.h>`,
    ``,
    `/* float32 network */`,
    ...stored.float32.map((o) => declare(name, o, values[o.suffix])),
    ``,
    `/* int8 network */`,
    ...stored.int8.map((o) => declare(name, o, values[o.suffix])),
    ``,
    ...helpers(name, numeric, categorical),
    ...floatPath(model, name),
    ...int8Path(model, name),
  ].join('\n');
}

/** NAME.h and NAME.c for `model`; `name` must be a C identifier. */
export function exportC(model: FirmwareModel, name: string, provenance: Provenance): CFiles {
  checkCName(name);
  const int8 = checkModel(model);
  return {
    headerFile: `${name}.h`,
    sourceFile: `${name}.c`,
    header: headerText(model, name, provenance),
    source: sourceText(model, int8, name, provenance),
  };
}
