// Optimiser comparison (bench/optim-cases.ts): evaluations to 100% training accuracy for L-BFGS
// and iRprop+ on XOR, 4-bit parity and two spirals, from the same starts. Transpiles the cases
// and src/nn to plain JavaScript under node_modules/.cache (as bench/engine.mjs does) and runs
// them. Usage: node bench/optim.mjs [--runs=N]   (wrap in flock /tmp/nb-heavy.lock on shared machines)
import { mkdirSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { dirname, join, relative } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import ts from 'typescript';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');
const out = join(root, 'node_modules', '.cache', 'neuron-budget-bench-optim');
rmSync(out, { recursive: true, force: true });
const files = [join(root, 'bench', 'optim-cases.ts')];
for (const e of readdirSync(join(root, 'src', 'nn'), { withFileTypes: true, recursive: true })) {
  if (e.isFile() && e.name.endsWith('.ts')) files.push(join(e.parentPath ?? e.path, e.name));
}
for (const f of files) {
  const target = join(out, relative(root, f)).replace(/\.ts$/, '.js');
  mkdirSync(dirname(target), { recursive: true });
  const js = ts.transpileModule(readFileSync(f, 'utf8'), {
    compilerOptions: { module: ts.ModuleKind.ES2022, target: ts.ScriptTarget.ES2022 },
  }).outputText;
  writeFileSync(target, js);
}
writeFileSync(join(out, 'package.json'), '{"type":"module"}');
const { OPTIM_CASES, evaluationsToTarget } = await import(pathToFileURL(join(out, 'bench', 'optim-cases.js')).href);

const runsArg = process.argv.find((a) => a.startsWith('--runs='));
const runs = runsArg ? Number(runsArg.slice(7)) : 20;
const choices = [
  ['L-BFGS (exact gradient)', { kind: 'lbfgs' }],
  ['iRprop+', { kind: 'irprop+' }],
];
const pad = (s, n) => String(s).padEnd(n);
console.log(`${runs} runs per row (restarts 0..${runs - 1}); evaluations = full passes over the rows\n`);
console.log(
  pad('case', 24) +
    pad('optimiser', 34) +
    pad('solved', 9) +
    pad('median evals', 14) +
    pad('mean evals', 12) +
    'mean best acc',
);
for (const c of OPTIM_CASES) {
  for (const [label, choice] of choices) {
    const r = evaluationsToTarget(c, choice, runs);
    const e = r.evaluations;
    const median = e.length ? e[Math.floor((e.length - 1) / 2)] : '-';
    const mean = e.length ? (e.reduce((a, b) => a + b, 0) / e.length).toFixed(1) : '-';
    console.log(
      pad(c.name, 24) +
        pad(label, 34) +
        pad(`${r.solved}/${r.runs}`, 9) +
        pad(median, 14) +
        pad(mean, 12) +
        r.meanBestAccuracy.toFixed(3),
    );
  }
}
