/**
 * The fixed-point requantisation against its published definitions: Jacob et al. 2018,
 * "Quantization and Training of Neural Networks for Efficient Integer-Arithmetic-Only
 * Inference", section 2.2, eq. 5–6 (M = S1·S2/S3 = 2^−n · M0, M0 in [0.5, 1)); the
 * fixed-point multiply and rounding shift as the general-purpose gemmlowp library documents
 * them (fixedpoint/fixedpoint.h: SaturatingRoundingDoublingHighMul, RoundingDivideByPOT),
 * and exact BigInt arithmetic as the reference for random operands.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  INT32_MAX,
  INT32_MIN,
  multiplyByQuantizedMultiplier,
  quantizeMultiplier,
  roundHalfAway,
  roundingDivideByPot,
  saturatingRoundingDoublingHighMul as srdhm,
} from '../../src/device/fixed-point.js';

/** gemmlowp's definition in exact 64-bit integers: (a·b + nudge) / 2^31, truncating toward zero. */
function srdhmBigInt(a: number, b: number): number {
  if (a === INT32_MIN && b === INT32_MIN) return INT32_MAX;
  const ab = BigInt(a) * BigInt(b);
  const nudge = ab >= 0n ? 1n << 30n : 1n - (1n << 30n);
  return Number((ab + nudge) / (1n << 31n)); // BigInt division truncates toward zero, as C's does
}

/** x / 2^e rounded to nearest, ties away from zero, in exact integers. */
function divideRoundAway(x: number, e: number): number {
  const d = 1n << BigInt(e);
  const X = BigInt(x);
  const mag = X < 0n ? -X : X;
  const q = (2n * mag + d) / (2n * d); // floor(|x|/d + 1/2)
  return Number(X < 0n ? -q : q);
}

const int32 = fc.integer({ min: INT32_MIN, max: INT32_MAX });

describe('SaturatingRoundingDoublingHighMul (gemmlowp)', () => {
  it('hand-worked values: a tie rounds toward +infinity, -1 · -1 saturates', () => {
    // 3 · 2^30 / 2^31 = 1.5 → 2;  −1.5 → −1 (the nudge 1 − 2^30, then truncation toward zero)
    expect(srdhm(3, 2 ** 30)).toBe(2);
    expect(srdhm(-3, 2 ** 30)).toBe(-1);
    // 5 · 2^30 / 2^31 = 2.5 → 3;  −2.5 → −2;  −2.75 → −3
    expect(srdhm(5, 2 ** 30)).toBe(3);
    expect(srdhm(-5, 2 ** 30)).toBe(-2);
    expect(srdhm(-11, 2 ** 29)).toBe(-3);
    expect(srdhm(INT32_MIN, INT32_MIN)).toBe(INT32_MAX);
    expect(srdhm(INT32_MIN, INT32_MAX)).toBe(-INT32_MAX);
    expect(srdhm(0, 12345)).toBe(0);
    // 455 · 1145324612 = 521122698460; / 2^31 = 242.6667 → 243 (worked by hand, checked with Python)
    expect(srdhm(455, 1145324612)).toBe(243);
  });

  it('equals the exact 64-bit definition on random int32 pairs', () => {
    fc.assert(
      fc.property(int32, int32, (a, b) => srdhm(a, b) === srdhmBigInt(a, b)),
      { numRuns: 20000 },
    );
  });

  it('equals it on the edges of the split (halves, powers of two, extremes)', () => {
    const edges = [INT32_MIN, INT32_MIN + 1, -65536, -65535, -32769, -32768, -1, 0, 1, 32767, 32768, 65535, 65536];
    edges.push(INT32_MAX, INT32_MAX - 1, 2 ** 30, -(2 ** 30), 2 ** 30 + 1, 1145324612);
    for (const a of edges) for (const b of edges) expect(srdhm(a, b), `${a} · ${b}`).toBe(srdhmBigInt(a, b));
  });
});

describe('RoundingDivideByPOT (gemmlowp)', () => {
  it('hand-worked values: ties away from zero', () => {
    expect(roundingDivideByPot(243, 4)).toBe(15); // 15.1875
    expect(roundingDivideByPot(24, 4)).toBe(2); // 1.5
    expect(roundingDivideByPot(-24, 4)).toBe(-2); // −1.5
    expect(roundingDivideByPot(-23, 4)).toBe(-1); // −1.4375
    expect(roundingDivideByPot(8, 4)).toBe(1); // 0.5
    expect(roundingDivideByPot(-8, 4)).toBe(-1); // −0.5
    expect(roundingDivideByPot(-7, 4)).toBe(0);
    expect(roundingDivideByPot(12345, 0)).toBe(12345);
    expect(roundingDivideByPot(INT32_MIN, 31)).toBe(-1);
    expect(roundingDivideByPot(INT32_MAX, 31)).toBe(1);
  });

  it('is round-half-away-from-zero division on random operands', () => {
    fc.assert(
      fc.property(
        int32,
        fc.integer({ min: 0, max: 31 }),
        (x, e) => roundingDivideByPot(x, e) === divideRoundAway(x, e),
      ),
      { numRuns: 20000 },
    );
  });
});

