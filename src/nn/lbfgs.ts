/**
 * Full-batch limited-memory BFGS (Liu & Nocedal 1989; Nocedal & Wright, Numerical Optimization,
 * 2nd ed. 2006, Algorithm 7.5), with the two-loop recursion of Algorithm 7.4, the initial
 * Hessian H0 = γ·I with γ = sᵀy / yᵀy of the newest pair (eq. 7.20), and a strong Wolfe line
 * search (line-search.ts). Only +, −, ×, ÷, sqrt and comparisons, in a fixed order, so a run
 * gives the same bits on every engine. All work arrays are allocated in the constructor or
 * on resize, none inside an iteration.
 */
import { StrongWolfeLineSearch, type Objective } from './line-search.js';

export type { Objective } from './line-search.js';

/** 'converged': a tolerance below is met; 'stuck': no acceptable step, even along steepest descent. */
export type LbfgsStatus = 'progress' | 'converged' | 'stuck';

export interface LbfgsOptions {
  /** Curvature pairs kept. */
  memory: number;
  /** Sufficient-decrease constant of the line search. */
  c1: number;
  /** Curvature constant of the line search. */
  c2: number;
  /** Converged when ‖∇f‖∞ ≤ this. */
  gradientTolerance: number;
  /** Converged when (f_k − f_{k+1}) / max(|f_k|, |f_{k+1}|, 1) ≤ this after a step; 0 turns the test off. */
  lossTolerance: number;
  /** Evaluations one line search may use. */
  maxLineSearchEvaluations: number;
}

/**
 * memory 10, gradientTolerance 1e-5, lossTolerance 2.22e-9 (factr 1e7 × machine epsilon, same
 * formula) and 20 line-search evaluations are SciPy's L-BFGS-B defaults (scipy.optimize
 * fmin_l_bfgs_b: m, pgtol, factr, maxls; checked in its documentation). c1 = 1e-4 and c2 = 0.9
 * are the values Nocedal & Wright recommend for quasi-Newton methods (section 3.1, from memory),
 * and SciPy's line_search defaults (checked). Nocedal & Wright suggest m between 3 and 20 (from
 * memory); 10 is SciPy's choice.
 * @testOnly
 */
export const LBFGS_DEFAULTS: Readonly<LbfgsOptions> = {
  memory: 10,
  c1: 1e-4,
  c2: 0.9,
  gradientTolerance: 1e-5,
  lossTolerance: 2.220446049250313e-9,
  maxLineSearchEvaluations: 20,
};

/**
 * A pair is kept only when sᵀy > ε·‖s‖·‖y‖ (ε the machine epsilon): the cosine between s and
 * y must exceed the rounding level of the dot product itself. A strong Wolfe step always
 * gives sᵀy ≥ (1 − c2)·|∇fᵀs| > 0, so this only drops pairs from steps accepted without the
 * curvature condition (budget ran out) or lost to rounding, where 1/sᵀy would be noise and the
 * inverse-Hessian approximation could stop being positive definite.
 */
const PAIR_COSINE_MIN = 2.220446049250313e-16;

export interface LbfgsResult {
  /** Objective evaluations this call used (full passes over the rows). */
  evaluations: number;
  /** Loss at x on return. */
  loss: number;
  status: LbfgsStatus;
}

export interface LbfgsStats {
  iterations: number;
  evaluations: number;
  /** Curvature pairs refused by the PAIR_COSINE_MIN test. */
  skippedPairs: number;
  /** Times the history was dropped because a line search along the quasi-Newton direction failed. */
  restarts: number;
}

function dot(a: Float64Array, ao: number, b: Float64Array, bo: number, n: number): number {
  let s = 0;
  for (let q = 0; q < n; q++) s += a[ao + q] * b[bo + q];
  return s;
}

export class Lbfgs {
  readonly options: Readonly<LbfgsOptions>;
  readonly stats: LbfgsStats = { iterations: 0, evaluations: 0, skippedPairs: 0, restarts: 0 };
  private n: number;
  private readonly m: number;
  /** Ring of pairs: pair i occupies [i·n, (i+1)·n) of s and y. */
  private s: Float64Array;
  private y: Float64Array;
  private readonly rho: Float64Array;
  private readonly coef: Float64Array;
  private count = 0;
  private newest = -1;
  private gamma = 1;
  private d: Float64Array;
  /** The point whose loss and gradient are cached, so an iteration starts without evaluating. */
  private x: Float64Array;
  private g: Float64Array;
  private f = NaN;
  private known = false;
  private readonly search: StrongWolfeLineSearch;

