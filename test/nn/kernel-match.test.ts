/**
 * The production WebAssembly kernel against the float64 reference: the same bits for losses,
 * gradients, logits and hidden activations, on random networks of many shapes (odd and even
 * widths, row counts that do and do not fill blocks of four, every activation and head).
 */
import { describe, expect, it } from 'vitest';
import type { Activation } from '../../src/config/types.js';
import type { Head } from '../../src/nn/index.js';
import { referenceKernel } from '../../src/nn/kernel/kernel.js';
import { initParams } from '../../src/nn/network.js';
import { type Shape } from '../../src/nn/kernel/layout.js';
import { Xoshiro128StarStar } from '../../src/common/random.js';
import { wasmKernel } from '../../src/nn/kernel/wasm.js';

function bitsEqual(a: Float64Array, b: Float64Array): boolean {
  if (a.length !== b.length) return false;
  const ua = new Uint32Array(a.buffer, a.byteOffset, a.length * 2);
  const ub = new Uint32Array(b.buffer, b.byteOffset, b.length * 2);
  for (let q = 0; q < ua.length; q++) if (ua[q] !== ub[q]) return false;
  return true;
}

const cases: [Activation, Head, number][] = [];
for (const act of ['tanh', 'logistic', 'relu'] as Activation[])
  for (const [head, K] of [
    ['linear', 1],
    ['logistic', 1],
    ['softmax', 2],
    ['softmax', 4],
  ] as [Head, number][])
    cases.push([act, head, K]);

describe('WebAssembly kernel is bit-identical to the float64 reference', () => {
  it.each(cases)('%s hidden, %s head, %i outputs', (activation, head, K) => {
    const rng = new Xoshiro128StarStar(11, K, activation.length, head.length);
    const ref = referenceKernel();
    const fast = wasmKernel();
    for (const [D, H, N] of [
      [1, 1, 1],
      [2, 2, 4],
      [3, 5, 7],
      [7, 8, 13],
      [5, 13, 33],
      // Crosses several 32-row gradient blocks, from block-aligned and unaligned starts.
      [6, 9, 101],
      [4, 0, 6],
    ]) {
      const shape: Shape = { inputs: D, width: H, outputs: K, activation, head };
      const params = initParams(shape, 'glorot', rng);
      for (let q = 0; q < params.length; q++) params[q] += 3 * (rng.nextDouble() - 0.5);
      const x = new Float64Array(N * D).map(() => 6 * (rng.nextDouble() - 0.5));
      const y = new Float64Array(N).map(() =>
        head === 'linear' ? rng.nextDouble() * 4 - 2 : Math.floor(rng.nextDouble() * (head === 'softmax' ? K : 2)),
      );
      const g1 = new Float64Array(params.length);
      const g2 = new Float64Array(params.length);
      for (const [s, e] of [
        [0, N],
        [1, N],
        [5, N],
        [0, Math.ceil(N / 2)],
      ]) {
        const l1 = ref.lossAndGradient(shape, params, x, y, s, e, g1);
        const l2 = fast.lossAndGradient(shape, params, x, y, s, e, g2);
        expect(Object.is(l1, l2)).toBe(true);
        expect(bitsEqual(g1, g2)).toBe(true);
      }
      const z1 = new Float64Array(N * K);
      const z2 = new Float64Array(N * K);
      const h1 = new Float64Array(N * H);
      const h2 = new Float64Array(N * H);
      ref.forward(shape, params, x, N, z1, h1);
      fast.forward(shape, params, x, N, z2, h2);
      expect(bitsEqual(z1, z2)).toBe(true);
      expect(bitsEqual(h1, h2)).toBe(true);
    }
  });

  it('the comparison can fail: one flipped low bit is detected', () => {
    const a = Float64Array.from([1, 2, 3]);
    const b = a.slice();
    new Uint32Array(b.buffer)[2] ^= 1;
    expect(bitsEqual(a, b)).toBe(false);
  });
});
