/**
 * The gate stage of the job, for src/run.ts: read the baseline, compare, and in
 * `baseline` mode record the result. The only gate code that touches files.
 *
 * A corrupt or future-version baseline is a UserError in both modes (exit 2): `baseline`
 * does not silently replace a file it cannot read, because that would throw its history
 * away; the message tells the user to fix or delete it. A search that found no width
 * leaves the baseline file untouched. So does a baseline file that changed while the search
 * ran (another `baseline` run): recording over it would lose that run's entry (exit 2).
 */
import type { Config, GateConfig } from '../config/types.js';
import type { LoadedData } from '../data/types.js';
import type { DeviceCost } from '../device/index.js';
import type { SearchResult } from '../search/types.js';
import { nextBaseline, whyNotRecordable } from './baseline.js';
import { updateBaseline } from './baseline-update.js';
import { evaluateGate, type GateOutcome } from './evaluate.js';
import type { Baseline, BaselineRecord } from './types.js';

export interface GateStageInput {
  mode: 'check' | 'baseline';
  result: SearchResult;
  loaded: Pick<LoadedData, 'fingerprint' | 'profile'>;
  config: Config;
  /** Absolute baseline path (the --baseline override, else config.gate.baseline). */
  baselinePath: string;
  /** The path as the user wrote it, for messages. */
  baselineShown: string;
  /** What the witness costs on the device; null without a witness. */
  cost?: DeviceCost | null;
  /** The baseline as read before the search (null: none). */
  previous: Baseline | null;
  /** For the history (baseline mode). */
  commit: string | null;
  date: Date;
  toolVersion: string;
}

export interface GateStageResult {
  /** Compared against the baseline as it was before this run. */
  outcome: GateOutcome;
  /** Absolute path written (baseline mode, recordable result), else null. */
  written: string | null;
  /** Baseline mode: what was written, or why nothing was; null in check mode. */
  record: BaselineRecord | null;
  /** The gate settings in effect (the --baseline override applied), for withGate. */
  gate: GateConfig;
}

export async function runGateStage(input: GateStageInput): Promise<GateStageResult> {
  const previous = input.previous;
  const config =
    input.baselinePath === input.config.gate.baseline
      ? input.config
      : {
          ...input.config,
          gate: { ...input.config.gate, baseline: input.baselinePath, baselineAsWritten: input.baselineShown },
        };
  const outcome = evaluateGate({
    result: input.result,
    loaded: input.loaded,
    config,
    baseline: previous,
    cost: input.cost ?? null,
  });
  if (input.mode === 'check') return { outcome, written: null, record: null, gate: config.gate };

  const why = whyNotRecordable(input.result);
  if (why !== null) return { outcome, written: null, record: { notWritten: why }, gate: config.gate };
  const next = nextBaseline(
    previous,
    { result: input.result, loaded: input.loaded, config },
    { date: input.date, commit: input.commit, toolVersion: input.toolVersion },
  );
  // Only if the file still holds what `previous` was read from: never drop another run's entry.
  await updateBaseline(input.baselinePath, input.baselineShown, previous, next);
  const record = { file: input.baselineShown, width: next.result.width, historyEntries: next.history.length };
  return { outcome, written: input.baselinePath, record, gate: config.gate };
}
