// writeFileAtomic: the whole new content or the old, never a half-written file or a leftover,
// and the leftovers of a killed writer removed by the next write.
import { spawnSync } from 'node:child_process';
import {
  chmodSync,
  mkdirSync,
  mkdtempSync,
  readdirSync,
  readFileSync,
  rmSync,
  utimesSync,
  writeFileSync,
} from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, test } from 'vitest';
import { STALE_TEMP_AGE_MS, removeStaleTempFiles, writeFileAtomic } from '../../src/files/atomic.js';

/** The PID of a process that has ended (a child run to completion). */
function deadPid(): number {
  const child = spawnSync(process.execPath, ['-e', '']);
  expect(child.status).toBe(0);
  return child.pid;
}

let dir: string;
beforeEach(() => {
  dir = mkdtempSync(join(tmpdir(), 'neuron-budget-atomic-'));
});
afterEach(() => {
  chmodSync(dir, 0o755);
  rmSync(dir, { recursive: true, force: true });
});

describe('writeFileAtomic', () => {
  test('writes a new file and leaves nothing else', async () => {
    await writeFileAtomic(join(dir, 'report.json'), '{"a":1}\n');
    expect(readFileSync(join(dir, 'report.json'), 'utf8')).toBe('{"a":1}\n');
    expect(readdirSync(dir)).toEqual(['report.json']);
  });

  test('replaces an existing file whole', async () => {
    writeFileSync(join(dir, 'base.json'), 'old content that is longer than the new one');
    await writeFileAtomic(join(dir, 'base.json'), 'new');
    expect(readFileSync(join(dir, 'base.json'), 'utf8')).toBe('new');
    expect(readdirSync(dir)).toEqual(['base.json']);
  });

  test('keeps UTF-8 text intact', async () => {
    const text = 'Pumpe Nr. 3 · ≤ 0.02 · 泵\n';
    await writeFileAtomic(join(dir, 't.txt'), text);
    expect(readFileSync(join(dir, 't.txt'), 'utf8')).toBe(text);
  });

  test('a failed rename removes the temp file and leaves the target as it was', async () => {
    mkdirSync(join(dir, 'taken'));
    writeFileSync(join(dir, 'taken', 'inside.txt'), 'x');
    await expect(writeFileAtomic(join(dir, 'taken'), 'text')).rejects.toThrow();
    expect(readdirSync(dir)).toEqual(['taken']);
    expect(readdirSync(join(dir, 'taken'))).toEqual(['inside.txt']);
  });

  test('a missing folder rejects and creates nothing', async () => {
    await expect(writeFileAtomic(join(dir, 'no', 'such', 'file.json'), 'x')).rejects.toMatchObject({ code: 'ENOENT' });
    expect(readdirSync(dir)).toEqual([]);
  });
});

describe('stale temp files of killed writers', () => {
  const hex = 'a1b2c3d4e5f6';

  test("the next write of the same file removes a dead writer's temp files, and only those", async () => {
    const gone = deadPid();
    const stale = `.base.json.${gone}.${hex}.neuron-budget.tmp`;
    const legacy = `.base.json.${gone}.${hex}.tmp`; // the name neuron-budget 0.1.0 gave them
    const live = `.base.json.${process.ppid}.${hex}.neuron-budget.tmp`; // our parent runs
    const others = [
      `.other.json.${gone}.${hex}.neuron-budget.tmp`, // another target
      `.base.json.${gone}.${hex}.json.tmp`, // not our pattern
      `.base.json.${gone}.A1B2C3D4E5F6.neuron-budget.tmp`, // not our pattern (upper-case hex)
      `base.json.${gone}.${hex}.neuron-budget.tmp`, // no leading dot
    ];
    for (const name of [stale, legacy, live, ...others]) writeFileSync(join(dir, name), 'half');
    await writeFileAtomic(join(dir, 'base.json'), 'whole');
    expect(readdirSync(dir).sort()).toEqual(['base.json', live, ...others].sort());
    expect(readFileSync(join(dir, 'base.json'), 'utf8')).toBe('whole');
  });

  test('a temp file older than the stale age goes even when its PID runs (reused or of another machine)', async () => {
    const old = `.base.json.${process.ppid}.${hex}.neuron-budget.tmp`;
    writeFileSync(join(dir, old), 'half');
    const when = (Date.now() - STALE_TEMP_AGE_MS - 60_000) / 1000;
    utimesSync(join(dir, old), when, when);
    expect(await removeStaleTempFiles(join(dir, 'base.json'))).toEqual([old]);
    expect(readdirSync(dir)).toEqual([]);
  });

  test('a folder holding one of the names leaves it alone, and a missing folder is not an error', async () => {
    const name = `.base.json.${deadPid()}.${hex}.neuron-budget.tmp`;
    mkdirSync(join(dir, name));
    expect(await removeStaleTempFiles(join(dir, 'base.json'))).toEqual([]);
    expect(readdirSync(dir)).toEqual([name]);
    expect(await removeStaleTempFiles(join(dir, 'nope', 'base.json'))).toEqual([]);
  });

  test('the temp file of a write follows the pattern the README names', async () => {
    // A folder in the way makes the rename fail after the temp file was written: catch its name.
    mkdirSync(join(dir, 'taken'));
    writeFileSync(join(dir, 'taken', 'x'), '');
    const seen: string[] = [];
    const watcher = (await import('node:fs')).watch(dir, (_e, name) => name && seen.push(String(name)));
    await expect(writeFileAtomic(join(dir, 'taken'), 'text')).rejects.toThrow();
    await new Promise((ok) => setTimeout(ok, 50));
    watcher.close();
    const temps = [...new Set(seen)].filter((n) => n !== 'taken');
    expect(temps.length).toBeGreaterThan(0);
    for (const n of temps)
      expect(n).toMatch(new RegExp(`^\\.taken\\.${process.pid}\\.[0-9a-f]{12}\\.neuron-budget\\.tmp$`));
  });
});
