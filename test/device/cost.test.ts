/** Device cost figures worked out by hand (the counts the exported C's objects are checked against in export-c.test.ts). */
import { describe, expect, it } from 'vitest';
import { costShapeOf, deviceCost, objectBytes, storedObjects, type CostShape } from '../../src/device/index.js';
import type { Encoding } from '../../src/data/types.js';

// 10 inputs, 3 hidden, 4 outputs (the example): 8 numeric features and one categorical
// feature of 2 categories, four classes.
const shape: CostShape = {
  inputs: 10,
  width: 3,
  outputs: 4,
  numericFeatures: 8,
  categoricalFeatures: 1,
  regression: false,
};

describe('cost of a network', () => {
  it('10 inputs, 3 hidden, 4 outputs: 49 parameters, 42 MACs and the bytes worked out by hand', () => {
    const c = deviceCost(shape);
    // 10·3 + 3 + 3·4 + 4 = 30 + 3 + 12 + 4 = 49;  10·3 + 3·4 = 42
    expect(c.parameters).toBe(49);
    expect(c.macs).toBe(42);
    // float32 flash: 49 parameters · 4 bytes = 196, plus mean and std of 8 numeric features
    // (8 · 2 · 4 = 64) = 260.
    expect(c.flashBytes.float32).toBe(260);
    // int8 flash: weights 30 + 12 = 42 bytes; int32 biases (3 + 4) · 4 = 28; M0 3 · 4 = 12;
    // shifts 3 · 1 = 3; output scales 4 · 4 = 16; activation table 256; zero-points of the input
    // and the pre-activation 1 + 1 = 2; one-hot code 1; mean and multiplier of 8 numeric features
    // 8 · 2 · 4 = 64.  42 + 28 + 12 + 3 + 16 + 256 + 2 + 1 + 64 = 424.
    expect(c.flashBytes.int8).toBe(424);
    // RAM: encoded inputs and hidden vector, (10 + 3) · 4 = 52 bytes in float32, 13 in int8.
    expect(c.ramBytes).toEqual({ float32: 52, int8: 13 });
  });

  it('regression stores the target mean and deviation on the float path; no categorical feature, no one-hot code', () => {
    const base = deviceCost({ ...shape, categoricalFeatures: 0, numericFeatures: 10, outputs: 1 });
    const reg = deviceCost({ ...shape, categoricalFeatures: 0, numericFeatures: 10, outputs: 1, regression: true });
    expect(reg.flashBytes.float32 - base.flashBytes.float32).toBe(8);
    expect(reg.flashBytes.int8).toBe(base.flashBytes.int8);
    expect(
      deviceCost(shape).flashBytes.int8 -
        deviceCost({ ...shape, numericFeatures: 8, categoricalFeatures: 0 }).flashBytes.int8,
    ).toBe(1);
  });

  it('flash is the sum of the stored objects, and one more hidden neuron adds what it stores', () => {
    const c = deviceCost(shape);
    const stored = storedObjects(shape);
    expect(stored.float32.reduce((n, o) => n + objectBytes(o), 0)).toBe(c.flashBytes.float32);
    expect(stored.int8.reduce((n, o) => n + objectBytes(o), 0)).toBe(c.flashBytes.int8);
    const wider = deviceCost({ ...shape, width: 4 });
    // one neuron: D + K weights and a bias in float32 (4 bytes each) …
    expect(wider.flashBytes.float32 - c.flashBytes.float32).toBe(4 * (10 + 4 + 1));
    // … in int8: D + K weight bytes, a 4-byte bias, a 4-byte M0 and a 1-byte shift
    expect(wider.flashBytes.int8 - c.flashBytes.int8).toBe(10 + 4 + 4 + 4 + 1);
    expect(wider.ramBytes.int8 - c.ramBytes.int8).toBe(1);
  });

  it('the shape of a network on an encoding counts its numeric and categorical features', () => {
    const encoding: Encoding = {
      features: [
        { kind: 'categorical', name: 'pump_model', categories: ['AQ-40', 'AQ-55', 'HX-90'] },
        { kind: 'numeric', name: 'rms', mean: 1, std: 2 },
      ],
      target: { name: 'y', task: 'regression', classes: null, mean: 0, std: 1 },
    };
    expect(costShapeOf({ inputs: 4, width: 2, outputs: 1 }, encoding)).toEqual({
      inputs: 4,
      width: 2,
      outputs: 1,
      numericFeatures: 1,
      categoricalFeatures: 1,
      regression: true,
    });
  });
});
