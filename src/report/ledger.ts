/**
 * The device ledger: what the width found costs, against each budget set and against what the
 * baseline's width costs on the same inputs. One list of rows and one sentence, shown by every screen.
 */
import type { DeviceCost } from '../device/index.js';
import { formatCount, neurons } from '../common/format.js';
import type { Report } from './types.js';

export interface LedgerRow {
  label: string;
  unit: '' | ' B';
  now: number;
  budget: number | null;
  /** At the baseline's width (this run's inputs and outputs); null without one. */
  atBaseline: number | null;
}

export interface Ledger {
  precision: 'float32' | 'int8';
  baselineWidth: number | null;
  rows: LedgerRow[];
}

/** The ledger, or null when there is no width to cost. */
export function ledgerOf(report: Report): Ledger | null {
  // A network's cost depends on its width alone (for these inputs and outputs): the width's entry holds it.
  const costAt = (width: number): DeviceCost | null =>
    report.search?.widths.find((w) => w.width === width)?.cost ?? null;
  if (report.width === null) return null;
  const c = report.device?.cost ?? costAt(report.width);
  if (c === null) return null;
  const p = report.device?.precision ?? 'float32';
  const other = p === 'int8' ? 'float32' : 'int8';
  const g = report.gate ?? null;
  const baselineWidth = report.baseline?.width ?? null;
  const base = baselineWidth === null ? null : costAt(baselineWidth);
  return {
    precision: p,
    baselineWidth,
    rows: [
      { label: 'hidden neurons', unit: '', now: report.width, budget: g?.maxWidth ?? null, atBaseline: baselineWidth },
      {
        label: `flash, ${p}`,
        unit: ' B',
        now: c.flashBytes[p],
        budget: g?.maxFlashBytes ?? null,
        atBaseline: base?.flashBytes[p] ?? null,
      },
      {
        label: `flash, ${other}`,
        unit: ' B',
        now: c.flashBytes[other],
        budget: null,
        atBaseline: base?.flashBytes[other] ?? null,
      },
      {
        label: `RAM, ${p}`,
        unit: ' B',
        now: c.ramBytes[p],
        budget: g?.maxRamBytes ?? null,
        atBaseline: base?.ramBytes[p] ?? null,
      },
      {
        label: `RAM, ${other}`,
        unit: ' B',
        now: c.ramBytes[other],
        budget: null,
        atBaseline: base?.ramBytes[other] ?? null,
      },
      {
        label: 'multiply-accumulates',
        unit: '',
        now: c.macs,
        budget: g?.maxMacs ?? null,
        atBaseline: base?.macs ?? null,
      },
    ],
  };
}

export function amount(n: number, unit: LedgerRow['unit']): string {
  return `${formatCount(n)}${unit}`;
}

/** "5 (over by 2)" / "600 B (fits, 77 B spare)" / "none set". */
export function budgetCell(row: LedgerRow): string {
  if (row.budget === null) return 'none set';
  const gap = row.now - row.budget;
  return gap > 0
    ? `${amount(row.budget, row.unit)} (over by ${amount(gap, row.unit)})`
    : `${amount(row.budget, row.unit)} (fits, ${amount(-gap, row.unit)} spare)`;
}

/** The second answer: does the width found fit the device? */
export function fitsSentence(ledger: Ledger | null): string {
  if (ledger === null) return 'Nothing to cost: no width is adequate.';
  const budgeted = ledger.rows.filter((r) => r.budget !== null);
  if (budgeted.length === 0) {
    return 'No device budget is set, so nothing is gated; the ledger shows what the network costs. Set gate.max-width, gate.max-flash-bytes, gate.max-ram-bytes or gate.max-macs to gate on it.';
  }
  const over = budgeted.filter((r) => r.now > r.budget!);
  if (over.length > 0)
    return `No: ${over.map((r) => `${excess(r)} over the budget of ${amount(r.budget!, r.unit)}`).join('; ')}.`;
  return `Yes, within every budget set: ${budgeted.map((r) => `${r.label} ${amount(r.now, r.unit)} of ${amount(r.budget!, r.unit)}`).join(', ')}.`;
}

/** "2 hidden neurons" / "123 B of flash, int8" / "12 multiply-accumulates". */
function excess(r: LedgerRow): string {
  const gap = r.now - r.budget!;
  if (r.label === 'hidden neurons') return neurons(gap);
  return r.unit === '' ? `${formatCount(gap)} ${r.label}` : `${amount(gap, r.unit)} of ${r.label}`;
}
