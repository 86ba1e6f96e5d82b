/**
 * Benchmark entry, bundled by bench/search.mjs (the worker pool needs a bundle). In the
 * main thread it runs one search and prints one JSON line of figures; started by the
 * pool as a worker, it is the worker. Usage: node <bundle> demo|demo-pr|generated <workers>
 */
import { existsSync } from 'node:fs';
import { loadavg } from 'node:os';
import { resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { isMainThread } from 'node:worker_threads';
import type { SearchConfig, TargetConfig } from '../src/config/types.js';
import { loadConfig } from '../src/config/index.js';
import { loadData } from '../src/data/index.js';
import type { EncodedDataset } from '../src/data/types.js';
import { rngFor } from '../src/common/random.js';
import { runSearch, runSearchWorker } from '../src/search/index.js';

function sharedArray(length: number): Float64Array {
  return new Float64Array(new SharedArrayBuffer(Math.max(1, length) * 8), 0, length);
}

/**
 * Invented benchmark data: 100,000 rows × 30 inputs uniform in [−1, 1]; the class is a band,
 * |x1 + x2 − x3| < 0.6, so two hidden neurons suffice and one does not (a single monotone
 * unit gives a half-space). The other 27 inputs are noise. 75% training, 25% validation.
 */
export function generated(rows = 100_000, inputs = 30): EncodedDataset {
  const rng = rngFor(20240601, 0, 0);
  const trainRows = Math.floor(rows * 0.75);
  const validationRows = rows - trainRows;
  const xTrain = sharedArray(trainRows * inputs);
  const yTrain = sharedArray(trainRows);
  const xValidation = sharedArray(validationRows * inputs);
  const yValidation = sharedArray(validationRows);
  const row = new Float64Array(inputs);
  for (let p = 0; p < rows; p++) {
    for (let i = 0; i < inputs; i++) row[i] = 2 * rng.nextDouble() - 1;
    const y = Math.abs(row[0] + row[1] - row[2]) < 0.6 ? 1 : 0;
    if (p < trainRows) {
      xTrain.set(row, p * inputs);
      yTrain[p] = y;
    } else {
      xValidation.set(row, (p - trainRows) * inputs);
      yValidation[p - trainRows] = y;
    }
  }
  return {
    task: 'classification',
    inputs,
    outputs: 1,
    trainRows,
    validationRows,
    xTrain,
    yTrain,
    xValidation,
    yValidation,
    judgingRows: 0,
    xJudging: new Float64Array(0),
    yJudging: new Float64Array(0),
    encoding: {
      features: Array.from({ length: inputs }, (_, i) => ({
        kind: 'numeric' as const,
        name: `x${i + 1}`,
        mean: 0,
        std: 1,
      })),
      target: { name: 'class', task: 'classification', classes: ['0', '1'], mean: 0, std: 1 },
    },
  };
}

const generatedSearch: SearchConfig = {
  minWidth: 1,
  maxWidth: 6,
  restarts: 5,
  required: 2,
  maxEpochs: 150,
  seed: 1,
  growth: 'fresh',
  start: 'baseline',
  activation: 'tanh',
  optimizer: 'lbfgs',
  patience: 200,
  weightDecay: 0.0001,
  init: null,
  checkEvery: 10,
  pruneEpochs: 100,
  prune: true,
  timeBudget: null,
  maxTrainings: null,
  workers: null,
};

async function main(): Promise<void> {
  const [name, workersArg] = process.argv.slice(2);
  const workers = Number(workersArg);
  let data: EncodedDataset;
  let search: SearchConfig;
  let target: TargetConfig;
  if (name === 'demo' || name === 'demo-pr') {
    const file = resolve(`examples/pump-vibration/neuron-budget${name === 'demo-pr' ? '.pr' : ''}.yml`);
    if (!existsSync(file)) {
      process.stdout.write(`${JSON.stringify({ name, skipped: `${file} not found` })}\n`);
      return;
    }
    const config = await loadConfig(file, process.cwd());
    data = (await loadData(config)).dataset;
    search = config.search;
    target = config.target;
  } else {
    data = generated();
    search = generatedSearch;
    target = { metric: 'accuracy', threshold: 0.95 };
  }
  const cpu0 = process.cpuUsage();
  const r = await runSearch(data, search, target, { workers, workerEntry: fileURLToPath(import.meta.url) });
  const cpu = process.cpuUsage(cpu0);
  const figures = {
    name,
    workers,
    rows: data.trainRows + data.validationRows,
    inputs: data.inputs,
    seconds: r.timing.searchSeconds,
    growthSeconds: r.timing.growthSeconds,
    pruneSeconds: r.timing.pruneSeconds,
    outcome: r.outcome,
    width: r.width,
    grownWidth: r.grownWidth,
    trainings: r.trainings,
    widths: r.widths.map((w) => `${w.width}:${w.reached}/${w.restarts}`).join(' '),
    loadAverage: loadavg()[0],
    /** CPU seconds of all threads of this process during the search. */
    cpuSeconds: (cpu.user + cpu.system) / 1e6,
  };
  process.stdout.write(`${JSON.stringify(figures)}\n`);
}

if (!isMainThread) runSearchWorker();
else
  main().catch((e: unknown) => {
    process.stderr.write(`${e instanceof Error ? (e.stack ?? e.message) : String(e)}\n`);
    process.exitCode = 1;
  });
