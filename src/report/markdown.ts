/**
 * The pull-request comment and job summary (GitHub-flavoured Markdown).
 *
 * Layout, top to bottom: the verdict and its main reason; other reasons; baseline vs
 * this change; the metric-by-width charts; the capacity-drift chart; collapsible details
 * (per-width numbers behind the charts, history, pruning steps, data changes); how to
 * refresh the baseline. Every string from the repository passes through escapeMarkdown.
 * When the comment would exceed the limit, only the details are shortened.
 */
import type { DataChanges, HistoryEntry } from '../gate/types.js';
import type { WidthSummary } from '../search/types.js';
import { countRange, metricRange, renderChart } from './chart.js';
import { escapeMarkdown as md } from '../common/escape.js';
import { MAX_MESSAGE } from '../common/errors.js';
import { higherIsBetter } from '../common/metric.js';
import { formatCount, formatDelta, formatMetric, formatSeconds, neurons, targetPhrase } from '../common/format.js';
import type { Report, ReportPruneStep } from './types.js';
import { currentWidthCell, overDeviceBudget, VERDICT_LABEL, viewOf, type ReportView, type WidthRow } from './view.js';

/** GitHub refuses comments longer than 65,536 characters; leave room for the shell's hidden marker. */
export const COMMENT_LIMIT = 65_000;
/** Most widths a chart shows; longer curves keep the widest (where the answer lies). */
export const CHART_MAX_POINTS = 30;

export interface MarkdownOptions {
  /** Maximum length of the whole comment. */
  limit?: number;
}

interface DetailLimits {
  widthRows: number;
  historyRows: number;
  pruneRows: number;
  changeItems: number;
}

const DETAIL_LEVELS: DetailLimits[] = [
  { widthRows: Infinity, historyRows: Infinity, pruneRows: Infinity, changeItems: Infinity },
  { widthRows: 200, historyRows: 100, pruneRows: 60, changeItems: 100 },
  { widthRows: 80, historyRows: 40, pruneRows: 20, changeItems: 40 },
  { widthRows: 0, historyRows: 12, pruneRows: 0, changeItems: 12 },
];

export function renderMarkdown(report: Report, options: MarkdownOptions = {}): string {
  const limit = options.limit ?? COMMENT_LIMIT;
  const view = viewOf(report);
  const charts = chartSection(view, report);
  const head = [headline(view), summaryTable(view, report), charts.text].filter((s) => s !== '').join('\n\n');
  const foot = footer(view, report);
  for (const level of DETAIL_LEVELS) {
    const body = [head, details(view, report, level, charts.chartWidths), foot].filter((s) => s !== '').join('\n\n');
    if (body.length + 1 <= limit) return `${body}\n`;
  }
  const note =
    "_The details were left out to keep this comment within GitHub's size limit; the JSON report has them all._";
  return `${[head, note, foot].join('\n\n')}\n`;
}

function headline(view: ReportView): string {
  const label = VERDICT_LABEL[view.verdict];
  const lines = [`### neuron-budget: ${label}. ${md(view.headline, MAX_MESSAGE)}`];
  if (view.otherReasons.length > 0) {
    lines.push('');
    for (const r of view.otherReasons) lines.push(`- ${md(r, MAX_MESSAGE)}`);
  }
  return lines.join('\n');
}

function summaryTable(view: ReportView, report: Report): string {
  const b = view.baseline;
  const c = view.current;
  const metricName = md(view.metricName);
  const dash = '—';
  const cWidth = currentWidthCell(view, report, dash, (w) => `**${w}**`);
  const rowsDelta =
    b && b.rows !== null && c.rows !== null && b.rows !== c.rows ? ` (${formatDelta(c.rows - b.rows)})` : '';
  const rows = [
    '| | Baseline | This change |',
    '|:--|--:|--:|',
    `| Smallest adequate width | ${b?.width ?? dash} | ${cWidth} |`,
    `| ${capital(metricName)} at that width (network kept) | ${num(b?.metric)} | ${num(c.metric)} |`,
    `| Networks meeting the target there | ${b?.met ?? '—'} | ${c.met ?? '—'} |`,
    `| Data rows | ${b?.rows == null ? dash : formatCount(b.rows)} | ${c.rows === null ? dash : formatCount(c.rows)}${rowsDelta} |`,
    `| Search time | ${formatSeconds(b?.searchSeconds)} | ${formatSeconds(c.searchSeconds)} |`,
  ];
  const gate = report.gate;
  const terms = [`Target: ${md(targetPhrase(view.metricName, view.threshold))}`];
  if (gate) {
    terms.push(gate.maxWidth === null ? 'no device budget set' : `device budget: ${neurons(gate.maxWidth)}`);
    terms.push(`allowed growth over the baseline: ${gate.allowedGrowth}`);
  }
  terms.push(`data: ${md(report.data.file)}`);
  const backing = view.backing === null ? '' : `\n\n${md(view.backing, 400)}`;
  return `${rows.join('\n')}${backing}\n\n${terms.join(' · ')}.`;
}

