/**
 * End to end: the committed dist/index.js through a job matrix's three stages, each a separate
 * job as a runner runs it (its own checkout, RUNNER_TEMP, GITHUB_OUTPUT and job summary), under
 * the Node running the tests and under Node 24 (the action's runtime):
 *
 *   plan  → outputs `shards` (for strategy.matrix) and `plan` (uploaded as an artifact);
 *   shard → one job per index, the plan downloaded into its checkout; output `part`;
 *   merge → the parts downloaded into one folder; finishes as `stage: check` does.
 *
 * Compared with a one-machine `stage: check` of the same checkout. The data are the invented
 * pump-vibration demo (examples/pump-vibration, not measurements), pull-request variant, whose
 * answer moves past the widths the plan covers, so the merge also trains some widths itself.
 */
import { copyFileSync, existsSync, mkdirSync, readFileSync, rmSync } from 'node:fs';
import { basename, dirname, join, relative } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import type { PartDocument } from '../../src/matrix/part.js';
import type { PlanDocument } from '../../src/matrix/plan.js';
import type { Report } from '../../src/report/types.js';
import { REPO_ROOT, runCli } from '../helpers/cli.js';
import {
  PR_NUMBER,
  listFiles,
  makeWorkspace,
  pullRequestEvent,
  runAction,
  runtimes,
  tempDir,
  type RunOptions,
  type RunResult,
  type Runtime,
} from './harness.js';
import { standInPerTest } from './stand-in-per-test.js';

const CONFIG = 'neuron-budget.pr.yml';
const MARKER = `<!-- neuron-budget comment; config: ${CONFIG} -->`;
const TIMEOUT = 120_000;
const DEMO_FILES = ['neuron-budget.yml', CONFIG, 'readings.csv', 'readings-pr.csv'];

/** Folders this file made (workspaces and the runners' files), removed at the end. */
const made: string[] = [];
afterAll(() => {
  for (const dir of made.splice(0)) rmSync(dir, { recursive: true, force: true });
});

/** A fresh checkout for one job, as actions/checkout gives each job of a matrix its own. */
function checkout(files: Record<string, string>): string {
  const parent = tempDir('matrix');
  made.push(parent);
  return makeWorkspace(files, parent);
}

/** The demo plus its baseline (written by the command line's `baseline` on the base readings), as committed. */
let committed: Promise<Record<string, string>> | null = null;
function committedFiles(): Promise<Record<string, string>> {
  committed ??= (async () => {
    const files: Record<string, string> = {};
    for (const name of DEMO_FILES)
      files[name] = readFileSync(join(REPO_ROOT, 'examples', 'pump-vibration', name), 'utf8');
    const base = await runCli(['baseline', '--config', 'neuron-budget.yml', '--workers', '2'], {
      files,
      timeoutMs: TIMEOUT,
    });
    expect(base.code, base.stderr).toBe(0);
    return { ...files, 'neuron-budget.baseline.json': base.read('neuron-budget.baseline.json') };
  })();
  return committed;
}

function explain(r: RunResult): string {
  return `exit ${r.code} (signal ${r.signal}) after ${r.ms} ms\n--- stdout\n${r.stdout.slice(-4000)}\n--- stderr\n${r.stderr.slice(-4000)}`;
}
const errors = (r: RunResult): string[] => r.annotations.filter((a) => a.level === 'error').map((a) => a.message);
const readJson = <T>(path: string): T => JSON.parse(readFileSync(path, 'utf8')) as T;

/** The report without its wall-clock `timing`, the one part that may differ between runs. */
function withoutTiming(path: string): Omit<Report, 'timing'> {
  const { timing, ...rest } = readJson<Report & { timing?: unknown }>(path);
  expect(timing, `${path} has a timing key`).toBeTypeOf('object');
  return rest;
}

/** A job's outputs with paths under its RUNNER_TEMP made relative, so two jobs' outputs compare. */
function portable(r: RunResult): Record<string, string> {
  return Object.fromEntries(
    Object.entries(r.outputs).map(([k, v]) => [k, v.startsWith(r.runnerTemp) ? relative(r.runnerTemp, v) : v]),
  );
}

