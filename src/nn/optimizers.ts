/**
 * Weight updates. Each optimiser keeps its per-weight state in typed arrays of the parameter
 * vector's length and updates the parameters in place, allocation-free.
 */
import type { Optimizer } from '../config/types.js';

/** The optimisers that step along one gradient evaluation (L-BFGS lives in lbfgs.ts). */
export type FirstOrderOptimizer = Exclude<Optimizer, 'lbfgs'>;

/** iRprop+ defaults (Riedmiller & Braun 1993; Igel & Hüsken 2003). */
const IRPROP_DEFAULTS = { etaPlus: 1.2, etaMinus: 0.5, delta0: 0.1, deltaMin: 1e-6, deltaMax: 50 } as const;
/** Adam defaults (Kingma & Ba 2015). */
const ADAM_DEFAULTS = { learningRate: 0.001, beta1: 0.9, beta2: 0.999, epsilon: 1e-8 } as const;
/** Backpropagation with momentum: ε 0.1, α 0.9, the values of Rumelhart, Hinton & Williams' 1986 symmetry run (from memory). */
const BACKPROP_DEFAULTS = { learningRate: 0.1, momentum: 0.9 } as const;

export interface OptimizerSettings {
  /** Adam and backprop step size (on the mean gradient). */
  learningRate?: number;
  /** Backprop momentum α. */
  momentum?: number;
  /** Adam mini-batch size in rows; 0 or absent: full batch. */
  batchSize?: number;
}

export interface Updater {
  readonly kind: FirstOrderOptimizer;
  /**
   * One update from the gradient of the loss summed over `rows` rows, whose summed loss
   * before the update is `loss`.
   */
  step(params: Float64Array, grad: Float64Array, loss: number, rows: number): void;
  /** Carry state over to a resized parameter vector; `map[old] = new` (−1 dropped); unmapped new entries start fresh. */
  resize(map: Int32Array, newSize: number): void;
  /** Reset the state of parameters [from, to) (after surgery changed what they mean). */
  resetRange(from: number, to: number): void;
}

function remap(old: Float64Array, map: Int32Array, newSize: number, fresh: number): Float64Array {
  const out = new Float64Array(newSize).fill(fresh);
  for (let q = 0; q < map.length; q++) if (map[q] >= 0) out[map[q]] = old[q];
  return out;
}

/** iRprop+ (Igel & Hüsken): on a sign change, revert the last step only if the error rose. @testOnly */
export class IRpropPlus implements Updater {
  readonly kind = 'irprop+' as const;
  private delta: Float64Array;
  private prevGrad: Float64Array;
  private prevStep: Float64Array;
  private prevLoss = Infinity;

  constructor(size: number) {
    this.delta = new Float64Array(size).fill(IRPROP_DEFAULTS.delta0);
    this.prevGrad = new Float64Array(size);
    this.prevStep = new Float64Array(size);
  }

  step(params: Float64Array, grad: Float64Array, loss: number, _rows?: number): void {
    const { etaPlus, etaMinus, deltaMin, deltaMax } = IRPROP_DEFAULTS;
    const delta = this.delta;
    const prevGrad = this.prevGrad;
    const prevStep = this.prevStep;
    const errorRose = loss > this.prevLoss;
    const n = params.length;
    for (let q = 0; q < n; q++) {
      const g = grad[q];
      const c = g * prevGrad[q];
      if (c > 0) {
        const d = Math.min(delta[q] * etaPlus, deltaMax);
        delta[q] = d;
        const step = g > 0 ? -d : d;
        params[q] += step;
        prevStep[q] = step;
        prevGrad[q] = g;
      } else if (c < 0) {
        delta[q] = Math.max(delta[q] * etaMinus, deltaMin);
        if (errorRose) {
          const step = -prevStep[q];
          params[q] += step;
          prevStep[q] = step;
        } else {
          prevStep[q] = 0;
        }
        prevGrad[q] = 0;
      } else {
        const d = delta[q];
        const step = g > 0 ? -d : g < 0 ? d : 0;
        params[q] += step;
        prevStep[q] = step;
        prevGrad[q] = g;
      }
    }
    this.prevLoss = loss;
  }

