import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { TargetConfig } from '../../src/config/types.js';
import { decideGrowth, mergeOutcomes, planTasks, restartAtWidth, taskKey } from '../../src/search/growth.js';
import type { GrowthPlan, TaskResult } from '../../src/search/growth.js';

const accuracy: TargetConfig = { metric: 'accuracy', threshold: 0.9 };

function fresh(width: number, restart: number, reached: boolean, metric = reached ? 1 : 0.5): TaskResult {
  return {
    width,
    restart,
    reached,
    stop: reached ? 'reached' : 'max-epochs',
    epochs: 100 + restart,
    metric,
    finalWidth: width,
    segments: [{ width, epochs: 100 + restart, metric, stop: reached ? 'reached' : 'max-epochs' }],
    network: null,
    reason: null,
  };
}

const plan = (over: Partial<GrowthPlan> = {}): GrowthPlan => ({
  growth: 'fresh',
  minWidth: 1,
  maxWidth: 4,
  restarts: 10,
  required: 3,
  maxTrainings: null,
  ...over,
});

describe('the adequacy decision', () => {
  it('walks restarts in order and stops as soon as the answer is certain', () => {
    const p = plan({ maxWidth: 1 });
    // successes at restarts 1, 4, 6 → certain after restart 6 (7 restarts run)
    const wins = new Set([1, 4, 6, 8, 9]);
    const d = decideGrowth(p, accuracy, (t) => fresh(t.width, t.restart, wins.has(t.restart)));
    expect(d.kind).toBe('decided');
    if (d.kind !== 'decided') return;
    expect(d.adequateWidth).toBe(1);
    expect(d.widths[0].restarts).toBe(7);
    expect(d.widths[0].reached).toBe(3);
    expect(d.reachedAtAdequate.map((r) => r.restart)).toEqual([1, 4, 6]);
    expect(d.trainings).toBe(7);
  });

  it('stops a width after more than restarts − required failures', () => {
    const p = plan({ maxWidth: 2 });
    const d = decideGrowth(p, accuracy, (t) => fresh(t.width, t.restart, t.width === 2));
    if (d.kind !== 'decided') throw new Error('undecided');
    expect(d.widths[0]).toMatchObject({ width: 1, restarts: 8, reached: 0, adequate: false });
    expect(d.widths[1]).toMatchObject({ width: 2, restarts: 3, reached: 3, adequate: true });
    expect(d.trainings).toBe(11);
  });

  it('accepts exactly the restart sequences with at least 3 of 10 successes; P(accept) matches the binomial', () => {
    // Operating characteristic of "≥ 3 of 10": P(X ≥ 3 | n = 10, p) = 0.070 at p = 0.1, 0.322 at 0.2,
    // 0.945 at 0.5 (binomial distribution, summed here over all 2^10 sequences).
    const p = plan({ maxWidth: 1 });
    const accept = { 0.1: 0, 0.2: 0, 0.5: 0 } as Record<number, number>;
    for (let mask = 0; mask < 1 << 10; mask++) {
      const d = decideGrowth(p, accuracy, (t) => fresh(t.width, t.restart, ((mask >> t.restart) & 1) === 1));
      if (d.kind !== 'decided') throw new Error('undecided');
      let ones = 0;
      for (let i = 0; i < 10; i++) ones += (mask >> i) & 1;
      expect(d.adequateWidth === 1).toBe(ones >= 3);
      if (d.adequateWidth === 1) {
        for (const q of [0.1, 0.2, 0.5]) accept[q] += q ** ones * (1 - q) ** (10 - ones);
      }
    }
    expect(accept[0.1]).toBeCloseTo(0.07, 3);
    expect(accept[0.2]).toBeCloseTo(0.322, 3);
    expect(accept[0.5]).toBeCloseTo(0.945, 3);
  });

  it('asks for the first missing task in canonical order', () => {
    const p = plan();
    const have = new Map([[taskKey({ width: 1, restart: 0 }), fresh(1, 0, false)]]);
    const d = decideGrowth(p, accuracy, (t) => have.get(taskKey(t)));
    expect(d).toMatchObject({ kind: 'need', task: { width: 1, restart: 1 }, deciding: 1 });
  });

  it('stops at the cap on trainings with the width it got to', () => {
    const p = plan({ maxTrainings: 12 });
    const d = decideGrowth(p, accuracy, (t) => fresh(t.width, t.restart, false));
    expect(d).toMatchObject({
      kind: 'decided',
      adequateWidth: null,
      trainings: 12,
      capHit: { width: 2, restartsRun: 4 },
    });
  });

  it('merging is independent of arrival order and of results past the decision point', () => {
    const p = plan({ maxWidth: 5 });
    const all = planTasks(p).map((t) => fresh(t.width, t.restart, (t.width * 7 + t.restart * 3) % 5 < t.width - 1));
    const reference = JSON.stringify(mergeOutcomes(p, accuracy, all));
    fc.assert(
      fc.property(fc.shuffledSubarray(all, { minLength: all.length, maxLength: all.length }), (perm) => {
        expect(JSON.stringify(mergeOutcomes(p, accuracy, perm))).toBe(reference);
      }),
      { seed: 7, numRuns: 50 },
    );
  });

  it('merging accepts an identical duplicate and refuses two different results for one task', () => {
    const p = plan({ maxWidth: 3 });
    const all = planTasks(p).map((t) => fresh(t.width, t.restart, t.width >= 2));
    expect(mergeOutcomes(p, accuracy, [...all, all[0]])).toEqual(mergeOutcomes(p, accuracy, all));
    const changed = { ...all[0], metric: all[0].metric + 0.01 };
    expect(() => mergeOutcomes(p, accuracy, [...all, changed])).toThrow(/two different results .* width 1, restart 0/);
  });
});

describe('in-place growth mapped onto widths', () => {
  const p = plan({ growth: 'in-place', minWidth: 1, maxWidth: 5 });
  // Restart grown 1 → 2 → 3, reaching the target at width 3.
  const grown: TaskResult = {
    width: 1,
    restart: 0,
    reached: true,
    stop: 'reached',
    epochs: 350,
    metric: 0.95,
    finalWidth: 3,
    segments: [
      { width: 1, epochs: 120, metric: 0.6, stop: 'stalled' },
      { width: 2, epochs: 240, metric: 0.8, stop: 'stalled' },
      { width: 3, epochs: 350, metric: 0.95, stop: 'reached' },
    ],
    network: null,
    reason: null,
  };
  it('counts a restart as reaching every width at or above the one it reached at', () => {
    expect(restartAtWidth(p, grown, 2)).toMatchObject({ reached: false, metric: 0.8, epochs: 240, stop: 'stalled' });
    expect(restartAtWidth(p, grown, 3)).toMatchObject({ reached: true, metric: 0.95, epochs: 350 });
    expect(restartAtWidth(p, grown, 5)).toMatchObject({ reached: true, metric: 0.95, epochs: 350 });
  });
  it('has one task per restart and reuses it across widths', () => {
    expect(planTasks(p)).toHaveLength(10);
    const d = decideGrowth(p, accuracy, (t) => ({ ...grown, restart: t.restart }));
    if (d.kind !== 'decided') throw new Error('undecided');
    expect(d.adequateWidth).toBe(3);
    expect(d.widths.map((w) => w.restarts)).toEqual([8, 8, 3]);
    expect(d.trainings).toBe(8);
  });
});
