/**
 * Every chart and table copes with any finite number it reads. A baseline file is the
 * repository's to write, so its widths, metrics, row counts and profile statistics may be any
 * number JSON holds (1.7e308, 5e-324, -0, 2^53 + 2): whatever they are, the comment and the
 * terminal text render, every Mermaid number is a plain decimal, and the JSON report holds no
 * Infinity (which JSON would silently turn into null).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { evaluateGate } from '../../src/gate/index.js';
import { nextBaseline, parseBaseline, serializeBaseline } from '../../src/gate/baseline.js';
import type { Baseline } from '../../src/gate/types.js';
import { renderMarkdown, renderText, withGate } from '../../src/report/index.js';
import { config, dataReport, found, loaded, profile, width as widthSummary } from '../gate/build.js';

const EDGES = [Number.MAX_VALUE, 1.7e308, 1e308, 1e160, 1e21, 2 ** 53 + 2, 12345.6789, 1, 0.5, Number.MIN_VALUE, 0];

/** Any finite double, biased towards the edges. */
const anyNumber = fc.oneof(
  fc.constantFrom(...EDGES, ...EDGES.map((x) => -x), -0),
  fc.double({ noNaN: true, noDefaultInfinity: true }),
);
const atLeast = (min: number) =>
  fc.oneof(
    fc.constantFrom(...EDGES.filter((x) => x >= min && Number.isInteger(x))),
    fc.integer({ min, max: 2 ** 31 }),
    fc.double({ min: Math.max(min, 2 ** 53), noNaN: true, noDefaultInfinity: true }),
  );

const history = fc.record({ width: atLeast(1), metric: anyNumber, rows: atLeast(0) });
const curve = fc.record({ width: atLeast(1), restarts: atLeast(0), best: fc.option(anyNumber) });
const numericProfile = fc.record({ mean: anyNumber, std: anyNumber.map(Math.abs), min: anyNumber, max: anyNumber });

const cfg = config();
const seed = nextBaseline(
  null,
  { result: found(3, 0.96), loaded: loaded(), config: cfg },
  { date: new Date('2026-01-01T00:00:00.000Z'), commit: null, toolVersion: '0.1.0' },
);

/** A baseline as a user could write it: the seed with its numbers replaced, read back through the reader. */
function hostileBaseline(parts: {
  width: number;
  metric: number;
  rows: number;
  history: { width: number; metric: number; rows: number }[];
  widths: { width: number; restarts: number; best: number | null }[];
  rms: { mean: number; std: number; min: number; max: number };
}): Baseline {
  const b = structuredClone(seed);
  b.result.width = parts.width;
  b.result.metric.value = parts.metric;
  b.data.rows = parts.rows;
  b.history = parts.history.map((h) => ({ ...seed.history[0], ...h }));
  b.widths = parts.widths.map((w) => ({ ...w, met: 0, adequate: false }));
  b.data.profile.features['rms_velocity'] = { kind: 'numeric', ...parts.rms, missing: 0 };
  return parseBaseline(serializeBaseline(b), 'neuron-budget.baseline.json');
}

function nonFinite(value: unknown, path = 'report'): string[] {
  if (typeof value === 'number') return Number.isFinite(value) ? [] : [path];
  if (Array.isArray(value)) return value.flatMap((v, i) => nonFinite(v, `${path}[${i}]`));
  if (value && typeof value === 'object')
    return Object.entries(value).flatMap(([k, v]) => nonFinite(v, `${path}.${k}`));
  return [];
}

describe('renderers on extreme finite numbers', () => {
  it('render every baseline a user can write, with plain decimal chart numbers and a finite report', () => {
    fc.assert(
      fc.property(
        fc.record({
          width: atLeast(1),
          metric: anyNumber,
          rows: atLeast(0),
          history: fc.array(history, { minLength: 1, maxLength: 5 }),
          widths: fc.array(curve, { maxLength: 5 }),
          rms: numericProfile,
          current: fc.array(anyNumber, { minLength: 1, maxLength: 4 }),
        }),
        (parts) => {
          const baseline = hostileBaseline(parts);
          // This run's own curve: our numbers, but the renderers must not care where a number came from.
          const result = found(parts.current.length, 0.96);
          result.widths = result.widths.map((w, i) => widthSummary(w.width, 4, 10, parts.current[i]));
          const moved = profile();
          const outcome = evaluateGate({ result, loaded: loaded(moved, 'c'.repeat(64)), config: cfg, baseline });
          const report = withGate(dataReport(result, cfg, moved, 'c'.repeat(64)), outcome, cfg.gate);

          expect(nonFinite(report)).toEqual([]);
          const md = renderMarkdown(report);
          const text = renderText(report);
          for (const block of md.match(/```mermaid\n[\s\S]*?\n```/g) ?? []) {
            const axis = /^\s+y-axis ".*" (\S+) --> (\S+)$/m.exec(block);
            expect(axis, block).not.toBe(null);
            const numbers = [axis![1], axis![2]];
            for (const m of block.matchAll(/^\s+(?:line|bar) \[(.*)\]$/gm)) numbers.push(...m[1].split(', '));
            for (const n of numbers) expect(n).toMatch(/^-?\d+(\.\d+)?$/);
          }
          expect(md).not.toMatch(/NaN|Infinity/);
          expect(text).not.toMatch(/NaN|Infinity/);
        },
      ),
      { numRuns: 300 },
    );
  });
});
