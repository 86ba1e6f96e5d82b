/**
 * The search over a job matrix, in three stages: `plan` splits the trainings into shards,
 * `shard` runs one shard anywhere, and `merge` checks that every part belongs to this run,
 * completes whatever the parts did not cover, and finishes exactly as `check` would (same
 * report outside `timing`, same verdict, same exit code).
 */
import { readFile } from 'node:fs/promises';
import { performance } from 'node:perf_hooks';
import { UserError } from '../common/errors.js';
import { quote } from '../common/escape.js';
import { findJsonSyntaxProblem } from '../common/json-position.js';
import { displayPath } from '../common/paths.js';
import { secondsFromMs } from '../common/format.js';
import { writeOutput } from '../files/output.js';
import { resultSettings, settingsFingerprint } from '../gate/index.js';
import { checkPart, parsePart, serializePart, PART_SCHEMA, type PartDocument } from '../matrix/part.js';
import { makePlan, MAX_SHARDS, PLAN_SCHEMA, type PlanDocument } from '../matrix/plan.js';
import { headFor } from '../nn/index.js';
import { growthPlan } from '../search/index.js';
import { runShard } from '../search/shard.js';
import { DEFAULT_PRUNE_CANDIDATES } from '../search/task.js';
import { TOOL_VERSION } from '../version.js';
import { finishJob, type FinishOptions, type JobResult } from './finish.js';
import { prepareJob, prepareReportJob, searchJob, searchOptions, type PreparedJob, type Running } from './prepare.js';

interface StageBase {
  configPath: string;
  root: string;
  baselinePath?: string | null;
  log?: (line: string) => void;
}

/** This run's plan for `shards` shards: a pure function of the prepared job. */
function planOf(job: PreparedJob, shards: number): PlanDocument {
  const { config, data } = job;
  const d = data.dataset;
  return makePlan(
    growthPlan(config.search, job.start),
    shards,
    {
      toolVersion: TOOL_VERSION,
      data: data.fingerprint,
      rows: data.rows,
      settings: settingsFingerprint(resultSettings(config)),
    },
    {
      trainRows: d.trainRows,
      inputs: d.inputs,
      outputs: d.outputs,
      maxEpochs: config.search.maxEpochs,
      pruneEpochs: config.search.prune ? config.search.pruneEpochs : 0,
      pruneCandidates: DEFAULT_PRUNE_CANDIDATES,
    },
  );
}

function describePlan(plan: PlanDocument): string {
  const tasks = plan.shards.reduce((n, s) => n + s.tasks.length, 0);
  const widths = [...new Set(plan.shards.flatMap((s) => s.tasks.map((t) => t.width)))].sort((a, b) => a - b);
  const from =
    plan.start.from === 'baseline'
      ? `from the baseline's width ${plan.start.width}`
      : `from min-width ${plan.start.width}`;
  const range = widths.length === 1 ? `width ${widths[0]}` : `widths ${widths[0]}–${widths[widths.length - 1]}`;
  const lines = [`plan: ${tasks} trainings (${range}, ${from}) over ${plan.shards.length} shards`];
  for (const s of plan.shards) {
    const pruned = s.tasks.filter((t) => t.prune).length;
    lines.push(
      `  shard ${s.index}: ${s.tasks.length} trainings${pruned > 0 ? `, prunes up to ${pruned} networks` : ''} (about ${(s.estimatedMacs / 1e9).toFixed(1)} G multiply-adds)`,
    );
  }
  return lines.join('\n');
}

export interface PlanStageOptions extends StageBase {
  shards: number;
  /** Where to write the plan (absolute). */
  planPath: string;
}

export interface PlanStageResult {
  plan: PlanDocument;
  /** The shard indexes, for a matrix (`[0, 1, 2]`). */
  indexes: number[];
  text: string;
}

