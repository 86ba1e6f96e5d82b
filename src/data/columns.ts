/**
 * Which columns are used, and what kind each one is. A column is numeric when at least
 * half of its cells are numbers (then every cell must be); otherwise it is categorical,
 * with at most data.max-categories distinct values.
 */
import type { Config } from '../config/types.js';
import { quote } from '../common/escape.js';
import { formatCount } from '../common/format.js';
import { nearest } from '../common/suggest.js';
import { looksNumeric, type ColumnStore } from './column-store.js';
import type { ReadPlan } from './read-csv.js';
import { MAX_MAGNITUDE } from './numbers.js';
import {
  characterCount,
  columnLabel,
  ConfigKeyProblem,
  dataError,
  MAX_NAME_LENGTH,
  shownValue,
  type DataFile,
} from './where.js';

/** Most classes a classification target may have (a practical cap, no source). */
export const MAX_CLASSES = 1000;

/** Column names listed in a message before the rest are only counted. */
const NAMES_LISTED = 30;

export interface ChosenColumns {
  plan: ReadPlan;
  /** Field indices of the features, in input order. */
  features: number[];
  target: number;
}

/** Resolves data.target / data.features / data.ignore against the header. */
export function chooseColumns(header: string[], config: Config, file: DataFile): ChosenColumns {
  const data = config.data;
  const index = new Map(header.map((name, i) => [name, i]));
  const find = (name: string, key: string): number => {
    const i = index.get(name);
    if (i !== undefined) return i;
    const guess = nearest(name, header);
    const hint = guess === null ? '.' : ` (did you mean ${quote(guess)}?).`;
    throw new ConfigKeyProblem(
      key,
      `expected a column of ${file.shown}, found ${quote(name)}, which its header (line 1) does not have${hint} ` +
        `The columns are: ${listNames(header)}`,
    );
  };
  const target = find(data.target, 'data.target');
  const ignored = new Set<number>();
  for (const name of data.ignore) {
    const i = find(name, 'data.ignore');
    if (i === target) {
      throw new ConfigKeyProblem('data.ignore', `lists ${quote(name)}, which is the target column (data.target)`);
    }
    ignored.add(i);
  }
  let features: number[];
  if (data.features === null) {
    features = header.map((_, i) => i).filter((i) => i !== target && !ignored.has(i));
  } else {
    features = [];
    for (const name of data.features) {
      const i = find(name, 'data.features');
      if (i === target) {
        throw new ConfigKeyProblem('data.features', `lists ${quote(name)}, which is the target column (data.target)`);
      }
      if (ignored.has(i)) {
        throw new ConfigKeyProblem('data.features', `lists ${quote(name)}, which data.ignore also lists`);
      }
      if (features.includes(i)) {
        throw new ConfigKeyProblem('data.features', `lists ${quote(name)} twice`);
      }
      features.push(i);
    }
  }
  if (features.length === 0) {
    throw new ConfigKeyProblem(
      data.features === null ? 'data.ignore' : 'data.features',
      `expected at least one feature column besides the target ${quote(data.target)}, found none left in ${file.shown}`,
    );
  }
  for (const field of [...features, target]) checkNameLength(header[field], field + 1, file);
  const columns = features.map((field) => ({ field, distinctLimit: data.maxCategories }));
  columns.push({ field: target, distinctLimit: MAX_CLASSES });
  return { plan: { columns, target: columns.length - 1 }, features, target };
}

export interface NumericColumn {
  kind: 'numeric';
  name: string;
  column: number;
  values: Float64Array;
}

export interface CategoricalColumn {
  kind: 'categorical';
  name: string;
  column: number;
  /** Sorted (by UTF-16 code units, so the order is the same everywhere). */
  categories: string[];
  /** Index into `categories` per row. */
  codes: Int32Array;
}

export type TypedColumn = NumericColumn | CategoricalColumn;

export { looksNumeric } from './column-store.js';

