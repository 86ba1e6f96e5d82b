/**
 * A line search for the strong Wolfe conditions (Nocedal & Wright, Numerical Optimization,
 * 2nd ed. 2006: Algorithm 3.5 with the zoom of Algorithm 3.6, trial steps by the cubic
 * interpolation of section 3.5, eq. 3.59):
 *   sufficient decrease  φ(α) ≤ φ(0) + c1·α·φ'(0)
 *   curvature            |φ'(α)| ≤ c2·|φ'(0)|
 * where φ(α) = f(x0 + α·d). Only +, −, ×, ÷, sqrt and comparisons, in a fixed order, so the
 * same inputs give the same bits on every engine. No allocation after construction.
 */

/** Loss at x; writes the exact gradient of that loss into grad. One call = one pass over the rows. */
export type Objective = (x: Float64Array, grad: Float64Array) => number;

/**
 * 'wolfe': the point satisfies both strong Wolfe conditions. 'budget': the caller's evaluation
 * budget ran out first. 'failed': no such point within the search's own evaluation limit, or the
 * bracket shrank to rounding level. In the last two cases the best point found is reported.
 */
export type LineSearchStatus = 'wolfe' | 'budget' | 'failed';

export interface LineSearchResult {
  status: LineSearchStatus;
  /** Objective evaluations used. */
  evaluations: number;
  /** True when the best point found lies below φ(0) (it is then in `point`/`gradient`). */
  moved: boolean;
}

export interface LineSearchSettings {
  c1: number;
  c2: number;
  /** Evaluations one search may use before it gives up. */
  maxEvaluations: number;
}

/**
 * A trial step from interpolation must stay at least this fraction of the bracket away from
 * both ends, so the bracket shrinks by a fixed factor whatever the cubic says. 0.1 is common
 * practice with no published source.
 */
const BRACKET_MARGIN = 0.1;

/**
 * Extrapolation bounds while no bracket exists: the next step lies in
 * [α_i + 1.1·(α_i − α_{i−1}), α_i + 4·(α_i − α_{i−1})], the factors of the Moré–Thuente line
 * search (MINPACK-2 dcsrch; from memory).
 */
const EXTRAPOLATE_MIN = 1.1;
const EXTRAPOLATE_MAX = 4;

const EPSILON = 2.220446049250313e-16;

function finite(v: number): boolean {
  return v - v === 0;
}

/**
 * The minimiser of the cubic through (a, fa, ga) and (b, fb, gb) (Nocedal & Wright eq. 3.59);
 * NaN when the cubic has no local minimiser or the data are not finite.
 */
function cubicMinimizer(a: number, fa: number, ga: number, b: number, fb: number, gb: number): number {
  const d1 = ga + gb - (3 * (fa - fb)) / (a - b);
  const disc = d1 * d1 - ga * gb;
  if (!(disc >= 0)) return NaN;
  const root = Math.sqrt(disc);
  const d2 = b > a ? root : -root;
  const alpha = b - ((b - a) * (gb + d2 - d1)) / (gb - ga + 2 * d2);
  return finite(alpha) ? alpha : NaN;
}

/** Trial step inside the bracket (lo, hi): the cubic minimiser kept BRACKET_MARGIN away from both ends. */
function bracketedStep(
  aLo: number,
  fLo: number,
  gLo: number,
  aHi: number,
  fHi: number,
  gHi: number,
  hiFinite: boolean,
): number {
  const left = aLo < aHi ? aLo : aHi;
  const right = aLo < aHi ? aHi : aLo;
  const margin = BRACKET_MARGIN * (right - left);
  // Without finite values at the far end there is nothing to interpolate: bisect.
  const c = hiFinite ? cubicMinimizer(aLo, fLo, gLo, aHi, fHi, gHi) : NaN;
  if (c !== c) return 0.5 * (aLo + aHi);
  if (c < left + margin) return left + margin;
  if (c > right - margin) return right - margin;
  return c;
}

/** Next step while the function still falls steeply: the cubic's minimiser beyond α_i, within the extrapolation bounds. */
function extrapolatedStep(aPrev: number, fPrev: number, gPrev: number, a: number, f: number, g: number): number {
  const span = a - aPrev;
  const lower = a + EXTRAPOLATE_MIN * span;
  const upper = a + EXTRAPOLATE_MAX * span;
  const c = cubicMinimizer(aPrev, fPrev, gPrev, a, f, g);
  if (c !== c || c > upper) return upper;
  return c < lower ? lower : c;
}

export class StrongWolfeLineSearch {
  /** The best point of the last search (valid when it reported `moved`) and its gradient. */
  point: Float64Array;
  gradient: Float64Array;
  /** Loss, step and directional derivative φ'(α) at `point`. */
  loss = NaN;
  alpha = 0;
  slope = NaN;
  /** The point, gradient, loss and φ'(α) of the most recent evaluate(). */
  trialPoint: Float64Array;
  trialGradient: Float64Array;
  trialLoss = NaN;
  trialSlope = NaN;

