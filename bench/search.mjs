// Search benchmark (prints figures; not a test): time of the whole growth-and-prune search on
// the demo data and on a generated 100,000-row × 30-input dataset, with 1 and 2 worker threads.
// The worker pool needs a bundle, so the entry is bundled with ncc into a temporary folder first.
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { availableParallelism, tmpdir } from 'node:os';
import { join } from 'node:path';

const out = mkdtempSync(join(tmpdir(), 'nb-bench-search-'));
try {
  execFileSync(
    process.execPath,
    [
      'node_modules/@vercel/ncc/dist/ncc/cli.js',
      'build',
      'bench/search.entry.ts',
      '-o',
      out,
      '--quiet',
      '--transpile-only',
      '--target',
      'es2022',
    ],
    { stdio: 'inherit' },
  );
  writeFileSync(join(out, 'package.json'), '{"type":"module"}\n');
  const bundle = join(out, 'index.js');
  const cases = (process.argv[2] ?? 'demo,demo-pr,generated').split(',');
  console.log(`search benchmark — node ${process.version}, ${availableParallelism()} logical cores`);
  console.log('(a speed-up needs idle cores: compare the load average printed per run with the core count)');
  for (const name of cases) {
    const runs = [];
    for (const workers of [1, 2]) {
      const line = execFileSync(process.execPath, [bundle, name, String(workers)], { encoding: 'utf8' }).trim();
      const f = JSON.parse(line);
      if (f.skipped) {
        console.log(`${name}: skipped (${f.skipped})`);
        break;
      }
      runs.push(f);
      console.log(
        `${name.padEnd(9)} ${String(f.rows).padStart(7)} rows × ${String(f.inputs).padStart(2)} inputs  ` +
          `workers ${workers}  ${f.seconds.toFixed(2).padStart(7)} s  (growth ${f.growthSeconds.toFixed(2)} s, prune ${f.pruneSeconds.toFixed(2)} s)  ` +
          `${f.outcome} width ${f.width} (grown ${f.grownWidth}), ${f.trainings} trainings, per width ${f.widths}  ` +
          `[CPU ${f.cpuSeconds.toFixed(1)} s = ${(f.cpuSeconds / f.seconds).toFixed(2)} cores busy; 1-min load average ${f.loadAverage.toFixed(1)}]`,
      );
    }
    if (runs.length === 2) {
      const same =
        runs[0].width === runs[1].width && runs[0].trainings === runs[1].trainings && runs[0].widths === runs[1].widths;
      console.log(
        `${name.padEnd(9)} speed-up 1 → 2 workers: ${(runs[0].seconds / runs[1].seconds).toFixed(2)}×${same ? '' : '  (RESULTS DIFFER: a bug)'}`,
      );
    }
  }
} finally {
  rmSync(out, { recursive: true, force: true });
}
