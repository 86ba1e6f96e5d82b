/**
 * Trains a fixed set of small networks and prints one sha256 per training over the bytes of
 * the final weights (plus the stop reason and epochs). Run under two Node versions by
 * determinism.test.ts; its imports are rewritten to a transpiled copy of src/nn.
 */
import { createHash } from 'node:crypto';
import type { EncodedDataset } from '../../src/data/types.js';
import { type TrainOptions } from '../../src/nn/index.js';
import { rngFor } from '../../src/common/random.js';
import { referenceKernel } from '../../src/nn/kernel/kernel.js';
import { createTrainer } from '../../src/nn/trainer.js';
import { wasmKernel } from '../../src/nn/kernel/wasm.js';

function data(
  task: 'classification' | 'regression',
  inputs: number,
  outputs: number,
  rows: number,
  seed: number,
): EncodedDataset {
  const rng = rngFor(seed, inputs, rows);
  const x = new Float64Array(rows * inputs).map(() => 2 * rng.nextDouble() - 1);
  const y = new Float64Array(rows).map((_, p) => {
    let s = 0;
    for (let i = 0; i < inputs; i++) s += Math.sign(x[p * inputs + i]) * (i + 1);
    if (task === 'regression') return s / inputs;
    return outputs === 1 ? (s > 0 ? 1 : 0) : ((s % outputs) + outputs) % outputs;
  });
  return {
    task,
    inputs,
    outputs,
    trainRows: rows,
    validationRows: 0,
    xTrain: x,
    yTrain: y,
    xValidation: new Float64Array(0),
    yValidation: new Float64Array(0),
    judgingRows: 0,
    xJudging: new Float64Array(0),
    yJudging: new Float64Array(0),
    encoding: { features: [], target: { name: 't', task, classes: null, mean: 0, std: 2 } },
  };
}

const xor: EncodedDataset = {
  ...data('classification', 2, 1, 4, 0),
  xTrain: Float64Array.from([-1, -1, -1, 1, 1, -1, 1, 1]),
  yTrain: Float64Array.from([0, 1, 1, 0]),
};

function base(over: Partial<TrainOptions>): TrainOptions {
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
    ...over,
  };
}

const lines: string[] = [];
for (const [kernelName, kernel] of [
  ['wasm', wasmKernel],
  ['reference', referenceKernel],
] as const) {
  const runs: [string, EncodedDataset, number, TrainOptions][] = [];
  for (let r = 0; r < 10; r++) runs.push([`xor r${r}`, xor, 2, base({})]);
  runs.push([
    'softmax logistic adam',
    data('classification', 5, 3, 61, 1),
    4,
    base({ activation: 'logistic', optimizer: 'adam', optimizerSettings: { learningRate: 0.01, batchSize: 16 } }),
  ]);
  runs.push([
    'regression relu backprop',
    data('regression', 3, 1, 45, 2),
    5,
    base({ activation: 'relu', optimizer: 'backprop', target: { metric: 'rmse', threshold: 0 } }),
  ]);
  runs.push([
    'regression tanh irprop',
    data('regression', 4, 1, 50, 3),
    3,
    base({ target: { metric: 'max-abs-error', threshold: 0 } }),
  ]);
  for (const [name, d, width, opts] of runs) {
    const t = createTrainer(d, width, opts, rngFor(7, width, lines.length % 13), { kernel: kernel() });
    const rec = t.run(300);
    t.addNeuron(rngFor(7, width + 1, 0));
    t.run(50);
    if (t.network.width > 1) t.removeNeuron(0);
    const rec2 = t.run(50);
    const w = (t as unknown as { parameters: Float64Array }).parameters;
    const sha = createHash('sha256')
      .update(new Uint8Array(w.buffer, w.byteOffset, w.byteLength))
      .digest('hex');
    lines.push(`${kernelName} ${name}: ${rec.stop}/${rec.epochs} ${rec2.stop}/${rec2.epochs} ${sha}`);
  }
}
console.log(lines.join('\n'));
