// End-to-end: data that cannot fit in the process's memory, through the BUILT command line
// under a lowered address-space limit (`ulimit -v`, as on a small runner or in a container).
// The reader estimates what the whole file will need before the column stores grow, and stops
// with one clear message (how much, the limit, what to do) instead of dying of a V8 fatal
// out-of-memory error or an internal error after minutes of reading.
//
// The limit is set relative to what a bare Node process already maps, so the test does not
// depend on the Node version; the data are invented (xorshift numbers), not measurements.
import { spawnSync } from 'node:child_process';
import { closeSync, openSync, writeFileSync, writeSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, describe, expect, test } from 'vitest';
import { expectOneUserError, makeTempDir, removeCliTempDirs, runCli } from '../helpers/cli.js';

afterAll(removeCliTempDirs);

/** Address space a bare `node` maps at start (kB), from /proc. */
function bareNodeKiB(): number {
  const out = spawnSync(
    process.execPath,
    ['-e', 'process.stdout.write(require("fs").readFileSync("/proc/self/status", "utf8"))'],
    {
      encoding: 'utf8',
    },
  );
  const m = /^VmSize:\s+(\d+) kB/m.exec(out.stdout);
  if (m === null) throw new Error(`no VmSize in /proc/self/status: ${out.stdout}${out.stderr}`);
  return Number(m[1]);
}

/**
 * Room above a bare Node's address space: enough for the bundle (which maps about 280 MiB more
 * than a bare Node by the time it reads data) to run a small check, far too little for a
 * million rows. Under this limit the code before the estimate died of a V8 fatal
 * out-of-memory error (exit 134) after 8 s of reading; with it, exit 2 in 0.3 s.
 */
const ROOM_KIB = 480 * 1024;

/** A shell wrapper that runs node under `ulimit -v`. */
function limitedNode(dir: string, limitKiB: number): string {
  const path = join(dir, 'node-limited.sh');
  writeFileSync(path, `#!/bin/sh\nulimit -v ${limitKiB}\nexec "${process.execPath}" "$@"\n`, { mode: 0o755 });
  return path;
}

/** `rows` rows of 18 numbers, a site and a label (the shape scripts/measure-load.mjs uses). */
function writeReadings(path: string, rows: number): void {
  let state = 0x9e3779b9;
  const next = (): number => {
    state ^= state << 13;
    state ^= state >>> 17;
    state ^= state << 5;
    return (state >>> 0) / 4294967296;
  };
  const fd = openSync(path, 'w');
  writeSync(fd, `${[...Array.from({ length: 18 }, (_, i) => `f${i + 1}`), 'site', 'label'].join(',')}\n`);
  const sites = ['north', 'south', 'east', 'west', 'depot'];
  let chunk = '';
  for (let r = 0; r < rows; r++) {
    for (let c = 0; c < 18; c++) chunk += `${(next() * 200 - 100).toFixed(4)},`;
    chunk += `${sites[Math.floor(next() * 5)]},${next() < 0.5 ? 'ok' : 'fault'}\n`;
    if (chunk.length > 1 << 20) {
      writeSync(fd, chunk);
      chunk = '';
    }
  }
  writeSync(fd, chunk);
  closeSync(fd);
}

const CONFIG = [
  'data:',
  '  path: readings.csv',
  '  target: label',
  'target:',
  '  threshold: 0.5',
  'search:',
  '  max-width: 1',
  '  restarts: 1',
  '  required: 1',
  '  max-epochs: 10',
  '  workers: 1',
  '',
].join('\n');

describe.runIf(process.platform === 'linux')('data too large for the memory limit', () => {
  const node = limitedNode(makeTempDir(), bareNodeKiB() + ROOM_KIB);

  test('a million rows under a small address-space limit: exit 2 with how much, the limit and what to do', async () => {
    const run = await runCli(['check', '--report', 'report.json'], {
      files: { 'neuron-budget.yml': CONFIG },
      setup: (dir) => writeReadings(join(dir, 'readings.csv'), 1_000_000),
      node,
    });
    expectOneUserError(run, 'readings.csv: ', [
      'loading about 1,0', // the projection from the first rows: about a million
      'rows needs about',
      'but this process has room for about',
      'the address-space limit (ulimit -v)',
      'v8 heap_size_limit',
      'Commit fewer rows',
      'NODE_OPTIONS=--max-old-space-size=',
      'bigger runner',
    ]);
    expect(run.created).toEqual([]);
  });

  test('under the same limit, a small file loads and the check runs (the limit alone is not the problem)', async () => {
    const run = await runCli(['check', '--report', 'report.json'], {
      files: { 'neuron-budget.yml': CONFIG },
      setup: (dir) => writeReadings(join(dir, 'readings.csv'), 2_000),
      node,
    });
    expect(run.stderr).not.toContain('error:');
    expect([0, 1], run.stderr).toContain(run.code);
    expect(JSON.parse(run.read('report.json')).data.rows).toBe(2_000);
  });
});