  constructor(size: number, options: Partial<LbfgsOptions> = {}) {
    const o = { ...LBFGS_DEFAULTS, ...options };
    if (!Number.isInteger(o.memory) || o.memory < 1)
      throw new RangeError(`memory must be a whole number >= 1, got ${o.memory}`);
    if (!(0 < o.c1 && o.c1 < o.c2 && o.c2 < 1))
      throw new RangeError(`need 0 < c1 < c2 < 1, got c1 ${o.c1}, c2 ${o.c2}`);
    if (!(o.maxLineSearchEvaluations >= 1)) throw new RangeError('maxLineSearchEvaluations must be >= 1');
    this.options = o;
    this.n = size;
    this.m = o.memory;
    this.s = new Float64Array(this.m * size);
    this.y = new Float64Array(this.m * size);
    this.rho = new Float64Array(this.m);
    this.coef = new Float64Array(this.m);
    this.d = new Float64Array(size);
    this.x = new Float64Array(size);
    this.g = new Float64Array(size);
    this.search = new StrongWolfeLineSearch(size, {
      c1: o.c1,
      c2: o.c2,
      maxEvaluations: o.maxLineSearchEvaluations,
    });
  }

  /**
   * Hands over an evaluation the caller already made at x, so the next iteration need not repeat
   * it. The curvature pairs stay; call reset() as well if x is unrelated to the previous point.
   */
  setPoint(x: Float64Array, loss: number, grad: Float64Array): void {
    this.x.set(x);
    this.g.set(grad);
    this.f = loss;
    this.known = true;
  }

  /**
   * One iteration from x (updated in place): direction by the two-loop recursion, then a strong
   * Wolfe line search. Uses at most maxEvaluations evaluations (one more at the start when no
   * loss is known for x). If the caller changed x since the last call, the history is dropped
   * and x is evaluated afresh. x never gets worse: on 'stuck' it holds the best point found.
   */
  iterate(x: Float64Array, objective: Objective, maxEvaluations: number): LbfgsResult {
    let evaluations = 0;
    if (!(maxEvaluations >= 1)) return { evaluations, loss: this.known ? this.f : NaN, status: 'progress' };
    if (!this.known || !this.isCurrent(x)) {
      if (this.known) this.reset();
      this.x.set(x);
      this.f = objective(this.x, this.g);
      this.known = true;
      evaluations++;
      this.stats.evaluations++;
    }
    const n = this.n;
    const f0 = this.f;
    const gInf = this.gradientInfNorm();
    if (!(f0 - f0 === 0) || !(gInf - gInf === 0)) return { evaluations, loss: f0, status: 'stuck' };
    if (gInf <= this.options.gradientTolerance) return { evaluations, loss: f0, status: 'converged' };
    this.stats.iterations++;

    for (;;) {
      let quasiNewton = this.count > 0;
      this.direction();
      let slope0 = dot(this.g, 0, this.d, 0, n);
      if (!(slope0 < 0) && quasiNewton) {
        // Rounding made the quasi-Newton direction useless: fall back on steepest descent.
        this.reset();
        quasiNewton = false;
        this.direction();
        slope0 = dot(this.g, 0, this.d, 0, n);
      }
      if (!(slope0 < 0)) return { evaluations, loss: this.f, status: 'stuck' };
      const budget = maxEvaluations - evaluations;
      if (budget < 1) return { evaluations, loss: this.f, status: 'progress' };
      // Quasi-Newton steps are well scaled, so α = 1 comes first (Nocedal & Wright, section 3.5).
      // Without curvature information the first trial moves the parameters by a Euclidean length
      // of 1 (as Liu & Nocedal's LBFGS code does, from memory): the summed loss's gradient grows
      // with the row count, so α = 1 on −∇f would make the step depend on the data size, while a
      // unit move is on the scale of Nguyen–Widrow initial weights.
      const alpha1 = this.count > 0 ? 1 : 1 / Math.sqrt(dot(this.d, 0, this.d, 0, n));
      const fOld = this.f;
      const r = this.search.search(this.x, fOld, slope0, this.d, alpha1, objective, budget);
      evaluations += r.evaluations;
      this.stats.evaluations += r.evaluations;
      if (r.moved) this.accept(x, r.status !== 'failed');
      if (r.status === 'wolfe') {
        const fNew = this.f;
        const scale = Math.max(fOld < 0 ? -fOld : fOld, fNew < 0 ? -fNew : fNew, 1);
        const converged =
          this.gradientInfNorm() <= this.options.gradientTolerance ||
          (this.options.lossTolerance > 0 && (fOld - fNew) / scale <= this.options.lossTolerance);
        return { evaluations, loss: this.f, status: converged ? 'converged' : 'progress' };
      }
      if (r.status === 'budget') return { evaluations, loss: this.f, status: 'progress' };
      // The line search failed. With curvature pairs, they may be what misleads: drop them and
      // try steepest descent from the best point so far. Without, there is nowhere to go.
      if (!quasiNewton) return { evaluations, loss: this.f, status: 'stuck' };
      this.reset();
      this.stats.restarts++;
    }
  }

