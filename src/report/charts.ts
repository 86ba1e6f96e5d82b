/**
 * The two charts, one per question, as chart specs with the sentence that reads them.
 *
 * Metric by width: one chart holds the baseline and this change, each width a pair of
 * categories ("b7" the baseline, "7" this change), because Mermaid draws two bar series at the
 * same place over each other. A side that did not decide a width has a bar of the axis minimum
 * there, i.e. none. The bar is the `required`-th best judged metric, so a bar reaches the
 * threshold line exactly when the width is adequate (recall floors aside). A category without
 * bars at each end (the widths just outside the range shown; the first is blank when that would be
 * 0) carries the threshold line past the outer bars, so it shows even with one width. Mermaid's
 * band axis merges equal labels, so every category is distinct.
 */
import { formatMetric } from '../common/format.js';
import { higherIsBetter } from '../common/metric.js';
import { CHART_COLORS, countRange, metricRange, type ChartSpec } from './chart.js';
import type { Report } from './types.js';
import { baselineDecisive, type ReportView } from './view.js';
import { nthBest } from './words.js';

/** Most widths the metric chart shows; longer curves keep the widest (where the answer lies). */
const CHART_MAX_WIDTHS = 15;
/** Most baselines the drift chart shows. */
const DRIFT_MAX_POINTS = 30;

export interface Chart {
  spec: ChartSpec;
  /** How to read it: what the bars and the line are, and where the y-axis starts. */
  legend: string;
  /** Widths it shows (their table rows are never cut for length). */
  widths: number[];
}

export function metricChart(view: ReportView, report: Report): Chart | null {
  const required = report.search?.required ?? 1;
  const rows = view.rows.slice(-CHART_MAX_WIDTHS);
  const pairs = view.baseline !== null;
  const now = rows.map((r) => r.current?.decisive ?? null);
  const base = rows.map((r) => (r.baseline ? baselineDecisive(r.baseline, required) : null));
  const values = [...now, ...base].filter((v): v is number => v !== null && Number.isFinite(v));
  if (values.length === 0) return null;
  const accuracy = higherIsBetter(view.metricName);
  const range = metricRange(values, view.threshold, accuracy);
  // Mermaid draws a bar of the axis minimum as a stub a few pixels high; one below it draws nothing.
  const floor = range[0] - (range[1] - range[0]);
  const first = rows[0].width - 1;
  const categories: string[] = [first > 0 ? String(first) : ' '];
  const nowBars: number[] = [floor];
  const baseBars: number[] = [floor];
  rows.forEach((r, i) => {
    if (pairs) {
      categories.push(`b${r.width}${r.width === view.baseline?.width ? ' min' : ''}`);
      baseBars.push(base[i] ?? floor);
      nowBars.push(floor);
    }
    categories.push(`${r.width}${r.width === view.current.width ? ' min' : ''}`);
    nowBars.push(now[i] ?? floor);
    baseBars.push(floor);
  });
  categories.push(String(rows[rows.length - 1].width + 1));
  nowBars.push(floor);
  baseBars.push(floor);
  const which = nthBest(required);
  const side = accuracy ? 'at or above' : 'at or below';
  const legend = [
    `Bars: the ${which} ${view.metricName} of the networks at each width, so a bar ${side} the line means the width is adequate (${required} network${required === 1 ? '' : 's'} met the target).`,
    pairs ? 'Each width has two places: grey "b" and the width is the baseline, blue the width alone this change.' : '',
    `"min" marks the smallest adequate width${pairs ? ' of each' : ''}. Red line: the threshold ${formatMetric(view.threshold)}.`,
    `The y-axis runs from ${formatMetric(range[0])} to ${formatMetric(range[1])}${range[0] === 0 ? '' : ', not from 0'}; the numbers are in the table.`,
  ]
    .filter((s) => s !== '')
    .join(' ');
  return {
    spec: {
      title: `${view.metricName} by hidden neurons`,
      xTitle: 'hidden neurons',
      categories,
      yTitle: view.metricName,
      yRange: range,
      series: [
        ...(pairs ? [{ kind: 'bar' as const, values: baseBars, color: CHART_COLORS.baseline }] : []),
        { kind: 'bar', values: nowBars, color: CHART_COLORS.current },
        { kind: 'line', values: categories.map(() => view.threshold), color: CHART_COLORS.limit },
      ],
    },
    legend,
    widths: rows.map((r) => r.width),
  };
}

/** Capacity drift: the width of each accepted baseline, then this change, against the neuron budget. */
export function driftChart(view: ReportView, budget: number | null): Chart | null {
  if (view.history.length === 0) return null;
  const history = view.history.slice(-DRIFT_MAX_POINTS);
  const first = view.history.length - history.length;
  // A blank first and a "later" last category carry the budget line past the outer bars.
  const categories = [' ', ...history.map((_, i) => String(first + i + 1))];
  const widths = [0, ...history.map((h) => h.width)];
  if (view.current.width !== null) {
    categories.push('now');
    widths.push(view.current.width);
  }
  categories.push('later');
  widths.push(0);
  const legend =
    `Bars: the smallest adequate width of each accepted baseline, oldest first (numbered as in the history table)${view.current.width !== null ? ', then this change' : ''}.` +
    (budget === null
      ? ' No neuron budget is set (gate.max-width).'
      : ` Red line: the device budget of ${budget} hidden neurons.`);
  return {
    spec: {
      title: 'Smallest adequate width over time',
      xTitle: 'accepted baseline',
      categories,
      yTitle: 'hidden neurons',
      yRange: countRange(budget === null ? widths : [...widths, budget]),
      series: [
        { kind: 'bar', values: widths, color: CHART_COLORS.current },
        ...(budget === null
          ? []
          : [{ kind: 'line' as const, values: categories.map(() => budget), color: CHART_COLORS.limit }]),
      ],
    },
    legend,
    widths: [],
  };
}
