/**
 * Mermaid `xychart-beta` blocks. Only numbers computed by neuron-budget and fixed
 * words written here ever reach a chart, so nothing from the repository can break it;
 * `chartText` still refuses anything outside a small alphabet as a second line of defence.
 *
 * The constructs used: an init directive that sets the series colours, `xychart-beta`, `title "…"`, `x-axis "…" ["…", …]`,
 * `y-axis "…" a --> b`, `line [n, …]`, `bar [n, …]`. Every series has exactly one value
 * per x-axis category: Mermaid draws a missing value as a broken path, so a width with
 * no value is left out of the chart (the table beside it still lists it).
 */
import { formatMetric } from '../common/format.js';

/** Letters, digits, space and . , - + (a width read from a baseline file may print as 1e+21). */
const SAFE_TEXT = /^[A-Za-z0-9 .,+-]*$/;

function chartText(s: string): string {
  if (!SAFE_TEXT.test(s)) throw new Error(`chart text outside the safe alphabet: ${JSON.stringify(s)}`);
  return `"${s}"`;
}

function chartNumber(n: number): string {
  const s = formatMetric(n);
  if (!/^-?\d+(\.\d+)?$/.test(s)) throw new Error(`not a chart number: ${n}`);
  return s;
}

export interface ChartSeries {
  kind: 'line' | 'bar';
  values: number[];
  /** `#rrggbb`; mermaid's default palette starts with a near-white lavender that hides bars. */
  color: string;
}

/** Colours readable on GitHub's light and dark themes. */
export const CHART_COLORS = { baseline: '#8c959f', current: '#0969da', limit: '#cf222e' } as const;

export interface ChartSpec {
  title: string;
  xTitle: string;
  categories: string[];
  yTitle: string;
  yRange: [number, number];
  series: ChartSeries[];
}

export function renderChart(spec: ChartSpec): string {
  for (const s of spec.series) {
    if (s.values.length !== spec.categories.length) {
      throw new Error('every chart series needs one value per category');
    }
  }
  for (const s of spec.series) {
    if (!/^#[0-9a-f]{6}$/.test(s.color)) throw new Error(`not a chart colour: ${JSON.stringify(s.color)}`);
  }
  const palette = spec.series.map((s) => s.color).join(',');
  const lines = [
    '```mermaid',
    `%%{init: {"themeVariables": {"xyChart": {"plotColorPalette": "${palette}"}}}}%%`,
    'xychart-beta',
    `  title ${chartText(spec.title)}`,
    `  x-axis ${chartText(spec.xTitle)} [${spec.categories.map(chartText).join(', ')}]`,
    `  y-axis ${chartText(spec.yTitle)} ${chartNumber(spec.yRange[0])} --> ${chartNumber(spec.yRange[1])}`,
    ...spec.series.map((s) => `  ${s.kind} [${s.values.map(chartNumber).join(', ')}]`),
    '```',
  ];
  return lines.join('\n');
}

/*
 * The ranges below take values read from a baseline file, which may be any finite number:
 * every step that could overflow (a margin on top of 1.7e308) stops at the largest float, so
 * an axis end is always a finite number.
 */

/** A y-axis range that shows every value and the threshold with a little room. */
export function metricRange(values: number[], threshold: number, accuracy: boolean): [number, number] {
  const all = [...values, threshold].filter(Number.isFinite);
  if (accuracy) {
    const low = Math.min(...all);
    // Keep the axis from collapsing when every value is 1.
    return [Math.min(0.9, Math.max(0, Math.floor(low * 10) / 10)), 1];
  }
  const high = Math.max(...all, 0);
  return [0, niceCeil(finite(high * 1.1))];
}

export function countRange(values: number[]): [number, number] {
  const high = Math.max(1, ...values.filter(Number.isFinite));
  return [0, finite(Math.ceil(finite(high * 1.15)) + 1)];
}

function niceCeil(x: number): number {
  if (x <= 0) return 1;
  const step = 10 ** Math.floor(Math.log10(x));
  return finite(Math.ceil(x / step) * step);
}

/** x, or the largest float when x overflowed. */
function finite(x: number): number {
  return Math.min(x, Number.MAX_VALUE);
}
