/** The training run's stop reasons, metrics and records. */
import { describe, expect, it } from 'vitest';
import { createTrainer, predict, trainerFromNetwork } from '../../src/nn/index.js';
import { meetsThreshold } from '../../src/common/metric.js';
import { rngFor } from '../../src/common/random.js';
import { computeMetrics, metricValue, targetMetric } from '../../src/nn/metrics.js';
import { HEAD_LINEAR, HEAD_LOGISTIC, HEAD_SOFTMAX } from '../../src/nn/kernel/reference.js';
import { Xoshiro128StarStar } from '../../src/common/random.js';
import { dataset, options, xorDataset } from './helpers.js';

describe('training run', () => {
  it('stops as reached on XOR and the record agrees with predict()', () => {
    // Seed found to succeed by running it; the 8-of-10 rate is checked in xor.test.ts.
    let hit = null;
    for (let r = 0; r < 10 && !hit; r++) {
      const t = createTrainer(xorDataset(), 2, options(), rngFor(1, 2, r));
      const rec = t.run(2000);
      if (rec.stop === 'reached') hit = { t, rec };
    }
    if (hit === null) throw new Error('no seed reached the target');
    const { t, rec } = hit;
    expect(rec.steeringMetric).toBe(1);
    const out = predict(t.snapshot(), xorDataset().xTrain, 4);
    expect(Array.from(out, (p) => (p > 0.5 ? 1 : 0))).toEqual([0, 1, 1, 0]);
  });

  it('stops as stalled when the error flattens (width 1 cannot fit XOR)', () => {
    const t = createTrainer(xorDataset(), 1, options({ stall: { window: 50, threshold: 0.01 } }), rngFor(5, 1, 0));
    const rec = t.run(5000);
    expect(rec.stop).toBe('stalled');
    expect(rec.epochs).toBeGreaterThanOrEqual(50);
    expect(rec.epochs).toBeLessThan(5000);
  });

  it('runs to max-epochs without a stall rule when the target is out of reach', () => {
    const t = createTrainer(xorDataset(), 1, options(), rngFor(5, 1, 0));
    const rec = t.run(300);
    expect(rec).toMatchObject({ epochs: 300, stop: 'max-epochs' });
    expect(rec.trainMetric).toBeLessThan(1);
  });

  it('stops as diverged on NaN without throwing', () => {
    const d = dataset('regression', 1, 1, [1, 2, 3], [1, NaN, 2]);
    const t = createTrainer(d, 2, options({ target: { metric: 'rmse', threshold: 0.1 } }), rngFor(1, 2, 0));
    expect(t.run(10).stop).toBe('diverged');
  });

  it('reports regression errors in the original units (times the target std)', () => {
    const d = dataset('regression', 1, 1, [-1, 0, 1], [-1, 0, 1]);
    d.encoding.target.std = 10;
    const t = createTrainer(d, 1, options({ target: { metric: 'max-abs-error', threshold: 0 } }), rngFor(1, 1, 0));
    const before = t.evaluate();
    const out = predict(t.snapshot(), d.xTrain, 3);
    const maxAbs = Math.max(...Array.from(out, (v, p) => Math.abs(v - d.yTrain[p]) * 10));
    expect(before.trainMetric).toBeCloseTo(maxAbs, 12);
  });

  it('meetsThreshold: accuracy at least, errors at most, NaN never', () => {
    expect(meetsThreshold(0.95, { metric: 'accuracy', threshold: 0.95 })).toBe(true);
    expect(meetsThreshold(0.94, { metric: 'accuracy', threshold: 0.95 })).toBe(false);
    expect(meetsThreshold(0.2, { metric: 'rmse', threshold: 0.2 })).toBe(true);
    expect(meetsThreshold(0.21, { metric: 'mae', threshold: 0.2 })).toBe(false);
    expect(meetsThreshold(NaN, { metric: 'max-abs-error', threshold: 1 })).toBe(false);
  });

  it('validation rows judge the target when there are any', () => {
    const d = dataset('classification', 2, 1, [-1, -1, -1, 1, 1, -1, 1, 1], [0, 1, 1, 0], { x: [1, 1], y: [1] });
    const t = createTrainer(d, 2, options(), rngFor(1, 2, 0));
    const rec = t.run(200);
    expect(rec.steeringMetric === 0 || rec.steeringMetric === 1).toBe(true);
  });

  it('the in-loop target metric equals the full metrics record (accuracy by hand on a tiny case)', () => {
    // Two rows, three classes: row 0 predicts class 2 (target 2), row 1 predicts class 0 (target 1).
    const z = Float64Array.from([0, 1, 3, 2, 1, 0]);
    const y = Float64Array.from([2, 1]);
    expect(targetMetric('accuracy', HEAD_SOFTMAX, 3, z, y, 2, 1)).toBe(0.5);
    const rng = new Xoshiro128StarStar(3, 1, 4, 1);
    for (const [head, K, names] of [
      [HEAD_SOFTMAX, 4, ['accuracy']],
      [HEAD_LOGISTIC, 1, ['accuracy']],
      [HEAD_LINEAR, 1, ['rmse', 'mae', 'max-abs-error']],
    ] as const) {
      const rows = 50;
      const logits = new Float64Array(rows * K).map(() => 4 * rng.nextDouble() - 2);
      const t = new Float64Array(rows).map(() =>
        head === HEAD_LINEAR ? rng.nextDouble() : Math.floor(rng.nextDouble() * (K === 1 ? 2 : K)),
      );
      const all = computeMetrics(head, K, logits, t, rows, 3.5);
      for (const name of names) expect(targetMetric(name, head, K, logits, t, rows, 3.5)).toBe(metricValue(all, name));
    }
  });
});

describe('trainerFromNetwork', () => {
  it('continues from a snapshot: same function bit for bit, and a shape mismatch is refused', () => {
    const data = xorDataset();
    const source = createTrainer(data, 3, options(), rngFor(2, 3, 0));
    source.run(50);
    const snap = source.snapshot();
    const copy = trainerFromNetwork(data, snap, options(), rngFor(9, 9, 9));
    expect(copy.snapshot()).toEqual(snap);
    const a = predict(snap, data.xTrain, 4);
    const b = predict(copy.snapshot(), data.xTrain, 4);
    expect(Array.from(b)).toEqual(Array.from(a));
    expect(copy.evaluate().trainLoss).toBe(source.evaluate().trainLoss);
    const other = dataset('classification', 3, 1, [0, 0, 0, 1, 1, 1], [0, 1]);
    expect(() => trainerFromNetwork(other, snap, options(), rngFor(1, 1, 1))).toThrow(/does not fit/);
  });
});
