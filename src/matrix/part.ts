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
  activation: NetworkJson['activation'];
  head: NetworkJson['head'];
}

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
    throw new UserError(`${shown}:${syntax.line}:${syntax.column}: the part is not valid JSON: ${syntax.detail}`);
  }
  const doc = fromExactJson(text.charCodeAt(0) === 0xfeff ? text.slice(1) : text);
  const bad = badIn(shown);
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
    throw new UserError(`${shown}: ${why}`);
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
  const bad = badIn(shown);
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
  const prunedSeen = new Set<string>();
  part.pruned.forEach((p, k) => {
    const at = `pruned[${k}]`;
    if (!isObject(p)) return bad(at, 'a pruned network', p);
    checkTask(p.source, `${at}.source`, bad);
    const key = taskKey(p.source);
    if (!tasks.get(key)?.prune || prunedSeen.has(key))
      bad(`${at}.source`, `a task shard ${part.shard.index} prunes, each once`, `width ${p.source.width}`);
    prunedSeen.add(key);
    if (!Array.isArray(p.chain)) bad(`${at}.chain`, 'a list', p.chain);
    if (!Array.isArray(p.steps)) bad(`${at}.steps`, 'a list', p.steps);
    if (!isCount(p.trainings)) bad(`${at}.trainings`, 'a whole number ≥ 0', p.trainings);
    if (typeof p.interrupted !== 'boolean') bad(`${at}.interrupted`, 'true or false', p.interrupted);
    // A chain shrinks one neuron per link, from the source's width down.
    p.chain.forEach((link, j) => {
      const where = `${at}.chain[${j}]`;
      checkJudged(link, where, bad);
      if (link.width !== p.source.width - 1 - j) bad(`${where}.width`, `${p.source.width - 1 - j}`, link.width);
      checkNetwork(link.network, `${where}.network`, want, bad);
      if (link.network.width !== link.width) bad(`${where}.network.width`, `${link.width}`, link.network.width);
    });
    p.steps.forEach((step, j) => checkStep(step, `${at}.steps[${j}]`, bad));
  });
}

type Bad = (key: string, expected: string, found: unknown) => never;

function badIn(shown: string): Bad {
  return (key, expected, found) => {
    throw new UserError(`${shown}: ${key}: expected ${expected}, found ${describe(found)}`, { key });
  };
}

const isCount = (v: unknown): v is number => Number.isInteger(v) && (v as number) >= 0;
const STOPS = new Set(['reached', 'stalled', 'diverged', 'max-epochs']);

function checkTask(t: unknown, at: string, bad: Bad): void {
  if (!isObject(t)) return bad(at, 'a task (width and restart)', t);
  if (!Number.isInteger(t['width']) || (t['width'] as number) < 1) bad(`${at}.width`, 'a whole number ≥ 1', t['width']);
  if (!isCount(t['restart'])) bad(`${at}.restart`, 'a whole number ≥ 0', t['restart']);
}

function checkJudged(j: unknown, at: string, bad: Bad): void {
  if (!isObject(j)) return bad(at, 'an object', j);
  for (const k of ['train', 'steering', 'judged']) if (typeof j[k] !== 'number') bad(`${at}.${k}`, 'a number', j[k]);
  for (const k of ['reached', 'met']) if (typeof j[k] !== 'boolean') bad(`${at}.${k}`, 'true or false', j[k]);
}

function checkStep(step: unknown, at: string, bad: Bad): void {
  if (!isObject(step)) return bad(at, 'a prune step', step);
  checkTask(step['source'], `${at}.source`, bad);
  if (!Number.isInteger(step['width']) || (step['width'] as number) < 1)
    bad(`${at}.width`, 'a whole number ≥ 1', step['width']);
  if (!isCount(step['neuron'])) bad(`${at}.neuron`, 'a whole number ≥ 0', step['neuron']);
  for (const k of ['steeringBefore', 'steeringAfter'])
    if (typeof step[k] !== 'number') bad(`${at}.${k}`, 'a number', step[k]);
  if (typeof step['accepted'] !== 'boolean') bad(`${at}.accepted`, 'true or false', step['accepted']);
  if (step['judged'] !== null && typeof step['judged'] !== 'number')
    bad(`${at}.judged`, 'a number or null', step['judged']);
}

function checkTaskResult(r: unknown, at: string, want: PartExpectation, bad: Bad): void {
  checkJudged(r, at, bad);
  const o = r as Record<string, unknown>;
  checkTask(o, at, bad);
  for (const k of ['epochs', 'finalWidth']) if (!isCount(o[k])) bad(`${at}.${k}`, 'a whole number ≥ 0', o[k]);
  if (typeof o['stop'] !== 'string' || !STOPS.has(o['stop'])) bad(`${at}.stop`, 'a stop reason', o['stop']);
  if (!Array.isArray(o['segments'])) bad(`${at}.segments`, 'a list', o['segments']);
  (o['segments'] as unknown[]).forEach((seg, k) => {
    const where = `${at}.segments[${k}]`;
    checkJudged(seg, where, bad);
    const g = seg as Record<string, unknown>;
    if (!Number.isInteger(g['width']) || (g['width'] as number) < 1)
      bad(`${where}.width`, 'a whole number ≥ 1', g['width']);
    if (!isCount(g['epochs'])) bad(`${where}.epochs`, 'a whole number ≥ 0', g['epochs']);
    if (typeof g['stop'] !== 'string' || !STOPS.has(g['stop'])) bad(`${where}.stop`, 'a stop reason', g['stop']);
  });
  if (o['network'] !== null) {
    checkNetwork(o['network'], `${at}.network`, want, bad);
    if ((o['network'] as NetworkJson).width !== o['finalWidth'])
      bad(`${at}.network.width`, `finalWidth (${String(o['finalWidth'])})`, (o['network'] as NetworkJson).width);
  }
  if (o['reason'] !== null && typeof o['reason'] !== 'string') bad(`${at}.reason`, 'a sentence or null', o['reason']);
}

function checkNetwork(n: unknown, at: string, want: PartExpectation, bad: Bad): void {
  if (!isObject(n)) return bad(at, 'a network', n);
  const net = n as unknown as NetworkJson;
  if (net.inputs !== want.inputs) bad(`${at}.inputs`, `${want.inputs}`, net.inputs);
  if (net.outputs !== want.outputs) bad(`${at}.outputs`, `${want.outputs}`, net.outputs);
  if (!Number.isInteger(net.width) || net.width < 1) bad(`${at}.width`, 'a whole number ≥ 1', net.width);
  // The activation and head follow from the settings, which the fingerprint already matched.
  if (net.activation !== want.activation) bad(`${at}.activation`, `"${want.activation}"`, net.activation);
  if (net.head !== want.head) bad(`${at}.head`, `"${want.head}"`, net.head);
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
}
