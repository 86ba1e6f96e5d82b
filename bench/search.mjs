// Search benchmark (prints figures; not a test): trainings and seconds of the whole check for
// the demo, its pull-request variant, the teacher-network case and a generated large case, three
// ways: the full scan (no baseline: every width from min-width), the start from the baseline,
// and plan → 3 shards → merge (the slowest shard is the matrix's wall time; the sum is what
// the runners pay). Every stage runs the built command line as a process, one at a time, with
// the same worker count, and the merged report must equal the one-machine report outside timing.
// usage: npm run bench:search [-- demo,demo-pr,teacher,large [workers]]
import { execFileSync, spawnSync } from 'node:child_process';
import { cpSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { availableParallelism, tmpdir } from 'node:os';
import { join } from 'node:path';
import { performance } from 'node:perf_hooks';
import { isDeepStrictEqual } from 'node:util';

const out = mkdtempSync(join(tmpdir(), 'nb-bench-search-'));
const ncc = (entry, folder) => {
  execFileSync(
    process.execPath,
    [
      'node_modules/@vercel/ncc/dist/ncc/cli.js',
      'build',
      entry,
      '-o',
      folder,
      '--quiet',
      '--transpile-only',
      '--target',
      'es2022',
    ],
    { stdio: 'inherit' },
  );
  writeFileSync(join(folder, 'package.json'), '{"type":"module"}\n');
  return join(folder, 'index.js');
};

try {
  const cli = ncc('src/cli.ts', join(out, 'cli'));
  const dataGen = ncc('bench/search-data.entry.ts', join(out, 'data'));
  const ws = join(out, 'ws');
  cpSync('examples/pump-vibration', ws, { recursive: true });
  execFileSync(process.execPath, [dataGen, ws]);
  const workers = process.argv[3] ?? '2';

  /** Runs the CLI in the workspace; returns wall seconds and the exit code. */
  const run = (args) => {
    const t0 = performance.now();
    const extra = args[0] === 'plan' ? [] : ['--workers', workers];
    const r = spawnSync(process.execPath, [cli, ...args, ...extra], { cwd: ws, encoding: 'utf8' });
    const seconds = (performance.now() - t0) / 1000;
    if (r.status !== 0 && r.status !== 1) throw new Error(`${args.join(' ')} failed (${r.status}):\n${r.stderr}`);
    return { seconds, code: r.status, stdout: r.stdout };
  };
  const report = (file) => JSON.parse(readFileSync(join(ws, file), 'utf8'));
  const withoutTiming = (r) => ({ ...r, timing: undefined });

  // Each case: the config checked, and the config whose data the baseline was recorded on.
  const cases = {
    demo: { config: 'neuron-budget.yml', base: 'neuron-budget.yml' },
    'demo-pr': { config: 'neuron-budget.pr.yml', base: 'neuron-budget.yml' },
    teacher: { config: 'teacher.yml', base: 'teacher.yml' },
    large: { config: 'large.yml', base: 'large.yml' },
  };
  const names = (process.argv[2] ?? Object.keys(cases).join(',')).split(',');
  console.log(
    `search benchmark — node ${process.version}, ${availableParallelism()} logical cores, ${workers} workers per process`,
  );
  console.log(
    'seconds: wall clock of the whole command (start-up, data loading, search, report); trainings: search.trainings',
  );
  const rows = [];
  for (const name of names) {
    const c = cases[name];
    if (!c) throw new Error(`unknown case ${name}; cases: ${Object.keys(cases).join(', ')}`);
    const baseline = `${name}.baseline.json`;
    rmSync(join(ws, baseline), { force: true });
    const full = run(['check', '--config', c.config, '--baseline', baseline, '--report', 'full.json']);
    const fullR = report('full.json');
    run(['baseline', '--config', c.base, '--baseline', baseline]);
    const start = run(['check', '--config', c.config, '--baseline', baseline, '--report', 'start.json']);
    const startR = report('start.json');
    const plan = run(['plan', '--config', c.config, '--baseline', baseline, '--shards', '3', '--out', 'plan.json']);
    const shards = JSON.parse(plan.stdout).map((i) =>
      run([
        'shard',
        '--config',
        c.config,
        '--baseline',
        baseline,
        '--plan',
        'plan.json',
        '--index',
        String(i),
        '--out',
        `part-${i}.json`,
      ]),
    );
    const parts = JSON.parse(plan.stdout).map((i) => `part-${i}.json`);
    const merge = run(['merge', '--config', c.config, '--baseline', baseline, '--report', 'merged.json', ...parts]);
    const mergedR = report('merged.json');
    const shardTrainings = parts
      .map((p) => report(p))
      .reduce((n, p) => n + p.results.length + p.pruned.reduce((m, q) => m + q.trainings, 0), 0);
    const same = isDeepStrictEqual(withoutTiming(mergedR), withoutTiming(startR)) && merge.code === start.code;
    const slowest = Math.max(...shards.map((s) => s.seconds));
    const sum = shards.reduce((n, s) => n + s.seconds, 0);
    rows.push({
      name,
      width: `${fullR.width ?? '-'} / ${startR.width ?? '-'} / ${mergedR.width ?? '-'}`,
      verdict: startR.verdict,
      full: `${fullR.search.trainings} tr, ${full.seconds.toFixed(1)} s`,
      start: `${startR.search.trainings} tr, ${start.seconds.toFixed(1)} s`,
      ratio: `${(fullR.search.trainings / startR.search.trainings).toFixed(1)}×`,
      shards: `${shardTrainings} tr; slowest ${slowest.toFixed(1)} s, sum ${sum.toFixed(1)} s`,
      merge: `${merge.seconds.toFixed(1)} s (plan ${plan.seconds.toFixed(1)} s)`,
      matrix: `${(plan.seconds + slowest + merge.seconds).toFixed(1)} s`,
      same: same ? 'yes' : 'NO (a bug)',
    });
  }
  const head = {
    name: 'case',
    width: 'width full/start/merged',
    verdict: 'verdict',
    full: 'full scan',
    start: 'from baseline',
    ratio: 'fewer',
    shards: '3 shards (trainings run on shards)',
    merge: 'merge',
    matrix: 'plan+slowest+merge',
    same: 'merged = one machine',
  };
  const keys = Object.keys(head);
  const widths = keys.map((k) => Math.max(head[k].length, ...rows.map((r) => String(r[k]).length)));
  const line = (r) => `| ${keys.map((k, i) => String(r[k]).padEnd(widths[i])).join(' | ')} |`;
  console.log(line(head));
  console.log(`|${widths.map((w) => '-'.repeat(w + 2)).join('|')}|`);
  for (const r of rows) console.log(line(r));
} finally {
  rmSync(out, { recursive: true, force: true });
}
