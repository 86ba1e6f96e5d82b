// Runs the training-engine benchmark (bench/engine.ts) without a build step: transpiles it and
// src/nn to plain JavaScript under node_modules/.cache (so package imports still resolve) and
// runs it. Usage: node bench/engine.mjs [--quick] [--only=abcd]
import { mkdirSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { dirname, join, relative } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import ts from 'typescript';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');
const out = join(root, 'node_modules', '.cache', 'neuron-budget-bench');
rmSync(out, { recursive: true, force: true });

const files = [join(root, 'bench', 'engine.ts')];
const walk = (dir) => {
  for (const e of readdirSync(dir, { withFileTypes: true })) {
    const p = join(dir, e.name);
    if (e.isDirectory()) walk(p);
    else if (e.name.endsWith('.ts')) files.push(p);
  }
};
walk(join(root, 'src', 'nn'));
for (const f of files) {
  const target = join(out, relative(root, f)).replace(/\.ts$/, '.js');
  mkdirSync(dirname(target), { recursive: true });
  const js = ts.transpileModule(readFileSync(f, 'utf8'), {
    compilerOptions: { module: ts.ModuleKind.ES2022, target: ts.ScriptTarget.ES2022 },
  }).outputText;
  writeFileSync(target, js);
}
writeFileSync(join(out, 'package.json'), '{"type":"module"}');
await import(pathToFileURL(join(out, 'bench', 'engine.js')).href);
