/**
 * Our own elementary functions against the JavaScript engine's Math.* (the general-purpose
 * reference here). They must agree to a few units in the last place; their own results are
 * fixed by IEEE 754 arithmetic, which is what makes training bit-identical across Node versions.
 * Stated accuracy (checked below): tanh, exp, expm1, log and log1p within 3 units in the last
 * place (6.7e-16 relative); the logistic function, computed as (1 + tanh(x/2))/2, within 2.3e-16
 * absolute (its relative error grows where it is tiny, which training does not mind).
 */
import { describe, expect, it } from 'vitest';
import { detExp, detLog, detLog1p, detLogistic, detSoftplus, detTanh } from '../../src/nn/kernel/detmath.js';
import { Xoshiro128StarStar } from '../../src/common/random.js';

function worstRel(f: (x: number) => number, g: (x: number) => number, xs: number[]): number {
  let worst = 0;
  for (const x of xs) {
    const a = f(x);
    const b = g(x);
    if (a === b) continue;
    const e = Math.abs(a - b) / Math.abs(b);
    if (e > worst) worst = e;
  }
  return worst;
}

const rng = new Xoshiro128StarStar(5, 6, 7, 8);
const wide = Array.from({ length: 20000 }, () => (rng.nextDouble() - 0.5) * 60);
const narrow = Array.from({ length: 20000 }, () => (rng.nextDouble() - 0.5) * 2e-3);
const positive = Array.from({ length: 20000 }, () => Math.exp((rng.nextDouble() - 0.5) * 1400));
const edges = [0, -0, 1e-300, -1e-300, 0.3465, -0.3466, 22, -22, 21.99, 40, 700, -700, 709.7, -745];

describe('deterministic elementary functions vs Math.*', () => {
  it('tanh within 3 ulp, odd, saturating to exactly ±1', () => {
    expect(worstRel(detTanh, Math.tanh, [...wide, ...narrow, ...edges])).toBeLessThan(6.7e-16);
    for (const x of wide) expect(detTanh(-x)).toBe(-detTanh(x));
    expect(detTanh(30)).toBe(1);
    expect(detTanh(-1e308)).toBe(-1);
    expect(Number.isNaN(detTanh(NaN))).toBe(true);
  });

  it('exp within 6.7e-16 relative over the whole finite range', () => {
    const xs = [...wide.map((x) => x * 20), ...narrow, ...edges];
    expect(worstRel(detExp, Math.exp, xs)).toBeLessThan(6.7e-16);
    expect(detExp(710)).toBe(Infinity);
    expect(detExp(-746)).toBe(0);
  });

  it('log and log1p within 6.7e-16 relative, including subnormals', () => {
    expect(worstRel(detLog, Math.log, [...positive, 5e-324, 2.2e-308, 1, 2, 0.5, 1e308])).toBeLessThan(6.7e-16);
    expect(worstRel(detLog1p, Math.log1p, [...narrow.map(Math.abs), ...positive.filter((v) => v < 1e10)])).toBeLessThan(
      6.7e-16,
    );
    expect(detLog(0)).toBe(-Infinity);
    expect(Number.isNaN(detLog(-1))).toBe(true);
  });

  it('logistic and softplus agree with their definitions', () => {
    const logistic = (x: number) => 1 / (1 + Math.exp(-x));
    const softplus = (x: number) => Math.max(x, 0) + Math.log1p(Math.exp(-Math.abs(x)));
    let worstAbs = 0;
    for (const x of wide) worstAbs = Math.max(worstAbs, Math.abs(detLogistic(x) - logistic(x)));
    expect(worstAbs).toBeLessThan(2.3e-16);
    expect(worstRel(detSoftplus, softplus, wide)).toBeLessThan(1e-15);
  });

  it('the accuracy check can fail: a float32-rounded tanh is caught', () => {
    expect(worstRel((x) => Math.fround(detTanh(x)), Math.tanh, wide)).toBeGreaterThan(6.7e-16);
  });
});
