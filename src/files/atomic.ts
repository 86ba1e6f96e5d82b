/**
 * Writes a file so that readers see either the old content or the whole new content,
 * never a half-written file: write a temp file in the same folder, then rename it over
 * the target (rename is atomic within one file system, which is why the temp file must
 * live beside the target rather than in the OS temp folder).
 *
 * A writer killed between the two steps leaves its temp file behind. The names follow one
 * pattern, `.NAME.PID.HEX.neuron-budget.tmp`, which users can ignore in git
 * (`*.neuron-budget.tmp`), and the next write of the same target removes those whose
 * writer is gone.
 */
import { randomBytes } from 'node:crypto';
import { open, readdir, rename, rm, stat } from 'node:fs/promises';
import { basename, dirname, join } from 'node:path';
import { processIsGone } from './process.js';

const TEMP_SUFFIX = '.neuron-budget.tmp';
/** A temp file this old is stale whatever its PID says (a PID can be reused, or belong to another machine). @testOnly */
export const STALE_TEMP_AGE_MS = 60 * 60 * 1000;

export async function writeFileAtomic(path: string, text: string): Promise<void> {
  await removeStaleTempFiles(path);
  // The random suffix only names the temp file; it never reaches any output.
  const temp = join(dirname(path), `.${basename(path)}.${process.pid}.${randomBytes(6).toString('hex')}${TEMP_SUFFIX}`);
  let handle: Awaited<ReturnType<typeof open>> | null = null;
  try {
    handle = await open(temp, 'wx');
    await handle.writeFile(text, 'utf8');
    await handle.sync();
    await handle.close();
    handle = null;
    await rename(temp, path);
  } catch (error) {
    if (handle) await handle.close().catch(() => undefined);
    await rm(temp, { force: true }).catch(() => undefined);
    throw error;
  }
}

function escapeRegExp(s: string): string {
  return s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
}

/**
 * Removes the temp files that earlier writes of `path` left behind: only names of exactly
 * our pattern for this target, and only when their writer process is gone (on this machine)
 * or the file is older than STALE_TEMP_AGE_MS. Never throws: a leftover it cannot remove
 * must not stop the write. Returns the names removed.
 * @testOnly
 */
export async function removeStaleTempFiles(path: string, now = Date.now()): Promise<string[]> {
  const folder = dirname(path);
  // A bare `.tmp` ending is the name neuron-budget 0.1.0 gave them: an upgrade cleans those up too.
  const pattern = new RegExp(
    `^\\.${escapeRegExp(basename(path))}\\.(\\d{1,10})\\.[0-9a-f]{12}(?:${escapeRegExp(TEMP_SUFFIX)}|\\.tmp)$`,
  );
  let names: string[];
  try {
    names = await readdir(folder);
  } catch {
    return [];
  }
  const removed: string[] = [];
  for (const name of names) {
    const m = pattern.exec(name);
    if (!m) continue;
    const pid = Number(m[1]);
    if (pid === process.pid) continue; // a write of this process may be under way
    const full = join(folder, name);
    try {
      const info = await stat(full);
      if (!info.isFile()) continue;
      if (!processIsGone(pid) && now - info.mtimeMs < STALE_TEMP_AGE_MS) continue;
      await rm(full, { force: true });
      removed.push(name);
    } catch {
      // Gone already (another run cleaned it) or not ours to touch: leave it.
    }
  }
  return removed;
}
