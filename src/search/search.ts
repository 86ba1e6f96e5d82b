/**
 * The growth-and-prune search: find the smallest hidden width at which enough networks meet the
 * target (tally.ts has the one definition), and hold a trained network (the witness) that shows it.
 *
 * 1. Growth (growth.ts): fresh seeded restarts, width by width upward, until one width is
 *    adequate on fresh restarts alone.
 * 2. Prune (task.ts): every network that met the target at that width or below is shrunk one
 *    neuron at a time while the steering rows still meet the target; each smaller network that
 *    also meets it on the judging rows counts for its width.
 * 3. Tally: the smallest width with `required` networks that met the target is the answer.
 */
import { availableParallelism } from 'node:os';
import { performance } from 'node:perf_hooks';
import type { SearchConfig, TargetConfig } from '../config/types.js';
import type { EncodedDataset } from '../data/types.js';
import type { TrainOptions } from '../nn/index.js';
import { inThreadExecutor, workerPoolExecutor, type Executor } from './executor.js';
import { decideGrowth, planTasks, startWidth, taskKey, type GrowthDecision, type RestartAtWidth } from './growth.js';
import { appraise, judgingRowsOf } from './judge.js';
import { notFoundNotes, stoppedGrowingNote, stoppedPruningNote, walkReport } from './notes.js';
import type { StartChoice } from './start.js';
import { tally } from './tally.js';
import {
  DEFAULT_PRUNE_CANDIDATES,
  DEFAULT_STALL,
  type PruneJob,
  type PruneResult,
  type SearchContext,
} from './task.js';
import { secondsFromMs } from '../common/format.js';
import { isBetter } from '../common/metric.js';
import type { GrowthPlan, ProgressEvent, SearchResult, TaskResult } from './types.js';

export interface SearchOptions {
  /** Worker threads; null/undefined: search.workers, else the machine's available parallelism. */
  workers?: number | null;
  /**
   * File of the running bundle, started as a worker thread for a pool. Without it the
   * search runs in this thread (as it does from TypeScript source, where a worker cannot load .ts).
   */
  workerEntry?: string | null;
  onProgress?: (event: ProgressEvent) => void;
  /** Milliseconds clock for `timing` (tests may inject one). The time budget reads Date.now(). */
  now?: () => number;
  stall?: { window: number; threshold: number };
  pruneCandidates?: number;
  /** The data split asked for judging rows but folded them into the validation rows (small data). */
  judgingFolded?: boolean;
  /** Where the growth walk begins (search/start.ts); absent: at min-width. */
  start?: StartChoice;
  /** Outcomes computed elsewhere (a matrix's shards): used as they are, only the rest runs here. */
  known?: KnownOutcomes;
  /** Said when work the known outcomes did not cover runs here (merge logs it). */
  onLocalWork?: (what: string) => void;
}

/** Growth results and prune results computed elsewhere; each is a pure function of (data, settings, task). */
export interface KnownOutcomes {
  results: readonly TaskResult[];
  pruned: readonly PruneResult[];
}

export function growthPlan(search: SearchConfig, start: StartChoice | null = null): GrowthPlan {
  return {
    start: start !== null && start.from === 'baseline' ? start.width : null,
    growth: search.growth,
    minWidth: search.minWidth,
    maxWidth: search.maxWidth,
    restarts: search.restarts,
    // A width is only adequate with a network to show for it: at least one must meet the target.
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
    patience: search.patience,
    weightDecay: search.weightDecay,
    target: { ...target },
    stall: null,
  };
  return {
    seed: search.seed,
    plan: growthPlan(search, options.start ?? null),
    train,
    stall: { ...(options.stall ?? DEFAULT_STALL) },
    pruneEpochs: search.pruneEpochs,
    pruneCandidates: options.pruneCandidates ?? DEFAULT_PRUNE_CANDIDATES,
    deadline: search.timeBudget === null ? null : Date.now() + search.timeBudget * 1000,
  };
}

export function workerCount(search: SearchConfig, options: SearchOptions): number {
  const n = options.workers ?? search.workers ?? availableParallelism();
  return Math.max(1, Math.floor(n));
}

/** Resolves when the deadline passes (never without one); the timer does not keep the process alive. */
function timeUp(deadline: number | null): Promise<'time'> {
  if (deadline === null) return new Promise(() => undefined);
  return new Promise((resolve) => setTimeout(() => resolve('time'), Math.max(0, deadline - Date.now())).unref());
}

/**
 * Whether the walk from a start width can still visit `width`: once it has turned down (or up)
 * from the start, the widths on the other side are never needed, so no thread speculates on them.
 */
