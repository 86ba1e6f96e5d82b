/** Whether a process of this machine still runs, for telling a dead writer's leftovers from a live one's. */

/**
 * True only when `pid` certainly names no running process here (ESRCH). A process of
 * another user (EPERM) runs; anything unclear counts as running, so nothing live is touched.
 */
export function processIsGone(pid: number): boolean {
  if (!Number.isSafeInteger(pid) || pid <= 0) return false;
  try {
    process.kill(pid, 0);
    return false;
  } catch (e) {
    return (e as NodeJS.ErrnoException).code === 'ESRCH';
  }
}
