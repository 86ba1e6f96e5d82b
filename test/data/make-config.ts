/** A validated Config for data tests, built directly (the config loader has its own tests). */
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Config, DataConfig } from '../../src/config/types.js';

export function tempDir(): string {
  return mkdtempSync(join(tmpdir(), 'nb-data-'));
}

export function makeConfig(root: string, data: Partial<DataConfig> & { path: string; target: string }, seed = 1): Config {
  return {
    file: join(root, 'neuron-budget.yml'),
    root,
    data: {
      pathAsWritten: data.path,
      features: null,
      ignore: [],
      task: 'auto',
      validation: 0.25,
      delimiter: ',',
      maxCategories: 20,
      missing: 'error',
      ...data,
      path: join(root, data.path),
    },
    target: { metric: 'accuracy', threshold: 0.95 },
    search: {
      minWidth: 1,
      maxWidth: 16,
      restarts: 10,
      required: 3,
      maxEpochs: 3000,
      seed,
      growth: 'fresh',
      activation: 'tanh',
      optimizer: 'irprop+',
      init: null,
      checkEvery: 10,
      pruneEpochs: 200,
      prune: true,
      timeBudget: null,
      maxTrainings: null,
      workers: null,
    },
    gate: {
      baseline: join(root, 'neuron-budget.baseline.json'),
      baselineAsWritten: 'neuron-budget.baseline.json',
      maxWidth: null,
      allowedGrowth: 0,
      metricTolerance: 0.02,
    },
  };
}

/** Writes `text` (or bytes) as `name` in `root` and returns a config that loads it. */
export function withFile(
  root: string,
  name: string,
  content: string | Uint8Array,
  data: Partial<DataConfig> & { target: string },
  seed = 1,
): Config {
  writeFileSync(join(root, name), content);
  return makeConfig(root, { ...data, path: name }, seed);
}
