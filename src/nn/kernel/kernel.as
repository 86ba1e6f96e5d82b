// The training kernel in AssemblyScript, compiled to WebAssembly with 128-bit SIMD (f64x2).
// scripts/build-kernel.mjs compiles this file; kernel-bytes.ts beside it holds the result.
//
// Every number this kernel produces is bit-identical to the float64 reference in
// reference.ts: each sum runs over the same terms in the same order (SIMD lanes hold
// different hidden neurons or different rows, never parts of one sum), and tanh, exp and log
// follow the same operations as detmath.ts, with the constants of constants.ts. Rows are processed four at a time so that
// each weight loaded from memory serves four rows; the input-weight gradient is summed over
// blocks of GRAD_BLOCK_ROWS rows in registers, and the reference sums it in the same blocks.
//
// Parameter layout (canonical, shared with TypeScript): W1 inputs×width, b1 width,
// W2 width×outputs, b2 outputs. Internally the hidden dimension is padded to an even
// count Hp and W2 is kept transposed (outputs×Hp) so that pairs of hidden neurons load together.
// W1 and its gradient are kept in panels: the weights of hidden neurons j..j+3 (j a multiple of
// four) for all inputs lie together, input by input (D × 4 values, starting at 8·j·D bytes),
// so the loops over inputs read memory in order; when Hp is not a multiple of four, the last
// panel holds one pair (D × 2 values).

// ---- generated constants: begin (written by scripts/build-kernel.mjs from constants.ts; do not edit)
const LN2_HI: f64 = 0.6931471803691238;
const LN2_LO: f64 = 1.9082149292705877e-10;
const INV_LN2: f64 = 1.4426950408889634;
const C2: f64 = 0.5;
const C3: f64 = 0.16666666666666666;
const C4: f64 = 0.041666666666666664;
const C5: f64 = 0.008333333333333333;
const C6: f64 = 0.001388888888888889;
const C7: f64 = 0.0001984126984126984;
const C8: f64 = 0.0000248015873015873;
const C9: f64 = 0.0000027557319223985893;
const C10: f64 = 2.755731922398589e-7;
const C11: f64 = 2.505210838544172e-8;
const C12: f64 = 2.08767569878681e-9;
const C13: f64 = 1.6059043836821613e-10;
const TANH_CLAMP: f64 = 22;
const ROUND_MAGIC: f64 = 6755399441055744;
const SQRT2: f64 = 1.4142135623730951;
const GRAD_BLOCK_ROWS: i32 = 32;
const ACT_TANH: i32 = 0;
const ACT_LOGISTIC: i32 = 1;
const ACT_RELU: i32 = 2;
const HEAD_LINEAR: i32 = 0;
const HEAD_LOGISTIC: i32 = 1;
const HEAD_SOFTMAX: i32 = 2;
// ---- generated constants: end

// ---- elementary functions (same operation sequence as detmath.ts) ----

/** Estrin's scheme for the same polynomial; detmath.ts evaluates it in the same order. */
@inline function expm1EstrinV(r: v128): v128 {
  const r2 = f64x2.mul(r, r);
  const r4 = f64x2.mul(r2, r2);
  const r8 = f64x2.mul(r4, r4);
  const b0 = f64x2.add(
    f64x2.add(f64x2.splat(1.0), f64x2.mul(f64x2.splat(C2), r)),
    f64x2.mul(f64x2.add(f64x2.splat(C3), f64x2.mul(f64x2.splat(C4), r)), r2),
  );
  const b1 = f64x2.add(
    f64x2.add(f64x2.splat(C5), f64x2.mul(f64x2.splat(C6), r)),
    f64x2.mul(f64x2.add(f64x2.splat(C7), f64x2.mul(f64x2.splat(C8), r)), r2),
  );
  const b2 = f64x2.add(
    f64x2.add(f64x2.splat(C9), f64x2.mul(f64x2.splat(C10), r)),
    f64x2.mul(f64x2.add(f64x2.splat(C11), f64x2.mul(f64x2.splat(C12), r)), r2),
  );
  const c0 = f64x2.add(b0, f64x2.mul(b1, r4));
  const c1 = f64x2.add(b2, f64x2.mul(f64x2.splat(C13), r4));
  return f64x2.mul(r, f64x2.add(c0, f64x2.mul(c1, r8)));
}

