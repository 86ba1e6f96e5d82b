import { existsSync, mkdtempSync, readFileSync, readdirSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseBaseline } from '../../src/gate/baseline.js';
import { runGateStage, type GateStageInput } from '../../src/gate/stage.js';
import type { SearchResult } from '../../src/search/types.js';
import { config, found, loaded, notFound, profile } from './build.js';

function setup(): {
  dir: string;
  path: string;
  input: (mode: 'check' | 'baseline', result: SearchResult, day?: number) => GateStageInput;
} {
  const dir = mkdtempSync(join(tmpdir(), 'nb-stage-'));
  const path = join(dir, 'neuron-budget.baseline.json');
  const cfg = config({ gate: { baseline: path } });
  return {
    dir,
    path,
    input: (mode, result, day = 1) => ({
      mode,
      result,
      loaded: loaded(profile({ rows: 1000 + day })),
      config: cfg,
      baselinePath: path,
      baselineShown: 'neuron-budget.baseline.json',
      // As the job does: the baseline as it is on disk before this run.
      previous: existsSync(path) ? parseBaseline(readFileSync(path, 'utf8'), 'neuron-budget.baseline.json') : null,
      commit: null,
      date: new Date(Date.UTC(2026, 2, day)),
      toolVersion: '0.1.0',
    }),
  };
}

describe('gate stage', () => {
  it('check without a baseline: verdict new, nothing written', async () => {
    const s = setup();
    const out = await runGateStage(s.input('check', found(4, 0.96)));
    expect(out.outcome.verdict).toBe('new');
    expect(out.written).toBeNull();
    expect(readdirSync(s.dir)).toEqual([]);
  });

  it('baseline writes, a second baseline grows the history, check compares with it', async () => {
    const s = setup();
    expect((await runGateStage(s.input('baseline', found(4, 0.96), 1))).written).toBe(s.path);
    const second = await runGateStage(s.input('baseline', found(5, 0.96), 2));
    expect(second.outcome.verdict).toBe('fail'); // judged against the first baseline before replacing it
    const written = JSON.parse(readFileSync(s.path, 'utf8'));
    expect(written.history.map((h: { width: number }) => h.width)).toEqual([4, 5]);
    const check = await runGateStage(s.input('check', found(5, 0.96), 3));
    expect(check.outcome.verdict).toBe('pass');
    expect(readdirSync(s.dir)).toEqual(['neuron-budget.baseline.json']);
  });

  it('a search that found nothing leaves the baseline untouched', async () => {
    const s = setup();
    await runGateStage(s.input('baseline', found(4, 0.96)));
    const before = readFileSync(s.path, 'utf8');
    const out = await runGateStage(s.input('baseline', notFound(16), 2));
    expect(out.written).toBeNull();
    expect(out.notWritten).toMatch(/left unchanged/);
    expect(readFileSync(s.path, 'utf8')).toBe(before);
  });

  it('a corrupt baseline is a user error in both modes and is never overwritten', async () => {
    const s = setup();
    writeFileSync(s.path, '{"schema": "neuron-budget/baseline@1", ');
    for (const mode of ['check', 'baseline'] as const) {
      await expect((async () => runGateStage(s.input(mode, found(4, 0.96))))()).rejects.toThrow(
        /^neuron-budget\.baseline\.json:1:\d+: the baseline is not valid JSON/,
      );
    }
    expect(readFileSync(s.path, 'utf8')).toBe('{"schema": "neuron-budget/baseline@1", ');
  });
});

describe('gate stage: --baseline override', () => {
  it('names the override in the gate settings it returns', async () => {
    const s = setup();
    const other = join(s.dir, 'other.json');
    const out = await runGateStage({
      ...s.input('baseline', found(3, 0.96)),
      baselinePath: other,
      baselineShown: 'other.json',
    });
    expect(out.written).toBe(other);
    expect(out.gate.baseline).toBe(other);
    expect(out.gate.baselineAsWritten).toBe('other.json');
    expect(readdirSync(s.dir)).toEqual(['other.json']);
  });
});
