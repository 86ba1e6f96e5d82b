/**
 * Forward outputs, losses and gradients against @tensorflow/tfjs (CPU backend, float32), a
 * general-purpose reference library, on random networks for every head and activation.
 * Weights and inputs are multiples of 1/64 of modest size, so they are exact in float32 and
 * both sides start from the same numbers; tfjs then rounds every operation to float32, so the
 * comparison allows 1e-5 relative to the largest entry of each compared tensor.
 */
import * as tf from '@tensorflow/tfjs';
import { beforeAll, describe, expect, it } from 'vitest';
import type { Activation } from '../../src/config/types.js';
import type { Head } from '../../src/nn/index.js';
import { referenceKernel, type Kernel } from '../../src/nn/kernel/kernel.js';
import { layoutOf, type Shape } from '../../src/nn/kernel/layout.js';
import { headCode, headOutputs } from '../../src/nn/kernel/reference.js';
import { Xoshiro128StarStar } from '../../src/common/random.js';
import { productionKernels } from './kernels.js';

beforeAll(async () => {
  await tf.setBackend('cpu');
  await tf.ready();
});

/** Largest |a − b| relative to the largest |b|. */
function relErr(a: ArrayLike<number>, b: ArrayLike<number>): number {
  let scale = 0;
  let diff = 0;
  for (let q = 0; q < b.length; q++) {
    scale = Math.max(scale, Math.abs(b[q]));
    diff = Math.max(diff, Math.abs(a[q] - b[q]));
  }
  return diff / Math.max(scale, 1e-30);
}

/** Exact conversion: every value here is a multiple of 1/64 well inside float32's range. */
function f32(a: Float64Array): Float32Array {
  const out = Float32Array.from(a);
  for (let q = 0; q < a.length; q++) if (out[q] !== a[q]) throw new Error('value not exact in float32');
  return out;
}

function grid(rng: Xoshiro128StarStar, span: number): number {
  return Math.round((2 * rng.nextDouble() - 1) * span * 64) / 64;
}

interface Case {
  shape: Shape;
  params: Float64Array;
  x: Float64Array;
  y: Float64Array;
  N: number;
}

function makeCase(activation: Activation, head: Head, K: number, seed: number): Case {
  const rng = new Xoshiro128StarStar(seed, 3, 5, 7);
  const D = 4;
  const H = 6;
  const N = 9;
  const shape: Shape = { inputs: D, width: H, outputs: K, activation, head };
  const params = new Float64Array(layoutOf(shape).size).map(() => grid(rng, 1.5));
  const x = new Float64Array(N * D).map(() => grid(rng, 2));
  const y = new Float64Array(N).map((_, p) => (head === 'linear' ? grid(rng, 1) : p % (head === 'softmax' ? K : 2)));
  return { shape, params, x, y, N };
}

