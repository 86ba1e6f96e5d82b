/**
 * The gate: baseline file, comparison and data changes. `evaluateGate` is the one call
 * the job needs after the search; `nextBaseline`/`writeBaseline` record an accepted result.
 */
export { evaluateGate } from './evaluate.js';
export type { GateOutcome } from './evaluate.js';
export { compare } from './compare.js';
export type { Comparison, CompareInput } from './compare.js';
export { dataChanges, MEAN_SHIFT_IN_STD, RANGE_GROWTH_IN_STD } from './data-changes.js';
export {
  nextBaseline,
  parseBaseline,
  readBaseline,
  serializeBaseline,
  whyNotRecordable,
  writeBaseline,
} from './baseline.js';
export type { BaselineMeta, RunFacts } from './baseline.js';
export { resultSettings, settingsFingerprint, settingsDifferences } from './settings.js';
export * from './types.js';
export { runGateStage } from './stage.js';
export type { GateStageInput, GateStageResult } from './stage.js';
