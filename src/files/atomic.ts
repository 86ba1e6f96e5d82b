/**
 * Writes a file so that readers see either the old content or the whole new content,
 * never a half-written file: write a temp file in the same folder, then rename it over
 * the target (rename is atomic within one file system, which is why the temp file must
 * live beside the target rather than in the OS temp folder).
 */
import { randomBytes } from 'node:crypto';
import { open, rename, rm } from 'node:fs/promises';
import { basename, dirname, join } from 'node:path';

export async function writeFileAtomic(path: string, text: string): Promise<void> {
  // The random suffix only names the temp file; it never reaches any output.
  const temp = join(dirname(path), `.${basename(path)}.${process.pid}.${randomBytes(6).toString('hex')}.tmp`);
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
