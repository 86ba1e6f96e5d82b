/**
 * The growth phase as pure functions: the canonical task order, and the decision that walks
 * outcomes in (width, restart) order. Whatever ran beyond the decision point is ignored, so the
 * answer never depends on how many threads or machines produced the outcomes, or in which order
 * they arrived.
 *
 * Growth walks widths upward and, at each width, restarts in index order, until `required` fresh
 * restarts of one width met the target (then that width is adequate on fresh networks alone, and
 * no wider width can be the answer) or max-width is passed. A width stops early once its answer by
 * fresh restarts is certain: `required` of them met, or more than `restarts − required` did not.
 * Networks that met at narrower widths are kept: pruning may still make those widths adequate.
 */
import type { NetworkJson, StopReason } from '../nn/index.js';
import type { GrowthPlan, Judged, TaskResult, TrainingTask } from './types.js';

export function taskKey(task: TrainingTask): string {
  return `${task.width}:${task.restart}`;
}

/**
 * The widths in the order a walk can visit them. From min-width: upward. From a start width S
 * (fresh growth only): S, S−1, S+1, S−2, S+2, … within the range, so whichever way the walk
 * turns after S, the widths it visits come in increasing position and every task before the
 * first undecided one can no longer matter.
 */
function walkOrder(plan: GrowthPlan): number[] {
  const start = startWidth(plan);
  if (start === null) {
    const out: number[] = [];
    for (let w = plan.minWidth; w <= plan.maxWidth; w++) out.push(w);
    return out;
  }
  const out = [start];
  for (let d = 1; start - d >= plan.minWidth || start + d <= plan.maxWidth; d++) {
    if (start - d >= plan.minWidth) out.push(start - d);
    if (start + d <= plan.maxWidth) out.push(start + d);
  }
  return out;
}

/** The width the walk starts from when it does not start at min-width (fresh growth only), clamped to the range. */
export function startWidth(plan: GrowthPlan): number | null {
  if (plan.growth === 'in-place' || plan.start === undefined || plan.start === null) return null;
  return Math.min(plan.maxWidth, Math.max(plan.minWidth, plan.start));
}

/** Every growth task in canonical order (walkOrder). In-place growth has one task per restart, starting at min-width. */
export function planTasks(plan: GrowthPlan): TrainingTask[] {
  const tasks: TrainingTask[] = [];
  if (plan.growth === 'in-place') {
    for (let i = 0; i < plan.restarts; i++) tasks.push({ width: plan.minWidth, restart: i });
    return tasks;
  }
  for (const w of walkOrder(plan)) {
    for (let i = 0; i < plan.restarts; i++) tasks.push({ width: w, restart: i });
  }
  return tasks;
}

/** The task whose result says how restart `restart` fares at width `width`. */
function taskFor(plan: GrowthPlan, width: number, restart: number): TrainingTask {
  return plan.growth === 'in-place' ? { width: plan.minWidth, restart } : { width, restart };
}

/** How restart i fares at width w, derived from its task's result. */
export interface RestartAtWidth extends Judged {
  restart: number;
  epochs: number;
  stop: StopReason;
  reason: string | null;
  /** The network, when it met the target at this width. */
  network: NetworkJson | null;
  /** The growth task it came from. */
  task: TrainingTask;
}

/**
 * In-place growth maps onto widths like this: restart i counts as meeting the target at width w
 * when its network met it at a width no larger than w (a network of fewer neurons that meets the
 * target is also a width-w network: give the extra neurons zero outgoing weights). Otherwise its
 * figures at w are those at the end of its time at w; a restart that diverged before w counts as
 * a diverged failure.
 */
export function restartAtWidth(plan: GrowthPlan, result: TaskResult, width: number): RestartAtWidth {
  const task = { width: result.width, restart: result.restart };
  const base = { restart: result.restart, task };
  const judged = (j: Judged): Judged => ({
    train: j.train,
    steering: j.steering,
    judged: j.judged,
    reached: j.reached,
    met: j.met,
  });
  if (plan.growth !== 'in-place') {
    return {
      ...base,
      ...judged(result),
      epochs: result.epochs,
      stop: result.stop,
      reason: result.reason,
      network: result.network,
    };
  }
  if (result.met && result.finalWidth <= width) {
    return {
      ...base,
      ...judged(result),
      epochs: result.epochs,
      stop: result.stop,
      reason: null,
      network: result.network,
    };
  }
  const seg = result.segments.find((s) => s.width === width);
  if (seg !== undefined) {
    const diverged = seg.stop === 'diverged';
    return {
      ...base,
      ...judged(seg),
      met: false,
      epochs: seg.epochs,
      stop: seg.stop,
      reason: diverged ? result.reason : null,
      network: null,
    };
  }
  const nan = Number.NaN;
  return {
    ...base,
    train: nan,
    steering: nan,
    judged: nan,
    reached: false,
    met: false,
    epochs: result.epochs,
    stop: 'diverged',
    reason: result.reason,
    network: null,
  };
}

