/** Picks the compute kernel a new trainer runs: the WebAssembly SIMD kernel, else the float64 reference (same bits). */
import { referenceKernel, type Kernel } from './kernel.js';
import { wasmAvailable, wasmKernel } from './wasm.js';

export function defaultKernel(): Kernel {
  return wasmAvailable() ? wasmKernel() : referenceKernel();
}
