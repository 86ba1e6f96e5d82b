import { mkdtempSync, readFileSync, readdirSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Ajv2020 from 'ajv/dist/2020.js';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  nextBaseline,
  parseBaseline,
  readBaseline,
  serializeBaseline,
  whyNotRecordable,
  writeBaseline,
} from '../../src/gate/baseline.js';
import { findJsonSyntaxProblem } from '../../src/common/json-position.js';
import { HISTORY_CAP, type Baseline } from '../../src/gate/types.js';
import { UserError } from '../../src/common/errors.js';
import { config, found, inconclusive, loaded, notFound, profile } from './build.js';

const schema = JSON.parse(readFileSync(new URL('../../schema/baseline.schema.json', import.meta.url), 'utf8'));
// ajv (a general-purpose JSON Schema validator) is the outside check of the file format.
const ajv = new Ajv2020.default({ allErrors: true, strict: true, allowUnionTypes: true });
const validate = ajv.compile(schema);

const meta = (day: number, commit: string | null = null) => ({
  date: new Date(Date.UTC(2026, 0, day, 9, 30)),
  commit,
  toolVersion: '0.1.0',
});

function sample(): Baseline {
  return nextBaseline(null, { result: found(5, 0.9625), loaded: loaded(), config: config() }, meta(1, 'abc1234'));
}

function tempDir(): string {
  return mkdtempSync(join(tmpdir(), 'nb-baseline-'));
}

function errorOf(fn: () => unknown): UserError {
  try {
    fn();
  } catch (e) {
    if (e instanceof UserError) return e;
    throw e;
  }
  throw new Error('expected a UserError');
}

describe('baseline file', () => {
  it('records the headline, the curve, the data and the settings fingerprint', () => {
    const b = sample();
    expect(b.schema).toBe('neuron-budget/baseline@2');
    expect(b.result.width).toBe(5);
    expect(b.result.metric).toEqual({ name: 'accuracy', value: 0.9625, threshold: 0.95 });
    expect(b.result.met).toBe(4);
    expect(b.result.restarts).toBe(10);
    expect(b.widths.map((w) => w.width)).toEqual([1, 2, 3, 4, 5]);
    expect(b.data.fingerprint).toBe('a'.repeat(64));
    expect(b.data.profile.rows).toBe(1800);
    expect(b.config.fingerprint).toMatch(/^[0-9a-f]{64}$/);
    expect(b.config.settings['search.restarts']).toBe(10);
    expect(b.config.settings).not.toHaveProperty('search.workers');
    expect(b.config.settings).not.toHaveProperty('search.time-budget');
    expect(b.history).toEqual([
      {
        width: 5,
        metric: 0.9625,
        rows: 1800,
        data: 'a'.repeat(64),
        commit: 'abc1234',
        date: '2026-01-01T09:30:00.000Z',
      },
    ]);
  });

  it('validates against the committed JSON Schema (checked with ajv)', () => {
    const b = sample();
    expect(validate(JSON.parse(serializeBaseline(b))), JSON.stringify(validate.errors)).toBe(true);
  });

  it('round-trips through write and read, atomically, leaving no temp file', async () => {
    const dir = tempDir();
    const path = join(dir, 'neuron-budget.baseline.json');
    const b = sample();
    await writeBaseline(path, b);
    expect(readdirSync(dir)).toEqual(['neuron-budget.baseline.json']);
    expect(await readBaseline(path)).toEqual(b);
  });

  it('reads a missing file as no baseline', async () => {
    expect(await readBaseline(join(tempDir(), 'absent.json'))).toBeNull();
  });

  it('refuses to record a search that failed or did not finish', () => {
    expect(whyNotRecordable(found(5, 0.96))).toBeNull();
    expect(whyNotRecordable(notFound(16))).toMatch(/no width reached the target/);
    expect(whyNotRecordable(inconclusive())).toMatch(/did not finish/);
    expect(() => nextBaseline(null, { result: notFound(16), loaded: loaded(), config: config() }, meta(1))).toThrow();
  });
});

