/**
 * The witness as a self-contained JSON document: the network plus everything needed to
 * turn raw CSV rows into its inputs and its outputs back into labels or values.
 */
import type { MetricName, TargetConfig, Task } from '../config/types.js';
import type { Encoding, FeatureEncoding } from '../data/types.js';
import type { NetworkJson } from '../nn/index.js';
import type { Witness } from '../search/types.js';
import { UserError } from '../common/errors.js';

export const MODEL_SCHEMA = 'neuron-budget/model@1';

export interface ModelDocument {
  schema: typeof MODEL_SCHEMA;
  task: Task;
  /** Hidden neurons. */
  width: number;
  /** What the network reached on the validation rows (training rows when there were none). */
  target: { metric: MetricName; threshold: number; value: number };
  /** Where it came from: enough to train it again with the same config and data. */
  origin: { seed: number; restart: number; grownWidth: number };
  /** Raw row → inputs: features in input order (numeric: (x − mean) / std; categorical: one-hot in this order). */
  encoding: Encoding;
  network: NetworkJson;
}

export function modelDocument(witness: Witness, encoding: Encoding, target: TargetConfig): ModelDocument {
  return {
    schema: MODEL_SCHEMA,
    task: encoding.target.task,
    width: witness.network.width,
    target: { metric: target.metric, threshold: target.threshold, value: witness.metric },
    origin: { seed: witness.seed, restart: witness.restart, grownWidth: witness.grownWidth },
    encoding: structuredClone(encoding),
    network: structuredClone(witness.network),
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
  const d = doc as Partial<ModelDocument>;
  if (d.schema !== MODEL_SCHEMA) bad('schema', `"${MODEL_SCHEMA}"`);
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
  return d as ModelDocument;
}
