import { existsSync, mkdtempSync, readFileSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { isUserError } from '../../src/common/errors.js';
import { parseBaseline, readBaseline } from '../../src/gate/baseline.js';
import { runGateStage, type GateStageInput } from '../../src/gate/stage.js';
import { acquireLock } from '../../src/files/lock.js';
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
    expect(out.record).toBeNull();
    expect(readdirSync(s.dir)).toEqual([]);
  });

  it('baseline writes, a second baseline grows the history, check compares with it', async () => {
    const s = setup();
    const first = await runGateStage(s.input('baseline', found(4, 0.96), 1));
    expect(first.written).toBe(s.path);
    expect(first.record).toEqual({ file: 'neuron-budget.baseline.json', width: 4, historyEntries: 1 });
    const second = await runGateStage(s.input('baseline', found(5, 0.96), 2));
    expect(second.record).toEqual({ file: 'neuron-budget.baseline.json', width: 5, historyEntries: 2 });
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
    expect(out.record).toEqual({
      notWritten: 'no width reached the target, so there is no result to record; the baseline file was left unchanged',
    });
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

describe('gate stage: two baseline runs at once', () => {
  const refusal = (e: unknown): string => {
    expect(isUserError(e), String(e)).toBe(true);
    return (e as Error).message;
  };

  it('a baseline file written by another run during the search is kept, and this run refuses (exit 2)', async () => {
    const s = setup();
    await runGateStage(s.input('baseline', found(4, 0.96), 1));
    // This run read the file before its search...
    const previous = await readBaseline(s.path);
    // ...and meanwhile another run recorded its result.
    await runGateStage(s.input('baseline', found(5, 0.96), 2));
    const theirs = readFileSync(s.path, 'utf8');
    const message = refusal(
      await runGateStage({ ...s.input('baseline', found(3, 0.96), 3), previous }).catch((e: unknown) => e),
    );
    expect(message).toMatch(/^neuron-budget\.baseline\.json: the baseline file changed while this run was searching/);
    expect(message).toContain('Run `neuron-budget baseline` again');
    expect(readFileSync(s.path, 'utf8')).toBe(theirs);
    expect(JSON.parse(theirs).history.map((h: { width: number }) => h.width)).toEqual([4, 5]);
    expect(readdirSync(s.dir)).toEqual(['neuron-budget.baseline.json']);
  });

  it('a file created or removed during the search is also a change', async () => {
    const s = setup();
    await runGateStage(s.input('baseline', found(4, 0.96), 1));
    const created = refusal(
      await runGateStage({ ...s.input('baseline', found(3, 0.96), 2), previous: null }).catch((e: unknown) => e),
    );
    expect(created).toContain('the baseline file was created while this run was searching');
    const previous = await readBaseline(s.path);
    rmSync(s.path);
    const removed = refusal(
      await runGateStage({ ...s.input('baseline', found(3, 0.96), 2), previous }).catch((e: unknown) => e),
    );
    expect(removed).toContain('the baseline file was removed while this run was searching');
    expect(readdirSync(s.dir)).toEqual([]);
  });

  it('the same content written in another layout is no change: the result is recorded', async () => {
    const s = setup();
    await runGateStage(s.input('baseline', found(4, 0.96), 1));
    const previous = await readBaseline(s.path);
    writeFileSync(s.path, JSON.stringify(JSON.parse(readFileSync(s.path, 'utf8'))));
    await runGateStage({ ...s.input('baseline', found(3, 0.96), 2), previous });
    expect(JSON.parse(readFileSync(s.path, 'utf8')).history).toHaveLength(2);
  });

  it('a lock held by a live writer past the wait: refused with the lock file named, nothing written', async () => {
    const s = setup();
    const held = await acquireLock(s.path);
    try {
      const message = refusal(
        await runGateStage({ ...s.input('baseline', found(4, 0.96), 1), previous: null }).catch((e: unknown) => e),
      );
      expect(message).toMatch(
        new RegExp(
          `^neuron-budget\\.baseline\\.json: another neuron-budget run is writing this baseline \\(lock file \\.neuron-budget\\.baseline\\.json\\.neuron-budget\\.lock, held by process ${process.pid}`,
        ),
      );
    } finally {
      await held.release();
    }
    expect(readdirSync(s.dir)).toEqual([]);
  }, 30_000);
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
