/**
 * Checks an int8 network read from a file before anything runs or exports it: every array has
 * its length, every code its range, every float32 constant is a finite float32. Returns the
 * first problem as (key, expected) for the loader's message, or null.
 */
import type { Encoding } from '../data/types.js';
import { BIAS_LIMIT } from './quantize.js';
import { LUT_ENTRIES } from './cost.js';
import { MAX_SHIFT } from './fixed-point.js';

export interface Int8Problem {
  key: string;
  expected: string;
}

const isInt = (v: unknown, lo: number, hi: number): boolean =>
  Number.isInteger(v) && (v as number) >= lo && (v as number) <= hi;
const isF32 = (v: unknown): boolean => typeof v === 'number' && Number.isFinite(v) && Math.fround(v) === v;
const isPositive = (v: unknown): boolean => typeof v === 'number' && Number.isFinite(v) && v > 0;

function list(v: unknown, n: number, ok: (x: unknown) => boolean): boolean {
  return Array.isArray(v) && v.length === n && v.every(ok);
}

function matrix(v: unknown, rows: number, cols: number, ok: (x: unknown) => boolean): boolean {
  return Array.isArray(v) && v.length === rows && v.every((r) => list(r, cols, ok));
}

const obj = (v: unknown): Record<string, unknown> | null =>
  typeof v === 'object' && v !== null && !Array.isArray(v) ? (v as Record<string, unknown>) : null;

function quantParams(v: unknown): boolean {
  const p = obj(v);
  return p !== null && isPositive(p.scale) && isInt(p.zeroPoint, -128, 127);
}

export function checkInt8Network(
  value: unknown,
  shape: { inputs: number; width: number; outputs: number },
  encoding: Encoding,
): Int8Problem | null {
  const { inputs: D, width: H, outputs: K } = shape;
  const q = obj(value);
  if (q === null) return { key: 'int8', expected: 'an object or null' };
  if (q.inputs !== D || q.width !== H || q.outputs !== K) {
    return { key: 'int8', expected: `the shape of the network (${D} inputs, ${H} hidden, ${K} outputs)` };
  }
  const input = obj(q.input);
  if (input === null || !quantParams(input) || !isInt(input.one, -128, 127)) {
    return { key: 'int8.input', expected: 'a scale, an int8 zero-point and an int8 one-hot code' };
  }
  const features = input.features;
  const fine =
    Array.isArray(features) &&
    features.length === encoding.features.length &&
    features.every((f, i) => {
      const e = encoding.features[i];
      const g = obj(f);
      if (g === null || g.kind !== e.kind) return false;
      if (e.kind === 'categorical') return g.categories === e.categories.length;
      return isF32(g.mean) && isF32(g.multiplier);
    });
  if (!fine) return { key: 'int8.input.features', expected: 'one entry per feature of the encoding, of its kind' };
  const hidden = obj(q.hidden);
  if (hidden === null) return { key: 'int8.hidden', expected: 'an object' };
  const checks: [string, boolean, string][] = [
    ['weights', matrix(hidden.weights, H, D, (w) => isInt(w, -127, 127)), `${H} rows of ${D} integers in [-127, 127]`],
    ['weightScales', list(hidden.weightScales, H, isPositive), `${H} positive numbers`],
    ['bias', list(hidden.bias, H, (b) => isInt(b, -BIAS_LIMIT, BIAS_LIMIT)), `${H} integers within ±2^30`],
    ['multiplier', list(hidden.multiplier, H, (m) => isInt(m, 0, 2 ** 31 - 1)), `${H} integers in [0, 2^31)`],
    ['shift', list(hidden.shift, H, (n) => isInt(n, -MAX_SHIFT, MAX_SHIFT)), `${H} integers in [-31, 31]`],
    ['preActivation', quantParams(hidden.preActivation), 'a scale and an int8 zero-point'],
    ['activation', quantParams(hidden.activation), 'a scale and an int8 zero-point'],
    ['table', list(hidden.table, LUT_ENTRIES, (t) => isInt(t, -128, 127)), `${LUT_ENTRIES} integers in [-128, 127]`],
  ];
  for (const [key, ok, expected] of checks) if (!ok) return { key: `int8.hidden.${key}`, expected };
  const output = obj(q.output);
  if (output === null) return { key: 'int8.output', expected: 'an object' };
  const outChecks: [string, boolean, string][] = [
    ['weights', matrix(output.weights, K, H, (w) => isInt(w, -127, 127)), `${K} rows of ${H} integers in [-127, 127]`],
    ['weightScales', list(output.weightScales, K, isPositive), `${K} positive numbers`],
    ['bias', list(output.bias, K, (b) => isInt(b, -BIAS_LIMIT, BIAS_LIMIT)), `${K} integers within ±2^30`],
    ['scale', list(output.scale, K, isF32), `${K} finite float32 numbers`],
  ];
  for (const [key, ok, expected] of outChecks) if (!ok) return { key: `int8.output.${key}`, expected };
  return null;
}