  resize(map: Int32Array, newSize: number): void {
    this.delta = remap(this.delta, map, newSize, IRPROP_DEFAULTS.delta0);
    this.prevGrad = remap(this.prevGrad, map, newSize, 0);
    this.prevStep = remap(this.prevStep, map, newSize, 0);
  }

  resetRange(from: number, to: number): void {
    this.delta.fill(IRPROP_DEFAULTS.delta0, from, to);
    this.prevGrad.fill(0, from, to);
    this.prevStep.fill(0, from, to);
    // The function changed, so the last error no longer says whether a step made things worse.
    this.prevLoss = Infinity;
  }

  /** Inspection for tests. */
  state(): { delta: Float64Array; prevGrad: Float64Array; prevStep: Float64Array; prevLoss: number } {
    return { delta: this.delta, prevGrad: this.prevGrad, prevStep: this.prevStep, prevLoss: this.prevLoss };
  }
}

/** Adam (Kingma & Ba 2015), Algorithm 1, on the mean gradient of the batch. */
class Adam implements Updater {
  readonly kind = 'adam' as const;
  private m: Float64Array;
  private v: Float64Array;
  private t = 0;
  private b1t = 1;
  private b2t = 1;
  constructor(
    size: number,
    private readonly lr: number,
  ) {
    this.m = new Float64Array(size);
    this.v = new Float64Array(size);
  }

  step(params: Float64Array, grad: Float64Array, _loss: number, rows: number): void {
    const { beta1, beta2, epsilon } = ADAM_DEFAULTS;
    this.t++;
    this.b1t *= beta1;
    this.b2t *= beta2;
    const c1 = 1 / (1 - this.b1t);
    const c2 = 1 / (1 - this.b2t);
    const inv = 1 / rows;
    const m = this.m;
    const v = this.v;
    const lr = this.lr;
    const n = params.length;
    for (let q = 0; q < n; q++) {
      const g = grad[q] * inv;
      const mq = beta1 * m[q] + (1 - beta1) * g;
      const vq = beta2 * v[q] + (1 - beta2) * g * g;
      m[q] = mq;
      v[q] = vq;
      params[q] -= (lr * (mq * c1)) / (Math.sqrt(vq * c2) + epsilon);
    }
  }

  resize(map: Int32Array, newSize: number): void {
    this.m = remap(this.m, map, newSize, 0);
    this.v = remap(this.v, map, newSize, 0);
  }

  resetRange(from: number, to: number): void {
    this.m.fill(0, from, to);
    this.v.fill(0, from, to);
  }
}

/** Backpropagation with momentum: Δw(t) = −ε ∂E/∂w + α Δw(t−1), on the mean gradient (Rumelhart, Hinton & Williams 1986). */
class Momentum implements Updater {
  readonly kind = 'backprop' as const;
  private prevStep: Float64Array;
  constructor(
    size: number,
    private readonly lr: number,
    private readonly momentum: number,
  ) {
    this.prevStep = new Float64Array(size);
  }

  step(params: Float64Array, grad: Float64Array, _loss: number, rows: number): void {
    const scale = this.lr / rows;
    const alpha = this.momentum;
    const prev = this.prevStep;
    const n = params.length;
    for (let q = 0; q < n; q++) {
      const s = -scale * grad[q] + alpha * prev[q];
      prev[q] = s;
      params[q] += s;
    }
  }

  resize(map: Int32Array, newSize: number): void {
    this.prevStep = remap(this.prevStep, map, newSize, 0);
  }

  resetRange(from: number, to: number): void {
    this.prevStep.fill(0, from, to);
  }
}

export function makeUpdater(kind: FirstOrderOptimizer, size: number, settings: OptimizerSettings): Updater {
  if (kind === 'irprop+') return new IRpropPlus(size);
  if (kind === 'adam') return new Adam(size, settings.learningRate ?? ADAM_DEFAULTS.learningRate);
  return new Momentum(
    size,
    settings.learningRate ?? BACKPROP_DEFAULTS.learningRate,
    settings.momentum ?? BACKPROP_DEFAULTS.momentum,
  );
}