interface ChartPart {
  text: string;
  /** Widths shown in the metric charts: their rows are never cut from the details. */
  chartWidths: Set<number>;
}

function chartSection(view: ReportView, report: Report): ChartPart {
  const chartWidths = new Set<number>();
  const accuracy = higherIsBetter(view.metricName);
  const seriesOf = (pick: (r: WidthRow) => number | null): { widths: number[]; values: number[] } => {
    const points = view.rows
      .map((r) => ({ width: r.width, value: pick(r) }))
      .filter((p): p is { width: number; value: number } => p.value !== null && Number.isFinite(p.value))
      .slice(-CHART_MAX_POINTS);
    return { widths: points.map((p) => p.width), values: points.map((p) => p.value) };
  };
  const current = seriesOf((r) => r.current?.best ?? null);
  const baseline = view.baseline ? seriesOf((r) => r.baseline?.best ?? null) : { widths: [], values: [] };
  const parts: string[] = [];
  if (current.widths.length > 0 || baseline.widths.length > 0) {
    const range = metricRange([...current.values, ...baseline.values], view.threshold, accuracy);
    const title = (who: string): string => `${who}, best ${view.metricName} per width`;
    parts.push(`#### ${capital(md(view.metricName))} by width`);
    parts.push(
      `Bars: the best ${md(view.metricName)} any restart reached at each width. Flat line: the threshold ${formatMetric(view.threshold)}. ` +
        `The numbers are in the per-width table below.`,
    );
    for (const [who, s] of [
      ['This change', current],
      ['Baseline', baseline],
    ] as const) {
      if (s.widths.length === 0) continue;
      s.widths.forEach((w) => chartWidths.add(w));
      parts.push(
        renderChart({
          title: title(who),
          xTitle: 'hidden neurons',
          categories: s.widths.map(String),
          yTitle: view.metricName,
          yRange: range,
          series: [
            { kind: 'bar', values: s.values },
            { kind: 'line', values: s.values.map(() => view.threshold) },
          ],
        }),
      );
    }
  }
  const drift = driftChart(view, report.gate?.maxWidth ?? null);
  if (drift) parts.push(drift);
  return { text: parts.join('\n\n'), chartWidths };
}

function driftChart(view: ReportView, budget: number | null): string {
  if (view.history.length === 0) return '';
  const history = view.history.slice(-CHART_MAX_POINTS);
  const labels = history.map((_, i) => String(view.history.length - history.length + i + 1));
  const widths = history.map((h) => h.width);
  if (view.current.width !== null) {
    labels.push('now');
    widths.push(view.current.width);
  }
  return [
    '#### Capacity drift',
    `Bars: the smallest adequate width of each accepted baseline, oldest first (numbered as in the history table below)${view.current.width !== null ? ', then this change' : ''}.` +
      (budget === null ? '' : ` Flat line: the device budget of ${budget}.`),
    renderChart({
      title: 'Smallest adequate width over time',
      xTitle: 'accepted baseline',
      categories: labels,
      yTitle: 'hidden neurons',
      yRange: countRange(budget === null ? widths : [...widths, budget]),
      series: [
        { kind: 'bar', values: widths },
        ...(budget === null ? [] : [{ kind: 'line' as const, values: widths.map(() => budget) }]),
      ],
    }),
  ].join('\n\n');
}

