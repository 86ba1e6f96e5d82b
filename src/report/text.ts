/**
 * The terminal report: the same answers and words as the comment, plain text, at most 80 columns
 * (a long repository name may run over; each is clipped at 200 characters).
 */
import { escapeText as plain } from '../common/escape.js';
import { MAX_MESSAGE } from '../common/errors.js';
import { formatMetric } from '../common/format.js';
import { DEFAULT_CONTEXT, type RenderContext } from './context.js';
import { amount, budgetCell, fitsSentence, ledgerOf, type Ledger } from './ledger.js';
import type { Report } from './types.js';
import { VERDICT_LABEL, viewOf, type ReportView } from './view.js';
import {
  changeItems,
  hints,
  needsSentence,
  nthBest,
  pruningSentence,
  searchCostSentence,
  SIGN_OFF,
  targetSpreadSentence,
  whySentence,
} from './words.js';

export const TEXT_WIDTH = 80;

export function renderText(report: Report, context: RenderContext = DEFAULT_CONTEXT): string {
  const view = viewOf(report);
  const out: string[] = [];
  // Reasons are our sentences (their repository strings clipped where they were quoted): shown whole.
  out.push(...wrap(`neuron-budget: ${VERDICT_LABEL[view.verdict]}. ${plain(view.headline, MAX_MESSAGE)}`, ''));
  for (const r of view.otherReasons) out.push(...wrap(plain(r, MAX_MESSAGE), '  - ', '    '));

  const needs = [needsSentence(report), view.backing, targetSpreadSentence(report)].filter((s) => s !== null);
  out.push('', ...wrap(`Needs: ${needs.join(' ')}`, '', '  '));
  const ledger = ledgerOf(report);
  out.push('', ...wrap(`Fits the device: ${fitsSentence(ledger)}`, '', '  '));
  if (ledger !== null) out.push(...ledgerLines(ledger));
  out.push('', ...wrap(`Why it changed: ${whySentence(report, plain)}`, '', '  '));

  if (view.rows.length > 0) out.push('', ...ladderLines(view, report));
  if (view.history.length > 0) {
    out.push('');
    out.push(`capacity drift (accepted baselines, oldest first${view.current.width !== null ? ', then now' : ''}):`);
    const widths = view.history.slice(-20).map((h) => String(h.width));
    if (view.current.width !== null) widths.push(`now ${view.current.width}`);
    const budget = report.gate?.maxWidth ?? null;
    out.push(...wrap(`width ${widths.join(' -> ')}${budget === null ? '' : ` (budget ${budget})`}`, '  ', '  '));
  }
  const pruning = pruningSentence(report);
  if (pruning !== null) out.push('', ...wrap(`pruning: ${pruning[0].toLowerCase()}${pruning.slice(1)}`, '', '  '));
  if (report.changes) {
    out.push('', 'data changes since the baseline:');
    for (const item of changeItems(report.changes, plain)) out.push(...wrap(item.text, '  - ', '    '));
  }

  out.push('');
  for (const line of hints(report, context, plain, (s) => s)) out.push(...wrap(line, ''));
  out.push(...wrap(SIGN_OFF, ''));
  return `${out.join('\n')}\n`;
}

function ledgerLines(ledger: Ledger): string[] {
  const base = ledger.baselineWidth;
  const head = ['on the device', 'needs now', 'budget', ...(base === null ? [] : [`at baseline's ${base}`])];
  const rows = ledger.rows.map((r) => [
    r.label,
    amount(r.now, r.unit),
    budgetCell(r),
    ...(base === null ? [] : [r.atBaseline === null ? '-' : amount(r.atBaseline, r.unit)]),
  ]);
  const widths = [22, 11, 20, 18];
  return [head, ...rows].map((cells) =>
    `  ${cells.map((c, i) => (i === 0 ? c.padEnd(widths[0]) : c.padStart(widths[i]))).join('')}`.trimEnd(),
  );
}

function ladderLines(view: ReportView, report: Report): string[] {
  const required = report.search?.required ?? 1;
  const b = view.baseline;
  const out = [`${view.metricName} by width (met: networks that met the target; ${nthBest(required)} decides)`];
  const head = ['width', 'met', nthBest(required), 'best', 'adequate', ...(b ? ['baseline met'] : [])];
  const widths = [7, 16, 11, 10, 10, 14];
  const line = (cells: string[]): string =>
    cells
      .map((c, i) => c.padStart(widths[i]))
      .join('')
      .trimEnd();
  out.push(line(head));
  for (const r of view.rows) {
    const c = r.current;
    const marked = r.width === view.current.width ? '>' : ' ';
    out.push(
      line([
        `${marked}${r.width}`,
        c ? `${c.metBy.fresh} of ${c.restarts}${c.metBy.pruned > 0 ? ` +${c.metBy.pruned}p` : ''}` : 'not decided',
        fmt(c?.decisive),
        fmt(c?.best),
        c ? (c.adequate ? 'yes' : 'no') : '-',
        ...(b ? [r.baseline ? String(r.baseline.met) : '-'] : []),
      ]),
    );
  }
  const notes = [`threshold ${formatMetric(view.threshold)}`];
  if (view.current.width !== null) notes.unshift("> marks this change's smallest adequate width");
  if (view.rows.some((r) => (r.current?.metBy.pruned ?? 0) > 0)) notes.push('+Np: N networks pruned down to it');
  out.push(...wrap(`(${notes.join('; ')})`, '  ', '  '));
  const cost = searchCostSentence(report);
  if (cost !== null) out.push(...wrap(cost, '  ', '  '));
  return out;
}

/** Greedy word wrap at TEXT_WIDTH; a single word longer than a line stays whole. */
function wrap(text: string, first: string, rest: string = first): string[] {
  const words = text.split(/ +/).filter((w) => w !== '');
  const lines: string[] = [];
  let line = first;
  let empty = true;
  for (const w of words) {
    if (!empty && line.length + 1 + w.length > TEXT_WIDTH) {
      lines.push(line);
      line = rest + w;
    } else {
      line += (empty ? '' : ' ') + w;
    }
    empty = false;
  }
  lines.push(line);
  return lines;
}

function fmt(v: number | null | undefined): string {
  return v === null || v === undefined || !Number.isFinite(v) ? '-' : formatMetric(v);
}