function stillVisitable(plan: GrowthPlan, decision: GrowthDecision, width: number): boolean {
  const start = startWidth(plan);
  if (start === null || decision.kind !== 'need' || decision.deciding === start) return true;
  return decision.deciding < start ? width <= start : width >= start;
}

/** The executor a search or a shard runs on: a pool of worker threads from a bundle, or this thread. */
export function executorFor(
  data: EncodedDataset,
  ctx: SearchContext,
  search: SearchConfig,
  options: SearchOptions,
): Executor {
  const size = workerCount(search, options);
  // A TypeScript source file cannot start as a worker: run in this thread then (tests from source).
  const entry = options.workerEntry != null && !/\.[cm]?ts$/.test(options.workerEntry) ? options.workerEntry : null;
  return size > 1 && entry !== null ? workerPoolExecutor(data, ctx, size, entry) : inThreadExecutor(data, ctx);
}

/** The growth phase: keeps every thread busy with tasks in canonical order from the first undecided one. */
async function grow(
  ctx: SearchContext,
  executor: Executor,
  target: TargetConfig,
  progress: (e: ProgressEvent) => void,
  known: readonly TaskResult[],
): Promise<{ decision: GrowthDecision; results: Map<string, TaskResult>; outOfTime: boolean }> {
  const plan = ctx.plan;
  const canon = planTasks(plan);
  const position = new Map(canon.map((t, k) => [taskKey(t), k]));
  const results = new Map<string, TaskResult>(known.map((r) => [taskKey(r), r]));
  const inflight = new Map<string, Promise<TaskResult | null>>();
  const clock = timeUp(ctx.deadline);
  let best: number | null = null;
  for (;;) {
    const decision = decideGrowth(plan, (t) => results.get(taskKey(t)));
    // Tasks before the first undecided one that are still running can no longer matter.
    const frontier = decision.kind === 'need' ? (position.get(taskKey(decision.task)) ?? 0) : canon.length;
    for (const key of [...inflight.keys()]) {
      if ((position.get(key) ?? 0) < frontier) {
        const [w, i] = key.split(':').map(Number);
        executor.discard({ width: w, restart: i });
        inflight.delete(key);
      }
    }
    if (decision.kind === 'decided') return { decision, results, outOfTime: false };
    if (ctx.deadline !== null && Date.now() >= ctx.deadline) return { decision, results, outOfTime: true };
    for (let k = frontier; k < canon.length && inflight.size < executor.size; k++) {
      const key = taskKey(canon[k]);
      if (results.has(key) || inflight.has(key) || !stillVisitable(plan, decision, canon[k].width)) continue;
      inflight.set(key, executor.train(canon[k]));
    }
    const keyed = [...inflight.entries()].map(([key, p]) => p.then((r) => ({ key, r })));
    const done = await Promise.race([...keyed, clock]);
    if (done === 'time') return { decision, results, outOfTime: true };
    inflight.delete(done.key);
    // A task handed back without a result gave up because the time ran out.
    if (done.r === null) return { decision, results, outOfTime: true };
    results.set(done.key, done.r);
    if (Number.isFinite(done.r.judged) && (best === null || isBetter(target.metric, done.r.judged, best)))
      best = done.r.judged;
    progress({
      phase: 'growth',
      kind: 'done',
      width: done.r.finalWidth,
      restart: done.r.restart,
      epoch: done.r.epochs,
      best,
    });
  }
}

