/**
 * The terminal report: the same facts as the comment, plain text, at most 80 columns
 * (a long repository name may run over; each is clipped at 200 characters).
 */
import type { DataChanges } from '../gate/types.js';
import { escapeText as plain } from '../common/escape.js';
import { MAX_MESSAGE } from '../common/errors.js';
import { formatCount, formatDelta, formatMetric, formatSeconds, neurons, targetPhrase } from '../common/format.js';
import type { Report } from './types.js';
import { currentWidthCell, overDeviceBudget, VERDICT_LABEL, viewOf } from './view.js';

export const TEXT_WIDTH = 80;

export function renderText(report: Report): string {
  const view = viewOf(report);
  const out: string[] = [];
  const label = VERDICT_LABEL[view.verdict];
  // Reasons are our sentences (their repository strings clipped where they were quoted): shown whole.
  out.push(...wrap(`neuron-budget: ${label}. ${plain(view.headline, MAX_MESSAGE)}`, ''));
  for (const r of view.otherReasons) out.push(...wrap(plain(r, MAX_MESSAGE), '  - ', '    '));
  out.push('');

  const b = view.baseline;
  const c = view.current;
  const dash = '-';
  const cWidth = currentWidthCell(view, report, dash);
  const rowsDelta =
    b && b.rows !== null && c.rows !== null && b.rows !== c.rows ? ` (${formatDelta(c.rows - b.rows)})` : '';
  const table: [string, string, string][] = [
    ['', 'baseline', 'this change'],
    ['smallest adequate width', b?.width == null ? dash : String(b.width), cWidth],
    [`${view.metricName} at that width`, fmt(b?.metric), fmt(c.metric)],
    ['networks meeting target there', b?.met == null ? dash : String(b.met), c.met === null ? dash : String(c.met)],
    [
      'data rows',
      b?.rows == null ? dash : formatCount(b.rows),
      c.rows === null ? dash : `${formatCount(c.rows)}${rowsDelta}`,
    ],
    [
      'search time',
      formatSeconds(b?.searchSeconds).replace('—', dash),
      formatSeconds(c.searchSeconds).replace('—', dash),
    ],
  ];
  for (const [name, before, after] of table)
    out.push(`${name.padEnd(32)}${before.padStart(16)}${after.padStart(24)}`.trimEnd());
  if (view.backing !== null) {
    out.push('');
    out.push(...wrap(view.backing, ''));
  }
  out.push('');
  const terms = [`target: ${targetPhrase(view.metricName, view.threshold)}`];
  if (report.gate) {
    terms.push(report.gate.maxWidth === null ? 'no device budget' : `device budget: ${neurons(report.gate.maxWidth)}`);
    terms.push(`allowed growth: ${report.gate.allowedGrowth}`);
  }
  out.push(...wrap(`${terms.join('; ')}.`, ''));
  out.push(...wrap(`data: ${plain(report.data.file)}`, ''));

  if (view.rows.length > 0) {
    out.push('');
    out.push(`${view.metricName} by width (best network; networks that met the target)`);
    const head = b ? ['width', 'this change', 'met', 'baseline', 'met'] : ['width', 'best', 'met', 'wilson 95%'];
    out.push(head.map((h, i) => (i === 0 ? h.padStart(7) : h.padStart(14))).join(''));
    for (const r of view.rows) {
      const cells = [
        `${r.width === c.width ? '>' : ' '}${String(r.width).padStart(6)}`,
        fmt(r.current?.best),
        r.current ? String(r.current.met) : dash,
      ];
      if (b) cells.push(fmt(r.baseline?.best), r.baseline ? String(r.baseline.met) : dash);
      else cells.push(r.current ? `${r.current.wilson[0].toFixed(2)}-${r.current.wilson[1].toFixed(2)}` : dash);
      out.push(cells.map((x, i) => (i === 0 ? x : x.padStart(14))).join(''));
    }
    out.push("  (> marks this change's width; the threshold is " + formatMetric(view.threshold) + ')');
  }

  if (view.history.length > 0) {
    out.push('');
    out.push(`capacity drift (accepted baselines, oldest first${c.width !== null ? ', then now' : ''}):`);
    const widths = view.history.slice(-20).map((h) => String(h.width));
    if (c.width !== null) widths.push(`now ${c.width}`);
    out.push(...wrap(`width ${widths.join(' -> ')}`, '  ', '  '));
  }

  const pruning = report.search?.pruning ?? [];
  if (pruning.length > 0) {
    const removed = pruning.filter((s) => s.accepted).length;
    out.push('');
    out.push(
      `pruning: ${pruning.length} step${pruning.length === 1 ? '' : 's'}, ${removed} neuron${removed === 1 ? '' : 's'} removed`,
    );
  }

  if (report.changes) {
    out.push('');
    out.push('data changes since the baseline:');
    for (const line of changeLines(report.changes)) out.push(...wrap(line, '  - ', '    '));
  }

  out.push('');
  out.push(
    ...wrap('To accept this result as the baseline: neuron-budget baseline (then commit the baseline file).', ''),
  );
  if (overDeviceBudget(report)) {
    out.push(
      ...wrap(
        'A new baseline does not lift the device budget: this check keeps failing until the width fits it or gate.max-width is raised.',
        '',
      ),
    );
  }
  out.push(...wrap('A passing gate is not a safety sign-off for a device.', ''));
  return `${out.join('\n')}\n`;
}

