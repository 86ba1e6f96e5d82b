/**
 * The growth phase as pure functions: the canonical task order, and the decision that
 * walks outcomes in (width, restart) order. Whatever ran beyond the decision point is
 * ignored, so the answer never depends on how many threads or machines produced the
 * outcomes, or in which order they arrived.
 */
import type { GrowthMode, TargetConfig } from '../config/types.js';
import type { NetworkJson, StopReason } from '../nn/index.js';
import type { TrainingOutcome, TrainingTask, WidthSummary } from './types.js';
import { isBetter } from '../common/metric.js';
import { wilsonInterval } from './wilson.js';

export interface GrowthPlan {
  growth: GrowthMode;
  minWidth: number;
  maxWidth: number;
  restarts: number;
  required: number;
  /** Cap on growth trainings; null = none. */
  maxTrainings: number | null;
}

/** The network's state at the end of its time at one width. */
export interface Segment {
  width: number;
  /** Epochs since the restart began (cumulative over widths for in-place growth). */
  epochs: number;
  metric: number;
  stop: StopReason;
}

/**
 * What one growth task produced. `width` is the task's width (the starting width for
 * in-place growth); `finalWidth` is the width of the network it ended with.
 */
export interface TaskResult extends TrainingOutcome {
  finalWidth: number;
  /** One entry per width the network passed through (one for fresh growth). */
  segments: Segment[];
  /** The trained network, kept when it reached the target (it may be pruned or become the witness). */
  network: NetworkJson | null;
  /** Why a diverged training failed; null otherwise. */
  reason: string | null;
}

export function taskKey(task: TrainingTask): string {
  return `${task.width}:${task.restart}`;
}

/** Every growth task in canonical order. In-place growth has one task per restart, starting at min-width. */
export function planTasks(plan: GrowthPlan): TrainingTask[] {
  const tasks: TrainingTask[] = [];
  if (plan.growth === 'in-place') {
    for (let i = 0; i < plan.restarts; i++) tasks.push({ width: plan.minWidth, restart: i });
    return tasks;
  }
  for (let w = plan.minWidth; w <= plan.maxWidth; w++) {
    for (let i = 0; i < plan.restarts; i++) tasks.push({ width: w, restart: i });
  }
  return tasks;
}

/** The task whose result says how restart `restart` fares at width `width`. */
export function taskFor(plan: GrowthPlan, width: number, restart: number): TrainingTask {
  return plan.growth === 'in-place' ? { width: plan.minWidth, restart } : { width, restart };
}

/** How restart i fares at width w, derived from its task's result. */
export interface RestartAtWidth {
  restart: number;
  reached: boolean;
  metric: number;
  epochs: number;
  stop: StopReason;
  reason: string | null;
}

/**
 * In-place growth maps onto widths like this: restart i counts as reaching the target
 * at width w when its network reached it at a width no larger than w (a network of
 * fewer neurons that reaches the target is also a width-w network: give the extra
 * neurons zero outgoing weights). Otherwise its metric and epochs at w are those at the
 * end of its time at w; a restart that diverged before w counts as a diverged failure.
 */
export function restartAtWidth(plan: GrowthPlan, result: TaskResult, width: number): RestartAtWidth {
  const restart = result.restart;
  if (plan.growth !== 'in-place') {
    return {
      restart,
      reached: result.reached,
      metric: result.metric,
      epochs: result.epochs,
      stop: result.stop,
      reason: result.reason,
    };
  }
  if (result.reached && result.finalWidth <= width) {
    return { restart, reached: true, metric: result.metric, epochs: result.epochs, stop: 'reached', reason: null };
  }
  const seg = result.segments.find((s) => s.width === width);
  if (seg !== undefined) {
    const diverged = seg.stop === 'diverged';
    return {
      restart,
      reached: false,
      metric: seg.metric,
      epochs: seg.epochs,
      stop: seg.stop,
      reason: diverged ? result.reason : null,
    };
  }
  return {
    restart,
    reached: false,
    metric: Number.NaN,
    epochs: result.epochs,
    stop: 'diverged',
    reason: result.reason,
  };
}

