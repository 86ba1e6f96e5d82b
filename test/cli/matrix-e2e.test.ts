/**
 * End to end: the search as a job matrix through the BUILT command line (dist/cli/index.js),
 * on the invented pump-vibration demo (examples/pump-vibration; its readings are invented, not
 * measurements). Every step runs in a fresh temp folder holding a copy of the checkout plus the
 * files an earlier step handed on, as separate jobs of a matrix would (a plan or a part travels
 * as an artifact). The reference is the same checkout searched on one machine by `check`:
 *
 *   - `plan --shards 3`, three `shard` processes and `merge` give the one-machine report outside
 *     `timing` and the same exit code, on the base readings (the plan covers what the search
 *     needs) and on the pull request's (whose answer moves past the widths the plan covered, so
 *     the merge runs the rest itself);
 *   - merge refuses a missing part, a part computed on other data, a part of another plan and a
 *     shard given twice; shard refuses a plan made for other data and a plan that is not JSON.
 *     Each refusal: exit 2, one `error:` line naming the file, no stack trace, nothing written.
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import type { PartDocument } from '../../src/matrix/part.js';
import type { PlanDocument } from '../../src/matrix/plan.js';
import type { Report } from '../../src/report/types.js';
import { hasStackTrace, REPO_ROOT, removeCliTempDirs, runCli, type CliRun } from '../helpers/cli.js';

afterAll(removeCliTempDirs);

const TIMEOUT = 120_000;
const BASE = 'neuron-budget.yml';
const PR = 'neuron-budget.pr.yml';
/** Where both demo configs keep their baseline (gate.baseline). */
const BASELINE = 'neuron-budget.baseline.json';

type Files = Record<string, string>;

/** The demo checkout: both configs and both CSV files, at the workspace root. */
const DEMO: Files = Object.fromEntries(
  [BASE, PR, 'readings.csv', 'readings-pr.csv'].map((name) => [
    name,
    readFileSync(join(REPO_ROOT, 'examples', 'pump-vibration', name), 'utf8'),
  ]),
);

/** Shown when an assertion on a run fails. */
const explain = (run: CliRun): string => `exit ${run.code}\n--- stdout\n${run.stdout}\n--- stderr\n${run.stderr}`;

/** One job: the command in a fresh copy of `files`. */
const job = (args: string[], files: Files): Promise<CliRun> => runCli(args, { files, timeoutMs: TIMEOUT });

/** The report without its wall-clock `timing`, the one part that may differ between runs. */
function withoutTiming(text: string): Omit<Report, 'timing'> {
  const { timing, ...rest } = JSON.parse(text) as Report & { timing?: unknown };
  expect(timing, 'the report has a timing key').toBeTypeOf('object');
  return rest;
}

const short = (hash: string): string => `${hash.slice(0, 12)}…`;

/** Memoized, so each test can run alone (`-t`) and the shared steps still run once. */
function once<T>(make: () => Promise<T>): () => Promise<T> {
  let made: Promise<T> | null = null;
  return () => (made ??= make());
}
const memo = new Map<string, Promise<unknown>>();
function cached<T>(key: string, make: () => Promise<T>): Promise<T> {
  if (!memo.has(key)) memo.set(key, make());
  return memo.get(key) as Promise<T>;
}

/** `baseline` on the base readings; the checkout then holds the baseline, as after its commit. */
const checkout = once(async (): Promise<Files> => {
  const run = await job(['baseline', '--config', BASE, '--workers', '2'], DEMO);
  expect(run.code, explain(run)).toBe(0);
  expect(run.created).toEqual([BASELINE]);
  return { ...DEMO, [BASELINE]: run.read(BASELINE) };
});
const baselineWidth = async (): Promise<number> =>
  (JSON.parse((await checkout())[BASELINE]) as { result: { width: number } }).result.width;

interface OneMachine {
  run: CliRun;
  text: string;
  report: Report;
}

/** The reference: `check` of the whole search on one machine. */
function oneMachine(config: string, files?: Files): Promise<OneMachine> {
  return cached(`one ${config} ${files ? 'custom' : 'checkout'}`, async () => {
    const run = await job(
      ['check', '--config', config, '--report', 'one.json', '--workers', '2'],
      files ?? (await checkout()),
    );
    expect(run.created, explain(run)).toEqual(['one.json']);
    const text = run.read('one.json');
    return { run, text, report: JSON.parse(text) as Report };
  });
}