export async function runPlanStage(options: PlanStageOptions): Promise<PlanStageResult> {
  if (!Number.isInteger(options.shards) || options.shards < 1 || options.shards > MAX_SHARDS)
    throw new UserError(
      `shards: expected a whole number from 1 to ${MAX_SHARDS} (a matrix's job limit), found ${options.shards}`,
    );
  const job = await prepareJob({ ...options, outputs: [[options.planPath, 'plan']] });
  const plan = planOf(job, options.shards);
  await writeOutput(options.planPath, `${JSON.stringify(plan, null, 2)}\n`, 'plan', job.config.root);
  let text = describePlan(plan);
  if (plan.shards.length < options.shards)
    text += `\n(${options.shards} shards were asked for, but there are only ${plan.shards.length} trainings to share)`;
  return { plan, indexes: plan.shards.map((s) => s.index), text };
}

/** Reads a plan file and checks it is this run's plan (the same data, settings, baseline and tool). */
async function readPlan(path: string, job: PreparedJob): Promise<PlanDocument> {
  const shown = displayPath(job.config.root, path);
  const text = await readFile(path, 'utf8').catch((e: NodeJS.ErrnoException) => {
    throw new UserError(
      e.code === 'ENOENT'
        ? `plan file ${shown} does not exist; write it with \`neuron-budget plan\``
        : `cannot read the plan file ${shown} (${e.code ?? 'unknown error'})`,
    );
  });
  const syntax = findJsonSyntaxProblem(text);
  if (syntax)
    throw new UserError(`${shown}:${syntax.line}:${syntax.column}: the plan is not valid JSON: ${syntax.detail}`);
  const doc = JSON.parse(text) as Partial<PlanDocument> | null;
  const refuse = (why: string): never => {
    throw new UserError(`${shown}: ${why}`);
  };
  if (typeof doc !== 'object' || doc === null || doc.schema !== PLAN_SCHEMA)
    return refuse(`expected a neuron-budget plan (schema "${PLAN_SCHEMA}"), the output of \`neuron-budget plan\``);
  const shards = Array.isArray(doc.shards) ? doc.shards.length : 0;
  if (shards < 1 || shards > MAX_SHARDS) return refuse(`shards: expected 1 to ${MAX_SHARDS} shards, found ${shards}`);
  const mine = planOf(job, shards);
  if (doc.data?.fingerprint !== mine.data.fingerprint)
    refuse('was made for other data than this checkout holds; make the plan from the same commit as the shards');
  if (doc.settings?.fingerprint !== mine.settings.fingerprint)
    refuse('was made with other result-changing settings than this config has');
  if (JSON.stringify(doc) !== JSON.stringify(mine))
    refuse(
      `is not this run's plan (plan ${quote(String(doc.id).slice(0, 12))}, this config, data and baseline give ${mine.id.slice(0, 12)}); it may come from another tool version or another baseline`,
    );
  return mine;
}

export interface ShardStageOptions extends StageBase, Running {
  planPath: string;
  index: number;
  /** Where to write the part (absolute). */
  partPath: string;
}

export async function runShardStage(options: ShardStageOptions): Promise<{ part: PartDocument; text: string }> {
  const started = performance.now();
  const job = await prepareJob({
    ...options,
    outputs: [[options.partPath, 'part']],
    reads: [[options.planPath, 'plan file']],
  });
  const plan = await readPlan(options.planPath, job);
  const shard = plan.shards[options.index];
  if (!Number.isInteger(options.index) || shard === undefined)
    throw new UserError(`index: expected a shard of the plan, 0 to ${plan.shards.length - 1}, found ${options.index}`);
  const outcome = await runShard(
    job.data.dataset,
    job.config.search,
    job.config.target,
    shard,
    searchOptions(job, options),
  );
  const part: PartDocument = {
    schema: PART_SCHEMA,
    tool: { name: 'neuron-budget', version: TOOL_VERSION },
    plan: plan.id,
    shard: { index: shard.index, of: plan.shards.length },
    data: { fingerprint: plan.data.fingerprint },
    settings: { fingerprint: plan.settings.fingerprint },
    results: outcome.results,
    pruned: outcome.pruned,
    seconds: secondsFromMs(performance.now() - started),
  };
  await writeOutput(options.partPath, serializePart(part), 'part', job.config.root);
  const left = shard.tasks.length - outcome.results.length;
  const text =
    `shard ${shard.index} of ${plan.shards.length}: ${outcome.results.length} trainings, ${outcome.pruned.length} networks pruned, ` +
    `${part.seconds.toFixed(1)} s${left > 0 ? `; ${left} trainings left for the merge (the time budget ran out)` : ''}`;
  return { part, text };
}

