/**
 * Analytic gradients against central finite differences, for every hidden activation and
 * output head, in double precision: relative error below 1e-6.
 */
import { describe, expect, it } from 'vitest';
import type { Activation } from '../../src/config/types.js';
import type { Head } from '../../src/nn/index.js';
import { referenceKernel, type Kernel } from '../../src/nn/kernel/kernel.js';
import { initParams } from '../../src/nn/network.js';
import { type Shape } from '../../src/nn/kernel/layout.js';
import { Xoshiro128StarStar } from '../../src/common/random.js';
import { productionKernels } from './kernels.js';

const ACTIVATIONS: Activation[] = ['tanh', 'logistic', 'relu'];
const HEADS: [Head, number][] = [
  ['linear', 1],
  ['logistic', 1],
  ['softmax', 3],
];

function problem(activation: Activation, head: Head, K: number, seed: number) {
  const rng = new Xoshiro128StarStar(seed, 17, 29, 31);
  const shape: Shape = { inputs: 3, width: 5, outputs: K, activation, head };
  const params = initParams(shape, 'glorot', rng);
  for (let q = 0; q < params.length; q++) params[q] += rng.nextDouble() - 0.5;
  const N = 7;
  const x = new Float64Array(N * 3).map(() => 2 * rng.nextDouble() - 1);
  const y = new Float64Array(N).map((_, p) =>
    head === 'linear' ? 2 * rng.nextDouble() - 1 : p % (head === 'softmax' ? K : 2),
  );
  return { shape, params, x, y, N };
}

/** Largest |analytic − central difference| / max(|analytic|, |difference|, 1e-3) over all parameters. */
function worstRelativeError(kernel: Kernel, activation: Activation, head: Head, K: number, seed: number): number {
  const { shape, params, x, y, N } = problem(activation, head, K, seed);
  const g = new Float64Array(params.length);
  const scratch = new Float64Array(params.length);
  kernel.lossAndGradient(shape, params, x, y, 0, N, g);
  let worst = 0;
  for (let q = 0; q < params.length; q++) {
    const h = 1e-5;
    const w = params[q];
    params[q] = w + h;
    const up = kernel.lossAndGradient(shape, params, x, y, 0, N, scratch);
    params[q] = w - h;
    const down = kernel.lossAndGradient(shape, params, x, y, 0, N, scratch);
    params[q] = w;
    const fd = (up - down) / (2 * h);
    const err = Math.abs(fd - g[q]) / Math.max(Math.abs(g[q]), Math.abs(fd), 1e-3);
    if (err > worst) worst = err;
  }
  return worst;
}

const kernels: [string, () => Kernel][] = [['reference', referenceKernel], ...productionKernels()];

describe.each(kernels)('gradients of the %s kernel vs central finite differences', (_name, make) => {
  for (const activation of ACTIVATIONS) {
    for (const [head, K] of HEADS) {
      it(`${activation} hidden, ${head} head`, () => {
        const kernel = make();
        for (const seed of [1, 2, 3]) expect(worstRelativeError(kernel, activation, head, K, seed)).toBeLessThan(1e-6);
      });
    }
  }

  it('the check can fail: a wrong gradient (one entry off by 1e-4) is detected', () => {
    const kernel = make();
    const broken: Kernel = {
      name: 'broken',
      forward: (...args) => kernel.forward(...args),
      lossAndGradient(shape, params, x, y, start, end, grad) {
        const loss = kernel.lossAndGradient(shape, params, x, y, start, end, grad);
        grad[2] += 1e-4;
        return loss;
      },
    };
    expect(worstRelativeError(broken, 'tanh', 'softmax', 3, 1)).toBeGreaterThan(1e-6);
  });
});
