/**
 * The production kernel: WebAssembly with 128-bit SIMD, float64, bit-identical to the
 * reference kernel (see src/nn/wasm/kernel.as). One module instance per thread serves every
 * trainer in it; calls are synchronous, so they share one work area.
 */
import type { Kernel } from './kernel.js';
import type { Shape } from './network.js';
import { activationCode, headCode } from './reference.js';
import { KERNEL_BASE64 } from './wasm/kernel-bytes.js';

/** The slice of the WebAssembly API used here (the project's type libraries do not declare it). */
interface WasmMemory {
  readonly buffer: ArrayBuffer;
  grow(pages: number): number;
}
interface WasmApi {
  validate(bytes: Uint8Array): boolean;
  Module: new (bytes: Uint8Array) => object;
  Instance: new (module: object, imports: object) => { exports: object };
}
const wasmApi = (globalThis as unknown as { WebAssembly?: WasmApi }).WebAssembly;

interface KernelExports {
  memory: WasmMemory;
  workBytes(d: number, h: number, k: number): number;
  lossGrad(
    act: number,
    head: number,
    d: number,
    h: number,
    k: number,
    params: number,
    x: number,
    y: number,
    start: number,
    end: number,
    grad: number,
    work: number,
    off: number,
  ): number;
  forward(
    act: number,
    d: number,
    h: number,
    k: number,
    params: number,
    x: number,
    rows: number,
    out: number,
    hidden: number,
    work: number,
  ): void;
  heapBase(): number;
}

/** Data arrays stay resident in wasm memory until this many bytes are cached; then the cache starts over. */
const CACHE_LIMIT_BYTES = 1 << 30;
const CACHE_LIMIT_ENTRIES = 32;
const PAGE = 65536;

class Runtime {
  readonly ex: KernelExports;
  private f64: Float64Array;
  private readonly base: number;
  private top: number;
  private readonly cache = new Map<Float64Array, number>();
  /** Changes whenever cached data or the memory itself changed, so kernels know to re-resolve their offsets. */
  version = 0;

  constructor(ex: KernelExports) {
    this.ex = ex;
    this.base = align(ex.heapBase());
    this.top = this.base;
    this.f64 = new Float64Array(ex.memory.buffer);
  }

  /** A Float64Array over the whole memory, renewed after the memory grew. */
  view(): Float64Array {
    if (this.f64.buffer !== this.ex.memory.buffer) this.f64 = new Float64Array(this.ex.memory.buffer);
    return this.f64;
  }

  private ensure(bytes: number): void {
    const have = this.ex.memory.buffer.byteLength;
    if (bytes > have) {
      this.ex.memory.grow(Math.ceil((bytes - have) / PAGE));
      this.version++;
    }
  }

  /** Byte offset of one data array inside wasm memory (copied in on first use). */
  residentOne(a: Float64Array): number {
    const at = this.cache.get(a);
    return at !== undefined ? at : this.resident(a, null)[0];
  }

  /**
   * Byte offsets of the given data arrays inside wasm memory (copied in on first use). Data
   * arrays are treated as immutable once a trainer has used them, as EncodedDataset promises.
   */
  resident(a: Float64Array, b: Float64Array | null): [number, number] {
    let pa = this.cache.get(a);
    let pb = b === null ? 0 : this.cache.get(b);
    if (pa !== undefined && pb !== undefined) return [pa, pb];
    const need = (pa === undefined ? a.byteLength + 16 : 0) + (b !== null && pb === undefined ? b.byteLength + 16 : 0);
    if (this.top + need - this.base > CACHE_LIMIT_BYTES || this.cache.size + 2 > CACHE_LIMIT_ENTRIES) {
      this.cache.clear();
      this.top = this.base;
      this.version++;
      pa = undefined;
      pb = b === null ? 0 : undefined;
    }
    if (pa === undefined) pa = this.copyIn(a);
    if (pb === undefined && b !== null) pb = this.copyIn(b);
    return [pa, pb ?? 0];
  }

  private copyIn(a: Float64Array): number {
    const at = this.top;
    this.ensure(at + a.byteLength);
    this.view().set(a, at / 8);
    this.top = align(at + a.byteLength);
    this.cache.set(a, at);
    this.version++;
    return at;
  }

  /** Byte offset of a scratch area of `bytes` bytes above the cached data (valid until the next call). */
  scratch(bytes: number): number {
    this.ensure(this.top + bytes + 64);
    return this.top;
  }
}

function align(n: number): number {
  return (n + 63) & ~63;
}

let runtime: Runtime | null | undefined;

function decode(b64: string): Uint8Array {
  return Uint8Array.from(Buffer.from(b64, 'base64'));
}

