/**
 * The action's shell: inputs → runJob → outputs, job summary, pull-request comment, step result.
 * Everything GitHub-specific lives here; the job itself knows nothing about the runner.
 */
import { fileURLToPath } from 'node:url';
import * as core from '@actions/core';
import { context } from '@actions/github';
import { mkdirSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { escapeText } from '../common/escape.js';
import { DEFAULT_CONFIG, displayPath } from '../common/paths.js';
import { isUserError, MAX_MESSAGE, UserError } from '../common/errors.js';
import { EXIT } from '../common/exit-codes.js';
import { writeFileAtomic } from '../files/atomic.js';
import type { ProgressEvent } from '../search/types.js';
import { runMergeStage, runPlanStage, runShardStage } from '../job/stages.js';
import { runJob, type JobResult } from '../run.js';
import { toAnnotation, withinLimit } from './annotations.js';
import { describeFailure, isApiFailure } from './api-failure.js';
import { commentBody, commentMarker, upsertComment } from './comment.js';
import { tokenIdentity } from './identity.js';
import { readInputs, outputFolder, type ActionInputs } from './inputs.js';
import { failureMarkdown, fitSummary } from './markdown.js';
import { commentBudgetFromEnv, makeClient, requestTimeoutFromEnv, retryBaseFromEnv } from './octokit.js';
import { throttledProgress } from '../report/progress.js';
import { baselineRecordLine } from '../report/index.js';
import { logUntrusted } from './log.js';

/** Verdicts that fail the step; the rest pass it. */
const FAILING = new Set(['fail', 'inconclusive']);

function runUrl(): string | null {
  const { serverUrl } = context;
  const repo = process.env['GITHUB_REPOSITORY'];
  const id = process.env['GITHUB_RUN_ID'];
  return serverUrl && repo && id ? `${serverUrl}/${repo}/actions/runs/${id}` : null;
}

async function writeSummary(markdown: string): Promise<void> {
  try {
    await core.summary.addRaw(fitSummary(markdown), true).write();
  } catch (e) {
    core.warning(`Could not write the job summary: ${escapeText((e as Error).message)}`);
  }
}

/** Beside the report, for workflows that relay the comment themselves (pull requests from forks). */
async function writeCommentFile(path: string, markdown: string): Promise<void> {
  try {
    await writeFileAtomic(path, markdown);
  } catch (e) {
    core.warning(`Could not write ${escapeText(path)}: ${escapeText((e as Error).message)}`);
  }
}

function isForkPullRequest(): boolean {
  const pr = context.payload.pull_request as
    { head?: { repo?: { id?: number; full_name?: string } | null } } | undefined;
  const head = pr?.head?.repo;
  const base = context.payload.repository as { id?: number; full_name?: string } | undefined;
  if (!head || !base) return false;
  if (head.id !== undefined && base.id !== undefined) return head.id !== base.id;
  return head.full_name !== base.full_name;
}

function forbiddenAdvice(): string {
  return isForkPullRequest()
    ? 'This pull request comes from a fork, and GitHub gives workflows started by fork pull requests a read-only token, so no comment can be posted from this job. ' +
        'To get comments on fork pull requests, use the two-workflow setup in the neuron-budget README ("Pull requests from forks").'
    : 'The token may not write to pull requests. Add `permissions: { contents: read, pull-requests: write }` to the job, or pass a token that has it as `github-token`.';
}

/**
 * Posts or updates the sticky comment. Never throws: a comment is a convenience, and the
 * step's result must come from the verdict alone.
 */
async function postComment(inputs: ActionInputs, markdown: string): Promise<void> {
  if (!inputs.comment) {
    core.info('Pull-request comment turned off (comment: false); the results are in the job summary and outputs.');
    return;
  }
  if (context.eventName === 'pull_request_target') {
    core.warning(
      'neuron-budget does not comment on pull_request_target events. That event runs with a write token and secrets; ' +
        "checking out and reading the pull request's files under it is unsafe. Run neuron-budget on pull_request " +
        '(see "Pull requests from forks" in the README).',
    );
    return;
  }
  if (context.eventName !== 'pull_request') {
    core.info(
      `Event ${context.eventName || '(unknown)'}: no pull-request comment; the results are in the job summary and outputs.`,
    );
    return;
  }
  const issueNumber = (context.payload.pull_request as { number?: number } | undefined)?.number;
  if (!issueNumber) {
    core.warning('The pull_request event payload has no pull-request number, so no comment was posted.');
    return;
  }
  if (!inputs.token) {
    core.warning(
      "No github-token was given, so no pull-request comment was posted. The default is the job's own token; leave the input unset to use it.",
    );
    return;
  }
  let owner: string;
  let repo: string;
  try {
    ({ owner, repo } = context.repo);
  } catch {
    core.warning('GITHUB_REPOSITORY is not set, so no pull-request comment was posted.');
    return;
  }
  const budgetMs = commentBudgetFromEnv(process.env);
  const budget = { signal: AbortSignal.timeout(budgetMs), endsAt: Date.now() + budgetMs };
  const octokit = makeClient({
    token: inputs.token,
    baseUrl: process.env['GITHUB_API_URL'] || 'https://api.github.com',
    retryBaseMs: retryBaseFromEnv(process.env),
    requestTimeoutMs: requestTimeoutFromEnv(process.env),
    budget,
    log: (m) => core.info(escapeText(m, MAX_MESSAGE)),
  });
  const marker = commentMarker(inputs.configKey);
  try {
    const identity = await tokenIdentity(octokit);
    core.info(`Looking for an earlier neuron-budget comment by ${escapeText(identity.login)} (${identity.how}).`);
    const done = await upsertComment(
      octokit,
      { owner, repo, issueNumber },
      marker,
      commentBody(marker, markdown, runUrl()),
      identity,
      (m) => core.info(escapeText(m, MAX_MESSAGE)),
    );
    core.info(`Pull-request comment ${done.action} (id ${done.id})${done.url ? `: ${escapeText(done.url)}` : ''}`);
  } catch (e) {
    const why = isApiFailure(e)
      ? describeFailure(e, forbiddenAdvice(), Math.round(budgetMs / 100) / 10)
      : `It failed with an unexpected error: ${(e as Error).message ?? String(e)}.`;
    core.warning(
      escapeText(
        `Could not post the pull-request comment. ${why} The verdict, job summary and outputs are unaffected.`,
        MAX_MESSAGE,
      ),
    );
  }
}

function setOutputs(result: JobResult, reportPath: string): void {
  const r = result.report;
  const str = (v: number | string | null | undefined): string => (v === null || v === undefined ? '' : String(v));
  core.setOutput('verdict', str(result.verdict));
  core.setOutput('width', str(r.width));
  core.setOutput('metric', str(r.metric.value));
  core.setOutput('baseline-width', str(r.baseline?.width));
  core.setOutput('report', reportPath);
  core.setOutput('model', str(result.modelWritten));
  core.setOutput('baseline', str(result.baselineWritten));
}

async function failBadInput(e: UserError, inputs: ActionInputs | null): Promise<void> {
  const workspace = inputs?.workspace ?? process.env['GITHUB_WORKSPACE'] ?? process.cwd();
  const { annotated, logged } = withinLimit([toAnnotation(e, workspace)]);
  for (const a of annotated) {
    core.error(a.message, { title: 'neuron-budget', file: a.file, startLine: a.startLine, startColumn: a.startColumn });
  }
  for (const a of logged) logUntrusted(`error: ${a.message}`);
  process.exitCode = EXIT.badInput;
  const md = failureMarkdown(e.message, 'input', e.file !== undefined);
  await writeSummary(md);
  // A stale "pass" must not linger on the pull request while the config is broken (plan and shard
  // leave that to merge, which runs after them and meets the same broken config).
  if (inputs && writesComment(inputs)) await postComment(inputs, md);
}

/** The whole check and merge post the one comment; plan and shard never do. */
function writesComment(inputs: ActionInputs): boolean {
  return inputs.stage.kind === 'check' || inputs.stage.kind === 'merge';
}

async function failInternal(e: unknown, inputs: ActionInputs | null): Promise<void> {
  const err = e instanceof Error ? e : new Error(String(e));
  core.error(`internal error: ${escapeText(err.message, MAX_MESSAGE)}`, { title: 'neuron-budget' });
  if (err.stack) logUntrusted(err.stack);
  process.exitCode = EXIT.internal;
  const md = failureMarkdown(err.message, 'internal');
  await writeSummary(md);
  if (inputs && writesComment(inputs)) await postComment(inputs, md);
}

/** Search progress as log lines, one group per phase. */
function groupedProgress(): (ev: ProgressEvent) => void {
  let phase: ProgressEvent['phase'] | null = null;
  const progress = (): ((ev: ProgressEvent) => void) => throttledProgress((line) => core.info(line));
  let print = progress();
  return (ev) => {
    if (ev.phase !== phase) {
      if (phase !== null) {
        core.endGroup();
        core.startGroup(`neuron-budget: ${ev.phase} phase`);
      }
      phase = ev.phase;
      print = progress(); // the first line of each phase always shows
    }
    print(ev);
  };
}

/** In a group: the data summary and search progress fold away in the log. */
async function grouped<T>(work: () => Promise<T>): Promise<T> {
  core.startGroup('neuron-budget: data and search');
  try {
    return await work();
  } finally {
    core.endGroup();
  }
}

/**
 * A matrix's first two stages: plan exposes the shard list for `strategy.matrix` and the plan
 * file; shard exposes its part file. Neither writes a summary or a comment: merge writes the one.
 */
async function runMatrixStage(inputs: ActionInputs, folder: string): Promise<void> {
  const base = {
    configPath: inputs.configPath,
    root: inputs.workspace,
    baselinePath: null,
    log: (line: string) => logUntrusted(line),
  };
  const stage = inputs.stage;
  if (stage.kind === 'plan') {
    const planPath = join(folder, 'plan.json');
    const planned = await grouped(() => runPlanStage({ ...base, shards: stage.shards, planPath }));
    logUntrusted(planned.text);
    core.setOutput('shards', JSON.stringify(planned.indexes));
    core.setOutput('plan', planPath);
    return;
  }
  if (stage.kind === 'shard') {
    const partPath = join(folder, `part-${stage.index}.json`);
    const said = await grouped(() =>
      runShardStage({
        ...base,
        planPath: stage.planPath,
        index: stage.index,
        partPath,
        workers: inputs.workers,
        workerEntry: fileURLToPath(import.meta.url),
        onProgress: groupedProgress(),
      }),
    );
    logUntrusted(said.text);
    core.setOutput('part', partPath);
  }
}

/** The part files merge reads: every .json file in the folder, in name order. */
function partFiles(dir: string, workspace: string): string[] {
  const shown = displayPath(workspace, dir);
  let names: string[];
  try {
    names = readdirSync(dir);
  } catch {
    throw new UserError(`input parts: folder ${shown} does not exist; download the shards' artifacts into it`, {
      key: 'parts',
    });
  }
  const parts = names
    .filter((n) => n.endsWith('.json'))
    .sort()
    .map((n) => join(dir, n));
  if (parts.length === 0)
    throw new UserError(
      `input parts: folder ${shown} holds no part files (*.json); download every shard's artifact into it (actions/download-artifact with merge-multiple: true)`,
      { key: 'parts' },
    );
  return parts;
}

export async function run(): Promise<void> {
  let inputs: ActionInputs | null = null;
  try {
    inputs = readInputs((name) => core.getInput(name));
    const folder = outputFolder(inputs);
    mkdirSync(folder, { recursive: true });
    const stage = inputs.stage;
    if (stage.kind === 'plan' || stage.kind === 'shard') {
      core.info(`neuron-budget: ${stage.kind} stage with ${escapeText(inputs.configKey)}`);
      await runMatrixStage(inputs, folder);
      return;
    }
    const reportPath = join(folder, 'report.json');
    const modelPath = join(folder, 'model.json');
    const mode = inputs.updateBaseline ? 'baseline' : 'check';

    core.info(
      `neuron-budget: ${stage.kind === 'merge' ? `merge (${mode})` : mode} with ${escapeText(inputs.configKey)} (workspace ${escapeText(inputs.workspace)})`,
    );
    const options = {
      configPath: inputs.configPath,
      root: inputs.workspace,
      mode,
      baselinePath: null,
      reportPath,
      modelPath,
      workers: inputs.workers,
      workerEntry: fileURLToPath(import.meta.url),
      commit: process.env['GITHUB_SHA'] || null,
      surface: 'action',
      configShown: inputs.configKey === DEFAULT_CONFIG ? null : inputs.configKey,
      onProgress: groupedProgress(),
      log: (line: string) => logUntrusted(line),
    } as const;
    const workspace = inputs.workspace;
    const result: JobResult = await grouped(() =>
      stage.kind === 'merge'
        ? runMergeStage({ ...options, partPaths: partFiles(stage.partsDir, workspace) })
        : runJob(options),
    );

    setOutputs(result, reportPath);
    logUntrusted(result.text);
    const verdict = result.verdict;
    if (FAILING.has(verdict)) {
      const reason = result.report.reasons[0];
      core.setFailed(`neuron-budget verdict: ${verdict}${reason ? ` (${escapeText(reason, MAX_MESSAGE)})` : ''}`);
    } else {
      core.info(`neuron-budget verdict: ${verdict}`);
    }
    if (result.baselineRecord) core.info(baselineRecordLine(result.baselineRecord));

    await writeCommentFile(join(folder, 'comment.md'), result.markdown);
    await writeSummary(result.markdown);
    await postComment(inputs, result.markdown);
  } catch (e) {
    if (isUserError(e)) await failBadInput(e, inputs);
    else await failInternal(e, inputs);
  }
}
