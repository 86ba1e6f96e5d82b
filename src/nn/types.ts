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

/** 'interrupted': TrainOptions.interrupted said to give up; the caller discards such a run. */
export type StopReason = 'reached' | 'stalled' | 'diverged' | 'max-epochs' | 'interrupted';

export interface TrainOptions {
  activation: Activation;
  init: Init | null;
  optimizer: Optimizer;
  maxEpochs: number;
  /** The target is checked on the validation rows (training rows when there are none) every this many epochs. */
  checkEvery: number;
  target: TargetConfig;
  /** Dynamic Node Creation trigger; null: never stop as stalled. */
  stall: { window: number; threshold: number } | null;
  /** Optional optimiser hyper-parameters (learning rate, momentum, Adam batch size); published defaults otherwise. */
  optimizerSettings?: OptimizerSettings;
  /**
   * Flat-spot elimination: added to the tanh/logistic derivative when training, so a
   * saturated neuron still learns. Default FLAT_SPOT_OFFSET; 0 trains on the exact gradient.
   */
  primeOffset?: number;
  /**
   * Polled at each target check (every checkEvery epochs); true stops the run as
   * 'interrupted'. Lets a worker give up a training whose answer is no longer needed.
   */
  interrupted?: () => boolean;
}

export interface TrainRecord {
  /** Epochs run by this call. */
  epochs: number;
  stop: StopReason;
  trainLoss: number;
  /** The target metric on the training rows (original units for regression). */
  trainMetric: number;
  /** The target metric on the validation rows (training rows when there are none). */
  validationMetric: number;
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
