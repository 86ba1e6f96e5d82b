/**
 * Bad config and data become error annotations on the offending file and line. The runner
 * shows at most 10 error annotations per step; past that the rest go to the log only.
 */
import { isAbsolute, resolve } from 'node:path';
import { relativeInside } from '../common/paths.js';
import { isPrintable } from '../common/escape.js';
import type { UserError } from '../common/errors.js';

const ANNOTATION_LIMIT = 10;

export interface Annotation {
  message: string;
  file?: string;
  startLine?: number;
  startColumn?: number;
}

/**
 * Annotation paths are relative to the repository root. Job errors name files relative to the
 * workspace (the job's root); a path outside it is left off.
 * @testOnly
 */
export function annotationPath(file: string, workspace: string): string | undefined {
  const abs = isAbsolute(file) ? file : resolve(workspace, file);
  const rel = relativeInside(workspace, abs);
  return rel === null || rel === '' ? undefined : rel;
}

export function toAnnotation(e: UserError, workspace: string): Annotation {
  const a: Annotation = { message: e.message };
  const file = e.file ? annotationPath(e.file, workspace) : undefined;
  // @actions/core escapes only %, CR, LF, ":" and "," in a command's properties, so a file name
  // with other control or invisible characters would reach the log raw: such an annotation
  // goes without a location (the message names the file, escaped).
  if (file && isPrintable(file)) {
    a.file = file;
    if (e.line !== undefined && e.line >= 1) {
      a.startLine = e.line;
      if (e.column !== undefined && e.column >= 1) a.startColumn = e.column;
    }
  }
  return a;
}

/** Splits into what is annotated and what only reaches the log. */
export function withinLimit(
  list: Annotation[],
  limit = ANNOTATION_LIMIT,
): { annotated: Annotation[]; logged: Annotation[] } {
  return { annotated: list.slice(0, limit), logged: list.slice(limit) };
}