  /** Forgets the curvature pairs (after the parameter vector changed meaning); the cached point stays. */
  reset(): void {
    this.count = 0;
    this.newest = -1;
    this.gamma = 1;
  }

  /**
   * Carries over to a resized parameter vector (map[old] = new index, −1 dropped). Removing or
   * adding a neuron changes the function, so old pairs are not secants of the new one: the
   * history is dropped and the next iteration evaluates the new point.
   */
  resize(_map: Int32Array, newSize: number): void {
    this.reset();
    this.known = false;
    this.f = NaN;
    if (newSize === this.n) return;
    this.n = newSize;
    this.s = new Float64Array(this.m * newSize);
    this.y = new Float64Array(this.m * newSize);
    this.d = new Float64Array(newSize);
    this.x = new Float64Array(newSize);
    this.g = new Float64Array(newSize);
    this.search.resize(newSize);
  }

  /** Curvature pairs currently held. */
  get pairs(): number {
    return this.count;
  }

  private isCurrent(x: Float64Array): boolean {
    const c = this.x;
    if (x.length !== c.length) return false;
    for (let q = 0; q < c.length; q++) if (x[q] !== c[q]) return false;
    return true;
  }

  private gradientInfNorm(): number {
    const g = this.g;
    let m = 0;
    for (let q = 0; q < g.length; q++) {
      const a = g[q] < 0 ? -g[q] : g[q];
      if (a > m || a !== a) m = a;
    }
    return m;
  }

  /** d = −H·g by the two-loop recursion (Algorithm 7.4), newest pair first; −g without pairs. */
  private direction(): void {
    const { n, m, s, y, rho, coef, d, g } = this;
    for (let q = 0; q < n; q++) d[q] = g[q];
    for (let k = 0; k < this.count; k++) {
      const i = (this.newest - k + m) % m;
      const a = rho[i] * dot(s, i * n, d, 0, n);
      coef[i] = a;
      const o = i * n;
      for (let q = 0; q < n; q++) d[q] -= a * y[o + q];
    }
    const gamma = this.gamma;
    for (let q = 0; q < n; q++) d[q] *= gamma;
    for (let k = this.count - 1; k >= 0; k--) {
      const i = (this.newest - k + m) % m;
      const b = rho[i] * dot(y, i * n, d, 0, n);
      const c = coef[i] - b;
      const o = i * n;
      for (let q = 0; q < n; q++) d[q] += c * s[o + q];
    }
    for (let q = 0; q < n; q++) d[q] = -d[q];
  }

  /** Moves to the line search's best point; stores the pair s = x₊ − x, y = g₊ − g when asked and acceptable. */
  private accept(out: Float64Array, storePair: boolean): void {
    const { n, m } = this;
    const xn = this.search.point;
    const gn = this.search.gradient;
    if (storePair) {
      let sy = 0;
      let ss = 0;
      let yy = 0;
      for (let q = 0; q < n; q++) {
        const sq = xn[q] - this.x[q];
        const yq = gn[q] - this.g[q];
        sy += sq * yq;
        ss += sq * sq;
        yy += yq * yq;
      }
      if (sy > PAIR_COSINE_MIN * Math.sqrt(ss) * Math.sqrt(yy)) {
        const i = (this.newest + 1) % m;
        const o = i * n;
        for (let q = 0; q < n; q++) {
          this.s[o + q] = xn[q] - this.x[q];
          this.y[o + q] = gn[q] - this.g[q];
        }
        this.rho[i] = 1 / sy;
        this.gamma = sy / yy;
        this.newest = i;
        if (this.count < m) this.count++;
      } else {
        this.stats.skippedPairs++;
      }
    }
    this.x.set(xn);
    this.g.set(gn);
    this.f = this.search.loss;
    out.set(xn);
  }
}
