import type { MetricName, Task } from '../config/types.js';
import type { PruneStep, SearchOutcome, WidthSummary } from '../search/types.js';

export type Verdict = 'pass' | 'fail' | 'improved' | 'new' | 'inconclusive';

/**
 * The JSON report (CLI --report, action output `report`). Everything outside `timing`
 * is identical for identical inputs, whatever the machine.
 */
export interface Report {
  schema: 'neuron-budget/report@1';
  tool: { name: 'neuron-budget'; version: string };
  /** null only while the search has not run (data stage only). */
  verdict: Verdict | null;
  reasons: string[];
  width: number | null;
  metric: { name: MetricName; value: number | null; threshold: number };
  baseline: { width: number | null; metric: number | null } | null;
  data: {
    file: string;
    rows: number;
    droppedRows: number;
    trainRows: number;
    validationRows: number;
    inputs: number;
    outputs: number;
    task: Task;
    fingerprint: string;
    classes: { label: string; count: number }[] | null;
  };
  search: {
    outcome: SearchOutcome | null;
    grownWidth: number | null;
    widths: WidthSummary[];
    pruning: PruneStep[];
    trainings: number;
    note: string | null;
  } | null;
  /** Data changes against the baseline (filled by the gate). */
  changes: unknown;
  timing: Record<string, number>;
}
