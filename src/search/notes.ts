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
import type { GrowthDecision } from './growth.js';
import type { StartChoice } from './start.js';
import type { GrowthPlan, WalkReport, WidthSummary } from './types.js';

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
export function stoppedGrowingNote(
  plan: GrowthPlan,
  why: string,
  atWidth: number,
  trainings: number,
  tried: GrowthDecision['tried'],
): string {
  const before = tried.filter((t) => t.width !== atWidth && t.restarts.length > 0);
  const adequate = before.filter((t) => t.restarts.filter((r) => r.met).length >= plan.required).map((t) => t.width);
  const not = before.filter((t) => !adequate.includes(t.width)).map((t) => t.width);
  const said = [
    adequate.length > 0
      ? `${widthList(adequate)} ${adequate.length > 1 ? 'were' : 'was'} adequate on fresh restarts`
      : '',
    not.length > 0 ? `${widthList(not)} ${not.length > 1 ? 'were' : 'was'} not adequate on fresh restarts` : '',
  ].filter((x) => x !== '');
  return `${why} while deciding width ${atWidth}, after ${trainings} trainings${said.length > 0 ? `; ${said.join(', ')}` : ''}.`;
}

/** The time ran out while pruning: the grown width is proven, smaller ones are not settled. */
export function stoppedPruningNote(why: string, grownWidth: number, trainings: number): string {
  return `${why} while pruning, after ${trainings} trainings: ${neurons(grownWidth)} are enough (proven by fresh restarts), but whether fewer would do was not settled.`;
}

/** Ascending widths as "width 3", "widths 3–5" or "widths 3, 5–7". */
function widthList(widths: readonly number[]): string {
  const runs: string[] = [];
  for (let k = 0; k < widths.length;) {
    let e = k;
    while (e + 1 < widths.length && widths[e + 1] === widths[e] + 1) e++;
    runs.push(widths[k] === widths[e] ? `${widths[k]}` : `${widths[k]}–${widths[e]}`);
    k = e + 1;
  }
  return widths.length === 1 ? `width ${runs[0]}` : `widths ${runs.join(', ')}`;
}

/** Where growth began and which widths it decided, with why that was enough. */
export function walkReport(plan: GrowthPlan, start: StartChoice | null, decision: GrowthDecision): WalkReport {
  const choice = start ?? { from: 'min-width' as const, width: plan.minWidth, why: 'the search starts there' };
  const from = choice.from === 'baseline' && plan.start != null ? 'baseline' : 'min-width';
  const width = from === 'baseline' ? choice.width : plan.minWidth;
  const decided = decision.tried.filter((t) => t.restarts.length > 0).map((t) => t.width);
  const lead =
    from === 'baseline'
      ? `Growth started at the baseline's width ${width} (${choice.why})`
      : `Growth started at min-width ${width} (${choice.why})`;
  const grown = decision.kind === 'decided' && decision.capHit === null ? decision.grownWidth : undefined;
  let summary: string;
  if (grown === undefined) {
    // Stopped (time budget, training cap) before the answer: the last width is only partly decided.
    summary = `${lead} and had tried ${decided.length === 0 ? 'no width' : widthList(decided)} when it stopped.`;
  } else if (from === 'min-width' || decided.length === 0) {
    summary = `${lead} and decided ${decided.length === 0 ? 'no width' : widthList(decided)}.`;
  } else {
    const lowest = decided[0];
    const untried = lowest > plan.minWidth ? span(plan.minWidth, lowest - 1) : null;
    const belowRule =
      untried === null
        ? ''
        : `; ${untried} ${lowest - 1 > plan.minWidth ? 'were' : 'was'} not trained: the start from the baseline takes the widths below one that is not adequate to be inadequate too, with no network there meeting the target by luck`;
    let what: string;
    if (grown === null) what = `no width from ${width} to max-width ${plan.maxWidth} was adequate on fresh restarts`;
    else if (grown > width)
      what = `width ${width} was not adequate on fresh restarts, so growth stepped up to width ${grown}, the first that was`;
    else if (grown === plan.minWidth) what = `every width down to min-width ${grown} was adequate on fresh restarts`;
    else what = `width ${grown} was adequate on fresh restarts and width ${grown - 1} was not`;
    summary = `${lead}: ${what}${belowRule}.`;
  }
  return { from, width, why: choice.why, decided, summary };
}
