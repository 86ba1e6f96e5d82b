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
  /** Networks of that width that met the target, and fresh restarts run there. */
  met: number | null;
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
  /** How this change's width is backed, in one sentence (the same on every screen); null without a width. */
  backing: string | null;
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
      met: at ? at.met : null,
      restarts: at ? at.restarts : null,
      rows: report.data.rows,
      searchSeconds: typeof searchSeconds === 'number' ? searchSeconds : null,
    },
    baseline: b
      ? {
          width: b.width,
          metric: b.metric,
          met: b.met ?? null,
          restarts: b.restarts ?? null,
          rows: b.rows ?? null,
          searchSeconds: b.searchSeconds ?? null,
        }
      : null,
    prunedFrom: grown !== null && report.width !== null && grown !== report.width ? grown : null,
    backing: at ? backingSentence(at, report) : null,
    rows: [...byWidth.values()].sort((x, y) => x.width - y.width),
    history: b?.history ?? [],
    baselineFile: report.gate?.baselineFile ?? b?.file ?? null,
  };
}

/**
 * "5 networks of width 7 met the target on the judging rows (2 of 10 fresh restarts, 3 pruned from
 * wider networks); 3 are required." One definition of the backing, shown by every screen.
 */
function backingSentence(w: WidthSummary, report: Report): string {
  const judging = report.search?.judging.on ?? 'judging';
  const rows = judging === 'judging' ? 'the judging rows' : `the ${judging} rows`;
  const parts: string[] = [];
  if (w.restarts > 0) parts.push(`${w.metBy.fresh} of ${w.restarts} fresh restart${w.restarts === 1 ? '' : 's'}`);
  if (w.metBy.pruned > 0) parts.push(`${w.metBy.pruned} pruned from wider networks`);
  const required = report.search?.required ?? null;
  const need = required === null ? '' : `; ${required} ${required === 1 ? 'is' : 'are'} required`;
  const networks = w.met === 1 ? '1 network' : `${w.met} networks`;
  return `${networks} of width ${w.width} met the target on ${rows} (${parts.join(', ')})${need}.`;
}

/** A baseline width's decisive metric, or its best in files that lack it when one network suffices. */
export function baselineDecisive(w: BaselineWidth, required: number): number | null {
  if (w.decisive !== undefined) return w.decisive;
  return required === 1 ? w.best : null;
}
