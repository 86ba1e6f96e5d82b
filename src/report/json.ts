/**
 * Fills the gate's part of the JSON report: verdict, reasons, the baseline it was
 * judged against, the gate settings and the data changes. Pure: returns a new Report.
 */
import type { GateConfig } from '../config/types.js';
import type { GateOutcome } from '../gate/evaluate.js';
import type { Report, ReportDraft } from './types.js';

export function withGate(report: ReportDraft, outcome: GateOutcome, gate: GateConfig): Report {
  const b = outcome.baseline;
  return {
    ...report,
    verdict: outcome.verdict,
    reasons: [...outcome.reasons],
    baseline: b
      ? {
          width: b.result.width,
          metric: b.result.metric.value,
          file: gate.baselineAsWritten,
          met: b.result.met,
          restarts: b.result.restarts,
          rows: b.data.rows,
          searchSeconds: b.result.searchSeconds,
          toolVersion: b.tool.version,
          sameSettings: outcome.settingsChanged.length === 0,
          settingsChanged: [...outcome.settingsChanged],
          widths: b.widths.map((w) => ({ ...w })),
          history: b.history.map((h) => ({ ...h })),
        }
      : null,
    gate: {
      maxWidth: gate.maxWidth,
      maxFlashBytes: gate.maxFlashBytes,
      maxRamBytes: gate.maxRamBytes,
      maxMacs: gate.maxMacs,
      allowedGrowth: gate.allowedGrowth,
      metricTolerance: gate.metricTolerance,
      baselineFile: gate.baselineAsWritten,
    },
    changes: outcome.changes,
  };
}
