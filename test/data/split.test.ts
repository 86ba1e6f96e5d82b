import { describe, expect, it } from 'vitest';
import { SplitMix64, Xoshiro128StarStar, xoshiroFromSeed } from '../../src/common/random.js';
import { splitRows } from '../../src/data/split.js';

const FILE = { path: '/x/d.csv', shown: 'd.csv' };

describe('seeded generators', () => {
  it('xoshiro128** matches the reference implementation (Blackman & Vigna, v1.1)', () => {
    // First outputs for state [1, 2, 3, 4], as produced by the authors' reference C code.
    const g = new Xoshiro128StarStar(1, 2, 3, 4);
    const got = Array.from({ length: 10 }, () => g.nextUint32());
    expect(got).toEqual([
      11520, 0, 5927040, 70819200, 2031721883, 1637235492, 1287239034, 3734860849, 3729100597, 4258142804,
    ]);
  });

  it('SplitMix64 (Steele, Lea & Flood 2014) gives the widely used vector for seed 1234567', () => {
    const g = new SplitMix64(1234567n);
    const got = Array.from({ length: 5 }, () => g.next());
    expect(got).toEqual([
      6457827717110365317n,
      3203168211198807973n,
      9817491932198370423n,
      4593380528125082431n,
      16408922859458223821n,
    ]);
  });

  it('gives doubles in [0, 1) with a plausible mean', () => {
    const g = xoshiroFromSeed(7n);
    const u = () => g.nextDouble();
    let sum = 0;
    let outside = 0;
    for (let i = 0; i < 100_000; i++) {
      const x = u();
      if (!(x >= 0 && x < 1)) outside++;
      sum += x;
    }
    expect(outside).toBe(0);
    // Mean of 1e5 uniforms: standard error 0.0009; 5 standard errors is a safe bound.
    expect(Math.abs(sum / 100_000 - 0.5)).toBeLessThan(0.0046);
  });
});

function labels(counts: number[]): Int32Array {
  const out: number[] = [];
  // Interleave classes so file order is not grouped by class.
  const left = [...counts];
  while (left.some((n) => n > 0)) left.forEach((n, c) => n > 0 && (out.push(c), left[c]--));
  return Int32Array.from(out);
}

describe('stratified split', () => {
  const cases: { counts: number[]; validation: number; seed: number }[] = [
    { counts: [50, 50, 50], validation: 0.25, seed: 1 },
    { counts: [7, 130, 33], validation: 0.2, seed: 2 },
    { counts: [2, 3, 1000], validation: 0.1, seed: 3 },
    { counts: [11, 13], validation: 0.5, seed: 4 },
    { counts: [400, 3, 17, 90], validation: 0.33, seed: 5 },
  ];
  for (const { counts, validation, seed } of cases) {
    it(`keeps each class within one row of exact (${counts.join('/')}, ${validation})`, () => {
      const classIndex = labels(counts);
      const split = splitRows(
        { classIndex, classes: counts.map((_, i) => `c${i}`), rows: classIndex.length, name: 'y', column: 1 },
        { validation, judging: 0 },
        seed,
        FILE,
      );
      const held = counts.map(() => 0);
      const kept = counts.map(() => 0);
      for (const r of split.validation) held[classIndex[r]]++;
      for (const r of split.train) kept[classIndex[r]]++;
      counts.forEach((n, c) => {
        expect(Math.abs(held[c] - n * validation)).toBeLessThanOrEqual(1);
        expect(Math.abs(kept[c] - n * (1 - validation))).toBeLessThanOrEqual(1);
        expect(held[c]).toBeGreaterThanOrEqual(1);
        expect(kept[c]).toBeGreaterThanOrEqual(1);
      });
      // Every row lands in exactly one part, each part ascending.
      const all = [...split.train, ...split.validation].sort((a, b) => a - b);
      expect(all).toEqual(Array.from({ length: classIndex.length }, (_, i) => i));
      for (const part of [split.train, split.validation]) {
        for (let i = 1; i < part.length; i++) expect(part[i]).toBeGreaterThan(part[i - 1]);
      }
    });
  }

  it('is the same for the same seed and differs for another', () => {
    const classIndex = labels([60, 40]);
    const target = { classIndex, classes: ['a', 'b'], rows: 100, name: 'y', column: 1 };
    const a = splitRows(target, { validation: 0.25, judging: 0 }, 9, FILE);
    const b = splitRows(target, { validation: 0.25, judging: 0 }, 9, FILE);
    const c = splitRows(target, { validation: 0.25, judging: 0 }, 10, FILE);
    expect([...a.validation]).toEqual([...b.validation]);
    expect([...a.validation]).not.toEqual([...c.validation]);
  });

  it('holds nothing back with validation 0', () => {
    const classIndex = labels([1, 5]);
    const split = splitRows(
      { classIndex, classes: ['a', 'b'], rows: 6, name: 'y', column: 1 },
      { validation: 0, judging: 0 },
      1,
      FILE,
    );
    expect(split.validation.length).toBe(0);
    expect(split.train.length).toBe(6);
  });

  it('splits regression rows without classes', () => {
    const split = splitRows(
      { classIndex: null, classes: null, rows: 101, name: 'y', column: 1 },
      { validation: 0.2, judging: 0 },
      1,
      FILE,
    );
    expect(split.validation.length).toBe(20);
    expect(split.train.length).toBe(81);
  });

  it('refuses a class too small to split, naming it', () => {
    const classIndex = labels([1, 20]);
    expect(() =>
      splitRows(
        { classIndex, classes: ['rare', 'common'], rows: 21, name: 'y', column: 3 },
        { validation: 0.25, judging: 0 },
        1,
        FILE,
      ),
    ).toThrow(/d\.csv:1:3: .*class "rare" has 1 row/);
  });

  it('three ways: judging rows come out of the training rows, the validation rows stay the same', () => {
    const classIndex = labels([120, 60, 20]);
    const target = { classIndex, classes: ['a', 'b', 'c'], rows: 200, name: 'y', column: 1 };
    const two = splitRows(target, { validation: 0.25, judging: 0 }, 3, FILE);
    const three = splitRows(target, { validation: 0.25, judging: 0.2 }, 3, FILE);
    expect([...three.validation]).toEqual([...two.validation]);
    expect(three.judgingFolded).toBe(false);
    const judged = [0, 0, 0];
    for (const r of three.judging) judged[classIndex[r]]++;
    expect(judged).toEqual([24, 12, 4]);
    // No row in two parts, none lost.
    const all = [...three.train, ...three.validation, ...three.judging].sort((a, b) => a - b);
    expect(all).toEqual(Array.from({ length: 200 }, (_, i) => i));
    const trainSet = new Set(two.train);
    for (const r of three.judging) expect(trainSet.has(r)).toBe(true);
  });

  it('folds the judging rows into the validation rows when a class is too small for three parts', () => {
    const classIndex = labels([2, 40]);
    const split = splitRows(
      { classIndex, classes: ['rare', 'common'], rows: 42, name: 'y', column: 1 },
      { validation: 0.25, judging: 0.2 },
      1,
      FILE,
    );
    expect(split.judgingFolded).toBe(true);
    expect(split.judging.length).toBe(0);
    expect(split.validation.length).toBe(1 + 10);
  });
});
