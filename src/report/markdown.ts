/**
 * The pull-request comment and job summary (GitHub-flavoured Markdown), laid out around the
 * reviewer's three questions: how many neurons does the data need now, does that fit the
 * device, and why did it change. The verdict and the three answers come first; the evidence
 * (metric by width, per class, capacity drift, pruning, every data change) follows collapsed.
 * Every string from the repository passes through escapeMarkdown. When the comment would
 * exceed the limit, only the evidence is shortened.
 */
import { escapeMarkdown as md } from '../common/escape.js';
import { MAX_MESSAGE } from '../common/errors.js';
import { renderChart } from './chart.js';
import { driftChart, metricChart } from './charts.js';
import { DEFAULT_CONTEXT, type RenderContext } from './context.js';
import {
  changesSection,
  classSection,
  collapsible,
  historySection,
  ladderSection,
  pruneSection,
  type DetailLimits,
} from './evidence.js';
import { amount, budgetCell, fitsSentence, ledgerOf, type Ledger } from './ledger.js';
import type { Report } from './types.js';
import { VERDICT_LABEL, viewOf, type ReportView } from './view.js';
import { hints, needsSentence, SIGN_OFF, targetSpreadSentence, whySentence } from './words.js';

/** GitHub refuses comments longer than 65,536 characters; leave room for the shell's hidden marker. */
export const COMMENT_LIMIT = 65_000;

export interface MarkdownOptions {
  /** Maximum length of the whole comment. */
  limit?: number;
  context?: RenderContext;
}

const DETAIL_LEVELS: DetailLimits[] = [
  { widthRows: Infinity, historyRows: Infinity, pruneRows: Infinity, changeItems: Infinity },
  { widthRows: 200, historyRows: 100, pruneRows: 60, changeItems: 100 },
  { widthRows: 80, historyRows: 40, pruneRows: 20, changeItems: 40 },
  { widthRows: 0, historyRows: 12, pruneRows: 0, changeItems: 12 },
];

const code = (s: string): string => `\`${s}\``;

export function renderMarkdown(report: Report, options: MarkdownOptions = {}): string {
  const limit = options.limit ?? COMMENT_LIMIT;
  const context = options.context ?? DEFAULT_CONTEXT;
  const view = viewOf(report);
  const head = [headline(view), answers(view, report)].join('\n\n');
  const foot = footer(report, context);
  for (const level of DETAIL_LEVELS) {
    const body = [head, evidence(view, report, level), foot].filter((s) => s !== '').join('\n\n');
    if (body.length + 1 <= limit) return `${body}\n`;
  }
  const note =
    "_The evidence was left out to keep this comment within GitHub's size limit; the JSON report has it all._";
  return `${[head, note, foot].join('\n\n')}\n`;
}

function headline(view: ReportView): string {
  const lines = [`### neuron-budget: ${VERDICT_LABEL[view.verdict]}. ${md(view.headline, MAX_MESSAGE)}`];
  if (view.otherReasons.length > 0) {
    lines.push('');
    for (const r of view.otherReasons) lines.push(`- ${md(r, MAX_MESSAGE)}`);
  }
  return lines.join('\n');
}

/** The three answers, each led by its question's word in bold. */
function answers(view: ReportView, report: Report): string {
  const needs = [needsSentence(report), view.backing, targetSpreadSentence(report)].filter((s) => s !== null);
  const ledger = ledgerOf(report);
  const parts = [
    `**Needs:** ${md(needs.join(' '), 2 * MAX_MESSAGE)}`,
    `**Fits the device:** ${md(fitsSentence(ledger), MAX_MESSAGE)}`,
  ];
  if (ledger !== null) parts.push(ledgerTable(ledger));
  parts.push(`**Why it changed:** ${whySentence(report, md)}`);
  return parts.join('\n\n');
}

function ledgerTable(ledger: Ledger): string {
  const base = ledger.baselineWidth;
  const head =
    base === null
      ? '| On the device | Needs now | Budget |\n|:--|--:|--:|'
      : `| On the device | Needs now | Budget | At the baseline's ${base} |\n|:--|--:|--:|--:|`;
  const lines = ledger.rows.map((r) => {
    const cells = [r.label, `**${amount(r.now, r.unit)}**`, budgetCell(r)];
    if (base !== null) cells.push(r.atBaseline === null ? '—' : amount(r.atBaseline, r.unit));
    return `| ${cells.join(' | ')} |`;
  });
  return `${head}\n${lines.join('\n')}`;
}

function evidence(view: ReportView, report: Report, limits: DetailLimits): string {
  const blocks: string[] = [];
  const metric = metricChart(view, report);
  if (view.rows.length > 0) {
    const chart = metric === null ? '' : `${metric.legend}\n\n${renderChart(metric.spec)}\n\n`;
    blocks.push(
      collapsible(
        `Per width: ${md(view.metricName)} of the ${view.rows.length} width${view.rows.length === 1 ? '' : 's'} decided`,
        `${chart}${ladderSection(view, report, limits, new Set(metric?.widths ?? []))}`,
      ),
    );
  }
  const classes = classSection(report);
  if (classes !== null) blocks.push(collapsible('Per class, on the rows that judged the witness', classes));
  const drift = driftChart(view, report.gate?.maxWidth ?? null);
  if (drift !== null) {
    blocks.push(
      collapsible(
        `Capacity drift: ${view.history.length} accepted baseline${view.history.length === 1 ? '' : 's'}`,
        `${drift.legend}\n\n${renderChart(drift.spec)}\n\n${historySection(view.history, limits)}`,
      ),
    );
  }
  const pruning = pruneSection(report, limits);
  if (pruning !== null) blocks.push(collapsible(`Pruning: ${report.search!.pruning.length} removals tried`, pruning));
  if (report.changes)
    blocks.push(collapsible('Every data change since the baseline', changesSection(report.changes, limits)));
  return blocks.join('\n\n');
}

function footer(report: Report, context: RenderContext): string {
  const lines = hints(report, context, md, code);
  const sign = `_neuron-budget ${md(report.tool.version)} measures how many hidden neurons this data needs. ${SIGN_OFF}_`;
  return ['---', ...lines, sign].join('\n\n');
}
