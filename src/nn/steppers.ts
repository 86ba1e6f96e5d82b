/**
 * One optimiser step over the training rows, whatever the optimiser: a first-order update
 * (iRprop+, Adam, backpropagation with momentum) after one evaluation of the loss and its exact
 * gradient, or an L-BFGS iteration (a line search, several evaluations). The trainer counts
 * evaluations as epochs, so every optimiser gets the same budget of passes over the data.
 */
import type { Optimizer } from '../config/types.js';
import { Lbfgs, type Objective } from './lbfgs.js';
import { makeUpdater, type OptimizerSettings, type Updater } from './optimizers.js';

export type StepStatus = 'progress' | 'converged' | 'stuck';

export interface StepResult {
  /** Evaluations of the loss and gradient (passes over the training rows) used. */
  evaluations: number;
  /** Loss at the point the step ended at (or the last one evaluated, for first-order steps). */
  loss: number;
  status: StepStatus;
}

export interface Stepper {
  /**
   * Improves `params` in place, using at most `budget` evaluations (at least one). `rows` is the
   * number of rows the objective's loss sums over (first-order steps move along the mean gradient).
   */
  step(params: Float64Array, objective: Objective, grad: Float64Array, budget: number, rows: number): StepResult;
  /** The parameter vector changed size: map[old] = new index (−1 dropped). */
  resize(map: Int32Array, newSize: number): void;
  /** The parameters in [from, to) changed meaning (surgery): forget what was learnt about them. */
  resetRange(from: number, to: number): void;
}

/** A first-order update: evaluate once, then step along the gradient. */
class FirstOrder implements Stepper {
  private readonly result: StepResult = { evaluations: 1, loss: 0, status: 'progress' };
  constructor(private readonly updater: Updater) {}

  step(params: Float64Array, objective: Objective, grad: Float64Array, _budget: number, rows: number): StepResult {
    const loss = objective(params, grad);
    // A non-finite loss leaves the weights untouched; the trainer stops the run as diverged.
    if (Number.isFinite(loss)) this.updater.step(params, grad, loss, rows);
    this.result.loss = loss;
    return this.result;
  }

  resize(map: Int32Array, newSize: number): void {
    this.updater.resize(map, newSize);
  }

  resetRange(from: number, to: number): void {
    this.updater.resetRange(from, to);
  }
}

/** L-BFGS: each step is one iteration with its strong Wolfe line search. */
class QuasiNewton implements Stepper {
  private lbfgs: Lbfgs;
  constructor(size: number) {
    this.lbfgs = new Lbfgs(size);
  }

  step(params: Float64Array, objective: Objective, _grad: Float64Array, budget: number): StepResult {
    return this.lbfgs.iterate(params, objective, budget);
  }

  resize(map: Int32Array, newSize: number): void {
    this.lbfgs.resize(map, newSize);
  }

  resetRange(): void {
    // The curvature pairs describe the whole vector: after surgery they no longer hold.
    this.lbfgs.reset();
  }
}

export function makeStepper(optimizer: Optimizer, size: number, settings: OptimizerSettings): Stepper {
  return optimizer === 'lbfgs' ? new QuasiNewton(size) : new FirstOrder(makeUpdater(optimizer, size, settings));
}
