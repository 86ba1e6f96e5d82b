// Bundles the action (dist/index.js) and the command line (dist/cli/index.js) with ncc.
// Each bundle also serves as its own worker-thread entry, since ncc does not follow `new Worker(path)`.
import { execFileSync } from 'node:child_process';
import { rmSync } from 'node:fs';

const ncc = 'node_modules/@vercel/ncc/dist/ncc/cli.js';
rmSync('dist', { recursive: true, force: true });
for (const [entry, out] of [
  ['src/index.ts', 'dist'],
  ['src/cli.ts', 'dist/cli'],
]) {
  execFileSync(process.execPath, [ncc, 'build', entry, '-o', out, '--quiet', '--target', 'es2022'], {
    stdio: 'inherit',
  });
}
