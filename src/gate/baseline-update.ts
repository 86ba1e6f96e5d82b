/**
 * Records an accepted result in the baseline file without losing another run's. A run reads
 * the baseline before its search and builds the next one from it; if a second run wrote the
 * file in between, writing ours would silently drop that run's history entry. So the write
 * happens under an exclusive lock beside the file, after reading the file again: unchanged,
 * ours is written; changed, nothing is written and the user is told to run again (exit 2).
 */
import { basename } from 'node:path';
import { UserError } from '../common/errors.js';
import { acquireLock, LockBusy, lockPathFor, type HeldLock } from '../files/lock.js';
import { readBaseline, writeBaseline } from './baseline.js';
import type { Baseline } from './types.js';

/**
 * Writes `next` to `path` if the file still holds `expected` (null: no file), else throws a
 * UserError naming the file (`shown`, as the user wrote it).
 */
export async function updateBaseline(
  path: string,
  shown: string,
  expected: Baseline | null,
  next: Baseline,
): Promise<void> {
  const lock = await lockOrRefuse(path, shown);
  try {
    const now = await readBaseline(path, shown);
    if (!sameBaseline(expected, now)) {
      const what = now === null ? 'was removed' : expected === null ? 'was created' : 'changed';
      throw new UserError(
        `${shown}: the baseline file ${what} while this run was searching (another \`neuron-budget baseline\` run?), ` +
          'so this result was not recorded, to keep that change. Run `neuron-budget baseline` again to record it on top.',
        { file: shown },
      );
    }
    await writeBaseline(path, next);
  } finally {
    await lock.release();
  }
}

async function lockOrRefuse(path: string, shown: string): Promise<HeldLock> {
  try {
    return await acquireLock(path);
  } catch (e) {
    if (!(e instanceof LockBusy)) throw e;
    const lockShown = displayLockPath(shown, path);
    const who = e.owner
      ? ` by process ${e.owner.pid}${e.owner.host ? ` on ${e.owner.host}` : ''}${e.owner.since ? ` since ${e.owner.since}` : ''}`
      : '';
    throw new UserError(
      `${shown}: another neuron-budget run is writing this baseline (lock file ${lockShown}, held${who}), so this result was not recorded. ` +
        'Run `neuron-budget baseline` again when it has finished; if none is running, delete the lock file.',
      { file: shown },
    );
  }
}

/** The lock file's path in the same form as the baseline's as the user wrote it. */
function displayLockPath(shown: string, path: string): string {
  return `${shown.slice(0, shown.lastIndexOf('/') + 1)}${basename(lockPathFor(path))}`;
}

/** Same content; key order and formatting of the file do not matter to a reader. */
function sameBaseline(a: Baseline | null, b: Baseline | null): boolean {
  if (a === null || b === null) return a === b;
  return canonical(a) === canonical(b);
}

function canonical(v: unknown): string {
  if (Array.isArray(v)) return `[${v.map(canonical).join(',')}]`;
  if (v !== null && typeof v === 'object') {
    const keys = Object.keys(v).sort();
    return `{${keys.map((k) => `${JSON.stringify(k)}:${canonical((v as Record<string, unknown>)[k])}`).join(',')}}`;
  }
  return JSON.stringify(v);
}
