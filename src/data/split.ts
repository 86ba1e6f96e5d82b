/**
 * Deterministic training/validation split, stratified by class: each class gives
 * round(rows × validation) of its rows (at least one) to validation, chosen by a seeded
 * Fisher–Yates shuffle. Both parts keep file order.
 */
import { quote } from '../common/escape.js';
import { type UserError } from '../common/errors.js';
import { shuffle, xoshiroFromSeed } from '../common/random.js';
import { columnLabel, dataError, type DataFile } from './where.js';

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
  const rng = xoshiroFromSeed(BigInt(seed) ^ SPLIT_STREAM);
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
    shuffle(rows, rng);
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
      : `class ${quote(target.classes[group])} has ${rows} row${rows === 1 ? '' : 's'}`;
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
