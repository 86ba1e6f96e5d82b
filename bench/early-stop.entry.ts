/**
 * Early-stop benchmark entry, bundled and run by bench/early-stop.mjs (prints figures; not a test).
 * Question: can a growth restart that fails be stopped before max-epochs (or patience), once its
 * learning curve can no longer reach the target, without changing any answer?
 *
 * Recording. For each case the search's growth walk is replayed with the search's own context
 * (searchContext), seeds (rngFor(seed, width, restart)) and training options, one task at a time
 * as runTask trains it. The one addition is a look at the steering metric at every check, through
 * TrainOptions.interrupted (which never says stop) and a kernel that counts loss evaluations (an
 * epoch each), so the trajectories are the search's own; --verify=N retrains the first N tasks with
 * runTask itself and compares. After the walk has decided, the restarts it skipped at every width
 * up to the grown width are trained too (more curves), the networks that met are pruned with
 * runPruneJob and the answer is tallied as the search tallies it.
 *
 * Evaluation. Candidate rules run offline over the curves; a rule may stop a restart only at a
 * check before the steering rows first met the target. A false stop is a stop on a restart that
 * later met the target on the steering rows; a "met change" is a stop after which the restart's
 * judged outcome (the network a stop would hand back: the lowest steering loss so far) differs from
 * the full run's. Any met change can change an answer; none means the growth decision, the networks
 * pruned and so the answer are identical (the report's epochs and figures of failed restarts are not).
 *
 * Usage: node <bundle> [--cases=demo,demo-pr,generated] [--seeds=1-20 (default)] [--curves=DIR] [--verify=N]
 * --seeds replaces search.seed (the configs' is 1): each seed is the same search with other starts.
 * With --curves, recorded curves are kept in DIR and reused (delete a file to record it again).
 */
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { performance } from 'node:perf_hooks';
import { rngFor } from '../src/common/random.js';
import { higherIsBetter, meetsThreshold } from '../src/common/metric.js';
import { loadConfig } from '../src/config/index.js';
import type { SearchConfig, TargetConfig } from '../src/config/types.js';
import { loadData, type EncodedDataset } from '../src/data/index.js';
import type { Kernel } from '../src/nn/kernel/kernel.js';
import { defaultKernel } from '../src/nn/kernel/select.js';
import { metricValue } from '../src/nn/metrics.js';
import { createTrainer, type TrainOptions } from '../src/nn/index.js';
import { appraise, judge } from '../src/search/judge.js';
import {
  decideGrowth,
  runPruneJob,
  runTask,
  searchContext,
  tally,
  taskKey,
  type PruneJob,
  type PruneResult,
  type RestartAtWidth,
  type SearchContext,
  type TaskResult,
  type TrainingTask,
} from '../src/search/index.js';

/** One check of a training: epochs so far, steering metric, and whether a stop here would hand back a network that meets the target on the judging rows. */
interface Check {
  epoch: number;
  metric: number;
  stopMet: boolean;
}

interface Curve {
  width: number;
  restart: number;
  /** The search's own walk ran this task (otherwise it was trained only for more curves). */
  walk: boolean;
  epochs: number;
  stop: string;
  /** Outcome of the full run: steering rows met the target (reached), judging rows did (met). */
  reached: boolean;
  met: boolean;
  checks: Check[];
}

interface CaseRecord {
  name: string;
  seed: number;
  rows: number;
  inputs: number;
  target: TargetConfig;
  maxEpochs: number;
  checkEvery: number;
  patience: number;
  restarts: number;
  required: number;
  answer: number | null;
  grownWidth: number | null;
  /** Growth trainings the walk used and epochs of the walk (exact). */
  walkTrainings: number;
  walkEpochs: number;
  /** Prune retrainings, and their epochs estimated as checks × check-every (the checks are all the prune phase shows). */
  pruneTrainings: number;
  pruneEpochsApprox: number;
  seconds: { walk: number; extra: number; prune: number };
  curves: Curve[];
}

function sharedArray(length: number): Float64Array {
  return new Float64Array(new SharedArrayBuffer(Math.max(1, length) * 8), 0, length);
}