  constructor(
    size: number,
    private readonly settings: LineSearchSettings,
  ) {
    this.point = new Float64Array(size);
    this.gradient = new Float64Array(size);
    this.trialPoint = new Float64Array(size);
    this.trialGradient = new Float64Array(size);
  }

  resize(size: number): void {
    this.point = new Float64Array(size);
    this.gradient = new Float64Array(size);
    this.trialPoint = new Float64Array(size);
    this.trialGradient = new Float64Array(size);
  }

  /** φ(α) at x0 + α·d (into trialPoint/trialGradient); sets trialSlope = ∇f(x0 + α·d)ᵀd. */
  evaluate(x0: Float64Array, d: Float64Array, alpha: number, objective: Objective): number {
    const xt = this.trialPoint;
    const gt = this.trialGradient;
    const n = xt.length;
    for (let q = 0; q < n; q++) xt[q] = x0[q] + alpha * d[q];
    const f = objective(xt, gt);
    let slope = 0;
    for (let q = 0; q < n; q++) slope += gt[q] * d[q];
    this.trialLoss = f;
    this.trialSlope = slope;
    return f;
  }

  /** The trial just evaluated becomes the best point (buffers swap, nothing is copied). */
  private keepTrial(alpha: number): void {
    const p = this.point;
    const g = this.gradient;
    this.point = this.trialPoint;
    this.gradient = this.trialGradient;
    this.trialPoint = p;
    this.trialGradient = g;
    this.loss = this.trialLoss;
    this.slope = this.trialSlope;
    this.alpha = alpha;
  }

  /**
   * Searches along the descent direction d from x0, whose loss is f0 and whose directional
   * derivative is slope0 < 0, starting with step alpha1. Uses at most `budget` evaluations.
   * A non-finite loss or slope at a trial point counts as a step that is too long.
   */
  search(
    x0: Float64Array,
    f0: number,
    slope0: number,
    d: Float64Array,
    alpha1: number,
    objective: Objective,
    budget: number,
  ): LineSearchResult {
    const { c1, c2 } = this.settings;
    const limit = Math.min(budget, this.settings.maxEvaluations);
    const curvature = -c2 * slope0;
    this.loss = f0;
    this.slope = slope0;
    this.alpha = 0;
    let evaluations = 0;
    const end = (status: LineSearchStatus): LineSearchResult => ({
      status: status === 'failed' && evaluations >= budget ? 'budget' : status,
      evaluations,
      moved: this.alpha > 0,
    });

    // Algorithm 3.5: widen the step until the bracket [lo, hi] holds a Wolfe point. The best
    // point so far (lo) is α = 0 at first, then always the lowest loss satisfying Armijo.
    let aPrev = 0;
    let fPrev = f0;
    let gPrev = slope0;
    let a = alpha1;
    let aHi: number;
    let fHi: number;
    let gHi: number;
    let hiFinite: boolean;
    for (let i = 1; ; i++) {
      if (evaluations >= limit) return end('failed');
      const f = this.evaluate(x0, d, a, objective);
      const g = this.trialSlope;
      evaluations++;
      const ok = finite(f) && finite(g);
      if (!ok || f > f0 + c1 * a * slope0 || (i > 1 && f >= fPrev)) {
        aHi = a;
        fHi = f;
        gHi = g;
        hiFinite = ok;
        break;
      }
      if ((g < 0 ? -g : g) <= curvature) {
        this.keepTrial(a);
        return end('wolfe');
      }
      if (g >= 0) {
        // The minimum lies between the previous step and this one; this one is the lower.
        aHi = aPrev;
        fHi = fPrev;
        gHi = gPrev;
        hiFinite = true;
        this.keepTrial(a);
        break;
      }
      this.keepTrial(a);
      const next = extrapolatedStep(aPrev, fPrev, gPrev, a, f, g);
      aPrev = a;
      fPrev = f;
      gPrev = g;
      a = next;
    }

    // Algorithm 3.6 (zoom): lo is this.alpha with this.loss and this.slope.
    for (;;) {
      if (evaluations >= limit) return end('failed');
      const aLo = this.alpha;
      const width = aHi > aLo ? aHi - aLo : aLo - aHi;
      if (width <= EPSILON * (aHi > aLo ? aHi : aLo)) return end('failed');
      const aj = bracketedStep(aLo, this.loss, this.slope, aHi, fHi, gHi, hiFinite);
      const f = this.evaluate(x0, d, aj, objective);
      const g = this.trialSlope;
      evaluations++;
      const ok = finite(f) && finite(g);
      if (!ok || f > f0 + c1 * aj * slope0 || f >= this.loss) {
        aHi = aj;
        fHi = f;
        gHi = g;
        hiFinite = ok;
        continue;
      }
      if ((g < 0 ? -g : g) <= curvature) {
        this.keepTrial(aj);
        return end('wolfe');
      }
      if (g * (aHi - aLo) >= 0) {
        aHi = aLo;
        fHi = this.loss;
        gHi = this.slope;
        hiFinite = true;
      }
      this.keepTrial(aj);
    }
  }
}
