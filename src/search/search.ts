/**
 * The growth-and-prune search: find the smallest hidden width whose networks reach the
 * target, and hold a trained network (the witness) that proves it.
 */
import { availableParallelism } from 'node:os';
import { performance } from 'node:perf_hooks';
import type { SearchConfig, TargetConfig } from '../config/types.js';
import type { EncodedDataset } from '../data/types.js';
import type { TrainOptions } from '../nn/index.js';
import { inThreadExecutor, workerPoolExecutor } from './executor.js';
import type { Executor } from './executor.js';
import { targetShort } from '../common/format.js';
import { isBetter } from '../common/metric.js';
import { decideGrowth, planTasks, taskFor, taskKey } from './growth.js';
import type { GrowthDecision, GrowthPlan, TaskResult } from './growth.js';
import { DEFAULT_PRUNE_CANDIDATES, DEFAULT_STALL, pickWitness } from './task.js';
import type { PruneResult, SearchContext } from './task.js';
import type { ProgressEvent, SearchResult, WidthSummary } from './types.js';

export interface SearchOptions {
  /** Worker threads; null/undefined: search.workers, else the machine's available parallelism. */
  workers?: number | null;
  /**
   * File of the running bundle, started as a worker thread for a pool. Without it the
   * search runs in this thread (as it does from TypeScript source, where a worker cannot load .ts).
   */
  workerEntry?: string | null;
  onProgress?: (event: ProgressEvent) => void;
  /** Milliseconds clock, for the time budget and `timing` (tests may inject one). */
  now?: () => number;
  stall?: { window: number; threshold: number };
  pruneCandidates?: number;
}

export function growthPlan(search: SearchConfig): GrowthPlan {
  return {
    growth: search.growth,
    minWidth: search.minWidth,
    maxWidth: search.maxWidth,
    restarts: search.restarts,
    // A width is only adequate with a network to show for it: at least one restart must reach.
    required: Math.max(1, search.required),
    maxTrainings: search.maxTrainings,
  };
}

export function searchContext(search: SearchConfig, target: TargetConfig, options: SearchOptions = {}): SearchContext {
  const train: TrainOptions = {
    activation: search.activation,
    init: search.init,
    optimizer: search.optimizer,
    maxEpochs: search.maxEpochs,
    checkEvery: search.checkEvery,
    target: { ...target },
    stall: null,
  };
  return {
    seed: search.seed,
    plan: growthPlan(search),
    train,
    stall: { ...(options.stall ?? DEFAULT_STALL) },
    pruneEpochs: search.pruneEpochs,
    pruneCandidates: options.pruneCandidates ?? DEFAULT_PRUNE_CANDIDATES,
  };
}

export function workerCount(search: SearchConfig, options: SearchOptions): number {
  const n = options.workers ?? search.workers ?? availableParallelism();
  return Math.max(1, Math.floor(n));
}

function fmt(x: number | null): string {
  return x === null || !Number.isFinite(x) ? 'none' : String(Number(x.toPrecision(4)));
}

function span(from: number, to: number): string {
  return from === to ? `width ${from}` : `widths ${from}–${to}`;
}

function notFoundNote(plan: GrowthPlan, target: TargetConfig, widths: WidthSummary[]): string {
  const best = widths.map((w) => `${w.width}: ${fmt(w.best)}`).join(', ');
  return (
    `No width from ${plan.minWidth} to ${plan.maxWidth} had ${plan.required} of ${plan.restarts} restarts reach ` +
    `${targetShort(target.metric, target.threshold)}; best validation ${target.metric} per width: ${best}.`
  );
}

function stoppedNote(plan: GrowthPlan, why: string, atWidth: number, trainings: number): string {
  const below =
    atWidth > plan.minWidth
      ? `; ${span(plan.minWidth, atWidth - 1)} ${atWidth - 1 > plan.minWidth ? 'were' : 'was'} not adequate`
      : '';
  return `${why} while deciding width ${atWidth}, after ${trainings} trainings${below}.`;
}

