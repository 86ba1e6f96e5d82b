import { describe, expect, it } from 'vitest';
import { dataChanges } from '../../src/gate/data-changes.js';
import type { DataProfile } from '../../src/data/types.js';
import { profile } from './build.js';

const fp = { before: 'a'.repeat(64), after: 'b'.repeat(64) };

function numeric(mean: number, std: number, min: number, max: number) {
  return { kind: 'numeric' as const, mean, std, min, max, missing: 0 };
}

describe('data changes', () => {
  it('reports rows overall and per class, and classes that appeared or vanished', () => {
    const before = profile();
    const after: DataProfile = {
      ...profile(),
      rows: 2000,
      classes: { imbalance: 500, misalignment: 100, normal: 1400 },
    };
    const ch = dataChanges(before, after, fp);
    expect(ch.changed).toBe(true);
    expect(ch.rows).toEqual({ before: 1800, after: 2000 });
    expect(ch.classes).toEqual([
      { label: 'bearing_wear', before: 450, after: 0 },
      { label: 'imbalance', before: 450, after: 500 },
      { label: 'misalignment', before: 0, after: 100 },
      { label: 'normal', before: 900, after: 1400 },
    ]);
    expect(ch.classesAppeared).toEqual(['misalignment']);
    expect(ch.classesVanished).toEqual(['bearing_wear']);
  });

  it('flags a mean moved by more than half a baseline std, not one moved by exactly half', () => {
    // std 0.5 → half a std is 0.25; values chosen to be exact in binary floating point.
    const before = profile({ features: { a: numeric(1, 0.5, 0, 2), b: numeric(1, 0.5, 0, 2) } });
    const after = profile({ features: { a: numeric(1.25, 0.5, 0, 2), b: numeric(1.2578125, 0.5, 0, 2) } });
    const ch = dataChanges(before, after, fp);
    expect(ch.features.map((f) => f.name)).toEqual(['b']);
    expect(ch.features[0].meanMoved).toBe(true);
    expect(ch.features[0].shiftInStd).toBeCloseTo(0.515625, 12);
    expect(ch.features[0].rangeWidened).toBe(false);
  });

  it('flags a range that grew on a side by more than half a baseline std, not one that grew by exactly half', () => {
    // std 1 → half a std is 0.5; values chosen to be exact in binary floating point.
    const before = profile({
      features: {
        lo: numeric(1, 1, 0, 2),
        hi: numeric(1, 1, 0, 2),
        half: numeric(1, 1, 0, 2),
        in: numeric(1, 1, 0, 2),
      },
    });
    const after = profile({
      features: {
        lo: numeric(1, 1, -0.5078125, 2),
        hi: numeric(1, 1, 0, 2.5078125),
        half: numeric(1, 1, -0.5, 2.5),
        in: numeric(1, 1, 0.5, 1.5),
      },
    });
    const ch = dataChanges(before, after, fp);
    expect(ch.features.map((f) => [f.name, f.rangeWidened, f.meanMoved])).toEqual([
      ['hi', true, false],
      ['lo', true, false],
    ]);
    expect(ch.features[0].rangeBefore).toEqual([0, 2]);
    expect(ch.features[0].rangeAfter).toEqual([0, 2.5078125]);
    expect(ch.features[0].rangeGrowth).toEqual({ below: 0, above: 0.5078125, belowInStd: 0, aboveInStd: 0.5078125 });
    expect(ch.features[1].rangeGrowth).toEqual({ below: 0.5078125, above: 0, belowInStd: 0.5078125, aboveInStd: 0 });
  });

  it('does not call a range widened when a side only moved by a hair, or the other side fell', () => {
    // The two cases seen in use (issue 14), with invented baseline stds of the size such ranges have:
    // 38.669..81.002 → 38.612..80.912 (the minimum 0.057 lower, the maximum fell) and
    // 399.09..705.19 → 399.09..708.22 (the maximum 3.03 higher).
    const before = profile({
      features: { temp: numeric(60, 9, 38.669, 81.002), flow: numeric(550, 60, 399.09, 705.19) },
    });
    const after = profile({
      features: { temp: numeric(60, 9, 38.612, 80.912), flow: numeric(550, 60, 399.09, 708.22) },
    });
    expect(dataChanges(before, after, fp).features).toEqual([]);

    // The same growth with the mean moved as well: listed for the mean, the range not called widened,
    // and the growth per side recorded so a screen can say how small it is.
    const moved = profile({
      features: { temp: numeric(66, 9, 38.612, 80.912), flow: numeric(550, 60, 399.09, 708.22) },
    });
    const [temp] = dataChanges(before, moved, fp).features;
    expect(temp).toMatchObject({ name: 'temp', meanMoved: true, rangeWidened: false });
    expect(temp.rangeGrowth.below).toBeCloseTo(0.057, 12);
    expect(temp.rangeGrowth.above).toBe(0);
    expect(temp.rangeGrowth.belowInStd).toBeCloseTo(0.057 / 9, 12);
  });

  it('counts any mean move of a constant feature as moved (its std is 0)', () => {
    const ch = dataChanges(
      profile({ features: { c: numeric(3, 0, 3, 3) } }),
      profile({ features: { c: numeric(3.1, 0.2, 3, 3.4) } }),
      fp,
    );
    expect(ch.features[0]).toMatchObject({ name: 'c', meanMoved: true, shiftInStd: null, rangeWidened: true });
    expect(ch.features[0].rangeGrowth).toMatchObject({ below: 0, belowInStd: null, aboveInStd: null });
    expect(ch.features[0].rangeGrowth.above).toBeCloseTo(0.4, 12);
  });

  it('reports columns added and removed, and categories that appeared or vanished', () => {
    const before = profile();
    const after = profile({
      columns: ['pump_model', 'rms_velocity', 'band_1x', 'band_2x', 'condition'],
      features: {
        ...profile().features,
        pump_model: { kind: 'categorical', counts: { 'P-200': 800, 'P-300': 400 }, missing: 0 },
      },
    });
    const ch = dataChanges(before, after, fp);
    expect(ch.columnsAdded).toEqual(['band_2x']);
    expect(ch.columnsRemoved).toEqual(['kurtosis']);
    expect(ch.categories).toEqual([{ feature: 'pump_model', appeared: ['P-300'], vanished: ['P-100'] }]);
  });

  it('says nothing changed for the same profile and fingerprint', () => {
    const ch = dataChanges(profile(), profile(), { before: fp.before, after: fp.before });
    expect(ch.changed).toBe(false);
    expect([
      ch.features,
      ch.categories,
      ch.columnsAdded,
      ch.columnsRemoved,
      ch.classesAppeared,
      ch.classesVanished,
    ]).toEqual([[], [], [], [], [], []]);
  });

  it('names a data file that moved, and nothing when it did not', () => {
    expect(dataChanges(profile(), profile(), fp, { before: 'readings.csv', after: 'readings-pr.csv' }).file).toEqual({
      before: 'readings.csv',
      after: 'readings-pr.csv',
    });
    expect(dataChanges(profile(), profile(), fp, { before: 'a.csv', after: 'a.csv' }).file).toBeNull();
  });

  it('has no per-class part for regression data', () => {
    const ch = dataChanges(profile({ classes: null }), profile({ classes: null, rows: 10 }), fp);
    expect(ch.classes).toBeNull();
    expect(ch.rows).toEqual({ before: 1800, after: 10 });
  });
});
