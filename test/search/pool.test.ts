/**
 * The worker pool runs only from a bundle (a worker cannot load .ts), so this test bundles a
 * small entry with ncc, as the product's bundles are built, and runs it as a runner would.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';

let bundle = '';

beforeAll(() => {
  const out = mkdtempSync(join(tmpdir(), 'nb-pool-'));
  execFileSync(
    process.execPath,
    [
      'node_modules/@vercel/ncc/dist/ncc/cli.js',
      'build',
      'test/search/pool-entry.ts',
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
  bundle = join(out, 'index.js');
}, 120_000);

function run(name: string, workers: number): string {
  // Run from the repository root: the demo's config paths are relative to it.
  return execFileSync(process.execPath, [bundle, name, String(workers)], {
    encoding: 'utf8',
    stdio: ['ignore', 'pipe', 'pipe'],
  });
}

describe('worker pool: the same result on 1, 2 and 4 threads', () => {
  // demo: the invented pump-vibration example through the real config and data pipeline.
  for (const name of ['demo', 'iris', 'parity4', 'parity3-inplace']) {
    it(
      name,
      () => {
        const one = run(name, 1);
        const parsed = JSON.parse(one) as { outcome: string; width: number };
        expect(parsed.outcome).toBe('found');
        expect(run(name, 1)).toBe(one);
        expect(run(name, 2)).toBe(one);
        expect(run(name, 4)).toBe(one);
      },
      300_000,
    );
  }
});
