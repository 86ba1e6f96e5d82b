// Bundles a benchmark entry (TypeScript, importing src/ and test/helpers/) with ncc into a
// temporary folder and runs it with the given arguments, its output going straight to ours.
// Used by bench/optim.mjs and bench/no-luck.mjs; the bundle is removed afterwards.
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

export function runBundled(entry, args) {
  const out = mkdtempSync(join(tmpdir(), 'nb-bench-'));
  try {
    execFileSync(
      process.execPath,
      [
        'node_modules/@vercel/ncc/dist/ncc/cli.js',
        'build',
        entry,
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
    execFileSync(process.execPath, [join(out, 'index.js'), ...args], { stdio: 'inherit' });
  } finally {
    rmSync(out, { recursive: true, force: true });
  }
}