export type GrowthDecision =
  | {
      kind: 'need';
      /** The first task the decision is waiting for. */
      task: TrainingTask;
      /** The width being decided. */
      deciding: number;
      /** What was decided so far (the width being decided last, with the restarts it has). */
      tried: { width: number; restarts: RestartAtWidth[] }[];
      /** Growth trainings used so far. */
      trainings: number;
    }
  | {
      kind: 'decided';
      /** The first width whose fresh restarts alone are adequate; null when none up to max-width (or the cap was hit). */
      grownWidth: number | null;
      /** Per width tried, in width order: the restarts run there, in restart order. */
      tried: { width: number; restarts: RestartAtWidth[] }[];
      /** Growth trainings the decision used. */
      trainings: number;
      /** Set when the cap on trainings stopped the walk: the width and restarts it got to. */
      capHit: { width: number; restartsRun: number } | null;
    };

export type ResultLookup = (task: TrainingTask) => TaskResult | undefined;

type Tried = { width: number; restarts: RestartAtWidth[] };

/**
 * Walk the widths as the header says. Pure: the same outcomes give the same decision.
 * From a start width S the walk decides S first; when S is adequate it steps down until a width
 * is not (the answer is the last adequate one), otherwise it steps up until one is. It assumes
 * that adequacy, once lost going down, does not come back at a smaller width.
 */
export function decideGrowth(plan: GrowthPlan, lookup: ResultLookup): GrowthDecision {
  const tried: Tried[] = [];
  const used = new Set<string>();
  const allowedFailures = plan.restarts - plan.required;
  const byWidth = (): Tried[] => [...tried].sort((a, b) => a.width - b.width);
  type Step = { adequate: boolean } | { stop: GrowthDecision };
  const decideWidth = (w: number): Step => {
    const seen: RestartAtWidth[] = [];
    let successes = 0;
    let failures = 0;
    for (let i = 0; i < plan.restarts; i++) {
      if (successes >= plan.required || failures > allowedFailures) break;
      const task = taskFor(plan, w, i);
      const key = taskKey(task);
      if (!used.has(key) && plan.maxTrainings !== null && used.size >= plan.maxTrainings) {
        if (seen.length > 0) tried.push({ width: w, restarts: seen });
        const capHit = { width: w, restartsRun: seen.length };
        return { stop: { kind: 'decided', grownWidth: null, tried: byWidth(), trainings: used.size, capHit } };
      }
      const result = lookup(task);
      if (result === undefined) {
        if (seen.length > 0) tried.push({ width: w, restarts: seen });
        return { stop: { kind: 'need', task, deciding: w, tried: byWidth(), trainings: used.size } };
      }
      used.add(key);
      const at = restartAtWidth(plan, result, w);
      seen.push(at);
      if (at.met) successes++;
      else failures++;
    }
    tried.push({ width: w, restarts: seen });
    return { adequate: successes >= plan.required };
  };
  const decided = (grownWidth: number | null): GrowthDecision => ({
    kind: 'decided',
    grownWidth,
    tried: byWidth(),
    trainings: used.size,
    capHit: null,
  });

  const start = startWidth(plan);
  if (start !== null) {
    const first = decideWidth(start);
    if ('stop' in first) return first.stop;
    if (first.adequate) {
      let lowest = start;
      for (let w = start - 1; w >= plan.minWidth; w--) {
        const step = decideWidth(w);
        if ('stop' in step) return step.stop;
        if (!step.adequate) break;
        lowest = w;
      }
      return decided(lowest);
    }
    for (let w = start + 1; w <= plan.maxWidth; w++) {
      const step = decideWidth(w);
      if ('stop' in step) return step.stop;
      if (step.adequate) return decided(w);
    }
    return decided(null);
  }
  for (let w = plan.minWidth; w <= plan.maxWidth; w++) {
    const step = decideWidth(w);
    if ('stop' in step) return step.stop;
    if (step.adequate) return decided(w);
  }
  return decided(null);
}

/**
 * Merge growth results from anywhere (threads, processes, machines) into the decision.
 * Identical duplicates are fine; two different results for one task are refused; extra results
 * past the decision point are ignored.
 */
export function mergeOutcomes(plan: GrowthPlan, results: Iterable<TaskResult>): GrowthDecision {
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
  return decideGrowth(plan, (t) => byKey.get(taskKey(t)));
}
