/**
 * A part: what one shard of a plan computed, as a small JSON file that travels as an artifact.
 * It names the plan, the data and the settings it was computed for, so `merge` can refuse a part
 * that belongs to another run, and it carries each training's full outcome (and the networks that
 * met the target, pruned or not), so the merged search is the one-machine search exactly.
 */
import { UserError } from '../common/errors.js';
import { findJsonSyntaxProblem } from '../common/json-position.js';
import { quote } from '../common/escape.js';
import type { NetworkJson } from '../nn/index.js';
import { taskKey } from '../search/growth.js';
import type { PruneResult } from '../search/task.js';
import type { TaskResult } from '../search/types.js';
import { fromExactJson, toExactJson } from './exact-json.js';
import type { PlanDocument } from './plan.js';

export const PART_SCHEMA = 'neuron-budget/part@1';

export interface PartDocument {
  schema: typeof PART_SCHEMA;
  tool: { name: 'neuron-budget'; version: string };
  /** The plan's id. */
  plan: string;
  shard: { index: number; of: number };
  data: { fingerprint: string };
  settings: { fingerprint: string };
  /** One per task of the shard that finished, in the plan's order. */
  results: TaskResult[];
  /** Networks of the shard pruned here (the plan's marked tasks that met the target). */
  pruned: PruneResult[];
  /** Wall-clock seconds the shard took (informative only). */
  seconds: number;
}

export function serializePart(part: PartDocument): string {
  return `${toExactJson(part)}\n`;
}

/** What a part is checked against: this run's plan, data and settings. */
export interface PartExpectation {
  plan: PlanDocument;
  toolVersion: string;
  inputs: number;
  outputs: number;
}

type Bad = (key: string, expected: string, found: unknown) => never;

function describe(v: unknown): string {
  if (v === undefined) return 'nothing';
  if (v === null) return 'null';
  if (Array.isArray(v)) return `a list of ${v.length}`;
  if (typeof v === 'object') return 'an object';
  if (typeof v === 'string') return quote(v, 40);
  return typeof v === 'number' || typeof v === 'boolean' ? String(v) : typeof v;
}

const isObject = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);

/** Syntax, then the fields that say where the part came from; the content is checked by checkPart. */
export function parsePart(text: string, shown: string): PartDocument {
  const syntax = findJsonSyntaxProblem(text);
  if (syntax) {
    throw new UserError(`${shown}:${syntax.line}:${syntax.column}: the part is not valid JSON: ${syntax.detail}`, {
      file: shown,
      line: syntax.line,
      column: syntax.column,
    });
  }
  const doc = fromExactJson(text.charCodeAt(0) === 0xfeff ? text.slice(1) : text);
  const bad: Bad = (key, expected, found) => {
    throw new UserError(`${shown}: ${key}: expected ${expected}, found ${describe(found)}`, { file: shown, key });
  };
  if (!isObject(doc)) return bad('(top level)', 'a neuron-budget part (a JSON object)', doc);
  if (doc['schema'] !== PART_SCHEMA)
    bad('schema', `"${PART_SCHEMA}"; this file is not the output of neuron-budget shard`, doc['schema']);
  const str = (o: unknown, key: string, at: string): string => {
    const v = isObject(o) ? o[key] : undefined;
    return typeof v === 'string' ? v : bad(at, 'a string', v);
  };
  const int = (o: unknown, key: string, at: string): number => {
    const v = isObject(o) ? o[key] : undefined;
    return Number.isInteger(v) && (v as number) >= 0 ? (v as number) : bad(at, 'a whole number ≥ 0', v);
  };
  str(doc['tool'], 'version', 'tool.version');
  str(doc, 'plan', 'plan');
  int(doc['shard'], 'index', 'shard.index');
  int(doc['shard'], 'of', 'shard.of');
  str(doc['data'], 'fingerprint', 'data.fingerprint');
  str(doc['settings'], 'fingerprint', 'settings.fingerprint');
  if (!Array.isArray(doc['results'])) bad('results', 'a list', doc['results']);
  if (!Array.isArray(doc['pruned'])) bad('pruned', 'a list', doc['pruned']);
  return doc as unknown as PartDocument;
}

const short = (hash: string): string => `${hash.slice(0, 12)}…`;

/**
 * Whether the part belongs to this run: the same tool version, data, settings and plan, and
 * holds results for exactly its shard's tasks, each of the right shape.
 */
