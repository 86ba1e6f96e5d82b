/**
 * XOR with a strictly layered network of width 2 (tanh hidden, iRprop+, the published
 * defaults, Nguyen-Widrow initialisation) on the loss's exact gradient: about half the seeds
 * learn the truth table within 2,000 epochs; the rest settle in the flat regions of the XOR loss
 * (loss near 2·ln 2). A general-purpose reference library's L-BFGS-B (SciPy), run from the same
 * starts, solves the same half (test/nn/lbfgs.test.ts), and tfjs showed the same rate (54 of 100
 * seeds here). Restarts, not a changed gradient, are the search's remedy: at this rate 3 of 10
 * restarts reach the target in all but about 5% of searches (binomial, derived).
 * Width 1 can never fit XOR (one monotone hidden unit gives a half-space decision), which is
 * derived lower bound (no shortcut connections); that case must not reach the target.
 */
import { describe, expect, it } from 'vitest';
import { createTrainer } from '../../src/nn/index.js';
import { rngFor } from '../../src/common/random.js';
import { options, xorDataset } from './helpers.js';

describe('XOR', () => {
  it('width 2 learns the truth table for at least 4 of 10 seeds within 2,000 epochs', () => {
    const outcomes: string[] = [];
    let reached = 0;
    for (let r = 0; r < 10; r++) {
      const t = createTrainer(xorDataset(), 2, options({ maxEpochs: 2000 }), rngFor(1, 2, r));
      const rec = t.run(2000);
      outcomes.push(`${r}:${rec.stop}@${rec.epochs} acc ${rec.trainMetric}`);
      if (rec.stop === 'reached' && rec.trainMetric === 1) reached++;
    }
    expect(reached, outcomes.join('; ')).toBeGreaterThanOrEqual(4);
  });

  it('width 1 never reaches 100%', () => {
    for (let r = 0; r < 10; r++) {
      const t = createTrainer(xorDataset(), 1, options(), rngFor(1, 1, r));
      expect(t.run(2000).stop).not.toBe('reached');
    }
  });
});