@inline function tanhV(x: v128): v128 {
  // pmin(a, b) is b < a ? b : a: one instruction, and like Math.min it keeps a NaN (a is never −0 here).
  const ax = f64x2.pmin(f64x2.abs(x), f64x2.splat(TANH_CLAMP));
  const y = f64x2.add(ax, ax);
  // k = y/ln2 rounded to a whole number (ties to even) by adding and removing 1.5·2^52; the low
  // bits of the sum then hold k itself, which builds 2^k directly (k is in [0, 64]; NaN lanes
  // stay NaN through p).
  const big = f64x2.add(f64x2.mul(y, f64x2.splat(INV_LN2)), f64x2.splat(ROUND_MAGIC));
  const k = f64x2.sub(big, f64x2.splat(ROUND_MAGIC));
  const r = f64x2.sub(f64x2.sub(y, f64x2.mul(k, f64x2.splat(LN2_HI))), f64x2.mul(k, f64x2.splat(LN2_LO)));
  const p = expm1EstrinV(r);
  const s = i64x2.shl(i64x2.add(big, i64x2.splat(1023)), 52);
  const em = f64x2.add(f64x2.mul(s, p), f64x2.sub(s, f64x2.splat(1.0)));
  const t = f64x2.div(em, f64x2.add(em, f64x2.splat(2.0)));
  // x < 0 ? −t : t, by flipping the sign bit where x < 0.
  return v128.xor(t, v128.and(f64x2.lt(x, f64x2.splat(0.0)), f64x2.splat(-0.0)));
}

@inline function logisticV(x: v128): v128 {
  return f64x2.add(f64x2.splat(0.5), f64x2.mul(f64x2.splat(0.5), tanhV(f64x2.mul(f64x2.splat(0.5), x))));
}

function tanhS(x: f64): f64 {
  return f64x2.extract_lane(tanhV(f64x2.splat(x)), 0);
}

function logisticS(x: f64): f64 {
  return 0.5 + 0.5 * tanhS(0.5 * x);
}

@inline function pow2(k: i64): f64 {
  return reinterpret<f64>((k + 1023) << 52);
}

function expm1PolyS(r: f64): f64 {
  let q = C12 + r * C13;
  q = C11 + r * q;
  q = C10 + r * q;
  q = C9 + r * q;
  q = C8 + r * q;
  q = C7 + r * q;
  q = C6 + r * q;
  q = C5 + r * q;
  q = C4 + r * q;
  q = C3 + r * q;
  q = C2 + r * q;
  q = 1 + r * q;
  return r * q;
}

function expS(x: f64): f64 {
  if (x != x) return x;
  if (x > 709.782712893384) return Infinity;
  if (x < -745.1332191019412) return 0;
  const k = Math.floor(x * INV_LN2 + 0.5);
  const r = x - k * LN2_HI - k * LN2_LO;
  const m = 1 + expm1PolyS(r);
  const ki = <i64>k;
  if (ki > 1023) return m * pow2(1023) * pow2(ki - 1023);
  if (ki < -1022) return m * pow2(ki + 1000) * pow2(-1000);
  return m * pow2(ki);
}

function logS(x: f64): f64 {
  if (x != x || x < 0) return NaN;
  if (x == 0) return -Infinity;
  if (x == Infinity) return Infinity;
  let e: i64 = 0;
  if (x < 2.2250738585072014e-308) {
    x *= 18014398509481984.0;
    e = -54;
  }
  const bits = reinterpret<u64>(x);
  e += <i64>((bits >> 52) & 0x7ff) - 1023;
  let m = reinterpret<f64>((bits & 0x000fffffffffffff) | 0x3ff0000000000000);
  if (m > SQRT2) {
    m *= 0.5;
    e += 1;
  }
  const f = m - 1;
  const s = f / (2 + f);
  const s2 = s * s;
  let q = 1.0 / 21.0 + s2 * (1.0 / 23.0);
  q = 1.0 / 19.0 + s2 * q;
  q = 1.0 / 17.0 + s2 * q;
  q = 1.0 / 15.0 + s2 * q;
  q = 1.0 / 13.0 + s2 * q;
  q = 1.0 / 11.0 + s2 * q;
  q = 1.0 / 9.0 + s2 * q;
  q = 1.0 / 7.0 + s2 * q;
  q = 1.0 / 5.0 + s2 * q;
  q = 1.0 / 3.0 + s2 * q;
  const series = s2 * q;
  const logm = 2 * s + 2 * s * series;
  const ef = <f64>e;
  return ef * LN2_HI + (logm + ef * LN2_LO);
}

