/**
 * Deterministic training/validation split, stratified by class: each class gives
 * round(rows × validation) of its rows (at least one) to validation, chosen by a seeded
 * Fisher–Yates shuffle. Both parts keep file order.
 */
import { type UserError } from '../errors.js';
import { columnLabel, dataError, type DataFile } from './where.js';

/** SplitMix64 (Steele, Lea & Flood 2014): turns one seed into well-mixed 64-bit words. */
export function splitMix64(seed: bigint): () => bigint {
  let state = BigInt.asUintN(64, seed);
  return () => {
    state = BigInt.asUintN(64, state + 0x9e3779b97f4a7c15n);
    let z = state;
    z = BigInt.asUintN(64, (z ^ (z >> 30n)) * 0xbf58476d1ce4e5b9n);
    z = BigInt.asUintN(64, (z ^ (z >> 27n)) * 0x94d049bb133111ebn);
    return z ^ (z >> 31n);
  };
}

/** xoshiro128** 1.1 (Blackman & Vigna): 32-bit outputs using only 32-bit operations. */
export function xoshiro128ss(s0: number, s1: number, s2: number, s3: number): () => number {
  let a = s0 >>> 0;
  let b = s1 >>> 0;
  let c = s2 >>> 0;
  let d = s3 >>> 0;
  return () => {
    const r = Math.imul(b, 5);
    const result = Math.imul((r << 7) | (r >>> 25), 9) >>> 0;
    const t = b << 9;
    c ^= a;
    d ^= b;
    b ^= c;
    a ^= d;
    c ^= t;
    d = (d << 11) | (d >>> 21);
    return result;
  };
}

/** Uniform doubles in [0, 1) with 53 random bits, seeded through SplitMix64. */
export function seededUniform(seed: bigint): () => number {
  const mix = splitMix64(seed);
  const r0 = mix();
  const r1 = mix();
  const lo = (x: bigint): number => Number(x & 0xffffffffn);
  const hi = (x: bigint): number => Number(x >> 32n);
  const next = xoshiro128ss(lo(r0), hi(r0), lo(r1), hi(r1));
  return () => ((next() >>> 5) * 67108864 + (next() >>> 6)) / 9007199254740992;
}

/** Fisher–Yates shuffle in place. */
export function shuffle(items: Int32Array, uniform: () => number): void {
  for (let i = items.length - 1; i > 0; i--) {
    const j = Math.floor(uniform() * (i + 1));
    const t = items[i];
    items[i] = items[j];
    items[j] = t;
  }
}

// Keeps the split's stream apart from the training streams drawn from the same seed.
const SPLIT_STREAM = 0x73706c6974n; // "split"

export interface Split {
  /** Row numbers (0-based among the rows kept), ascending. */
  train: Int32Array;
  validation: Int32Array;
}

export interface SplitTarget {
  /** Class index per row, or null for regression (one group). */
  classIndex: Int32Array | null;
  classes: string[] | null;
  rows: number;
  name: string;
  column: number;
}

export function splitRows(target: SplitTarget, validation: number, seed: number, file: DataFile): Split {
  const groups = groupRows(target);
  const uniform = seededUniform(BigInt(seed) ^ SPLIT_STREAM);
  const train: number[] = [];
  const held: number[] = [];
  groups.forEach((rows, g) => {
    const minimum = target.classIndex === null ? 3 : 2;
    let take = 0;
    if (validation > 0) {
      if (rows.length < minimum) throw tooFew(target, g, rows.length, minimum, validation, file);
      // At least one validation row per class, and enough left to train on.
      take = Math.min(Math.max(1, Math.round(rows.length * validation)), rows.length - (minimum - 1));
    } else if (target.classIndex === null && rows.length < 2) {
      throw tooFew(target, g, rows.length, 2, validation, file);
    }
    shuffle(rows, uniform);
    for (let i = 0; i < rows.length; i++) (i < take ? held : train).push(rows[i]);
  });
  const ascending = (xs: number[]): Int32Array => Int32Array.from(xs).sort();
  return { train: ascending(train), validation: ascending(held) };
}

function groupRows(target: SplitTarget): Int32Array[] {
  if (target.classIndex === null) return [Int32Array.from({ length: target.rows }, (_, i) => i)];
  const counts = new Int32Array(target.classes?.length ?? 0);
  for (const c of target.classIndex) counts[c]++;
  const groups = Array.from(counts, (n) => new Int32Array(n));
  const filled = new Int32Array(counts.length);
  target.classIndex.forEach((c, row) => {
    groups[c][filled[c]++] = row;
  });
  return groups;
}

function tooFew(
  target: SplitTarget,
  group: number,
  rows: number,
  minimum: number,
  validation: number,
  file: DataFile,
): UserError {
  const what =
    target.classes === null
      ? `the data have ${rows} rows`
      : `class "${target.classes[group]}" has ${rows} row${rows === 1 ? '' : 's'}`;
  const need =
    validation > 0
      ? target.classes === null
        ? `at least ${minimum} rows (one or more to validate on, two or more to train on)`
        : `at least ${minimum} rows per class (one to train on, one to validate on)`
      : 'at least 2 rows to train on';
  return dataError(
    file,
    1,
    target.column,
    `${columnLabel(target.column, target.name)} (the target): ${what}; with validation ${validation} the split needs ${need}`,
  );
}
