/**
 * L-BFGS (src/nn/lbfgs.ts) and its strong Wolfe line search (src/nn/line-search.ts), checked
 * against analytic minimisers, standard test problems, finite differences, an independent
 * linear solve, and SciPy's L-BFGS-B (a general-purpose reference library; figures measured
 * with SciPy 1.17.1, script in test/nn/reference/lbfgsb_reference.py).
 */
import { describe, expect, it } from 'vitest';
import { Lbfgs, LBFGS_DEFAULTS, type Objective } from '../../src/nn/lbfgs.js';
import { StrongWolfeLineSearch } from '../../src/nn/line-search.js';
import { initParams } from '../../src/nn/network.js';
import { rngFor } from '../../src/common/random.js';
import {
  dot,
  maxAbsDiff,
  minimise,
  rosenbrock,
  rosenbrockStart,
  TIGHT,
  XOR_SHAPE,
  xorAccuracy,
  xorObjective,
} from './optim-problems.js';

describe('L-BFGS on Rosenbrock', () => {
  // SciPy's L-BFGS-B (same memory m = 10, gtol 1e-10, ftol 0) from the same start: 39 iterations,
  // 47 evaluations. Measured here: 38 iterations, 47 evaluations (the start included). The bound
  // is the reference library's own count, so a slower line search or a broken scaling fails it.
  it('reaches (1, 1) within 1e-6 from (−1.2, 1) in 38 iterations, no more than SciPy L-BFGS-B needs', () => {
    const x = rosenbrockStart(2);
    const run = minimise(x, rosenbrock, TIGHT);
    expect(run.status).toBe('converged');
    expect(Math.abs(x[0] - 1)).toBeLessThan(1e-6);
    expect(Math.abs(x[1] - 1)).toBeLessThan(1e-6);
    expect(run.opt.stats.iterations).toBeLessThanOrEqual(39);
    expect(run.evaluations).toBeLessThanOrEqual(47);
  });

  it('with the default tolerances stops close to (1, 1) as well', () => {
    const x = rosenbrockStart(2);
    const run = minimise(x, rosenbrock, {});
    expect(run.status).toBe('converged');
    // SciPy's defaults stop at 2.0e-6 from (1, 1) here; ours at 4.8e-8 (measured).
    expect(maxAbsDiff(x, [1, 1])).toBeLessThan(1e-5);
  });

  for (const n of [10, 100]) {
    it(`extended Rosenbrock in ${n} dimensions (MGH problem 21) reaches its minimum 0 at all ones`, () => {
      const x = rosenbrockStart(n);
      const run = minimise(x, rosenbrock, TIGHT);
      expect(run.status).toBe('converged');
      expect(maxAbsDiff(x, new Float64Array(n).fill(1))).toBeLessThan(1e-6);
      expect(rosenbrock(x, new Float64Array(n))).toBeLessThan(1e-12);
    });
  }
});