/** The same network in tfjs: summed loss, head outputs and gradients in our parameter layout. */
function tfjsReference(c: Case): { loss: number; outputs: Float32Array; grad: Float64Array } {
  const { shape, params, x, y, N } = c;
  const { inputs: D, width: H, outputs: K } = shape;
  const lay = layoutOf(shape);
  tf.engine().startScope();
  try {
    const w1 = tf.tensor2d(f32(params.slice(lay.w1, lay.b1)), [D, H], 'float32');
    const b1 = tf.tensor1d(f32(params.slice(lay.b1, lay.w2)), 'float32');
    const w2 = tf.tensor2d(f32(params.slice(lay.w2, lay.b2)), [H, K], 'float32');
    const b2 = tf.tensor1d(f32(params.slice(lay.b2, lay.size)), 'float32');
    const xt = tf.tensor2d(f32(x), [N, D], 'float32');
    const act = (a: tf.Tensor) =>
      shape.activation === 'tanh' ? tf.tanh(a) : shape.activation === 'logistic' ? tf.sigmoid(a) : tf.relu(a);
    const logits = (ww1: tf.Tensor, bb1: tf.Tensor, ww2: tf.Tensor, bb2: tf.Tensor) =>
      tf.add(
        tf.matMul(act(tf.add(tf.matMul(xt, ww1 as tf.Tensor2D), bb1)) as tf.Tensor2D, ww2 as tf.Tensor2D),
        bb2,
      ) as tf.Tensor2D;
    const SUM = tf.Reduction.SUM;
    const lossFn = (ww1: tf.Tensor, bb1: tf.Tensor, ww2: tf.Tensor, bb2: tf.Tensor): tf.Scalar => {
      const z = logits(ww1, bb1, ww2, bb2);
      if (shape.head === 'linear') {
        return tf.mul(0.5, tf.losses.meanSquaredError(tf.tensor2d(f32(y), [N, 1]), z, undefined, SUM)) as tf.Scalar;
      }
      if (shape.head === 'logistic')
        return tf.losses.sigmoidCrossEntropy(tf.tensor2d(f32(y), [N, 1]), z, undefined, 0, SUM) as tf.Scalar;
      return tf.losses.softmaxCrossEntropy(
        tf.oneHot(tf.tensor1d(Int32Array.from(y), 'int32'), K),
        z,
        undefined,
        0,
        SUM,
      ) as tf.Scalar;
    };
    const { value, grads } = tf.valueAndGrads(lossFn)([w1, b1, w2, b2]);
    const z = logits(w1, b1, w2, b2);
    const out = shape.head === 'linear' ? z : shape.head === 'logistic' ? tf.sigmoid(z) : tf.softmax(z);
    const grad = new Float64Array(lay.size);
    grad.set(grads[0].dataSync(), lay.w1);
    grad.set(grads[1].dataSync(), lay.b1);
    grad.set(grads[2].dataSync(), lay.w2);
    grad.set(grads[3].dataSync(), lay.b2);
    return { loss: value.dataSync()[0], outputs: out.dataSync() as Float32Array, grad };
  } finally {
    tf.engine().endScope();
  }
}

const ACTS: Activation[] = ['tanh', 'logistic', 'relu'];
const HEADS: [Head, number][] = [
  ['linear', 1],
  ['logistic', 1],
  ['softmax', 3],
];
const kernels: [string, () => Kernel][] = [['reference', referenceKernel], ...productionKernels()];

describe.each(kernels)('%s kernel vs @tensorflow/tfjs (cpu, float32)', (_name, make) => {
  for (const act of ACTS) {
    for (const [head, K] of HEADS) {
      it(`${act} hidden, ${head} head: outputs, loss and gradients agree to 1e-5 relative`, () => {
        const kernel = make();
        for (const seed of [1, 2, 3, 4]) {
          const c = makeCase(act, head, K, seed);
          const ref = tfjsReference(c);
          const grad = new Float64Array(c.params.length);
          const loss = kernel.lossAndGradient(c.shape, c.params, c.x, c.y, 0, c.N, grad);
          const logits = new Float64Array(c.N * K);
          kernel.forward(c.shape, c.params, c.x, c.N, logits, null);
          const outputs = new Float64Array(c.N * K);
          for (let p = 0; p < c.N; p++) headOutputs(headCode(head), K, logits, p * K, outputs, p * K);
          expect(Math.abs(loss - ref.loss) / Math.abs(ref.loss)).toBeLessThan(1e-5);
          expect(relErr(outputs, ref.outputs)).toBeLessThan(1e-5);
          expect(relErr(grad, ref.grad)).toBeLessThan(1e-5);
        }
      });
    }
  }

  it('the comparison can fail: a gradient with one entry 1e-3 off is caught', () => {
    const c = makeCase('tanh', 'softmax', 3, 9);
    const ref = tfjsReference(c);
    const grad = new Float64Array(c.params.length);
    make().lossAndGradient(c.shape, c.params, c.x, c.y, 0, c.N, grad);
    grad[1] += 1e-3 * Math.max(...Array.from(grad, Math.abs));
    expect(relErr(grad, ref.grad)).toBeGreaterThan(1e-5);
  });
});
