/**
 * Reading a model file: JSON syntax with line and column, then the shape by
 * schema/model.schema.json itself, then what a schema cannot say (array lengths that follow
 * the network's shape, the int8 form's consistency). Every problem is one message naming the
 * file and the key. Files of version 1 (before judging rows and the int8 form) are read too.
 */
import modelSchema from '../../schema/model.schema.json' with { type: 'json' };
import { UserError } from '../common/errors.js';
import { findJsonSyntaxProblem } from '../common/json-position.js';
import { schemaValidator, SchemaProblem, type JsonSchema } from '../common/json-schema.js';
import type { MetricName } from '../common/metric.js';
import type { FeatureEncoding } from '../data/types.js';
import { checkInt8Network, costShapeOf, deviceCost } from '../device/index.js';
import type { NetworkJson } from '../nn/index.js';
import { MODEL_SCHEMA, type ModelDocument } from './document.js';

/** The first version: no cost, no int8 form, judged on the validation rows, a 0-based restart and the grown width. */
const MODEL_SCHEMA_V1 = 'neuron-budget/model@1';

const checkShape = schemaValidator(modelSchema as unknown as JsonSchema);

function inputsOf(features: FeatureEncoding[]): number {
  return features.reduce((n, f) => n + (f.kind === 'numeric' ? 1 : f.categories.length), 0);
}

/** A version-1 document in this version's shape (what it could not know is marked as such). */
function upgrade(d: Record<string, unknown>): Record<string, unknown> {
  const v1target = d['target'] as { metric: MetricName; threshold: number; value: number } | undefined;
  const v1origin = d['origin'] as { seed: number; restart: number; grownWidth: number } | undefined;
  const net = d['network'] as NetworkJson | undefined;
  const enc = d['encoding'] as { features: FeatureEncoding[] } | undefined;
  const cost =
    net && enc && Array.isArray(enc.features)
      ? deviceCost(costShapeOf(net, enc as unknown as Parameters<typeof costShapeOf>[1]))
      : undefined;
  return {
    ...d,
    schema: MODEL_SCHEMA,
    target: v1target && { ...v1target, on: 'validation', met: true, adequate: true },
    origin: v1origin && {
      seed: v1origin.seed,
      width: v1origin.grownWidth,
      restart: typeof v1origin.restart === 'number' ? v1origin.restart + 1 : v1origin.restart,
      how: 'fresh',
    },
    cost,
    int8: null,
    provenance: null,
  };
}

/** Parse and check a model file; a bad file gets a message naming the file and the key. */
export function parseModel(text: string, file = 'model'): ModelDocument {
  const syntax = findJsonSyntaxProblem(text);
  if (syntax) {
    throw new UserError(`${file}:${syntax.line}:${syntax.column}: the model is not valid JSON: ${syntax.detail}`, {
      file,
      line: syntax.line,
      column: syntax.column,
    });
  }
  let doc = JSON.parse(text.charCodeAt(0) === 0xfeff ? text.slice(1) : text) as unknown;
  const bad = (key: string, expected: string, found: string): never => {
    throw new UserError(`${file}: ${key}: expected ${expected}, found ${found}`, { file, key });
  };
  if (typeof doc !== 'object' || doc === null || Array.isArray(doc))
    return bad('(top level)', 'a neuron-budget model (a JSON object)', Array.isArray(doc) ? 'a list' : String(doc));
  const schema = (doc as Record<string, unknown>)['schema'];
  if (schema === MODEL_SCHEMA_V1) doc = upgrade(doc as Record<string, unknown>);
  else if (schema !== MODEL_SCHEMA) {
    bad('schema', `"${MODEL_SCHEMA}"`, typeof schema === 'string' ? JSON.stringify(schema.slice(0, 60)) : 'nothing');
  }
  try {
    checkShape(doc);
  } catch (e) {
    if (e instanceof SchemaProblem) bad(e.key, e.expected, e.found);
    throw e;
  }
  const d = doc as ModelDocument;
  const net = d.network;
  const enc = d.encoding;
  if (inputsOf(enc.features) !== net.inputs)
    bad(
      'encoding.features',
      `features that encode to ${net.inputs} inputs (network.inputs)`,
      `${inputsOf(enc.features)}`,
    );
  const rows = (key: string, list: number[][], count: number, length: number): void => {
    if (list.length !== count) bad(key, `${count} rows`, `${list.length}`);
    list.forEach((r, i) => {
      if (r.length !== length) bad(`${key}[${i}]`, `${length} numbers`, `${r.length}`);
    });
  };
  rows('network.hiddenWeights', net.hiddenWeights, net.width, net.inputs);
  rows('network.outputWeights', net.outputWeights, net.outputs, net.width);
  if (net.hiddenBias.length !== net.width)
    bad('network.hiddenBias', `${net.width} numbers`, `${net.hiddenBias.length}`);
  if (net.outputBias.length !== net.outputs)
    bad('network.outputBias', `${net.outputs} numbers`, `${net.outputBias.length}`);
  if (d.width !== net.width) bad('width', `network.width (${net.width})`, `${d.width}`);
  if (d.task === 'classification' && !Array.isArray(enc.target.classes))
    bad('encoding.target.classes', 'a list of class labels', 'null');
  if (d.int8 !== null) {
    const problem = checkInt8Network(d.int8, net, enc);
    if (problem) bad(problem.key, problem.expected, 'something else');
  }
  // The cost is derived: recompute it rather than trust the file.
  return { ...d, cost: deviceCost(costShapeOf(net, enc)) };
}