describe('the multiplier M = 2^-n · M0 (eq. 5–6)', () => {
  it('hand-worked: S1 = 0.02, S2 = 0.05, S3 = 0.03 give M = 1/30 = 2^-4 · 0.5333…', () => {
    const m = quantizeMultiplier((0.02 * 0.05) / 0.03);
    // M0 = 16/30, stored as round(16/30 · 2^31) = round(1145324612.27) = 1145324612
    expect(m).toEqual({ multiplier: 1145324612, shift: 4 });
  });

  it('exact powers and multipliers of one or more (a left shift)', () => {
    expect(quantizeMultiplier(0.09375)).toEqual({ multiplier: 0.75 * 2 ** 31, shift: 3 });
    expect(quantizeMultiplier(0.5)).toEqual({ multiplier: 2 ** 30, shift: 0 });
    expect(quantizeMultiplier(3)).toEqual({ multiplier: 0.75 * 2 ** 31, shift: -2 });
    // Just below 1: M0 rounds up to 2^31, which becomes 2^30 with one shift less.
    expect(quantizeMultiplier(1 - 2 ** -40)).toEqual({ multiplier: 2 ** 30, shift: -1 });
  });

  it('M0 lies in [2^30, 2^31) and 2^-n · M0 / 2^31 is within half a unit of M0 of M', () => {
    fc.assert(
      fc.property(fc.double({ min: 2 ** -31, max: 2 ** 30, noNaN: true }), (m) => {
        const q = quantizeMultiplier(m);
        const back = (q.multiplier / 2 ** 31) * 2 ** -q.shift;
        return (
          q.multiplier >= 2 ** 30 && q.multiplier < 2 ** 31 && Math.abs(back - m) <= 2 ** (-32 - q.shift) * (1 + 1e-12)
        );
      }),
      { numRuns: 5000 },
    );
  });

  it('limits: below 2^-32 every int32 accumulator rounds to 0, so M0 is 0', () => {
    expect(quantizeMultiplier(2 ** -33)).toEqual({ multiplier: 0, shift: 0 });
    expect(quantizeMultiplier(0)).toEqual({ multiplier: 0, shift: 0 });
    expect(Math.abs(roundHalfAway(INT32_MAX * 2 ** -33))).toBe(0);
  });

  it('acc · M by the fixed-point rules: the hand-worked 455 / 30 → 15, and a left shift that saturates', () => {
    expect(multiplyByQuantizedMultiplier(455, quantizeMultiplier(1 / 30))).toBe(15);
    expect(multiplyByQuantizedMultiplier(-455, quantizeMultiplier(1 / 30))).toBe(-15);
    expect(multiplyByQuantizedMultiplier(100, quantizeMultiplier(3))).toBe(300);
    // M = 4 = 2^30 · 2^-31 · 2^3: 2^30 · 2^3 saturates to 2^31 − 1, times M0 = 1/2 is 2^30 − 1/2 → 2^30.
    expect(quantizeMultiplier(4)).toEqual({ multiplier: 2 ** 30, shift: -3 });
    expect(multiplyByQuantizedMultiplier(2 ** 30, quantizeMultiplier(4))).toBe(2 ** 30);
  });

  it('acc · M is within one of the exactly rounded product (two roundings) on random operands', () => {
    fc.assert(
      fc.property(int32, fc.double({ min: 2 ** -20, max: 0.999, noNaN: true }), (acc, m) => {
        const q = quantizeMultiplier(m);
        const exact = (Number(BigInt(acc) * BigInt(q.multiplier)) / 2 ** 31) * 2 ** -q.shift;
        return Math.abs(multiplyByQuantizedMultiplier(acc, q) - exact) <= 1;
      }),
      { numRuns: 5000 },
    );
  });
});

describe('round half away from zero', () => {
  it('rounds ties away from zero and is exact next to a half', () => {
    expect([2.5, -2.5, 0.5, -0.5, 1.4999999999999998, 0.49999999999999994].map(roundHalfAway)).toEqual([
      3, -3, 1, -1, 1, 0,
    ]);
    expect(Object.is(roundHalfAway(-0.2), 0)).toBe(true);
  });
});
