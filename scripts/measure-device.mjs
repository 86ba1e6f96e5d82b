#!/usr/bin/env node
// Measures what a witness-like network of the demo costs on a device and what int8 does to it:
// trains one network per demo data set with the engine (iRprop+, tanh, seed 1, restart 0, up to
// 1,200 epochs, stopping when the validation rows reach the demo's 0.95, as a search's training
// does), quantises it, exports it to C, compiles it with the system C compiler and scores every
// row through the float64 forward pass, the compiled float32 and int8 paths and the TypeScript
// int8 simulation.
//
//   node scripts/measure-device.mjs            (npm run measure:device)
//   node scripts/measure-device.mjs --search   the demo configs' own search and witness instead
//                                              (single-threaded; minutes)
//
// Compiles the TypeScript with `tsc` into .build/ first (gitignored). The demo data are invented.
import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { parse } from 'csv-parse/sync';

const repo = resolve(fileURLToPath(import.meta.url), '..', '..');
const build = join(repo, '.build', 'src');
console.error('compiling TypeScript into .build/ ...');
try {
  execFileSync(
    process.execPath,
    [join(repo, 'node_modules/typescript/bin/tsc'), '-p', repo, '--outDir', join(repo, '.build')],
    {
      stdio: 'inherit',
    },
  );
} catch {
  // tsc exits non-zero on type errors elsewhere in the tree but still emits JavaScript.
}
const load = (p) => import(pathToFileURL(join(build, p)).href);
const { loadData } = await load('data/index.js');
const { createTrainer, rngFor } = await load('nn/index.js');
const { modelDocument, predictRows } = await load('model/index.js');
const { exportC, floatLiteral, int8Forward, rawFeatureRows } = await load('device/index.js');
const { loadConfig } = await load('config/index.js');
const { runSearch } = await load('search/index.js');
const searchMode = process.argv.includes('--search');

const cc = ['gcc', 'cc'].find((c) => spawnSync('sh', ['-c', `command -v ${c}`]).status === 0) ?? null;
const demo = join(repo, 'examples', 'pump-vibration');

function config(file) {
  return {
    file: join(demo, 'neuron-budget.yml'),
    root: demo,
    data: {
      path: join(demo, file),
      pathAsWritten: file,
      target: 'condition',
      features: null,
      ignore: ['reading_id'],
      task: 'auto',
      validation: 0.25,
      delimiter: ',',
      maxCategories: 20,
      missing: 'error',
    },
    target: { metric: 'accuracy', threshold: 0.95 },
    search: { seed: 1 },
    gate: {},
  };
}

/** Runs the exported C on raw features; returns [float32 class, int8 class, int8 output bits] per row. */
function runC(files, raw, F) {
  const dir = mkdtempSync(join(tmpdir(), 'nb-measure-c-'));
  writeFileSync(join(dir, files.headerFile), files.header);
  writeFileSync(join(dir, files.sourceFile), files.source);
  writeFileSync(
    join(dir, 'main.c'),
    `#include <stdio.h>
#include <stdlib.h>
#include "m.h"
int main(void) {
  float f[M_FEATURES], o[M_OUTPUTS];
  char w[128];
  int i, k;
  for (;;) {
    for (i = 0; i < M_FEATURES; i++) {
      if (scanf("%127s", w) != 1) return 0;
      f[i] = strtof(w, NULL);
    }
    printf("%d", m_predict(f, o));
    printf(" %d", m_predict_int8(f, o));
    for (k = 0; k < M_OUTPUTS; k++) printf(" %a", (double)o[k]);
    printf("\\n");
  }
}
`,
  );
  const exe = join(dir, 'main');
  execFileSync(cc, ['-std=c99', '-Wall', '-Wextra', '-Werror', '-pedantic', '-O2', '-o', exe, 'main.c', 'm.c', '-lm'], {
    cwd: dir,
  });
  const lines = [];
  for (let p = 0; p < raw.length / F; p++)
    lines.push(Array.from(raw.subarray(p * F, (p + 1) * F), (v) => floatLiteral(v).slice(0, -1)).join(' '));
  return execFileSync(exe, { input: lines.join('\n') + '\n', maxBuffer: 1 << 26 })
    .toString()
    .trim()
    .split('\n')
    .map((l) => l.split(' '));
}

const hexBits = (h) => {
  const m = /^(-?)0x([0-9a-f]+)(?:\.([0-9a-f]*))?p([+-]\d+)$/.exec(h);
  const frac = m[3] ?? '';
  const v = parseInt(m[2] + frac, 16) * 2 ** (Number(m[4]) - 4 * frac.length) * (m[1] ? -1 : 1);
  return new Uint32Array(Float32Array.of(v).buffer)[0];
};

