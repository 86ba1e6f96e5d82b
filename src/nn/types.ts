/** The training engine's types, shared by its modules and by the search. */
import type { Activation, Init, Optimizer, TargetConfig } from '../config/types.js';
import type { Rng } from '../common/random.js';
import type { OptimizerSettings } from './optimizers.js';

export type { Rng } from '../common/random.js';

export type { Head } from './kernel/layout.js';
import type { Head } from './kernel/layout.js';

/** An opaque trained or untrained network; weights live in contiguous typed memory. */
export interface Network {
  readonly inputs: number;
  readonly width: number;
  readonly outputs: number;
  readonly activation: Activation;
  readonly head: Head;
}

/** Plain-JSON form of a network (the witness export's `network` part). */
export interface NetworkJson {
  inputs: number;
  width: number;
  outputs: number;
  activation: Activation;
  head: Head;
  /** width rows of inputs weights. */
  hiddenWeights: number[][];
  hiddenBias: number[];
  /** outputs rows of width weights. */
  outputWeights: number[][];
  outputBias: number[];
}

/**
 * 'reached': the steering rows met the target when training stopped; 'stalled': the steering loss
 * stopped improving (or the optimiser converged) without meeting it; 'interrupted':
 * TrainOptions.interrupted said to give up, and the caller discards such a run.
 */
export type StopReason = 'reached' | 'stalled' | 'diverged' | 'max-epochs' | 'interrupted';

export interface TrainOptions {
  activation: Activation;
  init: Init | null;
  optimizer: Optimizer;
  maxEpochs: number;
  /** The steering rows are checked every this many epochs (an epoch is one pass over the training rows). */
  checkEvery: number;
  /** The target the steering rows are checked against (they steer; they do not judge). */
  target: TargetConfig;
  /**
   * Epochs without a real improvement of the steering loss (by MIN_IMPROVEMENT, relative) after
   * which a training stops, whether or not the target was met: early stopping on the validation
   * rows, and the bound on polishing a network that met the target.
   */
  patience: number;
  /** L2 penalty λ on the weights (not the biases): the loss gains (λ/2)·Σw², summed over all rows' loss. */
  weightDecay: number;
  /** Dynamic Node Creation trigger; null: never stop for it. */
  stall: { window: number; threshold: number } | null;
  /** Optional optimiser hyper-parameters (learning rate, momentum, Adam batch size); published defaults otherwise. */
  optimizerSettings?: OptimizerSettings;
  /**
   * Polled at each check (every checkEvery epochs); true stops the run as 'interrupted'. Lets a
   * worker give up a training whose answer is no longer needed, or whose time ran out.
   */
  interrupted?: () => boolean;
}

export interface TrainRecord {
  /** Epochs run by this call (an L-BFGS epoch is one evaluation of the loss and its gradient). */
  epochs: number;
  stop: StopReason;
  /** Mean loss on the training rows, without the weight penalty. */
  trainLoss: number;
  /** The target metric on the training rows (original units for regression). */
  trainMetric: number;
  /** The target metric on the steering rows (validation rows; training rows when there are none). */
  steeringMetric: number;
}

/**
 * Owns one network and its optimiser state while it trains, grows and shrinks.
 */
export interface Trainer {
  readonly network: Network;
  /** Train up to `maxEpochs` more epochs (stopping early as the options say). */
  run(maxEpochs: number): TrainRecord;
  /** Add a hidden neuron without changing the network's function; resets its optimiser state. */
  addNeuron(rng: Rng): void;
  /** Remove hidden neuron j, folding its mean activation (over training rows) into the output biases. */
  removeNeuron(j: number): void;
  /** Compensated-ablation loss increase per hidden neuron, in one pass over the training rows. */
  saliency(): Float64Array;
  /** The current metrics without training. */
  evaluate(): TrainRecord;
  /** A deep copy of the current network. */
  snapshot(): NetworkJson;
}