/** Run the whole search. Outside `timing`, the result depends only on the data, the config and the code. */
export async function runSearch(
  data: EncodedDataset,
  search: SearchConfig,
  target: TargetConfig,
  options: SearchOptions = {},
): Promise<SearchResult> {
  const now = options.now ?? (() => performance.now());
  const t0 = now();
  const ctx = searchContext(search, target, options);
  const plan = ctx.plan;
  const size = workerCount(search, options);
  // A TypeScript source file cannot start as a worker: run in this thread then (tests from source).
  const entry = options.workerEntry != null && !/\.[cm]?ts$/.test(options.workerEntry) ? options.workerEntry : null;
  const executor: Executor =
    size > 1 && entry !== null ? workerPoolExecutor(data, ctx, size, entry) : inThreadExecutor(data, ctx);
  const deadline = search.timeBudget === null ? Number.POSITIVE_INFINITY : t0 + search.timeBudget * 1000;
  let bestSoFar: number | null = null;
  const progress = (e: ProgressEvent): void => options.onProgress?.(e);

  try {
    // Growth phase: keep every thread busy with tasks in canonical order from the first undecided one.
    const canon = planTasks(plan);
    const position = new Map(canon.map((t, k) => [taskKey(t), k]));
    const results = new Map<string, TaskResult>();
    const inflight = new Map<string, Promise<TaskResult>>();
    let decision: GrowthDecision;
    for (;;) {
      decision = decideGrowth(plan, target, (t) => results.get(taskKey(t)));
      // Tasks before the first undecided one that are still running can no longer matter.
      const frontier = decision.kind === 'need' ? (position.get(taskKey(decision.task)) ?? 0) : canon.length;
      for (const key of [...inflight.keys()]) {
        if ((position.get(key) ?? 0) < frontier) {
          const [w, i] = key.split(':').map(Number);
          executor.discard({ width: w, restart: i });
          inflight.delete(key);
        }
      }
      if (decision.kind === 'decided') break;
      if (now() >= deadline) break;
      for (let k = frontier; k < canon.length && inflight.size < executor.size; k++) {
        const key = taskKey(canon[k]);
        if (results.has(key) || inflight.has(key)) continue;
        inflight.set(key, executor.train(canon[k]));
      }
      const done = await Promise.race([...inflight.values()]);
      const key = taskKey(done);
      inflight.delete(key);
      results.set(key, done);
      if (Number.isFinite(done.metric) && (bestSoFar === null || isBetter(target.metric, done.metric, bestSoFar))) {
        bestSoFar = done.metric;
      }
      progress({ phase: 'growth', width: done.finalWidth, restart: done.restart, epoch: done.epochs, best: bestSoFar });
    }
    const growthEnd = now();
    const timing = (pruneEnd: number) => ({
      searchSeconds: (pruneEnd - t0) / 1000,
      growthSeconds: (growthEnd - t0) / 1000,
      pruneSeconds: (pruneEnd - growthEnd) / 1000,
    });

    if (decision.kind === 'need' || decision.capHit !== null || decision.adequateWidth === null) {
      let outcome: SearchResult['outcome'] = 'not-found';
      let note: string;
      if (decision.kind === 'need') {
        outcome = 'inconclusive';
        const why = `The time budget of ${search.timeBudget} s ran out`;
        note = stoppedNote(plan, why, decision.deciding, decision.trainings);
      } else if (decision.capHit !== null) {
        outcome = 'inconclusive';
        note = stoppedNote(
          plan,
          `The cap of ${search.maxTrainings} trainings was reached`,
          decision.capHit.width,
          decision.trainings,
        );
      } else {
        note = notFoundNote(plan, target, decision.widths);
      }
      return {
        outcome,
        width: null,
        grownWidth: null,
        metric: null,
        witness: null,
        widths: decision.widths,
        pruning: [],
        trainings: decision.trainings,
        note,
        timing: timing(now()),
      };
    }

    // Prune phase: shrink every network that reached the target at the adequate width.
    const grownWidth = decision.adequateWidth;
    const reachedTasks = decision.reachedAtAdequate.map((r) =>
      results.get(taskKey(taskFor(plan, grownWidth, r.restart)))!,
    );
    let pruned: PruneResult[];
    if (search.prune) {
      pruned = await Promise.all(
        reachedTasks.map(async (t) => {
          const r = await executor.prune({ task: { width: t.width, restart: t.restart }, network: t.network! });
          progress({ phase: 'prune', width: r.width, restart: r.restart, epoch: r.steps.length, best: r.metric });
          return r;
        }),
      );
    } else {
      pruned = reachedTasks.map((t) => ({
        restart: t.restart,
        grownWidth: t.finalWidth,
        width: t.finalWidth,
        metric: t.metric,
        network: t.network!,
        steps: [],
        trainings: 0,
      }));
    }
    const win = pickWitness(pruned)!;
    return {
      outcome: 'found',
      width: win.width,
      grownWidth,
      metric: win.metric,
      witness: {
        restart: win.restart,
        seed: search.seed,
        grownWidth: win.grownWidth,
        network: win.network,
        metric: win.metric,
      },
      widths: decision.widths,
      pruning: pruned.flatMap((r) => r.steps),
      trainings: decision.trainings + pruned.reduce((s, r) => s + r.trainings, 0),
      note: null,
      timing: timing(now()),
    };
  } finally {
    await executor.close();
  }
}
