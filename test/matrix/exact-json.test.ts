import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { fromExactJson, toExactJson } from '../../src/matrix/exact-json.js';

describe('exact JSON', () => {
  it('carries NaN, ±Infinity and −0, which plain JSON turns into null and 0', () => {
    const values = [Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY, -0, 0, 1.5];
    expect(JSON.parse(JSON.stringify(values))).toEqual([null, null, null, 0, 0, 1.5]);
    const back = fromExactJson(toExactJson({ values })) as { values: number[] };
    back.values.forEach((v, i) => expect(Object.is(v, values[i])).toBe(true));
  });

  it('round-trips every float64 bit for bit', () => {
    fc.assert(
      fc.property(fc.array(fc.double()), (xs) => {
        const back = fromExactJson(toExactJson(xs)) as number[];
        expect(back.length).toBe(xs.length);
        back.forEach((v, i) => expect(Object.is(v, xs[i])).toBe(true));
      }),
    );
  });
});
