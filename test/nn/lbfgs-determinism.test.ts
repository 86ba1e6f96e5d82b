/**
 * L-BFGS gives bit-identical parameters under Node 20 and Node 24: the script runs it on small
 * networks (reference kernel) and prints a sha256 of each result, under this Node and under the
 * Node 24 binary named by NEURON_BUDGET_NODE24 (see test/setup/node24.ts).
 */
import { execFileSync } from 'node:child_process';
import { existsSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join, relative } from 'node:path';
import ts from 'typescript';
import { afterAll, describe, expect, it } from 'vitest';

const root = join(import.meta.dirname, '..', '..');
const work = mkdtempSync(join(tmpdir(), 'nb-lbfgs-determinism-'));
afterAll(() => rmSync(work, { recursive: true, force: true }));

/** Transpiles src/nn and the script to plain JavaScript (type-only imports vanish). */
function build(): string {
  const files = [join(root, 'test', 'nn', 'lbfgs-determinism-script.ts')];
  const walk = (dir: string) => {
    for (const e of readdirSync(dir, { withFileTypes: true })) {
      const p = join(dir, e.name);
      if (e.isDirectory()) walk(p);
      else if (e.name.endsWith('.ts')) files.push(p);
    }
  };
  walk(join(root, 'src', 'nn'));
  for (const f of files) {
    const out = join(work, relative(root, f)).replace(/\.ts$/, '.js');
    mkdirSync(dirname(out), { recursive: true });
    const js = ts.transpileModule(readFileSync(f, 'utf8'), {
      compilerOptions: { module: ts.ModuleKind.ES2022, target: ts.ScriptTarget.ES2022 },
    }).outputText;
    writeFileSync(out, js);
  }
  writeFileSync(join(work, 'package.json'), '{"type":"module"}');
  return join(work, 'test', 'nn', 'lbfgs-determinism-script.js');
}

describe('bit-identical L-BFGS across Node versions', () => {
  it('Node 20 and Node 24 give the same parameters for the same starts', () => {
    const node24 = process.env.NEURON_BUDGET_NODE24;
    if (!node24 || !existsSync(node24)) {
      throw new Error('NEURON_BUDGET_NODE24 must name a Node 24 binary (see test/setup/node24.ts)');
    }
    expect(execFileSync(node24, ['--version'], { encoding: 'utf8' }).startsWith('v24.')).toBe(true);
    const script = build();
    const here = execFileSync(process.execPath, [script], { encoding: 'utf8', timeout: 120_000 });
    const there = execFileSync(node24, [script], { encoding: 'utf8', timeout: 120_000 });
    expect(here.trim().split('\n')).toHaveLength(9);
    expect(there).toBe(here);
  });
});
