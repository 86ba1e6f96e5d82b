// "Did you mean" suggestions: the edit distance and the nearest-name rule.
import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { didYouMean, editDistance, nearest } from '../../src/common/suggest.js';

describe('editDistance (Levenshtein 1966)', () => {
  test('textbook examples', () => {
    // The usual worked examples of Levenshtein distance (from memory, commonly quoted):
    // kitten → sitting is 3, flaw → lawn is 2, saturday → sunday is 3.
    expect(editDistance('kitten', 'sitting')).toBe(3);
    expect(editDistance('flaw', 'lawn')).toBe(2);
    expect(editDistance('saturday', 'sunday')).toBe(3);
    expect(editDistance('', 'abc')).toBe(3);
    expect(editDistance('abc', 'abc')).toBe(0);
  });

  // The distance is a metric, and bounded by the lengths: properties that hold for any
  // correct implementation, checked on random strings over a small alphabet.
  const word = fc.string({ unit: fc.constantFrom('a', 'b', 'c', '-'), maxLength: 9 });
  test('is a metric: identity, symmetry, triangle inequality', () => {
    fc.assert(
      fc.property(word, word, word, (a, b, c) => {
        expect(editDistance(a, b) === 0).toBe(a === b);
        expect(editDistance(a, b)).toBe(editDistance(b, a));
        expect(editDistance(a, c)).toBeLessThanOrEqual(editDistance(a, b) + editDistance(b, c));
      }),
    );
  });
  test('lies between the length difference and the longer length', () => {
    fc.assert(
      fc.property(word, word, (a, b) => {
        const d = editDistance(a, b);
        expect(d).toBeGreaterThanOrEqual(Math.abs(a.length - b.length));
        expect(d).toBeLessThanOrEqual(Math.max(a.length, b.length));
      }),
    );
  });
  test('one edit is distance 1', () => {
    fc.assert(
      fc.property(word, fc.nat(), fc.constantFrom('x', 'y'), (a, at, ch) => {
        const i = a.length === 0 ? 0 : at % (a.length + 1);
        expect(editDistance(a, a.slice(0, i) + ch + a.slice(i))).toBe(1);
      }),
    );
  });
});

describe('nearest', () => {
  const keys = ['min-width', 'max-width', 'restarts', 'required', 'max-epochs', 'seed'];
  test.each([
    ['restart', 'restarts'],
    ['max_width', 'max-width'],
    ['MaxWidth', 'max-width'],
    ['maxepochs', 'max-epochs'],
    ['sed', 'seed'],
    ['requird', 'required'],
  ])('%s → %s', (typo, expected) => {
    expect(nearest(typo, keys)).toBe(expected);
  });
  test.each(['learning-rate', 'xyz', 'hidden-layers'])('%s is too far from every key', (name) => {
    expect(nearest(name, keys)).toBeNull();
    expect(didYouMean(name, keys)).toBe('');
  });
  test('didYouMean quotes the match', () => {
    expect(didYouMean('restart', keys)).toBe(' (did you mean "restarts"?)');
  });
  test('no candidates, no suggestion', () => {
    expect(nearest('a', [])).toBeNull();
  });
});