/**
 * The invented dataset of bench/search.entry.ts, copied (that module runs a search when imported):
 * 100,000 rows × 30 inputs uniform in [−1, 1], class |x1 + x2 − x3| < 0.6, 75% training.
 */
function generated(rows = 100_000, inputs = 30): EncodedDataset {
  const rng = rngFor(20240601, 0, 0);
  const trainRows = Math.floor(rows * 0.75);
  const validationRows = rows - trainRows;
  const xTrain = sharedArray(trainRows * inputs);
  const yTrain = sharedArray(trainRows);
  const xValidation = sharedArray(validationRows * inputs);
  const yValidation = sharedArray(validationRows);
  const row = new Float64Array(inputs);
  for (let p = 0; p < rows; p++) {
    for (let i = 0; i < inputs; i++) row[i] = 2 * rng.nextDouble() - 1;
    const y = Math.abs(row[0] + row[1] - row[2]) < 0.6 ? 1 : 0;
    if (p < trainRows) {
      xTrain.set(row, p * inputs);
      yTrain[p] = y;
    } else {
      xValidation.set(row, (p - trainRows) * inputs);
      yValidation[p - trainRows] = y;
    }
  }
  return {
    task: 'classification',
    inputs,
    outputs: 1,
    trainRows,
    validationRows,
    xTrain,
    yTrain,
    xValidation,
    yValidation,
    judgingRows: 0,
    xJudging: new Float64Array(0),
    yJudging: new Float64Array(0),
    encoding: {
      features: Array.from({ length: inputs }, (_, i) => ({
        kind: 'numeric' as const,
        name: `x${i + 1}`,
        mean: 0,
        std: 1,
      })),
      target: { name: 'class', task: 'classification', classes: ['0', '1'], mean: 0, std: 1 },
    },
  };
}

/** The search settings bench/search.entry.ts uses for the generated dataset (copied). */
const generatedSearch: SearchConfig = {
  minWidth: 1,
  maxWidth: 6,
  restarts: 5,
  required: 2,
  maxEpochs: 150,
  seed: 1,
  growth: 'fresh',
  start: 'baseline',
  activation: 'tanh',
  optimizer: 'lbfgs',
  patience: 200,
  weightDecay: 0.0001,
  init: null,
  checkEvery: 10,
  pruneEpochs: 100,
  prune: true,
  timeBudget: null,
  maxTrainings: null,
  workers: null,
};

async function loadCase(name: string): Promise<{ data: EncodedDataset; search: SearchConfig; target: TargetConfig }> {
  if (name === 'demo' || name === 'demo-pr') {
    const file = resolve(`examples/pump-vibration/neuron-budget${name === 'demo-pr' ? '.pr' : ''}.yml`);
    const config = await loadConfig(file, process.cwd());
    return { data: (await loadData(config)).dataset, search: config.search, target: config.target };
  }
  if (name === 'generated')
    return { data: generated(), search: generatedSearch, target: { metric: 'accuracy', threshold: 0.95 } };
  throw new Error(`unknown case ${name} (expected demo, demo-pr or generated)`);
}

/** The default kernel, counting full loss-and-gradient evaluations (the trainer counts each as an epoch). */
function countingKernel(): { kernel: Kernel; count: () => number } {
  const inner = defaultKernel();
  let n = 0;
  return {
    kernel: {
      name: inner.name,
      lossAndGradient(shape, params, x, y, start, end, grad) {
        n++;
        return inner.lossAndGradient(shape, params, x, y, start, end, grad);
      },
      forward(shape, params, x, rows, logits, hidden) {
        inner.forward(shape, params, x, rows, logits, hidden);
      },
    },
    count: () => n,
  };
}

