/** Run an exported model on raw rows (column name → cell text), as read from a CSV file. */
import { quote } from '../common/escape.js';
import { UserError } from '../common/errors.js';
import { predict } from '../nn/index.js';
import type { ModelDocument } from './document.js';

export type Row = Record<string, string>;

/** A row's cell, by own key only: a column may be named `constructor` or `__proto__`. */
function cellOf(row: Row, name: string): string | undefined {
  return Object.hasOwn(row, name) ? row[name] : undefined;
}

export type Prediction = { label: string; probabilities: Record<string, number> } | { value: number };

/** (x − mean) / std, with a constant training column (std 0) only centred. */
export function standardise(x: number, mean: number, std: number): number {
  return std > 0 ? (x - mean) / std : x - mean;
}

/** Encode raw rows the way the training data was encoded. An unseen category encodes as all zeros. */
export function encodeRows(model: ModelDocument, rows: readonly Row[]): Float64Array {
  const inputs = model.network.inputs;
  const x = new Float64Array(rows.length * inputs);
  rows.forEach((row, r) => {
    let c = r * inputs;
    for (const f of model.encoding.features) {
      const cell = cellOf(row, f.name);
      if (cell === undefined) throw new UserError(`row ${r + 1}: column ${quote(f.name)} is missing`, { key: f.name });
      const text = cell.trim();
      if (f.kind === 'numeric') {
        const v = text === '' ? Number.NaN : Number(text);
        if (!Number.isFinite(v)) {
          throw new UserError(`row ${r + 1}, column ${quote(f.name)}: expected a number, found ${quote(cell)}`, {
            key: f.name,
          });
        }
        x[c++] = standardise(v, f.mean, f.std);
      } else {
        const k = f.categories.indexOf(text);
        for (let j = 0; j < f.categories.length; j++) x[c + j] = j === k ? 1 : 0;
        c += f.categories.length;
      }
    }
  });
  return x;
}

/** Head outputs for each row: class probabilities, or the value in the target's units. */
export function predictRows(model: ModelDocument, rows: readonly Row[]): Prediction[] {
  const out = predict(model.network, encodeRows(model, rows), rows.length);
  const K = model.network.outputs;
  const t = model.encoding.target;
  const preds: Prediction[] = [];
  for (let p = 0; p < rows.length; p++) {
    if (model.task === 'regression') {
      preds.push({ value: out[p] * t.std + t.mean });
      continue;
    }
    const classes = t.classes ?? [];
    // Keyed by class labels, which may be any string: no prototype, so no label is special.
    const probabilities = Object.create(null) as Record<string, number>;
    let best = 0;
    if (K === 1) {
      // One logistic output: the probability of the second class.
      probabilities[classes[0]] = 1 - out[p];
      probabilities[classes[1]] = out[p];
      best = out[p] > 0.5 ? 1 : 0;
    } else {
      for (let k = 0; k < K; k++) {
        probabilities[classes[k]] = out[p * K + k];
        if (out[p * K + k] > out[p * K + best]) best = k;
      }
    }
    preds.push({ label: classes[best], probabilities });
  }
  return preds;
}

/** The model's target metric on rows that carry the target column. */
export function scoreRows(model: ModelDocument, rows: readonly Row[]): number {
  const preds = predictRows(model, rows);
  const name = model.encoding.target.name;
  const truth = rows.map((row, r) => {
    const cell = cellOf(row, name);
    if (cell === undefined) throw new UserError(`row ${r + 1}: target column ${quote(name)} is missing`, { key: name });
    return cell.trim();
  });
  const metric = model.target.metric;
  if (metric === 'accuracy') {
    let correct = 0;
    preds.forEach((p, r) => {
      if ('label' in p && p.label === truth[r]) correct++;
    });
    return correct / rows.length;
  }
  let se = 0;
  let ae = 0;
  let maxAe = 0;
  preds.forEach((p, r) => {
    const d = Math.abs(('value' in p ? p.value : Number.NaN) - Number(truth[r]));
    se += d * d;
    ae += d;
    if (d > maxAe || d !== d) maxAe = d;
  });
  if (metric === 'rmse') return Math.sqrt(se / rows.length);
  return metric === 'mae' ? ae / rows.length : maxAe;
}
