/** Test problems and a driver shared by the L-BFGS tests. */
import { Lbfgs, type LbfgsOptions, type Objective } from '../../src/nn/lbfgs.js';
import { referenceKernel } from '../../src/nn/kernel/kernel.js';
import { targetMetric } from '../../src/nn/metrics.js';
import type { Shape } from '../../src/nn/kernel/layout.js';
import { HEAD_LOGISTIC } from '../../src/nn/kernel/reference.js';

/**
 * Extended Rosenbrock (Moré, Garbow & Hillstrom 1981, ACM TOMS 7(1), problem 21): for each pair,
 * 100(x₂ − x₁²)² + (1 − x₁)². Two variables give the classic Rosenbrock function.
 */
export const rosenbrock: Objective = (x, g) => {
  let f = 0;
  for (let i = 0; i < x.length; i += 2) {
    const a = x[i];
    const t = x[i + 1] - a * a;
    const u = 1 - a;
    f += 100 * t * t + u * u;
    g[i] = -400 * a * t - 2 * u;
    g[i + 1] = 200 * t;
  }
  return f;
};

/** The standard start (−1.2, 1, −1.2, 1, …) of that problem (Nocedal & Wright 2006 section 2.1 for n = 2; MGH for all n). */
export function rosenbrockStart(n: number): Float64Array {
  const x = new Float64Array(n);
  for (let i = 0; i < n; i += 2) {
    x[i] = -1.2;
    x[i + 1] = 1;
  }
  return x;
}

/** Tight tolerances: converge on the gradient alone, to near rounding level. */
export const TIGHT: Partial<LbfgsOptions> = { gradientTolerance: 1e-10, lossTolerance: 0 };

export interface Run {
  status: string;
  /** Calls that took a step or ended the run. */
  calls: number;
  evaluations: number;
  opt: Lbfgs;
}

/** Iterates until the status is no longer 'progress' or the evaluation budget is spent. */
export function minimise(x: Float64Array, f: Objective, options: Partial<LbfgsOptions>, budget = 100_000): Run {
  const opt = new Lbfgs(x.length, options);
  let evaluations = 0;
  let calls = 0;
  let status = 'progress';
  while (status === 'progress' && evaluations < budget) {
    const r = opt.iterate(x, f, budget - evaluations);
    evaluations += r.evaluations;
    calls++;
    status = r.status;
  }
  return { status, calls, evaluations, opt };
}

export function maxAbsDiff(a: ArrayLike<number>, b: ArrayLike<number>): number {
  let m = 0;
  for (let i = 0; i < a.length; i++) m = Math.max(m, Math.abs(a[i] - b[i]));
  return m;
}

export function dot(a: Float64Array, b: Float64Array): number {
  let s = 0;
  for (let i = 0; i < a.length; i++) s += a[i] * b[i];
  return s;
}

/** The XOR network of the engine: 2-2-1, tanh hidden, logistic head, inputs in {−1, 1}. */
export const XOR_SHAPE: Shape = { inputs: 2, width: 2, outputs: 1, activation: 'tanh', head: 'logistic' };
export const XOR_X = Float64Array.from([-1, -1, -1, 1, 1, -1, 1, 1]);
export const XOR_Y = Float64Array.from([0, 1, 1, 0]);

export function xorObjective(): Objective {
  const kernel = referenceKernel();
  return (p, g) => kernel.lossAndGradient(XOR_SHAPE, p, XOR_X, XOR_Y, 0, 4, g);
}

export function xorAccuracy(p: Float64Array): number {
  const logits = new Float64Array(4);
  referenceKernel().forward(XOR_SHAPE, p, XOR_X, 4, logits, null);
  return targetMetric('accuracy', HEAD_LOGISTIC, 1, logits, XOR_Y, 4, 1);
}
