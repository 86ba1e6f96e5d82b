/**
 * An exclusive lock beside a file, `.NAME.neuron-budget.lock`, for a read-compare-write that
 * must not interleave with another process's. Created with O_EXCL, so exactly one process
 * holds it; it records who holds it, so a lock whose holder died can be taken over:
 *
 * - its process is gone (same machine, by PID), or
 * - it is older than STALE_LOCK_AGE_MS (any machine; the section it guards takes
 *   milliseconds), or
 * - it is unreadable and older than a few seconds (a holder killed between create and write).
 */
import { randomBytes } from 'node:crypto';
import { open, readFile, rm, stat } from 'node:fs/promises';
import { hostname } from 'node:os';
import { basename, dirname, join } from 'node:path';
import { setTimeout as sleep } from 'node:timers/promises';
import { processIsGone } from './process.js';

const LOCK_SUFFIX = '.neuron-budget.lock';
/** A lock this old is stale, whoever holds it. @testOnly */
export const STALE_LOCK_AGE_MS = 10 * 60 * 1000;
/** A lock file without readable content (its holder died before writing it) is stale after this. */
const EMPTY_LOCK_AGE_MS = 5_000;

export function lockPathFor(path: string): string {
  return join(dirname(path), `.${basename(path)}${LOCK_SUFFIX}`);
}

export interface LockOwner {
  pid: number;
  host: string | null;
  since: string | null;
}

/** The lock is held by a live process and was not released in time. */
export class LockBusy extends Error {
  constructor(
    readonly lockPath: string,
    readonly owner: LockOwner | null,
  ) {
    super(`${lockPath} is held${owner ? ` by process ${owner.pid}` : ''}`);
    this.name = 'LockBusy';
  }
}

export interface HeldLock {
  release(): Promise<void>;
}

export interface LockOptions {
  /** How long to wait for a live holder to finish. */
  waitMs?: number;
  pollMs?: number;
}

interface LockRecord {
  pid: number;
  host: string;
  token: string;
  since: string;
}

export async function acquireLock(path: string, options: LockOptions = {}): Promise<HeldLock> {
  const lockPath = lockPathFor(path);
  const waitMs = options.waitMs ?? 10_000;
  const pollMs = options.pollMs ?? 25;
  const record: LockRecord = {
    pid: process.pid,
    host: hostname(),
    token: randomBytes(8).toString('hex'),
    since: new Date().toISOString(),
  };
  const text = `${JSON.stringify(record)}\n`;
  const started = Date.now();
  for (;;) {
    try {
      const handle = await open(lockPath, 'wx');
      try {
        await handle.writeFile(text, 'utf8');
      } finally {
        await handle.close();
      }
      return { release: () => releaseLock(lockPath, text) };
    } catch (e) {
      if ((e as NodeJS.ErrnoException).code !== 'EEXIST') throw e;
    }
    const held = await inspect(lockPath);
    if (held === null) continue; // released between our try and the look
    if (held.stale) {
      // Re-read just before removing: never remove a lock someone else took over meanwhile.
      const again = await readFile(lockPath, 'utf8').catch(() => null);
      if (again === held.text) await rm(lockPath, { force: true });
      continue;
    }
    if (Date.now() - started >= waitMs) throw new LockBusy(lockPath, held.owner);
    await sleep(pollMs);
  }
}

/** Removes the lock only while it is still ours. */
async function releaseLock(lockPath: string, text: string): Promise<void> {
  const now = await readFile(lockPath, 'utf8').catch(() => null);
  if (now === text) await rm(lockPath, { force: true });
}

async function inspect(lockPath: string): Promise<{ text: string; stale: boolean; owner: LockOwner | null } | null> {
  let text: string;
  let age: number;
  try {
    text = await readFile(lockPath, 'utf8');
    age = Date.now() - (await stat(lockPath)).mtimeMs;
  } catch (e) {
    if ((e as NodeJS.ErrnoException).code === 'ENOENT') return null;
    throw e;
  }
  const owner = parseOwner(text);
  if (age >= STALE_LOCK_AGE_MS) return { text, stale: true, owner };
  if (owner === null) return { text, stale: age >= EMPTY_LOCK_AGE_MS, owner };
  const here = owner.host === hostname();
  return { text, stale: here && processIsGone(owner.pid), owner };
}

/** The holder as the file says, or null. The file sits in a checkout: only plain values pass. */
function parseOwner(text: string): LockOwner | null {
  let v: unknown;
  try {
    v = JSON.parse(text);
  } catch {
    return null;
  }
  if (typeof v !== 'object' || v === null) return null;
  const r = v as Partial<Record<keyof LockRecord, unknown>>;
  if (typeof r.pid !== 'number' || !Number.isSafeInteger(r.pid) || r.pid <= 0) return null;
  const host = typeof r.host === 'string' && /^[A-Za-z0-9._-]{1,255}$/.test(r.host) ? r.host : null;
  const since =
    typeof r.since === 'string' && !Number.isNaN(Date.parse(r.since)) ? new Date(r.since).toISOString() : null;
  return { pid: r.pid, host, since };
}
