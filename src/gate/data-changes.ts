/**
 * What changed in the data between the baseline and this run, in the terms a reviewer
 * needs to explain a change of capacity: rows per class, classes, shifted features,
 * columns.
 */
import type { DataProfile, NumericProfile } from '../data/types.js';
import type { CategoryChange, DataChanges, FeatureShift, RangeGrowth } from './types.js';

/**
 * A numeric feature counts as shifted when its mean moved by more than this many
 * baseline standard deviations. Half a standard deviation is a common rule of thumb
 * for a "medium" shift (common practice, no single source).
 */
export const MEAN_SHIFT_IN_STD = 0.5;

/**
 * A numeric feature's range counts as widened when it grew on a side (a new minimum below the
 * baseline's, or a new maximum above it) by more than this many baseline standard deviations.
 * A rule of thumb (common practice, no single source): the extremes of a sample wander by chance
 * as rows are added (for normal data and a thousand rows the sample maximum's spread is about
 * σ/√(2 ln n) ≈ 0.27σ, from extreme-value theory; figure from memory), so a new extreme within
 * a few hundredths of σ of the old one is no change a reviewer should read about, while one
 * half a σ beyond it puts rows where the baseline's networks never saw any.
 */
export const RANGE_GROWTH_IN_STD = 0.5;

export function dataChanges(
  before: DataProfile,
  after: DataProfile,
  fingerprints: { before: string; after: string },
  files: { before: string; after: string } = { before: '', after: '' },
): DataChanges {
  const columnsBefore = new Set(before.columns);
  const columnsAfter = new Set(after.columns);
  const columnsAdded = after.columns.filter((c) => !columnsBefore.has(c));
  const columnsRemoved = before.columns.filter((c) => !columnsAfter.has(c));

  let classes: DataChanges['classes'] = null;
  const classesAppeared: string[] = [];
  const classesVanished: string[] = [];
  if (before.classes !== null || after.classes !== null) {
    const b = tableOf(before.classes);
    const a = tableOf(after.classes);
    const labels = [...new Set([...b.keys(), ...a.keys()])].sort(byCodeUnit);
    classes = labels.map((label) => ({ label, before: b.get(label) ?? 0, after: a.get(label) ?? 0 }));
    for (const label of labels) {
      if (!b.has(label)) classesAppeared.push(label);
      if (!a.has(label)) classesVanished.push(label);
    }
  }

  const features: FeatureShift[] = [];
  const categories: CategoryChange[] = [];
  const featuresBefore = tableOf(before.features);
  const featuresAfter = tableOf(after.features);
  const shared = [...featuresAfter.keys()].filter((name) => featuresBefore.has(name)).sort(byCodeUnit);
  for (const name of shared) {
    const b = featuresBefore.get(name)!;
    const a = featuresAfter.get(name)!;
    if (b.kind === 'numeric' && a.kind === 'numeric') {
      const delta = atMostMax(Math.abs(a.mean - b.mean));
      const shiftInStd = b.std > 0 ? atMostMax(delta / b.std) : null;
      const meanMoved = shiftInStd === null ? delta > 0 : shiftInStd > MEAN_SHIFT_IN_STD;
      const rangeGrowth = growthOf(b, a);
      const rangeWidened = grewMeaningfully(rangeGrowth.below, b.std) || grewMeaningfully(rangeGrowth.above, b.std);
      if (meanMoved || rangeWidened) {
        features.push({
          name,
          meanBefore: b.mean,
          meanAfter: a.mean,
          stdBefore: b.std,
          shiftInStd,
          meanMoved,
          rangeBefore: [b.min, b.max],
          rangeAfter: [a.min, a.max],
          rangeWidened,
          rangeGrowth,
        });
      }
    } else if (b.kind === 'categorical' && a.kind === 'categorical') {
      const countsBefore = tableOf(b.counts);
      const countsAfter = tableOf(a.counts);
      const appeared = [...countsAfter.keys()].filter((c) => !countsBefore.has(c)).sort(byCodeUnit);
      const vanished = [...countsBefore.keys()].filter((c) => !countsAfter.has(c)).sort(byCodeUnit);
      if (appeared.length > 0 || vanished.length > 0) categories.push({ feature: name, appeared, vanished });
    }
  }

  return {
    changed: fingerprints.before !== fingerprints.after,
    file: files.before === files.after ? null : { before: files.before, after: files.after },
    rows: { before: before.rows, after: after.rows },
    classes,
    classesAppeared,
    classesVanished,
    features,
    categories,
    columnsAdded,
    columnsRemoved,
  };
}

/** How far the range reaches beyond the baseline's on each side, in the feature's units and in baseline stds. */
function growthOf(b: NumericProfile, a: NumericProfile): RangeGrowth {
  const below = atMostMax(Math.max(0, b.min - a.min));
  const above = atMostMax(Math.max(0, a.max - b.max));
  const inStd = (g: number): number | null => (b.std > 0 ? atMostMax(g / b.std) : null);
  return { below, above, belowInStd: inStd(below), aboveInStd: inStd(above) };
}

/** A side grew meaningfully: by more than RANGE_GROWTH_IN_STD baseline stds (any growth for a constant feature). */
function grewMeaningfully(growth: number, std: number): boolean {
  return std > 0 ? growth > RANGE_GROWTH_IN_STD * std : growth > 0;
}

/**
 * A profile table as a Map. The tables are keyed by the data's own strings and a baseline file
 * is read with JSON.parse, so a label may be `constructor` or `__proto__`: only own keys count.
 */
function tableOf<T>(table: Record<string, T> | null): Map<string, T> {
  return new Map(table === null ? [] : Object.entries(table));
}

/**
 * Two finite means read from a baseline file can differ by more than the largest float; the
 * shift is then "at least the largest float", never Infinity (which JSON cannot hold).
 */
function atMostMax(x: number): number {
  return Math.min(x, Number.MAX_VALUE);
}

/** Locale-independent order, so the summary reads the same on every machine. */
function byCodeUnit(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0;
}
