/**
 * Runs L-BFGS on a few problems and prints one sha256 per run over the bytes of the final
 * parameters (plus evaluations and status). Run under two Node versions by
 * lbfgs-determinism.test.ts on a transpiled copy of src/nn.
 */
import { createHash } from 'node:crypto';
import { referenceKernel } from '../../src/nn/kernel/kernel.js';
import { Lbfgs, type Objective } from '../../src/nn/lbfgs.js';
import { initParams } from '../../src/nn/network.js';
import { type Shape } from '../../src/nn/kernel/layout.js';
import { rngFor } from '../../src/common/random.js';

function run(name: string, x: Float64Array, f: Objective, budget: number): string {
  const opt = new Lbfgs(x.length);
  let evaluations = 0;
  let status = 'progress';
  while (status === 'progress' && evaluations < budget) {
    const r = opt.iterate(x, f, budget - evaluations);
    evaluations += r.evaluations;
    status = r.status;
  }
  const sha = createHash('sha256')
    .update(new Uint8Array(x.buffer, x.byteOffset, x.byteLength))
    .digest('hex');
  return `${name}: ${status}/${evaluations} ${sha}`;
}

const lines: string[] = [];
const kernel = referenceKernel();
// Data are made up for this check only.
const rows = 40;
const rng = rngFor(3, rows, 0);
const x = new Float64Array(rows * 3).map(() => 2 * rng.nextDouble() - 1);
const y = new Float64Array(rows).map((_, p) => (x[p * 3] * x[p * 3 + 1] + x[p * 3 + 2] > 0 ? 1 : 0));
for (const activation of ['tanh', 'logistic'] as const) {
  for (let r = 0; r < 4; r++) {
    const shape: Shape = { inputs: 3, width: 3, outputs: 1, activation, head: 'logistic' };
    const f: Objective = (p, g) => kernel.lossAndGradient(shape, p, x, y, 0, rows, g);
    lines.push(run(`${activation} r${r}`, initParams(shape, 'nguyen-widrow', rngFor(1, 3, r)), f, 300));
  }
}
const softmax: Shape = { inputs: 3, width: 4, outputs: 3, activation: 'tanh', head: 'softmax' };
const y3 = new Float64Array(rows).map((_, p) => (x[p * 3] > 0.3 ? 2 : x[p * 3 + 1] > 0 ? 1 : 0));
lines.push(
  run(
    'softmax',
    initParams(softmax, 'nguyen-widrow', rngFor(1, 4, 0)),
    (p, g) => kernel.lossAndGradient(softmax, p, x, y3, 0, rows, g),
    300,
  ),
);
console.log(lines.join('\n'));