function log1pS(u: f64): f64 {
  const w = 1 + u;
  if (w == 1) return u;
  return logS(w) + (u - (w - 1)) / w;
}

function softplusS(z: f64): f64 {
  return (z > 0 ? z : 0) + log1pS(expS(z > 0 ? -z : z));
}

// ---- state of the current call ----

let D: i32 = 0;
let H: i32 = 0;
let K: i32 = 0;
let Hp: i32 = 0;
let ACT: i32 = 0;
let HEAD: i32 = 0;
// work area pointers
let W1p: usize = 0;
let B1p: usize = 0;
let W2T: usize = 0;
let GW1: usize = 0;
let GB1: usize = 0;
let GW2T: usize = 0;
let GB2: usize = 0;
let HB: usize = 0; // 4 × Hp hidden activations of the block
let DB: usize = 0; // GRAD_BLOCK_ROWS × Hp hidden deltas of the current gradient block
let ZB: usize = 0; // 4 × K logits
let DZ: usize = 0; // 4 × K output deltas
let HT: usize = 0; // Hp × 4 hidden activations of the block, transposed (rows side by side)

/** Byte offset of W1 element (input i, hidden neuron j) in the panel layout. */
@inline function panelAt(i: i32, j: i32): usize {
  const j4 = j & ~3;
  const w = j4 + 4 <= Hp ? 4 : 2;
  return <usize>(8 * (j4 * D + i * w + (j - j4)));
}

/** Bytes of work memory a call with this shape needs. */
export function workBytes(d: i32, h: i32, k: i32): i32 {
  const hp = (h + 1) & ~1;
  return 8 * (2 * d * hp + 2 * hp + 2 * k * hp + k + (8 + GRAD_BLOCK_ROWS) * hp + 8 * k) + 64;
}

function setup(act: i32, head: i32, d: i32, h: i32, k: i32, params: usize, work: usize): void {
  ACT = act;
  HEAD = head;
  D = d;
  H = h;
  K = k;
  Hp = (h + 1) & ~1;
  let p = (work + 15) & ~(<usize>15);
  W1p = p; p += <usize>(8 * D * Hp);
  GW1 = p; p += <usize>(8 * D * Hp);
  B1p = p; p += <usize>(8 * Hp);
  GB1 = p; p += <usize>(8 * Hp);
  W2T = p; p += <usize>(8 * K * Hp);
  GW2T = p; p += <usize>(8 * K * Hp);
  HB = p; p += <usize>(32 * Hp);
  DB = p; p += <usize>(8 * GRAD_BLOCK_ROWS * Hp);
  ZB = p; p += <usize>(32 * K);
  DZ = p; p += <usize>(32 * K);
  HT = p; p += <usize>(32 * Hp);
  GB2 = p;
  // Pack the canonical parameters into the padded layout.
  for (let i = 0; i < D; i++) {
    for (let j = 0; j < H; j++) store<f64>(W1p + panelAt(i, j), load<f64>(params + <usize>(8 * (i * H + j))));
    if (Hp > H) store<f64>(W1p + panelAt(i, H), 0);
  }
  const b1 = params + <usize>(8 * D * H);
  const w2 = b1 + <usize>(8 * H);
  for (let j = 0; j < H; j++) store<f64>(B1p + <usize>(8 * j), load<f64>(b1 + <usize>(8 * j)));
  if (Hp > H) store<f64>(B1p + <usize>(8 * H), 0);
  for (let k = 0; k < K; k++) {
    for (let j = 0; j < H; j++) store<f64>(W2T + <usize>(8 * (k * Hp + j)), load<f64>(w2 + <usize>(8 * (j * K + k))));
    if (Hp > H) store<f64>(W2T + <usize>(8 * (k * Hp + H)), 0);
  }
}

/** Activation of a pair of pre-activations, stored at hp. */
@inline function activate(a: v128, hp: usize): void {
  let h: v128;
  if (ACT == ACT_TANH) h = tanhV(a);
  else if (ACT == ACT_LOGISTIC) h = logisticV(a);
  else h = v128.bitselect(a, f64x2.splat(0.0), f64x2.gt(a, f64x2.splat(0.0)));
  v128.store(hp, h);
}

/**
 * Derivative of the activation at a pair of activations h: the exact derivative, nothing added
 * (for ReLU, h > 0 exactly when the pre-activation was).
 */