describe('history', () => {
  it('ten successive baselines over growing data keep ten entries in order, newest last', () => {
    let b: Baseline | null = null;
    for (let k = 1; k <= 10; k++) {
      const rows = 1000 + 100 * k;
      const fp = k.toString(16).padStart(64, '0');
      const w = 3 + Math.floor(k / 4);
      b = nextBaseline(
        b,
        { result: found(w, 0.96), loaded: loaded(profile({ rows }), fp), config: config() },
        meta(k, `c0ffee${k}`),
      );
    }
    expect(b!.history).toHaveLength(10);
    expect(b!.history.map((h) => h.rows)).toEqual([1100, 1200, 1300, 1400, 1500, 1600, 1700, 1800, 1900, 2000]);
    expect(b!.history.map((h) => h.width)).toEqual([3, 3, 3, 4, 4, 4, 4, 5, 5, 5]);
    expect(b!.history.map((h) => h.commit)).toEqual(Array.from({ length: 10 }, (_, i) => `c0ffee${i + 1}`));
    expect(b!.history.map((h) => h.date.slice(0, 10))).toEqual(
      Array.from({ length: 10 }, (_, i) => `2026-01-${String(i + 1).padStart(2, '0')}`),
    );
    expect(b!.history.at(-1)!.data).toBe(b!.data.fingerprint);
    expect(validate(b), JSON.stringify(validate.errors)).toBe(true);
  });

  it(`is capped at ${HISTORY_CAP} entries, dropping the oldest`, () => {
    let b: Baseline | null = null;
    for (let k = 1; k <= HISTORY_CAP + 5; k++) {
      b = nextBaseline(b, { result: found(2, 0.96), loaded: loaded(profile({ rows: k })), config: config() }, meta(1));
    }
    expect(b!.history).toHaveLength(HISTORY_CAP);
    expect(b!.history[0].rows).toBe(6);
    expect(b!.history.at(-1)!.rows).toBe(HISTORY_CAP + 5);
    expect(validate(b), JSON.stringify(validate.errors)).toBe(true);
  });

  it('does not change the previous baseline object', () => {
    const first = sample();
    const copy = structuredClone(first);
    nextBaseline(first, { result: found(6, 0.97), loaded: loaded(), config: config() }, meta(2));
    expect(first).toEqual(copy);
  });
});

