/**
 * The gate's decision: a search result and the baseline, judged by the gate settings,
 * become a verdict and one-sentence reasons a reviewer can act on without the docs.
 *
 * Deciding reasons come first (reasons[0] is the headline); flags that do not change
 * the verdict follow. The metric tolerance is such a flag: a metric that got worse at
 * the chosen width is reported, but the width alone decides pass or fail, because the
 * width is what the device pays for and the target threshold already bounds the metric.
 */
import type { GateConfig, MetricName } from '../config/types.js';
import { formatCount, formatMetric, neurons, targetPhrase } from '../common/format.js';
import type { DeviceCost } from '../device/index.js';
import { higherIsBetter } from '../common/metric.js';
import type { SearchResult } from '../search/types.js';
import { settingsDifferences } from './settings.js';
import type { Baseline, ResultSettings, Verdict } from './types.js';

export interface CompareInput {
  result: Pick<SearchResult, 'outcome' | 'width' | 'metric' | 'notes' | 'widths'>;
  target: { metric: MetricName; threshold: number };
  /** The search range actually searched, and the networks a width needs. */
  search: { minWidth: number; maxWidth: number; required: number };
  gate: Pick<GateConfig, 'maxWidth' | 'allowedGrowth' | 'metricTolerance'> &
    Partial<Pick<GateConfig, 'maxFlashBytes' | 'maxRamBytes' | 'maxMacs'>>;
  /** What the witness costs on the device, and which form the budgets apply to; null without a witness. */
  device?: { cost: DeviceCost; precision: 'float32' | 'int8' } | null;
  baseline: Baseline | null;
  /** This run's result-changing settings (see settings.ts). */
  settings: ResultSettings;
}

export interface Comparison {
  verdict: Verdict;
  reasons: string[];
  /** Result-changing settings that differ from the baseline's, as "key: before → after". */
  settingsChanged: string[];
}

export function compare(input: CompareInput): Comparison {
  const { result, target, search, gate, baseline } = input;
  const settingsChanged = baseline ? settingsDifferences(baseline.config.settings, input.settings) : [];
  const flags: string[] = [];
  if (settingsChanged.length > 0) {
    flags.push(
      `The settings that shape the result differ from the baseline's (${settingsChanged.join('; ')}), so this compares answers to different questions.`,
    );
  }

  if (result.outcome === 'inconclusive') {
    const how = result.notes.length > 0 ? ` ${result.notes.map(sentence).join(' ')}` : '';
    return {
      verdict: 'inconclusive',
      reasons: [`The search ran out of budget before it could decide the smallest adequate width.${how}`, ...flags],
      settingsChanged,
    };
  }

  if (result.outcome !== 'found' || result.width === null || result.metric === null) {
    const best = bestSeen(result.widths, target.metric);
    const bestText = best ? `; the best network reached ${formatMetric(best.value)} (width ${best.width})` : '';
    const networks = search.required === 1 ? 'a network that meets' : `${search.required} networks that meet`;
    return {
      verdict: 'fail',
      reasons: [
        `No width from ${search.minWidth} to ${search.maxWidth} has ${networks} ${targetPhrase(target.metric, target.threshold)}${bestText}.`,
        ...result.notes.map(sentence),
        ...flags,
      ],
      settingsChanged,
    };
  }

  const width = result.width;
  const failures: string[] = [];
  if (gate.maxWidth !== null && width > gate.maxWidth) {
    failures.push(`Needs ${neurons(width)}; the device budget is ${gate.maxWidth}.`);
  }
  failures.push(...budgetFailures(input));

  if (!baseline) {
    if (failures.length > 0) return { verdict: 'fail', reasons: [...failures, ...flags], settingsChanged };
    return {
      verdict: 'new',
      reasons: [
        `Needs ${neurons(width)}; there is no baseline yet to compare with, so record this result as the baseline.`,
        ...flags,
      ],
      settingsChanged,
    };
  }

  const before = baseline.result.width;
  const growth = width - before;
  const allowed = gate.allowedGrowth;
  const allowance = allowed === 0 ? 'no growth is allowed' : `the allowed growth is ${allowed}`;
  let comparison: string;
  if (growth > allowed) {
    failures.push(`Needs ${neurons(width)}, ${growth} more than the baseline's ${before}; ${allowance}.`);
    comparison = '';
  } else if (growth > 0) {
    comparison = `Needs ${neurons(width)}, ${growth} more than the baseline's ${before}, within the allowed growth of ${allowed}.`;
  } else if (growth < 0) {
    comparison = `Needs ${neurons(width)}, ${-growth} fewer than the baseline's ${before}; refresh the baseline to keep the gain.`;
  } else {
    comparison = `Needs ${neurons(width)}, the same as the baseline.`;
  }

  const tolerance = toleranceFlag(result.metric, baseline, target.metric, gate.metricTolerance);
  if (tolerance) flags.push(tolerance);

  if (failures.length > 0) {
    const context = comparison === '' ? [] : [comparison];
    return { verdict: 'fail', reasons: [...failures, ...context, ...flags], settingsChanged };
  }
  return { verdict: growth < 0 ? 'improved' : 'pass', reasons: [comparison, ...flags], settingsChanged };
}

function toleranceFlag(value: number, baseline: Baseline, metric: MetricName, tolerance: number): string | null {
  const before = baseline.result.metric.value;
  const worse = higherIsBetter(metric) ? before - value : value - before;
  // A tiny epsilon so that a difference equal to the tolerance (up to rounding) is not flagged.
  if (worse <= tolerance + 1e-12) return null;
  return `Flag (does not fail the gate): ${metric} at the chosen width is ${formatMetric(value)}, ${formatMetric(worse)} worse than the baseline's ${formatMetric(before)}; the tolerance is ${formatMetric(tolerance)}.`;
}

function bestSeen(
  widths: CompareInput['result']['widths'],
  metric: MetricName,
): { width: number; value: number } | null {
  let best: { width: number; value: number } | null = null;
  for (const w of widths) {
    if (w.best === null) continue;
    const better = best === null || (higherIsBetter(metric) ? w.best > best.value : w.best < best.value);
    if (better) best = { width: w.width, value: w.best };
  }
  return best;
}

function sentence(s: string): string {
  const t = s.trim();
  const capital = t.charAt(0).toUpperCase() + t.slice(1);
  return /[.!?]$/.test(capital) ? capital : `${capital}.`;
}

/** One sentence per byte or operation budget the witness exceeds, naming the figure and the budget. */
function budgetFailures(input: CompareInput): string[] {
  const { gate, device } = input;
  if (!device) return [];
  const { cost, precision } = device;
  const out: string[] = [];
  const at = `(width ${input.result.width})`;
  if (gate.maxFlashBytes != null && cost.flashBytes[precision] > gate.maxFlashBytes) {
    out.push(
      `Needs ${formatCount(cost.flashBytes[precision])} flash bytes for its ${precision} weights ${at}; the device budget is ${formatCount(gate.maxFlashBytes)} bytes.`,
    );
  }
  if (gate.maxRamBytes != null && cost.ramBytes[precision] > gate.maxRamBytes) {
    out.push(
      `Needs ${formatCount(cost.ramBytes[precision])} RAM bytes for one ${precision} inference ${at}; the device budget is ${formatCount(gate.maxRamBytes)} bytes.`,
    );
  }
  if (gate.maxMacs != null && cost.macs > gate.maxMacs) {
    out.push(
      `Needs ${formatCount(cost.macs)} multiply-accumulates per inference ${at}; the device budget is ${formatCount(gate.maxMacs)}.`,
    );
  }
  return out;
}