const results = [];
for (const [file, width0, yml] of [
  ['readings.csv', 3, 'neuron-budget.yml'],
  ['readings-pr.csv', 7, 'neuron-budget.pr.yml'],
]) {
  const loaded = await loadData(searchMode ? await loadConfig(join(demo, yml), repo) : config(file));
  const ds = loaded.dataset;
  let width = width0;
  const options = {
    activation: 'tanh',
    init: null,
    optimizer: 'irprop+',
    maxEpochs: 1200,
    checkEvery: 10,
    target: { metric: 'accuracy', threshold: 0.95 },
    stall: null,
  };
  let witness;
  let record = { epochs: null, stop: null };
  if (searchMode) {
    const cfg = await loadConfig(join(demo, yml), repo);
    const found = await runSearch(ds, { ...cfg.search, workers: 1 }, cfg.target);
    if (!found.witness) throw new Error(`${yml}: the search found no witness (${found.outcome})`);
    witness = found.witness;
    width = witness.network.width;
  } else {
    const trainer = createTrainer(ds, width, options, rngFor(1, width, 0));
    record = trainer.run(1200);
    witness = { restart: 0, seed: 1, grownWidth: width, network: trainer.snapshot(), metric: record.validationMetric };
  }
  const doc = modelDocument(witness, ds.encoding, options.target, { x: ds.xTrain, rows: ds.trainRows });
  const rows = parse(readFileSync(join(demo, file), 'utf8'), { columns: true, trim: true });
  const truth = rows.map((r) => r.condition);
  const classes = ds.encoding.target.classes;
  const raw = rawFeatureRows(ds.encoding, rows);
  const F = ds.encoding.features.length;
  const f64 = predictRows(doc, rows).map((p) => p.label);
  const i8 = int8Forward(doc.int8, raw, rows.length);
  const validation = new Set(loaded.splitRows.validation);
  const acc = (labels, only) => {
    let n = 0;
    let ok = 0;
    labels.forEach((l, p) => {
      if (only && !validation.has(p)) return;
      n++;
      if (l === truth[p]) ok++;
    });
    return ok / n;
  };
  const i8labels = Array.from(i8.classes, (c) => classes[c]);
  const entry = {
    data: file,
    source: searchMode
      ? `search witness (restart ${witness.restart}, grown at ${witness.grownWidth})`
      : 'restart 0 of the width',
    width,
    epochs: record.epochs,
    stop: record.stop,
    inputs: ds.inputs,
    macs: doc.cost.macs,
    parameters: doc.cost.parameters,
    flashFloat32: doc.cost.flashBytes.float32,
    flashInt8: doc.cost.flashBytes.int8,
    ramFloat32: doc.cost.ramBytes.float32,
    ramInt8: doc.cost.ramBytes.int8,
    // The int8 gap follows the neuron whose largest weight dwarfs its others (per-channel scale max|w| / 127).
    largestHiddenWeight: Math.max(...witness.network.hiddenWeights.flat().map(Math.abs)),
    accAllFloat64: acc(f64),
    accAllInt8: acc(i8labels),
    accValidationFloat64: acc(f64, true),
    accValidationInt8: acc(i8labels, true),
  };
  if (cc) {
    const c = runC(
      exportC(doc, 'm', { toolVersion: 'measure', dataFingerprint: loaded.fingerprint, config: file }),
      raw,
      F,
    );
    const K = doc.network.outputs;
    entry.accAllFloat32C = acc(c.map((r) => classes[Number(r[0])]));
    entry.accAllInt8C = acc(c.map((r) => classes[Number(r[1])]));
    entry.int8BitsMatch = c.every((r, p) =>
      r.slice(2).every((h, k) => hexBits(h) === new Uint32Array(i8.outputs.buffer)[p * K + k]),
    );
  }
  results.push(entry);
}

const pct = (v) => (v === undefined ? '-' : (100 * v).toFixed(1) + '%');
console.log(cc ? `C compiler: ${cc}` : 'no C compiler found: the compiled columns are left out');
console.log(
  searchMode
    ? "networks: the witnesses of the demo configs' searches"
    : 'networks: restart 0 at the width, seed 1, iRprop+, up to 1,200 epochs',
);
console.log(
  'data             width inputs  MACs  flash f32/int8  RAM f32/int8  all rows: f64   f32(C)  int8   int8(C)  validation: f64  int8   int8 C = TS',
);
for (const r of results) {
  console.log(
    [
      r.data.padEnd(16),
      String(r.width).padStart(5),
      String(r.inputs).padStart(6),
      String(r.macs).padStart(5),
      `${r.flashFloat32} / ${r.flashInt8}`.padStart(15),
      `${r.ramFloat32} / ${r.ramInt8}`.padStart(13),
      pct(r.accAllFloat64).padStart(15),
      pct(r.accAllFloat32C).padStart(7),
      pct(r.accAllInt8).padStart(6),
      pct(r.accAllInt8C).padStart(8),
      pct(r.accValidationFloat64).padStart(16),
      pct(r.accValidationInt8).padStart(6),
      String(r.int8BitsMatch ?? '-').padStart(12),
    ].join(' '),
  );
}
console.log(JSON.stringify(results, null, 2));
if (!existsSync(build)) process.exit(1);
