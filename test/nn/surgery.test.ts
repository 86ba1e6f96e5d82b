/**
 * Growing and pruning hidden neurons, and Nguyen-Widrow initialisation.
 *
 * Removal check: at the least-squares optimum of a linear output layer, removing hidden neuron
 * j and folding v_kj·h̄_j into the output biases raises E = ½ Σ_p Σ_k (y − t)² by exactly
 * ½ · Σ_k v_kj² · Σ_p (h_pj − h̄_j)² (E is quadratic in the output layer and its gradient is
 * zero there; derived, not taken from a paper). The least-squares layer is solved in the test.
 */
import { describe, expect, it } from 'vitest';
import { createTrainer, predict } from '../../src/nn/index.js';
import { rngFor } from '../../src/common/random.js';
import { referenceKernel } from '../../src/nn/kernel/kernel.js';
import { fromJson, initialNorm, initParams, nguyenWidrowBeta } from '../../src/nn/network.js';
import { layoutOf } from '../../src/nn/kernel/layout.js';
import { Xoshiro128StarStar } from '../../src/common/random.js';
import { dataset, options } from './helpers.js';

function regressionData(rows: number, inputs: number, seed: number) {
  const rng = new Xoshiro128StarStar(seed, 99, 7, 1);
  const x: number[] = [];
  const y: number[] = [];
  for (let p = 0; p < rows; p++) {
    let t = 0;
    for (let i = 0; i < inputs; i++) {
      const v = 2 * rng.nextDouble() - 1;
      x.push(v);
      t += Math.sin(2 * v * (i + 1));
    }
    y.push(t);
  }
  return dataset('regression', inputs, 1, x, y);
}

/** Solves A u = b (A symmetric positive definite, small) by Gaussian elimination with partial pivoting. */
function solve(A: number[][], b: number[]): number[] {
  const n = b.length;
  const M = A.map((row, r) => [...row, b[r]]);
  for (let c = 0; c < n; c++) {
    let piv = c;
    for (let r = c + 1; r < n; r++) if (Math.abs(M[r][c]) > Math.abs(M[piv][c])) piv = r;
    [M[c], M[piv]] = [M[piv], M[c]];
    for (let r = c + 1; r < n; r++) {
      const f = M[r][c] / M[c][c];
      for (let k = c; k <= n; k++) M[r][k] -= f * M[c][k];
    }
  }
  const u = new Array<number>(n).fill(0);
  for (let r = n - 1; r >= 0; r--) {
    let s = M[r][n];
    for (let k = r + 1; k < n; k++) s -= M[r][k] * u[k];
    u[r] = s / M[r][r];
  }
  return u;
}

function sse(out: Float64Array, y: Float64Array): number {
  let e = 0;
  for (let p = 0; p < y.length; p++) e += 0.5 * (out[p] - y[p]) ** 2;
  return e;
}

describe('adding a neuron', () => {
  it.each(['tanh', 'logistic', 'relu'] as const)('leaves every output bit-identical (%s)', (activation) => {
    const data = regressionData(37, 3, 1);
    const t = createTrainer(
      data,
      3,
      options({ activation, target: { metric: 'rmse', threshold: 0 } }),
      rngFor(4, 3, 0),
    );
    t.run(25);
    const before = predict(t.snapshot(), data.xTrain, data.trainRows);
    const lossBefore = t.evaluate().trainLoss;
    t.addNeuron(rngFor(4, 4, 0));
    expect(t.network.width).toBe(4);
    const after = predict(t.snapshot(), data.xTrain, data.trainRows);
    for (let p = 0; p < before.length; p++) expect(Object.is(after[p], before[p])).toBe(true);
    expect(Object.is(t.evaluate().trainLoss, lossBefore)).toBe(true);
    // The new neuron has fresh input weights and zero outgoing weights, and it trains.
    const snap = t.snapshot();
    expect(snap.outputWeights[0][3]).toBe(0);
    expect(snap.hiddenWeights[3].some((w) => w !== 0)).toBe(true);
    t.run(5);
    expect(t.snapshot().outputWeights[0][3]).not.toBe(0);
  });
});