function changeLines(ch: DataChanges): string[] {
  const lines: string[] = [];
  if (ch.file) lines.push(`data file ${plain(ch.file.before)} -> ${plain(ch.file.after)}`);
  if (!ch.changed) lines.push('same data as the baseline (same fingerprint)');
  else
    lines.push(
      `rows ${formatCount(ch.rows.before)} -> ${formatCount(ch.rows.after)} (${ascii(formatDelta(ch.rows.after - ch.rows.before))})`,
    );
  for (const l of ch.classesAppeared) lines.push(`new class ${plain(l)}`);
  for (const l of ch.classesVanished) lines.push(`class ${plain(l)} no longer appears`);
  for (const c of ch.classes ?? []) {
    if (c.before !== c.after)
      lines.push(
        `class ${plain(c.label)}: ${formatCount(c.before)} -> ${formatCount(c.after)} rows (${ascii(formatDelta(c.after - c.before))})`,
      );
  }
  for (const n of ch.columnsAdded) lines.push(`column added: ${plain(n)}`);
  for (const n of ch.columnsRemoved) lines.push(`column removed: ${plain(n)}`);
  for (const f of ch.features) {
    const parts: string[] = [];
    if (f.meanMoved)
      parts.push(
        `mean ${fmt(f.meanBefore)} -> ${fmt(f.meanAfter)}${f.shiftInStd === null ? '' : ` (${f.shiftInStd.toFixed(1)} std)`}`,
      );
    if (f.rangeWidened)
      parts.push(
        `range ${fmt(f.rangeBefore[0])}..${fmt(f.rangeBefore[1])} -> ${fmt(f.rangeAfter[0])}..${fmt(f.rangeAfter[1])}`,
      );
    lines.push(`feature ${plain(f.name)}: ${parts.join('; ')}`);
  }
  for (const c of ch.categories) {
    if (c.appeared.length > 0)
      lines.push(`feature ${plain(c.feature)}: new categories ${c.appeared.map((s) => plain(s)).join(', ')}`);
    if (c.vanished.length > 0)
      lines.push(`feature ${plain(c.feature)}: categories gone ${c.vanished.map((s) => plain(s)).join(', ')}`);
  }
  return lines;
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
  return v === null || v === undefined ? '-' : formatMetric(v);
}

function ascii(s: string): string {
  return s.replace('−', '-');
}
