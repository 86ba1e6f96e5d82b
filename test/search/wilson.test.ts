import { describe, expect, it } from 'vitest';
import { wilsonInterval } from '../../src/search/wilson.js';

// Check table: Wilson score interval (E. B. Wilson, JASA 22(158):209–212, 1927), 95%, z = 1.959964.
// Values computed from Wilson's formula to 4 decimals; the same figures come out of R's
// prop.test(correct = FALSE) (that cross-check is from memory).
const table: [number, number, number, number][] = [
  [0, 10, 0, 0.2775],
  [3, 10, 0.1078, 0.6032],
  [5, 10, 0.2366, 0.7634],
  [8, 10, 0.4902, 0.9433],
  [10, 10, 0.7225, 1],
  [0, 20, 0, 0.1611],
  [20, 20, 0.8389, 1],
];

describe('wilsonInterval (Wilson 1927)', () => {
  for (const [k, n, lo, hi] of table) {
    it(`${k}/${n} → [${lo}, ${hi}]`, () => {
      const [a, b] = wilsonInterval(k, n);
      expect(a).toBeCloseTo(lo, 4);
      expect(b).toBeCloseTo(hi, 4);
    });
  }

  it('one-sided 95% lower bounds (z = 1.644854): 10/10 → 0.7871, 9/10 → 0.6523', () => {
    // The one-sided 95% bound is the lower end of the two-sided 90% Wilson interval.
    expect(wilsonInterval(10, 10, 1.644854)[0]).toBeCloseTo(0.7871, 4);
    expect(wilsonInterval(9, 10, 1.644854)[0]).toBeCloseTo(0.6523, 4);
  });

  it('no trials gives the uninformative interval', () => {
    expect(wilsonInterval(0, 0)).toEqual([0, 1]);
  });
});
