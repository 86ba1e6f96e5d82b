/**
 * The comment's evidence, collapsed under the three answers: the per-width ladder, per-class
 * figures, the baseline history, the pruning steps and every data change (Markdown tables).
 */
import { escapeMarkdown as md } from '../common/escape.js';
import { formatCount, formatMetric } from '../common/format.js';
import type { DataChanges, HistoryEntry } from '../gate/types.js';
import type { WidthSummary } from '../search/types.js';
import type { Report } from './types.js';
import { baselineDecisive, type ReportView } from './view.js';
import { capitalise, changeItems, nthBest, pruningSentence, searchCostSentence } from './words.js';

/** How much of each evidence table fits; the comment shortens them step by step to stay in GitHub's limit. */
export interface DetailLimits {
  widthRows: number;
  historyRows: number;
  pruneRows: number;
  changeItems: number;
}

export function collapsible(summary: string, body: string): string {
  // The blank line after </summary> lets GitHub render the Markdown inside.
  return `<details><summary>${summary}</summary>\n\n${body}\n\n</details>`;
}

function num(v: number | null | undefined): string {
  return v === null || v === undefined || !Number.isFinite(v) ? '—' : formatMetric(v);
}

/** "4 of 10 + 1 pruned": networks that met the target, by source. */
function metCell(w: WidthSummary): string {
  const fresh = `${w.metBy.fresh} of ${w.restarts}`;
  return w.metBy.pruned > 0 ? `${fresh} + ${w.metBy.pruned} pruned` : fresh;
}

export function ladderSection(view: ReportView, report: Report, limits: DetailLimits, mustShow: Set<number>): string {
  const required = report.search?.required ?? 1;
  const which = nthBest(required);
  const hasBaseline = view.baseline !== null;
  const header = [
    'Width',
    'Met the target',
    `${capitalise(which)}`,
    'Best',
    'Adequate',
    ...(hasBaseline ? ['Baseline: met', `Baseline: ${which}`] : []),
  ];
  const keep = pickRows(view.rows, limits.widthRows, (r) => mustShow.has(r.width) || r.width === view.current.width);
  const lines = keep.kept.map((r) => {
    const c = r.current;
    const marked = r.width === view.current.width || r.width === view.baseline?.width;
    const cells = [
      marked ? `**${r.width}**` : String(r.width),
      c ? metCell(c) : 'not decided',
      num(c?.decisive),
      num(c?.best),
      c ? (c.adequate ? 'yes' : 'no') : '—',
    ];
    if (hasBaseline)
      cells.push(
        r.baseline ? String(r.baseline.met) : '—',
        num(r.baseline ? baselineDecisive(r.baseline, required) : null),
      );
    return `| ${cells.join(' | ')} |`;
  });
  const align = header.map((_, i) => (i === 1 ? ':--' : '--:'));
  const omitted =
    keep.omitted > 0 ? `\n\n_${keep.omitted} more widths left out for length; the JSON report lists them all._` : '';
  const bold =
    view.current.width !== null || view.baseline?.width != null
      ? ' Bold: the smallest adequate width of this change and of the baseline.'
      : '';
  return (
    `| ${header.join(' | ')} |\n|${align.join('|')}|\n${lines.join('\n')}${omitted}\n\n` +
    `Met the target: fresh restarts at that width that met it, of those run, plus networks pruned down to it. ` +
    `A width is adequate when ${required} network${required === 1 ? '' : 's'} of it met the target, so the ${which} figure decides.${bold}` +
    (searchCostSentence(report) === null ? '' : ` ${searchCostSentence(report)}`)
  );
}

export function classSection(report: Report): string | null {
  const d = report.device;
  if (d === null || d.classes === null) return null;
  const floors = d.classes.some((c) => c.floor !== null);
  const head = `| Class | Rows | Recall | Precision${floors ? ' | Recall floor' : ''} |\n|:--|--:|--:|--:|${floors ? '--:|' : ''}`;
  const lines = d.classes.map(
    (c) =>
      `| ${md(c.label)} | ${formatCount(c.rows)} | ${num(c.recall)} | ${num(c.precision)}${floors ? ` | ${num(c.floor)}` : ''} |`,
  );
  const parts = [`In the ${d.precision} form that decides.`, `${head}\n${lines.join('\n')}`];
  if (d.confusion !== null) {
    const labels = d.classes.map((c) => md(c.label, 40));
    const ch = `| True class ↓ predicted → | ${labels.join(' | ')} |\n|:--|${labels.map(() => '--:').join('|')}|`;
    const rows = d.confusion.map((row, i) => `| ${labels[i]} | ${row.map((n) => formatCount(n)).join(' | ')} |`);
    parts.push(`${ch}\n${rows.join('\n')}`);
  }
  return parts.join('\n\n');
}

export function historySection(history: HistoryEntry[], limits: DetailLimits): string {
  const start = Math.max(0, history.length - limits.historyRows);
  const lines = history.slice(start).map((h, i) => {
    const commit = h.commit === null ? '—' : md(h.commit.slice(0, 12));
    return `| ${start + i + 1} | ${md(h.date.slice(0, 10))} | ${commit} | ${formatCount(h.rows)} | ${h.width} | ${num(h.metric)} |`;
  });
  const omitted = start > 0 ? `\n\n_The ${start} oldest entries are left out for length._` : '';
  return `| # | Date | Commit | Rows | Width | Metric |\n|--:|:--|:--|--:|--:|--:|\n${lines.join('\n')}${omitted}`;
}

export function pruneSection(report: Report, limits: DetailLimits): string | null {
  const steps = report.search?.pruning ?? [];
  const summary = pruningSentence(report);
  if (summary === null) return null;
  if (limits.pruneRows === 0) return `${summary}\n\n_The steps are left out for length; the JSON report lists them._`;
  const shown = steps.slice(0, limits.pruneRows);
  const lines = shown.map(
    (s) =>
      `| ${s.source.width} | ${s.source.restart} | ${s.width} | ${s.neuron} | ${num(s.steeringBefore)} | ${num(s.steeringAfter)} | ${s.accepted ? 'removed' : 'put back'} |`,
  );
  const omitted =
    steps.length > shown.length ? `\n\n_${steps.length - shown.length} more steps left out for length._` : '';
  return (
    `${summary}\n\n| Grown width | Restart | Width before | Neuron index | Steering before | Steering after | Outcome |\n|--:|--:|--:|--:|--:|--:|:--|\n${lines.join('\n')}${omitted}\n\n` +
    'Neuron index counts from 0, as in the JSON report and the model file. A neuron is put back when the network without it no longer meets the target on the steering rows.'
  );
}

export function changesSection(changes: DataChanges, limits: DetailLimits): string {
  const items = changeItems(changes, md).map((i) => i.text);
  const shown = items.slice(0, limits.changeItems);
  const omitted =
    items.length > shown.length ? `\n\n_${items.length - shown.length} more changes left out for length._` : '';
  return `${shown.map((s) => `- ${s}`).join('\n')}${omitted}\n\nA feature is listed when its mean moved by more than half a baseline standard deviation, or its range grew on a side by more than half a baseline standard deviation.`;
}

function pickRows<T>(rows: T[], max: number, must: (r: T) => boolean): { kept: T[]; omitted: number } {
  if (rows.length <= max) return { kept: rows, omitted: 0 };
  let room = Math.max(0, max - rows.filter(must).length);
  const kept = rows.filter((r) => {
    if (must(r)) return true;
    if (room > 0) {
      room--;
      return true;
    }
    return false;
  });
  return { kept, omitted: rows.length - kept.length };
}
