/**
 * The target column and the task. With `task: auto`, a text target means
 * classification; a numeric target with at most AUTO_MAX_CLASSES distinct values means
 * classification too (class labels like 0/1/2); any other numeric target means regression.
 */
import { quote } from '../common/escape.js';
import { AUTO_MAX_CLASSES } from '../common/metric.js';
import type { Config, Task } from '../config/types.js';
import type { ColumnStore } from './column-store.js';
import { categoricalColumn, looksNumeric, MAX_CLASSES, numericColumn } from './columns.js';
import { columnLabel, dataError, shownValue, type DataFile } from './where.js';

export type TargetColumn =
  | {
      task: 'classification';
      name: string;
      column: number;
      /** Labels in class-index order: numeric labels by value, text labels by code units. */
      classes: string[];
      /** Class index per row. */
      indices: Int32Array;
      /** Whether labels were numbers (the fingerprint hashes their values, not their spelling). */
      numericLabels: Float64Array | null;
    }
  | { task: 'regression'; name: string; column: number; values: Float64Array };

export function targetColumn(store: ColumnStore, config: Config, file: DataFile): TargetColumn {
  const wanted = config.data.task;
  const label = columnLabel(store.column, store.name);
  const numeric = looksNumeric(store);
  let task: Task;
  if (wanted !== 'auto') task = wanted;
  else if (!numeric) task = 'classification';
  else task = distinctNumbers(store, AUTO_MAX_CLASSES) === null ? 'regression' : 'classification';

  if (task === 'regression') {
    if (!numeric) {
      const first = store.firstText;
      throw dataError(
        file,
        first?.line ?? 1,
        store.column,
        `${label} (the target) must be numeric for regression, found ${shownValue(first?.value ?? '')}`,
      );
    }
    const column = numericColumn(store, file, ' (the target)');
    checkNotConstant(column.values, file, store);
    return { task, name: store.name, column: store.column, values: column.values };
  }

  if (numeric) {
    const column = numericColumn(store, file, ' (the target)');
    const values = distinctNumbers(store, MAX_CLASSES);
    if (values === null) throw tooManyClasses(store, file);
    const rank = new Map(values.map((v, i) => [v, i]));
    const indices = new Int32Array(column.values.length);
    for (let i = 0; i < indices.length; i++) indices[i] = rank.get(column.values[i]) ?? -1;
    const classes = values.map((v) => String(v));
    checkTwoClasses(classes, file, store);
    return { task, name: store.name, column: store.column, classes, indices, numericLabels: column.values };
  }
  if (store.distinct === null) throw tooManyClasses(store, file);
  const column = categoricalColumn(store, file, MAX_CLASSES, 'class label');
  checkTwoClasses(column.categories, file, store);
  return {
    task,
    name: store.name,
    column: store.column,
    classes: column.categories,
    indices: column.codes,
    numericLabels: null,
  };
}

/** Sorted distinct values of a numeric column, or null when there are more than `limit`. */
function distinctNumbers(store: ColumnStore, limit: number): number[] | null {
  const seen = new Set<number>();
  const values = store.numbers;
  for (let i = 0; i < store.length; i++) {
    const v = values[i];
    if (Number.isNaN(v) || seen.has(v)) continue;
    seen.add(v);
    if (seen.size > limit) return null;
  }
  return [...seen].sort((a, b) => a - b);
}

function checkTwoClasses(classes: string[], file: DataFile, store: ColumnStore): void {
  if (classes.length >= 2) return;
  throw dataError(
    file,
    1,
    store.column,
    `${columnLabel(store.column, store.name)} (the target) has a single class ${quote(classes[0] ?? '')} in all ` +
      `${store.length} rows; classification needs at least two classes`,
  );
}

function checkNotConstant(values: Float64Array, file: DataFile, store: ColumnStore): void {
  for (let i = 1; i < values.length; i++) if (values[i] !== values[0]) return;
  throw dataError(
    file,
    1,
    store.column,
    `${columnLabel(store.column, store.name)} (the target) is ${values[0]} in all ${values.length} rows; ` +
      'a regression target must vary',
  );
}

function tooManyClasses(store: ColumnStore, file: DataFile) {
  return dataError(
    file,
    store.overflow?.line ?? 1,
    store.column,
    `${columnLabel(store.column, store.name)} (the target) has more than ${MAX_CLASSES} distinct values, ` +
      'too many classes for classification; set data.task: regression if it is a measurement',
  );
}