/** One fresh growth task, trained as runTask trains it, with its learning curve. */
function trainTask(data: EncodedDataset, ctx: SearchContext, task: TrainingTask): { result: TaskResult; curve: Curve } {
  const { train } = ctx;
  const counter = countingKernel();
  const checks: Check[] = [];
  let bestLoss = Infinity;
  let bestMet = false;
  let look: () => boolean = () => false;
  const options: TrainOptions = { ...train, stall: null, interrupted: () => look() };
  const trainer = createTrainer(data, task.width, options, rngFor(ctx.seed, task.width, task.restart), {
    kernel: counter.kernel,
  });
  look = () => {
    const steer = trainer.metrics().validation;
    const metric = metricValue(steer, train.target.metric);
    // The network a stop here would hand back: the lowest steering loss checked so far (the trainer's rule).
    if (Number.isFinite(steer.loss) && Number.isFinite(metric) && steer.loss < bestLoss) {
      bestLoss = steer.loss;
      bestMet = appraise(data, trainer.snapshot(), train.target, false).met;
    }
    checks.push({ epoch: counter.count(), metric, stopMet: bestMet });
    return false;
  };
  const rec = trainer.run(train.maxEpochs);
  if (counter.count() !== rec.epochs)
    throw new Error(`epoch count ${counter.count()} differs from the trainer's ${rec.epochs}`);
  const network = rec.stop === 'diverged' ? null : trainer.snapshot();
  const judged = judge(data, network, rec, train.target);
  const result: TaskResult = {
    width: task.width,
    restart: task.restart,
    ...judged,
    stop: rec.stop,
    epochs: rec.epochs,
    finalWidth: task.width,
    segments: [{ width: task.width, epochs: rec.epochs, stop: rec.stop, ...judged }],
    network: judged.met ? network : null,
    reason: rec.stop === 'diverged' ? `diverged at width ${task.width} after ${rec.epochs} epochs` : null,
  };
  const curve: Curve = {
    width: task.width,
    restart: task.restart,
    walk: false,
    epochs: rec.epochs,
    stop: rec.stop,
    reached: judged.reached,
    met: judged.met,
    checks,
  };
  return { result, curve };
}

/** The search's prune sources (search.ts): networks that met at the grown width or below, in (width, restart) order. */
function pruneSources(tried: { width: number; restarts: RestartAtWidth[] }[], grownWidth: number | null): PruneJob[] {
  const jobs: PruneJob[] = [];
  for (const { width, restarts } of tried) {
    if (grownWidth !== null && width > grownWidth) continue;
    for (const r of restarts) if (r.met && r.network !== null) jobs.push({ source: r.task, network: r.network });
  }
  return jobs;
}

const seconds = (t0: number): number => (performance.now() - t0) / 1000;

