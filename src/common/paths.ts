/**
 * Workspace confinement for every path a user gives (config paths, action inputs).
 * A gate that runs on pull requests must not read or write outside the checkout, so a
 * path may not climb out with `../`, be absolute somewhere else, or pass through a
 * symbolic link that points outside.
 */
import { existsSync, realpathSync } from 'node:fs';
import { dirname, isAbsolute, relative, resolve, sep } from 'node:path';
import { quote } from './escape.js';
import { UserError } from './errors.js';

export type InsideResult = { ok: true; path: string } | { ok: false; reason: string };

/** True when `child` is `parent` or lies below it (both absolute and normalised). @testOnly */
export function isInside(parent: string, child: string): boolean {
  return relativeInside(parent, child) !== null;
}

/**
 * `child` relative to `parent` with forward slashes ('' for `parent` itself), or null when it
 * lies outside. A name that merely starts with two dots (`..x`) is inside.
 */
export function relativeInside(parent: string, child: string): string | null {
  const rel = relative(resolve(parent), resolve(child));
  if (rel === '..' || rel.startsWith('..' + sep) || isAbsolute(rel)) return null;
  return rel.split(sep).join('/');
}

/** How a file is named in messages: relative to the workspace root when inside it, forward slashes. */
export function displayPath(root: string, file: string): string {
  const rel = relativeInside(root, file);
  return rel === null ? resolve(file) : rel || '.';
}

/** The real location of `p`, following links through its longest existing prefix. */
function realLocation(p: string): string {
  let existing = p;
  const rest: string[] = [];
  while (!existsSync(existing)) {
    const parent = dirname(existing);
    if (parent === existing) return p;
    rest.unshift(existing.slice(parent.length).replace(/^[\\/]+/, ''));
    existing = parent;
  }
  return resolve(realpathSync(existing), ...rest);
}

/**
 * Resolves `p` against `baseDir` and checks that the result stays inside `root`.
 * Returns the absolute path, or the reason it was refused (for the caller to locate).
 */
export function checkInside(root: string, baseDir: string, p: string): InsideResult {
  if (p.trim() === '') return { ok: false, reason: 'expected a path, found an empty string' };
  if (p.includes('\0')) return { ok: false, reason: 'a path may not contain a NUL character' };
  const absoluteRoot = resolve(root);
  const target = resolve(baseDir, p);
  const where = isAbsolute(p) ? 'is an absolute path outside' : 'leads outside';
  if (!isInside(absoluteRoot, target)) {
    return { ok: false, reason: `${quote(p)} ${where} the workspace ${absoluteRoot}` };
  }
  const realRoot = realLocation(absoluteRoot);
  if (!isInside(realRoot, realLocation(target))) {
    return {
      ok: false,
      reason: `${quote(p)} goes through a symbolic link that leads outside the workspace ${absoluteRoot}`,
    };
  }
  return { ok: true, path: target };
}

/** As checkInside, but throws a UserError (with `key` when given) instead of returning the reason. */
export function resolveInside(root: string, baseDir: string, p: string, key?: string): string {
  const result = checkInside(root, baseDir, p);
  if (!result.ok) throw new UserError(key ? `${key}: ${result.reason}` : result.reason, key ? { key } : {});
  return result.path;
}

/** The config file the command line and the action read when none is named. */
export const DEFAULT_CONFIG = 'neuron-budget.yml';
