/**
 * Why no width is adequate, in sentences a reviewer can act on, read off the per-width curve:
 * - networks met the target, but too few of one width (say how many, and how many are required);
 * - the networks fit the training rows but not the judging rows: too few rows or too much noise;
 * - more neurons still help: the curve still improves at max-width, which is too small;
 * - the curve is flat and even the training rows are not fitted: the features may not carry the target.
 * And how far a search got when its budget ran out.
 */
import { formatMetric, neurons, targetShort } from '../common/format.js';
import { higherIsBetter, isBetter, meetsThreshold } from '../common/metric.js';
import type { TargetConfig } from '../config/types.js';
import type { GrowthPlan, WidthSummary } from './types.js';

/** Widths at the top of the range whose best is compared with the rest to tell a rising curve. */
const TOP_WIDTHS = 3;
/**
 * A curve still rises when its best over the top widths beats the best before them by more than
 * this (accuracy points, or this fraction of an error metric's value); an engineering choice.
 */
const RISE = 0.005;

function span(from: number, to: number): string {
  return from === to ? `width ${from}` : `widths ${from}–${to}`;
}

function bestAt(
  widths: WidthSummary[],
  target: TargetConfig,
  pickTrain = false,
): { width: number; value: number } | null {
  let best: { width: number; value: number } | null = null;
  for (const w of widths) {
    const v = pickTrain ? w.bestTrain : w.best;
    if (v !== null && (best === null || isBetter(target.metric, v, best.value))) best = { width: w.width, value: v };
  }
  return best;
}

function rises(
  widths: WidthSummary[],
  target: TargetConfig,
): { from: { width: number; value: number }; to: { width: number; value: number } } | null {
  if (widths.length <= TOP_WIDTHS) return null;
  const top = bestAt(widths.slice(-TOP_WIDTHS), target);
  const before = bestAt(widths.slice(0, -TOP_WIDTHS), target);
  if (top === null || before === null) return null;
  const margin = higherIsBetter(target.metric) ? RISE : RISE * Math.abs(before.value);
  const gain = higherIsBetter(target.metric) ? top.value - before.value : before.value - top.value;
  return gain > margin ? { from: before, to: top } : null;
}

export function notFoundNotes(
  plan: GrowthPlan,
  target: TargetConfig,
  widths: WidthSummary[],
  judgedOn: string,
): string[] {
  const notes: string[] = [];
  const name = target.metric;
  const withMet = widths.filter((w) => w.met > 0);
  if (withMet.length > 0) {
    const shown = withMet
      .slice(0, 3)
      .map((w) => `${w.met === 1 ? '1 network' : `${w.met} networks`} of width ${w.width}`)
      .join(', ');
    notes.push(
      `Some networks met ${targetShort(name, target.threshold)} (${shown}), but a width needs ${plan.required} to be adequate.`,
    );
  }
  const train = bestAt(widths, target, true);
  const judged = bestAt(widths, target);
  const rising = rises(widths, target);
  if (rising !== null) {
    notes.push(
      `More neurons still help: the best ${judgedOn} ${name} improved from ${formatMetric(rising.from.value)} (width ${rising.from.width}) to ${formatMetric(rising.to.value)} (width ${rising.to.width}); search.max-width (${plan.maxWidth}) is too small for this target.`,
    );
  } else if (train !== null && meetsThreshold(train.value, target)) {
    notes.push(
      `The networks fit the training rows (${name} ${formatMetric(train.value)} at width ${train.width}) but not the ${judgedOn} rows (best ${judged === null ? 'none' : formatMetric(judged.value)}): the data hold too few rows, or too much noise, for this target.`,
    );
  } else {
    const best = train === null ? 'no network trained' : `the best training ${name} was ${formatMetric(train.value)}`;
    notes.push(
      `Even the training rows are not fitted (${best}) and more neurons did not help from ${span(plan.minWidth, plan.maxWidth)}: the features may not carry the target.`,
    );
  }
  return notes;
}

/** The growth phase stopped (time budget, training cap) before a width was adequate. */
export function stoppedGrowingNote(plan: GrowthPlan, why: string, atWidth: number, trainings: number): string {
  const below =
    atWidth > plan.minWidth
      ? `; ${span(plan.minWidth, atWidth - 1)} ${atWidth - 1 > plan.minWidth ? 'were' : 'was'} not adequate on fresh restarts`
      : '';
  return `${why} while deciding width ${atWidth}, after ${trainings} trainings${below}.`;
}

/** The time ran out while pruning: the grown width is proven, smaller ones are not settled. */
export function stoppedPruningNote(why: string, grownWidth: number, trainings: number): string {
  return `${why} while pruning, after ${trainings} trainings: ${neurons(grownWidth)} are enough (proven by fresh restarts), but whether fewer would do was not settled.`;
}