async function record(name: string, seed: number, verify: number): Promise<CaseRecord> {
  const loaded = await loadCase(name);
  const { data, target } = loaded;
  const search = { ...loaded.search, seed };
  const ctx = searchContext(search, target);
  const plan = ctx.plan;
  if (plan.growth !== 'fresh') throw new Error(`${name}: only fresh growth is measured here`);
  const results = new Map<string, TaskResult>();
  const curves: Curve[] = [];
  const lookup = (t: TrainingTask) => results.get(taskKey(t));
  const t0 = performance.now();
  let decision = decideGrowth(plan, lookup);
  while (decision.kind === 'need') {
    const { result, curve } = trainTask(data, ctx, decision.task);
    results.set(taskKey(decision.task), result);
    curves.push({ ...curve, walk: true });
    process.stderr.write(
      `${name} s${seed} w${curve.width} r${curve.restart} ${curve.epochs} epochs ${curve.stop}${curve.met ? ' met' : ''}\n`,
    );
    decision = decideGrowth(plan, lookup);
  }
  if (decision.capHit !== null) throw new Error(`${name}: the cap on trainings stopped the walk`);
  const walkSeconds = seconds(t0);
  const walkEpochs = curves.reduce((s, c) => s + c.epochs, 0);
  const t1 = performance.now();
  const top = decision.grownWidth ?? plan.maxWidth;
  for (let w = plan.minWidth; w <= top; w++) {
    for (let i = 0; i < plan.restarts; i++) {
      if (results.has(taskKey({ width: w, restart: i }))) continue;
      const { curve } = trainTask(data, ctx, { width: w, restart: i });
      curves.push(curve);
      process.stderr.write(
        `${name} s${seed} w${w} r${i} (extra) ${curve.epochs} epochs ${curve.stop}${curve.met ? ' met' : ''}\n`,
      );
    }
  }
  const extraSeconds = seconds(t1);
  const t2 = performance.now();
  let checks = 0;
  const countChecks = (): boolean => {
    checks++;
    return false;
  };
  const jobs = search.prune ? pruneSources(decision.tried, decision.grownWidth) : [];
  const pruned: PruneResult[] = jobs.map((job) => runPruneJob(data, ctx, job, countChecks));
  const answer = tally(plan, target, decision.tried, pruned, ctx.seed).width;
  const pruneSeconds = seconds(t2);
  for (let k = 0; k < Math.min(verify, curves.length); k++) {
    const task = { width: curves[k].width, restart: curves[k].restart };
    const again = runTask(data, ctx, task);
    if (JSON.stringify(again) !== JSON.stringify(results.get(taskKey(task))))
      throw new Error(`${name}: task ${taskKey(task)} trained here differs from runTask`);
  }
  if (verify > 0) process.stderr.write(`${name}: first ${Math.min(verify, curves.length)} tasks match runTask\n`);
  return {
    name,
    seed,
    rows: data.trainRows + data.validationRows + data.judgingRows,
    inputs: data.inputs,
    target,
    maxEpochs: search.maxEpochs,
    checkEvery: search.checkEvery,
    patience: search.patience,
    restarts: plan.restarts,
    required: plan.required,
    answer,
    grownWidth: decision.grownWidth,
    walkTrainings: decision.trainings,
    walkEpochs,
    pruneTrainings: pruned.reduce((s, r) => s + r.trainings, 0),
    pruneEpochsApprox: checks * search.checkEvery,
    seconds: { walk: walkSeconds, extra: extraSeconds, prune: pruneSeconds },
    curves,
  };
}

// ---- Offline evaluation -------------------------------------------------------------------

/** A curve as the rules read it: metric values oriented so that larger is better. */
interface Seen {
  c: Curve;
  run: CaseRecord;
  epochs: number[];
  v: number[];
  /** Oriented target. */
  t: number;
  /** Index of the first check that met the target on the steering rows; null: never. */
  firstReach: number | null;
}

function seen(run: CaseRecord, c: Curve): Seen {
  const sign = higherIsBetter(run.target.metric) ? 1 : -1;
  const k = c.checks.findIndex((x) => meetsThreshold(x.metric, run.target));
  return {
    c,
    run,
    epochs: c.checks.map((x) => x.epoch),
    v: c.checks.map((x) => sign * x.metric),
    t: sign * run.target.threshold,
    firstReach: k < 0 ? null : k,
  };
}

/** Checks a rule may stop at: before the first that met the target on the steering rows, and before the last (stopping there saves nothing). */
const stoppable = (s: Seen): number => s.firstReach ?? s.v.length - 1;

/** A rule: true to stop the restart at check k. */
type Rule = (s: Seen, k: number) => boolean;

const bestUpTo = (s: Seen, k: number): number => {
  let best = -Infinity;
  for (let j = 0; j <= k; j++) if (s.v[j] > best) best = s.v[j];
  return best;
};

/**
 * Largest improvement of a curve over any window of at most r epochs, for r = 0..length−1:
 * max over checks i < j with epoch_j − epoch_i ≤ r of v_j − v_i (then a prefix maximum over r).
 */
function improvementEnvelope(s: Seen, length: number): Float64Array {
  const g = new Float64Array(length);
  for (let i = 0; i < s.v.length; i++) {
    if (!Number.isFinite(s.v[i])) continue;
    for (let j = i + 1; j < s.v.length; j++) {
      const d = s.epochs[j] - s.epochs[i];
      const up = s.v[j] - s.v[i];
      if (d < length && Number.isFinite(up) && up > g[d]) g[d] = up;
    }
  }
  for (let r = 1; r < length; r++) if (g[r - 1] > g[r]) g[r] = g[r - 1];
  return g;
}

