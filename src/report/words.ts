/**
 * The sentences every screen shares (comment, job summary, terminal): written once here, so the
 * screens cannot word the same fact two ways. Each screen passes its own escaper for the
 * repository strings the sentences quote, and its own way of showing a command.
 */
import type { DataChanges } from '../gate/types.js';
import { formatCount, formatDelta, formatMetric, formatSeconds, neurons, targetPhrase } from '../common/format.js';
import { higherIsBetter } from '../common/metric.js';
import type { Report } from './types.js';
import type { RenderContext } from './context.js';

/** Escapes a repository string for one screen (Markdown or terminal). */
export type Escape = (raw: string, max?: number) => string;
/** Shows a command or a config key as that screen does (a code span in Markdown). */
export type Code = (s: string) => string;

/** "best", "2nd best", "3rd best", "4th best". */
export function nthBest(n: number): string {
  if (n <= 1) return 'best';
  const tens = n % 100;
  const suffix = tens >= 11 && tens <= 13 ? 'th' : (['th', 'st', 'nd', 'rd'][n % 10] ?? 'th');
  return `${n}${suffix} best`;
}

/** "on 539 judging rows" (or validation/training rows when those judged). */
function judgingRowsPhrase(report: Report): string {
  const j = report.search?.judging;
  if (!j) return '';
  return `on ${formatCount(j.rows)} ${j.on} rows`;
}

/** The first answer: how many neurons the data need now, and what the witness scores. */
export function needsSentence(report: Report): string {
  const base = report.baseline?.width ?? null;
  const target = targetPhrase(report.metric.name, report.metric.threshold);
  if (report.width === null) {
    const why =
      report.search?.outcome === 'inconclusive'
        ? 'not settled: the search stopped before it could decide'
        : `no width in the search range is adequate (${report.search?.required ?? 1} of its networks meeting ${target})`;
    return `${capitalise(why)}${base === null ? '' : `; the baseline needed ${neurons(base)}`}.`;
  }
  const was =
    base === null
      ? ''
      : base === report.width
        ? ', as the baseline did'
        : ` (the baseline needed ${formatCount(base)})`;
  const parts = [`${neurons(report.width)}${was}.`];
  const value = report.metric.value;
  if (value !== null) {
    const int8 = report.device?.metric.int8 ?? null;
    const decides = report.device?.precision ?? 'float32';
    const forms =
      int8 === null
        ? ''
        : decides === 'int8'
          ? ` in the int8 form that decides (float32 ${formatMetric(report.device!.metric.float32)})`
          : `; int8 form ${formatMetric(int8)}`;
    const bound = `${higherIsBetter(report.metric.name) ? 'at least' : 'at most'} ${formatMetric(report.metric.threshold)}`;
    parts.push(
      `The witness scores ${report.metric.name} ${formatMetric(value)} ${judgingRowsPhrase(report)} (target: ${bound})${forms}.`,
    );
  }
  return parts.join(' ');
}

/** The spread of a regression target, so "rmse ≤ 6" can be read against its scale; null otherwise. */
export function targetSpreadSentence(report: Report): string | null {
  const s = report.data.targetSpread;
  if (!s || report.data.task !== 'regression') return null;
  return `The target column has mean ${formatMetric(s.mean)}, standard deviation ${formatMetric(s.std)}, range ${formatMetric(s.min)} to ${formatMetric(s.max)}.`;
}

/** One data change with how much a reviewer should care (higher first). */
interface ChangeItem {
  weight: number;
  text: string;
}

