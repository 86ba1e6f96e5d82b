/**
 * One network and its optimiser state while it trains, grows and shrinks.
 *
 * Training follows the exact gradient of the loss it reports (plus the L2 penalty on the weights,
 * when there is one). The steering rows (validation rows, or the training rows when there are
 * none) decide when a training stops: when their loss has not really improved for `patience`
 * epochs, when the optimiser has converged, or at max-epochs. The network handed back is the one
 * with the lowest steering loss among those that met the target on the steering rows (or, when
 * none did, among all checked): early stopping with the best weights restored. The judging rows
 * are never read here.
 */
import { meetsThreshold } from '../common/metric.js';
import type { Init } from '../config/types.js';
import type { EncodedDataset } from '../data/types.js';
import type { Kernel } from './kernel/kernel.js';
import { layoutOf, type Layout, type Shape } from './kernel/layout.js';
import { headCode } from './kernel/reference.js';
import { defaultKernel } from './kernel/select.js';
import type { Objective } from './lbfgs.js';
import { computeMetrics, metricValue, type Metrics } from './metrics.js';
import { defaultInit, describe, fromJson, initParams, toJson } from './network.js';
import type { OptimizerSettings } from './optimizers.js';
import { StallDetector } from './stall.js';
import { makeStepper, type StepResult, type Stepper } from './steppers.js';
import { saliencies, withNeuronAdded, withNeuronRemoved, type Resized } from './surgery.js';
import type { Head, NetworkJson, Rng, StopReason, TrainOptions, TrainRecord, Trainer } from './types.js';

/**
 * A steering loss counts as improved when it falls by more than this fraction of the last
 * improved value; smaller gains do not reset the patience (an engineering choice, no source).
 */
const MIN_IMPROVEMENT = 1e-3;

/** The output head the dataset calls for. */
export function headFor(data: Pick<EncodedDataset, 'task' | 'outputs'>): Head {
  if (data.task === 'regression') return 'linear';
  return data.outputs === 1 ? 'logistic' : 'softmax';
}

export interface TrainerExtras {
  /** Optimiser hyper-parameters beyond the published defaults. */
  optimizerSettings?: OptimizerSettings;
  /** Compute kernel; default: the fastest available. */
  kernel?: Kernel;
}

class NetworkTrainer implements Trainer {
  private shape: Shape;
  private layout: Layout;
  private params: Float64Array;
  private grad: Float64Array;
  /** The best network checked so far, and the best that met the target (see the header). */
  private best: Float64Array;
  private bestMet: Float64Array;
  private readonly stepper: Stepper;
  private readonly init: Init;
  private readonly stall: StallDetector | null;
  private readonly head: number;
  private readonly logitsTrain: Float64Array;
  private readonly logitsSteer: Float64Array;
  private readonly batch: number;
  private batchStart = 0;
  private batchEnd = 0;
  /** The loss over all training rows with the weight penalty, and its gradient: what the optimiser minimises. */
  private readonly objective: Objective;
  /** The same over rows [batchStart, batchEnd) (mini-batch Adam). */
  private readonly batchObjective: Objective;

  constructor(
    private readonly data: EncodedDataset,
    width: number,
    private readonly options: TrainOptions,
    rng: Rng,
    private readonly kernel: Kernel,
    settings: OptimizerSettings,
  ) {
    if (!Number.isInteger(width) || width < 0) throw new RangeError(`width must be a whole number >= 0, got ${width}`);
    if (data.trainRows < 1) throw new RangeError('the training set has no rows');
    if ((data.task === 'classification') !== (options.target.metric === 'accuracy')) {
      throw new RangeError(`target metric ${options.target.metric} does not fit a ${data.task} task`);
    }
    if (!(options.checkEvery >= 1)) throw new RangeError(`checkEvery must be >= 1, got ${options.checkEvery}`);
    if (!(options.weightDecay >= 0)) throw new RangeError(`weightDecay must be >= 0, got ${options.weightDecay}`);
    this.shape = {
      inputs: data.inputs,
      width,
      outputs: data.outputs,
      activation: options.activation,
      head: headFor(data),
    };
    this.layout = layoutOf(this.shape);
    this.head = headCode(this.shape.head);
    this.init = options.init ?? defaultInit(options.activation);
    this.params = initParams(this.shape, this.init, rng);
    this.grad = new Float64Array(this.params.length);
    this.best = new Float64Array(this.params.length);
    this.bestMet = new Float64Array(this.params.length);
    this.stepper = makeStepper(options.optimizer, this.params.length, settings);
    this.stall = options.stall ? new StallDetector(options.stall.window, options.stall.threshold) : null;
    this.logitsTrain = new Float64Array(data.trainRows * data.outputs);
    const steerRows = data.validationRows > 0 ? data.validationRows : data.trainRows;
    this.logitsSteer = new Float64Array(steerRows * data.outputs);
    const b = settings.batchSize ?? 0;
    this.batch = options.optimizer === 'adam' && b > 0 && b < data.trainRows ? b : data.trainRows;
    this.objective = (x, g) => this.penalised(x, g, this.lossOver(x, g, 0, this.data.trainRows));
    this.batchObjective = (x, g) => this.penalised(x, g, this.lossOver(x, g, this.batchStart, this.batchEnd));
  }

