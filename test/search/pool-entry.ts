/**
 * A tiny stand-alone entry, bundled by the pool test with ncc: in the main thread it runs
 * one search and prints the result; started by the pool as a worker, it is the worker.
 * Usage: node <bundle> <case> <workers>
 */
import { resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { isMainThread } from 'node:worker_threads';
import type { EncodedDataset } from '../../src/data/types.js';
import { loadConfig } from '../../src/config/index.js';
import { loadData } from '../../src/data/index.js';
import { runSearch, runSearchWorker } from '../../src/search/index.js';
import type { SearchConfig, TargetConfig } from '../../src/config/types.js';
import { exact, iris, parity, searchConfig } from './fixtures.js';

type Case = [EncodedDataset, SearchConfig, TargetConfig];

/** The invented pump-vibration demo, read through the real config and data pipeline. */
async function demo(file: string): Promise<Case> {
  const config = await loadConfig(resolve(file), process.cwd());
  return [(await loadData(config)).dataset, config.search, config.target];
}

const cases: Record<string, () => Case | Promise<Case>> = {
  demo: () => demo('examples/pump-vibration/neuron-budget.yml'),
  iris: () => [iris().dataset, searchConfig({ maxWidth: 6 }), { metric: 'accuracy', threshold: 0.95 }],
  parity4: () => [parity(4), searchConfig({ maxWidth: 7, maxEpochs: 3000 }), exact],
  'parity3-inplace': () => [parity(3), searchConfig({ growth: 'in-place', maxWidth: 6 }), exact],
};

if (!isMainThread) {
  runSearchWorker();
} else {
  const [name, workers] = process.argv.slice(2);
  Promise.resolve(cases[name]())
    .then(([data, search, target]) =>
      runSearch(data, search, target, { workers: Number(workers), workerEntry: fileURLToPath(import.meta.url) }),
    )
    .then(
      (result) => {
        process.stdout.write(`${JSON.stringify({ ...result, timing: null })}\n`);
        process.stderr.write(`${JSON.stringify(result.timing)}\n`);
      },
      (e: unknown) => {
        process.stderr.write(`${e instanceof Error ? (e.stack ?? e.message) : String(e)}\n`);
        process.exitCode = 1;
      },
    );
}
