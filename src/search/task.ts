/**
 * One unit of work, runnable in any thread: a growth task (one seeded training, or one
 * network grown in place) or a prune job (shrinking one network that met the target).
 * Everything here is a pure function of (data, context, task): no shared state, and the clock is
 * read only through `cancelled`, which can only end a task early (the caller then discards it).
 */
import { rngFor } from '../common/random.js';
import type { TargetConfig } from '../config/types.js';
import type { EncodedDataset } from '../data/types.js';
import { createTrainer, trainerFromNetwork } from '../nn/index.js';
import type { NetworkJson, Trainer, TrainOptions } from '../nn/index.js';
import { judge } from './judge.js';
import type { GrowthPlan, Judged, PruneStep, Segment, TaskResult, TrainingTask } from './types.js';

/** Everything a thread needs besides the data; plain JSON so it can be posted to a worker. */
export interface SearchContext {
  seed: number;
  plan: GrowthPlan;
  /** Options for fresh trainings and prune retraining (stall: null). */
  train: TrainOptions;
  /** Dynamic Node Creation trigger for in-place growth. */
  stall: { window: number; threshold: number };
  pruneEpochs: number;
  /** Least-salient neurons tried per prune step before pruning stops. */
  pruneCandidates: number;
  /** Wall-clock time (Date.now()) at which running work gives up; null: no time budget. */
  deadline: number | null;
}

/**
 * Dynamic Node Creation trigger (Ash 1989): window 100 epochs, relative slope 0.05.
 * Engineering choices inside the published range (window 25 and slope 0.1 in one
 * published description; checks every 100 updates with a 1% threshold in another).
 */
export const DEFAULT_STALL = { window: 100, threshold: 0.05 } as const;

/** Engineering choice: try the three least salient neurons before giving up a prune step. */
export const DEFAULT_PRUNE_CANDIDATES = 3;

const never = (): boolean => false;

function divergedReason(width: number, epochs: number): string {
  return `training diverged (a non-finite loss or weight) at width ${width} after ${epochs} epochs`;
}

/** Gives up when the caller says so or the search's time is up. */
function stopWhen(ctx: SearchContext, cancelled: () => boolean): () => boolean {
  const deadline = ctx.deadline;
  return deadline === null ? cancelled : () => cancelled() || Date.now() >= deadline;
}

/**
 * Run one growth task; the result is plain JSON (it can cross threads, processes, machines).
 * null only when `cancelled` (or the time budget) said to give up.
 * In-place growth (Dynamic Node Creation) starts at the task's width and gives every width up to
 * max-epochs; a neuron is added when the error curve flattens (the stall trigger) or that budget
 * runs out, until the target is met or max-width is hit.
 */
export function runTask(
  data: EncodedDataset,
  ctx: SearchContext,
  task: TrainingTask,
  cancelled: () => boolean = never,
): TaskResult | null {
  const { plan, train } = ctx;
  const inPlace = plan.growth === 'in-place';
  const rng = rngFor(ctx.seed, task.width, task.restart);
  const options: TrainOptions = {
    ...train,
    stall: inPlace ? { ...ctx.stall } : null,
    interrupted: stopWhen(ctx, cancelled),
  };
  const trainer = createTrainer(data, task.width, options, rng);
  const segments: Segment[] = [];
  let epochs = 0;
  for (;;) {
    const rec = trainer.run(train.maxEpochs);
    if (rec.stop === 'interrupted') return null;
    epochs += rec.epochs;
    const width = trainer.network.width;
    const network = rec.stop === 'diverged' ? null : trainer.snapshot();
    const judged = judge(data, network, rec, train.target);
    segments.push({ width, epochs, stop: rec.stop, ...judged });
    const done = judged.met || rec.stop === 'diverged' || !inPlace || width >= plan.maxWidth;
    if (done) {
      return {
        width: task.width,
        restart: task.restart,
        ...judged,
        stop: rec.stop,
        epochs,
        finalWidth: width,
        segments,
        network: judged.met ? network : null,
        reason: rec.stop === 'diverged' ? divergedReason(width, epochs) : null,
      };
    }
    // Out of patience or epochs at this width: add a neuron that leaves the function unchanged and keep training.
    trainer.addNeuron(rng);
  }
}