describe('reading a broken baseline', () => {
  const file = 'neuron-budget.baseline.json';

  it('names the file, line and column of a JSON syntax error', () => {
    const text = serializeBaseline(sample()).replace('"width": 5,', '"width": 5,,');
    const e = errorOf(() => parseBaseline(text, file));
    const line = text.split('\n').findIndex((l) => l.includes('"width": 5,,')) + 1;
    const column = text.split('\n')[line - 1].indexOf(',,') + 2;
    expect(e.message).toBe(
      `${file}:${line}:${column}: the baseline is not valid JSON: expected a key in double quotes, found ","`,
    );
    expect([e.file, e.line, e.column]).toEqual([file, line, column]);
  });

  it('reports a truncated file at its end', () => {
    const text = serializeBaseline(sample()).slice(0, 120);
    const e = errorOf(() => parseBaseline(text, file));
    expect(e.message).toMatch(
      /^neuron-budget\.baseline\.json:\d+:\d+: the baseline is not valid JSON: expected .*, found (the end of the file|a line break)/,
    );
  });

  it('says an empty file is empty', () => {
    expect(errorOf(() => parseBaseline('  \n', file)).message).toMatch(/the baseline file is empty/);
  });

  it('says a baseline from an older neuron-budget must be recorded again, and why', () => {
    const text = serializeBaseline(sample()).replace('neuron-budget/baseline@2', 'neuron-budget/baseline@1');
    expect(errorOf(() => parseBaseline(text, file)).message).toMatch(
      /^neuron-budget\.baseline\.json: schema: this baseline \(baseline@1\) was written by an older neuron-budget, which judged networks on the rows that also steered their training.*run `neuron-budget baseline`/,
    );
  });

  it('says a baseline from a newer neuron-budget needs a newer neuron-budget', () => {
    const text = serializeBaseline(sample()).replace('neuron-budget/baseline@2', 'neuron-budget/baseline@3');
    const e = errorOf(() => parseBaseline(text, file));
    expect(e.message).toMatch(
      /^neuron-budget\.baseline\.json: schema: this baseline was written by a newer neuron-budget \(baseline@3\)/,
    );
    expect(e.key).toBe('schema');
  });

  it('says a JSON file that is not a baseline is not one', () => {
    expect(errorOf(() => parseBaseline('{"name": "something else"}', file)).message).toBe(
      `${file}: schema: expected "neuron-budget/baseline@2", found nothing; this file is not a neuron-budget baseline`,
    );
    expect(errorOf(() => parseBaseline('[1, 2]', file)).message).toMatch(
      /expected a neuron-budget baseline \(a JSON object\), found a list/,
    );
  });

  const shapeCases: [string, (b: Record<string, any>) => void, string][] = [
    ['result.width', (b) => (b.result.width = 'five'), 'result.width: expected an integer of at least 1, found "five"'],
    ['result.width', (b) => (b.result.width = 0), 'result.width: expected an integer of at least 1, found 0'],
    [
      'result.metric.name',
      (b) => (b.result.metric.name = 'f1'),
      'result.metric.name: expected one of "accuracy", "rmse", "mae", "max-abs-error", found "f1"',
    ],
    [
      'history[0].date',
      (b) => (b.history[0].date = 'yesterday'),
      'history[0].date: expected an ISO 8601 UTC date-time',
    ],
    ['history', (b) => delete b.history, 'history: expected a list, found nothing (the key is missing)'],
    ['widths[2].met', (b) => (b.widths[2].met = -1), 'widths[2].met: expected an integer of at least 0, found -1'],
    [
      'data.fingerprint',
      (b) => (b.data.fingerprint = 'xyz'),
      'data.fingerprint: expected a sha256 fingerprint (64 hex digits), found "xyz"',
    ],
    [
      'data.profile.features.kurtosis.kind',
      (b) => (b.data.profile.features.kurtosis.kind = 'text'),
      'data.profile.features.kurtosis.kind: expected one of "numeric", "categorical", found "text"',
    ],
    [
      'result.extra',
      (b) => (b.result.extra = 1),
      'result.extra: expected no such key (allowed: width, metric, grownWidth, restarts, searchSeconds, met), found 1',
    ],
  ];

  it.each(shapeCases)('names the key %s of a wrong shape, and ajv rejects it too', (key, mutate, message) => {
    const b = JSON.parse(serializeBaseline(sample()));
    mutate(b);
    const e = errorOf(() => parseBaseline(JSON.stringify(b, null, 2), file));
    expect(e.message).toContain(`${file}: ${message}`);
    expect(e.key).toBe(key);
    expect(validate(b)).toBe(false);
  });

  it('gives readBaseline the same errors, naming the path as the user wrote it', async () => {
    const dir = tempDir();
    writeFileSync(join(dir, file), '{ "schema": ');
    await expect(readBaseline(join(dir, file), file)).rejects.toThrow(/^neuron-budget\.baseline\.json:1:13: /);
    await expect(readBaseline(dir, 'baselines/')).rejects.toThrow(
      'baselines/: expected a baseline file, found a folder',
    );
  });
});

