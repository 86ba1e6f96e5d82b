/** Builds small encoded datasets for the engine tests. */
import type { EncodedDataset } from '../../src/data/types.js';
import type { TrainOptions } from '../../src/nn/index.js';

export function dataset(
  task: 'classification' | 'regression',
  inputs: number,
  outputs: number,
  x: number[],
  y: number[],
  validation?: { x: number[]; y: number[] },
): EncodedDataset {
  const rows = y.length;
  const classes = task === 'classification' ? Array.from({ length: Math.max(2, outputs) }, (_, k) => `c${k}`) : null;
  return {
    task,
    inputs,
    outputs,
    trainRows: rows,
    validationRows: validation ? validation.y.length : 0,
    xTrain: Float64Array.from(x),
    yTrain: Float64Array.from(y),
    xValidation: Float64Array.from(validation?.x ?? []),
    yValidation: Float64Array.from(validation?.y ?? []),
    judgingRows: 0,
    xJudging: new Float64Array(0),
    yJudging: new Float64Array(0),
    encoding: {
      features: Array.from({ length: inputs }, (_, i) => ({
        kind: 'numeric' as const,
        name: `f${i}`,
        mean: 0,
        std: 1,
      })),
      target: { name: 'target', task, classes, mean: 0, std: 1 },
    },
  };
}

/** The XOR truth table with inputs in {−1, 1} (tanh-friendly) and a two-class target. */
export function xorDataset(): EncodedDataset {
  return dataset('classification', 2, 1, [-1, -1, -1, 1, 1, -1, 1, 1], [0, 1, 1, 0]);
}

export function options(overrides: Partial<TrainOptions> = {}): TrainOptions {
  return {
    activation: 'tanh',
    init: null,
    optimizer: 'irprop+',
    maxEpochs: 2000,
    checkEvery: 1,
    target: { metric: 'accuracy', threshold: 1 },
    stall: null,
    patience: 200,
    weightDecay: 0,
    ...overrides,
  };
}
