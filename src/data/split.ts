/**
 * Deterministic three-way split, stratified by class, chosen by a seeded Fisher–Yates
 * shuffle of each class's rows:
 * - validation rows (round(rows × data.validation) per class, at least one) steer training:
 *   when a training stops, which restart is kept, whether a pruning step is accepted;
 * - judging rows (round(rows × data.judging) per class, at least one) decide whether a network
 *   meets the target, and never steer anything;
 * - the rest train.
 * The validation rows are the first of each shuffled class, so they are the same rows whatever
 * data.judging is. Every part keeps file order.
 *
 * Small data: when some class has too few rows for three parts, the judging part is dropped and
 * networks are judged on the validation rows (`judgingFolded`); the report says so, because a
 * figure chosen on the rows that judge it is optimistic.
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
  judging: Int32Array;
  /** The judging part was asked for but some class was too small: judged on validation rows instead. */
  judgingFolded: boolean;
}

export interface SplitTarget {
  /** Class index per row, or null for regression (one group). */
  classIndex: Int32Array | null;
  classes: string[] | null;
  rows: number;
  name: string;
  column: number;
}

export interface SplitFractions {
  validation: number;
  judging: number;
}

/** Rows each part takes from a group of `n`, or null when the group is too small for them. */
function partSizes(n: number, f: SplitFractions, minTrain: number): { validation: number; judging: number } | null {
  let validation = f.validation > 0 ? Math.max(1, Math.round(n * f.validation)) : 0;
  let judging = f.judging > 0 ? Math.max(1, Math.round(n * f.judging)) : 0;
  if (n < minTrain + Math.sign(validation) + Math.sign(judging)) return null;
  // Keep enough to train on; the larger held-out part gives way first, and neither below one row.
  while (n - validation - judging < minTrain) {
    if (validation >= judging && validation > 1) validation--;
    else judging--;
  }
  return { validation, judging };
}

export function splitRows(target: SplitTarget, fractions: SplitFractions, seed: number, file: DataFile): Split {
  const groups = groupRows(target);
  const minTrain = target.classIndex === null ? 2 : 1;
  let f = fractions;
  let judgingFolded = false;
  if (f.judging > 0 && groups.some((rows) => partSizes(rows.length, f, minTrain) === null)) {
    f = { ...f, judging: 0 };
    judgingFolded = true;
  }
  const sizes = groups.map((rows, g) => {
    const s = partSizes(rows.length, f, minTrain);
    if (s === null) throw tooFew(target, g, rows.length, minTrain, f, file);
    return s;
  });
  const rng = xoshiroFromSeed(BigInt(seed) ^ SPLIT_STREAM);
  const train: number[] = [];
  const validation: number[] = [];
  const judging: number[] = [];
  groups.forEach((rows, g) => {
    shuffle(rows, rng);
    const { validation: v, judging: j } = sizes[g];
    for (let i = 0; i < rows.length; i++) (i < v ? validation : i < v + j ? judging : train).push(rows[i]);
  });
  const ascending = (xs: number[]): Int32Array => Int32Array.from(xs).sort();
  return { train: ascending(train), validation: ascending(validation), judging: ascending(judging), judgingFolded };
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
  minTrain: number,
  f: SplitFractions,
  file: DataFile,
): UserError {
  const what =
    target.classes === null
      ? `the data have ${rows} rows`
      : `class ${quote(target.classes[group])} has ${rows} row${rows === 1 ? '' : 's'}`;
  const parts = [`${minTrain} to train on`];
  if (f.validation > 0) parts.push('1 to validate on');
  const minimum = minTrain + (f.validation > 0 ? 1 : 0);
  const per = target.classes === null ? '' : ' per class';
  return dataError(
    file,
    1,
    target.column,
    `${columnLabel(target.column, target.name)} (the target): ${what}; with validation ${f.validation} the split needs at least ${minimum} rows${per} (${parts.join(', ')})`,
  );
}