  get network() {
    return describe(this.shape);
  }

  /** The live parameter vector (layout in kernel/layout.ts); for tests and benchmarks. */
  get parameters(): Float64Array {
    return this.params;
  }

  private lossOver(x: Float64Array, g: Float64Array, start: number, end: number): number {
    return this.kernel.lossAndGradient(this.shape, x, this.data.xTrain, this.data.yTrain, start, end, g);
  }

  /** Adds (λ/2)·Σw² over the weights (not the biases) to `loss` and λw to their gradient. */
  private penalised(x: Float64Array, g: Float64Array, loss: number): number {
    const lambda = this.options.weightDecay;
    if (lambda === 0) return loss;
    const { w1, b1, w2, b2 } = this.layout;
    let squares = 0;
    for (let q = w1; q < b1; q++) {
      squares += x[q] * x[q];
      g[q] += lambda * x[q];
    }
    for (let q = w2; q < b2; q++) {
      squares += x[q] * x[q];
      g[q] += lambda * x[q];
    }
    return loss + 0.5 * lambda * squares;
  }

  /** One epoch: a full-batch optimiser step, or one pass of mini-batch Adam steps. */
  private epoch(budget: number): StepResult {
    const N = this.data.trainRows;
    if (this.batch >= N) return this.stepper.step(this.params, this.objective, this.grad, budget, N);
    let loss = 0;
    for (let start = 0; start < N; start += this.batch) {
      this.batchStart = start;
      this.batchEnd = Math.min(N, start + this.batch);
      const part = this.stepper.step(this.params, this.batchObjective, this.grad, 1, this.batchEnd - start).loss;
      loss += part;
      if (!Number.isFinite(part)) break;
    }
    return { evaluations: 1, loss, status: 'progress' };
  }

  run(maxEpochs: number): TrainRecord {
    const { options } = this;
    let stop: StopReason = 'max-epochs';
    let epochs = 0;
    let nextCheck = options.checkEvery;
    let reference = Infinity;
    let lastImprovement = 0;
    let bestLoss = Infinity;
    let bestMetLoss = Infinity;
    this.stall?.reset();
    while (epochs < maxEpochs) {
      const step = this.epoch(maxEpochs - epochs);
      epochs += step.evaluations;
      if (!Number.isFinite(step.loss)) {
        stop = 'diverged';
        break;
      }
      const stalled = this.stall !== null && this.stall.record(step.loss / this.data.trainRows);
      const ended = step.status !== 'progress';
      if (epochs < nextCheck && epochs < maxEpochs && !ended && !stalled) continue;
      nextCheck = epochs + options.checkEvery;
      if (options.interrupted?.() === true) {
        stop = 'interrupted';
        break;
      }
      const steer = this.steeringMetrics();
      const metric = metricValue(steer, options.target.metric);
      if (!Number.isFinite(steer.loss) || !Number.isFinite(metric)) {
        stop = 'diverged';
        break;
      }
      if (steer.loss < reference * (1 - MIN_IMPROVEMENT)) {
        reference = steer.loss;
        lastImprovement = epochs;
      }
      if (steer.loss < bestLoss) {
        bestLoss = steer.loss;
        this.best.set(this.params);
      }
      if (meetsThreshold(metric, options.target) && steer.loss < bestMetLoss) {
        bestMetLoss = steer.loss;
        this.bestMet.set(this.params);
      }
      if (ended || stalled || epochs - lastImprovement >= options.patience) {
        stop = 'stalled';
        break;
      }
    }
    if (stop !== 'diverged' && stop !== 'interrupted') {
      if (bestMetLoss < Infinity) this.params.set(this.bestMet);
      else if (bestLoss < Infinity) this.params.set(this.best);
    }
    const rec = this.evaluate();
    if (stop === 'diverged' || stop === 'interrupted') return { ...rec, epochs, stop };
    if (!Number.isFinite(rec.trainLoss)) return { ...rec, epochs, stop: 'diverged' };
    return { ...rec, epochs, stop: rec.stop === 'reached' ? 'reached' : stop };
  }

