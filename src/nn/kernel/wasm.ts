/**
 * The production kernel: WebAssembly with 128-bit SIMD, float64, bit-identical to the
 * reference kernel (see src/nn/wasm/kernel.as). One module instance per thread serves every
 * trainer in it; calls are synchronous, so they share one work area.
 */
import type { Kernel } from './kernel.js';
import type { Shape } from './layout.js';
import { activationCode, headCode } from './reference.js';
import { createHash } from 'node:crypto';
import { KERNEL_BASE64, KERNEL_SHA256 } from './kernel-bytes.js';

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
  const bytes = decode(KERNEL_BASE64);
  // The bytes are what the reproducibility check vouched for, or the build is broken: never run others.
  const sha = createHash('sha256').update(bytes).digest('hex');
  if (sha !== KERNEL_SHA256) throw new Error(`kernel bytes have sha256 ${sha}, expected ${KERNEL_SHA256}`);
  try {
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

/**
 * Where one gradient call's operands live in wasm memory. Kept while nothing moved (same shape,
 * same data, same memory), so the epoch loop allocates nothing and resolves nothing.
 */
class GradientPlan {
  version = -1;
  shape: Shape | null = null;
  x: Float64Array | null = null;
  y: Float64Array | null = null;
  xAt = 0;
  yAt = 0;
  paramsAt = 0;
  gradAt = 0;
  workAt = 0;
  activation = 0;
  head = 0;
  memory: Float64Array;
  grad: Float64Array;
  constructor(memory: Float64Array) {
    this.memory = memory;
    this.grad = memory.subarray(0, 0);
  }
  current(rt: Runtime, shape: Shape, x: Float64Array, y: Float64Array): boolean {
    return this.version === rt.version && shape === this.shape && x === this.x && y === this.y;
  }
  plan(rt: Runtime, shape: Shape, x: Float64Array, y: Float64Array, size: number): void {
    [this.xAt, this.yAt] = rt.resident(x, y);
    this.paramsAt = rt.scratch(16 * size + 128 + rt.ex.workBytes(shape.inputs, shape.width, shape.outputs));
    this.gradAt = align(this.paramsAt + 8 * size);
    this.workAt = align(this.gradAt + 8 * size);
    this.memory = rt.view();
    this.grad = this.memory.subarray(this.gradAt / 8, this.gradAt / 8 + size);
    this.activation = activationCode(shape.activation);
    this.head = headCode(shape.head);
    this.version = rt.version;
    this.shape = shape;
    this.x = x;
    this.y = y;
  }
}

/** The same for one forward call: inputs, logits and (optionally) hidden activations. */
class ForwardPlan {
  version = -1;
  shape: Shape | null = null;
  x: Float64Array | null = null;
  rows = -1;
  hiddenBytes = -1;
  xAt = 0;
  paramsAt = 0;
  logitsAt = 0;
  hiddenAt = 0;
  workAt = 0;
  memory: Float64Array;
  logits: Float64Array;
  hidden: Float64Array;
  constructor(memory: Float64Array) {
    this.memory = memory;
    this.logits = memory.subarray(0, 0);
    this.hidden = memory.subarray(0, 0);
  }
  current(rt: Runtime, shape: Shape, x: Float64Array, rows: number, hiddenBytes: number): boolean {
    return (
      this.version === rt.version &&
      shape === this.shape &&
      x === this.x &&
      rows === this.rows &&
      hiddenBytes === this.hiddenBytes
    );
  }
  plan(rt: Runtime, shape: Shape, x: Float64Array, rows: number, hiddenBytes: number, size: number): void {
    const { inputs: D, width: H, outputs: K } = shape;
    this.xAt = rt.residentOne(x);
    const logitBytes = 8 * rows * K;
    this.paramsAt = rt.scratch(8 * size + logitBytes + hiddenBytes + 256 + rt.ex.workBytes(D, H, K));
    this.logitsAt = align(this.paramsAt + 8 * size);
    this.hiddenAt = align(this.logitsAt + logitBytes);
    this.workAt = align(this.hiddenAt + hiddenBytes);
    this.memory = rt.view();
    this.logits = this.memory.subarray(this.logitsAt / 8, this.logitsAt / 8 + rows * K);
    this.hidden = this.memory.subarray(this.hiddenAt / 8, this.hiddenAt / 8 + rows * H);
    this.version = rt.version;
    this.shape = shape;
    this.x = x;
    this.rows = rows;
    this.hiddenBytes = hiddenBytes;
  }
}

/** A kernel backed by the shared WebAssembly module; throws when WebAssembly SIMD is unavailable. */
export function wasmKernel(): Kernel {
  const rt = getRuntime();
  if (rt === null) throw new Error('WebAssembly SIMD is not available in this JavaScript engine');
  const ex = rt.ex;
  // Gradient and forward calls share the scratch area above the cached data; each call rewrites
  // everything it reads there, so they may overlap.
  const g = new GradientPlan(rt.view());
  const f = new ForwardPlan(rt.view());
  return {
    name: 'wasm-simd-f64',
    lossAndGradient(shape, params, x, y, start, end, grad): number {
      const P = params.length;
      if (!g.current(rt, shape, x, y)) g.plan(rt, shape, x, y, P);
      const mem = g.memory;
      const po = g.paramsAt / 8;
      if (P <= 64) for (let q = 0; q < P; q++) mem[po + q] = params[q];
      else mem.set(params, po);
      const { inputs, width, outputs } = shape;
      const loss = ex.lossGrad(
        g.activation,
        g.head,
        inputs,
        width,
        outputs,
        g.paramsAt,
        g.xAt,
        g.yAt,
        start,
        end,
        g.gradAt,
        g.workAt,
      );
      const view = g.grad;
      if (P <= 64) for (let q = 0; q < P; q++) grad[q] = view[q];
      else grad.set(view);
      return loss;
    },
    forward(shape, params, x, rows, logits, hidden): void {
      const hiddenBytes = hidden ? 8 * rows * shape.width : 0;
      if (!f.current(rt, shape, x, rows, hiddenBytes)) f.plan(rt, shape, x, rows, hiddenBytes, params.length);
      f.memory.set(params, f.paramsAt / 8);
      const { inputs, width, outputs } = shape;
      ex.forward(
        activationCode(shape.activation),
        inputs,
        width,
        outputs,
        f.paramsAt,
        f.xAt,
        rows,
        f.logitsAt,
        hidden ? f.hiddenAt : 0,
        f.workAt,
      );
      logits.set(f.logits);
      if (hidden) hidden.set(f.hidden);
    },
  };
}