function details(view: ReportView, report: Report, limits: DetailLimits, chartWidths: Set<number>): string {
  const blocks: string[] = [];
  if (view.rows.length > 0) blocks.push(collapsible('Per-width results', widthTable(view, limits, chartWidths)));
  if (view.history.length > 0)
    blocks.push(collapsible(`Baseline history (${view.history.length})`, historyTable(view.history, limits)));
  const pruning = report.search?.pruning ?? [];
  if (pruning.length > 0) blocks.push(collapsible(`Pruning steps (${pruning.length})`, pruneTable(pruning, limits)));
  if (report.changes) blocks.push(collapsible('What changed in the data', changesList(report.changes, limits)));
  return blocks.join('\n\n');
}

function collapsible(summary: string, body: string): string {
  // The blank line after </summary> lets GitHub render the Markdown inside.
  return `<details><summary>${summary}</summary>\n\n${body}\n\n</details>`;
}

function widthTable(view: ReportView, limits: DetailLimits, chartWidths: Set<number>): string {
  const hasBaseline = view.baseline !== null;
  const header = hasBaseline
    ? '| Width | This change: best | Met | Wilson 95% | Baseline: best | Met |\n|--:|--:|--:|--:|--:|--:|'
    : '| Width | Best | Met | Wilson 95% | Median epochs |\n|--:|--:|--:|--:|--:|';
  const keep = pickRows(view.rows, limits.widthRows, (r) => chartWidths.has(r.width) || r.width === view.current.width);
  const lines = keep.kept.map((r) => {
    const c = r.current;
    const cells = [
      mark(r.width, view),
      num(c?.best),
      c ? metCell(c) : '—',
      c ? `${c.wilson[0].toFixed(2)}–${c.wilson[1].toFixed(2)}` : '—',
    ];
    if (hasBaseline) cells.push(num(r.baseline?.best), r.baseline ? String(r.baseline.met) : '—');
    else cells.push(c ? formatCount(c.medianEpochs) : '—');
    return `| ${cells.join(' | ')} |`;
  });
  const omitted =
    keep.omitted > 0 ? `\n\n_${keep.omitted} more widths left out for length; the JSON report lists them all._` : '';
  return `${header}\n${lines.join('\n')}${omitted}\n\nMet: networks of that width that met the target (fresh restarts + networks pruned down to it). Wilson 95%: interval for the fresh restarts' success rate.`;
}

function mark(width: number, view: ReportView): string {
  const tags: string[] = [];
  if (width === view.current.width) tags.push('this change');
  if (view.baseline && width === view.baseline.width) tags.push('baseline');
  return tags.length > 0 ? `**${width}** (${tags.join(', ')})` : String(width);
}

function historyTable(history: HistoryEntry[], limits: DetailLimits): string {
  const start = Math.max(0, history.length - limits.historyRows);
  const lines = history.slice(start).map((h, i) => {
    const commit = h.commit === null ? '—' : md(h.commit.slice(0, 12));
    return `| ${start + i + 1} | ${md(h.date.slice(0, 10))} | ${commit} | ${formatCount(h.rows)} | ${h.width} | ${num(h.metric)} |`;
  });
  const omitted = start > 0 ? `\n\n_The ${start} oldest entries are left out for length._` : '';
  return `| # | Date | Commit | Rows | Width | Metric |\n|--:|:--|:--|--:|--:|--:|\n${lines.join('\n')}${omitted}`;
}

function pruneTable(steps: ReportPruneStep[], limits: DetailLimits): string {
  if (limits.pruneRows === 0) return `_${steps.length} steps left out for length; the JSON report lists them._`;
  const shown = steps.slice(0, limits.pruneRows);
  const lines = shown.map(
    (s) =>
      `| ${s.source.width}/${s.source.restart} | ${s.width} | ${s.neuron} | ${num(s.steeringBefore)} | ${num(s.steeringAfter)} | ${s.accepted ? 'removed' : 'put back (needed)'} |`,
  );
  const omitted =
    steps.length > shown.length ? `\n\n_${steps.length - shown.length} more steps left out for length._` : '';
  return `| Restart | Width before | Neuron | Metric before | Metric after | Outcome |\n|--:|--:|--:|--:|--:|:--|\n${lines.join('\n')}${omitted}`;
}

