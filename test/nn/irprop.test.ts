/**
 * iRprop+ against the published rule (C. Igel & M. Hüsken, "Empirical evaluation of the
 * improved Rprop learning algorithms", Neurocomputing 50:105–123, 2003), with the published
 * defaults η+ 1.2, η− 0.5, Δ0 0.1, Δmin 1e-6, Δmax 50, on a sequence worked out by hand.
 */
import { describe, expect, it } from 'vitest';
import { IRpropPlus } from '../../src/nn/optimizers.js';

describe('iRprop+', () => {
  it('follows the rule step by step, including sign changes after an error increase and a decrease', () => {
    const opt = new IRpropPlus(1);
    const w = new Float64Array([0]);
    const g = new Float64Array(1);
    const step = (grad: number, loss: number) => {
      g[0] = grad;
      opt.step(w, g, loss, 1);
      const s = opt.state();
      return { w: w[0], delta: s.delta[0], prevGrad: s.prevGrad[0], prevStep: s.prevStep[0] };
    };
    // 1. No previous gradient: step −sign(g)·Δ0 = −0.1.
    let s = step(2, 10);
    expect(s.w).toBeCloseTo(-0.1, 15);
    expect(s.delta).toBe(0.1);
    // 2. Same sign: Δ = 0.1·1.2 = 0.12, step −0.12, w = −0.22.
    s = step(1, 8);
    expect(s.delta).toBeCloseTo(0.12, 15);
    expect(s.w).toBeCloseTo(-0.22, 15);
    // 3. Sign change and the error rose (9 > 8): Δ = 0.06, the last step is taken back (+0.12), gradient stored as 0.
    s = step(-3, 9);
    expect(s.delta).toBeCloseTo(0.06, 15);
    expect(s.w).toBeCloseTo(-0.1, 15);
    expect(s.prevGrad).toBe(0);
    expect(s.prevStep).toBeCloseTo(0.12, 15);
    // 4. Previous gradient 0: plain step −sign(g)·Δ = +0.06, w = −0.04; Δ unchanged.
    s = step(-2, 7);
    expect(s.delta).toBeCloseTo(0.06, 15);
    expect(s.w).toBeCloseTo(-0.04, 15);
    // 5. Sign change but the error fell (6.5 < 7): Δ = 0.03, no move, gradient stored as 0.
    s = step(1, 6.5);
    expect(s.delta).toBeCloseTo(0.03, 15);
    expect(s.w).toBeCloseTo(-0.04, 15);
    expect(s.prevStep).toBe(0);
    expect(s.prevGrad).toBe(0);
    // 6. Previous gradient 0 again: step −0.03, w = −0.07.
    s = step(1, 6);
    expect(s.w).toBeCloseTo(-0.07, 15);
  });

  it('a zero gradient does not move the weight (sign(0) = 0)', () => {
    const opt = new IRpropPlus(1);
    const w = new Float64Array([0.5]);
    opt.step(w, new Float64Array([0]), 1, 1);
    expect(w[0]).toBe(0.5);
  });

  it('clamps the step size to Δmax = 50 and Δmin = 1e-6', () => {
    const up = new IRpropPlus(1);
    const w = new Float64Array(1);
    for (let t = 0; t < 60; t++) up.step(w, new Float64Array([1]), 1, 1);
    expect(up.state().delta[0]).toBe(50);
    const down = new IRpropPlus(1);
    for (let t = 0; t < 80; t++) down.step(w, new Float64Array([t % 2 === 0 ? 1 : -1]), 1, 1);
    expect(down.state().delta[0]).toBe(1e-6);
  });
});