/** Rule (a): best-so-far plus the steepest check-to-check slope of the last K checks, carried to max-epochs. */
function extrapolation(K: number): { rule: Rule; ratio: (s: Seen, k: number) => number } {
  const slope = (s: Seen, k: number): number => {
    let m = 0;
    for (let j = k - K + 1; j <= k; j++) m = Math.max(m, (s.v[j] - s.v[j - 1]) / (s.epochs[j] - s.epochs[j - 1]));
    return m;
  };
  const gain = (s: Seen, k: number): number => slope(s, k) * (s.run.maxEpochs - s.epochs[k]);
  return {
    rule: (s, k) => k >= K && Number.isFinite(s.v[k]) && bestUpTo(s, k) + gain(s, k) < s.t,
    // Gap over projected gain: above 1, the rule stops there.
    ratio: (s, k) => (k >= K ? (s.t - bestUpTo(s, k)) / gain(s, k) : 0),
  };
}

/** Rule (b): the gap to the target exceeds `factor` × the pool's envelope for the epochs left. */
function envelope(
  factor: number,
  pool: (s: Seen) => Float64Array | null,
): { rule: Rule; ratio: (s: Seen, k: number) => number } {
  const ratio = (s: Seen, k: number): number => {
    const g = pool(s);
    if (g === null || !Number.isFinite(s.v[k])) return 0;
    // Windows shorter than the check spacing are never observed: read at least one spacing.
    const left = Math.max(s.run.checkEvery, s.run.maxEpochs - s.epochs[k]);
    return (s.t - s.v[k]) / g[Math.min(g.length - 1, left)];
  };
  return { rule: (s, k) => ratio(s, k) > factor, ratio };
}

/**
 * Rule (c), the median stopping rule (Golovin et al. 2017, Google Vizier; described from memory):
 * stop a trial when its best value so far is below the median of the running averages, up to the
 * same step, of the trials completed before it. Trials here: the earlier restarts at the same width
 * of the same search; at least 3 of them and a grace period of `grace` epochs (our choices).
 */
function median(all: Seen[], grace: number): Rule {
  return (s, k) => {
    const e = s.epochs[k];
    if (e < grace || !Number.isFinite(s.v[k])) return false;
    const averages: number[] = [];
    for (const o of all) {
      if (o.run !== s.run || o.c.width !== s.c.width || o.c.restart >= s.c.restart) continue;
      let sum = 0;
      let n = 0;
      for (let j = 0; j < o.v.length && o.epochs[j] <= e; j++) {
        if (!Number.isFinite(o.v[j])) continue;
        sum += o.v[j];
        n++;
      }
      if (n > 0) averages.push(sum / n);
    }
    if (averages.length < 3) return false;
    averages.sort((a, b) => a - b);
    const m = averages.length;
    const mid = m % 2 === 1 ? averages[(m - 1) / 2] : (averages[m / 2 - 1] + averages[m / 2]) / 2;
    return bestUpTo(s, k) < mid;
  };
}

interface Outcome {
  stopped: number;
  saved: number;
  total: number;
  /** [walk, all]: stops on restarts that later met the target on the steering rows. */
  falseStops: [number, number];
  /** [walk, all]: stops after which the restart no longer meets the target on the judging rows, or newly does. */
  lost: [number, number];
  gained: [number, number];
  /** Searches in which a restart of the walk would change its judged outcome (the answer can change). */
  runsAtRisk: number;
}

function outcome(rule: Rule, runs: CaseRecord[], curves: Seen[]): Outcome {
  const o: Outcome = {
    stopped: 0,
    saved: 0,
    total: runs.reduce((a, r) => a + r.walkEpochs + r.pruneEpochsApprox, 0),
    falseStops: [0, 0],
    lost: [0, 0],
    gained: [0, 0],
    runsAtRisk: 0,
  };
  const atRisk = new Set<CaseRecord>();
  for (const s of curves) {
    let k: number | null = null;
    for (let j = 0; j < stoppable(s) && k === null; j++) if (rule(s, j)) k = j;
    if (k === null) continue;
    const count = (pair: [number, number], yes: boolean): void => {
      if (!yes) return;
      pair[1]++;
      if (s.c.walk) pair[0]++;
    };
    const stopMet = s.c.checks[k].stopMet;
    count(o.falseStops, s.firstReach !== null);
    count(o.lost, s.c.met && !stopMet);
    count(o.gained, !s.c.met && stopMet);
    if (!s.c.walk) continue;
    o.stopped++;
    o.saved += s.c.epochs - s.epochs[k];
    if (stopMet !== s.c.met) atRisk.add(s.run);
  }
  o.runsAtRisk = atRisk.size;
  return o;
}