/** The per-thread kernel module, or null where this engine has no WebAssembly SIMD. */
function getRuntime(): Runtime | null {
  if (runtime !== undefined) return runtime;
  try {
    const bytes = decode(KERNEL_BASE64);
    if (wasmApi === undefined || !wasmApi.validate(bytes)) {
      runtime = null;
    } else {
      const instance = new wasmApi.Instance(new wasmApi.Module(bytes), { env: { abort: () => undefined } });
      runtime = new Runtime(instance.exports as unknown as KernelExports);
    }
  } catch {
    runtime = null;
  }
  return runtime;
}

export function wasmAvailable(): boolean {
  return getRuntime() !== null;
}

/** A kernel backed by the shared WebAssembly module; throws when WebAssembly SIMD is unavailable. */
export function wasmKernel(): Kernel {
  const rt = getRuntime();
  if (rt === null) throw new Error('WebAssembly SIMD is not available in this JavaScript engine');
  const ex = rt.ex;
  // Offsets of the last gradient call, reused while nothing moved (the epoch loop must not allocate).
  // Gradient and forward calls share the scratch area above the cached data; each call rewrites
  // everything it reads there, so they may overlap.
  let gVersion = -1;
  let gShape: Shape | null = null;
  let gX: Float64Array | null = null;
  let gY: Float64Array | null = null;
  let xp = 0;
  let yp = 0;
  let pp = 0;
  let gp = 0;
  let wp = 0;
  let mem = rt.view();
  let gradView = mem.subarray(0, 0);
  let act = 0;
  let head = 0;
  // The same for the last forward call.
  let fVersion = -1;
  let fShape: Shape | null = null;
  let fX: Float64Array | null = null;
  let fRows = -1;
  let fHidBytes = -1;
  let fx = 0;
  let fp = 0;
  let op = 0;
  let hp = 0;
  let fw = 0;
  let fmem = mem;
  let logitsView = mem.subarray(0, 0);
  let hiddenView = mem.subarray(0, 0);
  return {
    name: 'wasm-simd-f64',
    lossAndGradient(
      shape: Shape,
      params: Float64Array,
      x: Float64Array,
      y: Float64Array,
      start: number,
      end: number,
      grad: Float64Array,
      primeOffset = 0,
    ): number {
      const P = params.length;
      if (gVersion !== rt.version || shape !== gShape || x !== gX || y !== gY) {
        [xp, yp] = rt.resident(x, y);
        pp = rt.scratch(16 * P + 128 + ex.workBytes(shape.inputs, shape.width, shape.outputs));
        gp = align(pp + 8 * P);
        wp = align(gp + 8 * P);
        mem = rt.view();
        gradView = mem.subarray(gp / 8, gp / 8 + P);
        act = activationCode(shape.activation);
        head = headCode(shape.head);
        gVersion = rt.version;
        gShape = shape;
        gX = x;
        gY = y;
      }
      const po = pp / 8;
      if (P <= 64) for (let q = 0; q < P; q++) mem[po + q] = params[q];
      else mem.set(params, po);
      const loss = ex.lossGrad(
        act,
        head,
        shape.inputs,
        shape.width,
        shape.outputs,
        pp,
        xp,
        yp,
        start,
        end,
        gp,
        wp,
        primeOffset,
      );
      if (P <= 64) for (let q = 0; q < P; q++) grad[q] = gradView[q];
      else grad.set(gradView);
      return loss;
    },
    forward(
      shape: Shape,
      params: Float64Array,
      x: Float64Array,
      rows: number,
      logits: Float64Array,
      hidden: Float64Array | null,
    ): void {
      const P = params.length;
      const D = shape.inputs;
      const H = shape.width;
      const K = shape.outputs;
      const hidBytes = hidden ? 8 * rows * H : 0;
      if (fVersion !== rt.version || shape !== fShape || x !== fX || rows !== fRows || hidBytes !== fHidBytes) {
        fx = rt.residentOne(x);
        const outBytes = 8 * rows * K;
        fp = rt.scratch(8 * P + outBytes + hidBytes + 256 + ex.workBytes(D, H, K));
        op = align(fp + 8 * P);
        hp = align(op + outBytes);
        fw = align(hp + hidBytes);
        fmem = rt.view();
        logitsView = fmem.subarray(op / 8, op / 8 + rows * K);
        hiddenView = fmem.subarray(hp / 8, hp / 8 + rows * H);
        fVersion = rt.version;
        fShape = shape;
        fX = x;
        fRows = rows;
        fHidBytes = hidBytes;
      }
      fmem.set(params, fp / 8);
      ex.forward(activationCode(shape.activation), D, H, K, fp, fx, rows, op, hidden ? hp : 0, fw);
      logits.set(logitsView);
      if (hidden) hidden.set(hiddenView);
    },
  };
}
