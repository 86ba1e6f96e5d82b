#!/usr/bin/env node
// Measures the data stage on a large file: writes a 1,000,000-row × 20-column CSV of
// synthetic numbers to a temp folder, loads it through loadData in a fresh process and
// prints the peak resident memory and the time. The goal: well under 1.5 GB.
//
//   node scripts/measure-load.mjs [rows]
//
// Compiles the TypeScript with `tsc` into .build/ first (gitignored), so it measures the
// current source.
import { execFileSync, spawnSync } from 'node:child_process';
import { createWriteStream, existsSync, mkdtempSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { once } from 'node:events';
import { fileURLToPath, pathToFileURL } from 'node:url';

const repo = resolve(fileURLToPath(import.meta.url), '..', '..');
const entry = join(repo, '.build', 'src', 'data', 'index.js');

if (process.argv[2] === '--child') {
  const [, , , csv, seconds0] = process.argv;
  const { loadData } = await import(pathToFileURL(entry).href);
  const root = resolve(csv, '..');
  const config = {
    file: join(root, 'neuron-budget.yml'),
    root,
    data: {
      path: csv,
      pathAsWritten: 'big.csv',
      target: 'label',
      features: null,
      ignore: [],
      task: 'auto',
      validation: 0.25,
      delimiter: ',',
      maxCategories: 20,
      missing: 'error',
    },
    target: { metric: 'accuracy', threshold: 0.95 },
    search: { seed: 1 },
    gate: {},
  };
  const start = process.hrtime.bigint();
  const data = await loadData(config);
  const seconds = Number(process.hrtime.bigint() - start) / 1e9;
  process.stdout.write(
    JSON.stringify({
      seconds,
      maxRssMiB: process.resourceUsage().maxRSS / 1024,
      rows: data.rows,
      inputs: data.dataset.inputs,
      trainRows: data.dataset.trainRows,
      validationRows: data.dataset.validationRows,
      fingerprint: data.fingerprint,
      startupNote: seconds0,
    }),
  );
  process.exit(0);
}

const rows = Number(process.argv[2] ?? 1_000_000);
{
  console.error('compiling TypeScript into .build/ ...');
  try {
    execFileSync(
      process.execPath,
      [join(repo, 'node_modules/typescript/bin/tsc'), '-p', repo, '--outDir', join(repo, '.build')],
      {
        stdio: 'inherit',
      },
    );
  } catch {
    // tsc exits non-zero on type errors elsewhere in the tree but still emits JavaScript.
  }
  if (!existsSync(entry)) throw new Error(`${entry} was not produced`);
}

// Synthetic data, no Math.random: a 32-bit xorshift stream with a fixed seed.
let state = 0x9e3779b9;
const next = () => {
  state ^= state << 13;
  state ^= state >>> 17;
  state ^= state << 5;
  return (state >>> 0) / 4294967296;
};
const dir = mkdtempSync(join(tmpdir(), 'nb-measure-'));
const csv = join(dir, 'big.csv');
const numeric = 18;
const header = [...Array.from({ length: numeric }, (_, i) => `f${i + 1}`), 'site', 'label'];
const out = createWriteStream(csv);
out.write(header.join(',') + '\n');
const sites = ['north', 'south', 'east', 'west', 'depot'];
let chunk = '';
for (let r = 0; r < rows; r++) {
  let line = '';
  for (let c = 0; c < numeric; c++) line += (next() * 200 - 100).toFixed(4) + ',';
  line += sites[Math.floor(next() * sites.length)] + ',' + (next() < 0.5 ? 'ok' : 'fault') + '\n';
  chunk += line;
  if (chunk.length > 1 << 20) {
    if (!out.write(chunk)) await once(out, 'drain');
    chunk = '';
  }
}
out.end(chunk);
await once(out, 'finish');
const bytes = statSync(csv).size;

const child = spawnSync(process.execPath, [fileURLToPath(import.meta.url), '--child', csv, '0'], {
  encoding: 'utf8',
  maxBuffer: 1 << 20,
});
rmSync(dir, { recursive: true, force: true });
if (child.status !== 0) {
  console.error(child.stderr);
  process.exit(1);
}
const result = JSON.parse(child.stdout);
console.log(`file:        ${rows} rows × ${header.length} columns, ${(bytes / 2 ** 20).toFixed(1)} MiB`);
console.log(
  `loaded:      ${result.rows} rows → ${result.inputs} inputs; ${result.trainRows} training, ${result.validationRows} validation rows`,
);
console.log(`time:        ${result.seconds.toFixed(2)} s (read, check, split, encode, fingerprint, profile)`);
console.log(`peak memory: ${result.maxRssMiB.toFixed(0)} MiB resident (limit 1536 MiB)`);
console.log(`fingerprint: ${result.fingerprint}`);
process.exit(result.maxRssMiB < 1536 ? 0 : 1);
