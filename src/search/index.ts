/** The growth-and-prune search: public surface. */
export { runSearch, growthPlan, searchContext, workerCount } from './search.js';
export type { SearchOptions } from './search.js';
export { planTasks, decideGrowth, mergeOutcomes, restartAtWidth, summarizeWidth, taskKey } from './growth.js';
export type { GrowthPlan, GrowthDecision, TaskResult, Segment } from './growth.js';
export {
  runTask,
  runPruneJob,
  pickWitness,
  leastSalientFirst,
  DEFAULT_STALL,
  DEFAULT_PRUNE_CANDIDATES,
} from './task.js';
export type { SearchContext, PruneJob, PruneResult } from './task.js';
export { wilsonInterval } from './wilson.js';
export { runSearchWorker } from './worker.js';
export { shareDataset } from './executor.js';
export type * from './types.js';
