/**
 * A summary of the data as used, kept in the baseline to explain later changes.
 *
 * Its tables are keyed by the file's own strings (column names, class labels, categories), so
 * they are null-prototype objects: a label such as `__proto__` or `constructor` is then an
 * ordinary key, never the object's prototype or an inherited method.
 */
import type { CategoricalProfile, DataProfile, NumericProfile, TargetSpread } from './types.js';
import type { TypedColumn } from './columns.js';
import type { TargetColumn } from './target.js';
import type { ColumnStore } from './column-store.js';

export function profileData(
  features: TypedColumn[],
  target: TargetColumn,
  stores: ColumnStore[],
  rows: number,
): DataProfile {
  const missing = new Map(stores.map((s) => [s.column, s.missing]));
  const profiles = keyedTable<NumericProfile | CategoricalProfile>();
  for (const column of features) {
    const lost = missing.get(column.column) ?? 0;
    profiles[column.name] =
      column.kind === 'numeric'
        ? numericProfile(column.values, lost)
        : categoricalProfile(column.categories, column.codes, lost);
  }
  let classes: Record<string, number> | null = null;
  if (target.task === 'classification') {
    const counts = new Array<number>(target.classes.length).fill(0);
    for (const c of target.indices) counts[c]++;
    const table = keyedTable<number>();
    target.classes.forEach((label, i) => {
      table[label] = counts[i];
    });
    classes = table;
  }
  const used = [
    ...features.map((c) => ({ name: c.name, column: c.column })),
    { name: target.name, column: target.column },
  ];
  used.sort((a, b) => a.column - b.column);
  return { rows, classes, columns: used.map((c) => c.name), features: profiles };
}

/** A regression target's mean, standard deviation and range over the rows used; null for classification. */
export function targetSpread(target: TargetColumn): TargetSpread | null {
  if (target.task !== 'regression') return null;
  const { mean, std, min, max } = numericProfile(target.values, 0);
  return { mean, std, min, max };
}

function numericProfile(values: Float64Array, missing: number): NumericProfile {
  let sum = 0;
  let min = Infinity;
  let max = -Infinity;
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    sum += v;
    if (v < min) min = v;
    if (v > max) max = v;
  }
  const mean = sum / values.length;
  let squares = 0;
  for (let i = 0; i < values.length; i++) {
    const d = values[i] - mean;
    squares += d * d;
  }
  // Population standard deviation, the same one the standardisation uses.
  return { kind: 'numeric', mean, std: Math.sqrt(squares / values.length), min, max, missing };
}

function categoricalProfile(categories: string[], codes: Int32Array, missing: number): CategoricalProfile {
  const tally = new Array<number>(categories.length).fill(0);
  for (const c of codes) tally[c]++;
  const counts = keyedTable<number>();
  categories.forEach((category, i) => {
    counts[category] = tally[i];
  });
  return { kind: 'categorical', counts, missing };
}

/** An empty table keyed by strings from the file: no prototype, so no key is special. */
function keyedTable<T>(): Record<string, T> {
  return Object.create(null) as Record<string, T>;
}
