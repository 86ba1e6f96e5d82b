/**
 * Per-class targets. Overall accuracy can hide a rare class that a network never catches: on
 * generated data (invented, for this check only) with two large classes split by x and a rare
 * third class of 2% in four small blobs above and below them (|y| ≈ 3), one hidden unit sees only
 * one projection of the inputs and the rare class can own only one interval of it, so at most two
 * of its four blobs (derived): a width-1 network is still 98% accurate but catches at most about
 * half of the rare class. A recall floor of 0.8 for it makes width 1 fail and a larger width pass.
 */
import { describe, expect, it } from 'vitest';
import { xoshiroFromSeed } from '../../src/common/random.js';
import { appraise } from '../../src/search/judge.js';
import { runSearch } from '../../src/search/index.js';
import type { EncodedDataset } from '../../src/data/types.js';
import { searchConfig, shared } from './fixtures.js';
import { confusion, recalls, recallsHold } from '../../src/search/classes.js';

/** Rows of classes common-left (0), common-right (1), rare (2): ±x halves, and blobs at (±0.7, ±3). */
function rareClassData(seed: number): EncodedDataset {
  const rng = xoshiroFromSeed(BigInt(seed));
  const part = (n: number) => {
    const x: number[] = [];
    const y: number[] = [];
    for (let i = 0; i < n; i++) {
      const r = rng.nextDouble();
      if (r < 0.02) {
        const sx = rng.nextDouble() < 0.5 ? -1 : 1;
        const sy = rng.nextDouble() < 0.5 ? -1 : 1;
        x.push(sx * (0.7 + rng.nextDouble() * 0.2), sy * (3 + rng.nextDouble() * 0.5));
        y.push(2);
      } else {
        const left = r < 0.51;
        x.push((left ? -1 : 1) * (0.2 + rng.nextDouble()), rng.nextDouble() * 2 - 1);
        y.push(left ? 0 : 1);
      }
    }
    return { x: shared(x), y: shared(y), rows: n };
  };
  const train = part(2000);
  const validation = part(1000);
  const judging = part(2000);
  return {
    task: 'classification',
    inputs: 2,
    outputs: 3,
    trainRows: train.rows,
    validationRows: validation.rows,
    xTrain: train.x,
    yTrain: train.y,
    xValidation: validation.x,
    yValidation: validation.y,
    judgingRows: judging.rows,
    xJudging: judging.x,
    yJudging: judging.y,
    encoding: {
      features: [
        { kind: 'numeric', name: 'x', mean: 0, std: 1 },
        { kind: 'numeric', name: 'y', mean: 0, std: 1 },
      ],
      target: { name: 'class', task: 'classification', classes: ['left', 'right', 'rare'], mean: 0, std: 1 },
    },
  };
}

describe('confusion matrix and recall', () => {
  it('counts every row once, rows by true class and columns by predicted class', () => {
    const m = confusion([0, 1, 1, 2, 0, 2], [0, 1, 0, 2, 0, 1], 3);
    expect(m).toEqual([
      [2, 1, 0],
      [0, 1, 1],
      [0, 0, 1],
    ]);
    expect(m.flat().reduce((s, v) => s + v, 0)).toBe(6);
    expect(recalls(m)).toEqual([2 / 3, 0.5, 1]);
    expect(recallsHold(m, [0, 0.5, 0.9])).toBe(true);
    expect(recallsHold(m, [0.7, 0, 0])).toBe(false);
  });
});

describe('a rare class that overall accuracy hides', () => {
  const data = rareClassData(5);
  const search = searchConfig({ maxWidth: 3, restarts: 4, required: 2, maxEpochs: 1500 });
  const accuracy = { metric: 'accuracy' as const, threshold: 0.95 };

  it('without a recall floor, width 1 is adequate although the rare class is never caught', async () => {
    const r = await runSearch(data, search, accuracy);
    expect(r.width).toBe(1);
    const a = appraise(data, r.witness!.network, accuracy, false);
    expect(a.float32).toBeGreaterThanOrEqual(0.95);
    expect(a.confusion!.flat().reduce((s, v) => s + v, 0)).toBe(data.judgingRows);
    expect(a.recall![2]).toBeLessThan(0.6);
  });

  it('with a recall floor of 0.8 on the rare class, width 1 fails and a larger width passes', async () => {
    const target = { ...accuracy, minRecall: { classes: [{ label: 'rare', min: 0.8 }] }, recallFloors: [0, 0, 0.8] };
    const r = await runSearch(data, search, target);
    expect(r.widths[0]).toMatchObject({ width: 1, met: 0, adequate: false });
    expect(r.width).toBeGreaterThan(1);
    const a = appraise(data, r.witness!.network, target, false);
    expect(a.recall![2]).toBeGreaterThanOrEqual(0.8);
    expect(a.met).toBe(true);
  });
});
