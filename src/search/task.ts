/**
 * One unit of work, runnable in any thread: a growth task (one seeded training, or one
 * network grown in place) or a prune job (shrinking one network that reached the target).
 * Everything here is a pure function of (data, context, task): no clocks, no shared state.
 */
import type { TargetConfig } from '../config/types.js';
import type { EncodedDataset } from '../data/types.js';
import { meetsThreshold } from '../common/metric.js';
import { rngFor } from '../common/random.js';
import { createTrainer, trainerFromNetwork } from '../nn/index.js';
import type { NetworkJson, Trainer, TrainOptions, TrainRecord } from '../nn/index.js';
import type { GrowthPlan, Segment, TaskResult } from './growth.js';
import type { PruneStep, TrainingTask } from './types.js';

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
}

/**
 * Dynamic Node Creation trigger (Ash 1989): window 100 epochs, relative slope 0.05.
 * Engineering choices inside the published range (window 25 and slope 0.1 in one
 * published description; checks every 100 updates with a 1% threshold in another).
 */
export const DEFAULT_STALL = { window: 100, threshold: 0.05 } as const;

/** Engineering choice: try the three least salient neurons before giving up a prune step. */
export const DEFAULT_PRUNE_CANDIDATES = 3;

function reachedBy(rec: TrainRecord, target: TargetConfig): boolean {
  if (rec.stop === 'diverged') return false;
  return rec.stop === 'reached' || meetsThreshold(rec.validationMetric, target);
}

const never = (): boolean => false;

function divergedReason(width: number, epochs: number): string {
  return `training diverged (a non-finite loss or weight) at width ${width} after ${epochs} epochs`;
}

/**
 * Run one growth task; the result is plain JSON (it can cross threads, processes, machines).
 * null only when `cancelled` said so (the answer was no longer needed).
 * In-place growth (Dynamic Node Creation) starts at the task's width and gives every
 * width up to max-epochs; a neuron is added when the error curve flattens (the stall
 * trigger) or that budget runs out, until the target is reached or max-width is hit.
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
  const options: TrainOptions = { ...train, stall: inPlace ? { ...ctx.stall } : null, interrupted: cancelled };
  const trainer = createTrainer(data, task.width, options, rng);
  const segments: Segment[] = [];
  let epochs = 0;
  for (;;) {
    const rec = trainer.run(train.maxEpochs);
    if (rec.stop === 'interrupted') return null;
    epochs += rec.epochs;
    const width = trainer.network.width;
    const reached = reachedBy(rec, train.target);
    segments.push({ width, epochs, metric: rec.validationMetric, stop: reached ? 'reached' : rec.stop });
    const done = reached || rec.stop === 'diverged' || !inPlace || width >= plan.maxWidth;
    if (done) {
      const diverged = rec.stop === 'diverged';
      return {
        width: task.width,
        restart: task.restart,
        reached,
        stop: reached ? 'reached' : rec.stop,
        epochs,
        metric: rec.validationMetric,
        finalWidth: width,
        segments,
        network: reached ? trainer.snapshot() : null,
        reason: diverged ? divergedReason(width, epochs) : null,
      };
    }
    // Stalled (or out of epochs at this width): add a neuron that leaves the function unchanged and keep training.
    trainer.addNeuron(rng);
  }
}

export interface PruneJob {
  /** The growth task whose network is pruned. */
  task: TrainingTask;
  /** That task's trained network. */
  network: NetworkJson;
}

export interface PruneResult {
  restart: number;
  /** Width of the network before pruning. */
  grownWidth: number;
  width: number;
  metric: number;
  network: NetworkJson;
  steps: PruneStep[];
  /** Retrainings run (one per removal tried). */
  trainings: number;
}

/**
 * Shrink one network by compensated ablation: score every hidden neuron by the loss
 * increase of removing it with its mean activation folded into the output biases,
 * remove the least salient, retrain for `pruneEpochs`, and keep the removal only if
 * the network still reaches the target; otherwise restore and try the next candidate.
 */
export function runPruneJob(data: EncodedDataset, ctx: SearchContext, job: PruneJob): PruneResult {
  const target = ctx.train.target;
  const retrain: TrainOptions = { ...ctx.train, stall: null };
  // Every restore starts from a snapshot with fresh optimiser state, so the result does not
  // depend on which thread ran the growth task.
  const fromSnapshot = (net: NetworkJson): Trainer =>
    trainerFromNetwork(data, net, retrain, rngFor(ctx.seed, job.task.width, job.task.restart));
  let trainer = fromSnapshot(job.network);
  let trainings = 0;

  const grownWidth = trainer.network.width;
  let metric = trainer.evaluate().validationMetric;
  let network = trainer.snapshot();
  const steps: PruneStep[] = [];
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
      trainings++;
      const after = rec.stop === 'diverged' ? Number.NaN : trainer.evaluate().validationMetric;
      const ok = Number.isFinite(after) && meetsThreshold(after, target);
      steps.push({ restart: job.task.restart, width, neuron: j, metricBefore: metric, metricAfter: after, kept: ok });
      if (ok) {
        metric = after;
        network = trainer.snapshot();
        removed = true;
        break;
      }
      dirty = true;
    }
    if (!removed) break;
  }
  return { restart: job.task.restart, grownWidth, width: network.width, metric, network, steps, trainings };
}

/** Neuron indices by ascending saliency; ties (and NaN) resolved by index so the order is total. */
export function leastSalientFirst(saliency: Float64Array): number[] {
  const idx = Array.from(saliency, (_, j) => j);
  const key = (j: number): number => (Number.isFinite(saliency[j]) ? saliency[j] : Number.POSITIVE_INFINITY);
  idx.sort((a, b) => key(a) - key(b) || a - b);
  return idx;
}

/** Smallest pruned network wins; ties go to the lowest restart index. */
export function pickWitness(results: readonly PruneResult[]): PruneResult | null {
  let best: PruneResult | null = null;
  for (const r of results) {
    if (best === null || r.width < best.width || (r.width === best.width && r.restart < best.restart)) best = r;
  }
  return best;
}
