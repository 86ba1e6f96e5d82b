/**
 * The witness as a self-contained JSON document: the network plus everything needed to
 * turn raw CSV rows into its inputs and its outputs back into labels or values.
 */
import type { MetricName, TargetConfig, Task } from '../config/types.js';
import type { Encoding } from '../data/types.js';
import type { NetworkJson } from '../nn/index.js';
import type { JudgingRows, Witness } from '../search/types.js';
import {
  costShapeOf,
  deviceCost,
  quantizeNetwork,
  type Calibration,
  type DeviceCost,
  type Int8Network,
} from '../device/index.js';

export const MODEL_SCHEMA = 'neuron-budget/model@2';

export interface ModelDocument {
  schema: typeof MODEL_SCHEMA;
  task: Task;
  /** Hidden neurons. */
  width: number;
  /** What the network reached, on which rows, and how its width is backed. */
  target: {
    metric: MetricName;
    threshold: number;
    /** The metric on the rows that judged it. */
    value: number;
    /** Which rows judged it: judging rows (never seen in training), or validation or training rows when there were none. */
    on: JudgingRows['on'];
    /** It met the target there. */
    met: boolean;
    /** Its width is adequate: enough networks of that width met the target (see the README). */
    adequate: boolean;
  };
  /** Where it came from: enough to train it again with the same config and data. */
  origin: {
    seed: number;
    /** The fresh training it started as: its width and restart (restarts count from 1). */
    width: number;
    restart: number;
    /** 'fresh': trained at this width; 'pruned': pruned down to it from origin.width. */
    how: 'fresh' | 'pruned';
  };
  /** Raw row → inputs: features in input order (numeric: (x − mean) / std; categorical: one-hot in this order). */
  encoding: Encoding;
  network: NetworkJson;
  /** What the network costs on the device (src/device/cost.ts). */
  cost: DeviceCost;
  /** The int8 form (src/device/quantize.ts); null when no calibration rows were given. */
  int8: Int8Network | null;
  /** What produced the file: the tool, the data (fingerprint) and the config; null in files of version 1. */
  provenance: Provenance | null;
}

export interface Provenance {
  tool: { name: 'neuron-budget'; version: string };
  /** sha256 of the data as used (src/data/fingerprint.ts). */
  data: string;
  /** The config file, relative to the workspace. */
  config: string;
}

/**
 * The witness as a document. With `calibration` (the encoded training rows) it carries the
 * int8 form too.
 */
export function modelDocument(
  witness: Witness,
  encoding: Encoding,
  target: TargetConfig,
  backing: { on: JudgingRows['on']; adequate: boolean },
  calibration: Calibration | null = null,
  provenance: Provenance | null = null,
): ModelDocument {
  return {
    schema: MODEL_SCHEMA,
    task: encoding.target.task,
    width: witness.network.width,
    target: {
      metric: target.metric,
      threshold: target.threshold,
      value: witness.judged,
      on: backing.on,
      met: witness.met,
      adequate: backing.adequate,
    },
    origin: { seed: witness.seed, width: witness.source.width, restart: witness.source.restart + 1, how: witness.how },
    encoding: structuredClone(encoding),
    network: structuredClone(witness.network),
    cost: deviceCost(costShapeOf(witness.network, encoding)),
    int8: calibration === null ? null : quantizeNetwork(witness.network, encoding, calibration),
    provenance,
  };
}

/** Stable, human-diffable text: two-space indent, key order as built, trailing newline. */
export function serializeModel(doc: ModelDocument): string {
  return `${JSON.stringify(doc, null, 2)}\n`;
}
