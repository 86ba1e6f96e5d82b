/**
 * The training engine's public surface, used by src/search. Pure computation: no I/O,
 * no clocks, no Math.random.
 */
import type { Activation, Init, Optimizer, TargetConfig } from '../config/types.js';
import type { EncodedDataset } from '../data/types.js';
import type { OptimizerSettings } from './optimizers.js';
import { rngFor as rngForImpl } from './rng.js';
import { createTrainer as createTrainerImpl, trainerFromNetwork as trainerFromNetworkImpl } from './trainer.js';
import { fromJson } from './network.js';
import { referenceForward, makeScratch, headCode, headOutputs } from './reference.js';
import { meetsTarget as meetsTargetImpl } from './metrics.js';

export type { OptimizerSettings } from './optimizers.js';
export type { Metrics } from './metrics.js';
export { headFor, FLAT_SPOT_OFFSET } from './trainer.js';

export type Head = 'softmax' | 'logistic' | 'linear';

/** A seeded xoshiro128** 1.1 stream. */
export interface Rng {
  /** Next 32-bit unsigned integer. */
  nextUint32(): number;
  /** Next double in [0, 1) with 53 random bits. */
  nextDouble(): number;
}

/** Independent stream for restart `restart` of width `width` under base seed `seed`. */
export function rngFor(seed: number, width: number, restart: number): Rng {
  return rngForImpl(seed, width, restart);
}

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

export function createTrainer(data: EncodedDataset, width: number, options: TrainOptions, rng: Rng): Trainer {
  return createTrainerImpl(data, width, options, rng);
}

/**
 * A trainer that continues from an existing network (any width): its weights, with fresh
 * optimiser and stall state. The prune phase restores refused removals with it.
 */
export function trainerFromNetwork(data: EncodedDataset, net: NetworkJson, options: TrainOptions, rng: Rng): Trainer {
  return trainerFromNetworkImpl(data, net, options, rng);
}

/** Run a network on encoded rows; returns rows * outputs head outputs (probabilities or standardised values). */
export function predict(net: NetworkJson, x: Float64Array, rows: number): Float64Array {
  const { shape, params } = fromJson(net);
  const K = shape.outputs;
  const logits = new Float64Array(rows * K);
  referenceForward(shape, params, x, rows, logits, null, makeScratch(shape.width, K));
  const out = new Float64Array(rows * K);
  const head = headCode(shape.head);
  for (let p = 0; p < rows; p++) headOutputs(head, K, logits, p * K, out, p * K);
  return out;
}

/** True when `value` meets the target (accuracy: >= threshold; error metrics: <= threshold). */
export function meetsTarget(value: number, target: TargetConfig): boolean {
  return meetsTargetImpl(value, target);
}