export type GrowthDecision =
  | {
      kind: 'need';
      /** The first task the decision is waiting for. */
      task: TrainingTask;
      /** The width being decided. */
      deciding: number;
      /** Widths decided so far. */
      widths: WidthSummary[];
      trainings: number;
    }
  | {
      kind: 'decided';
      /** Smallest adequate width, or null (none up to max-width, or the cap was hit). */
      adequateWidth: number | null;
      widths: WidthSummary[];
      /** Restarts run at the adequate width that reached the target, in restart order. */
      reachedAtAdequate: RestartAtWidth[];
      /** Growth trainings the decision used. */
      trainings: number;
      /** Set when the cap on trainings stopped the walk: the width and restarts it got to. */
      capHit: { width: number; restartsRun: number } | null;
    };

export type ResultLookup = (task: TrainingTask) => TaskResult | undefined;

/**
 * Walk widths upward and, at each width, restarts in index order, stopping a width as
 * soon as its answer is certain: `required` successes, or more than `restarts - required`
 * failures. Pure: the same outcomes give the same decision.
 */
export function decideGrowth(plan: GrowthPlan, target: TargetConfig, lookup: ResultLookup): GrowthDecision {
  const widths: WidthSummary[] = [];
  const used = new Set<string>();
  const allowedFailures = plan.restarts - plan.required;
  for (let w = plan.minWidth; w <= plan.maxWidth; w++) {
    const seen: RestartAtWidth[] = [];
    let successes = 0;
    let failures = 0;
    for (let i = 0; i < plan.restarts; i++) {
      if (successes >= plan.required || failures > allowedFailures) break;
      const task = taskFor(plan, w, i);
      const key = taskKey(task);
      if (!used.has(key) && plan.maxTrainings !== null && used.size >= plan.maxTrainings) {
        return {
          kind: 'decided',
          adequateWidth: null,
          widths,
          reachedAtAdequate: [],
          trainings: used.size,
          capHit: { width: w, restartsRun: seen.length },
        };
      }
      const result = lookup(task);
      if (result === undefined) return { kind: 'need', task, deciding: w, widths, trainings: used.size };
      used.add(key);
      const at = restartAtWidth(plan, result, w);
      seen.push(at);
      if (at.reached) successes++;
      else failures++;
    }
    const summary = summarizeWidth(w, seen, successes >= plan.required, target);
    widths.push(summary);
    if (summary.adequate) {
      return {
        kind: 'decided',
        adequateWidth: w,
        widths,
        reachedAtAdequate: seen.filter((s) => s.reached),
        trainings: used.size,
        capHit: null,
      };
    }
  }
  return { kind: 'decided', adequateWidth: null, widths, reachedAtAdequate: [], trainings: used.size, capHit: null };
}

/** @testOnly */
export function median(values: readonly number[]): number | null {
  if (values.length === 0) return null;
  const s = [...values].sort((a, b) => a - b);
  const mid = s.length >> 1;
  return s.length % 2 === 1 ? s[mid] : (s[mid - 1] + s[mid]) / 2;
}

export function summarizeWidth(
  width: number,
  seen: readonly RestartAtWidth[],
  adequate: boolean,
  target: TargetConfig,
): WidthSummary {
  const finite = seen.map((s) => s.metric).filter((m) => Number.isFinite(m));
  let best: number | null = null;
  for (const m of finite) if (best === null || isBetter(target.metric, m, best)) best = m;
  const reached = seen.filter((s) => s.reached).length;
  return {
    width,
    restarts: seen.length,
    reached,
    adequate,
    best,
    median: median(finite),
    wilson: wilsonInterval(reached, seen.length),
    medianEpochs: median(seen.map((s) => s.epochs)) ?? 0,
    diverged: seen.filter((s) => s.stop === 'diverged').length,
  };
}

/**
 * Merge growth results from anywhere (threads, processes, machines) into the decision.
 * Duplicates must agree; extra results past the decision point are ignored.
 */
export function mergeOutcomes(plan: GrowthPlan, target: TargetConfig, results: Iterable<TaskResult>): GrowthDecision {
  const byKey = new Map<string, TaskResult>();
  for (const r of results) {
    const key = taskKey(r);
    const seen = byKey.get(key);
    // Every task is a pure function of (data, settings, task): two copies that differ mean mixed inputs.
    if (seen !== undefined && JSON.stringify(seen) !== JSON.stringify(r)) {
      throw new Error(`two different results for the task at width ${r.width}, restart ${r.restart}`);
    }
    byKey.set(key, r);
  }
  return decideGrowth(plan, target, (t) => byKey.get(taskKey(t)));
}
