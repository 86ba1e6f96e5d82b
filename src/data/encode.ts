/**
 * Turns typed columns into the network's inputs and targets: numeric features
 * standardised with statistics of the training rows only, categorical features one-hot,
 * class labels as indices, regression targets standardised. Row-major, on
 * SharedArrayBuffer so worker threads read the same memory.
 */
import type { EncodedDataset, FeatureEncoding, TargetEncoding } from './types.js';
import type { TypedColumn } from './columns.js';
import type { Split } from './split.js';
import type { TargetColumn } from './target.js';

function sharedFloat64(length: number): Float64Array {
  return new Float64Array(new SharedArrayBuffer(length * Float64Array.BYTES_PER_ELEMENT));
}

/** Mean and population standard deviation over the given rows (two passes, for accuracy). */
function meanAndStd(values: Float64Array, rows: Int32Array): { mean: number; std: number } {
  if (rows.length === 0) return { mean: 0, std: 0 };
  let sum = 0;
  for (let i = 0; i < rows.length; i++) sum += values[rows[i]];
  const mean = sum / rows.length;
  let squares = 0;
  for (let i = 0; i < rows.length; i++) {
    const d = values[rows[i]] - mean;
    squares += d * d;
  }
  return { mean, std: Math.sqrt(squares / rows.length) };
}

export function encodeDataset(features: TypedColumn[], target: TargetColumn, split: Split): EncodedDataset {
  const encodings: FeatureEncoding[] = features.map((column) => {
    if (column.kind === 'categorical') {
      return { kind: 'categorical', name: column.name, categories: column.categories };
    }
    const { mean, std } = meanAndStd(column.values, split.train);
    // A constant feature is only centred: dividing by 0 would poison every input.
    return { kind: 'numeric', name: column.name, mean, std: std > 0 ? std : 1 };
  });
  const inputs = encodings.reduce((n, e) => n + (e.kind === 'numeric' ? 1 : e.categories.length), 0);

  let targetEncoding: TargetEncoding;
  let outputs: number;
  if (target.task === 'classification') {
    targetEncoding = { name: target.name, task: 'classification', classes: target.classes, mean: 0, std: 1 };
    outputs = target.classes.length === 2 ? 1 : target.classes.length;
  } else {
    const { mean, std } = meanAndStd(target.values, split.train);
    targetEncoding = { name: target.name, task: 'regression', classes: null, mean, std: std > 0 ? std : 1 };
    outputs = 1;
  }

  const fill = (rows: Int32Array) => {
    const x = sharedFloat64(rows.length * inputs);
    const y = sharedFloat64(rows.length);
    let offset = 0;
    for (let f = 0; f < features.length; f++) {
      const column = features[f];
      const e = encodings[f];
      if (column.kind === 'numeric' && e.kind === 'numeric') {
        const values = column.values;
        for (let r = 0; r < rows.length; r++) x[r * inputs + offset] = (values[rows[r]] - e.mean) / e.std;
        offset += 1;
      } else if (column.kind === 'categorical') {
        const codes = column.codes;
        for (let r = 0; r < rows.length; r++) x[r * inputs + offset + codes[rows[r]]] = 1;
        offset += column.categories.length;
      }
    }
    if (target.task === 'classification') {
      for (let r = 0; r < rows.length; r++) y[r] = target.indices[rows[r]];
    } else {
      for (let r = 0; r < rows.length; r++) y[r] = (target.values[rows[r]] - targetEncoding.mean) / targetEncoding.std;
    }
    return { x, y };
  };

  const train = fill(split.train);
  const validation = fill(split.validation);
  const judging = fill(split.judging);
  // The rows that judge, as the device gets them: what the int8 path is judged on.
  const judgedRows =
    split.judging.length > 0 ? split.judging : split.validation.length > 0 ? split.validation : split.train;
  return {
    task: target.task,
    inputs,
    outputs,
    trainRows: split.train.length,
    validationRows: split.validation.length,
    xTrain: train.x,
    yTrain: train.y,
    xValidation: validation.x,
    yValidation: validation.y,
    judgingRows: split.judging.length,
    xJudging: judging.x,
    yJudging: judging.y,
    rawJudged: rawFeatures(features, judgedRows),
    encoding: { features: encodings, target: targetEncoding },
  };
}

/**
 * Rows as a device receives them (rows × features, float32): a numeric feature's value, a
 * categorical feature's category index. The exported C and the int8 simulation take this form.
 */
function rawFeatures(features: TypedColumn[], rows: Int32Array): Float32Array {
  const F = features.length;
  const out = new Float32Array(new SharedArrayBuffer(rows.length * F * Float32Array.BYTES_PER_ELEMENT));
  features.forEach((column, f) => {
    if (column.kind === 'numeric') for (let r = 0; r < rows.length; r++) out[r * F + f] = column.values[rows[r]];
    else for (let r = 0; r < rows.length; r++) out[r * F + f] = column.codes[rows[r]];
  });
  return out;
}
