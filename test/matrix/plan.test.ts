import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { makePlan, plannedTasks, type CostModel, type PlanIdentity } from '../../src/matrix/plan.js';
import { planTasks, taskKey } from '../../src/search/growth.js';
import type { GrowthPlan } from '../../src/search/types.js';

const plan = (over: Partial<GrowthPlan> = {}): GrowthPlan => ({
  growth: 'fresh',
  minWidth: 1,
  maxWidth: 12,
  restarts: 10,
  required: 3,
  maxTrainings: null,
  ...over,
});
const identity: PlanIdentity = { toolVersion: '0.1.0', data: 'd'.repeat(64), rows: 1200, settings: 's'.repeat(64) };
const cost: CostModel = {
  trainRows: 700,
  inputs: 10,
  outputs: 4,
  maxEpochs: 1200,
  pruneEpochs: 200,
  pruneCandidates: 3,
};

describe('the tasks a plan covers', () => {
  it('from a baseline: its width and the one below, every restart, the one-machine path marked for pruning', () => {
    const tasks = plannedTasks(plan({ start: 7 }));
    expect(new Set(tasks.map((t) => t.width))).toEqual(new Set([6, 7]));
    expect(tasks).toHaveLength(20);
    // Width 7: the first `required` restarts; width 6: the first restarts − required + 1 (its failures).
    expect(tasks.filter((t) => t.prune && t.width === 7).map((t) => t.restart)).toEqual([0, 1, 2]);
    expect(tasks.filter((t) => t.prune && t.width === 6).map((t) => t.restart)).toEqual([0, 1, 2, 3, 4, 5, 6, 7]);
  });

  it('from min-width: every task, none pruned on the shards', () => {
    const p = plan();
    expect(plannedTasks(p).map(taskKey)).toEqual(planTasks(p).map(taskKey));
    expect(plannedTasks(p).some((t) => t.prune)).toBe(false);
  });
});

describe('shards', () => {
  it('hold every planned task exactly once, balanced within the largest task (longest first onto the least loaded)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 12 }), fc.integer({ min: 1, max: 40 }), (start, shards) => {
        const p = plan({ start });
        const doc = makePlan(p, shards, identity, cost);
        const all = doc.shards.flatMap((s) => s.tasks.map(taskKey)).sort();
        expect(all).toEqual(plannedTasks(p).map(taskKey).sort());
        expect(doc.shards.length).toBe(Math.min(shards, plannedTasks(p).length));
        const loads = doc.shards.map((s) => s.estimatedMacs);
        // Greedy list scheduling: no shard exceeds another by more than one task's cost.
        const perTask = (w: number): number =>
          3 * cost.trainRows * cost.maxEpochs * (w * (cost.inputs + cost.outputs + 1) + cost.outputs) +
          3 *
            cost.trainRows *
            cost.pruneEpochs *
            cost.pruneCandidates *
            ((w - 1) * (cost.inputs + cost.outputs + 1) + cost.outputs);
        expect(Math.max(...loads) - Math.min(...loads)).toBeLessThanOrEqual(perTask(Math.max(start, 1)));
      }),
    );
  });

  it('are the same on every call, and the id changes with the data, the settings, the tool or the start', () => {
    const a = makePlan(plan({ start: 5 }), 3, identity, cost);
    expect(makePlan(plan({ start: 5 }), 3, identity, cost)).toEqual(a);
    const ids = new Set([
      a.id,
      makePlan(plan({ start: 5 }), 3, { ...identity, data: 'e'.repeat(64) }, cost).id,
      makePlan(plan({ start: 5 }), 3, { ...identity, settings: 't'.repeat(64) }, cost).id,
      makePlan(plan({ start: 5 }), 3, { ...identity, toolVersion: '0.2.0' }, cost).id,
      makePlan(plan({ start: 6 }), 3, identity, cost).id,
      makePlan(plan({ start: 5 }), 2, identity, cost).id,
    ]);
    expect(ids.size).toBe(6);
    expect(a.id).toMatch(/^[0-9a-f]{64}$/);
  });
});