describe('removing a neuron with mean compensation', () => {
  it('raises the squared error by ½·v_j²·Σ_p (h_pj − h̄_j)² at the least-squares output layer, and saliency() predicts it', () => {
    const data = regressionData(60, 2, 2);
    const N = data.trainRows;
    const H = 5;
    const base = createTrainer(data, H, options({ target: { metric: 'rmse', threshold: 0 } }), rngFor(9, H, 0));
    base.run(40);
    const { shape, params } = fromJson(base.snapshot());
    const hidden = new Float64Array(N * H);
    referenceKernel().forward(shape, params, data.xTrain, N, new Float64Array(N), hidden);
    // Least-squares output layer over [h, 1] by the normal equations.
    const A: number[][] = Array.from({ length: H + 1 }, () => new Array<number>(H + 1).fill(0));
    const b = new Array<number>(H + 1).fill(0);
    for (let p = 0; p < N; p++) {
      const f = [...Array.from(hidden.subarray(p * H, p * H + H)), 1];
      for (let r = 0; r <= H; r++) {
        b[r] += f[r] * data.yTrain[p];
        for (let c = 0; c <= H; c++) A[r][c] += f[r] * f[c];
      }
    }
    const u = solve(A, b);
    for (let j = 0; j < H; j++) {
      const t = createTrainer(data, H, options({ target: { metric: 'rmse', threshold: 0 } }), rngFor(9, H, 0));
      t.run(40);
      const live = (t as unknown as { parameters: Float64Array }).parameters;
      const lay = layoutOf(shape);
      for (let q = 0; q < H; q++) live[lay.w2 + q] = u[q];
      live[lay.b2] = u[H];
      const eBefore = sse(predict(t.snapshot(), data.xTrain, N), data.yTrain);
      const sal = t.saliency();
      let mean = 0;
      for (let p = 0; p < N; p++) mean += hidden[p * H + j];
      mean /= N;
      let spread = 0;
      for (let p = 0; p < N; p++) spread += (hidden[p * H + j] - mean) ** 2;
      const expected = 0.5 * u[j] * u[j] * spread;
      t.removeNeuron(j);
      expect(t.network.width).toBe(H - 1);
      const eAfter = sse(predict(t.snapshot(), data.xTrain, N), data.yTrain);
      expect(Math.abs(eAfter - eBefore - expected)).toBeLessThan(1e-9 * Math.max(expected, 1e-6));
      // saliency() reports the mean per-row loss increase: ΔE / N.
      expect(Math.abs(sal[j] * N - expected)).toBeLessThan(1e-9 * Math.max(expected, 1e-6));
    }
  });

  it('without compensation the increase would be different (the check can fail)', () => {
    // Same optimum argument, no bias fold: ΔE = ½·v_j²·Σ h_pj², which differs unless h̄_j = 0.
    const h = [0.2, 0.5, 0.9];
    const mean = (0.2 + 0.5 + 0.9) / 3;
    const withFold = h.reduce((s, v) => s + (v - mean) ** 2, 0);
    const without = h.reduce((s, v) => s + v * v, 0);
    expect(Math.abs(without - withFold)).toBeGreaterThan(1e-3);
  });

  it('resets the stall window and keeps training afterwards', () => {
    const data = regressionData(30, 2, 3);
    const t = createTrainer(
      data,
      3,
      options({ target: { metric: 'rmse', threshold: 0 }, stall: { window: 5, threshold: 0.5 } }),
      rngFor(1, 3, 0),
    );
    expect(t.run(1000).stop).toBe('stalled');
    t.removeNeuron(1);
    const rec = t.run(1000);
    expect(rec.stop).toBe('stalled');
    expect(rec.epochs).toBeGreaterThanOrEqual(5);
  });
});

describe('Nguyen-Widrow initialisation (Nguyen & Widrow 1990), its scale capped at 1', () => {
  it.each([
    [1, 1],
    [2, 2],
    [5, 3],
    [16, 10],
    [32, 2],
    [64, 50],
  ])('width %i, %i inputs: every hidden neuron has input-weight norm min(1, 0.7·H^(1/n)), bias within ±it', (H, n) => {
    const beta = 0.7 * Math.pow(H, 1 / n);
    expect(Math.abs(nguyenWidrowBeta(H, n) - beta)).toBeLessThan(1e-14 * beta);
    const norm = Math.min(1, beta);
    expect(Math.abs(initialNorm(H, n) - norm)).toBeLessThan(1e-14 * norm);
    const shape = { inputs: n, width: H, outputs: 2, activation: 'tanh' as const, head: 'softmax' as const };
    const params = initParams(shape, 'nguyen-widrow', rngFor(3, H, n));
    const lay = layoutOf(shape);
    for (let j = 0; j < H; j++) {
      let norm2 = 0;
      for (let i = 0; i < n; i++) norm2 += params[lay.w1 + i * H + j] ** 2;
      expect(Math.abs(Math.sqrt(norm2) - norm)).toBeLessThan(1e-12 * norm);
      expect(Math.abs(params[lay.b1 + j])).toBeLessThanOrEqual(norm);
    }
  });

  it('the cap binds only above 1: 0.7·H^(1/n) for 2 inputs up to width 2, 1 from width 3', () => {
    expect(initialNorm(2, 2)).toBeCloseTo(0.7 * Math.SQRT2, 14);
    expect(initialNorm(3, 2)).toBe(1);
    expect(initialNorm(4, 4)).toBeCloseTo(0.7 * Math.SQRT2, 14);
    expect(initialNorm(5, 4)).toBe(1);
  });

  it.each([
    [1, 0.7 * Math.pow(2, 1 / 3)],
    [4, 1], // 0.7·5^(1/3) = 1.197, capped
  ])('a neuron added to a network of width %i (3 inputs) gets norm min(1, 0.7·(H+1)^(1/n)) = %f', (H, expected) => {
    const data = regressionData(10, 3, 4);
    const t = createTrainer(data, H, options({ target: { metric: 'rmse', threshold: 0 } }), rngFor(2, H, 0));
    t.addNeuron(rngFor(2, H + 1, 0));
    const w = t.snapshot().hiddenWeights[H];
    const norm = Math.sqrt(w.reduce((s, v) => s + v * v, 0));
    expect(Math.abs(norm - expected)).toBeLessThan(1e-12);
  });
});
