/**
 * An error the user caused (bad config, bad data, bad arguments). The shells print
 * `message` without a stack trace, exit with code 2, and (in the action) turn
 * `file`/`line`/`column` into an error annotation.
 *
 * Messages quote repository strings (column names, values, paths), so the whole message is
 * passed through the one sanitiser here: whoever builds a message cannot forget it.
 */
import { escapeText } from './escape.js';

/** Longest message shown; the values inside are clipped where they are quoted, this bounds the rest. */
export const MAX_MESSAGE = 2000;

export class UserError extends Error {
  readonly file: string | undefined;
  readonly line: number | undefined;
  readonly column: number | undefined;
  readonly key: string | undefined;

  constructor(message: string, where: { file?: string; line?: number; column?: number; key?: string } = {}) {
    super(escapeText(message, MAX_MESSAGE));
    this.name = 'UserError';
    this.file = where.file;
    this.line = where.line;
    this.column = where.column;
    this.key = where.key;
  }
}

export function isUserError(e: unknown): e is UserError {
  return e instanceof UserError;
}