const { list, node24Problem } = runtimes();

describe.each(list)('action bundle under $label: the search as a job matrix', (runtime: Runtime) => {
  const standIn = standInPerTest(runtime, node24Problem);

  /** One job of the workflow, on a pull_request event against the stand-in API. */
  const job = (
    workspace: string,
    inputs: Record<string, string>,
    extra: Partial<RunOptions> = {},
  ): Promise<RunResult> =>
    runAction({
      runtime,
      apiUrl: standIn().url,
      workspace,
      eventName: 'pull_request',
      event: pullRequestEvent(),
      inputs: { config: CONFIG, ...inputs },
      timeoutMs: TIMEOUT,
      ...extra,
    });

  /** The plan job and one shard job per index; memoized per runtime, so the tests below share it. */
  let planned: Promise<{ plan: RunResult; planDoc: PlanDocument; shards: RunResult[] }> | null = null;
  const planAndShards = (): Promise<{ plan: RunResult; planDoc: PlanDocument; shards: RunResult[] }> =>
    (planned ??= (async () => {
      const files = await committedFiles();
      const ws = checkout(files);
      const before = listFiles(ws);
      const plan = await job(ws, { stage: 'plan', shards: '3' });
      expect(plan.code, explain(plan)).toBe(0);
      // The plan file is under RUNNER_TEMP, not in the checkout.
      expect(listFiles(ws)).toEqual(before);
      expect(plan.outputs['plan']).toBe(join(plan.runnerTemp, 'neuron-budget', 'neuron-budget.pr', 'plan.json'));
      const planDoc = readJson<PlanDocument>(plan.outputs['plan']);
      const indexes = JSON.parse(plan.outputs['shards']) as number[];
      expect(indexes).toEqual(planDoc.shards.map((s) => s.index));
      const shards: RunResult[] = [];
      for (const index of indexes) {
        // download-artifact puts the plan into the shard job's workspace.
        const shardWs = checkout({ ...files, 'artifacts/plan/plan.json': readFileSync(plan.outputs['plan'], 'utf8') });
        const shard = await job(shardWs, {
          stage: 'shard',
          plan: 'artifacts/plan/plan.json',
          'shard-index': String(index),
          workers: '1',
        });
        expect(shard.code, explain(shard)).toBe(0);
        shards.push(shard);
      }
      return { plan, planDoc, shards };
    })());

  /** The merge job's checkout: the committed files and, in `parts/`, the part files of `indexes`. */
  async function mergeCheckout(shards: RunResult[], indexes: number[]): Promise<string> {
    const ws = checkout(await committedFiles());
    mkdirSync(join(ws, 'parts'));
    for (const i of indexes)
      copyFileSync(shards[i].outputs['part'], join(ws, 'parts', basename(shards[i].outputs['part'])));
    return ws;
  }

  it(
    'plan, a shard job per index and merge: one comment and one summary, both from merge; the one-machine report',
    async () => {
      // The one-machine reference: stage check, with its comment turned off so the API sees only the matrix.
      const one = await job(checkout(await committedFiles()), { comment: 'false' });
      expect(one.code, explain(one)).toBe(1);
      expect(one.outputs['verdict']).toBe('fail');
      expect(standIn().requests).toEqual([]);

      const { plan, planDoc, shards } = await planAndShards();
      expect(Object.keys(plan.outputs).sort()).toEqual(['plan', 'shards']);
      expect(JSON.parse(plan.outputs['shards'])).toEqual([0, 1, 2]);
      // A baseline of the same settings is committed: the plan starts from its width.
      expect(planDoc.start).toEqual({ from: 'baseline', width: Number(one.outputs['baseline-width']) });
      const planned = planDoc.shards.flatMap((s) => s.tasks.map((t) => t.width));
      expect(Math.max(...planned)).toBeLessThan(Number(one.outputs['width']));
      shards.forEach((shard, i) => {
        expect(Object.keys(shard.outputs)).toEqual(['part']);
        expect(shard.outputs['part']).toBe(
          join(shard.runnerTemp, 'neuron-budget', 'neuron-budget.pr', `part-${i}.json`),
        );
        const part = readJson<PartDocument>(shard.outputs['part']);
        expect(part.plan).toBe(planDoc.id);
        expect(part.shard).toEqual({ index: i, of: 3 });
        expect(part.results).toHaveLength(planDoc.shards[i].tasks.length);
      });
      // Neither plan nor shard writes a job summary or talks to the API.
      for (const r of [plan, ...shards]) {
        expect(r.summary, explain(r)).toBe('');
        expect(errors(r)).toEqual([]);
      }
      expect(standIn().requests).toEqual([]);

      const merge = await job(await mergeCheckout(shards, [0, 1, 2]), { stage: 'merge', parts: 'parts' });
      expect(merge.code, explain(merge)).toBe(one.code);
      // The same outputs as the one-machine check (paths relative to each job's RUNNER_TEMP) and the same report.
      expect(portable(merge)).toEqual(portable(one));
      expect(withoutTiming(merge.outputs['report'])).toEqual(withoutTiming(one.outputs['report']));
      expect(existsSync(merge.outputs['model'])).toBe(true);
      expect(readFileSync(merge.outputs['model'], 'utf8')).toBe(readFileSync(one.outputs['model'], 'utf8'));
      expect(merge.stdout).toContain(`merge: 3 parts of plan ${planDoc.id.slice(0, 12)}: 20 trainings`);
      // The merge trained itself only the widths the plan did not cover, above the plan's, up to the answer.
      const local =
        /merge: ran here what the parts did not hold: \d+ growth trainings the plan did not cover \(widths? ([\d, ]+)\)/.exec(
          merge.stdout,
        );
      expect(local, explain(merge)).not.toBeNull();
      const ranHere = local![1].split(', ').map(Number);
      expect(Math.min(...ranHere)).toBeGreaterThan(Math.max(...planned));
      expect(ranHere).toContain(Number(merge.outputs['width']));
      expect(errors(merge).filter((m) => m.startsWith('neuron-budget verdict: fail'))).toHaveLength(1);

      // One job summary, from merge, and one comment, posted by merge: the summary under our marker.
      const width = merge.outputs['width'];
      expect(merge.summary).toContain(`Needs ${width} hidden neurons`);
      expect(merge.summary.split('A passing gate is not a safety sign-off').length - 1).toBe(1);
      expect(standIn().requests.filter((q) => q.method === 'POST')).toHaveLength(1);
      expect(standIn().requests.filter((q) => q.method === 'PATCH')).toHaveLength(0);
      const comments = standIn().all(PR_NUMBER);
      expect(comments).toHaveLength(1);
      expect(comments[0].body.split('\n')[0]).toBe(MARKER);
      expect(comments[0].body.slice(MARKER.length + 1).trim()).toBe(merge.summary.trim());
      expect(readFileSync(join(dirname(merge.outputs['report']), 'comment.md'), 'utf8').trim()).toBe(
        merge.summary.trim(),
      );
    },
    TIMEOUT * 4,
  );

  it(
    'merge with a part missing: exit 2, the missing shard named in the annotation, no verdict',
    async () => {
      const { shards } = await planAndShards();
      const merge = await job(await mergeCheckout(shards, [0, 1]), { stage: 'merge', parts: 'parts' });
      expect(merge.code, explain(merge)).toBe(2);
      const said = errors(merge);
      expect(said, explain(merge)).toHaveLength(1);
      expect(said[0]).toContain('the part of shard 2 of 3 is missing (parts given: 0, 1)');
      expect(merge.outputs['verdict'] ?? '').toBe('');
      expect(merge.outputs['report']).toBeUndefined();
      expect(merge.stderr).not.toMatch(/\n\s+at /);
      // The job summary and the pull request's comment say that nothing was checked, and why.
      expect(merge.summary).toContain('the part of shard 2 of 3 is missing');
      const comments = standIn().all(PR_NUMBER);
      expect(comments).toHaveLength(1);
      expect(comments[0].body).toContain('the part of shard 2 of 3 is missing');
      expect(comments[0].body).toContain('No verdict was reached');
    },
    TIMEOUT * 2,
  );
});
