/**
 * Property-based checks with fast-check: well-formed tables survive write-CSV → load →
 * decode, and malformed input only ever ends in a UserError that names the file.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { loadData } from '../../src/data/index.js';
import { UserError } from '../../src/common/errors.js';
import { tempDir, withFile } from './make-config.js';

interface Table {
  delimiter: string;
  eol: string;
  bom: boolean;
  numeric: number[][]; // per numeric column, one value per row
  categorical: string[][]; // per categorical column
  labels: string[]; // target per row
  regression: number[] | null;
  validation: number;
}

const DELIMITERS = [',', ';', '\t', '|'];

function quote(value: string, delimiter: string): string {
  const needs = value.includes(delimiter) || /["\r\n]/.test(value) || value.trim() !== value;
  return needs ? `"${value.replace(/"/g, '""')}"` : value;
}

function writeCsv(t: Table): { text: string; header: string[] } {
  const header = [...t.numeric.map((_, i) => `num ${i}`), ...t.categorical.map((_, i) => `cat,${i}`), 'target'];
  const lines = [header.map((h) => quote(h, t.delimiter)).join(t.delimiter)];
  for (let r = 0; r < t.labels.length; r++) {
    const cells = [
      ...t.numeric.map((c) => String(c[r])),
      ...t.categorical.map((c) => quote(c[r], t.delimiter)),
      t.regression === null ? quote(t.labels[r], t.delimiter) : String(t.regression[r]),
    ];
    lines.push(cells.join(t.delimiter));
  }
  return { text: (t.bom ? '\uFEFF' : '') + lines.join(t.eol) + t.eol, header };
}

// Category text: starts with a letter (so it never reads as a number) and may hold
// delimiters, quotes, line breaks, spaces and non-ASCII letters.
const category = fc
  .tuple(
    fc.constantFrom('k', 'Z', 'é', '東'),
    fc.string({
      unit: fc.constantFrom('a', 'b', ' ', ',', ';', '"', '\n', '\r\n', '\t', '|', 'ß', '🙂'),
      maxLength: 6,
    }),
  )
  .map(([a, b]) => (a + b).trimEnd());

const number = fc.oneof(
  fc.double({ min: -1e9, max: 1e9, noNaN: true, noDefaultInfinity: true }),
  fc.integer({ min: -1000, max: 1000 }),
  fc.double({ min: -1e-6, max: 1e-6, noNaN: true }),
);

const table: fc.Arbitrary<Table> = fc
  .record({
    rows: fc.integer({ min: 6, max: 40 }),
    numericColumns: fc.integer({ min: 0, max: 3 }),
    categoricalColumns: fc.integer({ min: 0, max: 2 }),
    classes: fc.uniqueArray(category, { minLength: 2, maxLength: 3 }),
    regression: fc.boolean(),
    delimiter: fc.constantFrom(...DELIMITERS),
    eol: fc.constantFrom('\n', '\r\n'),
    bom: fc.boolean(),
    validation: fc.constantFrom(0, 0.2, 0.34),
    seed: fc.integer({ min: 0, max: 1 << 30 }),
  })
  .filter((s) => s.numericColumns + s.categoricalColumns > 0)
  .chain((s) =>
    fc.record({
      numeric: fc.array(fc.array(number, { minLength: s.rows, maxLength: s.rows }), {
        minLength: s.numericColumns,
        maxLength: s.numericColumns,
      }),
      categorical: fc.array(
        fc
          .uniqueArray(category, { minLength: 1, maxLength: 4 })
          .chain((pool) => fc.array(fc.constantFrom(...pool), { minLength: s.rows, maxLength: s.rows })),
        { minLength: s.categoricalColumns, maxLength: s.categoricalColumns },
      ),
      // Regression targets: distinct values, so `task: regression` is a real choice.
      regressionValues: fc.uniqueArray(fc.integer({ min: -5000, max: 5000 }), { minLength: s.rows, maxLength: s.rows }),
      settings: fc.constant(s),
    }),
  )
  .map(({ numeric, categorical, regressionValues, settings: s }) => ({
    delimiter: s.delimiter,
    eol: s.eol,
    bom: s.bom,
    numeric,
    categorical,
    // Cycle through the classes so each has at least two rows.
    labels: Array.from({ length: s.rows }, (_, r) => s.classes[r % s.classes.length]),
    regression: s.regression ? regressionValues.map((v) => v / 8) : null,
    validation: s.validation,
  }));

describe('round trip', () => {
  it('write CSV → load → decode gives back every row', async () => {
    await fc.assert(
      fc.asyncProperty(table, async (t) => {
        const { text } = writeCsv(t);
        const config = withFile(tempDir(), 't.csv', text, {
          target: 'target',
          delimiter: t.delimiter,
          validation: t.validation,
          task: t.regression === null ? 'classification' : 'regression',
        });
        const data = await loadData(config);
        const d = data.dataset;
        expect(data.rows).toBe(t.labels.length);
        const split = data.splitRows;
        if (split === undefined) throw new Error('splitRows missing');
        const parts = [
          { x: d.xTrain, y: d.yTrain, rows: split.train },
          { x: d.xValidation, y: d.yValidation, rows: split.validation },
          { x: d.xJudging, y: d.yJudging, rows: split.judging },
        ];
        let seen = 0;
        for (const part of parts) {
          part.rows.forEach((row, i) => {
            seen++;
            let offset = 0;
            let n = 0;
            let c = 0;
            for (const e of d.encoding.features) {
              if (e.kind === 'numeric') {
                const original = t.numeric[n++][row];
                const back = part.x[i * d.inputs + offset] * e.std + e.mean;
                // Standardising and undoing it rounds at most a few ulps of the column's scale.
                const scale = Math.max(Math.abs(e.mean), e.std, Math.abs(original), 1e-300);
                expect(Math.abs(back - original)).toBeLessThanOrEqual(scale * 1e-12);
                offset += 1;
              } else {
                const hot = Array.from(
                  part.x.subarray(i * d.inputs + offset, i * d.inputs + offset + e.categories.length),
                );
                expect(hot.filter((v) => v === 1).length).toBe(1);
                expect(hot.filter((v) => v !== 0 && v !== 1).length).toBe(0);
                expect(e.categories[hot.indexOf(1)]).toBe(t.categorical[c++][row]);
                offset += e.categories.length;
              }
            }
            const target = d.encoding.target;
            if (t.regression === null) {
              expect(target.classes?.[part.y[i]]).toBe(t.labels[row]);
            } else {
              expect(part.y[i] * target.std + target.mean).toBeCloseTo(t.regression[row], 9);
            }
          });
        }
        expect(seen).toBe(t.labels.length);
      }),
      { numRuns: 150, seed: 20261201 },
    );
  });
});

const GOOD = 'a,b,y\n1,x,p\n2,y,q\n3,x,p\n4,y,q\n5,x,p\n6,y,q\n';

const malformed = fc.oneof(
  // Random text from CSV-significant characters.
  fc.string({
    unit: fc.constantFrom('a', '1', '.', ',', '"', '\n', '\r', ' ', '\0', 'e', '-', 'NaN', 'y'),
    maxLength: 80,
  }),
  // Random bytes.
  fc.uint8Array({ maxLength: 120 }).map((b) => Buffer.from(b)),
  // A valid file with a few characters inserted or removed.
  fc
    .array(
      fc.record({
        at: fc.nat({ max: GOOD.length }),
        insert: fc.constantFrom('', '"', ',', '\n', 'x', '\0', '\r', 'Infinity', '1e999'),
        remove: fc.nat({ max: 3 }),
      }),
      { minLength: 1, maxLength: 4 },
    )
    .map((edits) => {
      let s = GOOD;
      for (const e of edits) s = s.slice(0, e.at) + e.insert + s.slice(e.at + e.remove);
      return s;
    }),
  // Valid UTF-8 bytes with one invalid byte spliced in.
  fc
    .record({ at: fc.nat({ max: GOOD.length }), byte: fc.integer({ min: 0x80, max: 0xff }) })
    .map(({ at, byte }) =>
      Buffer.concat([Buffer.from(GOOD.slice(0, at)), Buffer.from([byte]), Buffer.from(GOOD.slice(at))]),
    ),
);

describe('malformed input', () => {
  it('either loads or fails with a UserError naming the file and a line', async () => {
    await fc.assert(
      fc.asyncProperty(malformed, fc.constantFrom('error', 'drop'), async (content, missing) => {
        const config = withFile(tempDir(), 'bad.csv', content, {
          target: 'y',
          validation: 0.25,
          missing: missing,
        });
        try {
          const data = await loadData(config);
          expect(data.rows).toBeGreaterThan(0);
        } catch (e) {
          if (!(e instanceof UserError)) throw e;
          if (e.key === undefined) {
            // A problem in the file: named with its line (and column where there is one).
            expect(e.message).toMatch(/^bad\.csv:\d+(:\d+)?: \S/);
            expect(e.line).toBeGreaterThanOrEqual(1);
            expect(e.file).toBe(config.data.path);
          } else {
            // A column the config names but the header lacks: the fix is in the config.
            expect(e.key).toMatch(/^data\.(target|features|ignore)$/);
            expect(e.message).toContain(`${e.key}: expected a column of bad.csv`);
          }
        }
      }),
      { numRuns: 400, seed: 7 },
    );
  });
});