function changesList(changes: DataChanges, limits: DetailLimits): string {
  const items: string[] = [];
  if (changes.file) items.push(`Data file: ${md(changes.file.before)} → ${md(changes.file.after)}.`);
  const r = changes.rows;
  if (!changes.changed) items.push("The data are the same as the baseline's (same fingerprint).");
  else items.push(`Rows: ${formatCount(r.before)} → ${formatCount(r.after)} (${formatDelta(r.after - r.before)}).`);
  for (const label of changes.classesAppeared) items.push(`New class ${md(label)}.`);
  for (const label of changes.classesVanished) items.push(`Class ${md(label)} no longer appears.`);
  for (const c of changes.classes ?? []) {
    if (c.before !== c.after) {
      items.push(
        `Class ${md(c.label)}: ${formatCount(c.before)} → ${formatCount(c.after)} rows (${formatDelta(c.after - c.before)}).`,
      );
    }
  }
  for (const name of changes.columnsAdded) items.push(`Column added: ${md(name)}.`);
  for (const name of changes.columnsRemoved) items.push(`Column removed: ${md(name)}.`);
  for (const f of changes.features) {
    const parts: string[] = [];
    if (f.meanMoved) {
      const by = f.shiftInStd === null ? '' : ` (${f.shiftInStd.toFixed(1)} standard deviations)`;
      parts.push(`mean ${num(f.meanBefore)} → ${num(f.meanAfter)}${by}`);
    }
    if (f.rangeWidened) {
      parts.push(
        `range ${num(f.rangeBefore[0])} to ${num(f.rangeBefore[1])} widened to ${num(f.rangeAfter[0])} to ${num(f.rangeAfter[1])}`,
      );
    }
    items.push(`Feature ${md(f.name)}: ${parts.join('; ')}.`);
  }
  for (const c of changes.categories) {
    if (c.appeared.length > 0)
      items.push(`Feature ${md(c.feature)}: new categories ${c.appeared.map((s) => md(s)).join(', ')}.`);
    if (c.vanished.length > 0)
      items.push(`Feature ${md(c.feature)}: categories gone ${c.vanished.map((s) => md(s)).join(', ')}.`);
  }
  if (changes.changed && items.length === (changes.file ? 2 : 1)) {
    items.push('No class, column or feature moved beyond the thresholds.');
  }
  const shown = items.slice(0, limits.changeItems);
  const omitted =
    items.length > shown.length ? `\n\n_${items.length - shown.length} more changes left out for length._` : '';
  return `${shown.map((s) => `- ${s}`).join('\n')}${omitted}\n\nA feature is listed when its mean moved by more than half a baseline standard deviation or its range widened.`;
}

function footer(view: ReportView, report: Report): string {
  const file = view.baselineFile === null ? 'the baseline file' : md(view.baselineFile);
  const accept =
    view.verdict === 'new'
      ? 'To record this result as the baseline'
      : 'If this change is intended, accept it as the new baseline';
  const overBudget = overDeviceBudget(report)
    ? ' A new baseline does not lift the device budget: this check keeps failing until the width fits it or `gate.max-width` is raised.'
    : '';
  return [
    '---',
    `${accept}: run \`neuron-budget baseline\` and commit ${file}, or run the action with \`update-baseline: true\`. ` +
      `A baseline is only written when the search found a width.${overBudget}`,
    `_neuron-budget ${md(report.tool.version)} measures how many hidden neurons this data needs; a passing gate is not a safety sign-off for a device._`,
  ].join('\n\n');
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

function num(v: number | null | undefined): string {
  return v === null || v === undefined ? '—' : formatMetric(v);
}

function capital(s: string): string {
  return s.length > 0 ? s[0].toUpperCase() + s.slice(1) : s;
}

/** "4 (1 + 3)": networks of the width that met the target, fresh + pruned when both occur. */
function metCell(w: WidthSummary): string {
  return w.metBy.pruned > 0 && w.metBy.fresh > 0 ? `${w.met} (${w.metBy.fresh} + ${w.metBy.pruned})` : String(w.met);
}
