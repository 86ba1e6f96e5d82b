/** The growth-and-prune search: public surface. */
export { runSearch, growthPlan, searchContext, workerCount } from './search.js';
export type { SearchOptions } from './search.js';
export { planTasks, decideGrowth, mergeOutcomes, restartAtWidth, taskKey } from './growth.js';
export type { GrowthDecision, RestartAtWidth } from './growth.js';
export { tally } from './tally.js';
export { runTask, runPruneJob, leastSalientFirst, DEFAULT_STALL, DEFAULT_PRUNE_CANDIDATES } from './task.js';
export type { SearchContext, PruneJob, PruneResult, ChainLink } from './task.js';
export { wilsonInterval } from './wilson.js';
export { runSearchWorker } from './worker.js';
export { shareDataset } from './executor.js';
export type * from './types.js';
