/**
 * Network shape and parameter layout, shared by both kernels and the rest of the engine.
 *
 * All parameters live in one Float64Array, in this order:
 *   W1  inputs × width  (row i holds input i's weights to every hidden neuron)
 *   b1  width
 *   W2  width × outputs (row j holds hidden neuron j's weights to every output)
 *   b2  outputs
 * Rows are contiguous so the forward and backward loops run along memory.
 */
import type { Activation } from '../../config/types.js';

export type Head = 'softmax' | 'logistic' | 'linear';

export interface Shape {
  readonly inputs: number;
  readonly width: number;
  readonly outputs: number;
  readonly activation: Activation;
  readonly head: Head;
}

export interface Layout {
  w1: number;
  b1: number;
  w2: number;
  b2: number;
  size: number;
}

export function layoutOf(s: { inputs: number; width: number; outputs: number }): Layout {
  const w1 = 0;
  const b1 = s.inputs * s.width;
  const w2 = b1 + s.width;
  const b2 = w2 + s.width * s.outputs;
  return { w1, b1, w2, b2, size: b2 + s.outputs };
}