/** Every data change, most important first within the fixed order a reader expects. */
export function changeItems(ch: DataChanges, esc: Escape): ChangeItem[] {
  const items: ChangeItem[] = [];
  if (ch.file) items.push({ weight: 2, text: `Data file ${esc(ch.file.before)} → ${esc(ch.file.after)}.` });
  if (!ch.changed) {
    items.push({ weight: 0, text: "Same data as the baseline's (same fingerprint)." });
    return items;
  }
  const r = ch.rows;
  const rowShare = r.before > 0 ? Math.abs(r.after - r.before) / r.before : 1;
  items.push({
    weight: rowShare >= 0.5 ? 5 : rowShare >= 0.05 ? 3 : 1,
    text: `Rows ${formatCount(r.before)} → ${formatCount(r.after)} (${formatDelta(r.after - r.before)}).`,
  });
  for (const label of ch.classesAppeared) items.push({ weight: 6, text: `New class ${esc(label)}.` });
  for (const label of ch.classesVanished) items.push({ weight: 6, text: `Class ${esc(label)} no longer appears.` });
  for (const c of ch.classes ?? []) {
    if (c.before === c.after || c.before === 0 || c.after === 0) continue;
    // What matters is the class's share of the rows, not its count: all classes growing together is one change.
    const moved = r.before > 0 && r.after > 0 ? Math.abs(c.after / r.after - c.before / r.before) : 1;
    items.push({
      weight: moved >= 0.05 ? 4 : 1,
      text: `Class ${esc(c.label)}: ${formatCount(c.before)} → ${formatCount(c.after)} rows (${formatDelta(c.after - c.before)}${share(c, r)}).`,
    });
  }
  for (const name of ch.columnsAdded) items.push({ weight: 5, text: `Column added: ${esc(name)}.` });
  for (const name of ch.columnsRemoved) items.push({ weight: 5, text: `Column removed: ${esc(name)}.` });
  for (const f of ch.features) {
    const parts: string[] = [];
    if (f.meanMoved) {
      const by = f.shiftInStd === null ? '' : ` (${f.shiftInStd.toFixed(1)} standard deviations)`;
      parts.push(`mean ${formatMetric(f.meanBefore)} → ${formatMetric(f.meanAfter)}${by}`);
    }
    if (f.rangeWidened) {
      const g = f.rangeGrowth;
      const sides: string[] = [];
      if (g.below > 0) sides.push(`${formatMetric(g.below)} lower${inStd(g.belowInStd)}`);
      if (g.above > 0) sides.push(`${formatMetric(g.above)} higher${inStd(g.aboveInStd)}`);
      parts.push(
        `range ${formatMetric(f.rangeBefore[0])} to ${formatMetric(f.rangeBefore[1])} widened to ${formatMetric(f.rangeAfter[0])} to ${formatMetric(f.rangeAfter[1])} (${sides.join(', ')})`,
      );
    }
    if (parts.length === 0) continue;
    items.push({
      weight: f.meanMoved ? 2 + Math.min(3, 1.5 * (f.shiftInStd ?? 0)) : 2,
      text: `Feature ${esc(f.name)}: ${parts.join('; ')}.`,
    });
  }
  for (const c of ch.categories) {
    if (c.appeared.length > 0)
      items.push({
        weight: 4,
        text: `Feature ${esc(c.feature)}: new categories ${c.appeared.map((s) => esc(s)).join(', ')}.`,
      });
    if (c.vanished.length > 0)
      items.push({
        weight: 3,
        text: `Feature ${esc(c.feature)}: categories gone ${c.vanished.map((s) => esc(s)).join(', ')}.`,
      });
  }
  return items;
}

/** "; 39% → 31% of the rows", when both row counts are known. */
function share(c: { before: number; after: number }, rows: { before: number; after: number }): string {
  if (rows.before <= 0 || rows.after <= 0) return '';
  const pct = (n: number, of: number): string => `${Math.round((100 * n) / of)}%`;
  return `; ${pct(c.before, rows.before)} → ${pct(c.after, rows.after)} of the rows`;
}

/** " (1.2 standard deviations)" or nothing when the baseline's deviation was 0. */
function inStd(v: number | null): string {
  return v === null ? '' : `, ${v.toFixed(1)} standard deviations`;
}

/** Most changes the "why it changed" answer names; the evidence lists them all. */
const WHY_ITEMS = 3;

/** The third answer: why the width changed, from the settings and the data, most important first. */
export function whySentence(report: Report, esc: Escape): string {
  const b = report.baseline;
  if (b === null)
    return `No baseline to compare with: this is the first measurement of this data (${formatCount(report.data.rows)} rows).`;
  const settings = b.settingsChanged ?? [];
  const lead = settings.length > 0 ? `Settings changed: ${settings.map((s) => esc(s)).join('; ')}. ` : '';
  const ch = report.changes;
  if (ch === null) return `${lead}`.trim();
  if (!ch.changed) {
    return settings.length > 0
      ? `${lead}The data are the same as the baseline's.`
      : "Nothing changed: the same data and settings as the baseline's.";
  }
  const items = changeItems(ch, esc)
    .map((item, order) => ({ ...item, order }))
    .sort((x, y) => y.weight - x.weight || x.order - y.order);
  const shown = items.slice(0, WHY_ITEMS).map((i) => i.text);
  const more = items.length - shown.length;
  const tail = more > 0 ? ` And ${more} more change${more === 1 ? '' : 's'} in the details.` : '';
  const quiet = items.every((i) => i.weight <= 1) ? ' No class, column or feature moved beyond the thresholds.' : '';
  return `${lead}${shown.join(' ')}${quiet}${tail}`;
}

