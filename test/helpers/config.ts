/**
 * Validated configs for tests that need one without going through the loader (the loader
 * has its own tests). Values are the documented defaults of src/config/spec.ts (the only key
 * list) unless a test overrides them.
 */
import { derivedJudging, sectionDefaults } from '../../src/config/keys.js';
import type { Config, DataConfig, GateConfig, SearchConfig, TargetConfig } from '../../src/config/types.js';

export function searchSettings(over: Partial<SearchConfig> = {}): SearchConfig {
  return { ...(sectionDefaults('search') as unknown as SearchConfig), ...over };
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
  const gate = sectionDefaults('gate') as unknown as GateConfig;
  const data = { ...(sectionDefaults('data') as unknown as DataConfig), target: 'condition', ...over.data };
  return {
    file: `${root}/neuron-budget.yml`,
    root,
    data: {
      ...data,
      judging: over.data?.judging ?? derivedJudging(data.validation),
      path: `${root}/${dataPath}`,
      pathAsWritten: dataPath,
    },
    target: { precision: 'float32', minRecall: null, metric: 'accuracy', threshold: 0.95, ...over.target },
    search: searchSettings(over.search),
    gate: {
      ...gate,
      baseline: `${root}/${String(gate.baseline)}`,
      baselineAsWritten: String(gate.baseline),
      ...over.gate,
    },
    positions: new Map(),
    metricGiven: true,
  };
}
