/**
 * The integer arithmetic of the int8 inference, written so that this TypeScript and the
 * exported C compute the same integers. Every value here is an integer held exactly in a
 * double (all magnitudes stay below 2^53), so no step depends on JavaScript's number type.
 *
 * Requantisation follows Jacob et al. 2018, "Quantization and Training of Neural Networks for
 * Efficient Integer-Arithmetic-Only Inference", section 2.2: the real multiplier M (eq. 5) is
 * written M = 2^−n · M0 with M0 in [0.5, 1) (eq. 6), M0 held as a 32-bit fixed-point integer.
 * The fixed-point multiply and the rounding shift are the documented rules of the
 * general-purpose gemmlowp library (fixedpoint/fixedpoint.h): SaturatingRoundingDoublingHighMul
 * and RoundingDivideByPOT.
 * @testOnly
 */

export const INT32_MIN = -2147483648;
/** @testOnly */
export const INT32_MAX = 2147483647;
const TWO_15 = 32768;
const TWO_30 = 1073741824;
const TWO_31 = 2147483648;

/** Largest right shift RoundingDivideByPOT takes (gemmlowp asserts exponent ≤ 31). */
export const MAX_SHIFT = 31;

/**
 * Round to nearest, ties away from zero. Exact for every double: trunc(x) and x − trunc(x)
 * are both exact, so no addition of 0.5 can round the wrong way.
 */
export function roundHalfAway(x: number): number {
  const i = Math.trunc(x);
  const f = x - i;
  const r = f >= 0.5 ? i + 1 : f <= -0.5 ? i - 1 : i;
  return r === 0 ? 0 : r; // no −0 in the JSON
}

export function clamp(x: number, lo: number, hi: number): number {
  return x < lo ? lo : x > hi ? hi : x;
}

/**
 * gemmlowp's SaturatingRoundingDoublingHighMul for int32 a, b: (a·b + nudge) / 2^31 truncated
 * toward zero, nudge = 2^30 when a·b ≥ 0 and 1 − 2^30 otherwise (so a tie rounds toward +∞);
 * INT32_MIN · INT32_MIN saturates to INT32_MAX.
 *
 * a·b reaches 2^62, beyond a double's 53 bits, so the product is split: b = bh·2^16 + bl,
 * a·bh = ph·2^15 + pl, and a·b + nudge = ph·2^31 + r with every part exact.
 */
export function saturatingRoundingDoublingHighMul(a: number, b: number): number {
  if (a === INT32_MIN && b === INT32_MIN) return INT32_MAX;
  const bh = b >> 16; // signed high half
  const bl = b & 0xffff; // unsigned low half
  const p = a * bh; // |p| ≤ 2^46: exact
  const q = a * bl; // |q| < 2^47: exact
  const ph = Math.floor(p / TWO_15);
  const pl = p - ph * TWO_15; // in [0, 2^15)
  const negative = (a < 0 && b > 0) || (a > 0 && b < 0);
  const nudge = negative ? 1 - TWO_30 : TWO_30;
  const r = pl * 65536 + q + nudge; // |r| < 2^48: exact
  const rh = Math.floor(r / TWO_31);
  const rl = r - rh * TWO_31; // in [0, 2^31)
  const floor = ph + rh; // floor((a·b + nudge) / 2^31)
  const truncated = floor < 0 && rl !== 0 ? floor + 1 : floor;
  return truncated === 0 ? 0 : truncated;
}

/**
 * gemmlowp's RoundingDivideByPOT: x / 2^exponent rounded to nearest, ties away from zero,
 * for int32 x and 0 ≤ exponent ≤ 31.
 */
export function roundingDivideByPot(x: number, exponent: number): number {
  const mask = 2 ** exponent - 1;
  const remainder = x & mask;
  const threshold = Math.floor(mask / 2) + (x < 0 ? 1 : 0);
  return (x >> exponent) + (remainder > threshold ? 1 : 0);
}

/** A real multiplier M ≈ M0 · 2^−31 · 2^−shift (positive shift: right shift; negative: left). */
export interface QuantizedMultiplier {
  /** M0 · 2^31, an int32 in [2^30, 2^31), or 0 when M rounds to nothing. */
  multiplier: number;
  /** n of eq. 6; may be negative for M ≥ 1 (a left shift, saturating). */
  shift: number;
}

/**
 * M = 2^−n · M0, M0 in [0.5, 1), M0 stored as round(M0 · 2^31) (eq. 6). Two limits, both exact
 * in their effect on an int32 accumulator acc: for M < 2^−32, |acc · M| < 1/2 always rounds to
 * 0, so the multiplier is 0; for M ≥ 2^31 every nonzero acc saturates an int8, and so does
 * 2^30 · 2^31 (the left shift capped at 31), which stands in for it.
 */
export function quantizeMultiplier(m: number): QuantizedMultiplier {
  if (!(m > 0) || !Number.isFinite(m)) return { multiplier: 0, shift: 0 };
  let n = 0;
  let f = m;
  while (f < 0.5 && n <= MAX_SHIFT + 1) {
    f *= 2; // exact
    n++;
  }
  while (f >= 1 && n >= -MAX_SHIFT - 1) {
    f /= 2; // exact
    n--;
  }
  if (n > MAX_SHIFT) return { multiplier: 0, shift: 0 };
  let m0 = roundHalfAway(f * TWO_31);
  if (m0 === TWO_31) {
    m0 = TWO_30;
    n--;
  }
  if (n < -MAX_SHIFT) return { multiplier: TWO_30, shift: -MAX_SHIFT };
  return { multiplier: m0, shift: n };
}

/**
 * acc · M for an int32 acc: a left shift (saturating to int32) when shift < 0, then the
 * fixed-point multiply by M0, then the rounding right shift when shift > 0.
 */
export function multiplyByQuantizedMultiplier(acc: number, q: QuantizedMultiplier): number {
  if (q.multiplier === 0) return 0;
  let x = acc;
  if (q.shift < 0) x = clamp(acc * 2 ** -q.shift, INT32_MIN, INT32_MAX); // power-of-two product: exact
  const high = saturatingRoundingDoublingHighMul(x, q.multiplier);
  return q.shift > 0 ? roundingDivideByPot(high, q.shift) : high;
}
