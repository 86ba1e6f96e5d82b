import type { NetworkJson, StopReason } from '../nn/index.js';

/** One (width, restart) training: the unit of work that can run anywhere and be merged. */
export interface TrainingTask {
  width: number;
  restart: number;
}

export interface TrainingOutcome extends TrainingTask {
  reached: boolean;
  stop: StopReason;
  epochs: number;
  /** Target metric on the validation rows (training rows when there are none). */
  metric: number;
}

export interface WidthSummary {
  width: number;
  /** Restarts run before the answer was certain. */
  restarts: number;
  reached: number;
  adequate: boolean;
  /** Best and median target metric over the restarts run (null if every restart diverged). */
  best: number | null;
  median: number | null;
  /** Wilson 95% interval of the success rate. */
  wilson: [number, number];
  /** Median epochs of the restarts run. */
  medianEpochs: number;
  /** Restarts that diverged, with the reason. */
  diverged: number;
}

export interface PruneStep {
  restart: number;
  /** Width before this step. */
  width: number;
  /** Index of the neuron removed (in the network before the step). */
  neuron: number;
  metricBefore: number;
  metricAfter: number;
  kept: boolean;
}

export type SearchOutcome = 'found' | 'not-found' | 'inconclusive';

export interface Witness {
  restart: number;
  seed: number;
  /** Width at which growth found it. */
  grownWidth: number;
  network: NetworkJson;
  metric: number;
}

export interface SearchResult {
  outcome: SearchOutcome;
  /** Smallest adequate width (after pruning); null unless found. */
  width: number | null;
  /** Adequate width found by the growth phase; null unless found. */
  grownWidth: number | null;
  /** The witness's target metric; null unless found. */
  metric: number | null;
  witness: Witness | null;
  widths: WidthSummary[];
  pruning: PruneStep[];
  trainings: number;
  /** For inconclusive: how far the search got, in one sentence. */
  note: string | null;
  /** Wall-clock figures only. */
  timing: { searchSeconds: number; growthSeconds: number; pruneSeconds: number };
}

export interface ProgressEvent {
  phase: 'growth' | 'prune';
  width: number;
  restart: number;
  epoch: number;
  /** Best target metric seen so far (null before any). */
  best: number | null;
}
