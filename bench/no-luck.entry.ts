/**
 * No-luck benchmark entry, bundled and run by bench/no-luck.mjs. Two Gaussian classes with a
 * known Bayes accuracy Φ(1) ≈ 0.8413 (test/helpers/problems.ts); for each data size, each way of
 * judging and each target (Bayes ± 2 points), over seeds 1..n (each a new sample, split and set of
 * starts), counts the searches that claim an adequate width and those that find width 1. The
 * witness is also scored on 50,000 fresh rows of the same distributions, which shows how far its
 * reported metric sits above what it really does.
 *
 * "ours" is the tool's judging: validation rows steer, separate judging rows (data.judging,
 * default 0.2) decide. "today's" emulates the judging before that change with the existing
 * setting data.judging: 0, which judges on the validation rows that also steer.
 */
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { loadConfig, settleTarget } from '../src/config/index.js';
import { loadData } from '../src/data/index.js';
import type { EncodedDataset } from '../src/data/types.js';
import { classesOn, type NetworkJson } from '../src/nn/index.js';
import { runSearch } from '../src/search/index.js';
import { gaussianClassesCsv, gaussianClassRows, PHI_1 } from '../test/helpers/problems.js';

const arg = (name: string, fallback: string): string =>
  process.argv.find((a) => a.startsWith(`--${name}=`))?.slice(name.length + 3) ?? fallback;
const sizes = arg('rows', '1000,2000,5000,10000').split(',').map(Number);
const seeds = Number(arg('seeds', '20'));
const maxWidth = Number(arg('max-width', '4'));
const FRESH_ROWS_PER_CLASS = 25_000;
/** The fresh rows come from seeds far from the ones searched. */
const FRESH_SEED = 1_000_000;

/** Accuracy of `net` on fresh rows, encoded as the dataset encodes its features. */
function trueAccuracy(net: NetworkJson, d: EncodedDataset, seed: number): number {
  const rows = gaussianClassRows(FRESH_ROWS_PER_CLASS, FRESH_SEED + seed);
  const [f1, f2] = d.encoding.features;
  if (f1.kind !== 'numeric' || f2.kind !== 'numeric') throw new Error('expected numeric features');
  const x = new Float64Array(rows.length * 2);
  rows.forEach((r, p) => {
    x[2 * p] = (r.x1 - f1.mean) / f1.std;
    x[2 * p + 1] = (r.x2 - f2.mean) / f2.std;
  });
  const classes = d.encoding.target.classes ?? [];
  const predicted = classesOn(net, x, rows.length);
  let correct = 0;
  rows.forEach((r, p) => {
    if (classes[predicted[p]] === r.label) correct++;
  });
  return correct / rows.length;
}

interface Line {
  claims: number;
  widthOne: number;
  reported: number[];
  truth: number[];
  split: string;
  seconds: number;
}

async function measure(rows: number, judging: 'ours' | "today's", threshold: number): Promise<Line> {
  const line: Line = { claims: 0, widthOne: 0, reported: [], truth: [], split: '', seconds: 0 };
  const started = performance.now();
  for (let seed = 1; seed <= seeds; seed++) {
    const root = mkdtempSync(join(tmpdir(), 'nb-no-luck-'));
    try {
      writeFileSync(join(root, 'classes.csv'), gaussianClassesCsv(rows / 2, seed));
      const yaml = [
        'data:',
        '  path: classes.csv',
        '  target: class',
        '  validation: 0.25',
        ...(judging === 'ours' ? [] : ['  judging: 0']),
        'target:',
        '  metric: accuracy',
        `  threshold: ${threshold}`,
        'search:',
        `  max-width: ${maxWidth}`,
        `  seed: ${seed}`,
        '  workers: 1',
      ].join('\n');
      writeFileSync(join(root, 'neuron-budget.yml'), `${yaml}\n`);
      const loaded = await loadConfig(join(root, 'neuron-budget.yml'), root);
      const data = await loadData(loaded);
      const config = settleTarget(loaded, data.dataset.task, data.dataset.encoding.target.classes);
      const d = data.dataset;
      line.split = `${d.trainRows}/${d.validationRows}/${d.judgingRows}`;
      const r = await runSearch(d, config.search, config.target, { workers: 1 });
      if (r.width !== null) line.claims++;
      if (r.width === 1) line.widthOne++;
      if (r.width !== null && r.witness !== null) {
        line.reported.push(r.witness.judged);
        line.truth.push(trueAccuracy(r.witness.network, d, seed));
      }
    } finally {
      rmSync(root, { recursive: true, force: true });
    }
  }
  line.seconds = (performance.now() - started) / 1000;
  return line;
}

const mean = (v: number[]): string => (v.length === 0 ? '-' : (v.reduce((a, b) => a + b, 0) / v.length).toFixed(4));
const pad = (s: string | number, n: number): string => String(s).padEnd(n);

async function main(): Promise<void> {
  console.log(
    `two Gaussian classes, Bayes accuracy Φ(1) = ${PHI_1.toFixed(4)}; ${seeds} seeds per line; max-width ${maxWidth}, other search keys at their defaults`,
  );
  console.log('split = training/validation/judging rows; "reported" and "true" are means over the claimed witnesses\n');
  console.log(
    pad('rows', 7) +
      pad('judging', 10) +
      pad('split', 17) +
      pad('target', 24) +
      pad('claims', 9) +
      pad('width 1', 9) +
      pad('reported', 10) +
      pad('true', 8) +
      'seconds',
  );
  for (const rows of sizes) {
    for (const judging of ['ours', "today's"] as const) {
      for (const [label, threshold] of [
        ['+ 0.02', PHI_1 + 0.02],
        ['− 0.02', PHI_1 - 0.02],
      ] as const) {
        const l = await measure(rows, judging, threshold);
        console.log(
          pad(rows, 7) +
            pad(judging, 10) +
            pad(l.split, 17) +
            pad(`Bayes ${label} = ${threshold.toFixed(4)}`, 24) +
            pad(`${l.claims}/${seeds}`, 9) +
            pad(`${l.widthOne}/${seeds}`, 9) +
            pad(mean(l.reported), 10) +
            pad(mean(l.truth), 8) +
            l.seconds.toFixed(1),
        );
      }
    }
  }
}

main().catch((e: unknown) => {
  process.stderr.write(`${e instanceof Error ? (e.stack ?? e.message) : String(e)}\n`);
  process.exitCode = 1;
});
