/** Where in the data file something is, for messages a user can follow in a text editor. */
import { quote } from '../common/escape.js';
import { UserError } from '../common/errors.js';

export interface DataFile {
  /** Absolute path (for UserError.file). */
  path: string;
  /** Path as the user knows it (relative to the workspace root), for messages. */
  shown: string;
}

/** `column 4 "kurtosis"`: both the number an editor shows and the header name. */
export function columnLabel(column: number, name: string | undefined): string {
  return name === undefined || name === '' ? `column ${column}` : `column ${column} ${quote(name, 60)}`;
}

/** An error at a line (1-based, as an editor counts) and column (1-based field number). */
export function dataError(
  file: DataFile,
  line: number,
  column: number | undefined,
  message: string,
  key?: string,
): UserError {
  const at = column === undefined ? `${file.shown}:${line}` : `${file.shown}:${line}:${column}`;
  return new UserError(`${at}: ${message}`, { file: file.path, line, column, key });
}

/** Quote a value from the file for a message, keeping it short and visible. */
export function shownValue(value: string): string {
  return quote(value, 40);
}

/**
 * Most characters in a column name, class label or category (documented in the README's
 * limits). These strings are stored in the model and the baseline and shown on every screen;
 * a longer one is a whole document pasted into a cell, not a name (a practical cap, no source).
 */
export const MAX_NAME_LENGTH = 256;

/** Characters (code points) in `s`. */
export function characterCount(s: string): number {
  let n = 0;
  for (let i = 0; i < s.length; i++) {
    const c = s.charCodeAt(i);
    if (c < 0xdc00 || c > 0xdfff) n++; // a low surrogate completes a character already counted
  }
  return n;
}

/**
 * A problem whose fix belongs in the config (a column name that is not in the header).
 * Thrown where the config position is not at hand; loadData turns it into a UserError
 * at the key's line and column in the config file.
 */
export class ConfigKeyProblem extends Error {
  constructor(
    readonly key: string,
    readonly detail: string,
  ) {
    super(`${key}: ${detail}`);
    this.name = 'ConfigKeyProblem';
  }
}