@inline function prime(h: v128): v128 {
  if (ACT == ACT_TANH) return f64x2.sub(f64x2.splat(1.0), f64x2.mul(h, h));
  if (ACT == ACT_LOGISTIC) return f64x2.mul(h, f64x2.sub(f64x2.splat(1.0), h));
  return v128.bitselect(f64x2.splat(1.0), f64x2.splat(0.0), f64x2.gt(h, f64x2.splat(0.0)));
}

/** Hidden activations of four rows (row pointers x0..x3) into HB. */
function hidden4(x0: usize, x1: usize, x2: usize, x3: usize): void {
  const hp8 = <usize>(8 * Hp);
  let j = 0;
  for (; j + 4 <= Hp; j += 4) {
    const jo = <usize>(8 * j);
    const bA = v128.load(B1p + jo);
    const bB = v128.load(B1p + jo + 16);
    let a0 = bA, a1 = bA, a2 = bA, a3 = bA;
    let c0 = bB, c1 = bB, c2 = bB, c3 = bB;
    let w = W1p + jo * <usize>D;
    for (let i = 0; i < D; i++) {
      const io = <usize>(8 * i);
      // Each row's input is loaded just before use, so few registers are live (V8 has 15 for SIMD).
      const wA = v128.load(w);
      const wB = v128.load(w, 16);
      let s = v128.load_splat<f64>(x0 + io);
      a0 = f64x2.add(a0, f64x2.mul(s, wA));
      c0 = f64x2.add(c0, f64x2.mul(s, wB));
      s = v128.load_splat<f64>(x1 + io);
      a1 = f64x2.add(a1, f64x2.mul(s, wA));
      c1 = f64x2.add(c1, f64x2.mul(s, wB));
      s = v128.load_splat<f64>(x2 + io);
      a2 = f64x2.add(a2, f64x2.mul(s, wA));
      c2 = f64x2.add(c2, f64x2.mul(s, wB));
      s = v128.load_splat<f64>(x3 + io);
      a3 = f64x2.add(a3, f64x2.mul(s, wA));
      c3 = f64x2.add(c3, f64x2.mul(s, wB));
      w += 32;
    }
    activate(a0, HB + jo);
    activate(c0, HB + jo + 16);
    activate(a1, HB + hp8 + jo);
    activate(c1, HB + hp8 + jo + 16);
    activate(a2, HB + 2 * hp8 + jo);
    activate(c2, HB + 2 * hp8 + jo + 16);
    activate(a3, HB + 3 * hp8 + jo);
    activate(c3, HB + 3 * hp8 + jo + 16);
  }
  for (; j < Hp; j += 2) {
    const jo = <usize>(8 * j);
    const bA = v128.load(B1p + jo);
    let a0 = bA, a1 = bA, a2 = bA, a3 = bA;
    let w = W1p + jo * <usize>D;
    for (let i = 0; i < D; i++) {
      const io = <usize>(8 * i);
      const wA = v128.load(w);
      a0 = f64x2.add(a0, f64x2.mul(v128.load_splat<f64>(x0 + io), wA));
      a1 = f64x2.add(a1, f64x2.mul(v128.load_splat<f64>(x1 + io), wA));
      a2 = f64x2.add(a2, f64x2.mul(v128.load_splat<f64>(x2 + io), wA));
      a3 = f64x2.add(a3, f64x2.mul(v128.load_splat<f64>(x3 + io), wA));
      w += 16;
    }
    activate(a0, HB + jo);
    activate(a1, HB + hp8 + jo);
    activate(a2, HB + 2 * hp8 + jo);
    activate(a3, HB + 3 * hp8 + jo);
  }
}

/** Hidden activations of one row into block slot r. */
function hidden1(x0: usize, r: i32): void {
  const hp8 = <usize>(8 * Hp);
  const hb = HB + <usize>r * hp8;
  for (let j = 0; j < Hp; j += 2) {
    const jo = <usize>(8 * j);
    let a0 = v128.load(B1p + jo);
    let w = W1p + panelAt(0, j);
    const step = <usize>((j & ~3) + 4 <= Hp ? 32 : 16);
    for (let i = 0; i < D; i++) {
      a0 = f64x2.add(a0, f64x2.mul(v128.load_splat<f64>(x0 + <usize>(8 * i)), v128.load(w)));
      w += step;
    }
    activate(a0, hb + jo);
  }
}

