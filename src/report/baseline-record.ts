/**
 * The one line that says what `baseline` did with the baseline file, for the command line's
 * stdout and the action's log (the record itself is in JobResult.baselineRecord).
 */
import { escapeText } from '../common/escape.js';
import { formatCount } from '../common/format.js';
import type { BaselineRecord } from '../gate/types.js';

/** "baseline written: FILE, width W, N history entries", or "baseline not written: WHY". The file is escaped. */
export function baselineRecordLine(record: BaselineRecord): string {
  if ('notWritten' in record) return `baseline not written: ${record.notWritten}`;
  const entries =
    record.historyEntries === 1 ? '1 history entry' : `${formatCount(record.historyEntries)} history entries`;
  return `baseline written: ${escapeText(record.file)}, width ${record.width}, ${entries}`;
}
