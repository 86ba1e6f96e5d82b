/**
 * The witness as a self-contained JSON document: the network plus everything needed to
 * turn raw CSV rows into its inputs and its outputs back into labels or values.
 */
import type { MetricName, TargetConfig, Task } from '../config/types.js';
import type { Encoding, FeatureEncoding } from '../data/types.js';
import type { NetworkJson } from '../nn/index.js';
import type { JudgingRows, Witness } from '../search/types.js';
import { UserError } from '../common/errors.js';
import {
  checkInt8Network,
  costShapeOf,
  deviceCost,
  quantizeNetwork,
  type Calibration,
  type DeviceCost,
  type Int8Network,
} from '../device/index.js';

export const MODEL_SCHEMA = 'neuron-budget/model@2';
/** The previous version (no cost, no int8 network): still read, as int8 null. */
const MODEL_SCHEMA_V1 = 'neuron-budget/model@1';

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
  };
}

/** Stable, human-diffable text: two-space indent, key order as built, trailing newline. */
export function serializeModel(doc: ModelDocument): string {
  return `${JSON.stringify(doc, null, 2)}\n`;
}

function inputsOf(features: FeatureEncoding[]): number {
  return features.reduce((n, f) => n + (f.kind === 'numeric' ? 1 : f.categories.length), 0);
}

/** Parse and check a model file; a bad file gets a message naming the file and the key. */
export function parseModel(text: string, file = 'model'): ModelDocument {
  let doc: unknown;
  try {
    doc = JSON.parse(text);
  } catch (e) {
    throw new UserError(`${file}: not valid JSON (${e instanceof Error ? e.message : String(e)})`, { file });
  }
  const bad = (key: string, expected: string): never => {
    throw new UserError(`${file}: key "${key}" should be ${expected}`, { file, key });
  };
  if (typeof doc !== 'object' || doc === null) return bad('(root)', 'an object');
  const d = doc as Omit<Partial<ModelDocument>, 'schema'> & { schema?: unknown };
  if (d.schema !== MODEL_SCHEMA && d.schema !== MODEL_SCHEMA_V1) bad('schema', `"${MODEL_SCHEMA}"`);
  if (d.task !== 'classification' && d.task !== 'regression') bad('task', '"classification" or "regression"');
  const net = d.network;
  if (typeof net !== 'object' || net === null) return bad('network', 'an object');
  const enc = d.encoding;
  if (typeof enc !== 'object' || enc === null || !Array.isArray(enc.features))
    return bad('encoding.features', 'a list');
  if (inputsOf(enc.features) !== net.inputs)
    bad('encoding.features', `to encode to ${net.inputs} inputs (network.inputs)`);
  if (!Array.isArray(net.hiddenWeights) || net.hiddenWeights.length !== net.width)
    bad('network.hiddenWeights', `${net.width} rows`);
  if (net.hiddenWeights.some((r) => !Array.isArray(r) || r.length !== net.inputs))
    bad('network.hiddenWeights', `rows of ${net.inputs} numbers`);
  if (!Array.isArray(net.hiddenBias) || net.hiddenBias.length !== net.width)
    bad('network.hiddenBias', `${net.width} numbers`);
  if (!Array.isArray(net.outputWeights) || net.outputWeights.length !== net.outputs)
    bad('network.outputWeights', `${net.outputs} rows`);
  if (net.outputWeights.some((r) => !Array.isArray(r) || r.length !== net.width))
    bad('network.outputWeights', `rows of ${net.width} numbers`);
  if (!Array.isArray(net.outputBias) || net.outputBias.length !== net.outputs)
    bad('network.outputBias', `${net.outputs} numbers`);
  if (d.task === 'classification' && !Array.isArray(enc.target?.classes))
    bad('encoding.target.classes', 'a list of class labels');
  if (d.schema === MODEL_SCHEMA_V1) {
    // Version 1 recorded only the validation value and the grown width; what it reached is kept.
    const v1 = d as unknown as { target: { metric: MetricName; threshold: number; value: number } };
    const old = d as unknown as { origin: { seed: number; restart: number; grownWidth: number } };
    return {
      ...(d as ModelDocument),
      schema: MODEL_SCHEMA,
      target: { ...v1.target, on: 'validation', met: true, adequate: true },
      origin: { seed: old.origin.seed, width: old.origin.grownWidth, restart: old.origin.restart + 1, how: 'fresh' },
      cost: deviceCost(costShapeOf(net, enc)),
      int8: null,
    };
  }
  if (d.int8 !== null) {
    const problem = checkInt8Network(d.int8, net, enc);
    if (problem) bad(problem.key, problem.expected);
  }
  return { ...(d as ModelDocument), cost: deviceCost(costShapeOf(net, enc)) };
}
