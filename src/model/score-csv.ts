/**
 * Scores the rows of a CSV file with a model, streaming: the columns the model reads are found
 * by name in the header, every cell is read as the training data were (the same strict numbers,
 * the same standardisation and one-hot encoding), and a cell the model cannot take (a missing
 * column, a value that is not a number, a category it never saw) is an error naming the file,
 * the line and the column. With the target column present, the model's metric on those rows is
 * computed the way the report computes it.
 */
import { createReadStream } from 'node:fs';
import { Writable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import { parse } from 'csv-parse';
import { quote } from '../common/escape.js';
import { UserError } from '../common/errors.js';
import { classifyNumber, NumberKind } from '../data/numbers.js';
import { NotTextError, TextCheck } from '../data/text-check.js';
import { columnLabel, dataError, type DataFile } from '../data/where.js';
import { predict } from '../nn/index.js';
import type { ModelDocument } from './document.js';
import { standardise } from './predict.js';

/** Rows encoded and run together (memory stays bounded whatever the file's size). */
const BATCH = 4096;

/** One batch of scored rows: head outputs (rows × outputs: probabilities, or the value in the target's units). */
export interface ScoredBatch {
  rows: number;
  /** Class index per row (regression: 0). */
  classes: Int32Array;
  /** rows × outputs head outputs; regression: the prediction in the target's units. */
  outputs: Float64Array;
}

export interface Scored {
  rows: number;
  /** The model's metric on the rows, when the file has the target column; else null. */
  metric: number | null;
}

interface Column {
  field: number;
  name: string;
}

/** Reads `file` and hands each batch of predictions to `onBatch`, in file order. */
export async function scoreCsv(
  model: ModelDocument,
  file: DataFile,
  onBatch: (batch: ScoredBatch) => void,
  delimiter = ',',
): Promise<Scored> {
  const D = model.network.inputs;
  const K = model.network.outputs;
  const features = model.encoding.features;
  const target = model.encoding.target;
  const classes = target.classes ?? [];
  const x = new Float64Array(BATCH * D);
  const truthClass = new Int32Array(BATCH);
  const truthValue = new Float64Array(BATCH);
  let columns: Column[] | null = null;
  let targetColumn: Column | null = null;
  let filled = 0;
  let rows = 0;
  let correct = 0;
  let se = 0;
  let ae = 0;
  let maxAe = 0;
  let nextLine = 1;
  const parsed = { value: 0 };

  const flush = (): void => {
    if (filled === 0) return;
    const out = predict(model.network, x.subarray(0, filled * D), filled);
    const cls = new Int32Array(filled);
    const outputs = new Float64Array(filled * K);
    for (let p = 0; p < filled; p++) {
      if (model.task === 'regression') {
        outputs[p] = out[p] * target.std + target.mean;
      } else if (K === 1) {
        outputs[p] = out[p];
        cls[p] = out[p] > 0.5 ? 1 : 0;
      } else {
        let best = 0;
        for (let k = 0; k < K; k++) {
          outputs[p * K + k] = out[p * K + k];
          if (out[p * K + k] > out[p * K + best]) best = k;
        }
        cls[p] = best;
      }
      if (targetColumn !== null) {
        if (model.task === 'classification') {
          if (cls[p] === truthClass[p]) correct++;
        } else {
          const d = Math.abs(outputs[p] - truthValue[p]);
          se += d * d;
          ae += d;
          if (d > maxAe || d !== d) maxAe = d;
        }
      }
    }
    onBatch({ rows: filled, classes: cls, outputs });
    filled = 0;
  };

  const number = (text: string, line: number, col: Column): number => {
    const kind = classifyNumber(text, parsed);
    if (kind !== NumberKind.Finite) {
      throw dataError(
        file,
        line,
        col.field + 1,
        `${columnLabel(col.field + 1, col.name)}: expected a finite number, found ${quote(text)}`,
      );
    }
    return parsed.value;
  };

  const onRecord = (record: string[]): void => {
    const line = nextLine;
    nextLine += 1 + record.reduce((n, v) => n + (v.match(/\n/g)?.length ?? 0), 0);
    if (record.length === 1 && record[0] === '') return;
    if (columns === null) {
      const at = new Map(record.map((name, i) => [name, i]));
      columns = features.map((f) => {
        const field = at.get(f.name);
        if (field === undefined) {
          throw dataError(
            file,
            line,
            undefined,
            `expected the column ${quote(f.name)} the model reads, found only ${record.map((c) => quote(c, 40)).join(', ')}`,
          );
        }
        return { field, name: f.name };
      });
      const t = at.get(target.name);
      targetColumn = t === undefined ? null : { field: t, name: target.name };
      return;
    }
    const cols = columns;
    let c = filled * D;
    features.forEach((f, i) => {
      const col = cols[i];
      const text = (record[col.field] ?? '').trim();
      if (text === '')
        throw dataError(
          file,
          line,
          col.field + 1,
          `${columnLabel(col.field + 1, col.name)} is empty; the model needs a value`,
        );
      if (f.kind === 'numeric') {
        x[c++] = standardise(number(text, line, col), f.mean, f.std);
      } else {
        const k = f.categories.indexOf(text);
        if (k < 0) {
          throw dataError(
            file,
            line,
            col.field + 1,
            `${columnLabel(col.field + 1, col.name)}: the category ${quote(text)} is not one the model was trained on (${f.categories.map((v) => quote(v, 30)).join(', ')})`,
          );
        }
        for (let j = 0; j < f.categories.length; j++) x[c + j] = j === k ? 1 : 0;
        c += f.categories.length;
      }
    });
    if (targetColumn !== null) {
      const col = targetColumn;
      const text = (record[col.field] ?? '').trim();
      if (model.task === 'regression') truthValue[filled] = number(text, line, col);
      else {
        let k = classes.indexOf(text);
        // Numeric class labels are kept as the number's shortest text ("1", not "1.0").
        if (k < 0 && classifyNumber(text, parsed) === NumberKind.Finite) k = classes.indexOf(String(parsed.value));
        if (k < 0) {
          throw dataError(
            file,
            line,
            col.field + 1,
            `${columnLabel(col.field + 1, col.name)} (the target): the class ${quote(text)} is not one the model knows`,
          );
        }
        truthClass[filled] = k;
      }
    }
    filled++;
    rows++;
    if (filled === BATCH) flush();
  };

  const parser = parse({
    delimiter,
    bom: true,
    trim: true,
    skip_empty_lines: false,
    record_delimiter: ['\r\n', '\n'],
    relax_column_count: true,
  });
  const sink = new Writable({
    objectMode: true,
    write(record: string[], _encoding, done) {
      try {
        onRecord(record);
      } catch (error) {
        done(error as Error);
        return;
      }
      done();
    },
  });
  try {
    await pipeline(createReadStream(file.path), new TextCheck(delimiter), parser, sink);
  } catch (error) {
    if (error instanceof UserError) throw error;
    if (error instanceof NotTextError) {
      throw dataError(
        file,
        error.where.line,
        error.where.column,
        `expected UTF-8 text, found the byte ${error.where.bytes}; save the file as CSV (UTF-8)`,
      );
    }
    const code = (error as NodeJS.ErrnoException).code;
    if (code === 'ENOENT') throw new UserError(`${file.shown}: the data file does not exist`, { file: file.path });
    if (code === 'EISDIR') throw new UserError(`${file.shown}: is a folder; expected a CSV file`, { file: file.path });
    if (typeof code === 'string' && code.startsWith('CSV_')) {
      throw dataError(
        file,
        nextLine,
        undefined,
        `the row starting on this line cannot be read as CSV: ${(error as Error).message}`,
      );
    }
    throw error;
  }
  flush();
  if (columns === null) throw dataError(file, 1, 1, 'the file is empty; expected a header row naming the columns');
  if (targetColumn === null || rows === 0) return { rows, metric: null };
  const metric = model.target.metric;
  if (metric === 'accuracy') return { rows, metric: correct / rows };
  return { rows, metric: metric === 'rmse' ? Math.sqrt(se / rows) : metric === 'mae' ? ae / rows : maxAe };
}