export interface PruneJob {
  /** The growth task whose network is pruned. */
  source: TrainingTask;
  /** That task's network, which met the target. */
  network: NetworkJson;
}

/** A network one removal smaller than the one before it in its chain, kept because the steering rows still met the target. */
export interface ChainLink extends Judged {
  width: number;
  network: NetworkJson;
}

export interface PruneResult {
  source: TrainingTask;
  /** The smaller networks, widest first. */
  chain: ChainLink[];
  steps: PruneStep[];
  /** Retrainings run (one per removal tried). */
  trainings: number;
  /** The time budget ran out before the chain ended. */
  interrupted: boolean;
}

/**
 * Shrink one network by compensated ablation: score every hidden neuron by the loss increase of
 * removing it with its mean activation folded into the output biases, remove the least salient,
 * retrain for at most `pruneEpochs`, and keep the removal only if the steering rows still meet the
 * target; otherwise restore and try the next candidate. Each kept network is judged on the judging
 * rows (that decides whether it counts for its width), but the judging rows never decide whether a
 * removal is kept.
 */
export function runPruneJob(
  data: EncodedDataset,
  ctx: SearchContext,
  job: PruneJob,
  cancelled: () => boolean = never,
): PruneResult {
  const target: TargetConfig = ctx.train.target;
  const retrain: TrainOptions = { ...ctx.train, stall: null, interrupted: stopWhen(ctx, cancelled) };
  // Every restore starts from a snapshot with fresh optimiser state, so the result does not
  // depend on which thread ran the growth task.
  const fromSnapshot = (net: NetworkJson): Trainer =>
    trainerFromNetwork(data, net, retrain, rngFor(ctx.seed, job.source.width, job.source.restart));
  let trainer = fromSnapshot(job.network);
  let steering = trainer.evaluate().steeringMetric;
  let network = job.network;
  const chain: ChainLink[] = [];
  const steps: PruneStep[] = [];
  let trainings = 0;
  while (trainer.network.width > 1) {
    const width = trainer.network.width;
    const order = leastSalientFirst(trainer.saliency());
    let removed = false;
    let dirty = false;
    for (const j of order.slice(0, ctx.pruneCandidates)) {
      // Restore lazily: after the last refused candidate nothing trains again, so no rebuild is needed.
      if (dirty) trainer = fromSnapshot(network);
      trainer.removeNeuron(j);
      const rec = trainer.run(ctx.pruneEpochs);
      if (rec.stop === 'interrupted') return { source: job.source, chain, steps, trainings, interrupted: true };
      trainings++;
      const smaller = rec.stop === 'diverged' ? null : trainer.snapshot();
      const judged = judge(data, smaller, rec, target);
      const accepted = smaller !== null && judged.reached;
      steps.push({
        source: job.source,
        width,
        neuron: j,
        steeringBefore: steering,
        steeringAfter: judged.steering,
        accepted,
        judged: accepted ? judged.judged : null,
      });
      if (accepted && smaller !== null) {
        steering = judged.steering;
        network = smaller;
        chain.push({ width: width - 1, network: smaller, ...judged });
        removed = true;
        break;
      }
      dirty = true;
    }
    if (!removed) break;
  }
  return { source: job.source, chain, steps, trainings, interrupted: false };
}

/** Neuron indices by ascending saliency; ties (and NaN) resolved by index so the order is total. */
export function leastSalientFirst(saliency: Float64Array): number[] {
  const idx = Array.from(saliency, (_, j) => j);
  const key = (j: number): number => (Number.isFinite(saliency[j]) ? saliency[j] : Number.POSITIVE_INFINITY);
  idx.sort((a, b) => key(a) - key(b) || a - b);
  return idx;
}
