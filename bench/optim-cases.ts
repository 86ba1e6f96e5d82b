/**
 * Optimiser comparison cases: evaluations (full passes over the rows) until a network reaches
 * 100% training accuracy, for L-BFGS and iRprop+, from the same Nguyen–Widrow starts. The
 * problems are published benchmarks: XOR, 4-bit parity, and two spirals (Lang & Witbrock 1988,
 * 2 × 97 points, inputs scaled by 1/6.5). Exported for reuse by a fuller benchmark; run by
 * bench/optim.mjs.
 */
import { referenceKernel, type Kernel } from '../src/nn/kernel/kernel.js';
import { Lbfgs } from '../src/nn/lbfgs.js';
import { targetMetric } from '../src/nn/metrics.js';
import { initParams } from '../src/nn/network.js';
import { type Shape } from '../src/nn/kernel/layout.js';
import { IRpropPlus } from '../src/nn/optimizers.js';
import { HEAD_LOGISTIC } from '../src/nn/kernel/reference.js';
import { rngFor } from '../src/common/random.js';

export interface OptimCase {
  name: string;
  shape: Shape;
  rows: number;
  x: Float64Array;
  /** Class index per row (0/1, logistic head). */
  y: Float64Array;
  /** Evaluations each run may use. */
  maxEvaluations: number;
}

function binaryCase(
  name: string,
  inputs: number,
  width: number,
  maxEvaluations: number,
  label: (bits: number[]) => number,
): OptimCase {
  const rows = 1 << inputs;
  const x = new Float64Array(rows * inputs);
  const y = new Float64Array(rows);
  for (let p = 0; p < rows; p++) {
    const bits: number[] = [];
    for (let i = 0; i < inputs; i++) {
      const b = (p >> (inputs - 1 - i)) & 1;
      bits.push(b);
      x[p * inputs + i] = b ? 1 : -1;
    }
    y[p] = label(bits);
  }
  return {
    name,
    shape: { inputs, width, outputs: 1, activation: 'tanh', head: 'logistic' },
    rows,
    x,
    y,
    maxEvaluations,
  };
}

const parity = (bits: number[]): number => bits.reduce((a, b) => a ^ b, 0);

/** Two spirals: for i = 0..96, angle iπ/16, radius 6.5·(104 − i)/104; (x, y) → 1 and (−x, −y) → 0. */
export function twoSpirals(width: number, maxEvaluations: number): OptimCase {
  const rows = 194;
  const x = new Float64Array(rows * 2);
  const y = new Float64Array(rows);
  for (let i = 0; i < 97; i++) {
    const angle = (i * Math.PI) / 16;
    const r = (6.5 * (104 - i)) / 104;
    const px = (r * Math.sin(angle)) / 6.5;
    const py = (r * Math.cos(angle)) / 6.5;
    x.set([px, py, -px, -py], 4 * i);
    y[2 * i] = 1;
    y[2 * i + 1] = 0;
  }
  return {
    name: `two spirals, 2-${width}-1`,
    shape: { inputs: 2, width, outputs: 1, activation: 'tanh', head: 'logistic' },
    rows,
    x,
    y,
    maxEvaluations,
  };
}

export const OPTIM_CASES: readonly OptimCase[] = [
  binaryCase('XOR, 2-2-1', 2, 2, 2000, parity),
  binaryCase('4-bit parity, 4-4-1', 4, 4, 5000, parity),
  twoSpirals(16, 5000),
];

export type OptimizerChoice = { kind: 'lbfgs' } | { kind: 'irprop+' };

export interface CaseResult {
  runs: number;
  /** Runs that reached 100% training accuracy within the budget. */
  solved: number;
  /** Evaluations of each solved run, ascending. */
  evaluations: number[];
  /** Mean over runs of the best training accuracy seen. */
  meanBestAccuracy: number;
}

function accuracyOf(kernel: Kernel, c: OptimCase, params: Float64Array, logits: Float64Array): number {
  kernel.forward(c.shape, params, c.x, c.rows, logits, null);
  return targetMetric('accuracy', HEAD_LOGISTIC, 1, logits, c.y, c.rows, 1);
}

/** One run from the start of restart `restart`; returns the evaluations to 100% (or -1) and the best accuracy. */
export function runOnce(c: OptimCase, choice: OptimizerChoice, restart: number): { evaluations: number; best: number } {
  const kernel = referenceKernel();
  const params = initParams(c.shape, 'nguyen-widrow', rngFor(1, c.shape.width, restart));
  const grad = new Float64Array(params.length);
  const logits = new Float64Array(c.rows);
  let best = accuracyOf(kernel, c, params, logits);
  let evaluations = 0;
  if (choice.kind === 'lbfgs') {
    const opt = new Lbfgs(params.length);
    const objective = (p: Float64Array, g: Float64Array) => kernel.lossAndGradient(c.shape, p, c.x, c.y, 0, c.rows, g);
    let status = 'progress';
    while (best < 1 && status === 'progress' && evaluations < c.maxEvaluations) {
      const r = opt.iterate(params, objective, c.maxEvaluations - evaluations);
      evaluations += r.evaluations;
      status = r.status;
      best = Math.max(best, accuracyOf(kernel, c, params, logits));
    }
  } else {
    const opt = new IRpropPlus(params.length);
    while (best < 1 && evaluations < c.maxEvaluations) {
      const loss = kernel.lossAndGradient(c.shape, params, c.x, c.y, 0, c.rows, grad);
      evaluations++;
      opt.step(params, grad, loss, c.rows);
      best = Math.max(best, accuracyOf(kernel, c, params, logits));
    }
  }
  return { evaluations: best === 1 ? evaluations : -1, best };
}

export function evaluationsToTarget(c: OptimCase, choice: OptimizerChoice, runs: number): CaseResult {
  const evaluations: number[] = [];
  let bestSum = 0;
  for (let r = 0; r < runs; r++) {
    const one = runOnce(c, choice, r);
    if (one.evaluations >= 0) evaluations.push(one.evaluations);
    bestSum += one.best;
  }
  evaluations.sort((a, b) => a - b);
  return { runs, solved: evaluations.length, evaluations, meanBestAccuracy: bestSum / runs };
}