/** Logits of block slot r into ZB (the sum over hidden neurons runs in order, as in the reference). */
function logits(params: usize, r: i32): void {
  const hb = HB + <usize>(8 * r * Hp);
  const zb = ZB + <usize>(8 * r * K);
  const w2 = params + <usize>(8 * (D * H + H));
  const b2 = w2 + <usize>(8 * H * K);
  for (let k = 0; k < K; k++) {
    let z = load<f64>(b2 + <usize>(8 * k));
    for (let j = 0; j < H; j++) z += load<f64>(hb + <usize>(8 * j)) * load<f64>(w2 + <usize>(8 * (j * K + k)));
    store<f64>(zb + <usize>(8 * k), z);
  }
}

/** Loss of block slot r with target t; its output deltas go to DZ. */
function headLoss(r: i32, t: f64): f64 {
  const z = ZB + <usize>(8 * r * K);
  const dz = DZ + <usize>(8 * r * K);
  if (HEAD == HEAD_LINEAR) {
    const d = load<f64>(z) - t;
    store<f64>(dz, d);
    return 0.5 * d * d;
  }
  if (HEAD == HEAD_LOGISTIC) {
    const z0 = load<f64>(z);
    store<f64>(dz, logisticS(z0) - t);
    return softplusS(z0) - t * z0;
  }
  let m = load<f64>(z);
  for (let k = 1; k < K; k++) {
    const zk = load<f64>(z + <usize>(8 * k));
    if (zk > m) m = zk;
  }
  let s: f64 = 0;
  for (let k = 0; k < K; k++) {
    const e = expS(load<f64>(z + <usize>(8 * k)) - m);
    store<f64>(dz + <usize>(8 * k), e);
    s += e;
  }
  const inv = 1 / s;
  for (let k = 0; k < K; k++) store<f64>(dz + <usize>(8 * k), load<f64>(dz + <usize>(8 * k)) * inv);
  const ti = <i32>t;
  const dt = dz + <usize>(8 * ti);
  store<f64>(dt, load<f64>(dt) - 1);
  return logS(s) - (load<f64>(z + <usize>(8 * ti)) - m);
}

/** Hidden deltas of slot r into `db`, and the gradient of b1, W2 and b2 from that row. */
function backOutput(r: i32, db: usize): void {
  const hp8 = <usize>(8 * Hp);
  const hb = HB + <usize>r * hp8;
  const dz = DZ + <usize>(8 * r * K);
  for (let j = 0; j < Hp; j += 2) {
    const jo = <usize>(8 * j);
    let acc = f64x2.splat(0.0);
    const h = v128.load(hb + jo);
    for (let k = 0; k < K; k++) {
      const d = v128.load_splat<f64>(dz + <usize>(8 * k));
      const ko = <usize>k * hp8 + jo;
      acc = f64x2.add(acc, f64x2.mul(v128.load(W2T + ko), d));
      v128.store(GW2T + ko, f64x2.add(v128.load(GW2T + ko), f64x2.mul(h, d)));
    }
    const dh = f64x2.mul(acc, prime(h));
    v128.store(db + jo, dh);
    v128.store(GB1 + jo, f64x2.add(v128.load(GB1 + jo), dh));
  }
  for (let k = 0; k < K; k++) {
    const g = GB2 + <usize>(8 * k);
    store<f64>(g, load<f64>(g) + load<f64>(dz + <usize>(8 * k)));
  }
}

/** Logits of all four block rows into zb (4 × K): rows travel side by side in the lanes, each sum still runs over j in order. */
function logits4(params: usize, zb: usize): void {
  const hp8 = <usize>(8 * Hp);
  for (let j = 0; j < Hp; j += 2) {
    const jo = <usize>(8 * j);
    const h0 = v128.load(HB + jo);
    const h1 = v128.load(HB + hp8 + jo);
    const h2 = v128.load(HB + 2 * hp8 + jo);
    const h3 = v128.load(HB + 3 * hp8 + jo);
    const t = HT + <usize>(32 * j);
    v128.store(t, v128.shuffle<f64>(h0, h1, 0, 2));
    v128.store(t, v128.shuffle<f64>(h2, h3, 0, 2), 16);
    v128.store(t, v128.shuffle<f64>(h0, h1, 1, 3), 32);
    v128.store(t, v128.shuffle<f64>(h2, h3, 1, 3), 48);
  }
  const w2 = params + <usize>(8 * (D * H + H));
  const b2 = w2 + <usize>(8 * H * K);
  const k8 = <usize>(8 * K);
  for (let k = 0; k < K; k++) {
    let a01 = v128.load_splat<f64>(b2 + <usize>(8 * k));
    let a23 = a01;
    let w = w2 + <usize>(8 * k);
    let t = HT;
    for (let j = 0; j < H; j++) {
      const wk = v128.load_splat<f64>(w);
      a01 = f64x2.add(a01, f64x2.mul(v128.load(t), wk));
      a23 = f64x2.add(a23, f64x2.mul(v128.load(t, 16), wk));
      w += k8;
      t += 32;
    }
    const zk = zb + <usize>(8 * k);
    store<f64>(zk, f64x2.extract_lane(a01, 0));
    store<f64>(zk + k8, f64x2.extract_lane(a01, 1));
    store<f64>(zk + 2 * k8, f64x2.extract_lane(a23, 0));
    store<f64>(zk + 3 * k8, f64x2.extract_lane(a23, 1));
  }
}

