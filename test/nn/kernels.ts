/** The kernels production may run, for tests that must cover each of them. */
import type { Kernel } from '../../src/nn/kernel/kernel.js';
import { wasmKernel } from '../../src/nn/kernel/wasm.js';

export function productionKernels(): [string, () => Kernel][] {
  return [['wasm-simd', wasmKernel]];
}