interface Matrix {
  planRun: CliRun;
  planText: string;
  plan: PlanDocument;
  /** Part file text, by shard index. */
  parts: string[];
  shardRuns: CliRun[];
}

/** `plan --shards N`, then one separate `shard` process per index, each in its own fresh checkout. */
function matrix(config: string, shards: number): Promise<Matrix> {
  return cached(`matrix ${config} ${shards}`, async () => {
    const from = await checkout();
    const planRun = await job(['plan', '--config', config, '--shards', String(shards), '--out', 'plan.json'], from);
    expect(planRun.code, explain(planRun)).toBe(0);
    expect(planRun.created).toEqual(['plan.json']);
    const planText = planRun.read('plan.json');
    const plan = JSON.parse(planText) as PlanDocument;
    const shardRuns: CliRun[] = [];
    const parts: string[] = [];
    for (const { index } of plan.shards) {
      const run = await job(
        [
          'shard',
          '--config',
          config,
          '--plan',
          'plan.json',
          '--index',
          String(index),
          '--out',
          `part-${index}.json`,
          '--workers',
          '1',
        ],
        { ...from, 'plan.json': planText },
      );
      expect(run.code, explain(run)).toBe(0);
      expect(run.created).toEqual([`part-${index}.json`]);
      shardRuns.push(run);
      parts.push(run.read(`part-${index}.json`));
    }
    return { planRun, planText, plan, parts, shardRuns };
  });
}

/** The part files of a matrix under their own names, to hand to a merge. */
const partFiles = (m: Matrix): Files => Object.fromEntries(m.parts.map((text, i) => [`part-${i}.json`, text]));

const MERGE = (config: string, parts: string[]): string[] => [
  'merge',
  '--config',
  config,
  '--report',
  'merged.json',
  '--workers',
  '2',
  ...parts,
];

/**
 * A refusal as the command line must make it: exit 2, nothing on stdout, no stack trace, exactly
 * one `error:` line, the last, starting with `error: <at>` and holding every fragment; and nothing
 * written (no report, no part, no partial file).
 */
function expectRefusal(run: CliRun, at: string, says: readonly string[]): void {
  expect(run.code, explain(run)).toBe(2);
  expect(run.stdout).toBe('');
  expect(hasStackTrace(run.stderr), run.stderr).toBe(false);
  const lines = run.stderr.trimEnd().split('\n');
  expect(
    lines.filter((l) => l.startsWith('error:')),
    run.stderr,
  ).toHaveLength(1);
  const last = lines[lines.length - 1];
  expect(last.startsWith(`error: ${at}`), run.stderr).toBe(true);
  for (const fragment of says) expect(last, run.stderr).toContain(fragment);
  expect(run.created, 'files written by a refused run').toEqual([]);
}

/** The widths a plan's shards train. */
const plannedWidths = (plan: PlanDocument): number[] =>
  [...new Set(plan.shards.flatMap((s) => s.tasks.map((t) => t.width)))].sort((a, b) => a - b);

/** What a plan and its parts must say of themselves, whatever the data. */
function expectMatrixShape(m: Matrix, shards: number, dataFingerprint: string): void {
  const { plan } = m;
  const indexes = plan.shards.map((s) => s.index);
  expect(indexes).toEqual(Array.from({ length: shards }, (_, i) => i));
  // stdout is the shard list for a script to fan out, and nothing else.
  expect(m.planRun.stdout).toBe(`${JSON.stringify(indexes)}\n`);
  expect(plan.data.fingerprint).toBe(dataFingerprint);
  m.parts.forEach((text, i) => {
    const part = JSON.parse(text) as PartDocument;
    expect(part.plan).toBe(plan.id);
    expect(part.shard).toEqual({ index: i, of: shards });
    expect(part.data.fingerprint).toBe(dataFingerprint);
    expect(part.settings.fingerprint).toBe(plan.settings.fingerprint);
    // Every task of the shard ran (no time budget is set), each once, in the plan's order.
    expect(part.results.map((r) => [r.width, r.restart])).toEqual(
      plan.shards[i].tasks.map((t) => [t.width, t.restart]),
    );
    expect(m.shardRuns[i].stderr).toContain(`shard ${i} of ${shards}: ${part.results.length} trainings`);
  });
}

