import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { decideGrowth, mergeOutcomes, planTasks, restartAtWidth, taskKey } from '../../src/search/growth.js';
import type { GrowthDecision, RestartAtWidth } from '../../src/search/growth.js';
import type { GrowthPlan, TaskResult } from '../../src/search/types.js';

/** A finished growth task whose network met the target (on the judging rows) or not. */
function fresh(width: number, restart: number, met: boolean, metric = met ? 1 : 0.5): TaskResult {
  const judged = { train: metric, steering: metric, judged: metric, reached: met, met };
  return {
    width,
    restart,
    ...judged,
    stop: met ? 'reached' : 'stalled',
    epochs: 100 + restart,
    finalWidth: width,
    segments: [{ width, epochs: 100 + restart, stop: met ? 'reached' : 'stalled', ...judged }],
    network: null,
    reason: null,
  };
}

function decided(d: GrowthDecision): Extract<GrowthDecision, { kind: 'decided' }> {
  if (d.kind !== 'decided') throw new Error('undecided');
  return d;
}

const at = (d: GrowthDecision, w: number): RestartAtWidth[] => decided(d).tried.find((t) => t.width === w)!.restarts;

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
    const d = decideGrowth(p, (t) => fresh(t.width, t.restart, wins.has(t.restart)));
    expect(decided(d).grownWidth).toBe(1);
    expect(at(d, 1)).toHaveLength(7);
    expect(
      at(d, 1)
        .filter((r) => r.met)
        .map((r) => r.restart),
    ).toEqual([1, 4, 6]);
    expect(decided(d).trainings).toBe(7);
  });

  it('stops a width after more than restarts − required failures', () => {
    const p = plan({ maxWidth: 2 });
    const d = decideGrowth(p, (t) => fresh(t.width, t.restart, t.width === 2));
    expect(at(d, 1).map((r) => r.met)).toEqual(Array(8).fill(false));
    expect(at(d, 2).map((r) => r.met)).toEqual([true, true, true]);
    expect(decided(d).grownWidth).toBe(2);
    expect(decided(d).trainings).toBe(11);
  });

  it('accepts exactly the restart sequences with at least 3 of 10 successes; P(accept) matches the binomial', () => {
    // Operating characteristic of "≥ 3 of 10": P(X ≥ 3 | n = 10, p) = 0.070 at p = 0.1, 0.322 at 0.2,
    // 0.945 at 0.5 (binomial distribution, summed here over all 2^10 sequences).
    const p = plan({ maxWidth: 1 });
    const accept = { 0.1: 0, 0.2: 0, 0.5: 0 } as Record<number, number>;
    for (let mask = 0; mask < 1 << 10; mask++) {
      const d = decided(decideGrowth(p, (t) => fresh(t.width, t.restart, ((mask >> t.restart) & 1) === 1)));
      let ones = 0;
      for (let i = 0; i < 10; i++) ones += (mask >> i) & 1;
      expect(d.grownWidth === 1).toBe(ones >= 3);
      if (d.grownWidth === 1) {
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
    const d = decideGrowth(p, (t) => have.get(taskKey(t)));
    expect(d).toMatchObject({ kind: 'need', task: { width: 1, restart: 1 }, deciding: 1 });
  });

  it('stops at the cap on trainings with the width it got to', () => {
    const p = plan({ maxTrainings: 12 });
    const d = decideGrowth(p, (t) => fresh(t.width, t.restart, false));
    expect(d).toMatchObject({
      kind: 'decided',
      grownWidth: null,
      trainings: 12,
      capHit: { width: 2, restartsRun: 4 },
    });
  });

  it('merging is independent of arrival order and of results past the decision point', () => {
    const p = plan({ maxWidth: 5 });
    const all = planTasks(p).map((t) => fresh(t.width, t.restart, (t.width * 7 + t.restart * 3) % 5 < t.width - 1));
    const reference = JSON.stringify(mergeOutcomes(p, all));
    fc.assert(
      fc.property(fc.shuffledSubarray(all, { minLength: all.length, maxLength: all.length }), (perm) => {
        expect(JSON.stringify(mergeOutcomes(p, perm))).toBe(reference);
      }),
      { seed: 7, numRuns: 50 },
    );
  });

  it('merging accepts an identical duplicate and refuses two different results for one task', () => {
    const p = plan({ maxWidth: 3 });
    const all = planTasks(p).map((t) => fresh(t.width, t.restart, t.width >= 2));
    expect(mergeOutcomes(p, [...all, all[0]])).toEqual(mergeOutcomes(p, all));
    const changed = { ...all[0], judged: all[0].judged + 0.01 };
    expect(() => mergeOutcomes(p, [...all, changed])).toThrow(/two different results .* width 1, restart 0/);
  });
});

