/**
 * Seeded random numbers: xoshiro128** version 1.1 (Blackman & Vigna), seeded through
 * SplitMix64 (Steele, Lea & Flood). Only 32-bit integer operations in the hot path, so every
 * engine produces the same stream. Every random choice in neuron-budget (the data split, the
 * initial weights) draws from here.
 */

/** A seeded xoshiro128** 1.1 stream. */
export interface Rng {
  /** Next 32-bit unsigned integer. */
  nextUint32(): number;
  /** Next double in [0, 1) with 53 random bits. */
  nextDouble(): number;
}

const MASK64 = (1n << 64n) - 1n;
const GOLDEN_GAMMA = 0x9e3779b97f4a7c15n;

/** One SplitMix64 output step: advances `state` by the golden gamma and mixes it. */
function splitMix64Mix(z: bigint): bigint {
  z = ((z ^ (z >> 30n)) * 0xbf58476d1ce4e5b9n) & MASK64;
  z = ((z ^ (z >> 27n)) * 0x94d049bb133111ebn) & MASK64;
  return z ^ (z >> 31n);
}

/** A SplitMix64 generator over 64-bit unsigned BigInts (used for seeding only). @testOnly */
export class SplitMix64 {
  private state: bigint;
  constructor(seed: bigint) {
    this.state = BigInt.asUintN(64, seed);
  }
  next(): bigint {
    this.state = (this.state + GOLDEN_GAMMA) & MASK64;
    return splitMix64Mix(this.state);
  }
}

/** xoshiro128** 1.1: the scrambler reads s[1] (version 1.0 wrongly read s[0]). @testOnly */
export class Xoshiro128StarStar implements Rng {
  private a: number;
  private b: number;
  private c: number;
  private d: number;

  constructor(s0: number, s1: number, s2: number, s3: number) {
    this.a = s0 | 0;
    this.b = s1 | 0;
    this.c = s2 | 0;
    this.d = s3 | 0;
    if ((this.a | this.b | this.c | this.d) === 0) {
      throw new RangeError('xoshiro128** state must not be all zero');
    }
  }

  /** The four state words as unsigned 32-bit integers. */
  state(): [number, number, number, number] {
    return [this.a >>> 0, this.b >>> 0, this.c >>> 0, this.d >>> 0];
  }

  nextUint32(): number {
    const r = Math.imul(this.b, 5);
    const result = Math.imul((r << 7) | (r >>> 25), 9) >>> 0;
    const t = this.b << 9;
    this.c ^= this.a;
    this.d ^= this.b;
    this.b ^= this.c;
    this.a ^= this.d;
    this.c ^= t;
    this.d = (this.d << 11) | (this.d >>> 21);
    return result;
  }

  nextDouble(): number {
    const hi = this.nextUint32() >>> 5;
    const lo = this.nextUint32() >>> 6;
    return (hi * 67108864 + lo) / 9007199254740992;
  }
}

/**
 * Our seeding convention: a SplitMix64 generator started at `seed`; its first two outputs
 * r0, r1 give the state words [lo(r0), hi(r0), lo(r1), hi(r1)].
 */
export function xoshiroFromSeed(seed: bigint): Xoshiro128StarStar {
  const sm = new SplitMix64(seed);
  for (;;) {
    const r0 = sm.next();
    const r1 = sm.next();
    const w = [r0 & 0xffffffffn, r0 >> 32n, r1 & 0xffffffffn, r1 >> 32n].map(Number);
    // An all-zero state is a fixed point; draw again in the (2^-128) case it happens.
    if ((w[0] | w[1] | w[2] | w[3]) !== 0) return new Xoshiro128StarStar(w[0], w[1], w[2], w[3]);
  }
}

function toUint64(n: number, what: string): bigint {
  if (!Number.isSafeInteger(n)) throw new RangeError(`${what} must be a safe integer, got ${n}`);
  return BigInt.asUintN(64, BigInt(n));
}

/**
 * The stream for restart `restart` of width `width` under base seed `seed`. The three numbers
 * are chained through the SplitMix64 mixer so that neighbouring triples give unrelated streams.
 */
export function rngFor(seed: number, width: number, restart: number): Xoshiro128StarStar {
  let h = splitMix64Mix((toUint64(seed, 'seed') + GOLDEN_GAMMA) & MASK64);
  h = splitMix64Mix(((h ^ toUint64(width, 'width')) + GOLDEN_GAMMA * 2n) & MASK64);
  h = splitMix64Mix(((h ^ toUint64(restart, 'restart')) + GOLDEN_GAMMA * 3n) & MASK64);
  return xoshiroFromSeed(h);
}

/** Fisher–Yates shuffle in place. */
export function shuffle(items: Int32Array, rng: Rng): void {
  for (let i = items.length - 1; i > 0; i--) {
    const j = Math.floor(rng.nextDouble() * (i + 1));
    const t = items[i];
    items[i] = items[j];
    items[j] = t;
  }
}