describe('strong Wolfe line search', () => {
  it("φ'(α) = ∇f(x + αd)ᵀd agrees with a central difference of φ (relative 1e-6)", () => {
    // h = 1e-5: truncation error O(h²·φ''') and rounding O(ε·|φ|/h) both stay far below 1e-6.
    const h = 1e-5;
    const cases: [string, Objective, Float64Array][] = [
      ['rosenbrock', rosenbrock, rosenbrockStart(10)],
      ['xor network', xorObjective(), initParams(XOR_SHAPE, 'nguyen-widrow', rngFor(1, 2, 0))],
    ];
    for (const [name, f, x0] of cases) {
      const n = x0.length;
      const rng = rngFor(5, n, 0);
      const d = new Float64Array(n).map(() => rng.nextDouble() - 0.5);
      const ls = new StrongWolfeLineSearch(n, { c1: 1e-4, c2: 0.9, maxEvaluations: 20 });
      const scratch = new Float64Array(n);
      const phi = (a: number) =>
        f(
          x0.map((v, q) => v + a * d[q]),
          scratch,
        );
      for (const alpha of [0, 0.01, 0.1, 0.5, 1]) {
        ls.evaluate(x0, d, alpha, f);
        const fd = (phi(alpha + h) - phi(alpha - h)) / (2 * h);
        const slope = ls.trialSlope;
        expect(Math.abs(slope - fd), `${name} α=${alpha}: ${slope} vs ${fd}`).toBeLessThanOrEqual(
          1e-6 * Math.max(1, Math.abs(fd)),
        );
        expect(ls.trialLoss).toBe(phi(alpha));
      }
    }
  });

  it('every accepted step satisfies both strong Wolfe conditions (recomputed from the returned points)', () => {
    const { c1, c2 } = LBFGS_DEFAULTS;
    const cases: [string, Objective, Float64Array][] = [
      ['rosenbrock', rosenbrock, rosenbrockStart(2)],
      ['extended rosenbrock', rosenbrock, rosenbrockStart(10)],
      ['xor network', xorObjective(), initParams(XOR_SHAPE, 'nguyen-widrow', rngFor(1, 2, 1))],
    ];
    for (const [name, f, x] of cases) {
      const n = x.length;
      const opt = new Lbfgs(n, TIGHT);
      const g0 = new Float64Array(n);
      const g1 = new Float64Array(n);
      const s = new Float64Array(n);
      let steps = 0;
      for (let k = 0; k < 200; k++) {
        const before = x.slice();
        const r = opt.iterate(x, f, 1000);
        if (r.status === 'stuck') break;
        if (maxAbsDiff(before, x) === 0) break; // converged at the start: no step taken
        steps++;
        for (let q = 0; q < n; q++) s[q] = x[q] - before[q];
        const f0 = f(before, g0);
        const f1 = f(x, g1);
        const slope0 = dot(g0, s);
        const slope1 = dot(g1, s);
        expect(slope0, `${name} step ${k}: descent`).toBeLessThan(0);
        expect(f1, `${name} step ${k}: sufficient decrease`).toBeLessThanOrEqual(f0 + c1 * slope0);
        expect(Math.abs(slope1), `${name} step ${k}: curvature`).toBeLessThanOrEqual(c2 * Math.abs(slope0));
        expect(r.loss).toBe(f1);
        if (r.status === 'converged') break;
      }
      expect(steps, name).toBeGreaterThan(5);
    }
  });
});

/** Solves A·x = b by Gaussian elimination with partial pivoting (A row-major n × n; copies are made). */
function gaussianSolve(A: Float64Array, b: Float64Array, n: number): Float64Array {
  const M = A.slice();
  const x = b.slice();
  for (let c = 0; c < n; c++) {
    let p = c;
    for (let r = c + 1; r < n; r++) if (Math.abs(M[r * n + c]) > Math.abs(M[p * n + c])) p = r;
    for (let k = 0; k < n; k++) [M[c * n + k], M[p * n + k]] = [M[p * n + k], M[c * n + k]];
    [x[c], x[p]] = [x[p], x[c]];
    for (let r = c + 1; r < n; r++) {
      const m = M[r * n + c] / M[c * n + c];
      for (let k = c; k < n; k++) M[r * n + k] -= m * M[c * n + k];
      x[r] -= m * x[c];
    }
  }
  for (let r = n - 1; r >= 0; r--) {
    let s = x[r];
    for (let k = r + 1; k < n; k++) s -= M[r * n + k] * x[k];
    x[r] = s / M[r * n + r];
  }
  return x;
}

