import { describe, expect, it } from 'vitest';
import type { EncodedDataset } from '../../src/data/types.js';
import { decideGrowth, runTask, searchContext, growthPlan, tally } from '../../src/search/index.js';
import { searchConfig, shared } from './fixtures.js';

describe('a diverging training', () => {
  it('is a failed restart with its reason, never a crash', () => {
    // Plain gradient descent with a learning rate of 1e6 on a regression target blows up
    // (any step size far above 2 / largest Hessian eigenvalue diverges: standard gradient-descent theory).
    const xs = Array.from({ length: 20 }, (_, i) => i / 10 - 1);
    const ds: EncodedDataset = {
      task: 'regression',
      inputs: 1,
      outputs: 1,
      trainRows: xs.length,
      validationRows: 0,
      xTrain: shared(xs),
      yTrain: shared(xs.map((x) => 3 * x)),
      xValidation: shared([]),
      yValidation: shared([]),
      judgingRows: 0,
      xJudging: new Float64Array(0),
      yJudging: new Float64Array(0),
      encoding: {
        features: [{ kind: 'numeric', name: 'x', mean: 0, std: 1 }],
        target: { name: 'y', task: 'regression', classes: null, mean: 0, std: 1 },
      },
    };
    const search = searchConfig({ optimizer: 'backprop', maxWidth: 1, restarts: 3, required: 1, maxEpochs: 500 });
    const target = { metric: 'rmse', threshold: 0.01 } as const;
    const ctx = searchContext(search, target);
    ctx.train.optimizerSettings = { learningRate: 1e6, momentum: 0.9 };
    const results = [0, 1, 2].map((restart) => runTask(ds, ctx, { width: 1, restart })!);
    for (const r of results) {
      expect(r.stop).toBe('diverged');
      expect(r.reached).toBe(false);
      expect(r.reason).toMatch(/diverged/);
    }
    const d = decideGrowth(growthPlan(search), (t) => results[t.restart]);
    expect(d).toMatchObject({ kind: 'decided', grownWidth: null });
    if (d.kind !== 'decided') throw new Error('undecided');
    const t = tally(growthPlan(search), target, d.tried, [], 1);
    expect(t.widths[0]).toMatchObject({ restarts: 3, reached: 0, met: 0, diverged: 3, best: null, median: null });
    expect(t.width).toBeNull();
  });
});
