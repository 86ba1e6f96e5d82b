/**
 * Elementary functions whose results we control. ECMAScript leaves Math.exp, Math.tanh and
 * Math.log implementation-approximated, so their last bits may change between Node versions;
 * these use only +, -, *, / and exact bit operations, which IEEE 754 fixes, so every engine
 * gives the same bits. The WebAssembly kernel evaluates tanh with the very same sequence of
 * operations and constants, so both paths agree bit for bit.
 *
 * Accuracy against Math.*: a few units in the last place (test/nn/detmath.test.ts states the bound).
 */

import {
  C10,
  C11,
  C12,
  C13,
  C2,
  C3,
  C4,
  C5,
  C6,
  C7,
  C8,
  C9,
  INV_LN2,
  LN2_HI,
  LN2_LO,
  ROUND_MAGIC,
  SQRT2,
  TANH_CLAMP,
} from './constants.js';

const f64 = new Float64Array(1);
const u32 = new Uint32Array(f64.buffer);
const HI = new Uint8Array(new Uint16Array([1]).buffer)[0] === 1 ? 1 : 0; // little-endian: high word at index 1

/** 2^k for integer k in [-1022, 1023], built from its bits. */
function pow2(k: number): number {
  u32[1 - HI] = 0;
  u32[HI] = (k + 1023) << 20;
  return f64[0];
}

/** expm1(r) for |r| <= ~0.35 by Horner's rule. */
function expm1Poly(r: number): number {
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

/**
 * The same polynomial by Estrin's scheme: more operations run side by side, which is what the
 * SIMD kernel needs for speed (tanh uses this form in both paths).
 */
function expm1PolyEstrin(r: number): number {
  const r2 = r * r;
  const r4 = r2 * r2;
  const r8 = r4 * r4;
  const b0 = 1 + C2 * r + (C3 + C4 * r) * r2;
  const b1 = C5 + C6 * r + (C7 + C8 * r) * r2;
  const b2 = C9 + C10 * r + (C11 + C12 * r) * r2;
  const c0 = b0 + b1 * r4;
  const c1 = b2 + C13 * r4;
  return r * (c0 + c1 * r8);
}

/** e^x. */
export function detExp(x: number): number {
  if (x !== x) return x;
  if (x > 709.782712893384) return Infinity;
  if (x < -745.1332191019412) return 0;
  const k = Math.floor(x * INV_LN2 + 0.5);
  const r = x - k * LN2_HI - k * LN2_LO;
  const m = 1 + expm1Poly(r);
  if (k > 1023) return m * pow2(1023) * pow2(k - 1023);
  if (k < -1022) return m * pow2(k + 1000) * pow2(-1000);
  return m * pow2(k);
}

/** Powers of two 2^0..2^64 for the tanh reduction (k never leaves that range). */
const POW2_TANH = new Float64Array(65);
for (let k = 0; k <= 64; k++) POW2_TANH[k] = pow2(k);

/**
 * tanh(x) = expm1(2|x|) / (expm1(2|x|) + 2) with the sign of x. Branch-free apart from the
 * clamp, so the SIMD kernel can evaluate the same operations lane by lane.
 */
export function detTanh(x: number): number {
  const ax = Math.min(x < 0 ? -x : x, TANH_CLAMP);
  const y = ax + ax;
  // Round y/ln2 to the nearest whole number (ties to even) by adding and removing 1.5·2^52.
  const k = y * INV_LN2 + ROUND_MAGIC - ROUND_MAGIC;
  const r = y - k * LN2_HI - k * LN2_LO;
  const p = expm1PolyEstrin(r);
  const s = POW2_TANH[k];
  const em = s * p + (s - 1);
  const t = em / (em + 2);
  return x < 0 ? -t : t;
}

/** Logistic function through tanh, so it inherits tanh's determinism: 1/(1+e^-x) = (1 + tanh(x/2))/2. */
export function detLogistic(x: number): number {
  return 0.5 + 0.5 * detTanh(0.5 * x);
}

/** Natural logarithm. */
export function detLog(x: number): number {
  if (x !== x || x < 0) return NaN;
  if (x === 0) return -Infinity;
  if (x === Infinity) return Infinity;
  let e = 0;
  if (x < 2.2250738585072014e-308) {
    x *= 18014398509481984; // 2^54: lift subnormals into the normal range
    e = -54;
  }
  f64[0] = x;
  const hi = u32[HI];
  e += ((hi >>> 20) & 0x7ff) - 1023;
  u32[HI] = (hi & 0x000fffff) | 0x3ff00000; // mantissa in [1, 2)
  let m = f64[0];
  if (m > SQRT2) {
    m *= 0.5;
    e += 1;
  }
  const f = m - 1;
  const s = f / (2 + f);
  const s2 = s * s;
  // 2 atanh(s) = 2 (s + s^3/3 + ... + s^23/23); |s| <= 0.1716 so the tail is below 1e-18.
  let q = 1 / 21 + s2 * (1 / 23);
  q = 1 / 19 + s2 * q;
  q = 1 / 17 + s2 * q;
  q = 1 / 15 + s2 * q;
  q = 1 / 13 + s2 * q;
  q = 1 / 11 + s2 * q;
  q = 1 / 9 + s2 * q;
  q = 1 / 7 + s2 * q;
  q = 1 / 5 + s2 * q;
  q = 1 / 3 + s2 * q;
  const series = s2 * q;
  const logm = 2 * s + 2 * s * series;
  return e * LN2_HI + (logm + e * LN2_LO);
}

/** log(1 + u) for u > -1, keeping the bits of u that 1 + u rounds away. @testOnly */
export function detLog1p(u: number): number {
  const w = 1 + u;
  if (w === 1) return u;
  return detLog(w) + (u - (w - 1)) / w;
}

/** log(1 + e^z) without overflow. */
export function detSoftplus(z: number): number {
  return (z > 0 ? z : 0) + detLog1p(detExp(z > 0 ? -z : z));
}
