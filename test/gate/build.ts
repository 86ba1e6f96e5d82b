/**
 * Hand-built inputs for the gate and report tests. All values are invented for the
 * pump-vibration scenario; none are measurements.
 */
import type { Config } from '../../src/config/types.js';
import { testConfig, type ConfigOverrides } from '../helpers/config.js';
import type { DataProfile, Encoding, LoadedData } from '../../src/data/types.js';
import { searchStageReport } from '../../src/report/assemble.js';
import type { ReportDraft } from '../../src/report/types.js';
import type { PruneStep, SearchResult, WidthSummary } from '../../src/search/types.js';
import { wilsonInterval } from '../../src/search/wilson.js';

export function config(over: ConfigOverrides = {}): Config {
  return testConfig('/repo', {
    ...over,
    data: { path: 'examples/pump-vibration/readings.csv', ignore: ['reading_id'], ...over.data },
    gate: { maxWidth: 8, ...over.gate },
  });
}

/** One width summary: `met` fresh restarts of `restarts` met the target; `best` is the best judged metric. */
export function width(w: number, met: number, restarts: number, best: number | null, required = 3): WidthSummary {
  return {
    width: w,
    restarts,
    reached: met,
    met,
    metBy: { fresh: met, pruned: 0 },
    adequate: met >= required,
    best,
    // Invented: the required-th best sits just under the threshold (0.95) on a width that is not adequate.
    decisive: best === null ? null : met >= required ? best : Math.min(best, 0.949),
    bestTrain: best === null ? null : Math.min(1, best + 0.02),
    median: best === null ? null : best - 0.01,
    wilson: wilsonInterval(met, restarts),
    medianEpochs: 400 + 50 * w,
    diverged: 0,
  };
}

/** A found result whose growth phase went up from 1 to `found` (invented curve). */
export function found(
  foundWidth: number,
  metric: number,
  opts: { pruning?: PruneStep[]; seconds?: number } = {},
): SearchResult {
  const widths: WidthSummary[] = [];
  for (let w = 1; w <= foundWidth; w++) {
    const best = w === foundWidth ? metric : Math.min(0.949, 0.55 + 0.06 * w);
    widths.push(width(w, w === foundWidth ? 4 : 0, 10, Number(best.toFixed(4))));
  }
  return {
    outcome: 'found',
    width: foundWidth,
    grownWidth: foundWidth,
    metric,
    witness: null,
    appraisal: null,
    widths,
    pruning: opts.pruning ?? [],
    trainings: widths.length * 10,
    notes: [],
    judging: { on: 'judging', rows: 360, folded: false },
    start: {
      from: 'min-width',
      width: 1,
      why: 'there is no baseline yet',
      decided: widths.map((w) => w.width),
      summary: `Growth started at min-width 1 (there is no baseline yet) and decided widths 1–${foundWidth}.`,
    },
    timing: { searchSeconds: opts.seconds ?? 12.5, growthSeconds: (opts.seconds ?? 12.5) - 1, pruneSeconds: 1 },
  };
}

export function notFound(maxWidth: number): SearchResult {
  const r = found(maxWidth, 0.9);
  return {
    ...r,
    outcome: 'not-found',
    width: null,
    grownWidth: null,
    metric: null,
    widths: r.widths.map((w) => ({
      ...w,
      reached: 0,
      met: 0,
      metBy: { fresh: 0, pruned: 0 },
      adequate: false,
      wilson: wilsonInterval(0, w.restarts),
    })),
    notes: [
      'Even the training rows are not fitted (the best training accuracy was 0.91) and more neurons did not help.',
    ],
  };
}

export function inconclusive(): SearchResult {
  const r = found(3, 0.9);
  return {
    ...r,
    outcome: 'inconclusive',
    width: null,
    grownWidth: null,
    metric: null,
    notes: ['the time budget of 60 s ran out after widths 1 to 3'],
  };
}

export function profile(over: Partial<DataProfile> = {}): DataProfile {
  return {
    rows: 1800,
    classes: { bearing_wear: 450, imbalance: 450, normal: 900 },
    columns: ['pump_model', 'rms_velocity', 'kurtosis', 'band_1x', 'condition'],
    features: {
      pump_model: { kind: 'categorical', counts: { 'P-100': 1000, 'P-200': 800 }, missing: 0 },
      rms_velocity: { kind: 'numeric', mean: 2.4, std: 0.8, min: 0.6, max: 5.1, missing: 0 },
      kurtosis: { kind: 'numeric', mean: 3.2, std: 0.9, min: 1.8, max: 8.4, missing: 0 },
      band_1x: { kind: 'numeric', mean: 1.1, std: 0.4, min: 0.2, max: 2.6, missing: 0 },
    },
    ...over,
  };
}

export function loaded(
  p: DataProfile = profile(),
  fingerprint = 'a'.repeat(64),
): Pick<LoadedData, 'fingerprint' | 'profile'> {
  return { fingerprint, profile: p };
}

/** The data-stage report the job builds before the gate runs (what runJob fills). */
export function dataReport(
  result: SearchResult,
  cfg: Config,
  p: DataProfile = profile(),
  fingerprint = 'a'.repeat(64),
): ReportDraft {
  const validationRows = Math.round(p.rows * cfg.data.validation);
  const judgingRows = Math.round(p.rows * cfg.data.judging);
  const draft: ReportDraft = {
    schema: 'neuron-budget/report@2',
    tool: { name: 'neuron-budget', version: '0.1.0' },
    reasons: [],
    width: null,
    metric: { name: cfg.target.metric, value: null, threshold: cfg.target.threshold },
    baseline: null,
    data: {
      file: cfg.data.pathAsWritten,
      rows: p.rows,
      droppedRows: 0,
      trainRows: p.rows - validationRows - judgingRows,
      validationRows,
      judgingRows,
      inputs: 6,
      outputs: p.classes ? Object.keys(p.classes).length : 1,
      task: p.classes ? 'classification' : 'regression',
      fingerprint,
      classes: p.classes ? Object.entries(p.classes).map(([label, count]) => ({ label, count })) : null,
      // An invented spread for regression profiles; the builder has no target values.
      targetSpread: p.classes ? null : { mean: 50, std: 4, min: 38, max: 62 },
    },
    search: null,
    device: null,
    changes: null,
    timing: { searchSeconds: result.timing.searchSeconds },
  };
  const encoding: Encoding = {
    features: Array.from({ length: 6 }, (_, i) => ({ kind: 'numeric' as const, name: `f${i}`, mean: 0, std: 1 })),
    target: {
      name: 'condition',
      task: p.classes ? 'classification' : 'regression',
      classes: p.classes ? Object.keys(p.classes) : null,
      mean: 0,
      std: 1,
    },
  };
  return searchStageReport(draft, result, cfg.search.required, { encoding, target: cfg.target });
}
