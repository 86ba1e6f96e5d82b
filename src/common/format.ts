/** Number and word formatting shared by the search's notes, the gate's reasons and every renderer. Locale-free. */
import { comparator, higherIsBetter, type MetricName } from './metric.js';

/**
 * A metric value with up to 4 decimals, trailing zeros trimmed (0.95, 0.9625, 0.9615),
 * never in exponent form so it is also a valid Mermaid number.
 */
export function formatMetric(value: number): string {
  if (!Number.isFinite(value)) return String(value);
  const abs = Math.abs(value);
  const decimals = abs >= 1000 ? 1 : abs >= 100 ? 2 : 4;
  let s = value.toFixed(decimals);
  if (s.includes('e')) s = BigInt(Math.round(value)).toString();
  if (s.includes('.')) s = s.replace(/0+$/, '').replace(/\.$/, '');
  return s === '-0' ? '0' : s;
}

/** Whole numbers with thin grouping commas: 12,345. */
export function formatCount(n: number): string {
  const s = String(Math.trunc(Math.abs(n)));
  const grouped = s.replace(/\B(?=(\d{3})+(?!\d))/g, ',');
  return n < 0 ? `-${grouped}` : grouped;
}

/** Signed difference: +12, -3, 0 (ASCII minus, the same in tables, lists and the terminal). */
export function formatDelta(n: number): string {
  if (n > 0) return `+${formatCount(n)}`;
  if (n < 0) return `-${formatCount(-n)}`;
  return '0';
}

/**
 * A measured duration as every file holds it: seconds, rounded to whole milliseconds (a clock
 * reading's last digits are noise, and 0.06729538599999978 reads as a bug).
 */
export function secondsFromMs(ms: number): number {
  return Math.round(ms) / 1000;
}

export function formatSeconds(seconds: number | null | undefined): string {
  if (seconds === null || seconds === undefined || !Number.isFinite(seconds)) return '—';
  if (seconds < 10) return `${seconds.toFixed(2)} s`;
  if (seconds < 120) return `${seconds.toFixed(1)} s`;
  const m = Math.floor(seconds / 60);
  return `${m} min ${Math.round(seconds - m * 60)} s`;
}

export function neurons(n: number): string {
  return n === 1 ? '1 hidden neuron' : `${formatCount(n)} hidden neurons`;
}

/** "accuracy ≥ 0.95" / "rmse ≤ 0.3". */
export function targetShort(metric: MetricName, threshold: number): string {
  return `${metric} ${comparator(metric)} ${formatMetric(threshold)}`;
}

/** "accuracy of at least 0.95" / "rmse of at most 0.3". */
export function targetPhrase(metric: MetricName, threshold: number): string {
  return `${metric} of ${higherIsBetter(metric) ? 'at least' : 'at most'} ${formatMetric(threshold)}`;
}
