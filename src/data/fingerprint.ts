/**
 * sha256 of the data as used, over a canonical form: columns sorted by name, each
 * with its role and kind, then its values in row order (numbers as little-endian
 * 64-bit floats, categories as indices into the sorted category list). Line endings,
 * quoting, spelling of numbers ("1.0" vs "1") and column order do not change it; any
 * changed value does.
 */
import { createHash, type Hash } from 'node:crypto';
import type { TypedColumn } from './columns.js';
import type { TargetColumn } from './target.js';
import { compareText } from './columns.js';

const FORMAT = 'neuron-budget data fingerprint v1';
const CHUNK = 8192;

interface Part {
  name: string;
  role: 'feature' | 'target';
  kind: 'numeric' | 'categorical';
  write: (hash: Hash) => void;
}

export function fingerprint(features: TypedColumn[], target: TargetColumn, rows: number): string {
  const parts: Part[] = features.map((column) => ({
    name: column.name,
    role: 'feature',
    kind: column.kind,
    write: (hash) =>
      column.kind === 'numeric' ? numbers(hash, column.values) : categories(hash, column.categories, column.codes),
  }));
  parts.push({
    name: target.name,
    role: 'target',
    kind: target.task === 'classification' && target.numericLabels === null ? 'categorical' : 'numeric',
    write: (hash) =>
      target.task === 'regression'
        ? numbers(hash, target.values)
        : target.numericLabels !== null
          ? numbers(hash, target.numericLabels)
          : categories(hash, target.classes, target.indices),
  });
  parts.sort((a, b) => compareText(a.name, b.name));
  const hash = createHash('sha256');
  hash.update(`${FORMAT}\nrows ${rows}\n`);
  for (const part of parts) {
    hash.update(`${JSON.stringify([part.name, part.role, part.kind])}\n`);
    part.write(hash);
  }
  return hash.digest('hex');
}

function numbers(hash: Hash, values: Float64Array): void {
  const chunk = new Float64Array(CHUNK);
  const view = new DataView(chunk.buffer);
  const littleEndian = new Uint8Array(new Uint16Array([1]).buffer)[0] === 1;
  for (let start = 0; start < values.length; start += CHUNK) {
    const n = Math.min(CHUNK, values.length - start);
    for (let i = 0; i < n; i++) {
      const v = values[start + i];
      if (littleEndian) chunk[i] = v === 0 ? 0 : v;
      else view.setFloat64(i * 8, v === 0 ? 0 : v, true);
    }
    hash.update(new Uint8Array(chunk.buffer, 0, n * 8));
  }
}

function categories(hash: Hash, names: string[], codes: Int32Array): void {
  hash.update(`${JSON.stringify(names)}\n`);
  const chunk = new Uint32Array(CHUNK);
  const view = new DataView(chunk.buffer);
  const littleEndian = new Uint8Array(new Uint16Array([1]).buffer)[0] === 1;
  for (let start = 0; start < codes.length; start += CHUNK) {
    const n = Math.min(CHUNK, codes.length - start);
    for (let i = 0; i < n; i++) {
      if (littleEndian) chunk[i] = codes[start + i];
      else view.setUint32(i * 4, codes[start + i], true);
    }
    hash.update(new Uint8Array(chunk.buffer, 0, n * 4));
  }
}
