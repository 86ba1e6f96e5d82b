import { describe, expect, it } from 'vitest';
import { UserError } from '../../src/common/errors.js';
import { checkPart, parsePart, serializePart, PART_SCHEMA, type PartDocument } from '../../src/matrix/part.js';
import { makePlan } from '../../src/matrix/plan.js';
import type { TaskResult } from '../../src/search/types.js';

const identity = { toolVersion: '0.1.0', data: 'a'.repeat(64), rows: 100, settings: 'b'.repeat(64) };
const cost = { trainRows: 80, inputs: 3, outputs: 1, maxEpochs: 100, pruneEpochs: 10, pruneCandidates: 3 };
const plan = makePlan(
  { growth: 'fresh', minWidth: 1, maxWidth: 6, restarts: 3, required: 1, maxTrainings: null, start: 3 },
  2,
  identity,
  cost,
);
const want = {
  plan,
  toolVersion: '0.1.0',
  inputs: 3,
  outputs: 1,
  activation: 'tanh' as const,
  head: 'logistic' as const,
};

function result(width: number, restart: number): TaskResult {
  const j = { train: 0.9, steering: Number.NaN, judged: 0.8, reached: true, met: true };
  const network = {
    inputs: 3,
    width,
    outputs: 1,
    activation: 'tanh' as const,
    head: 'logistic' as const,
    hiddenWeights: Array.from({ length: width }, () => [0.1, -0, 0.3]),
    hiddenBias: Array(width).fill(0) as number[],
    outputWeights: [Array(width).fill(0.5) as number[]],
    outputBias: [0],
  };
  return {
    width,
    restart,
    ...j,
    stop: 'reached',
    epochs: 10,
    finalWidth: width,
    segments: [{ width, epochs: 10, stop: 'reached', ...j }],
    network,
    reason: null,
  };
}

function part(index: number, over: Partial<PartDocument> = {}): PartDocument {
  return {
    schema: PART_SCHEMA,
    tool: { name: 'neuron-budget', version: '0.1.0' },
    plan: plan.id,
    shard: { index, of: plan.shards.length },
    data: { fingerprint: identity.data },
    settings: { fingerprint: identity.settings },
    results: plan.shards[index].tasks.map((t) => result(t.width, t.restart)),
    pruned: [],
    seconds: 1,
    ...over,
  };
}

const refusal = (f: () => void): string => {
  try {
    f();
  } catch (e) {
    expect(e).toBeInstanceOf(UserError);
    return (e as Error).message;
  }
  throw new Error('not refused');
};

describe('a part', () => {
  it('survives the trip through its file exactly (NaN and −0 included) and belongs to its plan', () => {
    const p = part(1);
    const back = parsePart(serializePart(p), 'part-1.json');
    expect(back).toEqual(p);
    expect(Number.isNaN(back.results[0].steering)).toBe(true);
    expect(Object.is(back.results[0].network!.hiddenWeights[0][1], -0)).toBe(true);
    expect(() => checkPart(back, 'part-1.json', want)).not.toThrow();
  });

  it('is refused, naming the file, when it comes from other data, settings, plans or versions', () => {
    expect(refusal(() => checkPart(part(0, { data: { fingerprint: 'c'.repeat(64) } }), 'p.json', want))).toMatch(
      /^p\.json: computed on other data/,
    );
    expect(refusal(() => checkPart(part(0, { settings: { fingerprint: 'c'.repeat(64) } }), 'p.json', want))).toMatch(
      /other result-changing settings/,
    );
    expect(refusal(() => checkPart(part(0, { plan: 'f'.repeat(64) }), 'p.json', want))).toMatch(
      /belongs to another plan/,
    );
    expect(refusal(() => checkPart(part(0, { shard: { index: 0, of: 3 } }), 'p.json', want))).toMatch(/another plan/);
    expect(
      refusal(() => checkPart(part(0, { tool: { name: 'neuron-budget', version: '0.0.9' } }), 'p.json', want)),
    ).toMatch(/made by neuron-budget "0\.0\.9"/);
  });

  it('is refused when it holds other tasks than its shard, or a network of the wrong shape', () => {
    const other = part(0, { results: part(1).results });
    expect(refusal(() => checkPart(other, 'p.json', want))).toMatch(/results\[0\]: expected a task of shard 0/);
    const broken = part(0);
    broken.results[0].network!.hiddenWeights[0] = [1, 2];
    expect(refusal(() => checkPart(broken, 'p.json', want))).toMatch(
      /results\[0\]\.network\.hiddenWeights\[0\]: expected 3 numbers/,
    );
  });

  it('that is not JSON, or not a part, gets the file and where', () => {
    expect(refusal(() => parsePart('{"schema": ', 'p.json'))).toMatch(/^p\.json:1:\d+: the part is not valid JSON/);
    expect(refusal(() => parsePart('{"schema": "neuron-budget/plan@1"}', 'p.json'))).toMatch(
      /^p\.json: schema: expected/,
    );
  });

  it('is refused, not a crash, when a field inside is of the wrong kind', () => {
    const prunes = plan.shards.findIndex((sh) => sh.tasks.some((t) => t.prune));
    const task = plan.shards[prunes].tasks.find((t) => t.prune)!;
    const withPruned = (pruned: unknown): PartDocument => part(prunes, { pruned: [pruned] as PartDocument['pruned'] });
    const source = { width: task.width, restart: task.restart };
    const ok = { source, chain: [], steps: [], trainings: 3, interrupted: false };
    expect(() => checkPart(withPruned(ok), 'p.json', want)).not.toThrow();
    expect(refusal(() => checkPart(withPruned({ ...ok, steps: [null] }), 'p.json', want))).toMatch(
      /pruned\[0\]\.steps\[0\]: expected a prune step/,
    );
    expect(refusal(() => checkPart(withPruned({ ...ok, trainings: -8 }), 'p.json', want))).toMatch(
      /trainings: expected a whole number/,
    );
    expect(
      refusal(() =>
        checkPart(withPruned({ ...ok, source: { width: String(task.width), restart: task.restart } }), 'p.json', want),
      ),
    ).toMatch(/source\.width/);
    const bogus = part(0);
    (bogus.results[0].network as { activation: string }).activation = 'bogus';
    expect(refusal(() => checkPart(bogus, 'p.json', want))).toMatch(/network\.activation: expected "tanh"/);
  });

  it('keeps ordinary strings that name properties of every object as strings', () => {
    const text = serializePart(part(0, { tool: { name: 'neuron-budget', version: 'constructor' } }));
    expect(parsePart(text, 'p.json').tool.version).toBe('constructor');
  });
});