/** Hidden deltas of the four rows into db (four rows of Hp), and the gradient of b1, W2 and b2, added in row order. */
function backOutput4(db: usize): void {
  const hp8 = <usize>(8 * Hp);
  const k8 = <usize>(8 * K);
  for (let j = 0; j < Hp; j += 2) {
    const jo = <usize>(8 * j);
    let a0 = f64x2.splat(0.0), a1 = a0, a2 = a0, a3 = a0;
    const h0 = v128.load(HB + jo);
    const h1 = v128.load(HB + hp8 + jo);
    const h2 = v128.load(HB + 2 * hp8 + jo);
    const h3 = v128.load(HB + 3 * hp8 + jo);
    for (let k = 0; k < K; k++) {
      const ko = <usize>k * hp8 + jo;
      const w = v128.load(W2T + ko);
      const dk = DZ + <usize>(8 * k);
      const d0 = v128.load_splat<f64>(dk);
      const d1 = v128.load_splat<f64>(dk + k8);
      const d2 = v128.load_splat<f64>(dk + 2 * k8);
      const d3 = v128.load_splat<f64>(dk + 3 * k8);
      a0 = f64x2.add(a0, f64x2.mul(w, d0));
      a1 = f64x2.add(a1, f64x2.mul(w, d1));
      a2 = f64x2.add(a2, f64x2.mul(w, d2));
      a3 = f64x2.add(a3, f64x2.mul(w, d3));
      let g = v128.load(GW2T + ko);
      g = f64x2.add(g, f64x2.mul(h0, d0));
      g = f64x2.add(g, f64x2.mul(h1, d1));
      g = f64x2.add(g, f64x2.mul(h2, d2));
      g = f64x2.add(g, f64x2.mul(h3, d3));
      v128.store(GW2T + ko, g);
    }
    const dh0 = f64x2.mul(a0, prime(h0));
    const dh1 = f64x2.mul(a1, prime(h1));
    const dh2 = f64x2.mul(a2, prime(h2));
    const dh3 = f64x2.mul(a3, prime(h3));
    v128.store(db + jo, dh0);
    v128.store(db + hp8 + jo, dh1);
    v128.store(db + 2 * hp8 + jo, dh2);
    v128.store(db + 3 * hp8 + jo, dh3);
    let gb = v128.load(GB1 + jo);
    gb = f64x2.add(gb, dh0);
    gb = f64x2.add(gb, dh1);
    gb = f64x2.add(gb, dh2);
    gb = f64x2.add(gb, dh3);
    v128.store(GB1 + jo, gb);
  }
  for (let k = 0; k < K; k++) {
    const g = GB2 + <usize>(8 * k);
    const dk = DZ + <usize>(8 * k);
    let v = load<f64>(g);
    v += load<f64>(dk);
    v += load<f64>(dk + k8);
    v += load<f64>(dk + 2 * k8);
    v += load<f64>(dk + 3 * k8);
    store<f64>(g, v);
  }
}

/**
 * W1 gradient from the n rows of the block (rows at x, x + 8D, ...; deltas in DB): for each
 * weight, Σ over the rows in row order from +0, kept in a register, then added to GW1. Tiles of
 * four inputs × four hidden neurons keep eight sums in registers while the rows stream past.
 */