describe('L-BFGS on a strictly convex quadratic', () => {
  it('½xᵀAx − bᵀx reaches A⁻¹b (by Gaussian elimination) to 1e-8', () => {
    const n = 20;
    const rng = rngFor(11, n, 0);
    const B = new Float64Array(n * n).map(() => 2 * rng.nextDouble() - 1);
    // A = BᵀB + I: symmetric positive definite.
    const A = new Float64Array(n * n);
    for (let i = 0; i < n; i++)
      for (let j = 0; j < n; j++) {
        let s = i === j ? 1 : 0;
        for (let k = 0; k < n; k++) s += B[k * n + i] * B[k * n + j];
        A[i * n + j] = s;
      }
    const b = new Float64Array(n).map(() => 2 * rng.nextDouble() - 1);
    const quadratic: Objective = (x, g) => {
      let f = 0;
      for (let i = 0; i < n; i++) {
        let ax = 0;
        for (let j = 0; j < n; j++) ax += A[i * n + j] * x[j];
        g[i] = ax - b[i];
        f += x[i] * (0.5 * ax - b[i]);
      }
      return f;
    };
    const solution = gaussianSolve(A, b, n);
    const x = new Float64Array(n);
    const run = minimise(x, quadratic, { gradientTolerance: 1e-12, lossTolerance: 0 });
    // Near x* the loss changes by less than its own rounding (ε·|f*|), so the line search can no
    // longer see a decrease and the run ends 'stuck' (measured: after 40 iterations, 85
    // evaluations, 3.5e-9 from A⁻¹b, ‖∇f‖∞ 7.5e-9); 'converged' would be as good.
    expect(['converged', 'stuck']).toContain(run.status);
    expect(maxAbsDiff(x, solution)).toBeLessThan(1e-8);
  });
});

/**
 * SciPy 1.17.1 L-BFGS-B (defaults: m 10, gtol 1e-5, ftol 2.2e-9; at most 2,000 evaluations) on
 * the same summed cross-entropy from the same 100 starts initParams(XOR_SHAPE, 'nguyen-widrow',
 * rngFor(1, 2, r)) reaches 100% accuracy for exactly these r (computed by
 * test/nn/reference/lbfgsb_reference.py). The others stop at flat regions with loss near 2·ln 2
 * (two rows left at probability ½) or 3·ln 3 − 2·ln 2 (three rows sharing one output, ⅔ vs ⅓).
 */
const SCIPY_XOR_SOLVED = [
  1, 5, 6, 7, 9, 11, 13, 15, 16, 17, 18, 19, 21, 23, 26, 27, 30, 32, 34, 37, 40, 46, 50, 51, 52, 53, 54, 55, 56, 57, 60,
  62, 64, 65, 68, 69, 71, 73, 76, 78, 79, 81, 82, 83, 86, 87, 88, 89, 90, 91, 93, 94, 95, 99,
];

describe('L-BFGS on the XOR network (reference kernel, exact gradient)', () => {
  // Measured: 54 of 100 starts (5 of the first 10: r = 1, 5, 6, 7, 9) reach 100% within 2,000
  // evaluations, using 7.6 evaluations on average; the rest stop as 'converged' after 21–48. The
  // brief asked for 8 of 10; with the exact gradient no faithful L-BFGS gets there from these
  // starts, since the reference library fails on the very same seeds.
  it('reaches 100% accuracy from exactly the starts SciPy L-BFGS-B solves (54 of 100)', () => {
    const f = xorObjective();
    const solved: number[] = [];
    for (let r = 0; r < 100; r++) {
      const p = initParams(XOR_SHAPE, 'nguyen-widrow', rngFor(1, 2, r));
      const opt = new Lbfgs(p.length);
      let evaluations = 0;
      let status = 'progress';
      while (xorAccuracy(p) < 1 && status === 'progress' && evaluations < 2000) {
        const res = opt.iterate(p, f, 2000 - evaluations);
        evaluations += res.evaluations;
        status = res.status;
      }
      if (xorAccuracy(p) === 1) solved.push(r);
      expect(evaluations).toBeLessThanOrEqual(2000);
    }
    expect(solved).toEqual(SCIPY_XOR_SOLVED);
    expect(solved.filter((r) => r < 10)).toEqual([1, 5, 6, 7, 9]);
  });
});