/** The merge's own account: how many parts and trainings it took from the shards. */
function expectMergedFrom(merge: CliRun, m: Matrix): void {
  const trainings = m.parts.reduce((n, t) => n + (JSON.parse(t) as PartDocument).results.length, 0);
  expect(trainings).toBe(m.plan.shards.reduce((n, s) => n + s.tasks.length, 0));
  expect(merge.stderr).toContain(
    `merge: ${m.parts.length} parts of plan ${m.plan.id.slice(0, 12)}: ${trainings} trainings`,
  );
}

describe('the search as a job matrix, through dist/cli/index.js, on the invented pump demo', () => {
  it(
    'base readings: plan --shards 3, three shard processes and merge give the one-machine report and exit code',
    async () => {
      const width = await baselineWidth();
      const one = await oneMachine(BASE);
      // Same data and settings as the baseline: the one-machine check passes at the baseline's width.
      expect(one.run.code, explain(one.run)).toBe(0);
      expect(one.report.verdict).toBe('pass');
      expect(one.report.width).toBe(width);

      const m = await matrix(BASE, 3);
      expectMatrixShape(m, 3, one.report.data.fingerprint);
      // A baseline of the same settings: the plan starts at its width and holds that width and the one below.
      expect(m.plan.start).toEqual({ from: 'baseline', width });
      expect(plannedWidths(m.plan)).toEqual([width - 1, width]);

      const merge = await job(MERGE(BASE, ['part-0.json', 'part-1.json', 'part-2.json']), {
        ...(await checkout()),
        ...partFiles(m),
      });
      expect(merge.code, explain(merge)).toBe(one.run.code);
      expect(merge.created).toEqual(['merged.json']);
      expect(withoutTiming(merge.read('merged.json'))).toEqual(withoutTiming(one.text));
      expectMergedFrom(merge, m);
      // The answer did not move, so the shards held everything: the merge trained nothing itself.
      expect(merge.stderr).not.toContain('ran here what the parts did not hold');

      // The parts in another order (as a glob or a download may list them): the same report.
      const shuffled = await job(MERGE(BASE, ['part-2.json', 'part-0.json', 'part-1.json']), {
        ...(await checkout()),
        ...partFiles(m),
      });
      expect(shuffled.code, explain(shuffled)).toBe(one.run.code);
      expect(withoutTiming(shuffled.read('merged.json'))).toEqual(withoutTiming(one.text));
    },
    TIMEOUT * 3,
  );

  it(
    'pull-request readings: the answer moves past the planned widths, merge runs the rest and fails as check does',
    async () => {
      const width = await baselineWidth();
      const one = await oneMachine(PR);
      expect(one.run.code, explain(one.run)).toBe(1);
      expect(one.report.verdict).toBe('fail');
      expect(one.report.baseline?.width).toBe(width);
      expect(one.report.width!).toBeGreaterThan(one.report.gate!.maxWidth!);

      const m = await matrix(PR, 3);
      expectMatrixShape(m, 3, one.report.data.fingerprint);
      // The same settings as the base config: the plan starts from the (base) baseline's width.
      expect(m.plan.start).toEqual({ from: 'baseline', width });
      const planned = plannedWidths(m.plan);
      expect(planned).toEqual([width - 1, width]);
      expect(one.report.width!).toBeGreaterThan(Math.max(...planned));

      const merge = await job(MERGE(PR, ['part-0.json', 'part-1.json', 'part-2.json']), {
        ...(await checkout()),
        ...partFiles(m),
      });
      expect(merge.code, explain(merge)).toBe(1);
      expect(merge.created).toEqual(['merged.json']);
      expect(withoutTiming(merge.read('merged.json'))).toEqual(withoutTiming(one.text));
      expectMergedFrom(merge, m);
      // The merge says which widths it trained itself: above the plan's, up to the answer.
      const local =
        /merge: ran here what the parts did not hold: \d+ growth trainings the plan did not cover \(widths? ([\d, ]+)\)/.exec(
          merge.stderr,
        );
      expect(local, merge.stderr).not.toBeNull();
      const ranHere = local![1].split(', ').map(Number);
      expect(Math.min(...ranHere)).toBeGreaterThan(Math.max(...planned));
      expect(ranHere).toContain(one.report.width);
      expect(merge.stderr).toContain(
        `Needs ${one.report.width} hidden neurons; the device budget is ${one.report.gate!.maxWidth}.`,
      );
    },
    TIMEOUT * 3,
  );

  it('merge refuses a missing part, naming the shard that is missing', async () => {
    const m = await matrix(BASE, 3);
    const run = await job(MERGE(BASE, ['part-0.json', 'part-1.json']), { ...(await checkout()), ...partFiles(m) });
    expectRefusal(run, 'the part of shard 2 of 3 is missing', ['parts given: 0, 1']);
  });

  it('merge refuses a shard given twice', async () => {
    const m = await matrix(BASE, 3);
    const files = { ...(await checkout()), ...partFiles(m), 'again/part-1.json': m.parts[1] };
    const run = await job(MERGE(BASE, ['part-0.json', 'part-1.json', 'again/part-1.json', 'part-2.json']), files);
    expectRefusal(run, 'again/part-1.json and part-1.json are both shard 1', []);
  });

  it('merge refuses a part computed on other data: a pull-request shard among the base parts', async () => {
    const base = await matrix(BASE, 3);
    const pr = await matrix(PR, 3);
    const prPart = JSON.parse(pr.parts[2]) as PartDocument;
    // Honest premise: the two parts really come from different data.
    expect(prPart.data.fingerprint).not.toBe(base.plan.data.fingerprint);
    const run = await job(MERGE(BASE, ['part-0.json', 'part-1.json', 'pr-part-2.json']), {
      ...(await checkout()),
      ...partFiles(base),
      'pr-part-2.json': pr.parts[2],
    });
    expectRefusal(run, 'pr-part-2.json: computed on other data', [
      `data fingerprint ${short(prPart.data.fingerprint)} in the part, ${short(base.plan.data.fingerprint)} here`,
    ]);
  });

  it('merge refuses parts computed before the data file changed', async () => {
    const m = await matrix(BASE, 3);
    const files = await checkout();
    // One reading edited between the shards and the merge: a value of its second data row.
    const [header, first, second, ...rest] = files['readings.csv'].split('\n');
    const edited = second.replace(/,(\d+\.\d+),/, (_, v: string) => `,${(Number(v) + 0.5).toFixed(3)},`);
    expect(edited).not.toBe(second);
    const changed = { ...files, 'readings.csv': [header, first, edited, ...rest].join('\n') };
    // The data the merge sees now: its own fingerprint, from a one-machine check of the edited checkout.
    const now = (await oneMachine(BASE, changed)).report.data.fingerprint;
    expect(now).not.toBe(m.plan.data.fingerprint);
    const run = await job(MERGE(BASE, ['part-0.json', 'part-1.json', 'part-2.json']), { ...changed, ...partFiles(m) });
    expectRefusal(run, 'part-0.json: computed on other data', [
      `data fingerprint ${short(m.plan.data.fingerprint)} in the part, ${short(now)} here`,
    ]);
  });

  it('merge refuses a part of another plan: one from a plan of 2 shards', async () => {
    const three = await matrix(BASE, 3);
    const two = await matrix(BASE, 2);
    expect(two.plan.id).not.toBe(three.plan.id);
    const run = await job(MERGE(BASE, ['part-0.json', 'part-1.json', 'two-part-1.json']), {
      ...(await checkout()),
      ...partFiles(three),
      'two-part-1.json': two.parts[1],
    });
    expectRefusal(run, 'two-part-1.json: belongs to another plan', [
      `plan ${short(two.plan.id)} of 2 shards; this run's plan is ${short(three.plan.id)} of 3`,
    ]);
  });

  it('merge refuses a part of another plan: one from a plan made before the baseline existed', async () => {
    const withBaseline = await matrix(BASE, 3);
    // The same checkout before the baseline was committed: the plan starts from min-width.
    const before = await cached('no-baseline plan', async () => {
      const planRun = await job(['plan', '--config', BASE, '--shards', '3', '--out', 'plan.json'], DEMO);
      expect(planRun.code, explain(planRun)).toBe(0);
      const planText = planRun.read('plan.json');
      const shard = await job(
        ['shard', '--config', BASE, '--plan', 'plan.json', '--index', '0', '--out', 'part-0.json', '--workers', '1'],
        { ...DEMO, 'plan.json': planText },
      );
      expect(shard.code, explain(shard)).toBe(0);
      return { plan: JSON.parse(planText) as PlanDocument, part: shard.read('part-0.json') };
    });
    expect(before.plan.start.from).toBe('min-width');
    expect(before.plan.shards).toHaveLength(3);
    expect(before.plan.id).not.toBe(withBaseline.plan.id);
    // Same shard count, same data and settings: only the plan id tells them apart.
    const run = await job(MERGE(BASE, ['old-part-0.json', 'part-1.json', 'part-2.json']), {
      ...(await checkout()),
      ...partFiles(withBaseline),
      'old-part-0.json': before.part,
    });
    expectRefusal(run, 'old-part-0.json: belongs to another plan', [
      `plan ${short(before.plan.id)} of 3 shards; this run's plan is ${short(withBaseline.plan.id)} of 3`,
    ]);
  });

  it('merge refuses a part that is not JSON, at its line and column', async () => {
    const m = await matrix(BASE, 3);
    // A part cut short, as an interrupted upload leaves it: the JSON ends inside its object.
    const truncated = m.parts[2].slice(0, Math.floor(m.parts[2].length / 2));
    const line = truncated.split('\n').length;
    const column = truncated.length - truncated.lastIndexOf('\n');
    const run = await job(MERGE(BASE, ['part-0.json', 'part-1.json', 'part-2.json']), {
      ...(await checkout()),
      ...partFiles(m),
      'part-2.json': truncated,
    });
    expectRefusal(run, `part-2.json:${line}:${column}: the part is not valid JSON`, []);
  });

  it('shard refuses a plan made for other data', async () => {
    const pr = await matrix(PR, 3);
    const run = await job(
      ['shard', '--config', BASE, '--plan', 'pr-plan.json', '--index', '0', '--out', 'part-0.json', '--workers', '1'],
      { ...(await checkout()), 'pr-plan.json': pr.planText },
    );
    expectRefusal(run, 'pr-plan.json: was made for other data than this checkout holds', []);
  });

  it('shard refuses a plan that is not JSON, at its file, line and column', async () => {
    const m = await matrix(BASE, 3);
    // A stray token on the line of the row count: `"rows": 1200` becomes `"rows": 1200 00`.
    const lines = m.planText.split('\n');
    const at = lines.findIndex((l) => /^\s*"rows": \d+$/.test(l));
    expect(at).toBeGreaterThan(0);
    const column = lines[at].length + 2;
    lines[at] += ' 00';
    const run = await job(
      ['shard', '--config', BASE, '--plan', 'plan.json', '--index', '0', '--out', 'part-0.json', '--workers', '1'],
      { ...(await checkout()), 'plan.json': lines.join('\n') },
    );
    expectRefusal(run, `plan.json:${at + 1}:${column}: the plan is not valid JSON`, []);
  });

  it('merge names the stray part of another plan even when it comes first', async () => {
    const three = await matrix(BASE, 3);
    const two = await matrix(BASE, 2);
    const run = await job(MERGE(BASE, ['two-part-1.json', 'part-0.json', 'part-1.json', 'part-2.json']), {
      ...(await checkout()),
      ...partFiles(three),
      'two-part-1.json': two.parts[1],
    });
    expectRefusal(run, 'two-part-1.json: belongs to another plan', [`this run's plan is ${short(three.plan.id)} of 3`]);
  });

  it('no output may be written over a file the run reads (the data, the config, the baseline, the plan, a part)', async () => {
    const files = await checkout();
    const cases: [string[], string, string][] = [
      [['plan', '--config', BASE, '--shards', '2', '--out', 'readings.csv'], 'readings.csv', 'data file'],
      [['check', '--config', BASE, '--report', BASE], BASE, 'config file'],
      [['check', '--config', BASE, '--model', BASELINE], BASELINE, 'baseline file'],
      [['shard', '--config', BASE, '--plan', 'p.json', '--index', '0', '--out', 'p.json'], 'p.json', 'plan file'],
      [['merge', '--config', BASE, '--report', 'part-0.json', 'part-0.json'], 'part-0.json', 'part file'],
    ];
    for (const [args, file, what] of cases) {
      const before: Record<string, string> = { ...files, 'p.json': '{}', 'part-0.json': '{}' };
      const run = await job(args, before);
      const kind =
        args[0] === 'plan' ? 'plan' : args[0] === 'shard' ? 'part' : args.includes('--model') ? 'model' : 'report';
      expectRefusal(run, `${kind} file ${file} is the ${what} this run reads`, []);
      expect(run.read(file)).toBe(before[file]);
    }
  });
});
