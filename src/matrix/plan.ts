/**
 * A search as a plan of independent tasks for a job matrix: which (width, restart) trainings
 * each shard runs, balanced by their expected cost, and which of their networks a shard prunes
 * when they meet the target. The plan is a pure function of the data, the result-changing
 * settings, the start (a matching baseline) and the shard count, and its id is the hash of all
 * of them, so `merge` can rebuild it and tell whether every part belongs to it.
 *
 * Which tasks: from a baseline's width S, the two widths the common answer needs (S and S − 1,
 * every restart); from min-width, every width up to max-width. Whatever the decision needs
 * beyond the plan, `merge` runs itself, so a plan that guessed short costs time, never the answer.
 * Which networks are pruned on the shards: those on the path a one-machine search takes when
 * the answer has not moved (S's first `required` restarts, S − 1's first restarts − required + 1);
 * `merge` prunes any other network the answer needs.
 */
import { createHash } from 'node:crypto';
import { planTasks, startWidth, taskKey } from '../search/growth.js';
import type { GrowthPlan, TrainingTask } from '../search/types.js';

export const PLAN_SCHEMA = 'neuron-budget/plan@1';
/** A matrix has at most 256 jobs per workflow run. */
export const MAX_SHARDS = 256;

export interface PlannedTask extends TrainingTask {
  /** Prune the network here when it meets the target. */
  prune: boolean;
}

export interface Shard {
  index: number;
  /** Estimated multiply-adds of its trainings (forward and backward passes), for balancing only. */
  estimatedMacs: number;
  /** In canonical order. */
  tasks: PlannedTask[];
}

export interface PlanIdentity {
  toolVersion: string;
  /** sha256 of the data as used (src/data/fingerprint.ts). */
  data: string;
  rows: number;
  /** sha256 of the result-changing settings (src/gate/settings.ts). */
  settings: string;
}

export interface PlanDocument {
  schema: typeof PLAN_SCHEMA;
  tool: { name: 'neuron-budget'; version: string };
  /** sha256 of everything below: two plans with one id hold the same tasks for the same question. */
  id: string;
  data: { fingerprint: string; rows: number };
  settings: { fingerprint: string };
  start: { from: 'baseline' | 'min-width'; width: number };
  shards: Shard[];
}

/** What one training costs, roughly: rows × epochs × the network's weights, three passes (forward, two backward). */
export interface CostModel {
  trainRows: number;
  inputs: number;
  outputs: number;
  maxEpochs: number;
  pruneEpochs: number;
  /** Least-salient neurons tried per prune step. */
  pruneCandidates: number;
}

function taskMacs(m: CostModel, task: PlannedTask): number {
  const weights = (w: number): number => w * (m.inputs + m.outputs + 1) + m.outputs;
  const training = 3 * m.trainRows * m.maxEpochs * weights(task.width);
  // A prune chain usually ends after one refused step: pruneCandidates retrainings one neuron smaller.
  const pruning =
    task.prune && task.width > 1 ? 3 * m.trainRows * m.pruneEpochs * m.pruneCandidates * weights(task.width - 1) : 0;
  return training + pruning;
}

/** The tasks the plan covers, in canonical order, with the ones pruned on the shards marked. @testOnly */
export function plannedTasks(plan: GrowthPlan): PlannedTask[] {
  const start = startWidth(plan);
  if (start === null) return planTasks(plan).map((t) => ({ ...t, prune: false }));
  const onPath = (t: TrainingTask): boolean =>
    t.width === start ? t.restart < plan.required : t.restart <= plan.restarts - plan.required;
  return planTasks(plan)
    .filter((t) => t.width === start || t.width === start - 1)
    .map((t) => ({ ...t, prune: onPath(t) }));
}

/**
 * Split the tasks over `shards` shards (fewer when there are fewer tasks) by longest expected
 * cost first onto the least loaded shard; ties go to the earlier task and the lower shard, so the
 * plan is the same on every machine.
 */
export function makePlan(plan: GrowthPlan, shards: number, identity: PlanIdentity, cost: CostModel): PlanDocument {
  const tasks = plannedTasks(plan);
  const count = Math.max(1, Math.min(shards, tasks.length));
  const position = new Map(tasks.map((t, k) => [taskKey(t), k]));
  const byCost = tasks
    .map((t) => ({ t, macs: taskMacs(cost, t) }))
    .sort((a, b) => b.macs - a.macs || position.get(taskKey(a.t))! - position.get(taskKey(b.t))!);
  const out: Shard[] = Array.from({ length: count }, (_, index) => ({ index, estimatedMacs: 0, tasks: [] }));
  for (const { t, macs } of byCost) {
    let least = out[0];
    for (const s of out) if (s.estimatedMacs < least.estimatedMacs) least = s;
    least.tasks.push(t);
    least.estimatedMacs += macs;
  }
  for (const s of out) s.tasks.sort((a, b) => position.get(taskKey(a))! - position.get(taskKey(b))!);
  const start = startWidth(plan);
  const body: Omit<PlanDocument, 'id'> = {
    schema: PLAN_SCHEMA,
    tool: { name: 'neuron-budget' as const, version: identity.toolVersion },
    data: { fingerprint: identity.data, rows: identity.rows },
    settings: { fingerprint: identity.settings },
    start:
      start === null
        ? { from: 'min-width' as const, width: plan.minWidth }
        : { from: 'baseline' as const, width: start },
    shards: out,
  };
  return { ...body, id: planId(body) };
}

function planId(body: Omit<PlanDocument, 'id'>): string {
  return createHash('sha256').update(JSON.stringify(body), 'utf8').digest('hex');
}