export function checkPart(part: PartDocument, shown: string, want: PartExpectation): void {
  const refuse = (why: string): never => {
    throw new UserError(`${shown}: ${why}`, { file: shown });
  };
  const plan = want.plan;
  if (part.tool.version !== want.toolVersion)
    refuse(
      `made by neuron-budget ${quote(part.tool.version, 20)}, but this is ${want.toolVersion}; run every stage with the same version`,
    );
  if (part.data.fingerprint !== plan.data.fingerprint)
    refuse(
      `computed on other data (data fingerprint ${short(part.data.fingerprint)} in the part, ${short(plan.data.fingerprint)} here); every stage must run on the same commit`,
    );
  if (part.settings.fingerprint !== plan.settings.fingerprint)
    refuse(
      `computed with other result-changing settings (settings fingerprint ${short(part.settings.fingerprint)} in the part, ${short(plan.settings.fingerprint)} here)`,
    );
  if (part.shard.of !== plan.shards.length || part.plan !== plan.id)
    refuse(
      `belongs to another plan (plan ${short(part.plan)} of ${part.shard.of} shards; this run's plan is ${short(plan.id)} of ${plan.shards.length}): the plan, the shards and the merge must come from the same config, data and baseline`,
    );
  const shard = plan.shards[part.shard.index];
  if (shard === undefined)
    refuse(`shard.index ${part.shard.index} is not a shard of this plan (0 to ${plan.shards.length - 1})`);
  const bad: Bad = (key, expected, found) => {
    throw new UserError(`${shown}: ${key}: expected ${expected}, found ${describe(found)}`, { file: shown, key });
  };
  const tasks = new Map(shard.tasks.map((t) => [taskKey(t), t]));
  const seen = new Set<string>();
  part.results.forEach((r, k) => {
    checkTaskResult(r, `results[${k}]`, want, bad);
    const key = taskKey(r);
    if (!tasks.has(key) || seen.has(key))
      bad(
        `results[${k}]`,
        `a task of shard ${part.shard.index}, each once`,
        `width ${r.width}, restart ${r.restart + 1}`,
      );
    seen.add(key);
  });
  part.pruned.forEach((p, k) => {
    const at = `pruned[${k}]`;
    if (!isObject(p) || !isObject(p.source)) return bad(at, 'a pruned network', p);
    const key = taskKey(p.source);
    if (!tasks.get(key)?.prune)
      bad(`${at}.source`, `a task shard ${part.shard.index} prunes`, `width ${p.source.width}`);
    if (!Array.isArray(p.chain) || !Array.isArray(p.steps)) bad(at, 'a chain and steps', p);
    if (!Number.isInteger(p.trainings) || typeof p.interrupted !== 'boolean') bad(at, 'trainings and interrupted', p);
    p.chain.forEach((link, j) => {
      checkJudged(link, `${at}.chain[${j}]`, bad);
      checkNetwork(link.network, `${at}.chain[${j}].network`, want, bad);
    });
  });
}

function checkJudged(j: unknown, at: string, bad: Bad): void {
  if (!isObject(j)) return bad(at, 'an object', j);
  const o = j;
  for (const k of ['train', 'steering', 'judged']) if (typeof o[k] !== 'number') bad(`${at}.${k}`, 'a number', o[k]);
  for (const k of ['reached', 'met']) if (typeof o[k] !== 'boolean') bad(`${at}.${k}`, 'true or false', o[k]);
}

function checkTaskResult(r: unknown, at: string, want: PartExpectation, bad: Bad): void {
  checkJudged(r, at, bad);
  const o = r as Record<string, unknown>;
  for (const k of ['width', 'restart', 'epochs', 'finalWidth'])
    if (!Number.isInteger(o[k])) bad(`${at}.${k}`, 'a whole number', o[k]);
  if (typeof o['stop'] !== 'string') bad(`${at}.stop`, 'a stop reason', o['stop']);
  if (!Array.isArray(o['segments'])) bad(`${at}.segments`, 'a list', o['segments']);
  (o['segments'] as unknown[]).forEach((s, k) => checkJudged(s, `${at}.segments[${k}]`, bad));
  if (o['network'] !== null) checkNetwork(o['network'], `${at}.network`, want, bad);
  if (o['reason'] !== null && typeof o['reason'] !== 'string') bad(`${at}.reason`, 'a sentence or null', o['reason']);
}

function checkNetwork(n: unknown, at: string, want: PartExpectation, bad: Bad): void {
  if (!isObject(n)) return bad(at, 'a network', n);
  const net = n as unknown as NetworkJson;
  if (net.inputs !== want.inputs) bad(`${at}.inputs`, `${want.inputs}`, net.inputs);
  if (net.outputs !== want.outputs) bad(`${at}.outputs`, `${want.outputs}`, net.outputs);
  if (!Number.isInteger(net.width) || net.width < 1) bad(`${at}.width`, 'a whole number ≥ 1', net.width);
  const numbers = (v: unknown, key: string, length: number): void => {
    if (!Array.isArray(v) || v.length !== length || !v.every((x) => typeof x === 'number'))
      bad(key, `${length} numbers`, v);
  };
  const rows = (v: unknown, key: string, count: number, length: number): void => {
    if (!Array.isArray(v) || v.length !== count) return bad(key, `${count} rows`, v);
    v.forEach((row, i) => numbers(row, `${key}[${i}]`, length));
  };
  rows(net.hiddenWeights, `${at}.hiddenWeights`, net.width, net.inputs);
  numbers(net.hiddenBias, `${at}.hiddenBias`, net.width);
  rows(net.outputWeights, `${at}.outputWeights`, net.outputs, net.width);
  numbers(net.outputBias, `${at}.outputBias`, net.outputs);
  if (typeof net.activation !== 'string' || typeof net.head !== 'string') bad(at, 'an activation and a head', n);
}
