/**
 * One shard of a plan, run on this machine: every planned training, and the pruning of the
 * marked networks that met the target. Each is a pure function of (data, settings, task), so
 * what a shard computes is exactly what a one-machine search computes for the same tasks.
 * Work the time budget cut short is left out; `merge` runs it again.
 */
import type { SearchConfig, TargetConfig } from '../config/types.js';
import type { EncodedDataset } from '../data/types.js';
import { executorFor, searchContext, type SearchOptions } from './search.js';
import type { PruneResult } from './task.js';
import type { TaskResult, TrainingTask } from './types.js';

export interface ShardWork {
  tasks: readonly (TrainingTask & { prune: boolean })[];
}

export interface ShardOutcome {
  /** Finished trainings, in the order of `tasks`. */
  results: TaskResult[];
  /** Pruned networks, in the order of their tasks. */
  pruned: PruneResult[];
}

export async function runShard(
  data: EncodedDataset,
  search: SearchConfig,
  target: TargetConfig,
  work: ShardWork,
  options: SearchOptions = {},
): Promise<ShardOutcome> {
  const ctx = searchContext(search, target, options);
  const executor = executorFor(data, ctx, search, options);
  const progress = options.onProgress ?? (() => undefined);
  try {
    progress({ phase: 'growth', kind: 'start', width: work.tasks[0]?.width ?? 1, restart: 0, epoch: 0, best: null });
    const outcomes = await Promise.all(
      work.tasks.map(async (task) => {
        const result = await executor.train({ width: task.width, restart: task.restart });
        if (result !== null)
          progress({
            phase: 'growth',
            kind: 'done',
            width: result.finalWidth,
            restart: result.restart,
            epoch: result.epochs,
            best: null,
          });
        if (result === null || !task.prune || !result.met || result.network === null) return { result, pruned: null };
        const pruned = await executor.prune({
          source: { width: task.width, restart: task.restart },
          network: result.network,
        });
        progress({
          phase: 'prune',
          kind: 'done',
          width: task.width,
          restart: task.restart,
          epoch: pruned.steps.length,
          best: null,
        });
        return { result, pruned: pruned.interrupted ? null : pruned };
      }),
    );
    return {
      results: outcomes.flatMap((o) => (o.result === null ? [] : [o.result])),
      pruned: outcomes.flatMap((o) => (o.pruned === null ? [] : [o.pruned])),
    };
  } finally {
    await executor.close();
  }
}