/** Numeric column values, or the first cell that breaks them. */
export function numericColumn(store: ColumnStore, file: DataFile, role: string): NumericColumn {
  const text = store.firstText;
  const odd = store.firstNotFinite;
  const label = `${columnLabel(store.column, store.name)}${role}`;
  if (odd !== null && (text === null || odd.line <= text.line)) {
    const why = odd.overflow
      ? `a number too large: cells may hold numbers from -${MAX_MAGNITUDE_SHOWN} to ${MAX_MAGNITUDE_SHOWN}, the range of ` +
        'the float32 numbers a device runs the network in (check the unit or the decimal point)'
      : 'a value that is not a finite number (NaN and Infinity are not measurements; leave the cell empty if it is missing)';
    throw dataError(
      file,
      odd.line,
      store.column,
      `${label}: expected a finite number, found ${shownValue(odd.value)}, ${why}`,
    );
  }
  if (text !== null) {
    throw dataError(
      file,
      text.line,
      store.column,
      `${label}: expected a number, found ${shownValue(text.value)} (the column holds numbers in ` +
        `${store.numberCount} of ${store.numberCount + store.textCount} rows; leave a missing value empty)`,
    );
  }
  return { kind: 'numeric', name: store.name, column: store.column, values: store.numbers.subarray(0, store.length) };
}

/** MAX_MAGNITUDE as a message shows it. */
const MAX_MAGNITUDE_SHOWN = MAX_MAGNITUDE.toPrecision(2).replace('e+', 'e');

/**
 * The column's texts as categories, or the first cell that breaks them. `what` names a
 * value in messages: "category" for a feature, "class label" for the target.
 */
export function categoricalColumn(
  store: ColumnStore,
  file: DataFile,
  cap: number,
  what: 'category' | 'class label' = 'category',
): CategoricalColumn {
  if (store.distinct === null || store.codes === null) {
    const count = store.distinctCount();
    const over = store.overflow;
    const amount = store.distinctCountExact() ? `${count}` : `more than ${cap}`;
    throw dataError(
      file,
      over?.line ?? 1,
      store.column,
      `${columnLabel(store.column, store.name)} is text with ${amount} distinct values; a categorical column ` +
        `may have at most ${cap} (data.max-categories). The value ${shownValue(over?.value ?? '')} on this line ` +
        `is number ${cap + 1}. An identifier column belongs in data.ignore.`,
    );
  }
  const long = store.firstTooLong;
  if (long !== null) {
    throw dataError(
      file,
      long.line,
      store.column,
      `${columnLabel(store.column, store.name)}: a ${what} may have at most ${MAX_NAME_LENGTH} characters; found ` +
        `one of ${formatCount(characterCount(long.value))} characters: ${shownValue(long.value)}`,
    );
  }
  return sortedCategories(store, store.distinct, store.codes);
}

function sortedCategories(store: ColumnStore, distinct: Map<string, number>, codes: Int32Array): CategoricalColumn {
  const firstSeen = [...distinct.keys()];
  const categories = [...firstSeen].sort(compareText);
  const rank = new Map(categories.map((c, i) => [c, i]));
  const remap = Int32Array.from(firstSeen, (c) => rank.get(c) ?? -1);
  const out = new Int32Array(store.length);
  for (let i = 0; i < store.length; i++) out[i] = remap[codes[i]];
  return { kind: 'categorical', name: store.name, column: store.column, categories, codes: out };
}

export function compareText(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0;
}

/** The feature column as numeric or categorical, by the rule at the top of this file. */
export function featureColumn(store: ColumnStore, file: DataFile, cap: number): TypedColumn {
  return looksNumeric(store) ? numericColumn(store, file, '') : categoricalColumn(store, file, cap);
}

/** A column the job uses must have a name of at most MAX_NAME_LENGTH characters. */
function checkNameLength(name: string, column: number, file: DataFile): void {
  if (name.length <= MAX_NAME_LENGTH) return;
  const length = characterCount(name);
  if (length <= MAX_NAME_LENGTH) return;
  throw dataError(
    file,
    1,
    column,
    `column ${column}: a column name may have at most ${MAX_NAME_LENGTH} characters; found one of ` +
      `${formatCount(length)} characters: ${shownValue(name)}`,
  );
}

/** The header's names for a message: quoted, clipped, and at most NAMES_LISTED of them. */
function listNames(header: string[]): string {
  const shown = header.slice(0, NAMES_LISTED).map((name) => quote(name, 40));
  const more = header.length - shown.length;
  return more > 0 ? `${shown.join(', ')} and ${formatCount(more)} more` : shown.join(', ');
}
