/** The comparison and data changes for one run against the baseline (pure). */
import type { Config } from '../config/types.js';
import type { LoadedData } from '../data/types.js';
import type { DeviceCost } from '../device/index.js';
import type { SearchResult } from '../search/types.js';
import { compare, type Comparison } from './compare.js';
import { dataChanges } from './data-changes.js';
import { resultSettings } from './settings.js';
import type { Baseline, DataChanges } from './types.js';

export interface GateOutcome extends Comparison {
  /** null without a baseline. */
  changes: DataChanges | null;
  baseline: Baseline | null;
}

export function evaluateGate(input: {
  result: SearchResult;
  loaded: Pick<LoadedData, 'fingerprint' | 'profile'>;
  config: Config;
  baseline: Baseline | null;
  /** What the witness costs on the device; null without a witness. */
  cost?: DeviceCost | null;
}): GateOutcome {
  const { result, loaded, config, baseline } = input;
  const cost = input.cost ?? null;
  const comparison = compare({
    result,
    target: config.target,
    search: { minWidth: config.search.minWidth, maxWidth: config.search.maxWidth, required: config.search.required },
    gate: config.gate,
    baseline,
    settings: resultSettings(config),
    device: cost === null ? null : { cost, precision: config.target.precision ?? 'float32' },
  });
  const changes = baseline
    ? dataChanges(
        baseline.data.profile,
        loaded.profile,
        { before: baseline.data.fingerprint, after: loaded.fingerprint },
        { before: baseline.data.file, after: config.data.pathAsWritten.replace(/\\/g, '/') },
      )
    : null;
  return { ...comparison, changes, baseline };
}
