import type { GrowthMode } from '../config/types.js';
import type { NetworkJson, StopReason } from '../nn/index.js';

/** One (width, restart) training: the unit of work that can run anywhere and be merged. */
export interface TrainingTask {
  width: number;
  /** 0-based internally (it seeds the restart's random stream); screens show it from 1. */
  restart: number;
}

/** How one trained network did: on the steering rows (which stopped its training) and on the judging rows. */
export interface Judged {
  /** The target metric on the training rows. */
  train: number;
  /** The target metric on the steering rows (validation rows, or training rows when there are none). */
  steering: number;
  /** The target metric on the judging rows: the figure that decides. NaN when the training diverged. */
  judged: number;
  /** The steering rows met the target (training stopped there, or was polished to it). */
  reached: boolean;
  /** The judging rows met the target: this network counts toward its width's adequacy. */
  met: boolean;
}

export interface WidthSummary {
  width: number;
  /** Fresh restarts run at this width before its answer was certain (0 when growth never tried it). */
  restarts: number;
  /** Fresh restarts whose steering rows met the target. */
  reached: number;
  /** Networks of this width that met the target on the judging rows, from any source. */
  met: number;
  /** `met` by source: fresh restarts at this width, and networks pruned down to it from a larger width. */
  metBy: { fresh: number; pruned: number };
  /** At least `required` networks of this width met the target. */
  adequate: boolean;
  /** Best judged metric over the networks of this width (fresh and pruned); null if none finished. */
  best: number | null;
  /**
   * The `required`-th best judged metric over the same networks: the figure the adequacy rule
   * turns on (at or past the threshold exactly when enough networks did, recall floors aside);
   * null when fewer than `required` finished.
   */
  decisive: number | null;
  /** Best metric on the training rows over the same networks (tells "does not fit" from "does not generalise"). */
  bestTrain: number | null;
  /** Median judged metric of the fresh restarts (null when none ran or all diverged). */
  median: number | null;
  /** Wilson 95% interval of the fresh restarts' rate of meeting the target. */
  wilson: [number, number];
  /** Median epochs of the fresh restarts run. */
  medianEpochs: number;
  /** Fresh restarts that diverged. */
  diverged: number;
}

/** One neuron removal tried while pruning a network. */
export interface PruneStep {
  /** The network being pruned: the growth task it came from. */
  source: TrainingTask;
  /** Width before this step. */
  width: number;
  /** Index of the neuron removed (in the network before the step). */
  neuron: number;
  /** Steering metric before and after the removal and retraining. */
  steeringBefore: number;
  steeringAfter: number;
  /** The removal was kept (the steering rows still met the target); otherwise it was undone. */
  accepted: boolean;
  /** Judged metric of the smaller network when the removal was kept, else null. */
  judged: number | null;
}

export type SearchOutcome = 'found' | 'not-found' | 'inconclusive';

/** A network that backs a width, and how. */
export interface Witness extends Judged {
  /** The growth task the network came from (the pruned one, when pruned). */
  source: TrainingTask;
  seed: number;
  /** 'fresh': trained at this width; 'pruned': pruned down to it from `source.width`. */
  how: 'fresh' | 'pruned';
  network: NetworkJson;
}

/** A network on the rows that judge, in both forms (search/judge.ts `appraise`). */
export interface Appraisal {
  /** The target metric of the float network. */
  float32: number;
  /** The target metric of its int8 form; null when the dataset has no raw rows to run it on. */
  int8: number | null;
  /** Classification: the confusion matrix (true class × predicted class) of the form that decides. */
  confusion: number[][] | null;
  recall: number[] | null;
  precision: number[] | null;
  /** The metric of the form that decides (target.precision). */
  deciding: number;
  met: boolean;
}

/** Which rows judged the target, and how many. */
export interface JudgingRows {
  on: 'judging' | 'validation' | 'training';
  rows: number;
  /** data.judging asked for judging rows but a class was too small: the validation rows judged instead. */
  folded: boolean;
}

/** Where the growth walk began and what it decided (the report's search.start). */
export interface WalkReport {
  from: 'baseline' | 'min-width';
  width: number;
  /** Why it began there. */
  why: string;
  /** Widths growth decided on fresh restarts, ascending. */
  decided: number[];
  /** A sentence: which widths were decided and why that was enough. */
  summary: string;
}

export interface SearchResult {
  outcome: SearchOutcome;
  /** Smallest adequate width; null unless found. */
  width: number | null;
  /** Smallest width whose fresh restarts alone were adequate (where growth stopped); null if none. */
  grownWidth: number | null;
  /** The witness's judged metric; null unless found. */
  metric: number | null;
  /**
   * The network shown for the result: at the smallest adequate width when found; otherwise the
   * best network that met the target at any width (its width then is not adequate), or null.
   */
  witness: Witness | null;
  /** The witness on the rows that judge, in both forms, with its per-class figures; null without a witness. */
  appraisal: Appraisal | null;
  widths: WidthSummary[];
  pruning: PruneStep[];
  /** Trainings the answer used: growth restarts and pruning retrainings. */
  trainings: number;
  /** Sentences on why no width is adequate, or how far an unfinished search got; empty when found. */
  notes: string[];
  judging: JudgingRows;
  /** Where the growth walk began, and which widths it decided. */
  start: WalkReport;
  /** Wall-clock figures only. */
  timing: { searchSeconds: number; growthSeconds: number; pruneSeconds: number };
}

export interface ProgressEvent {
  phase: 'growth' | 'prune';
  /**
   * start: the phase begins, before any of its trainings finished (width: where it starts;
   * restart and epoch 0), so a log shows a line at once; done: one training or prune job finished.
   */
  kind: 'start' | 'done';
  width: number;
  /** 0-based, as in TrainingTask. */
  restart: number;
  epoch: number;
  /** Best judged metric seen so far (null before any). */
  best: number | null;
}

export type { StopReason };

export interface GrowthPlan {
  growth: GrowthMode;
  minWidth: number;
  maxWidth: number;
  restarts: number;
  required: number;
  /** Cap on growth trainings; null = none. */
  maxTrainings: number | null;
  /**
   * Width the walk starts from (a matching baseline's width), deciding it and the width below
   * first; null or absent: every width from min-width up. Fresh growth only.
   */
  start?: number | null;
}

/** The network's state at the end of its time at one width (in-place growth passes through several). */
export interface Segment extends Judged {
  width: number;
  /** Epochs since the restart began (cumulative over widths for in-place growth). */
  epochs: number;
  stop: StopReason;
}

/**
 * What one growth task produced. `width` is the task's width (the starting width for in-place
 * growth); `finalWidth` is the width of the network it ended with.
 */
export interface TaskResult extends TrainingTask, Judged {
  stop: StopReason;
  epochs: number;
  finalWidth: number;
  /** One entry per width the network passed through (one for fresh growth). */
  segments: Segment[];
  /** The trained network, kept when it met the target (it may be pruned or become the witness). */
  network: NetworkJson | null;
  /** Why a diverged training failed; null otherwise. */
  reason: string | null;
}
