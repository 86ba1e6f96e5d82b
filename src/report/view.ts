/**
 * The facts every renderer shows, read once from the JSON report so the comment, the
 * job summary and the terminal text cannot disagree.
 */
import type { MetricName } from '../config/types.js';
import type { BaselineWidth, HistoryEntry } from '../gate/types.js';
import type { WidthSummary } from '../search/types.js';
import type { Report, Verdict } from './types.js';

export interface SideFacts {
  width: number | null;
  metric: number | null;
  reached: number | null;
  restarts: number | null;
  rows: number | null;
  searchSeconds: number | null;
}

export interface WidthRow {
  width: number;
  current: WidthSummary | null;
  baseline: BaselineWidth | null;
}

export interface ReportView {
  verdict: Verdict;
  headline: string;
  otherReasons: string[];
  metricName: MetricName;
  threshold: number;
  current: SideFacts;
  baseline: SideFacts | null;
  /** This change's width was found by pruning below the grown width. */
  prunedFrom: number | null;
  rows: WidthRow[];
  history: HistoryEntry[];
  baselineFile: string | null;
}

export const VERDICT_LABEL: Record<Verdict, string> = {
  pass: 'PASS',
  fail: 'FAIL',
  improved: 'IMPROVED',
  new: 'NEW',
  inconclusive: 'INCONCLUSIVE',
};

export function viewOf(report: Report): ReportView {
  const widths = report.search?.widths ?? [];
  const at = report.width === null ? undefined : widths.find((w) => w.width === report.width);
  const b = report.baseline;
  const byWidth = new Map<number, WidthRow>();
  for (const w of widths) byWidth.set(w.width, { width: w.width, current: w, baseline: null });
  for (const w of b?.widths ?? []) {
    const row = byWidth.get(w.width) ?? { width: w.width, current: null, baseline: null };
    row.baseline = w;
    byWidth.set(w.width, row);
  }
  const grown = report.search?.grownWidth ?? null;
  const searchSeconds = report.timing['searchSeconds'];
  return {
    verdict: report.verdict,
    headline: report.reasons[0] ?? '',
    otherReasons: report.reasons.slice(1),
    metricName: report.metric.name,
    threshold: report.metric.threshold,
    current: {
      width: report.width,
      metric: report.metric.value,
      reached: at ? at.reached : null,
      restarts: at ? at.restarts : null,
      rows: report.data.rows,
      searchSeconds: typeof searchSeconds === 'number' ? searchSeconds : null,
    },
    baseline: b
      ? {
          width: b.width,
          metric: b.metric,
          reached: b.reached ?? null,
          restarts: b.restarts ?? null,
          rows: b.rows ?? null,
          searchSeconds: b.searchSeconds ?? null,
        }
      : null,
    prunedFrom: grown !== null && report.width !== null && grown !== report.width ? grown : null,
    rows: [...byWidth.values()].sort((x, y) => x.width - y.width),
    history: b?.history ?? [],
    baselineFile: report.gate?.baselineFile ?? b?.file ?? null,
  };
}

/** The width found exceeds gate.max-width. */
/** This change's width for the summary table: the width and what pruning did, or why there is none. */
export function currentWidthCell(
  view: ReportView,
  report: Report,
  dash: string,
  strong: (s: string) => string = (s) => s,
): string {
  const c = view.current;
  if (c.width === null) {
    if (report.search?.outcome === 'inconclusive') return 'not settled';
    return report.search ? 'none in range' : dash;
  }
  return `${strong(String(c.width))}${view.prunedFrom !== null ? ` (pruned from ${view.prunedFrom})` : ''}`;
}

export function overDeviceBudget(report: Report): boolean {
  const budget = report.gate?.maxWidth ?? null;
  return budget !== null && report.width !== null && report.width > budget;
}
