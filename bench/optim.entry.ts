/**
 * Optimiser benchmark entry, bundled and run by bench/optim.mjs. For each problem and each
 * optimiser: fresh restarts at one width, each a real training (the data stage, the search's
 * training options and seeds, the trainer and its checks), timed until the network first meets
 * the target on the rows that judge it. The trainer checks every search.check-every epochs, so
 * that is the resolution of the epoch counts. A training that never meets it runs to its own end
 * (patience, convergence or max-epochs) and counts as not reached.
 */
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { availableParallelism, tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { rngFor } from '../src/common/random.js';
import { loadConfig, settleTarget } from '../src/config/index.js';
import type { Config, Optimizer } from '../src/config/types.js';
import { loadData } from '../src/data/index.js';
import type { EncodedDataset } from '../src/data/types.js';
import { createTrainer } from '../src/nn/index.js';
import type { Kernel } from '../src/nn/kernel/kernel.js';
import { defaultKernel } from '../src/nn/kernel/select.js';
import { appraise } from '../src/search/judge.js';
import { searchContext } from '../src/search/search.js';
import { irisCsv, parityCsv, twoSpiralsCsv } from '../test/helpers/problems.js';

interface Problem {
  name: string;
  width: number;
  /** Loads the problem's config and data. */
  load(): Promise<{ config: Config; data: EncodedDataset }>;
}

async function fromConfig(file: string, root: string): Promise<{ config: Config; data: EncodedDataset }> {
  const loaded = await loadConfig(file, root);
  const data = await loadData(loaded);
  return { config: settleTarget(loaded, data.dataset.task, data.dataset.encoding.target.classes), data: data.dataset };
}

/** A problem from CSV text, judged on its training rows (validation 0), at an accuracy threshold. */
function generated(name: string, width: number, csv: () => string, target: string, threshold: number): Problem {
  return {
    name,
    width,
    async load() {
      const root = mkdtempSync(join(tmpdir(), 'nb-bench-optim-'));
      try {
        writeFileSync(join(root, 'data.csv'), csv());
        const yaml = `data:\n  path: data.csv\n  target: ${target}\n  validation: 0\ntarget:\n  metric: accuracy\n  threshold: ${threshold}\n`;
        writeFileSync(join(root, 'neuron-budget.yml'), yaml);
        return await fromConfig(join(root, 'neuron-budget.yml'), root);
      } finally {
        rmSync(root, { recursive: true, force: true });
      }
    },
  };
}

const demoRoot = resolve('examples/pump-vibration');
const PROBLEMS: Problem[] = [
  generated('XOR', 2, () => parityCsv(2), 'label', 1),
  generated('4-bit parity', 4, () => parityCsv(4), 'label', 1),
  generated('two spirals', 32, twoSpiralsCsv, 'arm', 0.98),
  generated('Iris', 1, irisCsv, 'species', 0.97),
  { name: 'demo (pump-vibration)', width: 3, load: () => fromConfig(join(demoRoot, 'neuron-budget.yml'), demoRoot) },
];
const OPTIMIZERS: Optimizer[] = ['lbfgs', 'irprop+', 'adam', 'backprop'];

/** The default kernel, counting the passes over the training rows (one per epoch, full batch). */
function countingKernel(): { kernel: Kernel; passes: () => number } {
  const inner = defaultKernel();
  let passes = 0;
  const kernel: Kernel = {
    name: inner.name,
    lossAndGradient: (shape, params, x, y, start, end, grad) => {
      passes++;
      return inner.lossAndGradient(shape, params, x, y, start, end, grad);
    },
    forward: (shape, params, x, rows, logits, hidden) => inner.forward(shape, params, x, rows, logits, hidden),
  };
  return { kernel, passes: () => passes };
}

interface Outcome {
  /** Epochs and seconds until the target was first met, or null. */
  epochs: number | null;
  seconds: number | null;
  /** Seconds the training took until it met the target or ended. */
  wall: number;
}

function trainOnce(config: Config, data: EncodedDataset, width: number, restart: number): Outcome {
  const ctx = searchContext(config.search, config.target);
  const { kernel, passes } = countingKernel();
  let trainer: ReturnType<typeof createTrainer> | null = null;
  let outcome: Outcome = { epochs: null, seconds: null, wall: 0 };
  let probing = 0;
  const started = performance.now();
  // Polled at every check of the real trainer: judge the current network as the search would.
  const interrupted = (): boolean => {
    if (trainer === null) return false;
    const t = performance.now();
    const met = appraise(data, trainer.snapshot(), config.target, false).met;
    probing += performance.now() - t;
    if (met) outcome = { epochs: passes(), seconds: (t - started - probing) / 1000, wall: 0 };
    return met;
  };
  trainer = createTrainer(data, width, { ...ctx.train, interrupted }, rngFor(ctx.seed, width, restart), { kernel });
  trainer.run(ctx.train.maxEpochs);
  return { ...outcome, wall: (performance.now() - started - probing) / 1000 };
}

const median = (v: number[]): number => {
  const s = [...v].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 === 1 ? s[m] : (s[m - 1] + s[m]) / 2;
};
const pad = (s: string | number, n: number): string => String(s).padEnd(n);

async function main(): Promise<void> {
  const runsArg = process.argv.find((a) => a.startsWith('--runs='));
  const runs = runsArg ? Number(runsArg.slice(7)) : 10;
  console.log(
    `optimiser benchmark — node ${process.version}, ${availableParallelism()} logical cores, kernel ${defaultKernel().name}, one thread`,
  );
  console.log(
    `${runs} fresh restarts per line (restarts 0..${runs - 1}); epochs = passes over the training rows until the target is first met on the judging rows, seen at the trainer's checks; medians over the restarts that met it (epochs, ms); s, all = seconds of all the restarts, each until it met the target or ended\n`,
  );
  console.log(
    pad('problem', 23) +
      pad('rows (tr/va/ju)', 17) +
      pad('width', 7) +
      pad('target', 8) +
      pad('max-ep', 8) +
      pad('optimiser', 11) +
      pad('met', 7) +
      pad('epochs', 8) +
      pad('ms', 8) +
      's, all',
  );
  for (const p of PROBLEMS) {
    const { config, data } = await p.load();
    for (const optimizer of OPTIMIZERS) {
      const c: Config = { ...config, search: { ...config.search, optimizer } };
      const done: Outcome[] = [];
      let wall = 0;
      for (let r = 0; r < runs; r++) {
        const o = trainOnce(c, data, p.width, r);
        wall += o.wall;
        if (o.epochs !== null) done.push(o);
      }
      const epochs = done.length ? String(Math.round(median(done.map((o) => o.epochs!)))) : '-';
      const ms = done.length ? (1000 * median(done.map((o) => o.seconds!))).toFixed(1) : '-';
      console.log(
        pad(p.name, 23) +
          pad(`${data.trainRows}/${data.validationRows}/${data.judgingRows}`, 17) +
          pad(p.width, 7) +
          pad(config.target.threshold, 8) +
          pad(c.search.maxEpochs, 8) +
          pad(optimizer, 11) +
          pad(`${done.length}/${runs}`, 7) +
          pad(epochs, 8) +
          pad(ms, 8) +
          wall.toFixed(2),
      );
    }
  }
}

main().catch((e: unknown) => {
  process.stderr.write(`${e instanceof Error ? (e.stack ?? e.message) : String(e)}\n`);
  process.exitCode = 1;
});