const pad = (s: string | number, n: number): string => String(s).padStart(n);
const padEnd = (s: string | number, n: number): string => String(s).padEnd(n);
const pair = (p: [number, number]): string => `${p[0]}/${p[1]}`;
const tallyOf = (values: (string | number)[]): string => {
  const m = new Map<string, number>();
  for (const v of values) m.set(String(v), (m.get(String(v)) ?? 0) + 1);
  return [...m].map(([v, n]) => (m.size === 1 ? v : `${v}×${n}`)).join(' ');
};

function evaluate(runs: CaseRecord[]): void {
  const names = [...new Set(runs.map((r) => r.name))];
  const all: Seen[] = runs.flatMap((r) => r.curves.map((c) => seen(r, c)));
  const length = Math.max(...runs.map((r) => r.maxEpochs)) + 1;
  const reaching = all.filter((s) => s.firstReach !== null);
  const env = new Map<Seen, Float64Array>(reaching.map((s) => [s, improvementEnvelope(s, length)]));
  const envOf = (pick: (r: Seen) => boolean): Float64Array | null => {
    let out: Float64Array | null = null;
    for (const r of reaching) {
      if (!pick(r)) continue;
      const g = env.get(r) as Float64Array;
      out ??= new Float64Array(length);
      for (let q = 0; q < length; q++) if (g[q] > out[q]) out[q] = g[q];
    }
    return out;
  };
  // Pools of reaching curves: other datasets; the same dataset in the other seeds' searches;
  // this search's own walk, earlier in its order; every curve (in sample).
  const otherData = new Map(names.map((n) => [n, envOf((r) => r.run.name !== n)]));
  const otherSeeds = new Map(runs.map((run) => [run, envOf((r) => r.run.name === run.name && r.run !== run)]));
  // One other search of the same data: the previous seed's (the last seed's for the first).
  const previous = new Map(
    runs.map((run) => {
      const same = runs.filter((r) => r.name === run.name);
      const other = same[(same.indexOf(run) + same.length - 1) % same.length];
      return [run, other === run ? null : envOf((r) => r.run === other)] as const;
    }),
  );
  const order = (s: Seen): number => s.c.width * 1e6 + s.c.restart;
  const online = new Map(all.map((s) => [s, envOf((r) => r.run === s.run && r.c.walk && order(r) < order(s))]));

  console.log('\nSearches, pooled over seeds (epochs: walk exact, prune ≈ checks × check-every):');
  console.log(
    `${padEnd('case', 10)} ${pad('rows×inputs', 12)}  seeds  ${padEnd('answer', 12)} walk met/run  walk+prune epochs  on failed restarts  failed ended by                      met w/o reaching  latest first reach`,
  );
  for (const n of names) {
    const rs = runs.filter((r) => r.name === n);
    const walk = all.filter((s) => s.run.name === n && s.c.walk);
    const failed = walk.filter((s) => !s.c.met);
    const failedEpochs = failed.reduce((a, s) => a + s.c.epochs, 0);
    const total = rs.reduce((a, r) => a + r.walkEpochs + r.pruneEpochsApprox, 0);
    const ends = new Map<string, number>();
    for (const s of failed) ends.set(s.c.stop, (ends.get(s.c.stop) ?? 0) + 1);
    const mine = all.filter((s) => s.run.name === n);
    const unreached = (xs: Seen[]) => xs.filter((s) => s.c.met && s.firstReach === null).length;
    const reach = mine.filter((s) => s.firstReach !== null).map((s) => s.epochs[s.firstReach as number]);
    console.log(
      `${padEnd(n, 10)} ${pad(`${rs[0].rows}×${rs[0].inputs}`, 12)}  ${pad(rs.length, 5)}  ${padEnd(tallyOf(rs.map((r) => r.answer ?? '-')), 12)} ` +
        `${pad(`${walk.length - failed.length}/${walk.length}`, 12)}  ${pad(total, 17)}  ` +
        `${pad(`${((100 * failedEpochs) / total).toFixed(1)}%`, 18)}  ${padEnd([...ends].map(([w, k]) => `${w} ${k}`).join(', '), 35)}  ` +
        `${pad(`${unreached(walk.filter((s) => s.c.met))}/${walk.filter((s) => s.c.met).length} walk`, 16)}  ` +
        `${reach.length > 0 ? `epoch ${Math.max(...reach)} of ${rs[0].maxEpochs}` : '-'}`,
    );
  }

  // Leave-one-curve-out pool: the best and second-best envelope value at each r, with the owner of the best.
  const best1 = new Float64Array(length);
  const best2 = new Float64Array(length);
  const owner = new Array<Seen | null>(length).fill(null);
  for (const r of reaching) {
    const g = env.get(r) as Float64Array;
    for (let q = 0; q < length; q++) {
      if (g[q] > best1[q]) {
        best2[q] = best1[q];
        best1[q] = g[q];
        owner[q] = r;
      } else if (g[q] > best2[q]) best2[q] = g[q];
    }
  }
  const leaveOneOut = new Map(
    all.map((s) => [s, Float64Array.from(best1, (v, q) => (owner[q] === s ? best2[q] : v))] as const),
  );
  const pump = (n: string): string | null => (n === 'demo' ? 'demo-pr' : n === 'demo-pr' ? 'demo' : null);
  const otherPump = new Map(names.map((n) => [n, envOf((r) => r.run.name === pump(n))]));

  type Ratio = (s: Seen, k: number) => number;
  const rules: { name: string; rule: Rule; ratio: Ratio | null; factor: number }[] = [];
  for (const K of [3, 5, 10]) {
    const { rule, ratio } = extrapolation(K);
    rules.push({ name: `(a) extrapolate, last ${K} checks`, rule, ratio, factor: 1 });
  }
  const pools: { label: string; pool: (s: Seen) => Float64Array | null; factors: number[] }[] = [
    { label: 'other datasets', pool: (s) => otherData.get(s.run.name) ?? null, factors: [1, 2] },
    { label: 'other pump data', pool: (s) => otherPump.get(s.run.name) ?? null, factors: [1, 2] },
    { label: 'same data, other seeds', pool: (s) => otherSeeds.get(s.run) ?? null, factors: [1, 1.5, 2] },
    { label: 'same data, one other seed', pool: (s) => previous.get(s.run) ?? null, factors: [1.5, 2] },
    { label: 'all others (leave 1 out)', pool: (s) => leaveOneOut.get(s) ?? null, factors: [1, 1.5] },
    { label: "this search's earlier", pool: (s) => online.get(s) ?? null, factors: [1, 2] },
  ];
  for (const p of pools) {
    for (const f of p.factors) {
      const { rule, ratio } = envelope(f, p.pool);
      rules.push({ name: `(b) envelope ×${f}, ${p.label}`, rule, ratio, factor: f });
    }
  }
  rules.push({ name: '(c) median rule, grace 200', rule: median(all, 200), ratio: null, factor: 1 });

  /**
   * Margin: the largest ratio (gap / projected gain, or gap / envelope) at a check where a stop
   * would be wrong (the restart later reached the target, or the network handed back would be
   * judged differently). The rule stops there when that ratio exceeds its factor.
   */
  const worstDanger = (ratio: Ratio, curves: Seen[]): number => {
    let worst = 0;
    for (const s of curves)
      for (let k = 0; k < stoppable(s); k++)
        if (s.firstReach !== null || s.c.checks[k].stopMet !== s.c.met) worst = Math.max(worst, ratio(s, k));
    return worst;
  };

  console.log(
    "\nRules, pooled over seeds. saved: epochs of the walk's restarts cut (% of the searches' epochs). false: stopped, " +
      "later met the target on the steering rows; lost / gained: the judged outcome flips; walk/all: the searches' own " +
      'restarts / every curve recorded; at risk: searches whose answer can change. danger: the largest ratio at a check ' +
      'where stopping would be wrong; the rule stops there when it exceeds the factor (margin = factor / danger).',
  );
  console.log(
    `${padEnd('rule', 46)} ${padEnd('case', 10)} stopped  ${pad('saved', 14)}  false  lost  gained  at risk  danger (margin)`,
  );
  for (const r of rules) {
    names.forEach((n, i) => {
      const rs = runs.filter((x) => x.name === n);
      const curves = all.filter((s) => s.run.name === n);
      const o = outcome(r.rule, rs, curves);
      let margin = '';
      if (r.ratio !== null) {
        const d = worstDanger(r.ratio, curves);
        margin = `${Number.isFinite(d) ? d.toFixed(2) : '∞ (flat curve)'}${Number.isFinite(d) && d > 0 ? ` (${(r.factor / d).toFixed(2)})` : ''}`;
      }
      console.log(
        `${padEnd(i === 0 ? r.name : '', 46)} ${padEnd(n, 10)} ${pad(o.stopped, 7)}  ${pad(`${o.saved} (${((100 * o.saved) / o.total).toFixed(1)}%)`, 14)}  ` +
          `${pad(pair(o.falseStops), 5)}  ${pad(pair(o.lost), 4)}  ${pad(pair(o.gained), 6)}  ${pad(`${o.runsAtRisk}/${rs.length}`, 7)}  ${margin}`,
      );
    });
  }
}