/** "Tried 14 removals on 3 networks: 3 removed, 11 put back; the witness was pruned from 8 to 7." */
export function pruningSentence(report: Report): string | null {
  const steps = report.search?.pruning ?? [];
  if (steps.length === 0) return null;
  const networks = new Set(steps.map((s) => `${s.source.width}/${s.source.restart}`)).size;
  const removed = steps.filter((s) => s.accepted).length;
  const w = report.search?.witness ?? null;
  const witness =
    w !== null && w.how === 'pruned' && w.source.width !== w.width
      ? `; the witness was pruned from ${w.source.width} to ${w.width} neurons`
      : '';
  return `Tried ${steps.length} removal${steps.length === 1 ? '' : 's'} on ${networks} network${networks === 1 ? '' : 's'}: ${removed} removed, ${steps.length - removed} put back${witness}.`;
}

/** "45 trainings in 9.40 s (growth 8.10 s, pruning 1.30 s)": what the search cost this run. */
export function searchCostSentence(report: Report): string | null {
  const s = report.search;
  if (!s) return null;
  const t = report.timing;
  const split =
    typeof t['growthSeconds'] === 'number' && typeof t['pruneSeconds'] === 'number'
      ? ` (growth ${formatSeconds(t['growthSeconds'])}, pruning ${formatSeconds(t['pruneSeconds'])})`
      : '';
  const walk = s.start === undefined ? '' : ` ${s.start.summary}`;
  return `The search ran ${formatCount(s.trainings)} training${s.trainings === 1 ? '' : 's'} in ${formatSeconds(t['searchSeconds'])}${split}.${walk}`;
}

/** Whether this run's result is already the baseline (nothing to accept). */
function baselineIsCurrent(report: Report): boolean {
  const b = report.baseline;
  return (
    b !== null &&
    b.width === report.width &&
    b.sameSettings !== false &&
    report.changes !== null &&
    !report.changes.changed &&
    report.changes.file === null
  );
}

/** What to do next, fitting the run: what was written, and the command the user would type. */
export function hints(report: Report, context: RenderContext, esc: Escape, code: Code): string[] {
  const out: string[] = [];
  const config = context.configShown === null ? '' : ` --config ${esc(context.configShown)}`;
  const file = esc(context.baselineFile ?? report.gate?.baselineFile ?? report.baseline?.file ?? 'the baseline file');
  const written = context.baseline;
  if (written !== null && 'file' in written) {
    out.push(
      `Baseline written: ${esc(written.file)}, width ${written.width}, ${written.historyEntries} history entr${written.historyEntries === 1 ? 'y' : 'ies'}. Commit it to make it the baseline.`,
    );
  } else if (written !== null) {
    out.push(`Baseline not written: ${esc(written.notWritten, 400)}.`);
  } else if (report.width !== null && report.verdict !== 'inconclusive' && !baselineIsCurrent(report)) {
    const command = code(`neuron-budget baseline${config}`);
    const action = code('update-baseline: true');
    const lead =
      report.verdict === 'new'
        ? 'To record this result as the baseline'
        : 'If this change is intended, accept it as the new baseline';
    out.push(
      context.surface === 'action'
        ? `${lead}: run the action with ${action}, or run ${command} and commit ${file}.`
        : `${lead}: run ${command} and commit ${file}.`,
    );
  }
  const budget = report.gate?.maxWidth ?? null;
  if (budget !== null && report.width !== null && report.width > budget) {
    out.push(
      `A new baseline does not lift the device budget: this check fails until the width fits it or ${code('gate.max-width')} is raised.`,
    );
  }
  return out;
}

export const SIGN_OFF = 'A passing gate is not a safety sign-off for a device.';

export function capitalise(s: string): string {
  return s.length > 0 ? s[0].toUpperCase() + s.slice(1) : s;
}