  private trainMetrics(): Metrics {
    const { data, shape } = this;
    this.kernel.forward(shape, this.params, data.xTrain, data.trainRows, this.logitsTrain, null);
    return computeMetrics(
      this.head,
      shape.outputs,
      this.logitsTrain,
      data.yTrain,
      data.trainRows,
      data.encoding.target.std,
    );
  }

  /** Metrics on the steering rows: the validation rows, or the training rows when there are none. */
  private steeringMetrics(): Metrics {
    const { data, shape } = this;
    if (data.validationRows === 0) return this.trainMetrics();
    this.kernel.forward(shape, this.params, data.xValidation, data.validationRows, this.logitsSteer, null);
    return computeMetrics(
      this.head,
      shape.outputs,
      this.logitsSteer,
      data.yValidation,
      data.validationRows,
      data.encoding.target.std,
    );
  }

  /**
   * One full-batch epoch: forward, backward and the optimiser's step, nothing else (no check).
   * Returns the loss; a non-finite loss leaves the weights untouched. For the engine benchmark.
   */
  fullBatchEpoch(): number {
    return this.stepper.step(this.params, this.objective, this.grad, 1, this.data.trainRows).loss;
  }

  /** Metrics on the training rows and on the steering rows. */
  metrics(): { train: Metrics; validation: Metrics } {
    return { train: this.trainMetrics(), validation: this.steeringMetrics() };
  }

  evaluate(): TrainRecord {
    const { train, validation } = this.metrics();
    const metric = this.options.target.metric;
    const trainMetric = metricValue(train, metric);
    const steeringMetric = metricValue(validation, metric);
    let stop: StopReason = 'max-epochs';
    if (!Number.isFinite(train.loss)) stop = 'diverged';
    else if (meetsThreshold(steeringMetric, this.options.target)) stop = 'reached';
    return { epochs: 0, stop, trainLoss: train.loss, trainMetric, steeringMetric };
  }

  addNeuron(rng: Rng): void {
    this.replace(withNeuronAdded(this.shape, this.params, this.init, rng));
  }

  removeNeuron(j: number): void {
    this.replace(withNeuronRemoved(this.kernel, this.shape, this.params, this.data, j));
    // The output biases absorbed the removed neuron: what the optimiser learnt about them is stale.
    this.stepper.resetRange(this.layout.b2, this.layout.b2 + this.shape.outputs);
  }

  private replace(r: Resized): void {
    this.shape = r.shape;
    this.layout = layoutOf(r.shape);
    this.params = r.params;
    this.grad = new Float64Array(r.params.length);
    this.best = new Float64Array(r.params.length);
    this.bestMet = new Float64Array(r.params.length);
    this.stepper.resize(r.map, r.params.length);
    this.stall?.reset();
  }

  saliency(): Float64Array {
    return saliencies(this.kernel, this.shape, this.params, this.data, this.head);
  }

  snapshot(): NetworkJson {
    return toJson(this.shape, this.params);
  }

  /** Takes over the weights of `net` (same shape); optimiser and stall state stay as new. */
  load(net: NetworkJson): void {
    const { shape, params } = fromJson(net);
    const s = this.shape;
    const same = (['inputs', 'width', 'outputs', 'head', 'activation'] as const).every((k) => shape[k] === s[k]);
    if (!same) {
      throw new RangeError(
        `network ${shape.inputs}-${shape.width}-${shape.outputs} (${shape.activation}, ${shape.head}) does not fit ${s.inputs}-${s.width}-${s.outputs} (${s.activation}, ${s.head})`,
      );
    }
    this.params.set(params);
  }
}

function settingsOf(options: TrainOptions, extras: TrainerExtras): OptimizerSettings {
  return { ...(options.optimizerSettings ?? {}), ...(extras.optimizerSettings ?? {}) };
}

/**
 * A trainer that continues from an existing network: its weights, fresh optimiser and stall
 * state. Deterministic: the same arguments give the same later runs.
 */
export function trainerFromNetwork(
  data: EncodedDataset,
  net: NetworkJson,
  options: TrainOptions,
  rng: Rng,
  extras: TrainerExtras = {},
): Trainer {
  const trainer = new NetworkTrainer(
    data,
    net.width,
    { ...options, activation: net.activation },
    rng,
    extras.kernel ?? defaultKernel(),
    settingsOf(options, extras),
  );
  trainer.load(net);
  return trainer;
}

export function createTrainer(
  data: EncodedDataset,
  width: number,
  options: TrainOptions,
  rng: Rng,
  extras: TrainerExtras = {},
): Trainer & {
  readonly parameters: Float64Array;
  fullBatchEpoch(): number;
  metrics(): { train: Metrics; validation: Metrics };
} {
  return new NetworkTrainer(data, width, options, rng, extras.kernel ?? defaultKernel(), settingsOf(options, extras));
}
