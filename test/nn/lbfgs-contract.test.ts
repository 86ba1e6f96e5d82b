/**
 * The L-BFGS calling contract the trainer relies on: evaluation accounting and budget, no
 * repeated evaluation, never a worse point, NaN handling, resize, determinism.
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { Lbfgs, LBFGS_DEFAULTS, type Objective } from '../../src/nn/lbfgs.js';
import { initParams } from '../../src/nn/network.js';
import { rngFor } from '../../src/common/random.js';
import { maxAbsDiff, minimise, rosenbrock, rosenbrockStart, TIGHT, XOR_SHAPE, xorObjective } from './optim-problems.js';

describe('L-BFGS contract', () => {
  it('is deterministic: two runs from the same start give bit-identical parameters', () => {
    const runs = [0, 1].map(() => {
      const p = initParams(XOR_SHAPE, 'nguyen-widrow', rngFor(1, 2, 3));
      minimise(p, xorObjective(), {}, 500);
      const x = rosenbrockStart(10);
      minimise(x, rosenbrock, TIGHT);
      return [...p, ...x];
    });
    expect(new Uint8Array(Float64Array.from(runs[0]).buffer)).toEqual(
      new Uint8Array(Float64Array.from(runs[1]).buffer),
    );
  });

  it('never evaluates a point twice and reports every evaluation it makes', () => {
    const seen = new Set<string>();
    let calls = 0;
    let repeats = 0;
    const counted: Objective = (x, g) => {
      calls++;
      const key = Array.from(x).join(',');
      if (seen.has(key)) repeats++;
      seen.add(key);
      return rosenbrock(x, g);
    };
    const run = minimise(rosenbrockStart(2), counted, TIGHT);
    expect(run.status).toBe('converged');
    expect(calls).toBe(run.evaluations);
    expect(repeats).toBe(0);
  });

  it('uses an evaluation handed over by setPoint instead of repeating it', () => {
    let calls = 0;
    const counted: Objective = (x, g) => {
      calls++;
      return rosenbrock(x, g);
    };
    const x = rosenbrockStart(2);
    const g = new Float64Array(2);
    const opt = new Lbfgs(2);
    opt.setPoint(x, rosenbrock(x, g), g);
    const r = opt.iterate(x, counted, 100);
    expect(r.evaluations).toBe(calls);
    expect(calls).toBeGreaterThanOrEqual(1);
    expect(r.loss).toBeLessThan(24.2); // f(−1.2, 1) = 24.2
  });

  it('respects the evaluation budget of every call', () => {
    for (const budget of [1, 2, 3, 5]) {
      let calls = 0;
      const counted: Objective = (x, g) => {
        calls++;
        return rosenbrock(x, g);
      };
      const x = rosenbrockStart(2);
      const opt = new Lbfgs(2);
      let lastLoss = Infinity;
      for (let k = 0; k < 100; k++) {
        const before = calls;
        const r = opt.iterate(x, counted, budget);
        expect(calls - before).toBe(r.evaluations);
        expect(r.evaluations).toBeLessThanOrEqual(budget);
        expect(r.loss).toBeLessThanOrEqual(lastLoss);
        lastLoss = r.loss;
        if (r.status !== 'progress') break;
      }
      expect(lastLoss, `budget ${budget}`).toBeLessThan(24.2);
    }
  });

  it('treats a NaN loss at a trial point as a step too long and never accepts it', () => {
    // √(1 + x²) summed: Newton-like steps overshoot it badly; beyond |x| > 2 the loss is NaN.
    let nanCalls = 0;
    const f: Objective = (x, g) => {
      let s = 0;
      for (let i = 0; i < x.length; i++) {
        if (Math.abs(x[i]) > 2) {
          nanCalls++;
          g.fill(NaN);
          return NaN;
        }
        const r = Math.sqrt(1 + x[i] * x[i]);
        s += r;
        g[i] = x[i] / r;
      }
      return s;
    };
    const x = Float64Array.from([1.5, -1.9, 0.7]);
    const opt = new Lbfgs(3, TIGHT);
    let last = Infinity;
    let status = 'progress';
    for (let k = 0; k < 100 && status === 'progress'; k++) {
      const r = opt.iterate(x, f, 100);
      expect(Number.isFinite(r.loss)).toBe(true);
      expect(r.loss).toBeLessThanOrEqual(last);
      last = r.loss;
      status = r.status;
    }
    expect(nanCalls).toBeGreaterThan(0);
    expect(status).toBe('converged');
    expect(maxAbsDiff(x, [0, 0, 0])).toBeLessThan(1e-9);
  });

  it("reports 'stuck' and keeps x when no step lowers the loss (gradient of the wrong sign)", () => {
    const wrong: Objective = (x, g) => {
      const f = rosenbrock(x, g);
      for (let q = 0; q < g.length; q++) g[q] = -g[q];
      return f;
    };
    const x = rosenbrockStart(2);
    const start = x.slice();
    const r = new Lbfgs(2).iterate(x, wrong, 1000);
    expect(r.status).toBe('stuck');
    expect(Array.from(x)).toEqual(Array.from(start));
    expect(r.loss).toBe(rosenbrock(start, new Float64Array(2)));
    expect(r.evaluations).toBeLessThanOrEqual(1 + LBFGS_DEFAULTS.maxLineSearchEvaluations);
  });

  it("reports 'converged' without a step at a stationary point", () => {
    const x = Float64Array.from([1, 1]);
    const r = new Lbfgs(2).iterate(x, rosenbrock, 10);
    expect(r).toEqual({ evaluations: 1, loss: 0, status: 'converged' });
  });

  it('after resize, evaluates the new point once and keeps minimising at the new size', () => {
    const opt = new Lbfgs(2, TIGHT);
    const x2 = rosenbrockStart(2);
    for (let k = 0; k < 5; k++) opt.iterate(x2, rosenbrock, 100);
    expect(opt.pairs).toBeGreaterThan(0);
    const map = Int32Array.from([0, 1]);
    opt.resize(map, 4);
    expect(opt.pairs).toBe(0);
    const x4 = Float64Array.from([x2[0], x2[1], -1.2, 1]);
    let calls = 0;
    const counted: Objective = (x, g) => {
      calls++;
      return rosenbrock(x, g);
    };
    let status = 'progress';
    let evaluations = 0;
    while (status === 'progress') {
      const r = opt.iterate(x4, counted, 1000);
      evaluations += r.evaluations;
      status = r.status;
    }
    expect(calls).toBe(evaluations);
    expect(status).toBe('converged');
    expect(maxAbsDiff(x4, [1, 1, 1, 1])).toBeLessThan(1e-6);
  });

  it('drops its history and re-evaluates when the caller changed x behind its back', () => {
    const opt = new Lbfgs(2);
    const x = rosenbrockStart(2);
    for (let k = 0; k < 3; k++) opt.iterate(x, rosenbrock, 100);
    expect(opt.pairs).toBeGreaterThan(0);
    x[0] = 0.5;
    const r = opt.iterate(x, rosenbrock, 100);
    expect(r.evaluations).toBeGreaterThanOrEqual(2); // the new point, then at least one trial
    expect(opt.pairs).toBeLessThanOrEqual(1);
    expect(r.loss).toBeLessThan(rosenbrock(Float64Array.from([0.5, 1]), new Float64Array(2)));
  });
});

describe('determinism by construction', () => {
  it('the optimiser uses no elementary function whose last bits an engine may choose', () => {
    for (const file of ['lbfgs.ts', 'line-search.ts']) {
      const src = readFileSync(join(import.meta.dirname, '..', '..', 'src', 'nn', file), 'utf8');
      const used = [...src.matchAll(/Math\.(\w+)/g)].map((m) => m[1]);
      // sqrt is correctly rounded by IEEE 754; min and max only compare.
      expect(
        used.filter((fn) => !['sqrt', 'min', 'max'].includes(fn)),
        file,
      ).toEqual([]);
    }
  });
});