function backInputBlock(x: usize, n: i32): void {
  const hp8 = <usize>(8 * Hp);
  const rowBytes = <usize>(8 * D);
  const zero = f64x2.splat(0.0);
  let j = 0;
  for (; j + 4 <= Hp; j += 4) {
    const jo = <usize>(8 * j);
    let i = 0;
    for (; i + 4 <= D; i += 4) {
      let a0 = zero, b0 = zero, a1 = zero, b1 = zero, a2 = zero, b2 = zero, a3 = zero, b3 = zero;
      let xr = x + <usize>(8 * i);
      let dr = DB + jo;
      for (let q = 0; q < n; q++) {
        const dA = v128.load(dr);
        const dB = v128.load(dr, 16);
        let s = v128.load_splat<f64>(xr);
        a0 = f64x2.add(a0, f64x2.mul(s, dA));
        b0 = f64x2.add(b0, f64x2.mul(s, dB));
        s = v128.load_splat<f64>(xr, 8);
        a1 = f64x2.add(a1, f64x2.mul(s, dA));
        b1 = f64x2.add(b1, f64x2.mul(s, dB));
        s = v128.load_splat<f64>(xr, 16);
        a2 = f64x2.add(a2, f64x2.mul(s, dA));
        b2 = f64x2.add(b2, f64x2.mul(s, dB));
        s = v128.load_splat<f64>(xr, 24);
        a3 = f64x2.add(a3, f64x2.mul(s, dA));
        b3 = f64x2.add(b3, f64x2.mul(s, dB));
        xr += rowBytes;
        dr += hp8;
      }
      const g = GW1 + jo * <usize>D + <usize>(32 * i);
      v128.store(g, f64x2.add(v128.load(g), a0));
      v128.store(g, f64x2.add(v128.load(g, 16), b0), 16);
      v128.store(g, f64x2.add(v128.load(g, 32), a1), 32);
      v128.store(g, f64x2.add(v128.load(g, 48), b1), 48);
      v128.store(g, f64x2.add(v128.load(g, 64), a2), 64);
      v128.store(g, f64x2.add(v128.load(g, 80), b2), 80);
      v128.store(g, f64x2.add(v128.load(g, 96), a3), 96);
      v128.store(g, f64x2.add(v128.load(g, 112), b3), 112);
    }
    for (; i < D; i++) {
      let a0 = zero, b0 = zero;
      let xr = x + <usize>(8 * i);
      let dr = DB + jo;
      for (let q = 0; q < n; q++) {
        const s = v128.load_splat<f64>(xr);
        a0 = f64x2.add(a0, f64x2.mul(s, v128.load(dr)));
        b0 = f64x2.add(b0, f64x2.mul(s, v128.load(dr, 16)));
        xr += rowBytes;
        dr += hp8;
      }
      const g = GW1 + jo * <usize>D + <usize>(32 * i);
      v128.store(g, f64x2.add(v128.load(g), a0));
      v128.store(g, f64x2.add(v128.load(g, 16), b0), 16);
    }
  }
  for (; j < Hp; j += 2) {
    const jo = <usize>(8 * j);
    let i = 0;
    for (; i + 4 <= D; i += 4) {
      let a0 = zero, a1 = zero, a2 = zero, a3 = zero;
      let xr = x + <usize>(8 * i);
      let dr = DB + jo;
      for (let q = 0; q < n; q++) {
        const dA = v128.load(dr);
        a0 = f64x2.add(a0, f64x2.mul(v128.load_splat<f64>(xr), dA));
        a1 = f64x2.add(a1, f64x2.mul(v128.load_splat<f64>(xr, 8), dA));
        a2 = f64x2.add(a2, f64x2.mul(v128.load_splat<f64>(xr, 16), dA));
        a3 = f64x2.add(a3, f64x2.mul(v128.load_splat<f64>(xr, 24), dA));
        xr += rowBytes;
        dr += hp8;
      }
      const g = GW1 + jo * <usize>D + <usize>(16 * i);
      v128.store(g, f64x2.add(v128.load(g), a0));
      v128.store(g, f64x2.add(v128.load(g, 16), a1), 16);
      v128.store(g, f64x2.add(v128.load(g, 32), a2), 32);
      v128.store(g, f64x2.add(v128.load(g, 48), a3), 48);
    }
    for (; i < D; i++) {
      let a0 = zero;
      let xr = x + <usize>(8 * i);
      let dr = DB + jo;
      for (let q = 0; q < n; q++) {
        a0 = f64x2.add(a0, f64x2.mul(v128.load_splat<f64>(xr), v128.load(dr)));
        xr += rowBytes;
        dr += hp8;
      }
      const g = GW1 + jo * <usize>D + <usize>(16 * i);
      v128.store(g, f64x2.add(v128.load(g), a0));
    }
  }
}