/** Every network that met the target at the grown width or below, once each, in (width, restart) order. */
function pruneSources(tried: { width: number; restarts: RestartAtWidth[] }[], grownWidth: number | null): PruneJob[] {
  const jobs: PruneJob[] = [];
  const seen = new Set<string>();
  for (const { width, restarts } of tried) {
    if (grownWidth !== null && width > grownWidth) continue;
    for (const r of restarts) {
      const key = taskKey(r.task);
      if (!r.met || r.network === null || seen.has(key)) continue;
      seen.add(key);
      jobs.push({ source: r.task, network: r.network });
    }
  }
  return jobs;
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
  const executor = executorFor(data, ctx, search, options);
  const progress = (e: ProgressEvent): void => options.onProgress?.(e);
  const judging = judgingRowsOf(data, options.judgingFolded ?? false);
  const judgedOn = judging.on === 'judging' ? 'judged' : judging.on;
  const budgetWhy = `The time budget of ${search.timeBudget} s ran out`;

  try {
    const first = planTasks(plan)[0]?.width ?? plan.minWidth;
    progress({ phase: 'growth', kind: 'start', width: first, restart: 0, epoch: 0, best: null });
    const grown = await grow(ctx, executor, target, progress, options.known?.results ?? []);
    const growthEnd = now();
    if (options.known !== undefined) {
      const planned = new Set(options.known.results.map(taskKey));
      const here = grown.decision.tried
        .flatMap((t) => t.restarts.map((r) => r.task))
        .filter((t) => !planned.has(taskKey(t)));
      if (here.length > 0)
        options.onLocalWork?.(
          `${here.length} growth ${here.length === 1 ? 'training' : 'trainings'} the plan did not cover (widths ${[...new Set(here.map((t) => t.width))].join(', ')})`,
        );
    }
    const timing = (end: number) => ({
      searchSeconds: secondsFromMs(end - t0),
      growthSeconds: secondsFromMs(growthEnd - t0),
      pruneSeconds: secondsFromMs(end - growthEnd),
    });
    const start = walkReport(plan, options.start ?? null, grown.decision);
    const base = { grownWidth: null, metric: null, witness: null, appraisal: null, pruning: [], judging, start };

    const decision = grown.decision;
    if (decision.kind === 'need') {
      return {
        ...base,
        outcome: 'inconclusive',
        width: null,
        widths: tally(plan, target, decision.tried, [], ctx.seed).widths,
        trainings: decision.trainings,
        notes: [stoppedGrowingNote(plan, budgetWhy, decision.deciding, decision.trainings, decision.tried)],
        timing: timing(now()),
      };
    }
    if (decision.capHit !== null) {
      const why = `The cap of ${search.maxTrainings} trainings was reached`;
      return {
        ...base,
        outcome: 'inconclusive',
        width: null,
        widths: tally(plan, target, decision.tried, [], ctx.seed).widths,
        trainings: decision.trainings,
        notes: [stoppedGrowingNote(plan, why, decision.capHit.width, decision.trainings, decision.tried)],
        timing: timing(now()),
      };
    }

    // Prune phase: shrink every network that met the target at the grown width or below.
    const jobs = search.prune ? pruneSources(decision.tried, decision.grownWidth) : [];
    if (jobs.length > 0) {
      const from = Math.max(...jobs.map((j) => j.source.width));
      progress({ phase: 'prune', kind: 'start', width: from, restart: 0, epoch: 0, best: null });
    }
    const prunedElsewhere = new Map((options.known?.pruned ?? []).map((r) => [taskKey(r.source), r]));
    const pruned: PruneResult[] = await Promise.all(
      jobs.map(async (job) => {
        const ready = prunedElsewhere.get(taskKey(job.source));
        if (ready !== undefined && !ready.interrupted) return ready;
        if (options.known !== undefined)
          options.onLocalWork?.(`pruning the network of width ${job.source.width}, restart ${job.source.restart + 1}`);
        const r = await executor.prune(job);
        const last = r.chain.length > 0 ? r.chain[r.chain.length - 1].width : job.source.width;
        progress({
          phase: 'prune',
          kind: 'done',
          width: last,
          restart: job.source.restart,
          epoch: r.steps.length,
          best: null,
        });
        return r;
      }),
    );
    const trainings = decision.trainings + pruned.reduce((s, r) => s + r.trainings, 0);
    const t = tally(plan, target, decision.tried, pruned, ctx.seed);
    const steps = pruned.flatMap((r) => r.steps);
    if (pruned.some((r) => r.interrupted) && decision.grownWidth !== null) {
      return {
        ...base,
        outcome: 'inconclusive',
        grownWidth: decision.grownWidth,
        width: null,
        witness: t.witness,
        appraisal: t.witness === null ? null : appraise(data, t.witness.network, target, true),
        widths: t.widths,
        pruning: steps,
        trainings,
        notes: [stoppedPruningNote(budgetWhy, decision.grownWidth, trainings)],
        timing: timing(now()),
      };
    }
    const found = t.width !== null && t.witness !== null;
    return {
      outcome: found ? 'found' : 'not-found',
      width: found ? t.width : null,
      grownWidth: decision.grownWidth,
      metric: found ? t.witness!.judged : null,
      witness: t.witness,
      appraisal: t.witness === null ? null : appraise(data, t.witness.network, target, true),
      widths: t.widths,
      pruning: steps,
      trainings,
      notes: found ? [] : notFoundNotes(plan, target, t.widths, judgedOn),
      judging,
      start,
      timing: timing(now()),
    };
  } finally {
    await executor.close();
  }
}
