/**
 * Output files a user asked for (report, model): checked before minutes of work, written
 * atomically after. A refusal by the file system is the user's to fix, not a bug.
 */
import { stat } from 'node:fs/promises';
import { dirname } from 'node:path';
import { UserError } from '../common/errors.js';
import { displayPath } from '../common/paths.js';
import { writeFileAtomic } from './atomic.js';

/** Writes an output file atomically; a refusal by the file system is the user's to fix, not a bug. */
export async function writeOutput(path: string, text: string, what: string, root: string): Promise<void> {
  try {
    await writeFileAtomic(path, text);
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    const reasons: Record<string, string> = {
      EACCES: 'permission denied',
      EPERM: 'permission denied',
      EROFS: 'the file system is read-only',
      ENOSPC: 'no space left on the device',
      EISDIR: 'it is a folder',
      ENOENT: 'its folder does not exist',
      ENOTDIR: 'a part of the path is not a folder',
    };
    const reason = code === undefined ? undefined : reasons[code];
    if (reason === undefined) throw error;
    const shown = displayPath(root, path);
    throw new UserError(`${what} file ${shown}: cannot be written (${reason}); nothing was written`, { file: shown });
  }
}

/** Fails early when `path` cannot be an output file (its folder is missing, or it is a folder). */
export async function checkOutputFolder(path: string, what: string, root: string): Promise<void> {
  const folder = dirname(path);
  const shown = displayPath(root, folder);
  const info = await stat(folder).catch(() => null);
  if (info === null)
    throw new UserError(`${what} file ${displayPath(root, path)}: folder ${shown} does not exist`, {
      file: displayPath(root, path),
    });
  if (!info.isDirectory())
    throw new UserError(`${what} file ${displayPath(root, path)}: ${shown} is not a folder`, {
      file: displayPath(root, path),
    });
  const target = await stat(path).catch(() => null);
  if (target?.isDirectory())
    throw new UserError(`${what} file ${displayPath(root, path)}: is a folder, expected a file name`, {
      file: displayPath(root, path),
    });
}