function seedList(text: string): number[] {
  const out: number[] = [];
  for (const part of text.split(',')) {
    const [a, b] = part.split('-').map(Number);
    for (let s = a; s <= (b ?? a); s++) out.push(s);
  }
  return out;
}

async function main(): Promise<void> {
  const arg = (name: string): string | undefined =>
    process.argv.find((a) => a.startsWith(`--${name}=`))?.slice(name.length + 3);
  const names = (arg('cases') ?? 'demo,demo-pr,generated').split(',');
  const seeds = seedList(arg('seeds') ?? '1-20');
  const dir = arg('curves');
  const verify = Number(arg('verify') ?? '0');
  if (dir !== undefined) mkdirSync(dir, { recursive: true });
  const runs: CaseRecord[] = [];
  const started = performance.now();
  for (const name of names) {
    for (const seed of seeds) {
      const file = dir === undefined ? null : join(dir, `${name}-seed${seed}.json`);
      if (file !== null && existsSync(file)) {
        runs.push(JSON.parse(readFileSync(file, 'utf8')) as CaseRecord);
        continue;
      }
      const rec = await record(name, seed, seed === seeds[0] ? verify : 0);
      if (file !== null) writeFileSync(file, `${JSON.stringify(rec)}\n`);
      runs.push(rec);
    }
  }
  console.log(
    `early-stop benchmark — node ${process.version}; seeds ${seeds.join(',')}; ${seconds(started).toFixed(0)} s recording`,
  );
  for (const n of names) {
    const rs = runs.filter((r) => r.name === n);
    const k = rs[0];
    const sum = (f: (r: CaseRecord) => number): number => rs.reduce((a, r) => a + f(r), 0);
    console.log(
      `${n}: target ${k.target.metric} ${k.target.threshold}, max-epochs ${k.maxEpochs}, check-every ${k.checkEvery}, patience ${k.patience}, ` +
        `${k.required} of ${k.restarts} restarts; ${sum((r) => r.curves.length)} curves (${sum((r) => r.walkTrainings)} the walks'); ` +
        `${sum((r) => r.pruneTrainings)} prune retrainings; seconds: walk ${sum((r) => r.seconds.walk).toFixed(0)}, extra ${sum((r) => r.seconds.extra).toFixed(0)}, prune ${sum((r) => r.seconds.prune).toFixed(0)}`,
    );
  }
  evaluate(runs);
}

main().catch((e: unknown) => {
  process.stderr.write(`${e instanceof Error ? (e.stack ?? e.message) : String(e)}\n`);
  process.exitCode = 1;
});