describe('in-place growth mapped onto widths', () => {
  const p = plan({ growth: 'in-place', minWidth: 1, maxWidth: 5 });
  // Restart grown 1 → 2 → 3, reaching the target at width 3.
  const j = (m: number, met: boolean) => ({ train: m, steering: m, judged: m, reached: met, met });
  const grown: TaskResult = {
    width: 1,
    restart: 0,
    ...j(0.95, true),
    stop: 'reached',
    epochs: 350,
    finalWidth: 3,
    segments: [
      { width: 1, epochs: 120, stop: 'stalled', ...j(0.6, false) },
      { width: 2, epochs: 240, stop: 'stalled', ...j(0.8, false) },
      { width: 3, epochs: 350, stop: 'reached', ...j(0.95, true) },
    ],
    network: null,
    reason: null,
  };
  it('counts a restart as reaching every width at or above the one it reached at', () => {
    expect(restartAtWidth(p, grown, 2)).toMatchObject({ met: false, judged: 0.8, epochs: 240, stop: 'stalled' });
    expect(restartAtWidth(p, grown, 3)).toMatchObject({ met: true, judged: 0.95, epochs: 350 });
    expect(restartAtWidth(p, grown, 5)).toMatchObject({ met: true, judged: 0.95, epochs: 350 });
  });
  it('has one task per restart and reuses it across widths', () => {
    expect(planTasks(p)).toHaveLength(10);
    const d = decided(decideGrowth(p, (t) => ({ ...grown, restart: t.restart })));
    expect(d.grownWidth).toBe(3);
    expect(d.tried.map((w) => w.restarts.length)).toEqual([8, 8, 3]);
    expect(d.trainings).toBe(8);
  });
});

describe('the walk from a start width (a matching baseline)', () => {
  // Restart i meets the target at width w when w ≥ answer, except for a seeded scatter of lucky
  // and unlucky restarts that leaves adequacy monotone in width (at most 2 of 10 flip).
  const outcome = (answer: number) => (t: { width: number; restart: number }) =>
    fresh(t.width, t.restart, t.width >= answer ? t.restart !== (t.width * 3) % 10 : t.restart === (t.width * 7) % 10);

  it('gives the full scan’s width from every start, and decides only the widths the answer needs', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 12 }), fc.integer({ min: 1, max: 12 }), (answer, start) => {
        const full = decided(decideGrowth(plan({ maxWidth: 12 }), outcome(answer)));
        const walk = decided(decideGrowth(plan({ maxWidth: 12, start }), outcome(answer)));
        expect(walk.grownWidth).toBe(full.grownWidth);
        const widths = walk.tried.map((t) => t.width);
        expect(widths).toEqual([...widths].sort((a, b) => a - b));
        // From the start, down to the answer and one below it; or up to the answer.
        const lo = start >= answer ? Math.max(1, answer - 1) : start;
        const hi = start >= answer ? start : answer;
        expect(widths).toEqual(Array.from({ length: hi - lo + 1 }, (_, k) => lo + k));
      }),
    );
  });

  it('decides the start width and the width below first when the answer has not moved', () => {
    const walk = decided(decideGrowth(plan({ maxWidth: 12, start: 7 }), outcome(7)));
    const full = decided(decideGrowth(plan({ maxWidth: 12 }), outcome(7)));
    expect(walk.tried.map((t) => t.width)).toEqual([6, 7]);
    expect(full.trainings / walk.trainings).toBeGreaterThan(3);
  });

  it('orders tasks so that the widths any walk visits come in increasing position', () => {
    for (const start of [1, 4, 6, 9]) {
      const p = plan({ maxWidth: 9, start, restarts: 2, required: 1 });
      const order = [...new Set(planTasks(p).map((t) => t.width))];
      expect([...order].sort((a, b) => a - b)).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9]);
      const pos = (w: number) => order.indexOf(w);
      expect(order[0]).toBe(start);
      for (let w = start; w > 1; w--) expect(pos(w - 1)).toBeGreaterThan(pos(w));
      for (let w = start; w < 9; w++) expect(pos(w + 1)).toBeGreaterThan(pos(w));
    }
  });

  it('is ignored by in-place growth, which always grows from min-width', () => {
    const p = plan({ growth: 'in-place', start: 3 });
    expect(planTasks(p).every((t) => t.width === 1)).toBe(true);
  });
});
