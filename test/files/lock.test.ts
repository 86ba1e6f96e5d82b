// The lock beside a file: one holder at a time, a live holder waited for, a dead one's lock taken over.
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync, utimesSync, writeFileSync } from 'node:fs';
import { hostname, tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, test } from 'vitest';
import { LockBusy, STALE_LOCK_AGE_MS, acquireLock, lockPathFor } from '../../src/files/lock.js';

let dir: string;
let target: string;
beforeEach(() => {
  dir = mkdtempSync(join(tmpdir(), 'neuron-budget-lock-'));
  target = join(dir, 'base.json');
});
afterEach(() => rmSync(dir, { recursive: true, force: true }));

function deadPid(): number {
  const child = spawnSync(process.execPath, ['-e', '']);
  expect(child.status).toBe(0);
  return child.pid;
}
function age(path: string, ms: number): void {
  const when = (Date.now() - ms) / 1000;
  utimesSync(path, when, when);
}
const record = (pid: number, host = hostname()): string =>
  JSON.stringify({ pid, host, token: 'feedfacefeedface', since: '2026-11-02T08:00:00.000Z' });

describe('acquireLock', () => {
  test('names the lock after the file, holds it exclusively, and removes it on release', async () => {
    expect(lockPathFor(target)).toBe(join(dir, '.base.json.neuron-budget.lock'));
    const held = await acquireLock(target);
    expect(JSON.parse(readFileSync(lockPathFor(target), 'utf8'))).toMatchObject({ pid: process.pid, host: hostname() });
    const busy = await acquireLock(target, { waitMs: 50 }).catch((e: unknown) => e);
    expect(busy).toBeInstanceOf(LockBusy);
    expect((busy as LockBusy).owner).toMatchObject({ pid: process.pid, host: hostname() });
    await held.release();
    expect(existsSync(lockPathFor(target))).toBe(false);
  });

  test('a second taker waits for a live holder, then gets the lock', async () => {
    const first = await acquireLock(target);
    let released = 0;
    setTimeout(() => {
      released = Date.now();
      void first.release();
    }, 150);
    const second = await acquireLock(target, { waitMs: 5_000 });
    expect(released).toBeGreaterThan(0);
    await second.release();
    expect(existsSync(lockPathFor(target))).toBe(false);
  });

  test('takes over the lock of a process that is gone, and of any holder after the stale age', async () => {
    writeFileSync(lockPathFor(target), record(deadPid()));
    const a = await acquireLock(target, { waitMs: 0 });
    expect(JSON.parse(readFileSync(lockPathFor(target), 'utf8')).pid).toBe(process.pid);
    await a.release();

    // Our parent process runs, but a lock this old cannot be in use (its section takes milliseconds).
    writeFileSync(lockPathFor(target), record(process.ppid));
    age(lockPathFor(target), STALE_LOCK_AGE_MS + 1_000);
    const b = await acquireLock(target, { waitMs: 0 });
    await b.release();
    expect(existsSync(lockPathFor(target))).toBe(false);
  });

  test("a live holder's lock is not taken over, nor another machine's with a PID unknown here", async () => {
    writeFileSync(lockPathFor(target), record(process.ppid));
    await expect(acquireLock(target, { waitMs: 30 })).rejects.toBeInstanceOf(LockBusy);
    writeFileSync(lockPathFor(target), record(deadPid(), 'some-other-runner'));
    await expect(acquireLock(target, { waitMs: 30 })).rejects.toMatchObject({
      owner: { host: 'some-other-runner' },
    });
    expect(existsSync(lockPathFor(target))).toBe(true);
  });

  test('an empty lock (holder killed between create and write) is waited for briefly, then taken over', async () => {
    writeFileSync(lockPathFor(target), '');
    await expect(acquireLock(target, { waitMs: 30 })).rejects.toMatchObject({ owner: null });
    age(lockPathFor(target), 10_000);
    const held = await acquireLock(target, { waitMs: 0 });
    await held.release();
  });

  test('release leaves a lock that is no longer ours', async () => {
    const held = await acquireLock(target);
    writeFileSync(lockPathFor(target), record(process.ppid)); // someone took it over
    await held.release();
    expect(readFileSync(lockPathFor(target), 'utf8')).toBe(record(process.ppid));
  });

  test("a lock file's strange content never reaches the owner shown", async () => {
    writeFileSync(
      lockPathFor(target),
      JSON.stringify({ pid: process.ppid, host: 'evil\n::error::x', since: 'not a date' }),
    );
    const busy = (await acquireLock(target, { waitMs: 0 }).catch((e: unknown) => e)) as LockBusy;
    expect(busy.owner).toEqual({ pid: process.ppid, host: null, since: null });
  });
});