export interface MergeStageOptions extends StageBase, Running, FinishOptions {
  /** The part files (absolute), in any order. */
  partPaths: readonly string[];
}

async function readParts(paths: readonly string[], job: PreparedJob): Promise<{ part: PartDocument; shown: string }[]> {
  if (paths.length === 0)
    throw new UserError('merge needs the part files the shards wrote (neuron-budget shard --out …); none were given');
  return Promise.all(
    paths.map(async (path) => {
      const shown = displayPath(job.config.root, path);
      const text = await readFile(path, 'utf8').catch((e: NodeJS.ErrnoException) => {
        throw new UserError(
          e.code === 'ENOENT'
            ? `part file ${shown} does not exist`
            : `cannot read the part file ${shown} (${e.code ?? 'unknown error'})`,
        );
      });
      return { part: parsePart(text, shown), shown };
    }),
  );
}

/**
 * The plan the parts belong to, rebuilt here: of the shard counts the parts give, the one whose
 * plan most parts name (so a stray part of another plan is the one refused, whatever its place
 * in the list); when none names a plan of this run, the first part's count (and it is refused).
 */
function namedPlan(job: PreparedJob, parts: readonly { part: PartDocument }[]): PlanDocument {
  const counts = [...new Set(parts.map((p) => p.part.shard.of))].filter((n) => n >= 1 && n <= MAX_SHARDS);
  const candidates = counts
    .map((n) => planOf(job, n))
    .map((plan) => ({ plan, naming: parts.filter((p) => p.part.plan === plan.id).length }))
    .filter((c) => c.naming > 0)
    .sort((a, b) => b.naming - a.naming);
  return candidates[0]?.plan ?? planOf(job, Math.min(MAX_SHARDS, Math.max(1, parts[0].part.shard.of)));
}

export async function runMergeStage(options: MergeStageOptions): Promise<JobResult> {
  const job = await prepareReportJob({ ...options, reads: options.partPaths.map((p) => [p, 'part file'] as const) });
  const parts = await readParts(options.partPaths, job);
  const plan = namedPlan(job, parts);
  const want = {
    plan,
    toolVersion: TOOL_VERSION,
    inputs: job.data.dataset.inputs,
    outputs: job.data.dataset.outputs,
    activation: job.config.search.activation,
    head: headFor(job.data.dataset),
  };
  const byIndex = new Map<number, string>();
  for (const { part, shown } of parts) {
    checkPart(part, shown, want);
    const other = byIndex.get(part.shard.index);
    if (other !== undefined)
      throw new UserError(`${shown} and ${other} are both shard ${part.shard.index}; give each shard's part once`);
    byIndex.set(part.shard.index, shown);
  }
  const missing = plan.shards.map((s) => s.index).filter((i) => !byIndex.has(i));
  if (missing.length > 0)
    throw new UserError(
      `the part of shard ${missing.join(', ')} of ${plan.shards.length} is missing (parts given: ${[...byIndex.keys()].sort((a, b) => a - b).join(', ')}); did a shard job fail or its artifact not download?`,
    );
  const known = {
    results: parts.flatMap((p) => p.part.results),
    pruned: parts.flatMap((p) => p.part.pruned),
  };
  options.log?.(
    `merge: ${parts.length} parts of plan ${plan.id.slice(0, 12)}: ${known.results.length} trainings, ${known.pruned.length} pruned networks`,
  );
  const search = await searchJob(job, options, {
    known,
    onLocalWork: (what) => options.log?.(`merge: ran here what the parts did not hold: ${what}`),
  });
  return finishJob(job, search, options);
}