describe('JSON syntax locator agrees with JSON.parse (the reference)', () => {
  it('on random JSON values and random corruptions of them', () => {
    fc.assert(
      fc.property(
        fc.json(),
        fc.nat(),
        fc.constantFrom('', ',', '}', ']', '"', ':', 'x', '\n', '0', '-', '.', 'e', '\\'),
        (json, at, insert) => {
          const pos = json.length === 0 ? 0 : at % (json.length + 1);
          const text = json.slice(0, pos) + insert + json.slice(pos);
          let parses = true;
          try {
            JSON.parse(text);
          } catch {
            parses = false;
          }
          expect(findJsonSyntaxProblem(text) === null).toBe(parses);
        },
      ),
      { numRuns: 3000, seed: 42 },
    );
  });
});

describe('writing guards', () => {
  it('never writes a baseline that would not read back (NaN in the profile), and leaves the old file', async () => {
    const dir = tempDir();
    const path = join(dir, 'neuron-budget.baseline.json');
    await writeBaseline(path, sample());
    const before = readFileSync(path, 'utf8');
    const broken = nextBaseline(
      null,
      {
        result: found(5, 0.96),
        loaded: loaded(
          profile({ features: { x: { kind: 'numeric', mean: Number.NaN, std: 0, min: 0, max: 0, missing: 0 } } }),
        ),
        config: config(),
      },
      meta(2),
    );
    await expect(writeBaseline(path, broken)).rejects.toThrow(
      /refusing to write a baseline.*data\.profile\.features\.x\.mean: expected a number, found null/,
    );
    expect(readFileSync(path, 'utf8')).toBe(before);
    expect(readdirSync(dir)).toEqual(['neuron-budget.baseline.json']);
  });

  it('stores a commit id as lower-case hex, and drops anything that is not one', () => {
    const b1 = nextBaseline(null, { result: found(5, 0.96), loaded: loaded(), config: config() }, meta(1, 'ABCDEF1'));
    const b2 = nextBaseline(null, { result: found(5, 0.96), loaded: loaded(), config: config() }, meta(1, 'HEAD'));
    expect(b1.history[0].commit).toBe('abcdef1');
    expect(b2.history[0].commit).toBeNull();
  });
});

describe('the hand validator and the JSON Schema agree (ajv as the reference)', () => {
  type Json = null | boolean | number | string | Json[] | { [k: string]: Json };
  /** Every path to a value inside a JSON document. */
  function paths(v: Json, at: (string | number)[] = []): (string | number)[][] {
    const out: (string | number)[][] = [at];
    if (Array.isArray(v)) v.forEach((c, i) => out.push(...paths(c, [...at, i])));
    else if (v !== null && typeof v === 'object')
      for (const [k, c] of Object.entries(v)) out.push(...paths(c, [...at, k]));
    return out;
  }

  it('on random replacements and deletions anywhere in a valid baseline', () => {
    const valid = JSON.parse(serializeBaseline(sample())) as Json;
    const all = paths(valid).filter((p) => p.length > 0);
    fc.assert(
      fc.property(
        fc.nat(all.length - 1),
        fc.option(
          fc.oneof(fc.constantFrom(-1, 0, 1, 2.5, 101, '', 'x', null, true, [], {}), fc.jsonValue({ maxDepth: 2 })),
          { nil: undefined },
        ),
        (i, replacement) => {
          const doc = structuredClone(valid) as Record<string | number, Json>;
          const path = all[i];
          let parent: Record<string | number, Json> = doc;
          for (const key of path.slice(0, -1)) parent = parent[key] as Record<string | number, Json>;
          const last = path[path.length - 1];
          if (replacement === undefined) {
            if (Array.isArray(parent)) parent.splice(Number(last), 1);
            else delete parent[last];
          } else parent[last] = replacement as Json;
          let ours = true;
          let message = '';
          try {
            parseBaseline(JSON.stringify(doc), 'b.json');
          } catch (e) {
            ours = false;
            message = (e as Error).message;
          }
          const schemaSays = validate(doc);
          expect(ours, `${path.join('.')} = ${JSON.stringify(replacement)}: ${message}`).toBe(schemaSays);
        },
      ),
      { numRuns: 3000, seed: 11 },
    );
  });
});