/**
 * Summed loss over rows [start, end) of x (rows × D) and targets y; the summed gradient goes
 * to `grad` in the canonical layout.
 */
export function lossGrad(
  act: i32,
  head: i32,
  d: i32,
  h: i32,
  k: i32,
  params: usize,
  x: usize,
  y: usize,
  start: i32,
  end: i32,
  grad: usize,
  work: usize,
): f64 {
  setup(act, head, d, h, k, params, work);
  memory.fill(GW1, 0, <usize>(8 * D * Hp));
  memory.fill(GB1, 0, <usize>(8 * Hp));
  memory.fill(GW2T, 0, <usize>(8 * K * Hp));
  memory.fill(GB2, 0, <usize>(8 * K));
  const rowBytes = <usize>(8 * D);
  let loss: f64 = 0;
  const hp8 = <usize>(8 * Hp);
  let p = start;
  while (p < end) {
    const n = end - p < GRAD_BLOCK_ROWS ? end - p : GRAD_BLOCK_ROWS;
    const xb = x + <usize>p * rowBytes;
    let r = 0;
    for (; r + 4 <= n; r += 4) {
      const x0 = xb + <usize>r * rowBytes;
      hidden4(x0, x0 + rowBytes, x0 + 2 * rowBytes, x0 + 3 * rowBytes);
      logits4(params, ZB);
      for (let s = 0; s < 4; s++) loss += headLoss(s, load<f64>(y + <usize>(8 * (p + r + s))));
      backOutput4(DB + <usize>r * hp8);
    }
    for (; r < n; r++) {
      hidden1(xb + <usize>r * rowBytes, 0);
      logits(params, 0);
      loss += headLoss(0, load<f64>(y + <usize>(8 * (p + r))));
      backOutput(0, DB + <usize>r * hp8);
    }
    backInputBlock(xb, n);
    p += n;
  }
  // Unpack the gradient into the canonical layout.
  for (let i = 0; i < D; i++)
    for (let j = 0; j < H; j++) store<f64>(grad + <usize>(8 * (i * H + j)), load<f64>(GW1 + panelAt(i, j)));
  const gb1 = grad + <usize>(8 * D * H);
  const gw2 = gb1 + <usize>(8 * H);
  const gb2 = gw2 + <usize>(8 * H * K);
  for (let j = 0; j < H; j++) store<f64>(gb1 + <usize>(8 * j), load<f64>(GB1 + <usize>(8 * j)));
  for (let kk = 0; kk < K; kk++) {
    for (let j = 0; j < H; j++) store<f64>(gw2 + <usize>(8 * (j * K + kk)), load<f64>(GW2T + <usize>(8 * (kk * Hp + j))));
    store<f64>(gb2 + <usize>(8 * kk), load<f64>(GB2 + <usize>(8 * kk)));
  }
  return loss;
}

/** Logits (rows × K) of `rows` rows; hidden activations (rows × H) too when `hidden` is not 0. */
export function forward(
  act: i32,
  d: i32,
  h: i32,
  k: i32,
  params: usize,
  x: usize,
  rows: i32,
  out: usize,
  hidden: usize,
  work: usize,
): void {
  setup(act, HEAD_LINEAR, d, h, k, params, work);
  const rowBytes = <usize>(8 * D);
  let p = 0;
  while (p < rows) {
    const n = rows - p >= 4 ? 4 : 1;
    const x0 = x + <usize>p * rowBytes;
    if (n == 4) {
      hidden4(x0, x0 + rowBytes, x0 + 2 * rowBytes, x0 + 3 * rowBytes);
      logits4(params, out + <usize>(8 * p * K)); // four rows of K logits, laid out as in `out`
    } else {
      hidden1(x0, 0);
      logits(params, 0);
      for (let kk = 0; kk < K; kk++) store<f64>(out + <usize>(8 * (p * K + kk)), load<f64>(ZB + <usize>(8 * kk)));
    }
    for (let r = 0; r < n; r++) {
      const row = p + r;
      if (hidden != 0) {
        for (let j = 0; j < H; j++)
          store<f64>(hidden + <usize>(8 * (row * H + j)), load<f64>(HB + <usize>(8 * (r * Hp + j))));
      }
    }
    p += n;
  }
}

/** First free byte after the module's static data. */
export function heapBase(): usize {
  return __heap_base;
}
