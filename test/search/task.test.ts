/** One growth task: it equals one run of the engine, and a pool can call it off mid-way. */
import { describe, expect, it } from 'vitest';
import { createTrainer } from '../../src/nn/index.js';
import { rngFor } from '../../src/common/random.js';
import { runTask, searchContext } from '../../src/search/index.js';
import { exact, parity, searchConfig } from './fixtures.js';

describe('growth task', () => {
  it.each([
    [2, 3, 7],
    [3, 0, 10],
    [1, 1, 250],
  ])(
    'width %i restart %i, check every %i: the same record as the engine run it wraps',
    (width, restart, checkEvery) => {
      const data = parity(3);
      const ctx = searchContext(searchConfig({ maxEpochs: 900, checkEvery }), exact);
      const sliced = runTask(data, ctx, { width, restart })!;
      const whole = createTrainer(data, width, { ...ctx.train, stall: null }, rngFor(ctx.seed, width, restart)).run(
        900,
      );
      expect(sliced.epochs).toBe(whole.epochs);
      expect(sliced.stop).toBe(whole.stop);
      expect(Object.is(sliced.steering, whole.steeringMetric)).toBe(true);
    },
  );

  it('gives up at the next target check once cancelled, and only then', () => {
    const data = parity(3);
    const ctx = searchContext(searchConfig({ maxEpochs: 900, checkEvery: 10 }), exact);
    // Width 1 cannot represent 3-bit parity, so this training runs all 900 epochs unless stopped.
    let looks = 0;
    expect(runTask(data, ctx, { width: 1, restart: 0 }, () => ++looks >= 2)).toBeNull();
    expect(looks).toBe(2);
    expect(runTask(data, ctx, { width: 1, restart: 0 }, () => false)).not.toBeNull();
  });
});
