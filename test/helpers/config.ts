/**
 * Validated configs for tests that need one without going through the loader (the loader
 * has its own tests). Values are the documented defaults unless a test overrides them.
 */
import type { Config, DataConfig, GateConfig, SearchConfig, TargetConfig } from '../../src/config/types.js';

export function searchSettings(over: Partial<SearchConfig> = {}): SearchConfig {
  return {
    minWidth: 1,
    maxWidth: 16,
    restarts: 10,
    required: 3,
    maxEpochs: 3000,
    seed: 1,
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
    ...over,
  };
}

export interface ConfigOverrides {
  data?: Partial<DataConfig>;
  target?: Partial<TargetConfig>;
  search?: Partial<SearchConfig>;
  gate?: Partial<GateConfig>;
}

/** A config rooted at `root` (absolute), its data file `data.path` given relative to it. */
export function testConfig(root: string, over: ConfigOverrides = {}): Config {
  const dataPath = over.data?.path ?? 'readings.csv';
  return {
    file: `${root}/neuron-budget.yml`,
    root,
    data: {
      target: 'condition',
      features: null,
      ignore: [],
      task: 'auto',
      validation: 0.25,
      delimiter: ',',
      maxCategories: 20,
      missing: 'error',
      ...over.data,
      path: `${root}/${dataPath}`,
      pathAsWritten: dataPath,
    },
    target: { metric: 'accuracy', threshold: 0.95, ...over.target },
    search: searchSettings(over.search),
    gate: {
      baseline: `${root}/neuron-budget.baseline.json`,
      baselineAsWritten: 'neuron-budget.baseline.json',
      maxWidth: null,
      allowedGrowth: 0,
      metricTolerance: 0.02,
      ...over.gate,
    },
  };
}
