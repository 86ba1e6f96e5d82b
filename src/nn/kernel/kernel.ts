/**
 * The compute kernel a trainer runs: the summed loss and gradient over a range of rows, and
 * a forward pass. Two implementations share this shape: the float64 reference in plain
 * TypeScript and the WebAssembly SIMD kernel (float64 too), which is the production path.
 */
import type { Shape } from './layout.js';
import { makeScratch, referenceForward, referenceLossAndGradient, type Scratch } from './reference.js';

export interface Kernel {
  readonly name: string;
  lossAndGradient(
    shape: Shape,
    params: Float64Array,
    x: Float64Array,
    y: Float64Array,
    start: number,
    end: number,
    grad: Float64Array,
  ): number;
  forward(
    shape: Shape,
    params: Float64Array,
    x: Float64Array,
    rows: number,
    logits: Float64Array,
    hidden: Float64Array | null,
  ): void;
}

export function referenceKernel(): Kernel {
  let scratch: Scratch = makeScratch(0, 0);
  let width = -1;
  let outputs = -1;
  const sized = (shape: Shape): Scratch => {
    if (shape.width !== width || shape.outputs !== outputs) {
      scratch = makeScratch(shape.width, shape.outputs);
      width = shape.width;
      outputs = shape.outputs;
    }
    return scratch;
  };
  return {
    name: 'reference-f64',
    lossAndGradient(shape, params, x, y, start, end, grad) {
      return referenceLossAndGradient(shape, params, x, y, start, end, grad, sized(shape));
    },
    forward(shape, params, x, rows, logits, hidden) {
      referenceForward(shape, params, x, rows, logits, hidden, sized(shape));
    },
  };
}
