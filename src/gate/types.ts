/**
 * The baseline file and the gate's outputs. The baseline is a committed JSON document;
 * its shape is also published as schema/baseline.schema.json for editors.
 */
import type { MetricName } from '../config/types.js';
import type { DataProfile } from '../data/types.js';

export const BASELINE_SCHEMA = 'neuron-budget/baseline@2';
export const BASELINE_VERSION = 2;
/** Oldest history entries are dropped beyond this many. */
export const HISTORY_CAP = 100;

/** One width of the recorded search curve. */
export interface BaselineWidth {
  width: number;
  /** Fresh restarts run at this width. */
  restarts: number;
  /** Networks of this width that met the target (fresh and pruned). */
  met: number;
  adequate: boolean;
  /** Best judged metric over the networks of this width; null when none finished. */
  best: number | null;
  /** The `required`-th best judged metric there (what adequacy turns on); absent in files from before it was recorded. */
  decisive?: number | null;
}

/** One accepted result, kept so capacity drift can be drawn over time. */
export interface HistoryEntry {
  width: number;
  metric: number;
  rows: number;
  /** Data fingerprint (sha256 hex) of the data the result came from. */
  data: string;
  /** Commit the data came from, when the shell knows it. */
  commit: string | null;
  /** ISO 8601 date-time, passed in by the shell. */
  date: string;
}

/** Settings that change the search's answer, kebab-case keys as in the config file. */
export type ResultSettings = Record<string, string | number | boolean | null | string[]>;

export interface Baseline {
  schema: typeof BASELINE_SCHEMA;
  tool: { name: 'neuron-budget'; version: string };
  result: {
    /** Smallest adequate width. */
    width: number;
    metric: { name: MetricName; value: number; threshold: number };
    /** Width at which the growth phase found it, before pruning. */
    grownWidth: number | null;
    /** Networks of `width` that met the target (fresh and pruned), and fresh restarts run there. */
    met: number;
    restarts: number;
    /** Wall-clock seconds of the search that produced it (informative only). */
    searchSeconds: number | null;
  };
  widths: BaselineWidth[];
  data: {
    /** Data file as written in the config. */
    file: string;
    rows: number;
    fingerprint: string;
    profile: DataProfile;
  };
  config: {
    /** sha256 hex of the canonical JSON of `settings`. */
    fingerprint: string;
    settings: ResultSettings;
  };
  /** Every accepted result, this one included as the last entry; oldest first. */
  history: HistoryEntry[];
}

export type RowChange = { before: number; after: number };

export interface FeatureShift {
  name: string;
  meanBefore: number;
  meanAfter: number;
  /** Baseline standard deviation the move is measured in. */
  stdBefore: number;
  /** |meanAfter − meanBefore| / stdBefore; null when stdBefore is 0. */
  shiftInStd: number | null;
  meanMoved: boolean;
  rangeBefore: [number, number];
  rangeAfter: [number, number];
  /** The range grew on a side by more than RANGE_GROWTH_IN_STD baseline stds (src/gate/data-changes.ts). */
  rangeWidened: boolean;
  /** How far the range reaches beyond the baseline's on each side (0: not beyond it). */
  rangeGrowth: RangeGrowth;
}

/** Growth of a range past the baseline's, per side: in the feature's units, and in baseline stds (null when that std is 0). */
export interface RangeGrowth {
  /** Baseline minimum − new minimum, when the new one is lower; else 0. */
  below: number;
  /** New maximum − baseline maximum, when the new one is higher; else 0. */
  above: number;
  belowInStd: number | null;
  aboveInStd: number | null;
}

export interface CategoryChange {
  feature: string;
  appeared: string[];
  vanished: string[];
}

/** What changed in the data between the baseline and this run. */
export interface DataChanges {
  /** false when the data as used are the same (same fingerprint). */
  changed: boolean;
  /** The data file as written in the config, when it differs from the baseline's. */
  file: { before: string; after: string } | null;
  rows: RowChange;
  /** Per class, every class in either profile (classification only). */
  classes: ({ label: string } & RowChange)[] | null;
  classesAppeared: string[];
  classesVanished: string[];
  /** Numeric features whose mean moved by more than half a baseline std, or whose range grew on a side by more than half a baseline std. */
  features: FeatureShift[];
  /** Categorical features with categories that appeared or vanished. */
  categories: CategoryChange[];
  columnsAdded: string[];
  columnsRemoved: string[];
}

/**
 * What `baseline` (or the action's update-baseline) did with the file: written, with the file as
 * the user wrote it, the width recorded and the history entries it now holds; or why not.
 */
export type BaselineRecord = { file: string; width: number; historyEntries: number } | { notWritten: string };

/** The gate's answer: pass, fail, improved, new (no baseline yet) or inconclusive (budget ran out). */
export type Verdict = 'pass' | 'fail' | 'improved' | 'new' | 'inconclusive';
